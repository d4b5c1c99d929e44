/**
 * Conductor data for 12/24 V cable sizing: copper resistivity, the AWG series, IEC metric sizes,
 * and the ampacity of boat/vehicle cable by insulation rating.
 *
 * - Copper resistivity at 20 °C: 1/58 Ω·mm²/m = 0.017241 (International Annealed Copper Standard,
 *   IEC 60028; from memory; the handbook figure usually rounded to 0.0172), with its temperature
 *   coefficient 0.00393 per K at 20 °C (IEC 60028, from memory): ρ(T) = ρ₂₀ × (1 + α (T − 20)).
 *   The unrounded value is used so results match tables computed from it.
 * - AWG diameters from the defining formula of ASTM B258: d = 0.127 mm × 92^((36 − n)/39),
 *   with 1/0 = n 0, 2/0 = −1, 3/0 = −2, 4/0 = −3.
 * - Metric sizes: the IEC 60228 nominal cross-section series.
 * - Ampacity: 33 CFR 183.425 Table 5 (allowable amperage of conductors by insulation temperature
 *   rating, 18 AWG to 4/0): the regulation text, read in a published reproduction of the CFR
 *   (standard text consulted). The engine-space factors (note 1 of Table 5) and the bundling
 *   factors are from memory.
 *
 * Plain numbers. Must never import UI, framework or database code.
 */

/** Ω·mm²/m at 20 °C (IEC 60028, 1/58; from memory). */
export const COPPER_RESISTIVITY = 1 / 58;
/** Temperature coefficient of annealed copper's resistance at 20 °C, per K (IEC 60028; from memory). */
export const COPPER_ALPHA_20 = 0.00393;
/** The conductor temperature the sizing assumes, °C. */
export const SIZING_CONDUCTOR_C = 20;

/** Copper resistivity at a conductor temperature, Ω·mm²/m. */
export function copperResistivity(conductorC: number = SIZING_CONDUCTOR_C): number {
  if (!Number.isFinite(conductorC) || conductorC < -50 || conductorC > 250) throw new RangeError('conductor temperature must be between −50 and 250 °C');
  return COPPER_RESISTIVITY * (1 + COPPER_ALPHA_20 * (conductorC - 20));
}

export const INSULATION_RATINGS = [60, 75, 80, 90, 105, 125, 200] as const;
export type InsulationRating = (typeof INSULATION_RATINGS)[number];

export interface AwgSize {
  gauge: string;
  /** The ASTM B258 gauge number (1/0 = 0, 2/0 = −1, …). */
  n: number;
  areaMm2: number;
  /** Allowable amps by insulation rating (33 CFR 183.425 Table 5). */
  amps: Record<InsulationRating, number>;
}

/** ASTM B258: diameter in mm of gauge number n. */
export function awgDiameterMm(n: number): number {
  return 0.127 * Math.pow(92, (36 - n) / 39);
}

export function awgAreaMm2(n: number): number {
  const d = awgDiameterMm(n);
  return (Math.PI / 4) * d * d;
}

// gauge, n, then amps at 60, 75, 80, 90, 105, 125, 200 °C — 33 CFR 183.425 Table 5 (regulation text).
const TABLE: [string, number, number[]][] = [
  ['18', 18, [10, 10, 15, 20, 20, 25, 25]],
  ['16', 16, [15, 15, 20, 25, 25, 30, 35]],
  ['14', 14, [20, 20, 25, 30, 35, 40, 45]],
  ['12', 12, [25, 25, 35, 40, 45, 50, 55]],
  ['10', 10, [40, 40, 50, 55, 60, 70, 70]],
  ['8', 8, [55, 65, 70, 70, 80, 90, 100]],
  ['6', 6, [80, 95, 100, 100, 120, 125, 135]],
  ['4', 4, [105, 125, 130, 135, 160, 170, 180]],
  ['3', 3, [120, 145, 150, 155, 180, 195, 210]],
  ['2', 2, [140, 170, 175, 180, 210, 225, 240]],
  ['1', 1, [165, 195, 210, 210, 245, 265, 280]],
  ['1/0', 0, [195, 230, 245, 245, 285, 305, 325]],
  ['2/0', -1, [225, 265, 285, 285, 330, 355, 370]],
  ['3/0', -2, [260, 310, 330, 330, 385, 410, 430]],
  ['4/0', -3, [300, 360, 385, 385, 445, 475, 510]],
];

export const AWG_SIZES: AwgSize[] = TABLE.map(([gauge, n, amps]) => ({
  gauge,
  n,
  areaMm2: awgAreaMm2(n),
  amps: Object.fromEntries(INSULATION_RATINGS.map((r, i) => [r, amps[i]])) as Record<InsulationRating, number>,
}));

/** Engine-space derating by insulation rating (33 CFR 183.425, from memory). */
export const ENGINE_SPACE_FACTOR: Record<InsulationRating, number> = { 60: 0.58, 75: 0.75, 80: 0.8, 90: 0.82, 105: 0.86, 125: 0.89, 200: 1 };

/** Bundling derating by the number of current-carrying conductors together (33 CFR 183.425, from memory). */
export function bundlingFactor(conductors: number): number {
  if (!Number.isInteger(conductors) || conductors < 1) throw new RangeError('conductors must be a whole number of at least 1');
  if (conductors <= 2) return 1;
  if (conductors === 3) return 0.7;
  if (conductors <= 6) return 0.6;
  if (conductors <= 24) return 0.5;
  return 0.4;
}

/** IEC 60228 nominal cross-sections, mm² (from 1 mm², the smallest the ampacity table covers). */
export const METRIC_SIZES_MM2 = [1, 1.5, 2.5, 4, 6, 10, 16, 25, 35, 50, 70, 95, 120] as const;

/**
 * Ampacity of a cross-section, A: that of the largest AWG size no bigger than it (a conservative
 * reading of the AWG table for metric cable), derated. Null below 18 AWG.
 */
export function ampacity(areaMm2: number, insulationC: InsulationRating = 105, opts: { bundled?: number; engineSpace?: boolean } = {}): number | null {
  let best: AwgSize | undefined;
  for (const s of AWG_SIZES) if (s.areaMm2 <= areaMm2 * (1 + 1e-9)) best = s;
  if (!best) return null;
  const factor = (opts.engineSpace ? ENGINE_SPACE_FACTOR[insulationC] : 1) * bundlingFactor(opts.bundled ?? 1);
  return best.amps[insulationC] * factor;
}
