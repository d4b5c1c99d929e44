'use client';
/**
 * The findings of one build-planning topic, each with its status as an icon and a word (never
 * colour alone), the rule's plain name, what was measured against what was needed, the message
 * and its source behind a disclosure. Findings waiting for inputs fold into one "Not yet checked"
 * line after the rest, each input a button to the tab where it is entered.
 * Shows what the check engine said; never judges anything itself.
 */
import { createContext, useContext } from 'react';
import type { Finding } from '@/lib/checks/types';
import { STATUS_ORDER, foldWaiting, ruleName } from '@/lib/checks/words';
import { formatNumber } from '@/lib/format';
import { NotYetChecked, SourceDisclosure, STATUS_LOOK, StatusBadge } from '@/components/checks/FindingParts';
import type { BuildTab } from './buildTabs';

/** Lets a "needs" entry switch the build plan's tab without leaving the page (and its draft). */
export const ShowTabContext = createContext<((tab: BuildTab) => void) | null>(null);

function amount(n: number | undefined): string {
  if (n === undefined) return '';
  return formatNumber(n, Math.abs(n) >= 100 ? 0 : 2);
}

export function FindingList({ findings, empty = 'Nothing to check here yet.', testId }: { findings: Finding[]; empty?: string; testId?: string }) {
  const showTab = useContext(ShowTabContext);
  if (!findings.length) return <p className="text-sm text-ink-soft">{empty}</p>;
  const { judged, needs } = foldWaiting(findings);
  const sorted = [...judged].sort((a, b) => STATUS_ORDER.indexOf(a.status) - STATUS_ORDER.indexOf(b.status));
  return (
    <div className="space-y-2" data-testid={testId}>
      <ul className="space-y-2">
        {sorted.map((f, i) => (
          <li key={`${f.id}-${i}`} className={`rounded-sm border border-paper-edge p-2 text-sm ${f.status === 'pass' ? 'bg-paper' : STATUS_LOOK[f.status].tint}`} data-finding={f.id} data-status={f.status}>
            <div className="flex items-start gap-2">
              <span className="mt-0.5"><StatusBadge status={f.status} size={14} /></span>
              <div className="min-w-0 flex-1">
                <p className="text-xs font-semibold">{ruleName(f.id)}</p>
                <p>{f.message}</p>
                {f.measured !== undefined && (
                  <p className="mt-1 font-mono text-xs text-ink-soft">
                    {amount(f.measured)}{f.required !== undefined ? ` / ${amount(f.required)}` : ''} {f.unit}
                  </p>
                )}
                <SourceDisclosure source={f.source} />
              </div>
            </div>
          </li>
        ))}
      </ul>
      <NotYetChecked
        needs={needs}
        linkFor={showTab ? (n, text) => (n.where === 'editor' ? text : <button type="button" className="text-copper underline" onClick={() => showTab(n.where as BuildTab)}>{text}</button>) : undefined}
      />
    </div>
  );
}

/** Findings of a topic: ids starting with one of the prefixes (`mass.`, `power.`…). */
export function findingsOf(findings: Finding[], ...prefixes: string[]): Finding[] {
  return findings.filter((f) => prefixes.some((p) => f.id.startsWith(p)));
}
