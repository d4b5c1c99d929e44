/**
 * U-values of the build-ups and the bay's heat loss, to size the heater.
 *
 * U = 1 ÷ (Rsi + Σ dᵢ/λᵢ + Rse) (EN ISO 6946). Surface resistances, EN ISO 6946 Table 7 (from
 * memory): Rsi 0.10 m²K/W for heat flowing up (roof), 0.13 horizontal (walls), 0.17 down (floor);
 * Rse 0.04 in all directions. The steel skin adds next to nothing (1 mm at λ 50) and is left out;
 * steel ribs and pillars bridge the insulation and are NOT counted — keep a margin on the heater.
 * Areas are the bare-metal faces of the bay (floor, roof, both side walls, front and rear), less
 * any windows, which are counted with their own U. The windows are the bay's drawn openings
 * (windows in walls and doors on the walls, roof vents, fans and skylights on the roof) when any
 * is drawn, else the list typed on the heat tab; a drawn opening takes the area-weighted U of the
 * typed entries on its face, or DRAWN_OPENING_U when none is typed. Ventilation loss 0.34 W/(m³·K) × n × V
 * (volumetric heat capacity of air, EN 12831, from memory). Default design ΔT 20 K and 1 air change
 * an hour: common practice, no source.
 *
 * `heatLoss(doc)` → `HeatLossReport`; `uValue(layers, face)` for one build-up. Pure; never throws
 * on a valid LayoutDoc. Must never import UI, framework or database code.
 */
import type { Layer, LayoutDoc } from '../layout';
import { roofOpeningAreaM2, roofOpenings, windowAreaM2, windows as drawnWindows } from '../layout/openings';
import { conductivityOf } from './conductivity';
import { moduleFacts } from './module-facts';

export type Face = 'floor' | 'walls' | 'roof';

/** EN ISO 6946 Table 7 (from memory), m²K/W: Rsi by direction of heat flow, Rse 0.04 in all. */
export const RSI: Record<Face, number> = { roof: 0.1, walls: 0.13, floor: 0.17 };
export const RSE = 0.04;
/** EN 12831 (from memory): W per m³ per K per air change an hour. */
export const AIR_HEAT_CAPACITY = 0.34;
export const DEFAULT_DELTA_K = 20; // common practice, no source
export const DEFAULT_AIR_CHANGES = 1; // common practice, no source
/**
 * U of a drawn window or roof opening when no U is typed for its face, W/m²K: single glazing,
 * about 5.7 — from memory (no table consulted); errs high for double-glazed or acrylic units.
 */
export const DRAWN_OPENING_U = 5.7;
export const DRAWN_OPENING_U_SOURCE = 'single glazing about 5.7 W/m²K (from memory)';
export const U_VALUE_SOURCE = 'EN ISO 6946 (U = 1 ÷ (Rsi + Σ d/λ + Rse); surface resistances Table 7, from memory); λ from EN ISO 10456 Table 3 or typical declared values (from memory)';

/** The build-up's own resistance, without the two surface resistances, m²K/W. */
export function layerResistance(u: Pick<UValueResult, 'face' | 'rTotal'>): number {
  return u.rTotal - RSI[u.face] - RSE;
}

export interface LayerResistance {
  material: string;
  thicknessMm: number;
  lambda: number | null;
  /** m²K/W; null when λ is unknown. */
  r: number | null;
  source: string | null;
}

export interface UValueResult {
  face: Face;
  layers: LayerResistance[];
  rTotal: number;
  /** W/m²K. */
  u: number;
  /** Materials without a λ (their resistance is left out, so U errs high). */
  unknown: string[];
}

export function uValue(layers: Layer[], face: Face, overrides: Record<string, number> = {}): UValueResult {
  const rows: LayerResistance[] = layers.map((l) => {
    const c = conductivityOf(l.material, overrides);
    return { material: l.material, thicknessMm: l.thickness, lambda: c?.lambda ?? null, r: c ? l.thickness / 1000 / c.lambda : null, source: c?.source ?? null };
  });
  const rTotal = RSI[face] + RSE + rows.reduce((a, r) => a + (r.r ?? 0), 0);
  return { face, layers: rows, rTotal, u: 1 / rTotal, unknown: rows.filter((r) => r.lambda === null).map((r) => r.material) };
}

export interface FaceLoss {
  face: Face;
  areaM2: number;
  u: number;
  wPerK: number;
}

