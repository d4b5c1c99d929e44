/**
 * Where a layout (or a revision) stands with its client — preliminary, issued for approval,
 * returned for changes, approved (lib/layout/drawing-issue) — as an icon and a word, never colour
 * alone (DESIGN.md "Look"). A layout saved since its latest revision reads "Approved B · changed
 * since", the last words a link to the compare view of that revision against the layout as last
 * saved. Presentation only.
 */
import Link from 'next/link';
import { CircleCheck, PencilRuler, Stamp, Undo2 } from 'lucide-react';
import { CHANGED_SINCE, ISSUE_STATE_WORD, type LayoutState } from '@/lib/layout/drawing-issue';

const LOOK: Record<LayoutState, { className: string; Icon: typeof Stamp }> = {
  draft: { className: 'border-paper-edge text-ink-soft', Icon: PencilRuler },
  sent: { className: 'border-ink-faint text-ink', Icon: Stamp },
  'changes-asked': { className: 'border-ochre bg-ochre-light text-ochre', Icon: Undo2 },
  approved: { className: 'border-moss bg-moss-light text-moss', Icon: CircleCheck },
};

/** What changed since revision `letter`: the compare view against the layout as last saved. */
export function changedSinceHref(layoutId: string, letter: string): string {
  return `/layouts/${encodeURIComponent(layoutId)}/revisions/compare?from=${encodeURIComponent(letter)}&to=current`;
}

export function LayoutStateBadge({ state, letter, changedSince }: { state: LayoutState; letter?: string | null; changedSince?: { layoutId: string } | null }) {
  const { className, Icon } = LOOK[state];
  if (changedSince && letter && state !== 'draft') {
    return (
      // Wraps between its words where the column is narrow (a phone); "changed since" stays whole.
      <span className={`inline-flex flex-wrap items-center gap-x-1 rounded-sm border px-1.5 py-0.5 text-xs font-medium ${className}`} data-state={state} data-changed-since={letter}>
        <span className="inline-flex items-center gap-1">
          <Icon size={12} aria-hidden="true" />
          {ISSUE_STATE_WORD[state]} <span className="font-mono">{letter}</span>{' ·'}
        </span>{' '}
        <Link className="whitespace-nowrap underline underline-offset-2 hover:text-copper" href={changedSinceHref(changedSince.layoutId, letter)} title={`What changed since revision ${letter}`}>
          {CHANGED_SINCE}
        </Link>
      </span>
    );
  }
  return (
    <span className={`inline-flex items-center gap-1 rounded-sm border px-1.5 py-0.5 text-xs font-medium ${className}`} data-state={state}>
      <Icon size={12} aria-hidden="true" />
      {letter && state !== 'draft' ? <span className="font-mono">{letter} ·</span> : null}
      {ISSUE_STATE_WORD[state]}
    </span>
  );
}

export function stateWord(state: LayoutState): string {
  return ISSUE_STATE_WORD[state];
}
