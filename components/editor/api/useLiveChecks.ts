'use client';
/**
 * Live checks while editing: the document goes to POST /api/checks through TanStack Query,
 * throttled (~150 ms window) and keyed by its content, so an undo back to a checked state is
 * answered from the cache. While a newer document is being checked, the last findings stay on
 * show marked stale. When the service does not answer, the state is "unavailable": findings are
 * never invented here. The document the editor opened with may come with its report from the
 * server (`initialReport`, made as the page rendered): the report itself, shown with the editor's
 * first frame, or its promise, still on the way. It is used for that document instead of asking
 * again, and when it is null (refused or failed) the editor asks.
 */
import { useEffect, useMemo, useRef, useState } from 'react';
import { keepPreviousData, useQuery } from '@tanstack/react-query';
import type { LayoutDoc } from '@/lib/layout';
import type { CheckReport } from '@/lib/checks/types';
import { ChecksRateLimited, ChecksRefused, ChecksUnavailable, postChecks } from './layoutApi';
import { contentKey } from './docKey';
import { createThrottle } from './throttle';

export const CHECKS_WINDOW_MS = 150;
/** While the check service is unreachable, ask again this often, so the panel recovers without an edit (common practice, no source). */
export const CHECKS_RECOVER_MS = 3_000;

export type ChecksStatus = 'checking' | 'ready' | 'unavailable' | 'refused';

export interface LiveChecks {
  report: CheckReport | undefined;
  status: ChecksStatus;
  /** True while the findings shown belong to an older version of the document. */
  stale: boolean;
  message?: string;
}

declare global {
  interface Window {
    /** Timings the benchmark and e2e read: ms from a document change to its findings. */
    __baywrightChecks?: { latencies: number[]; lastKey?: string };
  }
}

/** `fetchChecks` replaces POST /api/checks (a viewer link reads its own checks route). */
export function useLiveChecks(
  doc: LayoutDoc,
  fetchChecks?: (doc: LayoutDoc, signal?: AbortSignal) => Promise<CheckReport>,
  initialReport?: CheckReport | Promise<CheckReport | null> | null,
): LiveChecks {
  const [opened] = useState<{ doc: LayoutDoc; key: string }>(() => ({ doc, key: contentKey(doc) }));
  const [sent, setSent] = useState(opened);
  const changedAt = useRef(new Map<string, number>());
  const throttle = useMemo(() => createThrottle<LayoutDoc>(CHECKS_WINDOW_MS, (d) => {
    const key = contentKey(d);
    setSent((s) => (s.key === key ? s : { doc: d, key }));
  }), []);
  // Read once: the report that came in the page, for the document as opened.
  const [inPage] = useState(() => (initialReport && !('then' in initialReport) ? initialReport : undefined));
  const currentKey = useMemo(() => contentKey(doc), [doc]);

  useEffect(() => {
    if (!changedAt.current.has(currentKey)) changedAt.current.set(currentKey, performance.now());
    if (changedAt.current.size > 200) changedAt.current.delete(changedAt.current.keys().next().value as string);
    throttle.push(doc);
  }, [doc, currentKey, throttle]);
  useEffect(() => () => throttle.cancel(), [throttle]);

  const q = useQuery<CheckReport, Error>({
    queryKey: ['checks', fetchChecks ? 'own-source' : 'post', sent.key],
    queryFn: ({ signal }) => {
      const ask = () => (fetchChecks ? fetchChecks(sent.doc, signal) : postChecks(fetch, sent.doc, signal));
      // The document as opened: the server's report, when it made one. What React hands over for a
      // streamed promise is a thenable whose `then` returns nothing: Promise.resolve makes it a promise.
      if (initialReport && sent.key === opened.key) return Promise.resolve(initialReport).then((report) => report ?? ask(), ask);
      return ask();
    },
    initialData: inPage && sent.key === opened.key ? inPage : undefined,
    placeholderData: keepPreviousData,
    staleTime: Infinity,
    gcTime: 60_000,
    retry: (count, err) => err instanceof ChecksRateLimited && count < 4,
    retryDelay: (_count, err) => (err instanceof ChecksRateLimited ? err.retryAfterMs : 500),
    refetchInterval: (query) => (query.state.error instanceof ChecksUnavailable ? CHECKS_RECOVER_MS : false),
    refetchOnReconnect: true,
  });

  const shownKey = q.isPlaceholderData ? undefined : sent.key;
  useEffect(() => {
    if (!q.data || q.isPlaceholderData || typeof window === 'undefined') return;
    const t0 = changedAt.current.get(sent.key);
    const bag = (window.__baywrightChecks ??= { latencies: [] });
    if (t0 !== undefined && bag.lastKey !== sent.key) {
      bag.latencies.push(performance.now() - t0);
      if (bag.latencies.length > 1000) bag.latencies.shift();
      changedAt.current.delete(sent.key);
    }
    bag.lastKey = sent.key;
  }, [q.data, q.isPlaceholderData, sent.key]);

  const stale = !!q.data && (shownKey !== currentKey);
  if (q.error && !q.data) {
    const e = q.error;
    if (e instanceof ChecksRefused) return { report: undefined, status: 'refused', stale: false, message: e.message };
    if (e instanceof ChecksUnavailable || e instanceof ChecksRateLimited) return { report: undefined, status: 'unavailable', stale: false, message: e.message };
    return { report: undefined, status: 'unavailable', stale: false, message: 'Checks are not available right now.' };
  }
  if (q.error && q.data) return { report: q.data, status: 'unavailable', stale: true, message: q.error.message };
  return { report: q.data, status: q.isFetching || stale ? 'checking' : 'ready', stale };
}
