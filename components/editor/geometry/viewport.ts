/**
 * The one viewport transform between the van (millimetres) and the screen (CSS pixels).
 * Plan orientation: the cab (x = 0) on the left, x growing to the right, the left wall (y = 0) at
 * the top. Pure math: never touches the DOM, Konva or the store.
 */
import { mm, px, type Mm, type Px } from '../types';

export interface Viewport {
  /** Screen pixels per millimetre. */
  scale: number;
  /** Screen position of the world origin (front-left corner of the bare floor). */
  originX: Px;
  originY: Px;
  /** Size of the drawing area in pixels. */
  width: Px;
  height: Px;
}

export const MIN_SCALE = 0.002;
export const MAX_SCALE = 12;
/** Space kept around the bay by "fit to bay", for rulers and dimension strings. */
export const FIT_MARGIN_PX = 72;
/** A CSS pixel is 1/96 in (CSS Values and Units Level 3, §5.2 "absolute lengths"). */
export const CSS_PX_PER_MM = 96 / 25.4;

export function clampScale(scale: number): number {
  if (!Number.isFinite(scale)) return 1;
  return Math.min(MAX_SCALE, Math.max(MIN_SCALE, scale));
}

export function toScreenX(v: Viewport, x: Mm | number): Px {
  return px(v.originX + x * v.scale);
}
export function toScreenY(v: Viewport, y: Mm | number): Px {
  return px(v.originY + y * v.scale);
}
export function toWorld(v: Viewport, sx: Px | number, sy: Px | number): { x: Mm; y: Mm } {
  return { x: mm((sx - v.originX) / v.scale), y: mm((sy - v.originY) / v.scale) };
}
/** A screen distance as millimetres at the current zoom (snap thresholds, handle sizes). */
export function screenToMm(v: Viewport, distance: Px | number): Mm {
  return mm(distance / v.scale);
}

/** Zoom by `factor` keeping the world point under the screen point (sx, sy) still. */
export function zoomAt(v: Viewport, factor: number, sx: number, sy: number): Viewport {
  const scale = clampScale(v.scale * factor);
  const real = scale / v.scale;
  return { ...v, scale, originX: px(sx - (sx - v.originX) * real), originY: px(sy - (sy - v.originY) * real) };
}

export function panBy(v: Viewport, dx: number, dy: number): Viewport {
  return { ...v, originX: px(v.originX + dx), originY: px(v.originY + dy) };
}

/** The scale and origin that show the whole bay, centred, with a margin. */
export function fitToBay(v: Viewport, bayLength: number, bayWidth: number, margin = FIT_MARGIN_PX): Viewport {
  const availW = Math.max(50, v.width - 2 * margin);
  const availH = Math.max(50, v.height - 2 * margin);
  const scale = clampScale(Math.min(availW / Math.max(1, bayLength), availH / Math.max(1, bayWidth)));
  return {
    ...v,
    scale,
    originX: px((v.width - bayLength * scale) / 2),
    originY: px((v.height - bayWidth * scale) / 2),
  };
}

/** Real size on screen: `pxPerMm` is what the person measured for their display (1:1). */
export function actualSize(v: Viewport, pxPerMm: number, centreX: number, centreY: number): Viewport {
  const factor = clampScale(pxPerMm) / v.scale;
  return zoomAt(v, factor, centreX, centreY);
}

/** The world rectangle currently on screen. */
export function visibleWorld(v: Viewport): { x0: number; y0: number; x1: number; y1: number } {
  const a = toWorld(v, 0, 0);
  const b = toWorld(v, v.width, v.height);
  return { x0: a.x, y0: a.y, x1: b.x, y1: b.y };
}

/**
 * Grid spacing in mm for the current zoom: the 100 mm grid, refined to 10 mm when zoomed in far
 * and thinned to 500 / 1000 mm when lines would crowd closer than `minPx` apart.
 */
export function gridSpacing(scale: number, minPx = 8): { minor: number; major: number } {
  const steps = [10, 100, 500, 1000];
  const minor = steps.find((s) => s * scale >= minPx) ?? 1000;
  const major = minor === 10 ? 100 : minor === 1000 ? 5000 : 1000;
  return { minor, major };
}
