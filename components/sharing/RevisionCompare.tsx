'use client';
/**
 * Two revisions side by side: pick the pair (or the layout as last saved), pick the arrangement,
 * see both plans with the later one marked the drafting way (revision clouds, delta triangles
 * with the letter, phantom lines where a module was), the revision table, the changes in words
 * (modules by label, fields by their on-screen names), the bay's own changes, and the check
 * findings that changed status — with the safety caution when a gas, power, heating, seat or
 * weight finding is among them. Reads /api/layouts/[id]/revisions/compare. Must never change anything.
 */
import { useState } from 'react';
import { useRouter } from 'next/navigation';
import { useQuery } from '@tanstack/react-query';
import { ArrowDownRight, ArrowUpRight } from 'lucide-react';
import { apiFetch } from '@/lib/api/client-fetch';
import { ARRANGEMENTS } from '@/lib/layout/vocabulary';
import type { Arrangement } from '@/lib/layout/schema';
import { AS_LAST_SAVED, nextRevisionLetter } from '@/lib/layout/drawing-issue';
import { bayChangeWords, moduleChangeWords } from '@/lib/layout/revision-words';
import { moduleLabel } from '@/lib/layout/kinds';
import { findingTopic, TOPIC_CAUTION, type HazardTopic } from '@/lib/layout/cautions';
import type { LengthUnit } from '@/lib/layout/units';
import { formatLength } from '@/lib/layout/units';
import type { ComparisonDto } from '@/db/sharing/compare';
import type { RevisionDto } from '@/db/sharing/revisions';
import { CautionNote } from '@/components/ui/CautionNote';
import { RevisionPlanSvg } from './RevisionPlanSvg';
import { StatusInline } from '@/components/checks/FindingParts';
import { ruleName } from '@/lib/checks/words';
import { RevisionMarkIcon } from './RevisionMarkIcon';
import { RevisionTable } from './RevisionTable';

const ARRANGEMENT_WORD: Record<Arrangement, string> = { travel: 'Travel', lounge: 'Lounge', sleep: 'Sleep' };

function Status({ s, side }: { s: 'pass' | 'warn' | 'fail' | null; side: 'before' | 'after' }) {
  if (!s) return <span className="text-ink-soft">{side === 'before' ? 'not raised' : 'no longer raised'}</span>;
  return <StatusInline status={s} />;
}

interface Props {
  layoutId: string;
  /** Issued revisions, newest first. */
  revisions: RevisionDto[];
  from: string;
  to: string;
  units: LengthUnit;
}

export function RevisionCompare({ layoutId, revisions, from, to, units }: Props) {
  const router = useRouter();
  const [arrangement, setArrangement] = useState<Arrangement>('travel');
  const letters = revisions.map((r) => r.letter).reverse();
  const q = useQuery({
    queryKey: ['compare', layoutId, from, to],
    queryFn: () => apiFetch<ComparisonDto>(`/api/layouts/${layoutId}/revisions/compare?from=${encodeURIComponent(from)}&to=${encodeURIComponent(to)}`),
  });
  const choose = (side: 'from' | 'to', value: string) => {
    const next = { from, to, [side]: value };
    router.replace(`/layouts/${layoutId}/revisions/compare?from=${encodeURIComponent(next.from)}&to=${encodeURIComponent(next.to)}`);
  };
  const options = [...letters.map((l) => ({ value: l, word: `Revision ${l}` })), { value: 'current', word: AS_LAST_SAVED }];
  // The later side's letter goes in the delta triangles; the layout as saved carries the next one.
  const markLetter = to === 'current' ? nextRevisionLetter(letters[letters.length - 1]) : to;

  return (
    <div className="space-y-5">
      <div className="flex flex-wrap items-end gap-4">
        {(['from', 'to'] as const).map((side) => (
          <div key={side}>
            <label className="label" htmlFor={`compare-${side}`}>{side === 'from' ? 'Earlier' : 'Later'}</label>
            <select id={`compare-${side}`} className="field w-56" value={side === 'from' ? from : to} onChange={(e) => choose(side, e.target.value)}>
              {options.map((o) => <option key={o.value} value={o.value}>{o.word}</option>)}
            </select>
          </div>
        ))}
        <div role="radiogroup" aria-label="Arrangement" className="flex overflow-hidden rounded border border-ink-faint">
          {ARRANGEMENTS.map((a) => (
            <button key={a} type="button" role="radio" aria-checked={arrangement === a} onClick={() => setArrangement(a)}
              className={`px-3 py-1 text-sm ${arrangement === a ? 'bg-ink text-paper' : 'bg-paper text-ink hover:bg-paper-deep'}`}>
              {ARRANGEMENT_WORD[a]}
            </button>
          ))}
        </div>
      </div>

      {q.isPending ? <p className="panel p-6 text-sm text-ink-soft" role="status">Comparing…</p>
        : q.isError ? <p className="panel border-brick p-6 text-sm text-brick" role="alert">Could not compare: {q.error.message}</p>
        : <Comparison data={q.data} arrangement={arrangement} markLetter={markLetter} units={units} revisions={revisions} to={to} />}
    </div>
  );
}

