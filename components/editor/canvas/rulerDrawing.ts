/**
 * Rulers along the top and left edge of the plan, in screen pixels, ticked in the person's units
 * at a spacing that stays readable at any zoom. Never draws in world space.
 */
import { MM_PER_INCH, type LengthUnit } from '@/lib/layout/units';
import type { Viewport } from '../geometry/viewport';
import { theme, canvasFonts } from '../theme';

export const RULER_PX = 20;

const MM_PER_UNIT: Record<LengthUnit, number> = { mm: 1, cm: 10, in: MM_PER_INCH };

/** A step in the display unit (1, 2, 5 × 10ⁿ) whose screen spacing is at least `minPx`. */
export function rulerStep(scale: number, unit: LengthUnit, minPx = 64): number {
  const perUnitPx = scale * MM_PER_UNIT[unit];
  for (let e = -1; e < 7; e++) for (const m of [1, 2, 5]) {
    const step = m * 10 ** e;
    if (step * perUnitPx >= minPx) return step;
  }
  return 10 ** 7;
}

export function drawRulers(ctx: CanvasRenderingContext2D, v: Viewport, unit: LengthUnit, fonts = canvasFonts): void {
  const step = rulerStep(v.scale, unit);
  const k = MM_PER_UNIT[unit] * v.scale; // px per display unit
  ctx.save();
  ctx.fillStyle = theme.paperDeep;
  ctx.fillRect(0, 0, v.width, RULER_PX);
  ctx.fillRect(0, 0, RULER_PX, v.height);
  ctx.strokeStyle = theme.paperEdge;
  ctx.lineWidth = 1;
  ctx.beginPath();
  ctx.moveTo(0, RULER_PX + 0.5); ctx.lineTo(v.width, RULER_PX + 0.5);
  ctx.moveTo(RULER_PX + 0.5, 0); ctx.lineTo(RULER_PX + 0.5, v.height);
  ctx.stroke();

  ctx.font = `9.5px ${fonts.mono}`;
  ctx.fillStyle = theme.inkSoft;
  ctx.strokeStyle = theme.inkFaint;
  ctx.textBaseline = 'top';
  ctx.beginPath();
  const firstX = Math.floor((RULER_PX - v.originX) / k / step) * step;
  for (let u = firstX; v.originX + u * k <= v.width; u += step / 5) {
    const x = Math.round(v.originX + u * k) + 0.5;
    if (x < RULER_PX) continue;
    const major = Math.abs(u / step - Math.round(u / step)) < 1e-6;
    ctx.moveTo(x, RULER_PX); ctx.lineTo(x, RULER_PX - (major ? 9 : 4));
    if (major) ctx.fillText(trim(u), x + 2, 2);
  }
  const firstY = Math.floor((RULER_PX - v.originY) / k / step) * step;
  ctx.textBaseline = 'middle';
  for (let u = firstY; v.originY + u * k <= v.height; u += step / 5) {
    const y = Math.round(v.originY + u * k) + 0.5;
    if (y < RULER_PX) continue;
    const major = Math.abs(u / step - Math.round(u / step)) < 1e-6;
    ctx.moveTo(RULER_PX, y); ctx.lineTo(RULER_PX - (major ? 9 : 4), y);
    if (major) {
      ctx.save();
      ctx.translate(9, y + 2);
      ctx.rotate(-Math.PI / 2);
      ctx.textAlign = 'right';
      ctx.fillText(trim(u), 0, 0);
      ctx.restore();
    }
  }
  ctx.stroke();
  // The unit in the corner, so every number on the rulers carries it.
  ctx.fillStyle = theme.paperDeep;
  ctx.fillRect(0, 0, RULER_PX, RULER_PX);
  ctx.fillStyle = theme.ink;
  ctx.textAlign = 'center';
  ctx.textBaseline = 'middle';
  ctx.font = `9px ${fonts.mono}`;
  ctx.fillText(unit, RULER_PX / 2, RULER_PX / 2);
  ctx.restore();
}

function trim(u: number): string {
  const r = Math.round(u * 100) / 100;
  return String(r);
}
