/**
 * The Power panel's form: battery, loads (with presets), solar, alternator and hook-up
 * charging, 230 V, and the circuits to size cable for — text fields that read into
 * `systems.power`. Circuit details this form does not show (insulation rating, bundling, engine
 * space, a drop allowance of its own) are kept from the document by circuit id. Where solar
 * panels are drawn on the roof their rated power replaces the typed watts (`arrayDrawn`, read
 * once with the defaults): the sun hours are then asked for without it, and a typed figure is
 * kept for when the panels go. Pure TypeScript; must never invent a value for an empty field.
 */
import * as z from 'zod/mini';
import { BATTERY_CHEMISTRIES } from '@/lib/layout/vocabulary';
import type { CircuitData, LayoutDoc, PowerData, PowerLoad } from '@/lib/layout';
import { solarArray } from '@/lib/planning/solar-array';
import { compact, field, shown } from '../quantities';

const watts = field.plain(['W'], 'watts, e.g. 45 W', { min: 0, max: 10_000 });
const hours = field.plain(['h', 'h/day'], 'hours a day, e.g. 4 h', { min: 0, max: 24 });
const pct = (min: number, max: number) => field.plain(['%'], 'a percentage, e.g. 80 %', { min, max });
const amps = field.plain(['A'], 'amps, e.g. 10 A', { min: 0, max: 1000 });
const psh = field.plain(['h', 'kWh/m²'], 'peak sun hours, e.g. 4.5', { min: 0, max: 12 });

export const powerSchema = z
  .object({
    chemistry: z.enum(['', ...BATTERY_CHEMISTRIES]),
    capacityAh: field.plain(['Ah'], 'amp-hours, e.g. 200 Ah', { min: 1, max: 5000 })(false),
    volts: field.plain(['V'], 'volts, e.g. 12.8 V', { min: 6, max: 60 })(false),
    usableDodPct: pct(5, 100)(false),
    chargeEfficiencyPct: pct(50, 100)(false),
    includeModuleLoads: z.boolean(),
    loads: z.array(z.object({
      id: z.string(),
      label: z.string().check(z.trim(), z.minLength(1, 'name the load'), z.maxLength(80)),
      watts: watts(true),
      hoursPerDay: hours(false),
      dutyPct: pct(0, 100)(false),
      supply: z.enum(['dc', 'ac']),
    }).check(z.superRefine((l, ctx) => {
      if (l.hoursPerDay === undefined && l.dutyPct === undefined) ctx.addIssue({ code: 'custom', path: ['hoursPerDay'], message: 'hours a day or a duty cycle' });
    }))).check(z.maxLength(60)),
    /** Solar panels are drawn on the roof: their rated power stands in for the typed watts. */
    arrayDrawn: z.boolean(),
    solarWatts: watts(false),
    pshSummer: psh(false),
    pshShoulder: psh(false),
    pshWinter: psh(false),
    solarLossesPct: pct(0, 100)(false),
    alternatorAmps: field.plain(['A'], 'amps, e.g. 30 A', { min: 0, max: 500 })(false),
    drivingHours: hours(false),
    chargerAmps: field.plain(['A'], 'amps, e.g. 20 A', { min: 0, max: 200 })(false),
    hookupHours: hours(false),
    mainsPresent: z.boolean(),
    mainsRcd: z.boolean(),
    mainsElectrician: z.boolean(),
    inverterEfficiencyPct: pct(50, 100)(false),
    autonomyDaysTarget: field.plain(['days', 'd'], 'days, e.g. 2', { min: 0.5, max: 30 })(false),
    circuits: z.array(z.object({
      id: z.string(),
      label: z.string().check(z.trim(), z.minLength(1, 'name the circuit'), z.maxLength(80)),
      amps: amps(true),
      lengthM: field.metres({ min: 0.05, max: 100 })(true),
      volts: field.plain(['V'], 'volts, e.g. 12 V', { min: 6, max: 60 })(false),
      critical: z.boolean(),
      fittedMm2: field.plain(['mm²', 'mm2'], 'a cross-section, e.g. 6 mm²', { min: 0.1, max: 500 })(false),
    })).check(z.maxLength(60)),
  })
  .check(z.superRefine((v, ctx) => {
    const some = (...xs: unknown[]) => xs.some((x) => x !== undefined);
    if ((v.chemistry === '') !== (v.capacityAh === undefined)) ctx.addIssue({ code: 'custom', path: [v.chemistry === '' ? 'chemistry' : 'capacityAh'], message: 'choose the chemistry and give the capacity' });
    if (v.chemistry !== '' && v.volts === undefined) ctx.addIssue({ code: 'custom', path: ['volts'], message: 'give the nominal volts' });
    const sunTyped = some(v.pshSummer, v.pshShoulder, v.pshWinter, v.solarLossesPct);
    if (sunTyped && v.solarWatts === undefined && !v.arrayDrawn) ctx.addIssue({ code: 'custom', path: ['solarWatts'], message: 'give the panels’ watts' });
    if (v.arrayDrawn ? sunTyped : v.solarWatts !== undefined) for (const k of ['pshSummer', 'pshShoulder', 'pshWinter'] as const) if (v[k] === undefined) ctx.addIssue({ code: 'custom', path: [k], message: 'peak sun hours for each season' });
    if ((v.alternatorAmps === undefined) !== (v.drivingHours === undefined)) ctx.addIssue({ code: 'custom', path: [v.alternatorAmps === undefined ? 'alternatorAmps' : 'drivingHours'], message: 'give both amps and hours' });
    if ((v.chargerAmps === undefined) !== (v.hookupHours === undefined)) ctx.addIssue({ code: 'custom', path: [v.chargerAmps === undefined ? 'chargerAmps' : 'hookupHours'], message: 'give both amps and hours' });
  }));
