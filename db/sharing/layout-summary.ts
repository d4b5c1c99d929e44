/**
 * What the layouts table shows about working with the client, per layout: its state (from the
 * latest revision: draft, sent, changes asked, approved), that revision's letter, whether the
 * layout has been saved since that revision froze it ("Approved B · changed since"), and how many
 * comment threads are still open. Two queries for the whole list, never one per row.
 * Callers have already checked that the actor may see these layouts.
 */
import 'server-only';
import { openThreadCounts } from './comments';
import { layoutStates, type LayoutState } from './revisions';

export interface LayoutSharingSummary {
  state: LayoutState;
  latestRevision: string | null;
  /** Saved since the latest revision was issued: the next revision's preliminary is under way. */
  changedSince: boolean;
  openComments: number;
}

export async function sharingSummaries(layouts: { id: string; version: number }[]): Promise<Map<string, LayoutSharingSummary>> {
  const layoutIds = layouts.map((l) => l.id);
  const [states, counts] = await Promise.all([layoutStates(layoutIds), openThreadCounts(layoutIds)]);
  return new Map(layouts.map(({ id, version }) => {
    const s = states.get(id);
    return [id, {
      state: s?.state ?? 'draft',
      latestRevision: s?.latest ?? null,
      changedSince: s?.latestVersion != null && version > s.latestVersion,
      openComments: counts.get(id) ?? 0,
    }];
  }));
}