/** One glazed area counted in the heat loss. */
export interface GlazedArea {
  face: Face;
  areaM2: number;
  uValue: number;
}

export interface HeatLossReport {
  uValues: UValueResult[];
  faces: FaceLoss[];
  /** Where the windows came from: the drawn openings, the list typed on the heat tab, or none at all. */
  windowsFrom: 'drawn' | 'typed' | 'none';
  /** The glazed areas counted (drawn or typed). */
  windows: GlazedArea[];
  windowsWPerK: number;
  ventilationWPerK: number;
  totalWPerK: number;
  deltaK: number;
  /** Heat the heater must give at the design ΔT, W. */
  requiredW: number;
  /** Sum of the heater modules' `watts`, W (0 when none). */
  heaterW: number;
  heaterIds: string[];
  unknownMaterials: string[];
}

export function heatLoss(doc: LayoutDoc): HeatLossReport {
  const ins = doc.systems?.insulation ?? {};
  const overrides = ins.conductivities ?? {};
  const L = doc.bay.length / 1000;
  const W = doc.bay.width / 1000;
  const H = doc.bay.height / 1000;
  const { windows, windowsFrom } = glazedAreas(doc);
  const windowArea = (face: Face) => windows.filter((w) => w.face === face).reduce((a, w) => a + w.areaM2, 0);
  const gross: Record<Face, number> = { floor: L * W, roof: L * W, walls: 2 * L * H + 2 * W * H };
  const uValues = (['floor', 'walls', 'roof'] as Face[]).map((f) => uValue(doc.buildUp[f], f, overrides));
  const faces = uValues.map((u): FaceLoss => {
    const areaM2 = Math.max(0, gross[u.face] - windowArea(u.face));
    return { face: u.face, areaM2, u: u.u, wPerK: u.u * areaM2 };
  });
  const windowsWPerK = windows.reduce((a, w) => a + w.uValue * w.areaM2, 0);
  const ventilationWPerK = AIR_HEAT_CAPACITY * (ins.airChangesPerHour ?? DEFAULT_AIR_CHANGES) * L * W * H;
  const totalWPerK = faces.reduce((a, f) => a + f.wPerK, 0) + windowsWPerK + ventilationWPerK;
  const deltaK = ins.deltaK ?? DEFAULT_DELTA_K;
  const heaters = doc.modules.filter((m) => m.kind === 'heater');
  const heaterW = heaters.reduce((a, m) => a + Math.max(0, moduleFacts(m).heatOutputW ?? 0), 0);
  return {
    uValues,
    faces,
    windowsFrom,
    windows,
    windowsWPerK,
    ventilationWPerK,
    totalWPerK,
    deltaK,
    requiredW: totalWPerK * deltaK,
    heaterW,
    heaterIds: heaters.map((m) => m.id),
    unknownMaterials: [...new Set(uValues.flatMap((u) => u.unknown))],
  };
}

/**
 * The glazed areas of the bay: the drawn windows (walls) and roof openings (roof) when any is
 * drawn, else the typed list. A drawn opening's U is the area-weighted U of the typed entries on
 * its face, or DRAWN_OPENING_U when none is typed there.
 */
export function glazedAreas(doc: Pick<LayoutDoc, 'bay' | 'systems'>): { windows: GlazedArea[]; windowsFrom: HeatLossReport['windowsFrom'] } {
  const typed = (doc.systems?.insulation?.windows ?? []).map((w) => ({ face: w.face as Face, areaM2: w.areaM2, uValue: w.uValue }));
  const glass = drawnWindows(doc.bay).map((w) => ({ face: 'walls' as Face, areaM2: windowAreaM2(w) }));
  const roof = roofOpenings(doc.bay).map((o) => ({ face: 'roof' as Face, areaM2: roofOpeningAreaM2(o) }));
  const drawn = [...glass, ...roof];
  if (drawn.length === 0) return { windows: typed, windowsFrom: typed.length ? 'typed' : 'none' };
  const typedU = (face: Face) => {
    const on = typed.filter((w) => w.face === face);
    const area = on.reduce((a, w) => a + w.areaM2, 0);
    return area > 0 ? on.reduce((a, w) => a + w.uValue * w.areaM2, 0) / area : DRAWN_OPENING_U;
  };
  const u = { walls: typedU('walls'), roof: typedU('roof'), floor: DRAWN_OPENING_U };
  return { windows: drawn.map((w) => ({ ...w, uValue: u[w.face] })), windowsFrom: 'drawn' };
}
