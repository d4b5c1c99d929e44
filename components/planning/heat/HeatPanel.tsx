'use client';
/**
 * Heating and insulation: the heater's fuel and placement confirmations, the design ΔT, air
 * changes, declared λ and windows, beside the U-value of each build-up layer by layer
 * (EN ISO 6946), the heat loss in W/K, the heat needed at the chosen ΔT against the heaters
 * drawn, the heater caution and the `heat.*` findings. Edits `systems.heating` and
 * `systems.insulation` only; the build-up layers themselves are edited in the editor's Bay panel.
 */
import { useId, useMemo } from 'react';
import { useFieldArray } from 'react-hook-form';
import { Plus, Trash2 } from 'lucide-react';
import { heatLoss } from '@/lib/planning';
import { FindingList, findingsOf } from '../FindingList';
import { Caution, CheckField, FieldGroup, QuantityField } from '../fields';
import { newRowId } from '../ids';
import type { PanelProps } from '../panelProps';
import { useSectionForm } from '../useSectionForm';
import { heatDefaults, heatSchema, heatSystems } from './heatForm';
import { PLANNING_CAUTION } from '@/lib/layout/cautions';
import { formatNumber } from '@/lib/format';

const FACE = { floor: 'Floor', walls: 'Walls', roof: 'Roof' } as const;
const f2 = (n: number) => n.toFixed(2);
const f1 = (n: number) => formatNumber(n, 1);