export type PowerInput = z.input<typeof powerSchema>;
export type PowerOutput = z.output<typeof powerSchema>;

export function powerDefaults(doc: LayoutDoc): PowerInput {
  const p = doc.systems?.power ?? {};
  return {
    chemistry: p.battery?.chemistry ?? '',
    capacityAh: shown(p.battery?.capacityAh),
    volts: shown(p.battery?.volts),
    usableDodPct: shown(p.battery?.usableDodPct),
    chargeEfficiencyPct: shown(p.battery?.chargeEfficiencyPct),
    includeModuleLoads: p.includeModuleLoads !== false,
    loads: (p.loads ?? []).map((l) => ({
      id: l.id, label: l.label, watts: shown(l.watts), hoursPerDay: shown(l.hoursPerDay),
      dutyPct: l.dutyCycle === undefined ? '' : shown(l.dutyCycle * 100), supply: l.supply ?? 'dc',
    })),
    arrayDrawn: solarArray(doc)?.basis === 'drawn',
    solarWatts: shown(p.solar?.watts),
    pshSummer: shown(p.solar?.peakSunHours.summer),
    pshShoulder: shown(p.solar?.peakSunHours.shoulder),
    pshWinter: shown(p.solar?.peakSunHours.winter),
    solarLossesPct: shown(p.solar?.lossesPct),
    alternatorAmps: shown(p.alternator?.amps),
    drivingHours: shown(p.alternator?.drivingHoursPerDay),
    chargerAmps: shown(p.hookup?.chargerAmps),
    hookupHours: shown(p.hookup?.hoursPerDay),
    mainsPresent: p.mains?.present ?? false,
    mainsRcd: p.mains?.rcd ?? false,
    mainsElectrician: p.mains?.installedByElectrician ?? false,
    inverterEfficiencyPct: shown(p.inverterEfficiencyPct),
    autonomyDaysTarget: shown(p.autonomyDaysTarget),
    circuits: (p.circuits ?? []).map((c) => ({
      id: c.id, label: c.label, amps: shown(c.amps), lengthM: shown(c.lengthM), volts: shown(c.volts), critical: c.critical, fittedMm2: shown(c.fittedMm2),
    })),
  };
}

export function powerSystems(v: PowerOutput, previous: PowerData | undefined): PowerData | undefined {
  const prevCircuits = new Map((previous?.circuits ?? []).map((c) => [c.id, c]));
  const loads = v.loads.map((l): PowerLoad => ({
    id: l.id, label: l.label, watts: l.watts!, supply: l.supply,
    ...(l.hoursPerDay !== undefined ? { hoursPerDay: l.hoursPerDay } : { dutyCycle: Math.round(l.dutyPct! * 100) / 10_000 }),
  }));
  const circuits = v.circuits.map((c): CircuitData => {
    const kept = prevCircuits.get(c.id);
    return {
      ...(kept ? compact({ insulationC: kept.insulationC, bundled: kept.bundled, engineSpace: kept.engineSpace, maxDropPct: kept.maxDropPct }) : {}),
      id: c.id, label: c.label, amps: c.amps!, lengthM: c.lengthM!, critical: c.critical,
      ...(c.volts !== undefined ? { volts: c.volts } : {}),
      ...(c.fittedMm2 !== undefined ? { fittedMm2: c.fittedMm2 } : {}),
    };
  });
  const mainsAny = v.mainsPresent || v.mainsRcd || v.mainsElectrician;
  return compact({
    battery: v.chemistry !== '' && v.capacityAh !== undefined && v.volts !== undefined
      ? { chemistry: v.chemistry, capacityAh: v.capacityAh, volts: v.volts, ...compact({ usableDodPct: v.usableDodPct, chargeEfficiencyPct: v.chargeEfficiencyPct }) }
      : undefined,
    loads: loads.length ? loads : undefined,
    includeModuleLoads: v.includeModuleLoads ? undefined : false,
    // With panels drawn the sun hours may come alone (the typed watts, if any, kept for later);
    // without, the typed watts bring them. Either way all three seasons are there (the schema asks).
    solar: v.pshSummer !== undefined && v.pshShoulder !== undefined && v.pshWinter !== undefined && (v.solarWatts !== undefined || v.arrayDrawn)
      ? { ...(v.solarWatts !== undefined ? { watts: v.solarWatts } : {}), peakSunHours: { summer: v.pshSummer, shoulder: v.pshShoulder, winter: v.pshWinter }, ...(v.solarLossesPct !== undefined ? { lossesPct: v.solarLossesPct } : {}) }
      : undefined,
    alternator: v.alternatorAmps !== undefined ? { amps: v.alternatorAmps, drivingHoursPerDay: v.drivingHours! } : undefined,
    hookup: v.chargerAmps !== undefined ? { chargerAmps: v.chargerAmps, hoursPerDay: v.hookupHours! } : undefined,
    mains: mainsAny ? { present: v.mainsPresent, ...(v.mainsRcd ? { rcd: true } : {}), ...(v.mainsElectrician ? { installedByElectrician: true } : {}) } : undefined,
    inverterEfficiencyPct: v.inverterEfficiencyPct,
    autonomyDaysTarget: v.autonomyDaysTarget,
    circuits: circuits.length ? circuits : undefined,
  }) as PowerData | undefined;
}
