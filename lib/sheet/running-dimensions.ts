/**
 * Running dimensions along the bay's two walls, as a workshop marks out a build: one dimension
 * line per wall from the front (the bulkhead, x = 0) with a tick at the start and end of every
 * module standing nearer that wall, each tick carrying its distance from the front in the sheet's
 * units (the title block states which). Figures are set horizontally and stacked greedily in up
 * to `RUN_ROWS` rows so no two collide; a figure that finds no room is left off (its tick stays,
 * and the schedule has the module's position). Sorting the stations is the only super-linear
 * step (n log n); a figure draws at most `FIGURE_MODULE_LIMIT` modules, so at most twice that
 * many stations. Pure: plain sheet items out; must never render.
 */
import { toUnit, type LengthUnit } from '../layout/units';
import type { Module } from '../layout/schema';
import { LINE, TYPE } from './drafting';
import type { SheetItem } from './primitives';
import { textWidth } from './typography';

/** Rows of figures a wall's running dimension may use. */
export const RUN_ROWS = 2;
/** Paper mm from the wall line to the running dimension line. */
export const RUN_OFFSET = 3;
/** Paper mm per row of figures. */
export const RUN_ROW_HEIGHT = 2.3;
/** Paper space a wall's running dimension takes outside the bay outline. */
export const RUN_BAND = RUN_OFFSET + RUN_ROWS * RUN_ROW_HEIGHT + 0.3;
/** Least clear space between two figures in one row (paper mm). */
const FIGURE_GAP = 0.8;

export type Wall = 'left' | 'right';

/** Which wall a module is dimensioned along: the one its middle is nearer (common practice, no source). */
export function wallOf(m: Pick<Module, 'y' | 'width'>, bayWidth: number): Wall {
  return m.y + m.width / 2 < bayWidth / 2 ? 'left' : 'right';
}

/** The stations of one wall: 0 and every module start and end within the bay, ascending, once each. */
export function stations(modules: Pick<Module, 'x' | 'length'>[], bayLength: number): number[] {
  const xs = [0];
  for (const m of modules) xs.push(m.x, m.x + m.length);
  const inside = xs.filter((x) => Number.isFinite(x) && x >= 0 && x <= bayLength).map((x) => Math.round(x));
  inside.sort((a, b) => a - b);
  return inside.filter((x, i) => i === 0 || x !== inside[i - 1]);
}

export interface PlacedFigure {
  station: number;
  /** 0 next to the dimension line, then outwards. */
  row: number;
  text: string;
  x0: number;
  x1: number;
}

/**
 * Greedy rows: each figure, in order along the wall, goes in the first row where it clears the
 * last figure placed there; none fits → left off. One pass, `RUN_ROWS` comparisons per figure.
 */
export function placeFigures(centres: { station: number; at: number; text: string; width: number }[]): { placed: PlacedFigure[]; leftOff: number } {
  const rowEnd = new Array<number>(RUN_ROWS).fill(-Infinity);
  const placed: PlacedFigure[] = [];
  let leftOff = 0;
  for (const c of centres) {
    const x0 = c.at - c.width / 2;
    const row = rowEnd.findIndex((end) => x0 >= end + FIGURE_GAP);
    if (row < 0) {
      leftOff++;
      continue;
    }
    rowEnd[row] = x0 + c.width;
    placed.push({ station: c.station, row, text: c.text, x0, x1: x0 + c.width });
  }
  return { placed, leftOff };
}

/**
 * The running dimension of one wall. `bx`, `wallY`: paper position of the front end of the wall
 * line; `toPaper` turns real mm into paper mm; `outward` is −1 above the plan (left wall), +1 below.
 */
export function runningDimension(
  modules: Module[],
  wall: Wall,
  geometry: { bx: number; wallY: number; bayLength: number; bayWidth: number; toPaper: (mm: number) => number; units: LengthUnit; tag: string },
): { items: SheetItem[]; leftOff: number } {
  const { bx, wallY, bayLength, bayWidth, toPaper, units, tag } = geometry;
  const along = modules.filter((m) => wallOf(m, bayWidth) === wall);
  const xs = stations(along, bayLength);
  if (xs.length < 2) return { items: [], leftOff: 0 };
  const outward = wall === 'left' ? -1 : 1;
  const lineY = wallY + outward * RUN_OFFSET;
  const items: SheetItem[] = [];
  // The dimension line in runs between stations (each run tagged with where it ends), a tick at each station.
  for (let i = 1; i < xs.length; i++) {
    items.push({ type: 'line', x1: bx + toPaper(xs[i - 1]), y1: lineY, x2: bx + toPaper(xs[i]), y2: lineY, width: LINE.thin, ink: 'ink', tag: `${tag}:${xs[i]}` });
  }
  const tick = 0.9;
  for (const x of xs) {
    const px = bx + toPaper(x);
    items.push({ type: 'line', x1: px, y1: wallY + outward * 0.6, x2: px, y2: lineY + outward * 0.6, width: LINE.hair, ink: 'soft' });
    items.push({ type: 'line', x1: px - tick, y1: lineY + tick, x2: px + tick, y2: lineY - tick, width: LINE.medium, ink: 'ink' });
  }
  // The front is the datum: it carries no figure; every other station its distance from it.
  const figures = xs.slice(1).map((x) => {
    const text = String(toUnit(x, units));
    return { station: x, at: bx + toPaper(x), text, width: textWidth(text, TYPE.small, 'mono') };
  });
  const { placed, leftOff } = placeFigures(figures);
  for (const f of placed) {
    // Baseline of row r: above the line for the left wall, below it for the right.
    const y = wall === 'left' ? lineY - 0.7 - f.row * RUN_ROW_HEIGHT : lineY + 2.4 + f.row * RUN_ROW_HEIGHT;
    const at = bx + toPaper(f.station);
    items.push({ type: 'text', x: at, y, text: f.text, size: TYPE.small, font: 'mono', align: 'center' });
  }
  return { items, leftOff };
}
