'use client';
/**
 * A viewer link in the browser: the plan in the editor's read-only mode (arrangement switch,
 * dimensions, side section, Checks) with a slim header naming the studio and what the link
 * shows. A live link asks once a second whether the workshop has saved and, if so, loads the new
 * document (so a designer and a client on a call see the same plan within about 2 s); any link
 * learns within seconds that it was withdrawn or has expired. The safety caution stays in view. Reads only /api/v/[token]/…
 * Must never show edit controls, other layouts or anyone's address.
 */
import { useCallback, useEffect, useMemo, useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { Eye, Radio } from 'lucide-react';
import { ISSUE_STATE_WORD } from '@/lib/layout/drawing-issue';
import { ONE_LINE_CAUTION } from '@/lib/layout/cautions';
import { CautionNote } from '@/components/ui/CautionNote';
import { LayoutStateBadge } from './LayoutStateBadge';
import { RevisionMarkIcon } from './RevisionMarkIcon';
import { EditorLoader } from '@/components/editor/EditorLoader';
import { ApiError, apiFetch } from '@/lib/api/client-fetch';
import type { CheckReport } from '@/lib/checks/types';
import type { ViewerContent } from '@/db/sharing/viewer-links';
import { Wordmark } from '@/components/ui/Wordmark';
import { ViewerGone } from './ViewerGone';
import { formatDateTime } from '@/lib/format';

export type ViewerContentDto = Omit<ViewerContent, 'checkDefaults'>;

/** Live links poll this often; revision links only to learn of withdrawal (common practice, no source). */
export const LIVE_POLL_MS = 1000;
const FROZEN_POLL_MS = 15_000;


type Gone = { status: 'revoked' | 'expired' | 'unknown'; at: string | null };

/** A 404 or 410 from a viewer route means the link no longer works; anything else is passing trouble. */
function goneFrom(err: unknown): Gone | null {
  if (!(err instanceof ApiError) || (err.status !== 404 && err.status !== 410)) return null;
  const status = err.body.status;
  return { status: status === 'revoked' || status === 'expired' ? status : 'unknown', at: null };
}

/**
 * `preview`: the plan drawn by the server, shown until the drawing runs (see EditorLoader);
 * `initialChecks`: the report of the document shown, begun by the server as the page rendered.
 */
export function ViewerScreen({ token, initial, preview = null, initialChecks = null }: { token: string; initial: ViewerContentDto; preview?: string | null; initialChecks?: CheckReport | Promise<CheckReport | null> | null }) {
  const [content, setContent] = useState(initial);
  const [fetchGone, setFetchGone] = useState<Gone | null>(null);
  const base = `/api/v/${encodeURIComponent(token)}`;
  const live = content.kind === 'live';

  const poll = useQuery({
    queryKey: ['viewer-version', token],
    queryFn: () => apiFetch<{ version: number; updatedAt: string }>(`${base}/version`),
    // Once the link is gone there is nothing more to ask.
    refetchInterval: (q) => (goneFrom(q.state.error) ? false : live ? LIVE_POLL_MS : FROZEN_POLL_MS),
    refetchIntervalInBackground: false,
    retry: false,
    staleTime: 0,
  });
  const gone = goneFrom(poll.error) ?? fetchGone;

  const polled = poll.data?.version;
  useEffect(() => {
    if (polled === undefined || polled === content.version) return;
    let cancelled = false;
    apiFetch<ViewerContentDto>(base)
      .then((next) => { if (!cancelled) setContent(next); })
      .catch((err) => {
        if (!cancelled) setFetchGone(goneFrom(err));
      });
    return () => { cancelled = true; };
  }, [polled, content.version, base]);

  const fetchChecks = useCallback((_doc: unknown, signal?: AbortSignal) => apiFetch<CheckReport>(`${base}/checks`, { signal }), [base]);
  const extensions = useMemo(() => ({ fetchChecks, incoming: { doc: content.doc, version: content.version } }), [fetchChecks, content.doc, content.version]);

  if (gone) return <ViewerGone status={gone.status} at={gone.at} />;

  const badge = live && content.revision ? (
    <span className="inline-flex items-center gap-2 text-xs" data-testid="viewer-kind" data-revision={content.revision.letter}>
      <span className="inline-flex items-center gap-1"><RevisionMarkIcon letter={content.revision.letter} /> Revision {content.revision.letter}, issued {formatDateTime(content.revision.issuedAt)}</span>
      <LayoutStateBadge state={content.revision.state} />
      <span className="text-ink-soft">· follows the workshop’s issued revisions</span>
    </span>
  ) : live ? (
    <span className="inline-flex items-center gap-1 rounded-sm border border-moss bg-moss-light px-1.5 py-0.5 text-xs text-moss" data-testid="viewer-kind">
      <Radio size={12} aria-hidden="true" /> {ISSUE_STATE_WORD.draft}: follows the workshop’s saves
    </span>
  ) : (
    <span className="inline-flex items-center gap-2 text-xs" data-testid="viewer-kind">
      <span className="inline-flex items-center gap-1"><RevisionMarkIcon letter={content.revision?.letter ?? '?'} /> Revision {content.revision?.letter}, issued {content.revision ? formatDateTime(content.revision.issuedAt) : ''}</span>
      {content.revision && <LayoutStateBadge state={content.revision.state} />}
    </span>
  );

  return (
    <div className="flex h-screen flex-col" data-testid="viewer" data-version={content.version}>
      <header className="flex h-12 shrink-0 items-center gap-4 border-b border-paper-edge bg-paper px-4">
        <Wordmark />
        <span className="text-sm text-ink-soft">{content.studioName}</span>
        <span className="truncate text-sm font-medium">{content.layoutName}</span>
        {badge}
        <span className="ml-auto inline-flex items-center gap-1 text-xs text-ink-soft"><Eye size={12} aria-hidden="true" /> View only{content.expiresAt ? ` · link works until ${formatDateTime(content.expiresAt)}` : ''}</span>
      </header>
      {content.revision?.note && <p className="shrink-0 border-b border-paper-edge bg-paper-deep px-4 py-1.5 text-sm">{content.revision.note}</p>}
      <div className="shrink-0 border-b border-paper-edge px-4 py-1.5"><CautionNote compact testId="viewer-caution">{ONE_LINE_CAUTION}</CautionNote></div>
      <div className="min-h-0 flex-1">
        <EditorLoader
          layoutId="viewer-link"
          initialDoc={initial.doc}
          initialVersion={initial.version}
          canEdit={false}
          units={content.units}
          extensions={extensions}
          preview={preview}
          initialChecks={initialChecks}
        />
      </div>
    </div>
  );
}
