/**
 * Ordinate dimensions (running dimensions from one datum) for the elevations and the roof plan:
 * one dimension line from the datum with a 45° tick at every station, each station's distance
 * from the datum as a figure beside it, figures stacked greedily (placeFigures, as the plan's
 * running dimensions) so none collide, a figure without room left off (its tick stays).
 * Sorting the stations is the only super-linear step (n log n). Pure; must never render.
 */
import { toUnit, type LengthUnit } from '../layout/units';
import { LINE, TYPE } from './drafting';
import type { SheetItem } from './primitives';
import { placeFigures, RUN_ROWS } from './running-dimensions';
import { textWidth } from './typography';

/** Paper mm from the measured edge to the ordinate line. */
export const ORDINATE_OFFSET = 3;
/** Paper mm a row (or column) of figures takes: the tallest figure of 5.5 pt is under 2 mm. */
export const ORDINATE_ROW = 2.3;
/** Paper mm a column of upright figures takes beside a vertical ordinate (four digits of the mono face and a gap). */
export const ORDINATE_COLUMN = 5.6;

export interface OrdinateSpec {
  /** Real mm from the datum, in any order; negatives and repeats are dropped. */
  stations: number[];
  /** Paper position of the datum along the line's axis (x for a horizontal line, y for a vertical one). */
  datum: number;
  /** +1: stations run right (horizontal) or down (vertical) on paper from the datum; −1: left or up. */
  direction: 1 | -1;
  /** Paper position of the measured edge across the line (the wall's or outline's y or x). */
  edge: number;
  /** −1: the line stands above (horizontal) or left (vertical) of the edge; +1 below or right. */
  side: 1 | -1;
  toPaper: (mm: number) => number;
  units: LengthUnit;
  /** Each run of the line is tagged `${tag}:${station}` (the station it ends at). */
  tag: string;
}

export function stationsOf(values: number[]): number[] {
  const out = values.filter((v) => Number.isFinite(v) && v >= 0).map((v) => Math.round(v));
  out.sort((a, b) => a - b);
  return out.filter((v, i) => i === 0 || v !== out[i - 1]);
}

/** A horizontal ordinate line, figures set upright above (side −1) or below (side +1) it. */
export function horizontalOrdinate(spec: OrdinateSpec): { items: SheetItem[]; leftOff: number } {
  const xs = stationsOf([0, ...spec.stations]);
  if (xs.length < 2) return { items: [], leftOff: 0 };
  const at = (v: number) => spec.datum + spec.direction * spec.toPaper(v);
  const lineY = spec.edge + spec.side * ORDINATE_OFFSET;
  const items: SheetItem[] = [];
  for (let i = 1; i < xs.length; i++) items.push({ type: 'line', x1: at(xs[i - 1]), y1: lineY, x2: at(xs[i]), y2: lineY, width: LINE.thin, ink: 'ink', tag: `${spec.tag}:${xs[i]}` });
  const tick = 0.9;
  for (const v of xs) {
    const px = at(v);
    items.push({ type: 'line', x1: px, y1: spec.edge + spec.side * 0.6, x2: px, y2: lineY + spec.side * 0.6, width: LINE.hair, ink: 'soft' });
    items.push({ type: 'line', x1: px - tick, y1: lineY + tick, x2: px + tick, y2: lineY - tick, width: LINE.medium, ink: 'ink' });
  }
  const figures = xs.slice(1).map((v) => {
    const text = String(toUnit(v, spec.units));
    return { station: v, at: at(v), text, width: textWidth(text, TYPE.small, 'mono') };
  });
  figures.sort((a, b) => a.at - b.at);
  const { placed, leftOff } = placeFigures(figures);
  for (const f of placed) {
    const y = spec.side < 0 ? lineY - 0.7 - f.row * ORDINATE_ROW : lineY + 2.4 + f.row * ORDINATE_ROW;
    items.push({ type: 'text', x: at(f.station), y, text: f.text, size: TYPE.small, font: 'mono', align: 'center' });
  }
  return { items, leftOff };
}

/**
 * A vertical ordinate line, figures set upright (easy to read on a wall elevation) in up to
 * RUN_ROWS columns left (side −1) or right (side +1) of it, each on its tick.
 */
export function verticalOrdinate(spec: OrdinateSpec): { items: SheetItem[]; leftOff: number } {
  const ys = stationsOf([0, ...spec.stations]);
  if (ys.length < 2) return { items: [], leftOff: 0 };
  const at = (v: number) => spec.datum + spec.direction * spec.toPaper(v);
  const lineX = spec.edge + spec.side * ORDINATE_OFFSET;
  const items: SheetItem[] = [];
  for (let i = 1; i < ys.length; i++) items.push({ type: 'line', x1: lineX, y1: at(ys[i - 1]), x2: lineX, y2: at(ys[i]), width: LINE.thin, ink: 'ink', tag: `${spec.tag}:${ys[i]}` });
  const tick = 0.9;
  for (const v of ys) {
    const py = at(v);
    items.push({ type: 'line', x1: spec.edge + spec.side * 0.6, y1: py, x2: lineX + spec.side * 0.6, y2: py, width: LINE.hair, ink: 'soft' });
    items.push({ type: 'line', x1: lineX - tick, y1: py + tick, x2: lineX + tick, y2: py - tick, width: LINE.medium, ink: 'ink' });
  }
  // Figures stack along the line by their height (ORDINATE_ROW), in columns outwards from it.
  const figures = ys.slice(1).map((v) => ({ station: v, at: at(v), text: String(toUnit(v, spec.units)), width: ORDINATE_ROW }));
  figures.sort((a, b) => a.at - b.at);
  const { placed, leftOff } = placeFigures(figures);
  for (const f of placed) {
    const x = lineX + spec.side * (1.2 + f.row * ORDINATE_COLUMN);
    items.push({ type: 'text', x, y: at(f.station) + 0.75, text: f.text, size: TYPE.small, font: 'mono', align: spec.side < 0 ? 'right' : 'left' });
  }
  return { items, leftOff };
}

/** Paper width a vertical ordinate takes beside its edge: the offset and RUN_ROWS columns. */
export const VERTICAL_ORDINATE_BAND = ORDINATE_OFFSET + 1.2 + RUN_ROWS * ORDINATE_COLUMN;
/** Paper height a horizontal ordinate takes beside its edge. */
export const HORIZONTAL_ORDINATE_BAND = ORDINATE_OFFSET + 0.7 + RUN_ROWS * ORDINATE_ROW;
