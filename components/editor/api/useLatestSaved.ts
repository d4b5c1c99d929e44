'use client';
/**
 * The layout's latest saved version and when it was saved, for the build plan's header and the
 * save indicator: the version is the editor store's (the one every save on this screen moves, as
 * the indicator shows it), checked against the server when the screen opens and whenever the
 * window comes back into view — GET /api/layouts/:id with If-None-Match, answered 304 with no body
 * while nothing changed. A page the browser brings back from its cache (the back button) or a tab
 * left open while someone saved elsewhere would otherwise show, and then edit, an older copy: a
 * newer saved copy replaces the store's document when nothing here is unsaved; with unsaved edits
 * here it is left to the next save, which meets it as a conflict (the conflict dialog). Never saves.
 */
import { useCallback, useEffect, useRef, useState } from 'react';
import { useStore } from 'zustand';
import type { LayoutDoc } from '@/lib/layout';
import type { EditorStore } from '../store/editorStore';
import { isDirty } from '../store/editorStore';
import type { FetchLike } from './layoutApi';
import { pendingFlush } from './leaveFlush';

export interface LatestSaved {
  version: number;
  /** ISO time of that save, when known. */
  savedAt: string | null;
}

export type Revalidation =
  | { kind: 'unchanged' }
  /** The server has a newer save, and it now is the store's document. */
  | { kind: 'replaced'; version: number; savedAt: string | null }
  /** The server has a newer save, but this screen has unsaved edits: the next save meets it as a conflict. */
  | { kind: 'newer-elsewhere'; version: number }
  | { kind: 'failed' };

/** One revalidation: asks the server for the layout unless it is still at the store's version. */
export async function revalidateSaved(api: EditorStore, layoutId: string, fetchFn: FetchLike): Promise<Revalidation> {
  // A save on leave from the screen before this one goes first, so it is what we read.
  await pendingFlush(layoutId)?.catch(() => undefined);
  let res: Response;
  try {
    res = await fetchFn(`/api/layouts/${encodeURIComponent(layoutId)}`, { headers: { 'if-none-match': `"${api.getState().version}"` }, cache: 'no-store' });
  } catch {
    return { kind: 'failed' };
  }
  if (res.status === 304) return { kind: 'unchanged' };
  if (!res.ok) return { kind: 'failed' };
  let body: { version?: unknown; doc?: unknown; updatedAt?: unknown };
  try {
    body = await res.json();
  } catch {
    return { kind: 'failed' };
  }
  const version = Number(body.version);
  if (!Number.isInteger(version) || !body.doc || typeof body.doc !== 'object') return { kind: 'failed' };
  const s = api.getState();
  // A save from here landed meanwhile: ours is as new.
  if (version <= s.version) return { kind: 'unchanged' };
  if (isDirty(s) || s.gesture) return { kind: 'newer-elsewhere', version };
  s.replaceDoc(body.doc as LayoutDoc, version);
  return { kind: 'replaced', version, savedAt: typeof body.updatedAt === 'string' ? body.updatedAt : null };
}

export function useLatestSaved(api: EditorStore, layoutId: string, options: { initialSavedAt?: string | null; enabled?: boolean; fetchFn?: FetchLike } = {}): LatestSaved {
  const { enabled = true, fetchFn = fetch } = options;
  const version = useStore(api, (s) => s.version);
  const [savedAt, setSavedAt] = useState<string | null>(options.initialSavedAt ?? null);
  const busy = useRef(false);

  // A save made here: the version moved just now.
  useEffect(() => api.subscribe((s, prev) => {
    if (s.version !== prev.version) setSavedAt(new Date().toISOString());
  }), [api]);

  const revalidate = useCallback(async () => {
    if (busy.current) return;
    busy.current = true;
    try {
      const r = await revalidateSaved(api, layoutId, fetchFn);
      if (r.kind === 'replaced') setSavedAt(r.savedAt);
    } finally {
      busy.current = false;
    }
  }, [api, layoutId, fetchFn]);

  useEffect(() => {
    if (!enabled) return;
    void revalidate();
    const onShow = () => {
      if (document.visibilityState === 'visible') void revalidate();
    };
    window.addEventListener('focus', onShow);
    window.addEventListener('pageshow', onShow);
    document.addEventListener('visibilitychange', onShow);
    return () => {
      window.removeEventListener('focus', onShow);
      window.removeEventListener('pageshow', onShow);
      document.removeEventListener('visibilitychange', onShow);
    };
  }, [enabled, revalidate]);

  return { version, savedAt };
}
