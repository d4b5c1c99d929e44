/**
 * Solar yield for a van roof: the PVWatts system-loss model and daily energy from peak sun hours.
 *
 * The PVWatts system-loss model combines its loss categories multiplicatively:
 * losses = 1 − Π(1 − lᵢ/100). Its defaults — soiling 2, shading 3, snow 0, mismatch 2, wiring 2,
 * connections 0.5, light-induced degradation 1.5, nameplate 1, age 0, availability 3 (%) — give
 * 14.08 %. Source: A. P. Dobos, "PVWatts Version 5 Manual", National Renewable Energy Laboratory
 * Technical Report NREL/TP-6A20-62641 (2014). Strength: secondary — the formula and the defaults
 * as reproduced from that report in reference documentation; the report text was not consulted.
 *
 * Pure numbers. Must never import UI, framework or database code.
 */

export interface PvwattsLossParts {
  soiling: number;
  shading: number;
  snow: number;
  mismatch: number;
  wiring: number;
  connections: number;
  lid: number;
  nameplateRating: number;
  age: number;
  availability: number;
}

/** Default loss categories, % (NREL/TP-6A20-62641, secondary). */
export const PVWATTS_DEFAULT_LOSS_PARTS: PvwattsLossParts = {
  soiling: 2,
  shading: 3,
  snow: 0,
  mismatch: 2,
  wiring: 2,
  connections: 0.5,
  lid: 1.5,
  nameplateRating: 1,
  age: 0,
  availability: 3,
};

/** Total system losses, %: 1 − Π(1 − lᵢ/100), × 100. */
export function pvwattsLosses(parts: PvwattsLossParts = PVWATTS_DEFAULT_LOSS_PARTS): number {
  let kept = 1;
  for (const [name, value] of Object.entries(parts)) {
    if (!Number.isFinite(value) || value < 0 || value > 100) throw new RangeError(`${name} loss must be between 0 and 100 %`);
    kept *= 1 - value / 100;
  }
  return (1 - kept) * 100;
}

/** The PVWatts default total, % (≈ 14.08). */
export const PVWATTS_DEFAULT_LOSSES_PCT = pvwattsLosses();

export const SOLAR_LOSS_SOURCE = 'System losses 14.08 %: the ten default losses multiplied together, A. P. Dobos, NREL Technical Report NREL/TP-6A20-62641 (2014) (secondary: figures as reproduced from the report)';

/**
 * Daily energy from the array, Wh: nameplate W × peak sun hours × (1 − losses). Peak sun hours are
 * kWh/m²/day of irradiation on the panel plane (1 kW/m² is the standard test condition irradiance, IEC 61215; from memory).
 */
export function solarDailyWh(watts: number, peakSunHours: number, lossesPct = PVWATTS_DEFAULT_LOSSES_PCT): number {
  if (!Number.isFinite(watts) || watts < 0) throw new RangeError('solar watts must be zero or more');
  if (!Number.isFinite(peakSunHours) || peakSunHours < 0) throw new RangeError('peak sun hours must be zero or more');
  if (!Number.isFinite(lossesPct) || lossesPct < 0 || lossesPct > 100) throw new RangeError('losses must be between 0 and 100 %');
  return watts * peakSunHours * (1 - lossesPct / 100);
}
