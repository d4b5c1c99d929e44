/**
 * Reference uploads of a layout: photos and PDF drawings. Every function takes the Actor and
 * checks rights inside: owners and designers of the layout's studio list, add, place and delete;
 * the layout's own client lists and views; anyone else gets "not found". Returns DTOs, never rows
 * (the stored name on disk never leaves this file).
 *
 * Tracing placements are studio data: they are returned only here, to signed-in members who may
 * read the layout, and are never part of the LayoutDoc a viewer link shows.
 */
import 'server-only';
import { log } from '../lib/log';
import fs from 'node:fs';
import { and, count, desc, eq, inArray, sum } from 'drizzle-orm';
import { getDb } from './client';
import { layouts, uploads, users } from './schema';
import { BadRequestError, ConflictError, NotFoundError } from './errors';
import type { Actor } from './actor';
import { loadLayoutFor, rightsOver } from './access';
import { isId } from './ids';
import { cleanFileName, withExtension } from '../lib/uploads/file-name';
import { extensionOf, isImage, uploadKind, type UploadType } from '../lib/uploads/file-type';
import { listStored, readStored, removeStored, storedExists, storedPath, storeUpload, MAX_UPLOAD_BYTES } from '../lib/uploads/store';
import { checkImageDimensions, quotaMessage, StorageQuotaError, studioQuotaBytes } from '../lib/uploads/limits';
import type { TracingPlacement } from '../lib/tracing/calibration';
import type { UploadDto } from '../lib/uploads/dto';

export type { UploadDto };

/** A layout keeps at most this many reference files (common practice, no source: a tidy folder). */
export const MAX_UPLOADS_PER_LAYOUT = 40;

const uploadColumns = {
  id: uploads.id,
  layoutId: uploads.layoutId,
  studioId: uploads.studioId,
  storedName: uploads.storedName,
  fileName: uploads.fileName,
  contentType: uploads.contentType,
  sizeBytes: uploads.sizeBytes,
  tracing: uploads.tracing,
  createdAt: uploads.createdAt,
  uploaderName: users.name,
  layoutClientId: layouts.clientId,
};

type Row = {
  id: string;
  layoutId: string;
  studioId: string;
  storedName: string;
  fileName: string;
  contentType: string;
  sizeBytes: number;
  tracing: TracingPlacement | null;
  createdAt: Date;
  uploaderName: string | null;
  layoutClientId: string | null;
};

function toDto(row: Row): UploadDto {
  return {
    id: row.id,
    layoutId: row.layoutId,
    fileName: row.fileName,
    contentType: row.contentType,
    kind: uploadKind(row.contentType),
    sizeBytes: row.sizeBytes,
    uploadedBy: row.uploaderName,
    createdAt: row.createdAt.toISOString(),
    url: `/api/uploads/${row.id}`,
    tracing: row.tracing ?? null,
  };
}

/**
 * The upload's row if the actor may see its layout (the one rule, applied to the layout the row
 * joins); NotFoundError otherwise, ForbiddenError with `forEdit` for the layout's client.
 */
async function readable(actor: Actor, uploadId: string, forEdit?: string): Promise<Row> {
  if (!isId(uploadId)) throw new NotFoundError(NO_FILE);
  const db = await getDb();
  const [row] = await db
    .select(uploadColumns)
    .from(uploads)
    .innerJoin(layouts, eq(layouts.id, uploads.layoutId))
    .leftJoin(users, eq(users.id, uploads.uploadedBy))
    .where(eq(uploads.id, uploadId))
    .limit(1);
  rightsOver(actor, row && { studioId: row.studioId, clientId: row.layoutClientId }, { notFound: NO_FILE, forEdit });
  return row!;
}

const NO_FILE = 'No such file.';

export async function listUploads(actor: Actor, layoutId: string): Promise<UploadDto[]> {
  await loadLayoutFor(actor, layoutId); // 404 for anyone who may not see the layout
  const db = await getDb();
  const rows = await db
    .select(uploadColumns)
    .from(uploads)
    .innerJoin(layouts, eq(layouts.id, uploads.layoutId))
    .leftJoin(users, eq(users.id, uploads.uploadedBy))
    .where(and(eq(uploads.layoutId, layoutId), eq(uploads.studioId, actor.studioId)))
    .orderBy(desc(uploads.createdAt));
  return rows.map(toDto);
}

export interface IncomingFile {
  body: ReadableStream<Uint8Array> | null;
  fileName: string | null;
  contentType: string;
  declaredLength?: number;
}

/**
 * Adds a file to a layout: rights first (so a stranger learns nothing, and no byte is written
 * for them), then the stream goes to disk with its size and type checked, then the row.
 */
