/**
 * DC cable sizing for a circuit: the smallest conductor that keeps the voltage drop within its
 * allowance and carries the current within its ampacity, in IEC metric sizes and in AWG.
 *
 * Voltage drop over the round trip: V = I × ρ × 2L ÷ A (Ohm's law; ρ of copper, see conductors.ts).
 * Allowances: 3 % for critical circuits, 10 % for others (ABYC E-11, voltage-drop tables, as
 * cited in the brief; secondary, clause not checked). Ampacity: 33 CFR 183.425 (from memory).
 *
 * `cableSize({ amps, lengthM, volts, maxDropPct })` → `CableChoice`. Throws RangeError on
 * nonsense input (negative amps, zero length or volts); the check rules validate first.
 * Pure numbers. Must never import UI, framework or database code.
 */
import { ampacity, AWG_SIZES, COPPER_RESISTIVITY, METRIC_SIZES_MM2, type InsulationRating } from './conductors';

/** ABYC E-11 (as cited): 3 % for critical circuits, 10 % for the rest. */
export const DROP_CRITICAL_PCT = 3;
export const DROP_NON_CRITICAL_PCT = 10;

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
  dropV: number;
  dropPct: number;
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

/** Voltage drop over the round trip, V. */
export function voltageDrop(amps: number, lengthM: number, areaMm2: number): number {
  if (!(areaMm2 > 0)) throw new RangeError('cross-section must be positive');
  return (amps * COPPER_RESISTIVITY * 2 * lengthM) / areaMm2;
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
  const amp = ampacity(areaMm2, i.insulationC ?? 105, { bundled: i.bundled, engineSpace: i.engineSpace });
  if (amp === null) return null;
  const dropV = voltageDrop(i.amps, i.lengthM, areaMm2);
  return { label, areaMm2, dropV, dropPct: (dropV / i.volts) * 100, ampacityA: amp };
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
  const amp = ampacity(areaMm2, i.insulationC ?? 105, { bundled: i.bundled, engineSpace: i.engineSpace }) ?? 0;
  const dropV = voltageDrop(i.amps, i.lengthM, areaMm2);
  const o = { label: `${areaMm2} mm²`, areaMm2, dropV, dropPct: (dropV / i.volts) * 100, ampacityA: amp };
  return { ...o, ok: o.dropPct <= i.maxDropPct + 1e-9 && amp >= i.amps };
}
