'use client';
/**
 * Gas and ventilation: the gas locker and its drop-out vent, the fixed ventilation EN 721 asks
 * of the living space, the installer's certificate and the CO and LPG alarms, beside what the
 * plan holds (gas appliances, lockers, cylinders), the vent each locker needs, the EN 721
 * figures for this floor, the gas caution and the `gas.*` findings. Edits `systems.gas` and
 * `systems.alarms` only.
 */
import { useMemo } from 'react';
import { en721Ventilation, gasInventory, lockerVentRequiredCm2 } from '@/lib/planning';
import { moduleLabel } from '@/lib/layout/kinds';
import { FindingList, findingsOf } from '../FindingList';
import { Caution, CheckField, FieldGroup, QuantityField, YesNoField } from '../fields';
import type { PanelProps } from '../panelProps';
import { useSectionForm } from '../useSectionForm';
import { gasDefaults, gasSchema, gasSystems } from './gasForm';
import { PLANNING_CAUTION } from '@/lib/layout/cautions';
import { formatNumber } from '@/lib/format';

export function GasPanel({ doc, readOnly, onSystems, onValidity, findings }: PanelProps) {
  const form = useSectionForm({ schema: gasSchema, defaults: () => gasDefaults(doc), onParsed: (v) => onSystems(gasSystems(v)), onValidity });
  const e = form.formState.errors;
  const r = form.register;
  const inv = useMemo(() => gasInventory(doc), [doc]);
  const vent = doc.systems?.gas?.ventilation ?? {};
  const floorM2 = vent.floorAreaM2 ?? (doc.bay.length * doc.bay.width) / 1e6;
  const flueless = inv.appliances.some((a) => a.flueless);
  const need = floorM2 > 0 ? en721Ventilation(floorM2, flueless, vent.highVentInRoof ?? false) : null;
  return (
    <div className="grid gap-6 xl:grid-cols-2">
      <form className="space-y-4" onSubmit={(ev) => ev.preventDefault()} noValidate aria-label="Gas and ventilation inputs">
        <fieldset disabled={readOnly} className="space-y-4">
          <FieldGroup title="Gas locker" note="Cylinders belong in a locker sealed from the living space, opening only to the outside, with a drop-out vent at its floor (DVGW G 607 / EN 1949, as cited).">
            <YesNoField label="Sealed from the living space" reg={r('sealed')} />
            <QuantityField label="Drop-out vent free area" unit="cm²" reg={r('ventAreaCm2')} error={e.ventAreaCm2} />
            <YesNoField label="Vent at the locker floor" reg={r('ventAtFloor')} />
            <YesNoField label="Cylinders strapped upright" reg={r('cylindersSecured')} />
            <QuantityField label="Cylinder tare (stamped)" unit="kg" reg={r('cylinderTareKg')} error={e.cylinderTareKg} hint="empty: taken as its gas content" />
          </FieldGroup>
          <FieldGroup title="Fixed ventilation of the living space" note="Vents that cannot be closed; opening windows and hatches do not count (EN 721, as cited).">
            <QuantityField label="High-level vent" unit="cm²" reg={r('highVentCm2')} error={e.highVentCm2} />
            <CheckField reg={r('highVentInRoof')} label="The high vent is a roof extract" />
            <QuantityField label="Low-level vent" unit="cm²" reg={r('lowVentCm2')} error={e.lowVentCm2} hint="within 100 mm of the floor" />
            <QuantityField label="Living floor area" unit="m²" reg={r('floorAreaM2')} error={e.floorAreaM2} placeholder={floorM2.toFixed(1)} hint="empty: the bay floor" />
          </FieldGroup>
          <FieldGroup title="Certificate and alarms">
            <CheckField reg={r('installerCertified')} label="Installed and tightness-tested by a qualified gas engineer, with a certificate" />
            <CheckField reg={r('alarmCo')} label="Carbon-monoxide alarm fitted" />
            <CheckField reg={r('alarmLpg')} label="LPG alarm fitted near the floor" />
          </FieldGroup>
        </fieldset>
      </form>
      <section className="space-y-4" aria-label="Gas and ventilation results" data-testid="gas-results">
        <div className="panel space-y-2 p-3 text-sm">
          <p>Gas appliances: {inv.appliances.length ? inv.appliances.map((a) => `${a.name}${a.flueless ? ' (flueless)' : ' (room-sealed)'}`).join(', ') : 'none drawn'}.</p>
          <p>Cylinders: <span className="font-mono">{inv.cylinders}</span>{inv.gasKg > 0 && <span className="font-mono"> ({inv.gasKg} kg of gas)</span>}.</p>
          {inv.lockers.map((l) => {
            const floorCm2 = (l.length * l.width) / 100;
            return (
              <p key={l.id}>
                {moduleLabel(l)}: floor <span className="font-mono">{formatNumber(floorCm2)} cm²</span>, drop-out vent needed <span className="font-mono">{Math.round(lockerVentRequiredCm2(floorCm2))} cm²</span> <span className="text-ink-soft">(2 % of the floor, at least 100 cm²)</span>
              </p>
            );
          })}
          <p>
            Fixed ventilation for <span className="font-mono">{floorM2.toFixed(1)} m²</span>:{' '}
            {need ? <><span className="font-mono">{need.highCm2} cm²</span> high and <span className="font-mono">{need.lowCm2} cm²</span> low <span className="text-ink-soft">({need.band})</span></> : 'beyond the 10 m² the cited EN 721 figures cover: read EN 721 itself'}
          </p>
        </div>
        {inv.present && (
          <Caution>
            {PLANNING_CAUTION.gas.map((t) => <p key={t}>{t}</p>)}
          </Caution>
        )}
        <FindingList findings={findingsOf(findings, 'gas.')} testId="findings-gas" />
      </section>
    </div>
  );
}
