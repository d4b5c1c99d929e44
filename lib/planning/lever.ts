/**
 * The lever rule for a two-axle vehicle: how a mass at a given distance behind the front axle
 * splits between the axles (moments about the front axle). A load ahead of the front axle
 * (negative distance) adds more than its mass to the front and lightens the rear; a load behind
 * the rear axle adds more than its mass to the rear and lightens the front. Front + rear always
 * equals the mass itself.
 *
 * Plain numbers in, plain numbers out. Must never import UI, framework or database code.
 */

export interface AxleSplit {
  frontKg: number;
  rearKg: number;
}

/**
 * rear = m × d ÷ wheelbase, front = m − rear (statics: moments about the front axle contact
 * point; any mechanics handbook).
 */
export function leverSplit(massKg: number, behindFrontAxleMm: number, wheelbaseMm: number): AxleSplit {
  if (!Number.isFinite(massKg) || !Number.isFinite(behindFrontAxleMm)) throw new RangeError('mass and distance must be finite numbers');
  if (!Number.isFinite(wheelbaseMm) || wheelbaseMm <= 0) throw new RangeError('wheelbase must be a positive number of millimetres');
  const rearKg = (massKg * behindFrontAxleMm) / wheelbaseMm;
  return { frontKg: massKg - rearKg, rearKg };
}

/** Where, behind the front axle, a mass must sit to put `rearKg` of it on the rear axle. */
export function leverPosition(massKg: number, rearKg: number, wheelbaseMm: number): number {
  if (!(massKg > 0)) throw new RangeError('mass must be positive to have a position');
  if (!Number.isFinite(wheelbaseMm) || wheelbaseMm <= 0) throw new RangeError('wheelbase must be a positive number of millimetres');
  return (rearKg / massKg) * wheelbaseMm;
}
