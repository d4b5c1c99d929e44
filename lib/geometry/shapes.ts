/**
 * Plain drawable shapes on plain numbers — polylines and circles with a named stroke, dash and
 * fill — and the builders the module symbols are made of (rounded box, ellipse, cubic curve, a
 * band along one side). Each renderer (the editor canvas, the plan sheet) gives the names their
 * look for its medium. Must never import anything of ours, nor draw.
 */

/** `heavy` is a module's working-face mark; `thin` every other line; `none` a fill alone. */
export type SymbolStroke = 'thin' | 'heavy' | 'none';
/** Dashes are named, not measured: each renderer sizes them for its medium. */
export type SymbolDash = 'dashed' | 'dotted';
/** `paper` blanks what lies below (a pillow over the bed's stipple), `shade` tints, `water` marks a tank's contents. */
export type SymbolFill = 'paper' | 'shade' | 'water';

export type Point = [number, number];

export interface PathShape { type: 'path'; points: Point[]; closed?: boolean; stroke?: SymbolStroke; dash?: SymbolDash; fill?: SymbolFill }
export interface CircleShape { type: 'circle'; cx: number; cy: number; r: number; stroke?: SymbolStroke; dash?: SymbolDash; fill?: SymbolFill }
export type SymbolShape = PathShape | CircleShape;

/** One side of a box in its own frame: x along its length, y across its width. */
export type BoxSide = 'front' | 'rear' | 'left' | 'right';

export function path(points: Point[]): PathShape {
  return { type: 'path', points };
}

export function ellipse(cx: number, cy: number, rx: number, ry: number, segments = 32): Point[] {
  return Array.from({ length: segments }, (_, i) => {
    const a = (2 * Math.PI * i) / segments;
    return [cx + Math.cos(a) * rx, cy + Math.sin(a) * ry] as Point;
  });
}

/** A circle as a closed polygon, for renderers without circles (the sheet). */
export function circlePoints(cx: number, cy: number, r: number, segments = 24): Point[] {
  return ellipse(cx, cy, r, r, segments);
}

export function roundRect(x: number, y: number, w: number, h: number, r: number): PathShape {
  const rr = Math.max(0, Math.min(r, w / 2, h / 2));
  const corner = (ox: number, oy: number, from: number): Point[] =>
    [0, 1, 2, 3].map((i) => {
      const a = from + (Math.PI / 2) * (i / 3);
      return [ox + Math.cos(a) * rr, oy + Math.sin(a) * rr] as Point;
    });
  const points = [
    ...corner(x + w - rr, y + rr, -Math.PI / 2),
    ...corner(x + w - rr, y + h - rr, 0),
    ...corner(x + rr, y + h - rr, Math.PI / 2),
    ...corner(x + rr, y + rr, Math.PI),
  ];
  return { type: 'path', points, closed: true };
}

export function cubic(p0: Point, p1: Point, p2: Point, p3: Point, steps = 12): Point[] {
  return Array.from({ length: steps + 1 }, (_, i) => {
    const t = i / steps, u = 1 - t;
    return [
      u * u * u * p0[0] + 3 * u * u * t * p1[0] + 3 * u * t * t * p2[0] + t * t * t * p3[0],
      u * u * u * p0[1] + 3 * u * u * t * p1[1] + 3 * u * t * t * p2[1] + t * t * t * p3[1],
    ] as Point;
  });
}

export function oppositeSide(f: BoxSide): BoxSide {
  return f === 'front' ? 'rear' : f === 'rear' ? 'front' : f === 'left' ? 'right' : 'left';
}

/** A band `band` deep along one side of an L × W box (front = x 0, left = y 0). */
export function bandRect(side: BoxSide, L: number, W: number, band: number): Point[] {
  const [x, y, w, h] = side === 'front' ? [0, 0, band, W] : side === 'rear' ? [L - band, 0, band, W] : side === 'left' ? [0, 0, L, band] : [0, W - band, L, band];
  return [[x, y], [x + w, y], [x + w, y + h], [x, y + h]];
}

/** A whole number from `v` (else `fallback`), kept within min..max. */
export function clampInt(v: unknown, min: number, max: number, fallback: number): number {
  const n = Math.round(Number(v ?? fallback) || fallback);
  return Math.max(min, Math.min(max, n));
}

/** A fraction from `v` (else `fallback`), kept within 0..1. */
export function clamp01(v: unknown, fallback: number): number {
  const n = Number(v ?? fallback);
  return Number.isFinite(n) ? Math.min(1, Math.max(0, n)) : fallback;
}
