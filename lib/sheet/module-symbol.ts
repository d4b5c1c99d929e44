/**
 * A module's symbol on the sheet, from the one symbol table the editor also draws
 * (lib/symbols/module-symbols.ts): its shapes scaled from the module's millimetres to paper
 * millimetres and written as sheet primitives (circles as fine polygons, named dashes as paper
 * lengths). Pure; draws nothing itself.
 */
import { circlePoints, moduleSymbol, type SymbolModule, type SymbolShape } from '../symbols/module-symbols';
import { hatch, LINE } from './drafting';
import type { Ink, SheetItem } from './primitives';

const DASH = { dashed: [1, 0.6], dotted: [0.3, 0.6] } as const;

/** Below this size on paper (mm) a symbol is clutter: the outline and number say enough. */
export const SYMBOL_MIN_MM = 4;

/**
 * Sheet items for the symbol of `m`, whose min corner sits at (`x`, `y`) on paper, drawn at
 * `paperPerMm` paper millimetres per real millimetre (1/20 at 1:20).
 */
export function symbolItems(m: SymbolModule, x: number, y: number, paperPerMm: number): SheetItem[] {
  if (Math.min(m.length, m.width) * paperPerMm < SYMBOL_MIN_MM) return [];
  const out: SheetItem[] = [];
  const at = ([px, py]: [number, number]): [number, number] => [x + px * paperPerMm, y + py * paperPerMm];
  for (const shape of moduleSymbol(m)) out.push(...itemsOf(shape, at));
  return out;
}

function itemsOf(shape: SymbolShape, at: (p: [number, number]) => [number, number]): SheetItem[] {
  const points = shape.type === 'circle' ? circlePoints(shape.cx, shape.cy, shape.r).map(at) : shape.points.map(at);
  const closed = shape.type === 'circle' || !!shape.closed;
  const out: SheetItem[] = [];
  if (shape.fill === 'water') {
    const xs = points.map((p) => p[0]), ys = points.map((p) => p[1]);
    const x0 = Math.min(...xs), y0 = Math.min(...ys);
    out.push(...hatch(x0, y0, Math.max(...xs) - x0, Math.max(...ys) - y0, 1.6, 0, 'faint'));
  } else if (shape.fill) {
    out.push({ type: 'polygon', points, fill: shape.fill === 'paper' ? 'white' : 'paper' });
  }
  if (shape.stroke === 'none' || points.length < 2) return out;
  const heavy = shape.stroke === 'heavy';
  const ink: Ink = heavy ? 'ink' : 'soft';
  const width = heavy ? LINE.heavy : LINE.hair;
  const dash = shape.dash ? ([...DASH[shape.dash]] as [number, number]) : undefined;
  const ring = closed ? [...points, points[0]] : points;
  for (let i = 1; i < ring.length; i++) {
    out.push({ type: 'line', x1: ring[i - 1][0], y1: ring[i - 1][1], x2: ring[i][0], y2: ring[i][1], width, ink, dash });
  }
  return out;
}
