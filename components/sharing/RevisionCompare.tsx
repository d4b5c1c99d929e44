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
import { apiFetch } from '@/lib/api/client-fetch';
import { ArrangementChoice } from './ArrangementChoice';
import type { Arrangement } from '@/lib/layout/schema';
import { AS_LAST_SAVED, nextRevisionLetter } from '@/lib/layout/drawing-issue';
import type { LengthUnit } from '@/lib/layout/units';
import type { ComparisonDto } from '@/db/sharing/compare';
import type { RevisionDto } from '@/db/sharing/revisions';
import { RevisionPlanSvg } from './RevisionPlanSvg';
import { RevisionMarkIcon } from './RevisionMarkIcon';
import { RevisionTable } from './RevisionTable';
import { ComparisonDetails } from './ComparisonDetails';


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
        <ArrangementChoice value={arrangement} onChange={setArrangement} />
      </div>

      {q.isPending ? <p className="panel p-6 text-sm text-ink-soft" role="status">Comparing…</p>
        : q.isError ? <p className="panel border-brick p-6 text-sm text-brick" role="alert">Could not compare: {q.error.message}</p>
        : <Comparison data={q.data} arrangement={arrangement} markLetter={markLetter} units={units} revisions={revisions} to={to} />}
    </div>
  );
}

function Comparison({ data, arrangement, markLetter, units, revisions, to }: { data: ComparisonDto; arrangement: Arrangement; markLetter: string; units: LengthUnit; revisions: RevisionDto[]; to: string }) {
  const { diff } = data;
  return (
    <>
      <div className="grid gap-4 lg:grid-cols-2" data-testid="compare-plans">
        <RevisionPlanSvg doc={data.from.doc} diff={diff} side="from" arrangement={arrangement} title={data.from.label} letter={markLetter} />
        <RevisionPlanSvg doc={data.to.doc} diff={diff} side="to" arrangement={arrangement} title={data.to.label} letter={markLetter} />
      </div>
      <p className="flex flex-wrap items-center gap-x-4 gap-y-1 text-xs text-ink-soft">
        <span className="inline-flex items-center gap-1 text-copper"><RevisionMarkIcon letter={markLetter} /></span>
        <span>Revision clouds mark what changed in {to === 'current' ? 'the layout as last saved' : `revision ${markLetter}`}; the triangle carries its letter.</span>
        <span>Dashed outlines with two short dashes (phantom lines) show where a module or opening stood before.</span>
        <span>Windows are drawn on the wall line, roof openings dashed overhead.</span>
      </p>
      <ComparisonDetails data={data} markLetter={markLetter} units={units} />
      <RevisionTable revisions={revisions} upTo={to === 'current' ? null : to} current={to === 'current' ? null : to} />
    </>
  );
}
