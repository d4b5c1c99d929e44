/**
 * The bay as a workshop drawing: bare metal as a heavy line with door openings as gaps (a slide
 * mark on side doors, swing arcs on rear doors), the wall build-up band lightly hatched, wheel
 * arches cross-hatched, the bulkhead or open cab end, the "cab" arrow, and the drafting grid.
 * Draws in mm on a context already transformed by the layer. Never reads the store.
 */
import type { LayoutDoc } from '@/lib/layout';
import { theme, canvasFonts } from '../theme';
import { fillHatch } from './hatching';
import { archBoxes, buildUpThickness } from '@/lib/layout/bay';
import { gridSpacing } from '../geometry/viewport';
import { BAY_WORD_PX, bayWords, CAB_ARROW_PX } from '../geometry/planWords';

type Ctx = CanvasRenderingContext2D;

export function drawGrid(ctx: Ctx, scale: number, area: { x0: number; y0: number; x1: number; y1: number }, bay: { length: number; width: number }): void {
  const { minor, major } = gridSpacing(scale);
  const px = 1 / scale;
  const lines = (step: number, style: string, width: number) => {
    ctx.beginPath();
    const sx = Math.floor(area.x0 / step) * step;
    const sy = Math.floor(area.y0 / step) * step;
    for (let x = sx; x <= area.x1; x += step) { ctx.moveTo(x, area.y0); ctx.lineTo(x, area.y1); }
    for (let y = sy; y <= area.y1; y += step) { ctx.moveTo(area.x0, y); ctx.lineTo(area.x1, y); }
    ctx.strokeStyle = style;
    ctx.lineWidth = width * px;
    ctx.stroke();
  };
  ctx.save();
  lines(minor, 'rgba(138,150,155,0.16)', 1);
  lines(major, 'rgba(138,150,155,0.32)', 1);
  // The bay floor reads a touch warmer than the sheet around it.
  ctx.fillStyle = 'rgba(236,231,218,0.35)';
  ctx.fillRect(0, 0, bay.length, bay.width);
  ctx.restore();
}

