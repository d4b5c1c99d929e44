'use client';
/**
 * Two revisions side by side: pick the pair (or the current draft), pick the arrangement, see both
 * plans with added, removed, moved and resized modules marked, the list of those changes in
 * millimetres, the bay's own changes, and the check findings that changed status.
 * Reads /api/layouts/[id]/revisions/compare. Must never change anything.
 */
import { useState } from 'react';
import { useRouter } from 'next/navigation';
import { useQuery } from '@tanstack/react-query';
import { ArrowDownRight, ArrowUpRight, Minus, MoveRight, Plus, Scaling } from 'lucide-react';
import { apiFetch } from '@/lib/api/client-fetch';
import { ARRANGEMENTS } from '@/lib/layout/vocabulary';
import type { Arrangement, Module } from '@/lib/layout/schema';
import type { ComparisonDto } from '@/db/sharing/compare';
import { RevisionPlanSvg } from './RevisionPlanSvg';
import { StatusInline } from '@/components/checks/FindingParts';
import { ruleName } from '@/lib/checks/words';
import { moduleLabel } from '@/lib/layout/kinds';
import { fieldName } from '@/lib/layout/field-names';

const ARRANGEMENT_WORD: Record<Arrangement, string> = { travel: 'Travel', lounge: 'Lounge', sleep: 'Sleep' };
const name = (m: Module) => moduleLabel(m);
const signed = (n: number) => `${n > 0 ? '+' : n < 0 ? '−' : '±'}${Math.abs(n)} mm`;

function Status({ s, side }: { s: 'pass' | 'warn' | 'fail' | null; side: 'before' | 'after' }) {
  if (!s) return <span className="text-ink-soft">{side === 'before' ? 'not raised' : 'no longer raised'}</span>;
  return <StatusInline status={s} />;
}

export function RevisionCompare({ layoutId, letters, from, to }: { layoutId: string; letters: string[]; from: string; to: string }) {
  const router = useRouter();
  const [arrangement, setArrangement] = useState<Arrangement>('travel');
  const q = useQuery({
    queryKey: ['compare', layoutId, from, to],
    queryFn: () => apiFetch<ComparisonDto>(`/api/layouts/${layoutId}/revisions/compare?from=${encodeURIComponent(from)}&to=${encodeURIComponent(to)}`),
  });
  const choose = (side: 'from' | 'to', value: string) => {
    const next = { from, to, [side]: value };
    router.replace(`/layouts/${layoutId}/revisions/compare?from=${encodeURIComponent(next.from)}&to=${encodeURIComponent(next.to)}`);
  };
  const options = [...letters.map((l) => ({ value: l, word: `Revision ${l}` })), { value: 'current', word: 'Current draft' }];

  return (
    <div className="space-y-5">
      <div className="flex flex-wrap items-end gap-4">
        {(['from', 'to'] as const).map((side) => (
          <div key={side}>
            <label className="label" htmlFor={`compare-${side}`}>{side === 'from' ? 'Earlier' : 'Later'}</label>
            <select id={`compare-${side}`} className="field w-44" value={side === 'from' ? from : to} onChange={(e) => choose(side, e.target.value)}>
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
        : (
          <>
            <div className="grid gap-4 lg:grid-cols-2" data-testid="compare-plans">
              <RevisionPlanSvg doc={q.data.from.doc} diff={q.data.diff} side="from" arrangement={arrangement} title={q.data.from.label} />
              <RevisionPlanSvg doc={q.data.to.doc} diff={q.data.diff} side="to" arrangement={arrangement} title={q.data.to.label} />
            </div>
            <p className="flex flex-wrap gap-4 text-xs text-ink-soft">
              <span className="inline-flex items-center gap-1"><Plus size={12} className="text-moss" aria-hidden="true" /> added (double outline)</span>
              <span className="inline-flex items-center gap-1"><Minus size={12} className="text-brick" aria-hidden="true" /> removed (dashed)</span>
              <span className="inline-flex items-center gap-1"><MoveRight size={12} className="text-ochre" aria-hidden="true" /> moved or resized (dashed ghost where it was)</span>
            </p>
            <div className="grid gap-4 lg:grid-cols-2">
              <section className="panel p-4 text-sm" data-testid="module-changes">
                <h2 className="mb-2 font-semibold">Modules</h2>
                {!q.data.diff.added.length && !q.data.diff.removed.length && !q.data.diff.changed.length ? (
                  <p className="text-ink-soft">No module changed ({q.data.diff.unchanged} the same).</p>
                ) : (
                  <ul className="space-y-1">
                    {q.data.diff.added.map((m) => <li key={`a-${m.id}`} className="flex gap-2"><Plus size={14} className="mt-0.5 text-moss" aria-hidden="true" /><span><strong>Added</strong> {name(m)} <span className="font-mono text-xs text-ink-soft">{m.length} × {m.width} × {m.height} mm</span></span></li>)}
                    {q.data.diff.removed.map((m) => <li key={`r-${m.id}`} className="flex gap-2"><Minus size={14} className="mt-0.5 text-brick" aria-hidden="true" /><span><strong>Removed</strong> {name(m)}</span></li>)}
                    {q.data.diff.changed.map((c) => (
                      <li key={`c-${c.id}`} className="flex gap-2">
                        {c.resized ? <Scaling size={14} className="mt-0.5 text-ochre" aria-hidden="true" /> : <MoveRight size={14} className="mt-0.5 text-ochre" aria-hidden="true" />}
                        <span>
                          <strong>{[c.moved && 'Moved', c.resized && (c.resized.rotated ? 'Turned' : 'Resized'), c.other.length && !c.moved && !c.resized && 'Edited'].filter(Boolean).join(', ')}</strong> {name(c.after)}{' '}
                          <span className="font-mono text-xs text-ink-soft">
                            {c.moved && `x ${signed(c.moved.dx)}, y ${signed(c.moved.dy)}${c.moved.dz ? `, up ${signed(c.moved.dz)}` : ''}`}
                            {c.moved && c.resized && ' · '}
                            {c.resized && `${c.before.length} × ${c.before.width} × ${c.before.height} → ${c.after.length} × ${c.after.width} × ${c.after.height} mm`}
                          </span>
                          {c.other.length > 0 && <span className="block text-xs text-ink-soft">also changed: {c.other.map((f) => fieldName(f).toLowerCase()).join(', ')}</span>}
                        </span>
                      </li>
                    ))}
                  </ul>
                )}
                {q.data.diff.bay.length > 0 && (
                  <>
                    <h3 className="mb-1 mt-3 font-medium">Bay</h3>
                    <ul className="space-y-0.5 text-xs">
                      {q.data.diff.bay.map((b) => <li key={b.field}>{fieldName(`bay.${b.field}`)}: <span className="font-mono">{b.before} → {b.after}</span></li>)}
                    </ul>
                  </>
                )}
              </section>
              <section className="panel p-4 text-sm" data-testid="finding-changes">
                <h2 className="mb-2 font-semibold">Checks that changed</h2>
                {q.data.findings.length === 0 ? <p className="text-ink-soft">No finding changed status.</p> : (
                  <ul className="space-y-2">
                    {q.data.findings.map((f) => (
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
              </section>
            </div>
          </>
        )}
    </div>
  );
}
