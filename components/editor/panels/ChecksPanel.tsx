'use client';
/**
 * The Checks panel: findings from the server grouped by arrangement and status, each with what
 * was measured, what is required and where the rule comes from. Clicking one selects and
 * highlights the modules it names (switching to its arrangement). Shows "checking…" while the
 * server works, marks findings from an older document as out of date, and says plainly when the
 * check service is unavailable. Never computes or invents a finding.
 */
import { useState } from 'react';
import Link from 'next/link';
import { CircleCheck, CircleX, Loader2, CloudOff } from 'lucide-react';
import { formatLength, type LengthUnit } from '@/lib/layout/units';
import type { Finding } from '@/lib/checks/types';
import { foldWaiting, ruleName } from '@/lib/checks/words';
import { NotYetChecked, SourceDisclosure, StatusBadge } from '@/components/checks/FindingParts';
import { useEditorApi, useEditor } from '../store/EditorStoreContext';
import type { LiveChecks } from '../api/useLiveChecks';
import { groupFindings } from './findingGroups';
import { CHECKS_CAUTION } from '@/lib/layout/cautions';

function amount(v: number | undefined, unit: string | undefined, units: LengthUnit): string | undefined {
  if (v === undefined || !Number.isFinite(v)) return undefined;
  if (unit === 'mm') return formatLength(v, units);
  return `${Math.round(v * 100) / 100}${unit ? ` ${unit}` : ''}`;
}

export function ChecksPanel({ checks, layoutId }: { checks: LiveChecks; layoutId?: string }) {
  const api = useEditorApi();
  const units = useEditor((s) => s.units);
  const highlight = useEditor((s) => s.highlight);
  const openingHighlight = useEditor((s) => s.openingHighlight);
  const [showPass, setShowPass] = useState(false);
  const { report, status, stale, message } = checks;
  const folded = report ? foldWaiting(report.findings) : null;

  const focus = (f: Finding) => {
    const s = api.getState();
    if (f.arrangement && f.arrangement !== s.arrangement) s.setArrangement(f.arrangement);
    api.getState().setHighlight(f.moduleIds ?? [], f.openingIds ?? []);
  };

  return (
    <div className="flex h-full flex-col text-sm" data-testid="checks-panel">
      <div className="flex items-center gap-3 border-b border-paper-edge px-4 py-1.5 text-xs text-ink-soft">
        <span role="status" aria-live="polite" className="flex items-center gap-1.5" data-testid="checks-status">
          {status === 'checking' && (<><Loader2 size={13} className="animate-spin" aria-hidden /> checking…</>)}
          {status === 'ready' && (<><CircleCheck size={13} aria-hidden /> up to date</>)}
          {status === 'unavailable' && (<><CloudOff size={13} aria-hidden /> checks unavailable{message ? `: ${message}` : ''}</>)}
          {status === 'refused' && (<><CircleX size={13} aria-hidden /> the check service refused this layout{message ? `: ${message}` : ''}</>)}
        </span>
        {stale && report && <span className="rounded bg-ochre-light px-1.5 text-ink">showing results for an earlier version</span>}
        <label className="ml-auto flex items-center gap-1.5"><input type="checkbox" className="accent-copper" checked={showPass} onChange={(e) => setShowPass(e.target.checked)} /> show what meets</label>
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
            {g.byStatus.filter((b) => showPass || b.status !== 'pass').map((b) => (
              <ul key={b.status} className="space-y-1">
                {b.findings.map((f, i) => {
                  const measured = amount(f.measured, f.unit, units);
                  const required = amount(f.required, f.unit, units);
                  const named = !!f.moduleIds?.length || !!f.openingIds?.length;
                  const active = named && (f.moduleIds ?? []).every((id) => highlight.includes(id)) && (f.openingIds ?? []).every((id) => openingHighlight.includes(id));
                  return (
                    <li key={`${f.id}-${i}`} data-finding={f.id} data-status={f.status} data-arrangement={f.arrangement ?? 'all'}
                      className={`flex items-start gap-2 rounded border px-2 py-1.5 ${active ? 'border-copper bg-copper-light' : 'border-transparent hover:border-paper-edge hover:bg-paper-deep'}`}>
                      <span className="mt-0.5"><StatusBadge status={f.status} /></span>
                      <span className="min-w-0 flex-1">
                        <button type="button" onClick={() => focus(f)} className="block w-full text-left">
                          <span className="block text-xs font-semibold text-ink">{ruleName(f.id)}</span>
                          <span className="block text-ink">{f.message}</span>
                          {(measured || required) && (
                            <span className="mt-0.5 block font-mono text-[11px] text-ink-soft">
                              {[measured && `measured ${measured}`, required && `required ${required}`].filter(Boolean).join(' · ')}
                            </span>
                          )}
                        </button>
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