export function drawBay(ctx: Ctx, doc: LayoutDoc, scale: number, fonts = canvasFonts): void {
  const { length: L, width: W } = doc.bay;
  const px = 1 / scale;
  const t = buildUpThickness(doc).wallT;
  ctx.save();

  // Wall build-up band along both side walls.
  if (t > 0) {
    ctx.beginPath();
    ctx.rect(0, 0, L, Math.min(t, W / 2));
    ctx.rect(0, W - Math.min(t, W / 2), L, Math.min(t, W / 2));
    fillHatch(ctx, 'band');
    ctx.beginPath();
    ctx.moveTo(0, t); ctx.lineTo(L, t);
    ctx.moveTo(0, W - t); ctx.lineTo(L, W - t);
    ctx.strokeStyle = theme.inkFaint;
    ctx.lineWidth = 1 * px;
    ctx.stroke();
  }

  // Wheel arches, cross-hatched.
  for (const { rect: r } of archBoxes(doc)) {
    ctx.beginPath();
    ctx.rect(r.x0, r.y0, r.x1 - r.x0, r.y1 - r.y0);
    ctx.fillStyle = theme.paperDeep;
    ctx.fill();
    fillHatch(ctx, 'cross');
    ctx.strokeStyle = theme.ink;
    ctx.lineWidth = 1.25 * px;
    ctx.stroke();
  }

  // Bare metal: heavy line, broken where the doors are.
  ctx.strokeStyle = theme.ink;
  ctx.lineWidth = 3 * px;
  ctx.lineCap = 'butt';
  const gaps = (wall: 'left' | 'right' | 'rear') => doc.bay.doors.filter((d) => d.wall === wall).map((d) => [d.offset, d.offset + d.width] as const).sort((a, b) => a[0] - b[0]);
  wallWithGaps(ctx, (s) => [s, 0], L, gaps('left'));
  wallWithGaps(ctx, (s) => [s, W], L, gaps('right'));
  wallWithGaps(ctx, (s) => [L, s], W, gaps('rear'));
  // Front end: bulkhead (heavy) or open to the cab (dashed).
  ctx.beginPath();
  ctx.moveTo(0, 0); ctx.lineTo(0, W);
  if (!doc.bay.bulkhead) { ctx.setLineDash([8 * px, 5 * px]); ctx.lineWidth = 1.5 * px; }
  ctx.stroke();
  ctx.setLineDash([]);

  // Door marks: side doors slide (a line outside the wall with a tick), rear doors swing.
  ctx.lineWidth = 1 * px;
  ctx.strokeStyle = theme.inkSoft;
  for (const d of doc.bay.doors) {
    if (d.wall === 'rear') {
      const half = d.width / 2;
      ctx.beginPath();
      ctx.moveTo(L, d.offset); ctx.lineTo(L + half, d.offset);
      ctx.arc(L, d.offset, half, 0, Math.PI / 2, false);
      ctx.moveTo(L, d.offset + d.width); ctx.lineTo(L + half, d.offset + d.width);
      ctx.arc(L, d.offset + d.width, half, 0, -Math.PI / 2, true);
      ctx.setLineDash([4 * px, 3 * px]);
      ctx.stroke();
      ctx.setLineDash([]);
    } else {
      const y = d.wall === 'left' ? -8 * px : W + 8 * px;
      const yIn = d.wall === 'left' ? 0 : W;
      ctx.beginPath();
      ctx.moveTo(d.offset, y); ctx.lineTo(d.offset + d.width, y);
      // Slide direction: rearwards, as a sliding side door opens.
      ctx.moveTo(d.offset + d.width, y); ctx.lineTo(d.offset + d.width - 6 * px, y - 3 * px * Math.sign(y - yIn || 1));
      ctx.moveTo(d.offset, yIn); ctx.lineTo(d.offset, y);
      ctx.moveTo(d.offset + d.width, yIn); ctx.lineTo(d.offset + d.width, y);
      ctx.stroke();
    }
  }
  // The door words and the cab word, where planWords puts them (the module labels keep clear of them).
  for (const w of bayWords(doc.bay, px)) label(ctx, w.text, w.x, w.y, px, fonts, w.turned ? -Math.PI / 2 : 0);

  // Cab arrow at the front.
  const ax = CAB_ARROW_PX.x * px, ay = W / 2;
  ctx.beginPath();
  ctx.moveTo(ax + 12 * px, ay); ctx.lineTo(ax - 8 * px, ay);
  ctx.moveTo(ax - 2 * px, ay - 5 * px); ctx.lineTo(ax - 8 * px, ay); ctx.lineTo(ax - 2 * px, ay + 5 * px);
  ctx.strokeStyle = theme.ink;
  ctx.lineWidth = 1.25 * px;
  ctx.stroke();
  ctx.restore();
}

function wallWithGaps(ctx: Ctx, at: (s: number) => [number, number], len: number, gaps: (readonly [number, number])[]) {
  ctx.beginPath();
  let s = 0;
  for (const [a, b] of gaps) {
    if (a > s) { ctx.moveTo(...at(s)); ctx.lineTo(...at(Math.min(a, len))); }
    s = Math.max(s, b);
  }
  if (s < len) { ctx.moveTo(...at(s)); ctx.lineTo(...at(len)); }
  ctx.stroke();
}

function label(ctx: Ctx, text: string, x: number, y: number, px: number, fonts: typeof canvasFonts, rotate: number) {
  ctx.save();
  ctx.translate(x, y);
  if (rotate) ctx.rotate(rotate);
  ctx.font = `${BAY_WORD_PX * px}px ${fonts.text}`;
  ctx.textAlign = 'center';
  ctx.textBaseline = 'middle';
  // On paper, as the dimension values are: the rear doors' swing lines run through their word.
  const w = ctx.measureText(text).width;
  ctx.fillStyle = 'rgba(245,242,234,0.92)';
  ctx.fillRect(-w / 2 - 2 * px, -0.65 * BAY_WORD_PX * px, w + 4 * px, 1.3 * BAY_WORD_PX * px);
  ctx.fillStyle = theme.inkSoft;
  ctx.fillText(text, 0, 0);
  ctx.restore();
}
