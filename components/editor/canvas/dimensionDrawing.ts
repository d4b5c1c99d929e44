/**
 * Dimension strings as a drafter draws them: a thin line with architectural tick marks (short
 * 45° slashes, never arrowheads) and the value in the mono face, in the person's units.
 * Draws in mm on a transformed context. Never decides which dimensions to show.
 */
import { formatLength, type LengthUnit } from '@/lib/layout/units';
import { theme, canvasFonts } from '../theme';
import type { DimensionString } from '../geometry/dimensions';
import { DIMENSION_TEXT_PX, dimensionTextPlace } from '../geometry/planWords';

type Ctx = CanvasRenderingContext2D;

export function drawDimension(ctx: Ctx, d: DimensionString, scale: number, unit: LengthUnit, colour: string = theme.ink, fonts = canvasFonts, offsetPx = 0): void {
  const px = 1 / scale;
  const lenPx = Math.abs(d.to - d.from) * scale;
  if (lenPx < 2) return;
  const at = d.at + offsetPx * px;
  ctx.save();
  ctx.strokeStyle = colour;
  ctx.fillStyle = colour;
  ctx.lineWidth = 0.9 * px;
  const tick = 4 * px;
  ctx.beginPath();
  if (d.axis === 'x') {
    ctx.moveTo(d.from - 4 * px, at); ctx.lineTo(d.to + 4 * px, at);
    for (const x of [d.from, d.to]) { ctx.moveTo(x - tick, at + tick); ctx.lineTo(x + tick, at - tick); }
  } else {
    ctx.moveTo(at, d.from - 4 * px); ctx.lineTo(at, d.to + 4 * px);
    for (const y of [d.from, d.to]) { ctx.moveTo(at - tick, y + tick); ctx.lineTo(at + tick, y - tick); }
  }
  ctx.stroke();

  const text = formatLength(d.value, unit);
  ctx.font = `${DIMENSION_TEXT_PX * px}px ${fonts.mono}`;
  const w = ctx.measureText(text).width;
  // Text sits on the line when there is room, beside it otherwise (planWords, which the module labels keep clear of).
  const place = dimensionTextPlace(d, scale, w * scale, offsetPx);
  ctx.translate(place.x - (place.turned ? place.beside : 0), place.y - (place.turned ? 0 : place.beside));
  if (place.turned) ctx.rotate(-Math.PI / 2);
  ctx.textAlign = 'center';
  ctx.textBaseline = 'middle';
  const ty = place.beside;
  ctx.fillStyle = 'rgba(245,242,234,0.92)';
  ctx.fillRect(-w / 2 - 2 * px, ty - 6.5 * px, w + 4 * px, 13 * px);
  ctx.fillStyle = colour;
  ctx.fillText(text, 0, ty);
  ctx.restore();
}