export function HeatPanel({ doc, readOnly, onSystems, onValidity, findings }: PanelProps) {
  const uid = useId();
  const form = useSectionForm({ schema: heatSchema, defaults: () => heatDefaults(doc), onParsed: (v) => onSystems(heatSystems(v)), onValidity });
  const lambdas = useFieldArray({ control: form.control, name: 'conductivities' });
  const windows = useFieldArray({ control: form.control, name: 'windows' });
  const e = form.formState.errors;
  const r = form.register;
  const h = useMemo(() => heatLoss(doc), [doc]);
  const fuel = doc.systems?.heating?.fuel;
  return (
    <div className="grid gap-6 xl:grid-cols-2">
      <form className="space-y-4" onSubmit={(ev) => ev.preventDefault()} noValidate aria-label="Heating and insulation inputs">
        <fieldset disabled={readOnly} className="space-y-4">
          <FieldGroup title="Heater">
            <div>
              <label className="label" htmlFor="h-fuel">Fuel</label>
              <select id="h-fuel" className="field" {...r('fuel')}>
                <option value="">Not chosen</option><option value="diesel">Diesel</option><option value="petrol">Petrol</option><option value="gas">Gas (LPG)</option><option value="electric">Electric (hook-up only)</option>
              </select>
            </div>
            <CheckField reg={r('exhaustClearOfOpenings')} label="Exhaust away from doors, opening windows and the fuel filler, as the maker specifies" />
            <CheckField reg={r('intakeClearOfExhaust')} label="Combustion intake apart from the exhaust and out of spray" />
          </FieldGroup>
          <FieldGroup title="Design conditions" note="Heater output is the modules' watts (Details panel in the editor).">
            <QuantityField label="Inside minus outside" unit="K" reg={r('deltaK')} error={e.deltaK} placeholder="20" hint="e.g. 20 K for 0 °C outside, 20 °C inside" testId="h-delta" />
            <QuantityField label="Air changes" unit="/h" reg={r('airChangesPerHour')} error={e.airChangesPerHour} placeholder="1" hint="vents and leaks; empty: 1 (common practice)" />
          </FieldGroup>
          <fieldset className="rounded-sm border border-paper-edge p-3">
            <legend className="px-1 text-sm font-semibold">Declared λ of your products</legend>
            {h.unknownMaterials.length > 0 && <p className="mb-2 text-xs text-brick">No λ known for: {h.unknownMaterials.join(', ')}. Add the maker&apos;s declared value (same name as in the build-up).</p>}
            <div className="space-y-2">
              {lambdas.fields.map((fl, i) => (
                <div key={fl.id} className="grid grid-cols-2 sm:grid-cols-[1fr_9rem_auto] items-end gap-2">
                  <div>
                    <label className="label" htmlFor={`${uid}-lam-${i}`}>Material</label>
                    <input id={`${uid}-lam-${i}`} className="field" list="buildup-materials" {...r(`conductivities.${i}.material`)} />
                    {e.conductivities?.[i]?.material && <p className="field-error">{e.conductivities[i]?.material?.message}</p>}
                  </div>
                  <QuantityField label="λ" unit="W/m·K" reg={r(`conductivities.${i}.lambda`)} error={e.conductivities?.[i]?.lambda} />
                  <button type="button" className="btn-quiet mb-0.5 px-2" onClick={() => lambdas.remove(i)} aria-label={`Remove λ ${i + 1}`}><Trash2 size={14} aria-hidden="true" /></button>
                </div>
              ))}
              <datalist id="buildup-materials">{[...new Set([...doc.buildUp.floor, ...doc.buildUp.walls, ...doc.buildUp.roof].map((l) => l.material))].map((m) => <option key={m} value={m} />)}</datalist>
              <button type="button" className="btn-quiet" onClick={() => lambdas.append({ material: h.unknownMaterials[0] ?? '', lambda: '' })}><Plus size={14} aria-hidden="true" /> Add a λ</button>
            </div>
          </fieldset>
          <fieldset className="rounded-sm border border-paper-edge p-3">
            <legend className="px-1 text-sm font-semibold">Windows and roof lights</legend>
            <div className="space-y-2">
              {windows.fields.map((fw, i) => (
                <div key={fw.id} className="grid grid-cols-2 sm:grid-cols-[7rem_1fr_1fr_auto] items-end gap-2">
                  <div>
                    <label className="label" htmlFor={`${uid}-win-${i}`}>In</label>
                    <select id={`${uid}-win-${i}`} className="field" {...r(`windows.${i}.face`)}><option value="walls">a wall</option><option value="roof">the roof</option></select>
                  </div>
                  <QuantityField label="Area" unit="m²" reg={r(`windows.${i}.areaM2`)} error={e.windows?.[i]?.areaM2} />
                  <QuantityField label="U-value" unit="W/m²K" reg={r(`windows.${i}.uValue`)} error={e.windows?.[i]?.uValue} hint="maker's figure" />
                  <button type="button" className="btn-quiet mb-0.5 px-2" onClick={() => windows.remove(i)} aria-label={`Remove window ${i + 1}`}><Trash2 size={14} aria-hidden="true" /></button>
                </div>
              ))}
              <button type="button" className="btn-quiet" onClick={() => windows.append({ id: newRowId('window'), face: 'walls', areaM2: '', uValue: '' })}><Plus size={14} aria-hidden="true" /> Add a window</button>
            </div>
          </fieldset>
        </fieldset>
      </form>
      <section className="space-y-4" aria-label="Heating results" data-testid="heat-results">
        {h.uValues.map((u) => (
          <div key={u.face} className="panel p-3">
            <h3 className="text-sm font-semibold">{FACE[u.face]} build-up: U = <span className="font-mono" data-testid={`u-${u.face}`}>{f2(u.u)} W/m²K</span></h3>
            <table className="mt-1 w-full text-left text-xs">
              <thead><tr className="text-ink-soft"><th className="py-1">Layer</th><th className="pl-3 text-right">mm</th><th className="pl-3 text-right">λ W/m·K</th><th className="pl-3 text-right">R m²K/W</th><th className="pl-3">λ from</th></tr></thead>
              <tbody>
                {u.layers.map((l, i) => (
                  <tr key={i} className="border-t border-paper-edge">
                    <td className="py-1">{l.material}</td>
                    <td className="text-right font-mono">{l.thicknessMm}</td>
                    <td className="text-right font-mono">{l.lambda ?? '?'}</td>
                    <td className="text-right font-mono">{l.r === null ? '—' : f2(l.r)}</td>
                    <td className="pl-3 text-ink-soft">{l.source ?? 'unknown: not counted'}</td>
                  </tr>
                ))}
                <tr className="border-t border-paper-edge text-ink-soft"><td className="py-1">Surface resistances (EN ISO 6946 Table 7, from memory)</td><td /><td /><td className="text-right font-mono">{f2(u.rTotal - u.layers.reduce((a, l) => a + (l.r ?? 0), 0))}</td><td /></tr>
              </tbody>
            </table>
          </div>
        ))}
        <div className="panel space-y-1 p-3 text-sm">
          <p>Heat loss: <span className="font-mono" data-testid="heat-wk">{f1(h.totalWPerK)} W/K</span> <span className="text-ink-soft">({h.faces.map((fc) => `${fc.face} ${f1(fc.wPerK)}`).join(', ')}, windows {f1(h.windowsWPerK)}, air {f1(h.ventilationWPerK)} W/K)</span></p>
          <p>Heat needed at <span className="font-mono">{h.deltaK} K</span>: <span className="font-mono" data-testid="heat-required">{formatNumber(h.requiredW)} W</span></p>
          <p>Heaters drawn: <span className="font-mono">{formatNumber(h.heaterW)} W</span> {h.heaterIds.length === 0 && <span className="text-ink-soft">(no heater module)</span>}</p>
          <p className="text-xs text-ink-soft">Steel ribs and pillars bridge the insulation and are not counted: keep a margin on the heater. Air: 0.34 W/(m³K) per air change an hour (EN 12831, from memory).</p>
        </div>
        {h.heaterIds.length > 0 && fuel !== 'electric' && (
          <Caution>
            <p>{PLANNING_CAUTION.heating}{fuel === 'gas' ? ` ${PLANNING_CAUTION.gasHeater}` : ''}</p>
          </Caution>
        )}
        <FindingList findings={findingsOf(findings, 'heat.')} testId="findings-heat" />
      </section>
    </div>
  );
}
