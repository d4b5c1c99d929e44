/**
 * The Weight panel's form: the base vehicle as registered or weighed, and the load carried,
 * as text fields that read into `systems.vehicle` and `systems.load`. Pure TypeScript (no
 * React), so the conversion both ways is tested on its own. Must never invent a value for a
 * field left empty: empty stays absent, and the checks ask for it.
 */
import * as z from 'zod/mini';
import type { LayoutDoc, LengthUnit, PayloadItem, Systems } from '@/lib/layout';
import { compact, field, shown, shownLength } from '../quantities';

export function weightSchema(units: LengthUnit) {
  const mass = field.mass({ max: 10_000 });
  const x = field.length(units, { min: -20_000, max: 40_000 });
  const count = field.plain(['', 'seats', 'people'], 'a whole number, e.g. 2', { min: 1, max: 12, int: true });
  const pct = field.plain(['%'], 'a percentage, e.g. 100 %', { min: 0, max: 100 });
  return z
    .object({
      massInRunningOrderKg: mass(false),
      frontAxleRunningOrderKg: mass(false),
      maxAuthorisedMassKg: mass(false),
      maxFrontAxleKg: mass(false),
      maxRearAxleKg: mass(false),
      wheelbaseMm: field.length(units, { min: 1000, max: 8000 })(false),
      frontAxleX: x(false),
      overallLengthMm: field.length(units, { min: 2000, max: 15_000 })(false),
      seats: count(false),
      cabSeatX: x(false),
      travellers: count(false),
      personalEffectsKg: field.mass({ max: 2000 })(false),
      personalEffectsX: x(false),
      freshFillPct: pct(false),
      greyFillPct: pct(false),
      items: z.array(z.object({
        id: z.string(),
        label: z.string().check(z.trim(), z.minLength(1, 'name the item'), z.maxLength(80)),
        massKg: field.mass({ max: 2000 })(true),
        x: x(true),
      })).check(z.maxLength(50)),
    })
    .check(z.superRefine((v, ctx) => {
      if (v.frontAxleRunningOrderKg !== undefined && v.massInRunningOrderKg !== undefined && v.frontAxleRunningOrderKg > v.massInRunningOrderKg) {
        ctx.addIssue({ code: 'custom', path: ['frontAxleRunningOrderKg'], message: 'more than the whole mass in running order' });
      }
    }));
}
export type WeightInput = z.input<ReturnType<typeof weightSchema>>;
export type WeightOutput = z.output<ReturnType<typeof weightSchema>>;

export function weightDefaults(doc: LayoutDoc, units: LengthUnit): WeightInput {
  const v = doc.systems?.vehicle ?? {};
  const l = doc.systems?.load ?? {};
  return {
    massInRunningOrderKg: shown(v.massInRunningOrderKg),
    frontAxleRunningOrderKg: shown(v.frontAxleRunningOrderKg),
    maxAuthorisedMassKg: shown(v.maxAuthorisedMassKg),
    maxFrontAxleKg: shown(v.maxFrontAxleKg),
    maxRearAxleKg: shown(v.maxRearAxleKg),
    wheelbaseMm: shownLength(v.wheelbaseMm, units),
    frontAxleX: shownLength(v.frontAxleX, units),
    overallLengthMm: shownLength(v.overallLengthMm, units),
    seats: shown(v.seats),
    cabSeatX: shownLength(v.cabSeatX, units),
    travellers: shown(l.travellers),
    personalEffectsKg: shown(l.personalEffectsKg),
    personalEffectsX: shownLength(l.personalEffectsX, units),
    freshFillPct: shown(l.freshFillPct),
    greyFillPct: shown(l.greyFillPct),
    items: (l.items ?? []).map((i) => ({ id: i.id, label: i.label, massKg: shown(i.massKg), x: shownLength(i.x, units) })),
  };
}

/** The parsed form as the two systems sections it owns (an emptied section becomes absent). */
export function weightSystems(v: WeightOutput, previous: Systems | undefined): Pick<Systems, 'vehicle' | 'load'> {
  const prevItems = new Map((previous?.load?.items ?? []).map((i) => [i.id, i]));
  return {
    vehicle: compact({
      massInRunningOrderKg: v.massInRunningOrderKg,
      frontAxleRunningOrderKg: v.frontAxleRunningOrderKg,
      maxAuthorisedMassKg: v.maxAuthorisedMassKg,
      maxFrontAxleKg: v.maxFrontAxleKg,
      maxRearAxleKg: v.maxRearAxleKg,
      wheelbaseMm: v.wheelbaseMm,
      frontAxleX: v.frontAxleX,
      overallLengthMm: v.overallLengthMm,
      seats: v.seats,
      cabSeatX: v.cabSeatX,
    }),
    load: compact({
      travellers: v.travellers,
      personalEffectsKg: v.personalEffectsKg,
      personalEffectsX: v.personalEffectsX,
      freshFillPct: v.freshFillPct,
      greyFillPct: v.greyFillPct,
      // y is not edited here: keep a side position the document already had.
      items: v.items.length
        ? v.items.map((i): PayloadItem => {
          const y = prevItems.get(i.id)?.y;
          return { id: i.id, label: i.label, massKg: i.massKg!, x: i.x!, ...(y !== undefined ? { y } : {}) };
        })
        : undefined,
    }),
  };
}
