/**
 * Save on leave: when a screen that edits a layout (the editor, the build plan) goes away with an
 * edit not yet saved — the browser's back button, a link, any navigation inside the app — the edit
 * is sent at once rather than dropped with the autosave timer. The request goes with `keepalive`
 * (it outlives the page) when the body fits the browser's 64 KiB keepalive allowance (Fetch
 * standard, "keepalive" body limit), and as an ordinary request otherwise (the app stays loaded on a
 * navigation inside it). The screen that opens next waits for it (`pendingFlush`) before it reads
 * the saved version, so it never shows the copy from before. Never saves read-only or over a
 * conflict: the caller (useAutosave) decides whether saving may go on.
 */
import type { EditorStore } from '../store/editorStore';
import { isDirty } from '../store/editorStore';
import { saveLayout, type FetchLike, type SaveResult } from './layoutApi';

/** The Fetch standard's cap on the bodies of keepalive requests in flight: 64 KiB. */
export const KEEPALIVE_BODY_LIMIT = 64 * 1024;

const pending = new Map<string, Promise<SaveResult>>();

/** The fetch the flush uses: `keepalive` when the body fits the allowance. */
export function keepaliveFetch(fetchFn: FetchLike): FetchLike {
  return (input, init) => {
    const size = typeof init?.body === 'string' ? new TextEncoder().encode(init.body).length : Infinity;
    return fetchFn(input, { ...init, keepalive: size <= KEEPALIVE_BODY_LIMIT });
  };
}

/** Sends the store's unsaved edit now; nothing when it has none. The save marks the store saved, as autosave would. */
export function flushOnLeave(api: EditorStore, layoutId: string, fetchFn: FetchLike): Promise<SaveResult> | null {
  const s = api.getState();
  if (s.readOnly || !isDirty(s)) return null;
  const doc = s.doc;
  const saving = saveLayout(keepaliveFetch(fetchFn), layoutId, doc, s.version).then((r) => {
    if (r.kind === 'saved') api.getState().markSaved(doc, r.version);
    return r;
  });
  pending.set(layoutId, saving);
  void saving.finally(() => {
    if (pending.get(layoutId) === saving) pending.delete(layoutId);
  });
  return saving;
}

/** A save on leave still under way for this layout (the next screen waits for it before reading). */
export function pendingFlush(layoutId: string): Promise<SaveResult> | undefined {
  return pending.get(layoutId);
}