export async function addUpload(actor: Actor, layoutId: string, file: IncomingFile, limit = MAX_UPLOAD_BYTES): Promise<UploadDto> {
  await loadLayoutFor(actor, layoutId, { forEdit: 'add files' });
  const db = await getDb();
  const [{ n }] = await db.select({ n: count() }).from(uploads).where(eq(uploads.layoutId, layoutId));
  if (n >= MAX_UPLOADS_PER_LAYOUT) throw new ConflictError(`This layout already has ${MAX_UPLOADS_PER_LAYOUT} reference files; delete one first.`);

  // The studio's storage allowance: refused before reading the body when the declared size already passes it.
  const quota = studioQuotaBytes();
  const [{ used }] = await db.select({ used: sum(uploads.sizeBytes) }).from(uploads).where(eq(uploads.studioId, actor.studioId));
  const usedBytes = Number(used ?? 0);
  if (usedBytes + (file.declaredLength ?? 0) > quota) throw new StorageQuotaError(quotaMessage(quota));

  const cleaned = cleanFileName(file.fileName);
  const stored = await storeUpload(file.body, { contentType: file.contentType, fileName: cleaned, declaredLength: file.declaredLength }, limit);
  try {
    if (usedBytes + stored.sizeBytes > quota) throw new StorageQuotaError(quotaMessage(quota));
    if (isImage(stored.contentType)) checkImageDimensions(storedPath(stored.storedName));
    const [row] = await db
      .insert(uploads)
      .values({
        layoutId,
        studioId: actor.studioId,
        storedName: stored.storedName,
        fileName: withExtension(cleaned, extensionOf(stored.contentType)),
        contentType: stored.contentType,
        sizeBytes: stored.sizeBytes,
        uploadedBy: actor.userId,
      })
      .returning({ id: uploads.id });
    return toDto(await readable(actor, row.id));
  } catch (err) {
    await removeStored(stored.storedName).catch(() => undefined);
    throw err;
  }
}

/** The file's details and a stream of its bytes, for the download route. */
export async function openUpload(actor: Actor, uploadId: string): Promise<{ upload: UploadDto; body: ReadableStream<Uint8Array> }> {
  const row = await readable(actor, uploadId);
  if (!(await storedExists(row.storedName))) throw new NotFoundError('The file is missing from storage.');
  return { upload: toDto(row), body: readStored(row.storedName) };
}

/** Removes the row first (so no one is offered a file that is going), then the bytes. */
export async function deleteUpload(actor: Actor, uploadId: string): Promise<void> {
  const row = await readable(actor, uploadId, 'delete files');
  const db = await getDb();
  await db.delete(uploads).where(eq(uploads.id, row.id));
  await removeStored(row.storedName).catch((err) => log.error('could not remove a stored upload', { error: err }));
}

/** Rights for placing an image, checked before the request body is read (404 / 403). */
export async function checkCanPlace(actor: Actor, uploadId: string): Promise<void> {
  await readable(actor, uploadId, 'place survey photos');
}

/** Places an image under the plan (or takes it away with null). Photos only. */
export async function setTracing(actor: Actor, uploadId: string, placement: TracingPlacement | null): Promise<UploadDto> {
  const row = await readable(actor, uploadId, 'place survey photos');
  if (placement && !isImage(row.contentType as UploadType)) {
    throw new BadRequestError('Only photos (JPEG, PNG, WebP) can be placed under the plan; open the PDF drawing to read it.');
  }
  const db = await getDb();
  await db.update(uploads).set({ tracing: placement }).where(eq(uploads.id, row.id));
  return toDto(await readable(actor, row.id));
}

/**
 * Removes stored files that no row names any more: left behind when a layout (and so its rows)
 * was deleted, or by an upload that died between the disk and the row. Files younger than
 * `graceMs` are kept, since an upload in another process may be between those two steps.
 * Maintenance, not a user action: it takes no Actor and touches only unreferenced files.
 */
export async function sweepOrphanUploads(graceMs = 60 * 60 * 1000, now = Date.now()): Promise<{ removed: number; kept: number }> {
  const files = await listStored();
  const old = files.filter((f) => now - f.modifiedMs > graceMs);
  if (old.length === 0) return { removed: 0, kept: files.length };
  const db = await getDb();
  const known = new Set<string>();
  const names = [...new Set(old.map((f) => f.storedName))];
  for (let i = 0; i < names.length; i += 500) {
    const rows = await db.select({ storedName: uploads.storedName }).from(uploads).where(inArray(uploads.storedName, names.slice(i, i + 500)));
    rows.forEach((r) => known.add(r.storedName));
  }
  let removed = 0;
  for (const f of old) {
    if (!f.incoming && known.has(f.storedName)) continue;
    await fs.promises.rm(f.path, { force: true });
    removed += 1;
  }
  return { removed, kept: files.length - removed };
}
