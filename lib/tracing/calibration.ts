/**
 * Two-point calibration of a tracing image: a person clicks two points on a photo or scanned
 * drawing and types the real distance between them; from that we get millimetres per image
 * pixel, and a placement that puts the image under the plan in bay coordinates (mm, x rearwards,
 * y across). Pure maths on plain numbers: must never touch the DOM, Konva, React or the database.
 */
import { z } from 'zod';

export interface Point {
  x: number;
  y: number;
}

/**
 * Where a tracing image sits under the plan. Image pixel (0, 0) — its top-left corner — lands
 * on bay point (x, y); one image pixel is `mmPerPx` millimetres; the image is turned by
 * `rotation` degrees (clockwise on screen, y pointing down) about that corner.
 */
export interface TracingPlacement {
  x: number;
  y: number;
  mmPerPx: number;
  rotation: number;
  opacity: number;
}

/** Bounds keep a bad request from placing an image a kilometre away or at zero size. */
export const tracingPlacementSchema = z.strictObject({
  x: z.number().finite().min(-100_000).max(100_000),
  y: z.number().finite().min(-100_000).max(100_000),
  mmPerPx: z.number().finite().gt(0, 'the scale must be above zero').max(1000),
  rotation: z.number().finite().min(-360).max(360).default(0),
  opacity: z.number().finite().min(0.05, 'opacity of at least 5 % or the image cannot be seen').max(1).default(0.5),
});

/** An image not yet calibrated: one pixel taken as one millimetre, top-left at the bay origin. */
export const UNCALIBRATED: TracingPlacement = { x: 0, y: 0, mmPerPx: 1, rotation: 0, opacity: 0.5 };

/** The two clicks must be at least this far apart (image px): closer, a one-pixel slip is >10 %. */
export const MIN_CALIBRATION_SPAN_PX = 10;

export class CalibrationError extends Error {}

export function distance(a: Point, b: Point): number {
  return Math.hypot(b.x - a.x, b.y - a.y);
}

/**
 * Millimetres per image pixel from two image points and the real distance between them.
 * Throws CalibrationError (with a message for the person) when the input cannot give a scale.
 */
export function scaleFromTwoPoints(a: Point, b: Point, realMm: number): number {
  for (const p of [a, b]) {
    if (!Number.isFinite(p.x) || !Number.isFinite(p.y)) throw new CalibrationError('Both points must be on the image.');
  }
  if (!Number.isFinite(realMm) || realMm <= 0) throw new CalibrationError('Type the real distance between the two points, above zero.');
  const span = distance(a, b);
  if (span < MIN_CALIBRATION_SPAN_PX) {
    throw new CalibrationError(`The two points are only ${span.toFixed(1)} px apart; pick points at least ${MIN_CALIBRATION_SPAN_PX} px apart, as far apart as you can.`);
  }
  return realMm / span;
}

/** Image pixel → bay millimetres under a placement. */
export function imageToBay(p: Point, placement: TracingPlacement): Point {
  const t = (placement.rotation * Math.PI) / 180;
  const sx = p.x * placement.mmPerPx;
  const sy = p.y * placement.mmPerPx;
  return { x: placement.x + sx * Math.cos(t) - sy * Math.sin(t), y: placement.y + sx * Math.sin(t) + sy * Math.cos(t) };
}

/** Bay millimetres → image pixel under a placement (the inverse of imageToBay). */
export function bayToImage(p: Point, placement: TracingPlacement): Point {
  const t = (placement.rotation * Math.PI) / 180;
  const dx = p.x - placement.x;
  const dy = p.y - placement.y;
  return { x: (dx * Math.cos(t) + dy * Math.sin(t)) / placement.mmPerPx, y: (-dx * Math.sin(t) + dy * Math.cos(t)) / placement.mmPerPx };
}

/**
 * Calibrates a placement from two points clicked on the plan (bay mm, as the image is drawn now)
 * and the real distance between them. The first point stays where it is on the plan, so the
 * image grows or shrinks about it; rotation and opacity are kept.
 */
export function calibrate(current: TracingPlacement, first: Point, second: Point, realMm: number): TracingPlacement {
  const a = bayToImage(first, current);
  const b = bayToImage(second, current);
  const mmPerPx = scaleFromTwoPoints(a, b, realMm);
  const next = { ...current, mmPerPx };
  // Keep image point `a` on the plan where the person clicked it.
  const moved = imageToBay(a, { ...next, x: 0, y: 0 });
  return { ...next, x: first.x - moved.x, y: first.y - moved.y };
}

/** Drawn size of the whole image on the plan, in mm. */
export function drawnSize(imageWidthPx: number, imageHeightPx: number, placement: TracingPlacement): { length: number; width: number } {
  return { length: imageWidthPx * placement.mmPerPx, width: imageHeightPx * placement.mmPerPx };
}

/**
 * A placement at scale `mmPerPx` and `rotation` that puts image point `imagePoint` on bay point
 * `bayPoint` — e.g. the corner of the bulkhead and the left wall clicked on a photo, placed at
 * bay (0, 0).
 */
export function placeByAnchor(imagePoint: Point, bayPoint: Point, mmPerPx: number, rotation = 0, opacity = UNCALIBRATED.opacity): TracingPlacement {
  const offset = imageToBay(imagePoint, { x: 0, y: 0, mmPerPx, rotation, opacity });
  return { x: bayPoint.x - offset.x, y: bayPoint.y - offset.y, mmPerPx, rotation, opacity };
}

/** Calibration straight from clicks on the image: two image points, the real distance, and where the first point is in the bay. */
export function calibrateFromImage(first: Point, second: Point, realMm: number, firstInBay: Point, rotation = 0, opacity = UNCALIBRATED.opacity): TracingPlacement {
  return placeByAnchor(first, firstInBay, scaleFromTwoPoints(first, second, realMm), rotation, opacity);
}
