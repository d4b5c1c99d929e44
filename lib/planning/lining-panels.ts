/**
 * Lining panels for the cut list: the wall and roof lining boards of the bay, from the innermost
 * build-up layer of the walls and of the roof when that layer is a sheet material (plywood, MDF,
 * fibreboard), each panel with the cut-outs the bay's openings make in it.
 *
 * Rules (common practice, no source; a starting list the workshop trims on fitting):
 * - Side walls are lined along the lined interior from the bulkhead to the rear, the rear wall from
 *   the left lining to the right, each from the finished floor up to the roof lining; door openings
 *   are left out (their own trim is not listed). Boards stand upright, one usable sheet width each,
 *   from the wall's start (the front end of a side wall, the left end of the rear wall); the last
 *   panel of a run is narrower. A wall taller than a board is split in rows.
 * - The roof is lined over the lined interior in strips one usable sheet width along the van,
 *   running across it.
 * - A window's cut-out is its glass size and a roof opening's its own size, where each crosses the
 *   panel: our simplification (common practice, no source); the real cut follows the frame maker's
 *   template. A window over two panels leaves its part in each.
 * - Wheel-arch notches, ribs and curves are marked on fitting, not listed.
 *
 * Frames: a cut-out's place is measured from the panel's edges as fitted — a side wall's panel from
 * its front edge and bottom edge, the rear wall's from its left edge and bottom edge, a roof panel's
 * from its front edge and left edge.
 *
 * Pure: plain numbers and the layout document in, panels out; must never import UI, framework or
 * database code.
 */
import type { Bay, Layer, LayoutDoc, Opening } from '../layout';
import { buildUpThickness, linedInterior } from '../layout/bay';
import { openingTitle, roofOpenings, windowOnWall, windows, type BayWall } from '../layout/openings';
import { materialFamily } from './conductivity';

/** One cut-out in one panel, placed from the panel's edges (mm). */
export interface CutOut {
  openingId: string;
  /** What the opening is: its label, else its kind in words ("Window in the left wall", "Roof vent"). */
  title: string;
  /** Across the panel: along the wall (walls), along the van (roof). */
  width: number;
  /** Up the panel (walls), across the van (roof). */
  height: number;
  /** From the panel's start edge: the front edge (side walls, roof), the left edge (rear wall). */
  fromStart: number;
  /** From the panel's second edge: the bottom edge (walls), the left edge (roof). */
  fromSecond: number;
  /** The edges those two figures run from, in words. */
  edges: readonly [string, string];
}

export type LiningSurface = BayWall | 'roof';

export interface LiningPanel {
  surface: LiningSurface;
  /** Across the panel (along the wall, or along the van on the roof), mm. */
  span: number;
  /** Up the panel (walls), across the van (roof), mm. */
  rise: number;
  /** The layer it is cut from. */
  layer: Layer;
  cutOuts: CutOut[];
}

/** Sheet materials a lining can be cut from (by their thermal-table family). */
const SHEET_FAMILIES = new Set(['plywood', 'mdf']);

const SURFACE_WORDS: Record<LiningSurface, string> = { left: 'Left wall lining', right: 'Right wall lining', rear: 'Rear wall lining', roof: 'Roof lining' };
const EDGE_WORDS: Record<LiningSurface, readonly [string, string]> = {
  left: ['front edge', 'bottom edge'],
  right: ['front edge', 'bottom edge'],
  rear: ['left edge', 'bottom edge'],
  roof: ['front edge', 'left edge'],
};

export function liningSurfaceName(s: LiningSurface): string {
  return SURFACE_WORDS[s];
}

/** The layer a surface is lined with: the innermost layer, when it is a sheet material. */
export function liningLayer(layers: readonly Layer[] | undefined): Layer | null {
  const inner = layers?.[layers.length - 1];
  if (!inner || !(inner.thickness > 0)) return null;
  const family = materialFamily(inner.material);
  return family && SHEET_FAMILIES.has(family) ? inner : null;
}

interface Span { a0: number; a1: number }

/** [from, to] less the door openings on that wall. */
function spansLessDoors(bay: Pick<Bay, 'doors'>, wall: BayWall, from: number, to: number): Span[] {
  const doors = bay.doors.filter((d) => d.wall === wall).map((d) => ({ a0: d.offset, a1: d.offset + d.width })).sort((p, q) => p.a0 - q.a0);
  const out: Span[] = [];
  let at = from;
  for (const d of doors) {
    if (d.a1 <= at) continue;
    if (d.a0 >= to) break;
    if (d.a0 > at) out.push({ a0: at, a1: d.a0 });
    at = Math.max(at, d.a1);
  }
  if (at < to) out.push({ a0: at, a1: to });
  return out;
}

