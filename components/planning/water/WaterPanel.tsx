'use client';
/**
 * Water: who uses the water and how much a day, beside the tanks drawn on the plan — fresh and
 * grey litres, days between fills, the self-containment minimum (NZS 5465, as cited) — and the
 * `water.*` findings. Edits only `systems.water`; tank sizes live on the tank modules.
 */
import { useMemo } from 'react';
import * as z from 'zod/mini';
import { DEFAULT_L_PER_PERSON_DAY, NZS5465_DAYS, NZS5465_L_PER_PERSON_DAY, waterBasisWords, waterPlan } from '@/lib/planning';
import type { LayoutDoc } from '@/lib/layout';
import { kindFacts } from '@/lib/layout/kinds';
import { FindingList, findingsOf } from '../FindingList';
import { FieldGroup, QuantityField } from '../fields';
import type { PanelProps } from '../panelProps';
import { compact, field, shown } from '../quantities';
import { useSectionForm } from '../useSectionForm';
import { formatNumber } from '@/lib/format';

export const waterSchema = z.object({
  persons: field.plain(['', 'people', 'persons'], 'a whole number, e.g. 2', { min: 1, max: 12, int: true })(false),
  litresPerPersonPerDay: field.plain(['L', 'l', 'L/day'], 'litres a day, e.g. 10 L', { min: 0.5, max: 300 })(false),
});

export function waterDefaults(doc: LayoutDoc): z.input<typeof waterSchema> {
  return { persons: shown(doc.systems?.water?.persons), litresPerPersonPerDay: shown(doc.systems?.water?.litresPerPersonPerDay) };
}

export function WaterPanel({ doc, readOnly, onSystems, onValidity, findings }: PanelProps) {
  const form = useSectionForm({
    schema: waterSchema,
    defaults: () => waterDefaults(doc),
    onParsed: (v) => onSystems({ water: compact(v) }),
    onValidity,
  });
  const e = form.formState.errors;
  const w = useMemo(() => waterPlan(doc), [doc]);
  const tanks = doc.modules.filter((m) => kindFacts(m).water !== undefined);
  return (
    <div className="grid gap-6 xl:grid-cols-2">
      <form className="space-y-4" onSubmit={(ev) => ev.preventDefault()} noValidate aria-label="Water inputs">
        <fieldset disabled={readOnly}>
          <FieldGroup title="Water use" note="Tank sizes come from the tank modules on the plan: the capacity typed in the Details panel, else the drawn inside volume.">
            <QuantityField label="People using the water" unit="people" reg={form.register('persons')} error={e.persons} placeholder={String(Math.max(1, doc.occupants.sleepers.length))} hint="empty: the sleepers" />
            <QuantityField label="Use per person a day" unit="L" reg={form.register('litresPerPersonPerDay')} error={e.litresPerPersonPerDay} placeholder={String(DEFAULT_L_PER_PERSON_DAY)} hint="empty: 10 L (drinking, cooking, washing up, a wash; common practice, no source)" />
          </FieldGroup>
        </fieldset>
      </form>
      <section className="space-y-4" aria-label="Water results" data-testid="water-results">
        <div className="panel grid gap-2 p-3 text-sm sm:grid-cols-2">
          <p>Fresh water: <span className="font-mono" data-testid="water-fresh">{formatNumber(w.freshL, 1)} L</span> <span className="text-ink-soft">({formatNumber(w.freshFullKg, 1)} kg full; {waterBasisWords(w.freshBasis)})</span></p>
          <p>Grey water: <span className="font-mono">{formatNumber(w.greyL, 1)} L</span> <span className="text-ink-soft">({waterBasisWords(w.greyBasis)})</span></p>
          <p>Lasts: <span className="font-mono" data-testid="water-days">{w.days === null ? '—' : `${formatNumber(w.days, 1)} days`}</span> <span className="text-ink-soft">for {w.persons} at {w.litresPerPersonPerDay} L a day</span></p>
          <p>Self-contained minimum: <span className="font-mono">{w.nzsMinimumL} L</span> <span className="text-ink-soft">({NZS5465_L_PER_PERSON_DAY} L × {NZS5465_DAYS} days each; NZS 5465, as cited)</span></p>
        </div>
        {tanks.length === 0 && <p className="text-sm text-ink-soft">No water tanks are drawn: add fresh and grey water tanks from the Parts shelf in the editor.</p>}
        <FindingList findings={findingsOf(findings, 'water.')} testId="findings-water" />
      </section>
    </div>
  );
}
