'use client';
/**
 * Weight: the base vehicle's plate and weighbridge figures and the load carried, with the
 * results beside them — laden mass against the maximum authorised mass, each axle by the lever
 * rule against its limit, the payload left against EN 1646-2 / Reg. (EU) No 1230/2012, the
 * licence caution for a maximum authorised mass above 3500 kg, the mass-and-balance table, a plan
 * with the centre of mass — and the `mass.*` findings.
 * Edits only `systems.vehicle` and `systems.load`, through the page's onSystems.
 */
import { useId, useMemo } from 'react';
import { useFieldArray } from 'react-hook-form';
import { Plus, Trash2 } from 'lucide-react';
import { massBalance, personalEffectsAllowance, userPayloadRequired } from '@/lib/planning';
import { CATEGORY_B_LIMIT_KG } from '@/lib/checks/systems/mass';
import { FindingList, findingsOf } from '../FindingList';
import { Caution, FieldGroup, QuantityField } from '../fields';
import { LimitBar } from '../LimitBar';
import { newRowId } from '../ids';
import type { PanelProps } from '../panelProps';
import { useSectionForm } from '../useSectionForm';
import { CentreOfMassPlan } from './CentreOfMassPlan';
import { MassBalanceTable } from './MassBalanceTable';
import { weightDefaults, weightSchema, weightSystems } from './weightForm';