/** Cuts [a0, a1] into steps of at most `step`, from a0. */
function strips(a0: number, a1: number, step: number): Span[] {
  const out: Span[] = [];
  for (let at = a0; at < a1; at += step) out.push({ a0: at, a1: Math.min(a1, at + step) });
  return out;
}

interface PanelRect { s0: number; s1: number; r0: number; r1: number }
interface OpeningRect { o: Opening; s0: number; s1: number; r0: number; r1: number }

function cutOutsOf(surface: LiningSurface, bay: Pick<Bay, 'doors'>, p: PanelRect, openings: OpeningRect[]): CutOut[] {
  const out: CutOut[] = [];
  for (const q of openings) {
    const s0 = Math.max(p.s0, q.s0);
    const s1 = Math.min(p.s1, q.s1);
    const r0 = Math.max(p.r0, q.r0);
    const r1 = Math.min(p.r1, q.r1);
    if (s1 <= s0 || r1 <= r0) continue;
    out.push({ openingId: q.o.id, title: openingTitle(bay, q.o), width: s1 - s0, height: r1 - r0, fromStart: s0 - p.s0, fromSecond: r0 - p.r0, edges: EDGE_WORDS[surface] });
  }
  return out;
}

/**
 * The lining panels of the walls and the roof, with their cut-outs, for boards of the given usable
 * size (`usableLength` along the grain, `usableWidth` across it). None when the usable board has no
 * size (the nesting then says why) or a surface's inner layer is not a sheet material.
 */
export function liningPanels(doc: Pick<LayoutDoc, 'bay' | 'buildUp'>, usableLength: number, usableWidth: number): LiningPanel[] {
  if (!(usableLength > 0 && usableWidth > 0)) return [];
  const { floorT, roofT } = buildUpThickness(doc);
  const lined = linedInterior(doc);
  const bay = doc.bay;
  const out: LiningPanel[] = [];

  const wallLayer = liningLayer(doc.buildUp?.walls);
  const z0 = floorT;
  const z1 = bay.height - roofT;
  if (wallLayer && z1 > z0 && lined.y1 > lined.y0) {
    for (const wall of ['left', 'right', 'rear'] as const) {
      const [from, to] = wall === 'rear' ? [lined.y0, lined.y1] : [lined.x0, lined.x1];
      const glass: OpeningRect[] = [];
      for (const w of windows(bay)) {
        const r = windowOnWall(bay, floorT, w);
        if (r && r.wall === wall) glass.push({ o: w, s0: r.along0, s1: r.along1, r0: r.z0, r1: r.z1 });
      }
      for (const span of spansLessDoors(bay, wall, from, to)) {
        for (const col of strips(span.a0, span.a1, usableWidth)) {
          for (const row of strips(z0, z1, usableLength)) {
            const p = { s0: col.a0, s1: col.a1, r0: row.a0, r1: row.a1 };
            out.push({ surface: wall, span: p.s1 - p.s0, rise: p.r1 - p.r0, layer: wallLayer, cutOuts: cutOutsOf(wall, bay, p, glass) });
          }
        }
      }
    }
  }

  const roofLayer = liningLayer(doc.buildUp?.roof);
  if (roofLayer && lined.y1 > lined.y0 && lined.x1 > lined.x0) {
    const holes: OpeningRect[] = roofOpenings(bay).map((o) => ({ o, s0: o.x, s1: o.x + o.length, r0: o.y, r1: o.y + o.width }));
    for (const col of strips(lined.x0, lined.x1, usableWidth)) {
      for (const row of strips(lined.y0, lined.y1, usableLength)) {
        const p = { s0: col.a0, s1: col.a1, r0: row.a0, r1: row.a1 };
        out.push({ surface: 'roof', span: p.s1 - p.s0, rise: p.r1 - p.r0, layer: roofLayer, cutOuts: cutOutsOf('roof', bay, p, holes) });
      }
    }
  }
  return out;
}

/** A cut-out in words, for the workshop: "Window in the left wall: 800 × 400 mm, 300 mm from the front edge, 850 mm from the bottom edge". */
export function cutOutWords(c: CutOut): string {
  return `${c.title}: ${c.width} × ${c.height} mm, ${c.fromStart} mm from the ${c.edges[0]}, ${c.fromSecond} mm from the ${c.edges[1]}`;
}

/** Area of a panel less its cut-outs, m². */
export function netAreaM2(length: number, width: number, cutOuts: readonly Pick<CutOut, 'width' | 'height'>[] = []): number {
  const holes = cutOuts.reduce((a, c) => a + c.width * c.height, 0);
  return Math.max(0, length * width - holes) / 1e6;
}
