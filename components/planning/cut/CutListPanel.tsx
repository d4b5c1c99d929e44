'use client';
/**
 * The cut list: the sheet panels of each cabinet-type module (lib/planning's per-kind rules)
 * nested onto standard 2440 × 1220 mm boards per material and thickness, with the kerf, edge
 * trim and grain options; sheets needed against the area lower bound, waste %, every sheet drawn
 * to scale with a numbered legend, parts that do not fit, and modules that are bought in. The wall
 * and roof lining panels come with their cut-outs (windows, roof openings) placed from the panel's
 * edges, and their material's area less the cut-outs.
 * Computes through `planCutList` only; the options are the page's (the parts list uses them too).
 */
import { useMemo } from 'react';
import { cutOutWords, partAreaM2, planCutList, SHEET_MATERIALS, STANDARD_SHEET, type CutPart, type NestOptions } from '@/lib/planning';
import { formatNumber } from '@/lib/format';
import type { LayoutDoc } from '@/lib/layout';
import { CutSheetDrawing } from './CutSheetDrawing';

export interface CutOptions {
  kerfMm: number;
  trimMm: number;
  respectGrain: boolean;
}

function NumberBox({ label, value, min, max, step, onChange, id }: { label: string; value: number; min: number; max: number; step: number; onChange: (v: number) => void; id: string }) {
  return (
    <div>
      <label className="label" htmlFor={id}>{label}</label>
      <span className="flex items-center rounded-sm border border-ink-faint bg-white/70">
        <input id={id} type="number" className="w-20 bg-transparent px-2 py-1.5 font-mono text-sm outline-none" value={value} min={min} max={max} step={step}
          onChange={(e) => {
            const v = Number(e.target.value);
            if (e.target.value !== '' && Number.isFinite(v) && v >= min && v <= max) onChange(v);
          }} />
        <span className="pr-2 font-mono text-xs text-ink-faint">mm</span>
      </span>
    </div>
  );
}

