/**
 * Keeping a save: the one place that writes `saved_versions`, called by every save of a layout
 * document inside its transaction (db/layouts.ts). Bounded per layout: the last
 * `SAVED_VERSIONS_KEPT` saves, plus every save an issued revision was frozen from.
 */
import 'server-only';
import { and, eq, lte, notInArray } from 'drizzle-orm';
import type { Db } from './client';
import { revisions, savedVersions } from './schema';
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

