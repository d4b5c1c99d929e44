/**
 * DC cable sizing for a circuit: the smallest conductor that keeps the voltage drop within its
 * allowance and carries the current within its ampacity, in IEC metric sizes and in AWG.
 *
 * Voltage drop over the round trip: V = I × ρ × 2L ÷ A (Ohm's law; ρ of copper at a conductor
 * temperature of 20 °C, see conductors.ts), as a share of the system's NOMINAL voltage (12 V or
 * 24 V) — not the battery's resting 12.8 V, which would quietly allow 6.7 % more drop. Each option
 * also reports the drop with the conductor at its insulation's rated temperature (the hottest it
 * may run within its ampacity), the warm case. Allowances: 3 % for critical circuits, 10 % for
 * others (ABYC E-11 as reproduced in cable makers' published tables: secondary, clause not
 * checked). Ampacity: 33 CFR 183.425 Table 5.
 *
 * `cableSize({ amps, lengthM, volts, maxDropPct })` → `CableChoice`. Throws RangeError on
 * nonsense input (negative amps, zero length or volts); the check rules validate first.
 * Pure numbers. Must never import UI, framework or database code.
 */
import { ampacity, AWG_SIZES, copperResistivity, COPPER_RESISTIVITY, METRIC_SIZES_MM2, type InsulationRating } from './conductors';

/** ABYC E-11 (secondary): 3 % for critical circuits, 10 % for the rest. */
export const DROP_CRITICAL_PCT = 3;
export const DROP_NON_CRITICAL_PCT = 10;
export const DEFAULT_INSULATION_C: InsulationRating = 105;

/**
 * The nominal voltage of a DC system from its battery's nominal volts: a 12.8 V LiFePO4 bank is a
 * 12 V system, 25.6 V a 24 V one (nominal system voltages of 12, 24 and 48 V: common practice, no source).
 */
export function nominalSystemVolts(batteryVolts: number): number {
  if (!Number.isFinite(batteryVolts) || batteryVolts <= 0) throw new RangeError('volts must be positive');
  if (batteryVolts < 18) return 12;
  if (batteryVolts < 36) return 24;
  return 48;
}

export interface CableInput {
  amps: number;
  /** One-way length, m; the return conductor doubles it. */
  lengthM: number;
  volts: number;
  maxDropPct: number;
  insulationC?: InsulationRating;
  bundled?: number;
  engineSpace?: boolean;
}

export interface CableOption {
  label: string;
  areaMm2: number;
  /** Drop with the conductor at 20 °C, V and % of the circuit's volts. */
  dropV: number;
  dropPct: number;
  /** Drop with the conductor at its insulation's rated temperature, % (the warm case). */
  warmDropPct: number;
  ampacityA: number;
}

export interface CableChoice {
  /** Least cross-section for the drop allowance alone, mm². */
  minAreaForDropMm2: number;
  /** Smallest IEC size meeting both drop and ampacity (null if none in the series does). */
  metric: CableOption | null;
  /** Smallest AWG size meeting both (null if none up to 4/0 does). */
  awg: CableOption | null;
  /** What decided the metric size. */
  governedBy: 'drop' | 'ampacity' | null;
}

function validate(i: CableInput): void {
  if (!Number.isFinite(i.amps) || i.amps < 0) throw new RangeError('amps must be zero or more');
  if (!Number.isFinite(i.lengthM) || i.lengthM <= 0) throw new RangeError('cable length must be a positive number of metres');
  if (!Number.isFinite(i.volts) || i.volts <= 0) throw new RangeError('volts must be positive');
  if (!Number.isFinite(i.maxDropPct) || i.maxDropPct <= 0 || i.maxDropPct >= 100) throw new RangeError('drop allowance must be between 0 and 100 %');
}

/** Voltage drop over the round trip, V, with the conductor at `conductorC` (default 20 °C). */
export function voltageDrop(amps: number, lengthM: number, areaMm2: number, conductorC?: number): number {
  if (!(areaMm2 > 0)) throw new RangeError('cross-section must be positive');
  const rho = conductorC === undefined ? COPPER_RESISTIVITY : copperResistivity(conductorC);
  return (amps * rho * 2 * lengthM) / areaMm2;
}

export function dropPct(amps: number, lengthM: number, areaMm2: number, volts: number): number {
  return (voltageDrop(amps, lengthM, areaMm2) / volts) * 100;
}

/** Least cross-section for a drop allowance, mm²: A = 2 ρ L I ÷ (V × pct/100). */
export function minAreaForDrop(i: CableInput): number {
  validate(i);
  return (2 * COPPER_RESISTIVITY * i.lengthM * i.amps) / (i.volts * (i.maxDropPct / 100));
}

function option(label: string, areaMm2: number, i: CableInput): CableOption | null {
  const rating = i.insulationC ?? DEFAULT_INSULATION_C;
  const amp = ampacity(areaMm2, rating, { bundled: i.bundled, engineSpace: i.engineSpace });
  if (amp === null) return null;
  const dropV = voltageDrop(i.amps, i.lengthM, areaMm2);
  const warmDropPct = (voltageDrop(i.amps, i.lengthM, areaMm2, rating) / i.volts) * 100;
  return { label, areaMm2, dropV, dropPct: (dropV / i.volts) * 100, warmDropPct, ampacityA: amp };
}

function fits(o: CableOption | null, i: CableInput): o is CableOption {
  return o !== null && o.dropPct <= i.maxDropPct + 1e-9 && o.ampacityA >= i.amps;
}

export function cableSize(i: CableInput): CableChoice {
  const minAreaForDropMm2 = minAreaForDrop(i);
  let metric: CableOption | null = null;
  for (const a of METRIC_SIZES_MM2) {
    const o = option(`${a} mm²`, a, i);
    if (fits(o, i)) { metric = o; break; }
  }
  let awg: CableOption | null = null;
  for (const s of AWG_SIZES) {
    const o = option(`${s.gauge} AWG`, s.areaMm2, i);
    if (fits(o, i)) { awg = o; break; }
  }
  let governedBy: CableChoice['governedBy'] = null;
  if (metric) {
    const dropOnly = METRIC_SIZES_MM2.find((a) => a >= minAreaForDropMm2 - 1e-9);
    governedBy = dropOnly !== undefined && dropOnly >= metric.areaMm2 ? 'drop' : 'ampacity';
  }
  return { minAreaForDropMm2, metric, awg, governedBy };
}

/** How a fitted cross-section performs on a circuit. */
export function checkFittedCable(i: CableInput, areaMm2: number): CableOption & { ok: boolean } {
  validate(i);
  const rating = i.insulationC ?? DEFAULT_INSULATION_C;
  const amp = ampacity(areaMm2, rating, { bundled: i.bundled, engineSpace: i.engineSpace }) ?? 0;
  const dropV = voltageDrop(i.amps, i.lengthM, areaMm2);
  const warmDropPct = (voltageDrop(i.amps, i.lengthM, areaMm2, rating) / i.volts) * 100;
  const o = { label: `${areaMm2} mm²`, areaMm2, dropV, dropPct: (dropV / i.volts) * 100, warmDropPct, ampacityA: amp };
  return { ...o, ok: o.dropPct <= i.maxDropPct + 1e-9 && amp >= i.amps };
}
