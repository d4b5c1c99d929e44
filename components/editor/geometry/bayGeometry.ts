/**
 * Measurements of the bay that the drawing needs: the wall build-up band, the lined interior, the
 * floor and roof build-up and the clear height. Plain numbers in mm, read from the document.
 * Must never decide pass/fail: that is the check engine's job (lib/checks).
 */
import type { BuildUp, LayoutDoc, Module, Arrangement } from '@/lib/layout';

export interface Rect {
  x: number;
  y: number;
  length: number;
  width: number;
}

export function layersThickness(layers: BuildUp['walls']): number {
  return layers.reduce((sum, l) => sum + l.thickness, 0);
}

export function wallThickness(doc: LayoutDoc): number {
  return layersThickness(doc.buildUp.walls);
}
export function floorThickness(doc: LayoutDoc): number {
  return layersThickness(doc.buildUp.floor);
}
export function roofThickness(doc: LayoutDoc): number {
  return layersThickness(doc.buildUp.roof);
}

/** Floor-to-lining height once floor and roof build-up are in (mm). */
export function clearHeight(doc: LayoutDoc): number {
  return doc.bay.height - floorThickness(doc) - roofThickness(doc);
}

/** The lined interior in plan: wall lining to wall lining across, bulkhead to rear along. */
export function linedInterior(doc: LayoutDoc): Rect {
  const t = wallThickness(doc);
  return { x: 0, y: t, length: doc.bay.length, width: Math.max(0, doc.bay.width - 2 * t) };
}

/** Plan footprints of the wheel arches (side walls: left at y = 0, right at y = bay.width). */
export function wheelArchRects(doc: LayoutDoc): Rect[] {
  return doc.bay.wheelArches.map((a) => ({
    x: a.x,
    y: a.side === 'left' ? 0 : doc.bay.width - a.width,
    length: a.length,
    width: a.width,
  }));
}

export function inArrangement(m: Module, arrangement: Arrangement): boolean {
  return m.arrangements.includes(arrangement);
}

export function modulesIn(doc: LayoutDoc, arrangement: Arrangement): Module[] {
  return doc.modules.filter((m) => inArrangement(m, arrangement));
}

export function rectsOverlap(a: Rect, b: Rect): boolean {
  return a.x < b.x + b.length && b.x < a.x + a.length && a.y < b.y + b.width && b.y < a.y + a.width;
}

export function boundsOf(rects: Rect[]): Rect | null {
  if (rects.length === 0) return null;
  let x0 = Infinity, y0 = Infinity, x1 = -Infinity, y1 = -Infinity;
  for (const r of rects) {
    x0 = Math.min(x0, r.x);
    y0 = Math.min(y0, r.y);
    x1 = Math.max(x1, r.x + r.length);
    y1 = Math.max(y1, r.y + r.width);
  }
  return { x: x0, y: y0, length: x1 - x0, width: y1 - y0 };
}

export function containsPoint(r: Rect, x: number, y: number): boolean {
  return x >= r.x && x <= r.x + r.length && y >= r.y && y <= r.y + r.width;
}