export function CutListPanel({ doc, options, onOptions }: { doc: LayoutDoc; options: CutOptions; onOptions: (o: CutOptions) => void }) {
  const plan = useMemo(() => {
    try {
      return { ok: true as const, value: planCutList(doc, options satisfies NestOptions) };
    } catch (err) {
      return { ok: false as const, error: err instanceof Error ? err.message : String(err) };
    }
  }, [doc, options]);
  const parts = useMemo(() => new Map<string, CutPart>(plan.ok ? plan.value.parts.map((p) => [p.id, p]) : []), [plan]);

  return (
    <div className="space-y-4" data-testid="cut-list">
      <div className="panel flex flex-wrap items-end gap-4 p-3">
        <NumberBox id="cut-kerf" label="Saw kerf" value={options.kerfMm} min={0} max={10} step={0.5} onChange={(kerfMm) => onOptions({ ...options, kerfMm })} />
        <NumberBox id="cut-trim" label="Edge trim" value={options.trimMm} min={0} max={50} step={1} onChange={(trimMm) => onOptions({ ...options, trimMm })} />
        <label className="flex items-center gap-2 pb-2 text-sm">
          <input type="checkbox" className="accent-copper" checked={options.respectGrain} onChange={(e) => onOptions({ ...options, respectGrain: e.target.checked })} />
          Keep visible faces with the grain along the sheet
        </label>
        <p className="pb-2 text-xs text-ink-soft">Boards {STANDARD_SHEET.length} × {STANDARD_SHEET.width} mm. Carcass rules are a starting list, not a joinery design (common practice, no source). Lining panels leave out each window at its glass size and each roof opening at its own size: our simplification (common practice, no source); cut to the frame maker&rsquo;s template. Lining boards are not priced in the parts list yet.</p>
      </div>
      {!plan.ok ? (
        <p className="panel border-brick p-3 text-sm" role="alert">The cut list cannot be nested: {plan.error}</p>
      ) : plan.value.byMaterial.length === 0 ? (
        <p className="panel p-3 text-sm text-ink-soft">No cabinet-type modules on the plan and no sheet lining in the build-up yet: nothing to cut.</p>
      ) : (
        <>
          <p className="text-sm" data-testid="cut-summary">
            <span className="font-semibold">{plan.value.sheetsNeeded} sheets</span> in all, {plan.value.parts.length} parts.
          </p>
          {plan.value.byMaterial.map(({ material, nest, netAreaM2 }) => {
            const numbers = new Map<string, number>();
            const cutOuts = (id: string) => parts.get(id)?.cutOuts ?? [];
            const anyCutOut = nest.sheets.some((s) => s.placements.some((p) => cutOuts(p.partId).length > 0));
            const lining = !Object.hasOwn(SHEET_MATERIALS, material.id);
            nest.sheets.forEach((s) => s.placements.forEach((p) => numbers.set(p.partId, numbers.size + 1)));
            return (
              <section key={material.id} className="panel space-y-3 p-3" aria-label={material.title} data-material={material.id}>
                <h3 className="text-sm font-semibold">
                  {material.title} — <span className="font-mono">{nest.sheetsNeeded}</span> {nest.sheetsNeeded === 1 ? 'sheet' : 'sheets'}
                  <span className="font-normal text-ink-soft"> (no fewer than <span className="font-mono">{nest.lowerBound}</span> by area), waste <span className="font-mono" data-testid={`waste-${material.id}`}>{nest.wastePct.toFixed(1)} %</span>, {material.thicknessMm} mm thick{lining ? <>, <span className="font-mono" data-testid={`net-area-${material.id}`}>{formatNumber(netAreaM2, 2)} m²</span> of lining less cut-outs</> : null}</span>
                </h3>
                <div className="grid gap-3 lg:grid-cols-2">
                  {nest.sheets.map((s) => (
                    <figure key={s.index} className="rounded-sm border border-paper-edge bg-paper p-2">
                      <CutSheetDrawing sheet={nest.sheet} nested={s} trimMm={nest.trimMm} numbers={numbers} title={material.title} cutOutsOf={cutOuts} />
                      <figcaption className="mt-1 text-xs text-ink-soft">Sheet {s.index + 1} of {nest.sheetsNeeded}</figcaption>
                    </figure>
                  ))}
                </div>
                <details>
                  <summary className="cursor-pointer text-sm">Parts ({numbers.size})</summary>
                  <table className="mt-1 w-full text-left text-xs">
                    <thead><tr className="text-ink-soft"><th className="py-1">No.</th><th>Part</th><th className="text-right">length × width (mm)</th><th className="text-right">sheet</th>{anyCutOut && <th className="pl-3">Cut-outs</th>}</tr></thead>
                    <tbody>
                      {nest.sheets.flatMap((s) => s.placements.map((p) => (
                        <tr key={p.partId} className="border-t border-paper-edge">
                          <td className="py-1 font-mono">{numbers.get(p.partId)}</td>
                          <td>{p.label}{p.rotated ? ' (turned across the grain)' : ''}</td>
                          <td className="text-right font-mono">{p.length} × {p.width}</td>
                          <td className="text-right font-mono">{s.index + 1}</td>
                          {anyCutOut && (
                            <td className="pl-3" data-testid="cut-outs">
                              {cutOuts(p.partId).map((c) => <span key={c.openingId} className="block">{cutOutWords(c)}</span>)}
                              {cutOuts(p.partId).length > 0 && <span className="block text-ink-soft">{formatNumber(partAreaM2(parts.get(p.partId)!), 2)} m² left</span>}
                            </td>
                          )}
                        </tr>
                      )))}
                    </tbody>
                  </table>
                </details>
                {nest.unplaced.length > 0 && (
                  <ul className="text-sm text-brick" role="alert">
                    {nest.unplaced.map((u) => <li key={u.partId}>{u.label}: {u.reason}</li>)}
                  </ul>
                )}
              </section>
            );
          })}
          {plan.value.skipped.length > 0 && (
            <details className="panel p-3 text-sm">
              <summary className="cursor-pointer">Bought in, not cut ({plan.value.skipped.length})</summary>
              <ul className="mt-1 list-disc pl-5 text-xs">{plan.value.skipped.map((s) => <li key={s.moduleId}><span className="font-mono">{s.moduleId}</span>: {s.reason}</li>)}</ul>
            </details>
          )}
        </>
      )}
    </div>
  );
}
