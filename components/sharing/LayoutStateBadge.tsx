/**
 * Where a layout (or a revision) stands with its client — preliminary, issued for approval,
 * returned for changes, approved (lib/layout/drawing-issue) — as an icon and a word, never colour
 * alone (DESIGN.md "Look"). Presentation only.
 */
import { CircleCheck, PencilRuler, Stamp, Undo2 } from 'lucide-react';
import { ISSUE_STATE_WORD, type LayoutState } from '@/lib/layout/drawing-issue';

const LOOK: Record<LayoutState, { className: string; Icon: typeof Stamp }> = {
  draft: { className: 'border-paper-edge text-ink-soft', Icon: PencilRuler },
  sent: { className: 'border-ink-faint text-ink', Icon: Stamp },
  'changes-asked': { className: 'border-ochre bg-ochre-light text-ochre', Icon: Undo2 },
  approved: { className: 'border-moss bg-moss-light text-moss', Icon: CircleCheck },
};

export function LayoutStateBadge({ state, letter }: { state: LayoutState; letter?: string | null }) {
  const { className, Icon } = LOOK[state];
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
