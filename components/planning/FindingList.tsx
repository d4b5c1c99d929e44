'use client';
/**
 * The findings of one build-planning topic, each with its status as an icon and a word (never
 * colour alone), what was measured against what was needed, the message and its source.
 * Shows what the check engine said; never judges anything itself.
 */
import { CircleAlert, CircleCheck, CircleX } from 'lucide-react';
import type { Finding } from '@/lib/checks/types';

const STATUS = {
  pass: { word: 'Pass', Icon: CircleCheck, tone: 'text-moss', bg: 'bg-moss-light' },
  warn: { word: 'Warn', Icon: CircleAlert, tone: 'text-ochre', bg: 'bg-ochre-light' },
  fail: { word: 'Fail', Icon: CircleX, tone: 'text-brick', bg: 'bg-brick-light' },
} as const;

function amount(n: number | undefined): string {
  if (n === undefined) return '';
  return Math.abs(n) >= 100 ? Math.round(n).toLocaleString('en-GB') : String(Math.round(n * 100) / 100);
}

export function FindingList({ findings, empty = 'Nothing to check here yet.', testId }: { findings: Finding[]; empty?: string; testId?: string }) {
  if (!findings.length) return <p className="text-sm text-ink-soft">{empty}</p>;
  return (
    <ul className="space-y-2" data-testid={testId}>
      {findings.map((f, i) => {
        const s = STATUS[f.status];
        return (
          <li key={`${f.id}-${i}`} className={`rounded-sm border border-paper-edge p-2 text-sm ${f.status === 'pass' ? 'bg-paper' : s.bg}`} data-finding={f.id} data-status={f.status}>
            <div className="flex items-start gap-2">
              <span className={`mt-0.5 inline-flex shrink-0 items-center gap-1 text-xs font-semibold ${s.tone}`}>
                <s.Icon size={14} aria-hidden="true" />
                {s.word}
              </span>
              <div className="min-w-0 flex-1">
                <p>{f.message}</p>
                <p className="mt-1 flex flex-wrap gap-x-3 text-xs text-ink-soft">
                  {f.measured !== undefined && (
                    <span className="font-mono">
                      {amount(f.measured)}{f.required !== undefined ? ` / ${amount(f.required)}` : ''} {f.unit}
                    </span>
                  )}
                  {f.source && <span>Source: {f.source}</span>}
                </p>
              </div>
            </div>
          </li>
        );
      })}
    </ul>
  );
}

/** Findings of a topic: ids starting with one of the prefixes (`mass.`, `power.`…). */
export function findingsOf(findings: Finding[], ...prefixes: string[]): Finding[] {
  return findings.filter((f) => prefixes.some((p) => f.id.startsWith(p)));
}
