'use client';
/**
 * Power: the 12 V system's inputs — battery by chemistry (with its usable depth of discharge),
 * loads with presets, solar (default system losses), alternator and hook-up charging, 230 V,
 * circuits — beside the results (PowerResults) and the `power.*` findings. Edits only
 * `systems.power`, through the page's onSystems.
 */
import { useId, useMemo, useState } from 'react';
import { useFieldArray } from 'react-hook-form';
import { Plus, Trash2 } from 'lucide-react';
import { BATTERY_CHEMISTRIES } from '@/lib/layout/vocabulary';
import { CHEMISTRIES, LOAD_PRESETS, PVWATTS_DEFAULT_LOSSES_PCT, solarArray } from '@/lib/planning';
import { formatNumber } from '@/lib/format';
import { CheckField, FieldGroup, QuantityField } from '../fields';
import { newRowId } from '../ids';
import type { PanelProps } from '../panelProps';
import { shown } from '../quantities';
import { useSectionForm } from '../useSectionForm';
import { powerDefaults, powerSchema, powerSystems } from './powerForm';
import { PowerResults } from './PowerResults';
import { moduleLabel } from '@/lib/layout/kinds';

export function PowerPanel({ doc, readOnly, onSystems, onValidity, findings }: PanelProps) {
  const uid = useId();
  const form = useSectionForm({
    schema: powerSchema,
    defaults: () => powerDefaults(doc),
    onParsed: (v) => onSystems({ power: powerSystems(v, doc.systems?.power) }),
    onValidity,
  });
  const loads = useFieldArray({ control: form.control, name: 'loads' });
  const circuits = useFieldArray({ control: form.control, name: 'circuits' });
  const [preset, setPreset] = useState(LOAD_PRESETS[0].id);
  const e = form.formState.errors;
  const r = form.register;
  const chemistry = form.watch('chemistry');
  const facts = chemistry ? CHEMISTRIES[chemistry] : null;
  // Panels drawn on the roof give the array's rated power; the typed field stands in where none is.
  const array = useMemo(() => solarArray(doc), [doc]);
  const moduleLoads = useMemo(() => doc.modules.filter((m) => m.kind !== 'heater' && m.props && 'watts' in m.props && typeof m.props.watts === 'number'), [doc.modules]);

  const addPreset = () => {
    const p = LOAD_PRESETS.find((x) => x.id === preset)!;
    loads.append({
      id: newRowId(p.id), label: p.load.label, watts: shown(p.load.watts), hoursPerDay: shown(p.load.hoursPerDay),
      dutyPct: p.load.dutyCycle === undefined ? '' : shown(p.load.dutyCycle * 100), supply: p.load.supply ?? 'dc',
    });
  };

  return (
    <div className="grid gap-6 xl:grid-cols-2">
      <form className="space-y-4" onSubmit={(ev) => ev.preventDefault()} noValidate aria-label="Power inputs">
        <fieldset disabled={readOnly} className="space-y-4">
          <FieldGroup title="Leisure battery" note={facts ? `${facts.title}: planned at ${facts.usableDodPct} % usable depth of discharge and ${facts.chargeEfficiencyPct} % charge efficiency (common practice, no source); override below.` : 'Capacity at the 20-hour rate (C20).'}>
            <div>
              <label className="label" htmlFor="p-chem">Chemistry</label>
              <select id="p-chem" className="field" {...r('chemistry')}>
                <option value="">No battery yet</option>
                {BATTERY_CHEMISTRIES.map((c) => <option key={c} value={c}>{CHEMISTRIES[c].title} — {CHEMISTRIES[c].usableDodPct} % usable</option>)}
              </select>
              {e.chemistry && <p className="field-error">{e.chemistry.message}</p>}
            </div>
            <QuantityField label="Capacity (C20)" unit="Ah" reg={r('capacityAh')} error={e.capacityAh} />
            <QuantityField label="Nominal volts" unit="V" reg={r('volts')} error={e.volts} placeholder={facts ? String(facts.nominalVolts) : '12'} />
            <QuantityField label="Usable depth of discharge" unit="%" reg={r('usableDodPct')} error={e.usableDodPct} placeholder={facts ? String(facts.usableDodPct) : ''} hint="empty: the chemistry's figure" />
            <QuantityField label="Charge efficiency" unit="%" reg={r('chargeEfficiencyPct')} error={e.chargeEfficiencyPct} placeholder={facts ? String(facts.chargeEfficiencyPct) : ''} />
            <QuantityField label="Days without charging, target" unit="days" reg={r('autonomyDaysTarget')} error={e.autonomyDaysTarget} placeholder="2" />
          </FieldGroup>

          <fieldset className="rounded-sm border border-paper-edge p-3">
            <legend className="px-1 text-sm font-semibold">12 V loads</legend>
            <CheckField
              reg={r('includeModuleLoads')}
              label={`Count the drawn appliances' own draw${moduleLoads.length ? ` (${moduleLoads.map((m) => moduleLabel(m)).join(', ')})` : ''}`}
              hint="modules with watts and a duty cycle in their details, such as a compressor fridge"
            />
            <div className="mt-3 space-y-2">
              {loads.fields.map((f, i) => (
                <div key={f.id} className="grid grid-cols-2 sm:grid-cols-[1fr_6rem_6rem_6rem_5rem_auto] items-end gap-2">
                  <div>
                    <label className="label" htmlFor={`${uid}-load-${i}`}>Load</label>
                    <input id={`${uid}-load-${i}`} className="field" {...r(`loads.${i}.label`)} />
                    {e.loads?.[i]?.label && <p className="field-error">{e.loads[i]?.label?.message}</p>}
                  </div>
                  <QuantityField label="Draw" unit="W" reg={r(`loads.${i}.watts`)} error={e.loads?.[i]?.watts} />
                  <QuantityField label="Hours a day" unit="h" reg={r(`loads.${i}.hoursPerDay`)} error={e.loads?.[i]?.hoursPerDay} />
                  <QuantityField label="or duty" unit="%" reg={r(`loads.${i}.dutyPct`)} error={e.loads?.[i]?.dutyPct} />
                  <div>
                    <label className="label" htmlFor={`${uid}-supply-${i}`}>Supply</label>
                    <select id={`${uid}-supply-${i}`} className="field" {...r(`loads.${i}.supply`)}><option value="dc">12 V</option><option value="ac">230 V</option></select>
                  </div>
                  <button type="button" className="btn-quiet mb-0.5 px-2" onClick={() => loads.remove(i)} aria-label={`Remove load ${i + 1}`}><Trash2 size={14} aria-hidden="true" /></button>
                </div>
              ))}
              <div className="flex flex-wrap items-end gap-2">
                <div>
                  <label className="label" htmlFor="p-preset">Preset</label>
                  <select id="p-preset" className="field" value={preset} onChange={(ev) => setPreset(ev.target.value)}>
                    {LOAD_PRESETS.map((p) => <option key={p.id} value={p.id}>{p.label}</option>)}
                  </select>
                </div>
                <button type="button" className="btn-quiet" onClick={addPreset}><Plus size={14} aria-hidden="true" /> Add preset</button>
                <button type="button" className="btn-quiet" onClick={() => loads.append({ id: newRowId('load'), label: '', watts: '', hoursPerDay: '', dutyPct: '', supply: 'dc' })}><Plus size={14} aria-hidden="true" /> Add a load</button>
              </div>
              <p className="text-xs text-ink-soft">{LOAD_PRESETS.find((p) => p.id === preset)?.note}. Measure or read the maker&apos;s plate for the real figure.</p>
            </div>
          </fieldset>

          <FieldGroup title="Charging" note={`Solar losses default to ${PVWATTS_DEFAULT_LOSSES_PCT.toFixed(2)} %, the ten default system losses of a national laboratory's published technical report (NREL/TP-6A20-62641, 2014) taken together. Peak sun hours: the daily irradiation on the panel for your region and season, from a published solar irradiation map or dataset.`}>
            {array?.basis === 'drawn' ? (
              <div>
                <p className="label">Solar panels</p>
                <p className="py-1.5 font-mono text-sm" data-testid="solar-from-roof">
                  From the roof plan: {array.panels} {array.panels === 1 ? 'panel' : 'panels'}, {formatNumber(array.watts)} W
                </p>
                <p className="text-xs text-ink-soft">The rated power of the panels drawn on the roof, added up; change a panel&apos;s in the editor&apos;s Details panel. Peak sun hours below still count.</p>
              </div>
            ) : (
              <QuantityField label="Solar panels" unit="W" reg={r('solarWatts')} error={e.solarWatts} />
            )}
            <QuantityField label="Sun, summer" unit="h/day" reg={r('pshSummer')} error={e.pshSummer} />
            <QuantityField label="Sun, spring/autumn" unit="h/day" reg={r('pshShoulder')} error={e.pshShoulder} />
            <QuantityField label="Sun, winter" unit="h/day" reg={r('pshWinter')} error={e.pshWinter} />
            <QuantityField label="Solar system losses" unit="%" reg={r('solarLossesPct')} error={e.solarLossesPct} placeholder={PVWATTS_DEFAULT_LOSSES_PCT.toFixed(2)} />
            <QuantityField label="Alternator / DC-DC charger" unit="A" reg={r('alternatorAmps')} error={e.alternatorAmps} />
            <QuantityField label="Driving a day" unit="h" reg={r('drivingHours')} error={e.drivingHours} />
            <QuantityField label="Hook-up charger" unit="A" reg={r('chargerAmps')} error={e.chargerAmps} />
            <QuantityField label="On hook-up a day" unit="h" reg={r('hookupHours')} error={e.hookupHours} />
            <QuantityField label="Inverter efficiency" unit="%" reg={r('inverterEfficiencyPct')} error={e.inverterEfficiencyPct} placeholder="90" />
          </FieldGroup>

          <FieldGroup title="230 V (hook-up, inverter, sockets)">
            <CheckField reg={r('mainsPresent')} label="230 V is fitted" />
            <CheckField reg={r('mainsRcd')} label="30 mA RCD on every 230 V circuit" />
            <CheckField reg={r('mainsElectrician')} label="Installed and tested by a qualified electrician" />
          </FieldGroup>

          <fieldset className="rounded-sm border border-paper-edge p-3">
            <legend className="px-1 text-sm font-semibold">Circuits (cable sizing)</legend>
            <div className="space-y-2">
              {circuits.fields.map((f, i) => (
                <div key={f.id} className="grid grid-cols-2 sm:grid-cols-[1fr_5rem_6rem_5rem_6rem_auto] items-end gap-2">
                  <div>
                    <label className="label" htmlFor={`${uid}-circ-${i}`}>Circuit</label>
                    <input id={`${uid}-circ-${i}`} className="field" {...r(`circuits.${i}.label`)} />
                    <label className="mt-1 flex items-center gap-1 text-xs"><input type="checkbox" className="accent-copper" {...r(`circuits.${i}.critical`)} /> critical (3 % drop)</label>
                  </div>
                  <QuantityField label="Current" unit="A" reg={r(`circuits.${i}.amps`)} error={e.circuits?.[i]?.amps} />
                  <QuantityField label="One way" unit="m" reg={r(`circuits.${i}.lengthM`)} error={e.circuits?.[i]?.lengthM} />
                  <QuantityField label="Volts" unit="V" reg={r(`circuits.${i}.volts`)} error={e.circuits?.[i]?.volts} placeholder="12" />
                  <QuantityField label="Fitted" unit="mm²" reg={r(`circuits.${i}.fittedMm2`)} error={e.circuits?.[i]?.fittedMm2} />
                  <button type="button" className="btn-quiet mb-5 px-2" onClick={() => circuits.remove(i)} aria-label={`Remove circuit ${i + 1}`}><Trash2 size={14} aria-hidden="true" /></button>
                </div>
              ))}
              <button type="button" className="btn-quiet" onClick={() => circuits.append({ id: newRowId('circuit'), label: '', amps: '', lengthM: '', volts: '', critical: true, fittedMm2: '' })}>
                <Plus size={14} aria-hidden="true" /> Add a circuit
              </button>
            </div>
          </fieldset>
        </fieldset>
      </form>
      <PowerResults doc={doc} findings={findings} />
    </div>
  );
}
