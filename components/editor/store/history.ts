/**
 * Undo history: one entry per gesture (a drag, a resize, a burst of nudges, one form edit).
 * An entry keeps the whole document before and after (documents are immutable, so this shares
 * structure and costs little). Pure data functions; must never hold Konva nodes or DOM objects.
 */
import type { LayoutDoc } from '@/lib/layout';

export interface HistoryEntry {
  label: string;
  before: LayoutDoc;
  after: LayoutDoc;
  selectionBefore: string[];
  selectionAfter: string[];
  /** The opening selected before and after (windows, roof openings and body points are selected on their own). */
  openingBefore?: string | null;
  openingAfter?: string | null;
  /** Entries with the same key within the burst window merge (arrow-key nudges). */
  mergeKey?: string;
  at: number;
}

export interface History {
  past: HistoryEntry[];
  future: HistoryEntry[];
}

export const HISTORY_LIMIT = 200;
/** Nudges closer together than this collapse into one entry (common practice in editors). */
export const BURST_MS = 1000;

export const emptyHistory = (): History => ({ past: [], future: [] });

export function pushEntry(h: History, entry: HistoryEntry): History {
  const last = h.past[h.past.length - 1];
  if (entry.mergeKey && last && last.mergeKey === entry.mergeKey && entry.at - last.at <= BURST_MS) {
    const merged: HistoryEntry = { ...last, after: entry.after, selectionAfter: entry.selectionAfter, openingAfter: entry.openingAfter, at: entry.at };
    return { past: [...h.past.slice(0, -1), merged], future: [] };
  }
  const past = [...h.past, entry];
  return { past: past.length > HISTORY_LIMIT ? past.slice(past.length - HISTORY_LIMIT) : past, future: [] };
}
