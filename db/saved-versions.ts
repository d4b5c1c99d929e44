/**
 * Saved versions of a layout: every save keeps the document as it left it (`recordSave`, called
 * inside the save's transaction), the history lists them newest first, and an earlier one can be
 * restored as the layout's newest save — nothing is overwritten, so a restore can itself be undone
 * by restoring again. Bounded: the last `SAVED_VERSIONS_KEPT` saves of a layout are kept, plus every
 * save an issued revision was frozen from. Rights: `loadLayoutFor` (read to list, edit to restore).
 * Must never return a row or a document outside the DTOs below.
 */
import 'server-only';
import { and, desc, eq, inArray, sql } from 'drizzle-orm';
import { getDb } from './client';
import { layouts, revisions, savedVersions, users } from './schema';
import { NotFoundError } from './errors';
import type { Actor } from './actor';
import { loadLayoutFor } from './access';
import { readStoredDoc } from './stored-doc';
import type { LayoutDoc } from '../lib/layout/schema';
import { saveLayout, type SavedLayoutDto } from './layouts';
import { SAVED_VERSIONS_KEPT } from './saved-version-record';

export { SAVED_VERSIONS_KEPT };

export interface SavedVersionDto {
  version: number;
  name: string;
  savedAt: string;
  savedBy: string | null;
  moduleCount: number;
  /** The version this save put back, when it was a restore. */
  restoredFrom: number | null;
  /** Letters of the revisions issued from this save. */
  revisions: string[];
  /** The layout's current version. */
  current: boolean;
}

/** The layout's saved versions, newest first (at most `SAVED_VERSIONS_KEPT` plus the revisions' saves). */
export async function listSavedVersions(actor: Actor, layoutId: string): Promise<SavedVersionDto[]> {
  const layout = await loadLayoutFor(actor, layoutId);
  const db = await getDb();
  const rows = await db
    .select({
      version: savedVersions.version,
      name: savedVersions.name,
      savedAt: savedVersions.savedAt,
      savedBy: users.name,
      restoredFrom: savedVersions.restoredFrom,
      moduleCount: sql<number>`coalesce(jsonb_array_length(${savedVersions.doc} -> 'modules'), 0)`,
    })
    .from(savedVersions)
    .leftJoin(users, eq(users.id, savedVersions.savedBy))
    .where(eq(savedVersions.layoutId, layout.id))
    .orderBy(desc(savedVersions.version))
    .limit(SAVED_VERSIONS_KEPT + 200);
  const issued = rows.length
    ? await db
        .select({ version: revisions.layoutVersion, letter: revisions.letter })
        .from(revisions)
        .where(and(eq(revisions.layoutId, layout.id), inArray(revisions.layoutVersion, rows.map((r) => r.version))))
        .orderBy(revisions.seq)
    : [];
  return rows.map((r) => ({
    version: r.version,
    name: r.name,
    savedAt: r.savedAt.toISOString(),
    savedBy: r.savedBy,
    moduleCount: Number(r.moduleCount),
    restoredFrom: r.restoredFrom,
    revisions: issued.filter((i) => i.version === r.version).map((i) => i.letter),
    current: r.version === layout.version,
  }));
}

/** One saved version's document, for a thumbnail or a restore. 404 when it is not kept. */
export async function savedVersionDoc(actor: Actor, layoutId: string, version: number): Promise<{ version: number; doc: LayoutDoc }> {
  const layout = await loadLayoutFor(actor, layoutId);
  const db = await getDb();
  const [row] = await db
    .select({ doc: savedVersions.doc })
    .from(savedVersions)
    .where(and(eq(savedVersions.layoutId, layout.id), eq(savedVersions.version, version)))
    .limit(1);
  if (!row) throw new NotFoundError('That saved version is not kept.');
  return { version, doc: readStoredDoc(row.doc) };
}

/**
 * Puts saved version `version` back as the layout's newest save (its document and name), based on
 * the version the caller last saw (`baseVersion`: 412 with the current copy if someone saved since).
 */
export async function restoreSavedVersion(actor: Actor, layoutId: string, version: number, baseVersion: number | null): Promise<SavedLayoutDto> {
  const layout = await loadLayoutFor(actor, layoutId, { forEdit: 'restore saved versions' });
  const saved = await savedVersionDoc(actor, layoutId, version);
  const db = await getDb();
  const [named] = await db
    .select({ name: savedVersions.name })
    .from(savedVersions)
    .where(and(eq(savedVersions.layoutId, layout.id), eq(savedVersions.version, version)))
    .limit(1);
  const base = baseVersion ?? (await db.select({ v: layouts.version }).from(layouts).where(eq(layouts.id, layout.id)).limit(1))[0].v;
  return saveLayout(actor, layout, base, { doc: saved.doc, name: named.name }, { restoredFrom: version });
}
