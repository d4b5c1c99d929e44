/**
 * Keeping a save: the one place that writes `saved_versions`. A new layout records its first
 * save inside its creating transaction (`recordSave`); every later save of a layout document is
 * one statement that saves and keeps it (`saveOverVersion`). Bounded per layout: the last
 * `SAVED_VERSIONS_KEPT` saves, plus every save an issued revision was frozen from.
 */
import 'server-only';
import { and, eq, lte, notInArray, sql } from 'drizzle-orm';
import type { Db } from './client';
import { layouts, revisions, savedVersions } from './schema';
import type { LayoutDoc } from '../lib/layout/schema';

type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];

/** How many of a layout's latest saves are kept (saves an issued revision points to are kept besides). */
export const SAVED_VERSIONS_KEPT = 50;

/**
 * Keeps the document a save produced and lets the oldest saves go beyond the bound — except those
 * a revision was issued from. Two indexed statements per save, whatever the history's length.
 */
export async function recordSave(
  tx: Tx | Db,
  save: { layoutId: string; version: number; name: string; doc: LayoutDoc; savedBy: string; restoredFrom?: number },
): Promise<void> {
  await tx
    .insert(savedVersions)
    .values({ layoutId: save.layoutId, version: save.version, name: save.name, doc: save.doc, savedBy: save.savedBy, restoredFrom: save.restoredFrom ?? null })
    .onConflictDoNothing();
  const issued = tx.select({ v: revisions.layoutVersion }).from(revisions).where(eq(revisions.layoutId, save.layoutId));
  await tx
    .delete(savedVersions)
    .where(and(eq(savedVersions.layoutId, save.layoutId), lte(savedVersions.version, save.version - SAVED_VERSIONS_KEPT), notInArray(savedVersions.version, issued)));
}

export interface SavedRow {
  id: string;
  name: string;
  version: number;
  updatedAt: Date;
}

/**
 * Saves `doc` over version `baseVersion` of a studio's layout and keeps the save, in one
 * statement: the compare-and-set UPDATE, the saved version it leaves and the trimming of the
 * oldest (data-modifying CTEs), so all of it lands or none does without a transaction. The
 * embedded database serves one transaction at a time, and a BEGIN … COMMIT of four statements
 * held it for five round trips between the threads; one statement holds it for one. Undefined:
 * the layout is not at `baseVersion` (someone saved first) or not the studio's.
 */
export async function saveOverVersion(
  db: Db,
  save: { layoutId: string; studioId: string; baseVersion: number; name: string; doc: LayoutDoc; clientId?: string | null; savedBy: string; restoredFrom?: number },
): Promise<SavedRow | undefined> {
  const client = save.clientId !== undefined ? sql`client_id = ${save.clientId},` : sql``;
  const result = (await db.execute(sql`
    with saved as (
      update ${layouts}
      set doc = ${JSON.stringify(save.doc)}::jsonb, name = ${save.name}, ${client}
          version = ${layouts.version} + 1, updated_by = ${save.savedBy}, updated_at = now()
      where ${layouts.id} = ${save.layoutId} and ${layouts.studioId} = ${save.studioId} and ${layouts.version} = ${save.baseVersion}
      returning id, name, version, updated_at, doc
    ), kept as (
      insert into ${savedVersions} (layout_id, version, name, doc, saved_by, restored_from)
      select id, version, name, doc, ${save.savedBy}::uuid, ${save.restoredFrom ?? null}::integer from saved
      on conflict do nothing
    ), trimmed as (
      delete from ${savedVersions}
      where layout_id = (select id from saved)
        and version <= (select version from saved) - ${SAVED_VERSIONS_KEPT}
        and version not in (select layout_version from ${revisions} where layout_id = (select id from saved))
    )
    select id, name, version, updated_at from saved`)) as { rows: { id: string; name: string; version: number; updated_at: Date | string }[] };
  const [row] = result.rows;
  return row && { id: row.id, name: row.name, version: Number(row.version), updatedAt: new Date(row.updated_at) };
}
