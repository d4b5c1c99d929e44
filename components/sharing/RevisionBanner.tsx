'use client';
/**
 * The strip above the plan that says which copy of the layout is on show and where it stands
 * with its issued revisions (db/sharing/issued, `GET …/revisions/standing`):
 * - the workshop, editing: once the layout has been saved since its latest revision, "Approved B ·
 *   changed since" — these edits are the next revision's preliminary; revision B stays frozen —
 *   with what changed (the compare view) and the frozen revision's sheet;
 * - anyone looking at a frozen revision (the client by default, or `?revision=B`): which revision,
 *   its state, and a way to the layout as last saved when it has moved on.
 * Rendered inside the editor (the saved version comes from its store). Shows words only; changes nothing.
 */
import Link from 'next/link';
import { useQuery } from '@tanstack/react-query';
import { useShallow } from 'zustand/react/shallow';
import { FileText, History, Info } from 'lucide-react';
import { apiFetch } from '@/lib/api/client-fetch';
import { useEditor } from '@/components/editor/store/EditorStoreContext';
import { CHANGED_SINCE, ISSUE_STATE_WORD, nextRevisionLetter, PRELIMINARY_CHOICE, type RevisionState } from '@/lib/layout/drawing-issue';
import type { IssueStandingDto } from '@/db/sharing/issued';
import { changedSinceHref } from './LayoutStateBadge';

/** Another tab may issue a revision or a client approve one: asked again this often (common practice, no source). */
const STANDING_POLL_MS = 30_000;

export interface RevisionOnShow {
  letter: string;
  state: RevisionState;
}

export function RevisionBanner({ layoutId, onShow, canEdit }: { layoutId: string; onShow: RevisionOnShow | null; canEdit: boolean }) {
  const { version } = useEditor(useShallow((s) => ({ version: s.version })));
  const standing = useQuery({
    queryKey: ['standing', layoutId],
    queryFn: () => apiFetch<IssueStandingDto>(`/api/layouts/${encodeURIComponent(layoutId)}/revisions/standing`),
    refetchInterval: STANDING_POLL_MS,
  });
  const s = standing.data;
  if (!s) return null;
  const base = `/layouts/${encodeURIComponent(layoutId)}`;

  if (onShow) {
    const movedOn = s.layoutVersion > (s.revisions.find((r) => r.letter === onShow.letter)?.layoutVersion ?? Infinity);
    return (
      <div role="note" className="flex flex-wrap items-center gap-x-3 gap-y-1 border-b border-paper-edge bg-paper-deep px-4 py-1.5 text-sm" data-testid="revision-banner" data-on-show={onShow.letter}>
        <Info size={14} aria-hidden="true" className="text-ink-soft" />
        <span>
          You are looking at revision <span className="font-mono font-semibold">{onShow.letter}</span> · {ISSUE_STATE_WORD[onShow.state]}, as issued (frozen).
          {movedOn ? ' The workshop has changed the layout since; those changes are not issued yet.' : ''}
        </span>
        {movedOn && <Link className="text-copper underline" href={changedSinceHref(layoutId, onShow.letter)}>What changed since {onShow.letter}</Link>}
        {movedOn && <Link className="text-copper underline" href={`${base}?revision=${PRELIMINARY_CHOICE}`}>See the preliminary layout</Link>}
      </div>
    );
  }

  const latest = s.latest;
  if (!latest) return null;
  if (!canEdit) {
    return (
      <div role="note" className="flex flex-wrap items-center gap-x-3 gap-y-1 border-b border-ochre bg-ochre-light px-4 py-1.5 text-sm text-ink" data-testid="revision-banner" data-on-show="preliminary">
        <Info size={14} aria-hidden="true" className="text-ochre" />
        <span>You are looking at the preliminary layout, as last saved: it has not been issued and may still change.</span>
        <Link className="text-copper underline" href={`${base}?revision=${s.clientRevision ?? latest.letter}`}>Back to revision {s.clientRevision ?? latest.letter}</Link>
      </div>
    );
  }
  // The store's saved version moves with every autosave; the standing query may be older.
  const changed = Math.max(version, s.layoutVersion) > latest.layoutVersion;
  if (!changed) return null;
  return (
    <div role="status" className="flex flex-wrap items-center gap-x-3 gap-y-1 border-b border-ochre bg-ochre-light px-4 py-1.5 text-sm text-ink" data-testid="revision-banner" data-changed-since={latest.letter}>
      <History size={14} aria-hidden="true" className="text-ochre" />
      <span>
        <span className="font-semibold">{ISSUE_STATE_WORD[latest.state]} <span className="font-mono">{latest.letter}</span> · {CHANGED_SINCE}</span>
        {' '}— these changes are the preliminary of revision <span className="font-mono">{nextRevisionLetter(latest.letter)}</span>. Revision {latest.letter} stays as issued
        {s.clientRevision ? `, and it is what the client sees until the next revision is issued` : ''}.
      </span>
      <Link className="text-copper underline" href={changedSinceHref(layoutId, latest.letter)}>What changed</Link>
      <Link className="inline-flex items-center gap-1 text-copper underline" href={`${base}?revision=${latest.letter}`}>Open revision {latest.letter}</Link>
      <Link className="inline-flex items-center gap-1 text-copper underline" href={`${base}/sheet?revision=${latest.letter}`}><FileText size={12} aria-hidden="true" />Its plan sheet</Link>
    </div>
  );
}
