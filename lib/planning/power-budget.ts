/**
 * The daily 12 V energy budget: loads (the loads table plus modules that draw power, such as a
 * compressor fridge with `watts` and `dutyCycle`), charging by season (solar — the panels drawn
 * on the roof, else the typed array, `solar-array.ts` —, alternator, hook-up), the battery's usable energy, the daily balance and the days of autonomy without sun.
 *
 * `powerBudget(doc)` returns the `PowerBudget` DTO for the Power panel and the plan sheet.
 * Charging energy into the battery is discounted by the chemistry's charge efficiency; AC loads by
 * the inverter efficiency (default 90 %, common practice, no source). Alternator and hook-up
 * charging: amps × hours × battery volts (a charger's nominal output; a DC-DC charger or split
 * relay limits what the alternator gives).
 *
 * Pure: reads a LayoutDoc, never throws on a valid one. Must never import UI, framework or database code.
 */
import type { LayoutDoc } from '../layout';
import { autonomyDays, batteryAhFor, CHEMISTRIES, usableWh } from './battery-sizing';
import { INPUTS, type InputNeed } from './inputs';
import { moduleFacts, moduleName } from './module-facts';
import { solarArray, type SolarArray } from './solar-array';
import { PVWATTS_DEFAULT_LOSSES_PCT, solarDailyWh } from './solar-yield';

export const DEFAULT_INVERTER_EFFICIENCY_PCT = 90; // common practice, no source
export const DEFAULT_AUTONOMY_DAYS = 2; // common practice, no source

export const SEASONS = ['summer', 'shoulder', 'winter'] as const;
export type Season = (typeof SEASONS)[number];

export interface BudgetLoad {
  id: string;
  label: string;
  watts: number;
  hoursPerDay: number;
  supply: 'dc' | 'ac';
  /** Wh a day drawn from the battery (AC loads include inverter losses). */
  whPerDay: number;
  moduleId?: string;
}

export interface SeasonBalance {
  season: Season;
  solarWh: number;
  /** All charging into the battery after charge efficiency. */
  chargeWh: number;
  useWh: number;
  /** chargeWh − useWh: positive means the battery keeps up. */
  netWh: number;
  /** Days until the usable energy runs out at this deficit (null when the balance holds or there is no battery). */
  daysToEmpty: number | null;
}

export interface PowerBudget {
  loads: BudgetLoad[];
  dailyUseWh: number;
  battery: null | {
    chemistry: string;
    capacityAh: number;
    volts: number;
    usableDodPct: number;
    chargeEfficiencyPct: number;
    usableWh: number;
  };
  /** The array counted: the panels drawn on the roof, else the typed watts; null when neither. */
  solar: SolarArray | null;
  /** An array is there but the peak sun hours by season are not typed: the balance waits for them. */
  sunHoursMissing: boolean;
  solarLossesPct: number;
  alternatorWh: number;
  hookupWh: number;
  seasons: SeasonBalance[];
  /** Days the battery carries the loads with no charging at all. */
  autonomyDays: number | null;
  autonomyDaysTarget: number;
  /** Ah (C20) the battery needs for the target days at its chemistry and volts. */
  requiredAh: number | null;
  /** Inputs to enter, by their on-screen label. */
  missing: InputNeed[];
}

function hoursOf(hoursPerDay: number | undefined, dutyCycle: number | undefined): number {
  return hoursPerDay ?? (dutyCycle ?? 0) * 24;
}

export function powerBudget(doc: LayoutDoc): PowerBudget {
  const power = doc.systems?.power ?? {};
  const missing: InputNeed[] = [];
  const inverterEff = (power.inverterEfficiencyPct ?? DEFAULT_INVERTER_EFFICIENCY_PCT) / 100;
  const loads: BudgetLoad[] = [];

  if (power.includeModuleLoads !== false) {
    for (const m of doc.modules) {
      // A heater's power is its heat output (no load here); enter its fan draw as a load.
      const load = moduleFacts(m).load;
      if (load === undefined) continue;
      const watts = load.watts;
      // No hours or duty cycle on the module: counted as running all day (errs high).
      const hours = hoursOf(load.hoursPerDay, load.dutyCycle ?? 1);
      loads.push({ id: `module:${m.id}`, label: moduleName(m), watts, hoursPerDay: hours, supply: 'dc', whPerDay: watts * hours, moduleId: m.id });
    }
  }
  for (const l of power.loads ?? []) {
    const hours = hoursOf(l.hoursPerDay, l.dutyCycle);
    const supply = l.supply ?? 'dc';
    const wh = l.watts * hours * (supply === 'ac' ? 1 / inverterEff : 1);
    loads.push({ id: l.id, label: l.label, watts: l.watts, hoursPerDay: hours, supply, whPerDay: wh });
  }
  const dailyUseWh = loads.reduce((a, l) => a + l.whPerDay, 0);

  let battery: PowerBudget['battery'] = null;
  if (power.battery) {
    const facts = CHEMISTRIES[power.battery.chemistry];
    const dod = power.battery.usableDodPct ?? facts.usableDodPct;
    const eff = power.battery.chargeEfficiencyPct ?? facts.chargeEfficiencyPct;
    battery = {
      chemistry: power.battery.chemistry,
      capacityAh: power.battery.capacityAh,
      volts: power.battery.volts,
      usableDodPct: dod,
      chargeEfficiencyPct: eff,
      usableWh: usableWh(power.battery.capacityAh, power.battery.volts, dod),
    };
  } else missing.push(INPUTS.battery);

  const volts = battery?.volts ?? 12;
  const chargeEff = (battery?.chargeEfficiencyPct ?? 100) / 100;
  const solarLossesPct = power.solar?.lossesPct ?? PVWATTS_DEFAULT_LOSSES_PCT;
  const alternatorWh = power.alternator ? power.alternator.amps * power.alternator.drivingHoursPerDay * volts : 0;
  const hookupWh = power.hookup ? power.hookup.chargerAmps * power.hookup.hoursPerDay * volts : 0;
  // Panels drawn on the roof give the array's rated power; the typed figure stands in where none is drawn.
  const solar = solarArray(doc);
  const sun = power.solar?.peakSunHours;
  const sunHoursMissing = solar !== null && sun === undefined;
  if (!solar && !power.alternator && !power.hookup) missing.push(INPUTS.charging);
  if (sunHoursMissing) missing.push(INPUTS.sunSummer, INPUTS.sunShoulder, INPUTS.sunWinter);

  const seasons = SEASONS.map((season): SeasonBalance => {
    const solarWh = solar && sun ? solarDailyWh(solar.watts, sun[season], solarLossesPct) : 0;
    const chargeWh = (solarWh + alternatorWh + hookupWh) * chargeEff;
    const netWh = chargeWh - dailyUseWh;
    const daysToEmpty = battery && netWh < 0 ? battery.usableWh / -netWh : null;
    return { season, solarWh, chargeWh, useWh: dailyUseWh, netWh, daysToEmpty };
  });

  const autonomyDaysTarget = power.autonomyDaysTarget ?? DEFAULT_AUTONOMY_DAYS;
  return {
    loads,
    dailyUseWh,
    battery,
    solar,
    sunHoursMissing,
    solarLossesPct,
    alternatorWh,
    hookupWh,
    seasons,
    autonomyDays: battery ? autonomyDays(battery.usableWh, dailyUseWh) : null,
    autonomyDaysTarget,
    requiredAh: battery ? batteryAhFor({ dailyWh: dailyUseWh, days: autonomyDaysTarget, usableDodPct: battery.usableDodPct, volts: battery.volts }) : null,
    missing,
  };
}
