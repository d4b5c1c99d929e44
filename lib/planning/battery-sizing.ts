/**
 * Leisure battery sizing: usable energy by chemistry, days of autonomy, and the capacity a daily
 * budget needs.
 *
 * Usable depth of discharge and charge efficiency by chemistry are common practice, no source:
 * lead-acid and AGM are kept above half charge for a reasonable cycle life (50 %); LiFePO4 is
 * commonly planned at 80 %. Charge efficiency: lead-acid/AGM ≈ 85 %, LiFePO4 ≈ 95 % (common
 * practice, no source). Capacities are C20 figures (the 20-hour rate) as EN 1648-2 counts them
 * (secondary).
 *
 * Pure numbers. Must never import UI, framework or database code.
 */
import type { BatteryChemistry } from '../layout';

export interface ChemistryFacts {
  title: string;
  usableDodPct: number;
  chargeEfficiencyPct: number;
  /** Typical nominal volts of a "12 V" block. */
  nominalVolts: number;
}

/** Common practice, no source (see header). */
export const CHEMISTRIES: Record<BatteryChemistry, ChemistryFacts> = {
  'lead-acid': { title: 'Flooded lead-acid', usableDodPct: 50, chargeEfficiencyPct: 85, nominalVolts: 12 },
  agm: { title: 'AGM lead-acid', usableDodPct: 50, chargeEfficiencyPct: 85, nominalVolts: 12 },
  lifepo4: { title: 'Lithium iron phosphate (LiFePO4)', usableDodPct: 80, chargeEfficiencyPct: 95, nominalVolts: 12.8 },
};

/** Usable energy, Wh: Ah × V × DoD. */
export function usableWh(capacityAh: number, volts: number, usableDodPct: number): number {
  if (!(capacityAh >= 0) || !(volts > 0)) throw new RangeError('capacity must be zero or more and volts positive');
  if (!(usableDodPct > 0 && usableDodPct <= 100)) throw new RangeError('usable depth of discharge must be above 0 and at most 100 %');
  return capacityAh * volts * (usableDodPct / 100);
}

/** Capacity needed, Ah C20: daily Wh × days ÷ (DoD × V). */
export function batteryAhFor({ dailyWh, days, usableDodPct, volts }: { dailyWh: number; days: number; usableDodPct: number; volts: number }): number {
  if (!(dailyWh >= 0) || !(days >= 0)) throw new RangeError('daily energy and days must be zero or more');
  if (!(volts > 0)) throw new RangeError('volts must be positive');
  if (!(usableDodPct > 0 && usableDodPct <= 100)) throw new RangeError('usable depth of discharge must be above 0 and at most 100 %');
  return (dailyWh * days) / ((usableDodPct / 100) * volts);
}

/** Days the usable energy carries the daily use with no charging (Infinity when nothing is used). */
export function autonomyDays(usable: number, dailyWh: number): number {
  if (!(usable >= 0) || !(dailyWh >= 0)) throw new RangeError('energies must be zero or more');
  return dailyWh === 0 ? Infinity : usable / dailyWh;
}

/** EN 1648-2 cl. 4.3.2: auxiliary battery of at least 60 Ah (C20) (secondary: quoted in trade literature; standard text not consulted). */
export const EN1648_MIN_AUX_AH = 60;
