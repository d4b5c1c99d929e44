/**
 * Where a layout (or a revision) stands with its client — draft, sent, changes asked, approved —
 * as an icon and a word, never colour alone (DESIGN.md "Look"). Presentation only.
 */
import { CircleCheck, CircleDashed, MessageSquareWarning, Send } from 'lucide-react';
import type { LayoutState } from '@/db/sharing/revisions';

const LOOK: Record<LayoutState, { word: string; className: string; Icon: typeof Send }> = {
  draft: { word: 'Draft', className: 'border-paper-edge text-ink-soft', Icon: CircleDashed },
  sent: { word: 'Sent', className: 'border-ink-faint text-ink', Icon: Send },
  'changes-asked': { word: 'Changes asked', className: 'border-ochre bg-ochre-light text-ochre', Icon: MessageSquareWarning },
  approved: { word: 'Approved', className: 'border-moss bg-moss-light text-moss', Icon: CircleCheck },
};

export function LayoutStateBadge({ state, letter }: { state: LayoutState; letter?: string | null }) {
  const { word, className, Icon } = LOOK[state];
  return (
    <span className={`inline-flex items-center gap-1 rounded-sm border px-1.5 py-0.5 text-xs font-medium ${className}`} data-state={state}>
      <Icon size={12} aria-hidden="true" />
      {word}
      {letter && state !== 'draft' ? <span className="font-mono">· {letter}</span> : null}
    </span>
  );
}

export function stateWord(state: LayoutState): string {
  return LOOK[state].word;
}
