/**
 * What the layouts table shows about working with the client, per layout: its state (from the
 * latest revision: draft, sent, changes asked, approved), that revision's letter, and how many
 * comment threads are still open. Two queries for the whole list, never one per row.
 * Callers have already checked that the actor may see these layouts.
 */
import 'server-only';
import { openThreadCounts } from './comments';
import { layoutStates, type LayoutState } from './revisions';

export interface LayoutSharingSummary {
  state: LayoutState;
  latestRevision: string | null;
  openComments: number;
}

export async function sharingSummaries(layoutIds: string[]): Promise<Map<string, LayoutSharingSummary>> {
  const [states, counts] = await Promise.all([layoutStates(layoutIds), openThreadCounts(layoutIds)]);
  return new Map(layoutIds.map((id) => [id, {
    state: states.get(id)?.state ?? 'draft',
    latestRevision: states.get(id)?.latest ?? null,
    openComments: counts.get(id) ?? 0,
  }]));
}
