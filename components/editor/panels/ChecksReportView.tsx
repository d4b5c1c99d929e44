'use client';
/**
 * What the Checks panel shows, from props alone: findings from the server grouped by arrangement
 * and status, each with what was measured, what is required and where the rule comes from; a
 * "checking…" line while the server works; findings from an older document marked out of date;
 * a plain word when the check service is unavailable. Never computes or invents a finding.
 *
 * Two users: the editor's Checks panel (ChecksPanel, which adds the store: units, highlight and
 * what a click on a finding does), and the editor's frame as served, shown while its scripts load
 * (EditorLoader), which passes no `focus`: its findings are text, not buttons. Must never read the
 * editor's store, so the frame as served stays free of it.
 */
import { useState } from 'react';
import Link from 'next/link';
import { CircleCheck, CircleX, Loader2, CloudOff } from 'lucide-react';
import { formatLength, type LengthUnit } from '@/lib/layout/units';
import type { Finding } from '@/lib/checks/types';
import { foldWaiting, ruleName } from '@/lib/checks/words';
import { NotYetChecked, SourceDisclosure, StatusBadge } from '@/components/checks/FindingParts';
import type { LiveChecks } from '../api/useLiveChecks';
import { groupFindings } from './findingGroups';
import { CHECKS_CAUTION } from '@/lib/layout/cautions';

function amount(v: number | undefined, unit: string | undefined, units: LengthUnit): string | undefined {
  if (v === undefined || !Number.isFinite(v)) return undefined;
  if (unit === 'mm') return formatLength(v, units);
  return `${Math.round(v * 100) / 100}${unit ? ` ${unit}` : ''}`;
}

export interface ChecksReportViewProps {
  checks: LiveChecks;
  units: LengthUnit;
  /** Links a waiting finding to the build plan's tab that answers it (the workshop's editor only). */
  layoutId?: string;
  /** Modules and openings shown highlighted on the plan: a finding naming only those is marked active. */
  highlight?: readonly string[];
  openingHighlight?: readonly string[];
  /** What a click on a finding does; absent: the findings are text only (the editor as served, before its scripts run). */
  focus?: (f: Finding) => void;
}

const NONE: readonly string[] = [];

/** What a group says when every finding in it meets and those are hidden (“show what meets” lists them): not a bare heading. */
function AllMeet({ count }: { count: number }) {
  return (
    <p className="flex items-center gap-1.5 px-2 py-1 text-xs text-ink-soft" data-testid="group-all-meet">
      <CircleCheck size={13} className="text-moss" aria-hidden /> {count === 1 ? 'The one check here meets.' : `All ${count} checks here meet.`}
    </p>
  );
}

export function ChecksReportView({ checks, units, layoutId, highlight = NONE, openingHighlight = NONE, focus }: ChecksReportViewProps) {
  const [showPass, setShowPass] = useState(false);
  const { report, status, stale, message } = checks;
  const folded = report ? foldWaiting(report.findings) : null;
  const live = focus !== undefined;

  return (
    <div className="flex h-full flex-col text-sm" data-testid={live ? 'checks-panel' : 'checks-panel-as-served'}>
      <div className="flex items-center gap-3 border-b border-paper-edge px-4 py-1.5 text-xs text-ink-soft">
        <span role="status" aria-live="polite" className="flex items-center gap-1.5" data-testid={live ? 'checks-status' : undefined}>
          {status === 'checking' && (<><Loader2 size={13} className="animate-spin" aria-hidden /> checking…</>)}
          {status === 'ready' && (<><CircleCheck size={13} aria-hidden /> up to date</>)}
          {status === 'unavailable' && (<><CloudOff size={13} aria-hidden /> checks unavailable{message ? `: ${message}` : ''}</>)}
          {status === 'refused' && (<><CircleX size={13} aria-hidden /> the check service refused this layout{message ? `: ${message}` : ''}</>)}
        </span>
        {stale && report && <span className="rounded bg-ochre-light px-1.5 text-ink">showing results for an earlier version</span>}
        <label className="ml-auto flex items-center gap-1.5"><input type="checkbox" className="accent-copper" checked={showPass} disabled={!live} onChange={(e) => setShowPass(e.target.checked)} /> show what meets</label>
      </div>
      <div className={`min-h-0 flex-1 overflow-auto px-4 py-2 ${stale ? 'opacity-60' : ''}`}>
        {!report && status !== 'checking' && (
          <p className="py-4 text-ink-soft">No findings to show. {status === 'unavailable' ? 'The plan can still be edited and saved; checks will appear when the service answers.' : ''}</p>
        )}
        {!report && status === 'checking' && <p className="py-4 text-ink-soft">Checking the layout…</p>}
        {report && report.findings.length === 0 && <p className="py-4 text-ink-soft">The check service returned no findings for this layout.</p>}
        {folded && groupFindings(folded.judged).map((g) => (
          <section key={g.arrangement} className="mb-3" aria-label={g.arrangement === 'all' ? 'Whole layout' : `${g.arrangement} arrangement`}>
            <h3 className="mb-1 text-xs font-semibold uppercase tracking-wide text-ink-soft">{g.arrangement === 'all' ? 'Whole layout' : g.arrangement}</h3>
            {!showPass && g.byStatus.every((b) => b.status === 'pass') && <AllMeet count={g.byStatus.reduce((n, b) => n + b.findings.length, 0)} />}
            {g.byStatus.filter((b) => showPass || b.status !== 'pass').map((b) => (
              <ul key={b.status} className="space-y-1">
                {b.findings.map((f, i) => {
                  const measured = amount(f.measured, f.unit, units);
                  const required = amount(f.required, f.unit, units);
                  const named = !!f.moduleIds?.length || !!f.openingIds?.length;
                  const active = named && (f.moduleIds ?? []).every((id) => highlight.includes(id)) && (f.openingIds ?? []).every((id) => openingHighlight.includes(id));
                  const text = (
                    <>
                      <span className="block text-xs font-semibold text-ink">{ruleName(f.id)}</span>
                      <span className="block text-ink">{f.message}</span>
                      {(measured || required) && (
                        <span className="mt-0.5 block font-mono text-[11px] text-ink-soft">
                          {[measured && `measured ${measured}`, required && `required ${required}`].filter(Boolean).join(' · ')}
                        </span>
                      )}
                    </>
                  );
                  return (
                    <li key={`${f.id}-${i}`} data-finding={f.id} data-status={f.status} data-arrangement={f.arrangement ?? 'all'}
                      className={`flex items-start gap-2 rounded border px-2 py-1.5 ${active ? 'border-copper bg-copper-light' : 'border-transparent hover:border-paper-edge hover:bg-paper-deep'}`}>
                      <span className="mt-0.5"><StatusBadge status={f.status} /></span>
                      <span className="min-w-0 flex-1">
                        {live
                          ? <button type="button" onClick={() => focus(f)} className="block w-full text-left">{text}</button>
                          : <span className="block w-full text-left">{text}</span>}
                        <SourceDisclosure source={f.source} />
                      </span>
                    </li>
                  );
                })}
              </ul>
            ))}
          </section>
        ))}
        {folded && (
          <NotYetChecked
            needs={folded.needs}
            linkFor={layoutId ? (n, text) => (n.where === 'editor' ? text : <Link className="text-copper underline" href={`/layouts/${layoutId}/build?tab=${n.where}`}>{text}</Link>) : undefined}
          />
        )}
        <p className="mt-2 border-t border-paper-edge pt-2 text-[11px] text-ink-soft">
          {CHECKS_CAUTION}
        </p>
      </div>
    </div>
  );
}