export function WeightPanel({ doc, units, readOnly, onSystems, onValidity, findings }: PanelProps) {
  const uid = useId();
  const schema = useMemo(() => weightSchema(units), [units]);
  const form = useSectionForm({
    schema,
    defaults: () => weightDefaults(doc, units),
    onParsed: (v) => onSystems(weightSystems(v, doc.systems)),
    onValidity,
  });
  const items = useFieldArray({ control: form.control, name: 'items' });
  const e = form.formState.errors;
  const balance = useMemo(() => massBalance(doc), [doc]);
  const report = balance.report;
  const v = doc.systems?.vehicle ?? {};
  const payloadLeft = v.maxAuthorisedMassKg !== undefined && v.massInRunningOrderKg !== undefined ? v.maxAuthorisedMassKg - report.builtKg : null;
  const payloadNeeded = report.lengthM !== null ? userPayloadRequired(report.seats, report.lengthM) : null;
  const effectsHint = report.lengthM !== null ? `empty: EN 1646-2 allowance, ${Math.round(personalEffectsAllowance(report.seats, report.lengthM))} kg` : 'empty: EN 1646-2 allowance (needs the overall length)';
  // Category B depends on the maximum authorised mass only; a van laden above it is overloaded.
  const overLicence = (v.maxAuthorisedMassKg ?? 0) > CATEGORY_B_LIMIT_KG;
  const r = form.register;
  const len = units;

  return (
    <div className="grid gap-6 xl:grid-cols-2">
      <form className="space-y-4" onSubmit={(ev) => ev.preventDefault()} noValidate aria-label="Weight inputs">
        <fieldset disabled={readOnly} className="space-y-4">
          <FieldGroup title="Base vehicle" note="From the vehicle plate or certificate of conformity, or a weighbridge ticket. Positions are along the bay from the front of the load floor; ahead of it is negative.">
            <QuantityField label="Mass in running order" unit="kg" reg={r('massInRunningOrderKg')} error={e.massInRunningOrderKg} hint="driver (75 kg) and fuel included" testId="w-miro" />
            <QuantityField label="Mass in running order on the front axle" unit="kg" reg={r('frontAxleRunningOrderKg')} error={e.frontAxleRunningOrderKg} hint="weighbridge, driver aboard" />
            <QuantityField label="Maximum authorised mass" unit="kg" reg={r('maxAuthorisedMassKg')} error={e.maxAuthorisedMassKg} testId="w-mam" />
            <QuantityField label="Front axle limit" unit="kg" reg={r('maxFrontAxleKg')} error={e.maxFrontAxleKg} />
            <QuantityField label="Rear axle limit" unit="kg" reg={r('maxRearAxleKg')} error={e.maxRearAxleKg} />
            <QuantityField label="Wheelbase" unit={len} reg={r('wheelbaseMm')} error={e.wheelbaseMm} />
            <QuantityField label="Front axle position" unit={len} reg={r('frontAxleX')} error={e.frontAxleX} hint="usually negative" />
            <QuantityField label="Overall length" unit={len} reg={r('overallLengthMm')} error={e.overallLengthMm} />
            <QuantityField label="Seats for travel" unit="seats" reg={r('seats')} error={e.seats} placeholder={String(report.seats)} hint="driver included; empty: cab and belted seats" />
            <QuantityField label="Cab seat position" unit={len} reg={r('cabSeatX')} error={e.cabSeatX} hint="hip point, usually negative" />
          </FieldGroup>
          <FieldGroup title="Load on the road">
            <QuantityField label="Travellers" unit="people" reg={r('travellers')} error={e.travellers} placeholder={String(report.seats)} hint="driver included; empty: every seat" />
            <QuantityField label="Personal effects" unit="kg" reg={r('personalEffectsKg')} error={e.personalEffectsKg} hint={effectsHint} />
            <QuantityField label="Effects stowed at" unit={len} reg={r('personalEffectsX')} error={e.personalEffectsX} hint="empty: middle of the bay" />
            <QuantityField label="Fresh water fill" unit="%" reg={r('freshFillPct')} error={e.freshFillPct} placeholder="100" />
            <QuantityField label="Grey water fill" unit="%" reg={r('greyFillPct')} error={e.greyFillPct} placeholder="0" />
          </FieldGroup>
          <fieldset className="rounded-sm border border-paper-edge p-3">
            <legend className="px-1 text-sm font-semibold">Other payload (bikes, roof box, tools)</legend>
            <div className="space-y-2">
              {items.fields.map((f, i) => (
                <div key={f.id} className="grid grid-cols-2 sm:grid-cols-[1fr_8rem_8rem_auto] items-end gap-2">
                  <div>
                    <label className="label" htmlFor={`${uid}-item-${i}`}>Item</label>
                    <input id={`${uid}-item-${i}`} className="field" {...r(`items.${i}.label`)} />
                    {e.items?.[i]?.label && <p className="field-error">{e.items[i]?.label?.message}</p>}
                  </div>
                  <QuantityField label="Mass" unit="kg" reg={r(`items.${i}.massKg`)} error={e.items?.[i]?.massKg} />
                  <QuantityField label="At" unit={len} reg={r(`items.${i}.x`)} error={e.items?.[i]?.x} />
                  <button type="button" className="btn-quiet mb-0.5 px-2" onClick={() => items.remove(i)} aria-label={`Remove ${form.getValues(`items.${i}.label`) || 'item'}`}>
                    <Trash2 size={14} aria-hidden="true" />
                  </button>
                </div>
              ))}
              <button type="button" className="btn-quiet" onClick={() => items.append({ id: newRowId('item'), label: '', massKg: '', x: '' })}>
                <Plus size={14} aria-hidden="true" /> Add an item
              </button>
            </div>
          </fieldset>
        </fieldset>
      </form>

      <section className="space-y-4" aria-label="Weight results">
        <div className="panel space-y-3 p-3" data-testid="weight-results">
          <LimitBar label="Laden mass" value={v.massInRunningOrderKg !== undefined ? report.totalKg : null} limit={v.maxAuthorisedMassKg ?? null} unit="kg" testId="bar-total" />
          <LimitBar label="Front axle" value={report.axles?.frontKg ?? null} limit={v.maxFrontAxleKg ?? null} unit="kg" testId="bar-front" />
          <LimitBar label="Rear axle" value={report.axles?.rearKg ?? null} limit={v.maxRearAxleKg ?? null} unit="kg" testId="bar-rear" />
          <LimitBar label="User payload left" value={payloadLeft} limit={payloadNeeded} unit="kg" atLeast />
          <p className="text-xs text-ink-soft">
            Axle loads by the lever rule (moments about the front axle). User payload needed: 75 kg for each passenger beside the driver, plus personal effects of 10 kg × persons + 10 kg × overall length in metres (EN 1646-2, secondary; Reg. (EU) No 1230/2012 gives the same figure, from memory).
          </p>
        </div>
        <MassBalanceTable balance={balance} />
        <CentreOfMassPlan doc={doc} report={report} />
        {(overLicence || doc.modules.some((m) => m.kind === 'seat')) && (
          <Caution>
            {overLicence && <p>With a maximum authorised mass above 3,500 kg a category B driving licence is not enough (Directive 2006/126/EC; from memory): check your licence, or have the van downplated to 3,500 kg.</p>}
            {doc.modules.some((m) => m.kind === 'seat') && <p>Travel seats, belts and their anchorages must be of an approved type and anchored as tested (UN ECE R14, R16, R17; from memory). Have the installation inspected under local rules.</p>}
          </Caution>
        )}
        <FindingList findings={findingsOf(findings, 'mass.')} testId="findings-mass" />
      </section>
    </div>
  );
}
