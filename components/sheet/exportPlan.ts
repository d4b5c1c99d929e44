/**
 * Browser-side exports of what the editor shows: a picture of this view (the Konva stage drawn
 * onto paper at twice the screen resolution, with a title strip along its foot: layout,
 * arrangement, revision, date, a scale bar and the one-line safety caution) and the layout file.
 * Konva is imported only when a picture is asked for (the editor has loaded it by then).
 * Must never change the document.
 */
import { theme, canvasFonts } from '@/components/editor/theme';
import { ONE_LINE_CAUTION } from '@/lib/layout/cautions';

export function downloadBlob(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = url;
  a.download = fileName;
  a.rel = 'noopener';
  document.body.appendChild(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

/** What the title strip of a picture says. */
export interface PictureTitle {
  layout: string;
  arrangement: string;
  /** "Preliminary (version 12)" or "Revision B · Approved". */
  revision: string;
  /** As the studio writes dates. */
  date: string;
  /** Screen pixels per millimetre of the view (the viewport's scale), for the scale bar. */
  pxPerMm: number;
}

/** Height of the title strip in picture pixels at pixel ratio 1. */
export const TITLE_STRIP_PX = 58;

/** The longest round length (100 mm, 200 mm, 500 mm, 1 m, 2 m…) that fits in `maxPx` at this scale. */
export function scaleBarMm(pxPerMm: number, maxPx: number): number {
  const steps = [10, 20, 50, 100, 200, 500, 1000, 2000, 5000];
  let best = steps[0];
  for (const s of steps) if (s * pxPerMm <= maxPx) best = s;
  return best;
}

function drawTitleStrip(ctx: CanvasRenderingContext2D, width: number, top: number, r: number, t: PictureTitle): void {
  const h = TITLE_STRIP_PX * r;
  ctx.fillStyle = theme.white;
  ctx.fillRect(0, top, width, h);
  ctx.strokeStyle = theme.ink;
  ctx.lineWidth = 1.5 * r;
  ctx.beginPath();
  ctx.moveTo(0, top + 0.75 * r);
  ctx.lineTo(width, top + 0.75 * r);
  ctx.stroke();
  const pad = 12 * r;
  ctx.textBaseline = 'alphabetic';
  ctx.fillStyle = theme.ink;
  ctx.font = `600 ${13 * r}px ${canvasFonts.text}`;
  ctx.fillText(t.layout, pad, top + 20 * r);
  ctx.font = `${11 * r}px ${canvasFonts.text}`;
  ctx.fillStyle = theme.inkSoft;
  ctx.fillText(`${t.arrangement} · ${t.revision} · ${t.date}`, pad, top + 36 * r);
  ctx.font = `${10 * r}px ${canvasFonts.text}`;
  ctx.fillStyle = theme.ochre;
  ctx.fillText(`⚠ ${ONE_LINE_CAUTION}`, pad, top + 51 * r, width - 2 * pad);

  // Scale bar at the right: alternate ink and white cells, the length above it.
  const barMm = scaleBarMm(t.pxPerMm * r, Math.min(220 * r, width / 3));
  const barPx = barMm * t.pxPerMm * r;
  const x0 = width - pad - barPx;
  const y0 = top + 24 * r;
  const cells = 4;
  for (let i = 0; i < cells; i++) {
    ctx.fillStyle = i % 2 ? theme.white : theme.ink;
    ctx.fillRect(x0 + (i * barPx) / cells, y0, barPx / cells, 5 * r);
  }
  ctx.strokeStyle = theme.ink;
  ctx.lineWidth = 1 * r;
  ctx.strokeRect(x0, y0, barPx, 5 * r);
  ctx.fillStyle = theme.ink;
  ctx.font = `${10 * r}px ${canvasFonts.mono}`;
  ctx.textAlign = 'right';
  ctx.fillText(barMm >= 1000 ? `${barMm / 1000} m` : `${barMm} mm`, width - pad, top + 18 * r);
  ctx.textAlign = 'left';
  ctx.fillText('0', x0, top + 18 * r);
}

/** The current canvas view as a PNG picture: the stage under `planElement`, on paper, with its title strip. */
export async function planToPng(planElement: HTMLElement, title: PictureTitle, pixelRatio = 2): Promise<Blob> {
  const Konva = (await import('konva/lib/Core')).default;
  const stage = Konva.stages.find((s) => planElement.contains(s.container()));
  if (!stage) throw new Error('The plan is not drawn yet; wait a moment and try again.');
  const drawn = stage.toCanvas({ pixelRatio });
  const out = document.createElement('canvas');
  out.width = drawn.width;
  out.height = drawn.height + TITLE_STRIP_PX * pixelRatio;
  const ctx = out.getContext('2d');
  if (!ctx) throw new Error('This browser cannot make a picture here.');
  ctx.fillStyle = theme.paper;
  ctx.fillRect(0, 0, out.width, out.height);
  ctx.drawImage(drawn, 0, 0);
  drawTitleStrip(ctx, out.width, drawn.height, pixelRatio, title);
  return new Promise((resolve, reject) => out.toBlob((b) => (b ? resolve(b) : reject(new Error('The picture could not be made.'))), 'image/png'));
}
