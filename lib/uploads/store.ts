/**
 * Where uploaded bytes live: `<BAYWRIGHT_DATA_ROOT>/uploads/<BAYWRIGHT_DB>/<aa>/<random>` — outside
 * `public/`, so nothing is served without a route handler's rights check. Names are 128 random
 * bits in hex, fanned out by their first two characters.
 *
 * Several app processes may share one folder (e.g. on a shared volume beside a PostgreSQL server):
 * a file is streamed to a temporary name in its final folder and renamed into place only when
 * complete (rename is atomic within a file system), nothing is cached in memory, and names never
 * collide, so no process needs to know about another.
 *
 * Enforces the size limit while streaming (never buffers the whole body) and the type from the
 * first bytes. Must never use a name that came from the uploader to build a path.
 */
import 'server-only';
import fs from 'node:fs';
import path from 'node:path';
import crypto from 'node:crypto';
import { Readable } from 'node:stream';
import { SNIFF_BYTES, sniffType, typeMismatch, type UploadType } from './file-type';
import { UPLOAD_LIMIT_BYTES } from './dto';

/** 15 MB (as 15 × 1024 × 1024 bytes): enough for a phone photo or a scanned A3 drawing. */
export const MAX_UPLOAD_BYTES = UPLOAD_LIMIT_BYTES;

export class PayloadTooLargeError extends Error {
  readonly status = 413;
  constructor(limit = MAX_UPLOAD_BYTES) {
    super(`The file is larger than ${Math.round(limit / (1024 * 1024))} MB. Make the photo smaller or split the drawing.`);
  }
}
export class UnsupportedTypeError extends Error {
  readonly status = 415;
}
export class EmptyUploadError extends Error {
  readonly status = 400;
  constructor() {
    super('The file is empty.');
  }
}

const STORED_NAME = /^[0-9a-f]{32}$/;

export function uploadsRoot(): string {
  const name = process.env.BAYWRIGHT_DB ?? 'dev';
  if (!/^[a-z0-9][a-z0-9_-]*$/i.test(name)) throw new Error(`BAYWRIGHT_DB must be a plain folder name, got "${name}"`);
  return path.join(process.env.BAYWRIGHT_DATA_ROOT ?? path.join(process.cwd(), 'data'), 'uploads', name);
}

/** The path of a stored file; refuses anything but one of our own random names. */
export function storedPath(storedName: string): string {
  if (!STORED_NAME.test(storedName)) throw new Error('not a stored upload name');
  return path.join(uploadsRoot(), storedName.slice(0, 2), storedName);
}

export interface StoredFile {
  storedName: string;
  contentType: UploadType;
  sizeBytes: number;
}

/**
 * Streams a request body to disk. Checks the type from the first bytes against the claim
 * (415), counts bytes against the limit (413), and removes what it wrote on any failure.
 */
export async function storeUpload(
  body: ReadableStream<Uint8Array> | null,
  claim: { contentType: string; fileName: string; declaredLength?: number },
  limit = MAX_UPLOAD_BYTES,
): Promise<StoredFile> {
  if (claim.declaredLength !== undefined && claim.declaredLength > limit) throw new PayloadTooLargeError(limit);
  if (!body) throw new EmptyUploadError();
  const storedName = crypto.randomBytes(16).toString('hex');
  const finalPath = storedPath(storedName);
  const tempPath = `${finalPath}.incoming`;
  await fs.promises.mkdir(path.dirname(finalPath), { recursive: true });

  const reader = body.getReader();
  let out: fs.promises.FileHandle | null = null;
  let size = 0;
  let head: Uint8Array = new Uint8Array(0);
  let contentType: UploadType | null = null;
  try {
    for (;;) {
      const { done, value } = await reader.read();
      if (done) break;
      if (!value?.byteLength) continue;
      size += value.byteLength;
      if (size > limit) throw new PayloadTooLargeError(limit);
      if (!contentType) {
        head = concat(head, value);
        if (head.byteLength < SNIFF_BYTES) continue;
        contentType = checkedType(head, claim);
        out = await fs.promises.open(tempPath, 'wx', 0o640);
        await out.write(head);
        continue;
      }
      await out!.write(value);
    }
    if (size === 0) throw new EmptyUploadError();
    if (!contentType) {
      // A file shorter than the sniff window: decide on what there is.
      contentType = checkedType(head, claim);
      out = await fs.promises.open(tempPath, 'wx', 0o640);
      await out.write(head);
    }
    await out!.sync();
    await out!.close();
    out = null;
    await fs.promises.rename(tempPath, finalPath);
    return { storedName, contentType, sizeBytes: size };
  } catch (err) {
    await reader.cancel().catch(() => undefined);
    if (out) await out.close().catch(() => undefined);
    await fs.promises.rm(tempPath, { force: true }).catch(() => undefined);
    throw err;
  }
}

function checkedType(head: Uint8Array, claim: { contentType: string; fileName: string }): UploadType {
  const found = sniffType(head);
  const mismatch = typeMismatch(found, claim.contentType, claim.fileName);
  if (mismatch || !found) throw new UnsupportedTypeError(mismatch ?? 'Unsupported file type.');
  return found;
}

function concat(a: Uint8Array, b: Uint8Array): Uint8Array {
  const out = new Uint8Array(a.byteLength + b.byteLength);
  out.set(a, 0);
  out.set(b, a.byteLength);
  return out;
}

/** A web stream of a stored file, for a Response body. */
export function readStored(storedName: string): ReadableStream<Uint8Array> {
  return Readable.toWeb(fs.createReadStream(storedPath(storedName))) as ReadableStream<Uint8Array>;
}

export async function storedExists(storedName: string): Promise<boolean> {
  return fs.promises.access(storedPath(storedName)).then(() => true, () => false);
}

/** Removes a stored file; a file already gone is not an error. */
export async function removeStored(storedName: string): Promise<void> {
  await fs.promises.rm(storedPath(storedName), { force: true });
}

export interface StoredEntry {
  storedName: string;
  path: string;
  /** A temporary file of an upload still streaming (or one that died). */
  incoming: boolean;
  modifiedMs: number;
}

/** Every file in the uploads folder that has the shape of one of ours; anything else is left alone. */
export async function listStored(): Promise<StoredEntry[]> {
  const root = uploadsRoot();
  const out: StoredEntry[] = [];
  const fans = await fs.promises.readdir(root).catch(() => [] as string[]);
  for (const fan of fans) {
    if (!/^[0-9a-f]{2}$/.test(fan)) continue;
    for (const name of await fs.promises.readdir(path.join(root, fan)).catch(() => [] as string[])) {
      const m = /^([0-9a-f]{32})(\.incoming)?$/.exec(name);
      if (!m || !m[1].startsWith(fan)) continue;
      const full = path.join(root, fan, name);
      const stat = await fs.promises.stat(full).catch(() => null);
      if (stat?.isFile()) out.push({ storedName: m[1], path: full, incoming: Boolean(m[2]), modifiedMs: stat.mtimeMs });
    }
  }
  return out;
}
