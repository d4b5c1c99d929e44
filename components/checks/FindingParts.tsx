'use client';
/**
 * The pieces every list of findings is made of, so the editor's Checks, the build plan, the
 * viewer and the compare view read alike: the status as an icon and a word (never colour
 * alone), the rule's plain name, the source behind a small disclosure, and the one
 * "Not yet checked — needs: …" line whose inputs link to where they are entered.
 * Words come from `lib/checks/words`; this file must never print a rule id or a status id.
 */
import type { ReactNode } from 'react';
import { CircleAlert, CircleCheck, CircleDashed, CircleX } from 'lucide-react';
import type { FindingNeed, FindingStatus } from '@/lib/checks/types';
import { NEED_PLACES, NOT_YET_CHECKED, STATUS_WORDS } from '@/lib/checks/words';

export const STATUS_LOOK: Record<FindingStatus, { Icon: typeof CircleCheck; badge: string; tone: string; tint: string }> = {
  // Words in ink on the light status tint (contrast); the icon carries the status colour.
  fail: { Icon: CircleX, badge: 'text-ink bg-brick-light [&>svg]:text-brick', tone: 'text-brick', tint: 'bg-brick-light' },
  warn: { Icon: CircleAlert, badge: 'text-ink bg-ochre-light [&>svg]:text-ochre', tone: 'text-ochre', tint: 'bg-ochre-light' },
  pass: { Icon: CircleCheck, badge: 'text-ink bg-moss-light [&>svg]:text-moss', tone: 'text-moss', tint: 'bg-moss-light' },
};

/** Icon and word on the status tint. */
export function StatusBadge({ status, size = 12 }: { status: FindingStatus; size?: number }) {
  const look = STATUS_LOOK[status];
  return (
    <span className={`inline-flex shrink-0 items-center gap-1 whitespace-nowrap rounded px-1.5 text-xs font-medium ${look.badge}`}>
      <look.Icon size={size} aria-hidden /> {STATUS_WORDS[status].word}
    </span>
  );
}

/** Icon and word in the status colour, for running text ("Meets → Does not meet"). */
export function StatusInline({ status }: { status: FindingStatus }) {
  const look = STATUS_LOOK[status];
  return <span className={`inline-flex items-center gap-1 ${look.tone}`}><look.Icon size={12} aria-hidden="true" />{STATUS_WORDS[status].word}</span>;
}

/** The source line, folded away on screen so the list reads as short sentences. */
export function SourceDisclosure({ source }: { source?: string }) {
  if (!source) return null;
  return (
    <details className="mt-0.5 text-[11px] text-ink-soft" onClick={(e) => e.stopPropagation()}>
      <summary className="cursor-pointer select-none hover:text-ink">Source</summary>
      <p className="mt-0.5">{source}</p>
    </details>
  );
}

/**
 * "Not yet checked — needs: a, b, c": each input names the tab it is entered on. `linkFor` turns
 * a place into a link or a button; without it the places are only named.
 */
export function NotYetChecked({ needs, linkFor }: { needs: FindingNeed[]; linkFor?: (need: FindingNeed, label: ReactNode) => ReactNode }) {
  if (needs.length === 0) return null;
  return (
    <div className="flex items-start gap-2 rounded border border-dashed border-paper-edge px-2 py-1.5 text-sm" data-testid="not-yet-checked">
      <span className="mt-0.5 inline-flex shrink-0 items-center gap-1 whitespace-nowrap rounded bg-paper-deep px-1.5 text-xs font-medium text-ink">
        <CircleDashed size={12} aria-hidden /> {NOT_YET_CHECKED}
      </span>
      <span className="min-w-0 text-ink">
        needs:{' '}
        {needs.map((n, i) => {
          const text = <>{n.label}<span className="text-ink-soft"> ({NEED_PLACES[n.where]})</span></>;
          return <span key={`${n.where}-${n.label}`}>{i > 0 && ', '}{linkFor ? linkFor(n, text) : text}</span>;
        })}
      </span>
    </div>
  );
}
