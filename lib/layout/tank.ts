/**
 * A water tank's capacity from its drawn size: the outside box less a wall allowance on every
 * face, times the share of the inside that holds water (a fill fraction, 1 when not given). A
 * typed capacity stands when there is one; the result says which was used, so every water and
 * mass figure can say so too. Pure numbers; must never import UI, framework or database code.
 */

/**
 * Wall allowed on every face of a moulded tank, mm — common practice, no source: rotomoulded
 * polyethylene leisure-vehicle tanks are made with walls of about 4–6 mm.
 */
export const TANK_WALL_MM = 5;

export interface TankSize {
  length: number;
  width: number;
  height: number;
}

export interface TankCapacity {
  /** Litres the figures use. */
  litres: number;
  /** 'typed': the capacity typed on the module; 'drawn': from the drawn inside volume. */
  basis: 'typed' | 'drawn';
  /** Litres the drawn inside holds (after the wall allowance and the fill fraction). */
  drawnLitres: number;
}

/** Litres inside the drawn box: (L − 2w)(W − 2w)(H − 2w) ÷ 10⁶ × fill fraction. */
export function drawnTankLitres(size: TankSize, fillFraction = 1): number {
  const inner = (d: number) => Math.max(0, d - 2 * TANK_WALL_MM);
  const fraction = Number.isFinite(fillFraction) ? Math.min(1, Math.max(0, fillFraction)) : 1;
  return (inner(size.length) * inner(size.width) * inner(size.height) * fraction) / 1_000_000;
}

export function tankCapacity(size: TankSize | undefined, values: { litres?: number; fillFraction?: number }): TankCapacity {
  const drawnLitres = size ? drawnTankLitres(size, values.fillFraction) : 0;
  if (values.litres !== undefined) return { litres: Math.max(0, values.litres), basis: 'typed', drawnLitres };
  return { litres: drawnLitres, basis: 'drawn', drawnLitres };
}
