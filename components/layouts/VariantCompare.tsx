'use client';
/**
 * Two variants side by side: choose the other layout of the family, choose the arrangement, see
 * both plans as last saved (revision clouds round what differs on the second, phantom lines where
 * a module stands in the first), whether each meets every check, what differs module by module
 * and the findings whose status differs. Reads /api/layouts/[id]/compare. Must never change anything.
 */
import { useState } from 'react';
import { useRouter } from 'next/navigation';
import { useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api/client-fetch';
import { ArrangementChoice } from '@/components/sharing/ArrangementChoice';
import type { Arrangement } from '@/lib/layout/schema';
import type { LengthUnit } from '@/lib/layout/units';
import type { ComparisonDto } from '@/db/sharing/compare';
import { RevisionPlanSvg } from '@/components/sharing/RevisionPlanSvg';
import { ComparisonDetails } from '@/components/sharing/ComparisonDetails';
import { StatusInline } from '@/components/checks/FindingParts';


export interface FamilyMember {
  id: string;
  name: string;
  archived: boolean;
}

export function VariantCompare({ layoutId, family, other, units }: { layoutId: string; family: FamilyMember[]; other: string; units: LengthUnit }) {
  const router = useRouter();
  const [arrangement, setArrangement] = useState<Arrangement>('travel');
  const q = useQuery({
    queryKey: ['compare-variants', layoutId, other],
    queryFn: () => apiFetch<ComparisonDto>(`/api/layouts/${layoutId}/compare?with=${encodeURIComponent(other)}`),
  });
  const others = family.filter((f) => f.id !== layoutId);
  return (
    <div className="space-y-5">
      <div className="flex flex-wrap items-end gap-4">
        <div>
          <label className="label" htmlFor="compare-with">Compare with</label>
          <select id="compare-with" className="field w-72" value={other}
            onChange={(e) => router.replace(`/layouts/${layoutId}/compare?with=${encodeURIComponent(e.target.value)}`)}>
            {others.map((f) => <option key={f.id} value={f.id}>{f.name}{f.archived ? ' (archived)' : ''}</option>)}
          </select>
        </div>
        <ArrangementChoice value={arrangement} onChange={setArrangement} />
      </div>
      {q.isPending ? <p className="panel p-6 text-sm text-ink-soft" role="status">Comparing the two layouts and checking both…</p>
        : q.isError ? <p className="panel border-brick p-6 text-sm text-brick" role="alert">Could not compare: {q.error.message}</p>
        : (
          <>
            <div className="grid gap-4 lg:grid-cols-2" data-testid="compare-plans">
              {(['from', 'to'] as const).map((side) => (
                <div key={side} className="space-y-1">
                  <RevisionPlanSvg doc={q.data[side].doc} diff={q.data.diff} side={side} arrangement={arrangement} title={q.data[side].label} letter="" />
                  <p className="text-xs" data-testid={`compare-${side}-status`}>
                    Checks: <StatusInline status={q.data[side].ok ? 'pass' : 'fail'} />
                    <span className="text-ink-soft"> {q.data[side].ok ? '— nothing fails' : '— at least one check is not met'}</span>
                  </p>
                </div>
              ))}
            </div>
            <p className="text-xs text-ink-soft">
              Revision clouds on the right mark what differs from the layout on the left; dashed outlines with two short dashes (phantom lines) show where a module stands on the left.
            </p>
            <ComparisonDetails data={q.data} markLetter="" units={units} titles={{ modules: 'How the two differ', findings: 'Checks that differ' }} />
          </>
        )}
    </div>
  );
}
