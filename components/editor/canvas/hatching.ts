/**
 * Material hatching as cached pattern tiles, one per material family and device pixel ratio,
 * held at a constant size on screen whatever the zoom: timber a fine diagonal hatch, upholstery a
 * soft stipple, the build-up band a light hatch, wheel arches a cross-hatch. One fill call per
 * shape instead of thousands of line nodes. Browser canvas only; never imported by the store.
 */
import { theme } from '../theme';
import { palette, withAlpha } from '@/lib/look';

export type HatchKind = 'timber' | 'stipple' | 'band' | 'cross' | 'wash';

const TILE_CSS_PX: Record<HatchKind, number> = { timber: 7, stipple: 6, band: 9, cross: 8, wash: 4 };
const cache = new Map<string, CanvasPattern | null>();

function drawTile(c: CanvasRenderingContext2D, kind: HatchKind, s: number, pr: number) {
  c.lineCap = 'square';
  switch (kind) {
    case 'timber':
      c.strokeStyle = 'rgba(74, 90, 97, 0.42)';
      c.lineWidth = 0.8 * pr;
      diagonal(c, s, 1);
      break;
    case 'band':
      c.strokeStyle = 'rgba(138, 150, 155, 0.55)';
      c.lineWidth = 0.7 * pr;
      diagonal(c, s, -1);
      break;
    case 'cross':
      c.strokeStyle = withAlpha(palette.ink, 0.5);
      c.lineWidth = 0.8 * pr;
      diagonal(c, s, 1);
      diagonal(c, s, -1);
      break;
    case 'stipple':
      c.fillStyle = 'rgba(74, 90, 97, 0.5)';
      dot(c, s * 0.25, s * 0.25, 0.65 * pr);
      dot(c, s * 0.75, s * 0.75, 0.65 * pr);
      break;
    case 'wash':
      c.fillStyle = 'rgba(138, 150, 155, 0.18)';
      c.fillRect(0, 0, s, s);
      c.fillStyle = 'rgba(74, 90, 97, 0.35)';
      dot(c, s / 2, s / 2, 0.45 * pr);
      break;
  }
}

function diagonal(c: CanvasRenderingContext2D, s: number, dir: 1 | -1) {
  c.beginPath();
  // Three strokes so the tile joins seamlessly with its neighbours.
  for (const o of [-s, 0, s]) {
    if (dir === 1) { c.moveTo(o, s); c.lineTo(o + s, 0); } else { c.moveTo(o, 0); c.lineTo(o + s, s); }
  }
  c.stroke();
}

function dot(c: CanvasRenderingContext2D, x: number, y: number, r: number) {
  c.beginPath();
  c.arc(x, y, r, 0, Math.PI * 2);
  c.fill();
}

function tile(kind: HatchKind, pr: number): CanvasPattern | null {
  const key = `${kind}@${pr}`;
  if (cache.has(key)) return cache.get(key)!;
  if (typeof document === 'undefined') return null;
  const s = Math.max(2, Math.round(TILE_CSS_PX[kind] * pr));
  const canvas = document.createElement('canvas');
  canvas.width = s;
  canvas.height = s;
  const c = canvas.getContext('2d');
  let pattern: CanvasPattern | null = null;
  if (c) {
    drawTile(c, kind, s, pr);
    pattern = c.createPattern(canvas, 'repeat');
  }
  cache.set(key, pattern);
  return pattern;
}

/**
 * Fill the current path with `kind` hatching at constant screen size. The tile is mapped back
 * through the context's scale (not its translation), so it is drawn in device pixels, stays crisp
 * at any zoom, and moves with the drawing when it is panned.
 */
export function fillHatch(ctx: CanvasRenderingContext2D, kind: HatchKind): void {
  const pr = typeof window !== 'undefined' ? Math.max(1, Math.round(window.devicePixelRatio || 1)) : 1;
  const pattern = tile(kind, pr);
  if (!pattern) return;
  const m = ctx.getTransform();
  if (typeof DOMMatrix !== 'undefined' && pattern.setTransform && m.a !== 0 && m.d !== 0) {
    pattern.setTransform(new DOMMatrix([1 / m.a, 0, 0, 1 / m.d, 0, 0]));
  }
  ctx.fillStyle = pattern;
  ctx.fill();
}

export const hatchInk = theme.inkSoft;