function Comparison({ data, arrangement, markLetter, units, revisions, to }: { data: ComparisonDto; arrangement: Arrangement; markLetter: string; units: LengthUnit; revisions: RevisionDto[]; to: string }) {
  const { diff } = data;
  const nothing = !diff.added.length && !diff.removed.length && !diff.changed.length;
  const topics = [...new Set(data.findings.map((f) => findingTopic(f.id)).filter((t): t is HazardTopic => t !== null))];
  const mark = <span className="mt-0.5 text-copper"><RevisionMarkIcon letter={markLetter} /></span>;
  return (
    <>
      <div className="grid gap-4 lg:grid-cols-2" data-testid="compare-plans">
        <RevisionPlanSvg doc={data.from.doc} diff={diff} side="from" arrangement={arrangement} title={data.from.label} letter={markLetter} />
        <RevisionPlanSvg doc={data.to.doc} diff={diff} side="to" arrangement={arrangement} title={data.to.label} letter={markLetter} />
      </div>
      <p className="flex flex-wrap items-center gap-x-4 gap-y-1 text-xs text-ink-soft">
        <span className="inline-flex items-center gap-1 text-copper"><RevisionMarkIcon letter={markLetter} /></span>
        <span>Revision clouds mark what changed in {to === 'current' ? 'the layout as last saved' : `revision ${markLetter}`}; the triangle carries its letter.</span>
        <span>Dashed outlines with two short dashes (phantom lines) show where a module stood before.</span>
      </p>
      <div className="grid gap-4 lg:grid-cols-2">
        <section className="panel p-4 text-sm" data-testid="module-changes">
          <h2 className="mb-2 font-semibold">What changed</h2>
          {nothing ? (
            <p className="text-ink-soft">No module changed ({diff.unchanged} the same).</p>
          ) : (
            <ul className="space-y-1.5">
              {diff.added.map((m) => (
                <li key={`a-${m.id}`} className="flex gap-2">{mark}<span><strong>Added</strong> {moduleLabel(m)} <span className="font-mono text-xs text-ink-soft">{formatLength(m.length, units)} × {formatLength(m.width, units)} × {formatLength(m.height, units)}</span></span></li>
              ))}
              {diff.removed.map((m) => <li key={`r-${m.id}`} className="flex gap-2">{mark}<span><strong>Removed</strong> {moduleLabel(m)}</span></li>)}
              {diff.changed.map((c) => {
                const w = moduleChangeWords(c, units);
                return (
                  <li key={`c-${c.id}`} className="flex gap-2">
                    {mark}
                    <span>
                      <strong>{w.verb}</strong> {moduleLabel(c.after)}
                      {w.lines.map((l) => <span key={l} className="block text-xs text-ink-soft">{l}</span>)}
                    </span>
                  </li>
                );
              })}
            </ul>
          )}
          {diff.bay.length > 0 && (
            <>
              <h3 className="mb-1 mt-3 font-medium">Bay</h3>
              <ul className="space-y-0.5 text-xs">
                {diff.bay.map((b) => <li key={b.field}>{bayChangeWords(b, units)}</li>)}
              </ul>
            </>
          )}
        </section>
        <section className="panel space-y-3 p-4 text-sm" data-testid="finding-changes">
          <h2 className="font-semibold">Checks that changed</h2>
          {data.findings.length === 0 ? <p className="text-ink-soft">No finding changed status.</p> : (
            <ul className="space-y-2">
              {data.findings.map((f) => (
                <li key={f.key} className="flex gap-2">
                  {f.direction === 'worse' ? <ArrowDownRight size={14} className="mt-0.5 text-brick" aria-label="worse" /> : <ArrowUpRight size={14} className="mt-0.5 text-moss" aria-label="better" />}
                  <span>
                    <span className="text-xs font-semibold">{ruleName(f.id)}</span>{f.arrangement ? <span className="text-xs text-ink-soft"> · {f.arrangement}</span> : null}:{' '}
                    <Status s={f.before} side="before" /> → <Status s={f.after} side="after" />
                    <span className="block text-xs text-ink-soft">{f.message}</span>
                  </span>
                </li>
              ))}
            </ul>
          )}
          {topics.map((t) => <CautionNote key={t} title={TOPIC_CAUTION[t].title} compact testId="compare-caution">{TOPIC_CAUTION[t].text}</CautionNote>)}
        </section>
      </div>
      <RevisionTable revisions={revisions} upTo={to === 'current' ? null : to} current={to === 'current' ? null : to} />
    </>
  );
}
