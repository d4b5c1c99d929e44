/**
 * How each module kind is drawn on the plan: its material family's hatching (timber hatch,
 * upholstery stipple, water fill line, electrics dotted border, gas double outline) and its own
 * small symbol (sink bowl, hob rings, bed pillow, tank fill line…), a mark on its working face and
 * its label. Draws in mm on a context already transformed by the layer; line widths and text are
 * sized in screen pixels via `scale`. Never reads the store; never creates Konva nodes.
 */
import { KINDS } from '@/lib/layout/kinds';
import type { Facing, Module } from '@/lib/layout/schema';
import { theme, canvasFonts } from '../theme';
import { fillHatch } from './hatching';

export interface ModuleLook {
  kind: Module['kind'];
  label?: string;
  length: number;
  width: number;
  facing: Facing;
  props?: Module['props'];
}

export interface DrawOptions {
  /** Screen px per mm. */
  scale: number;
  phantom?: boolean;
  fonts?: { text: string; mono: string };
}

type Ctx = CanvasRenderingContext2D;

export function drawModule(ctx: Ctx, m: ModuleLook, o: DrawOptions): void {
  const spec = KINDS[m.kind];
  const px = 1 / o.scale;
  const L = m.length, W = m.width;
  ctx.save();
  if (o.phantom) ctx.globalAlpha = 0.45;

  // Base sheet and family hatching.
  ctx.beginPath();
  ctx.rect(0, 0, L, W);
  ctx.fillStyle = o.phantom ? 'rgba(245,242,234,0.2)' : theme.paper;
  ctx.fill();
  if (!o.phantom) {
    if (spec.family === 'timber') fillHatch(ctx, 'timber');
    else if (spec.family === 'upholstery') fillHatch(ctx, 'stipple');
  }

  // Outline by family.
  ctx.lineWidth = 1.25 * px;
  ctx.strokeStyle = theme.ink;
  // Phantom line (alternate position): long dash, two short dashes. Hidden edges: plain dashes.
  ctx.setLineDash(o.phantom ? [12 * px, 2.5 * px, 2.5 * px, 2.5 * px, 2.5 * px, 2.5 * px] : m.kind === 'overhead-locker' || m.kind === 'bed-infill' ? [5 * px, 3 * px] : []);
  if (spec.family === 'electrics' && !o.phantom) ctx.setLineDash([1.2 * px, 2.6 * px]);
  ctx.strokeRect(0, 0, L, W);
  ctx.setLineDash([]);
  if (spec.family === 'gas' && !o.phantom) {
    const inset = Math.min(3 * px, L / 4, W / 4);
    ctx.lineWidth = 0.9 * px;
    ctx.strokeRect(inset, inset, L - 2 * inset, W - 2 * inset);
  }

  const screenMin = Math.min(L, W) * o.scale;
  if (!o.phantom && screenMin >= 10) {
    ctx.lineWidth = 1 * px;
    ctx.strokeStyle = theme.inkSoft;
    drawSymbol(ctx, m, px);
    drawFacing(ctx, m, px);
  }
  if (screenMin >= 18 && L * o.scale >= 36) drawLabel(ctx, m.label || spec.title, L, W, o, px);
  ctx.restore();
}

function drawSymbol(ctx: Ctx, m: ModuleLook, px: number) {
  const L = m.length, W = m.width;
  const cx = L / 2, cy = W / 2;
  const short = Math.min(L, W);
  switch (m.kind) {
    case 'sink-unit': {
      const bw = L * 0.62, bh = W * 0.55;
      roundRect(ctx, cx - bw / 2, cy - bh / 2, bw, bh, Math.min(bw, bh) * 0.2);
      ctx.stroke();
      circle(ctx, cx, cy, Math.max(2 * px, short * 0.05));
      ctx.stroke();
      break;
    }
    case 'hob': {
      const n = Math.max(1, Math.min(4, Number(m.props?.burners ?? 2) || 2));
      const cols = n <= 2 ? n : 2;
      const rows = Math.ceil(n / cols);
      const r = Math.min(L / cols, W / rows) * 0.3;
      for (let i = 0; i < n; i++) {
        const x = (L / cols) * ((i % cols) + 0.5);
        const y = (W / rows) * (Math.floor(i / cols) + 0.5);
        circle(ctx, x, y, r); ctx.stroke();
        circle(ctx, x, y, r * 0.45); ctx.stroke();
      }
      break;
    }
    case 'fridge': {
      const r = short * 0.22;
      ctx.beginPath();
      for (let i = 0; i < 3; i++) {
        const a = (Math.PI / 3) * i;
        ctx.moveTo(cx - Math.cos(a) * r, cy - Math.sin(a) * r);
        ctx.lineTo(cx + Math.cos(a) * r, cy + Math.sin(a) * r);
      }
      ctx.stroke();
      break;
    }
    case 'fresh-water-tank':
    case 'grey-water-tank': {
      // Fill line at the tank's level (props.fillLevel 0..1, three quarters if not given).
      const level = clamp01(Number(m.props?.fillLevel ?? 0.75));
      const y = W * (1 - level);
      ctx.beginPath();
      ctx.rect(0, y, L, W - y);
      fillHatch(ctx, 'wash');
      ctx.beginPath();
      ctx.moveTo(0, y); ctx.lineTo(L, y);
      if (m.kind === 'grey-water-tank') ctx.setLineDash([4 * px, 2 * px]);
      ctx.stroke();
      ctx.setLineDash([]);
      break;
    }
    case 'gas-locker': {
      const n = Math.max(1, Math.min(3, Number(m.props?.cylinders ?? 1) || 1));
      const r = Math.min(L / n, W) * 0.3;
      for (let i = 0; i < n; i++) { circle(ctx, (L / n) * (i + 0.5), cy, r); ctx.stroke(); }
      break;
    }
    case 'electrics-bay': {
      const h = short * 0.5;
      ctx.beginPath();
      ctx.moveTo(cx + h * 0.15, cy - h / 2);
      ctx.lineTo(cx - h * 0.2, cy + h * 0.05);
      ctx.lineTo(cx + h * 0.15, cy + h * 0.05);
      ctx.lineTo(cx - h * 0.15, cy + h / 2);
      ctx.stroke();
      break;
    }
    case 'heater': {
      ctx.beginPath();
      for (let k = 0; k < 3; k++) {
        const x0 = L * (0.3 + 0.2 * k);
        ctx.moveTo(x0, W * 0.2);
        ctx.bezierCurveTo(x0 + L * 0.08, W * 0.4, x0 - L * 0.08, W * 0.6, x0, W * 0.8);
      }
      ctx.stroke();
      break;
    }
    case 'toilet-cabinet': {
      ctx.beginPath();
      ctx.ellipse(cx, cy, L * 0.28, W * 0.34, 0, 0, Math.PI * 2);
      ctx.stroke();
      break;
    }
    case 'shower-tray': {
      ctx.beginPath();
      ctx.moveTo(0, 0); ctx.lineTo(L, W); ctx.moveTo(L, 0); ctx.lineTo(0, W);
      ctx.stroke();
      circle(ctx, cx, cy, short * 0.06);
      ctx.fillStyle = theme.paper; ctx.fill(); ctx.stroke();
      break;
    }
    case 'bed-platform': {
      // Pillow at the end nearest the cab unless the bed faces rearwards.
      const alongX = L >= W;
      const pw = alongX ? Math.min(L * 0.14, 300) : W * 0.7;
      const ph = alongX ? W * 0.7 : Math.min(W * 0.14, 300);
      const px0 = alongX ? (m.facing === 'rear' ? L - pw - L * 0.04 : L * 0.04) : (L - pw) / 2;
      const py0 = alongX ? (W - ph) / 2 : W * 0.04;
      roundRect(ctx, px0, py0, pw, ph, Math.min(pw, ph) * 0.2);
      ctx.fillStyle = theme.paper; ctx.fill(); ctx.stroke();
      break;
    }
    case 'bench-seat':
    case 'seat': {
      // Backrest band on the side opposite the face the seat is used from.
      const band = Math.min(short * 0.22, 120);
      ctx.beginPath();
      const side = opposite(m.facing);
      bandRect(ctx, side, L, W, band);
      ctx.fillStyle = 'rgba(138,150,155,0.25)'; ctx.fill(); ctx.stroke();
      if (m.kind === 'seat' && m.props?.belted) {
        ctx.beginPath();
        ctx.moveTo(L * 0.25, W * 0.25); ctx.lineTo(L * 0.75, W * 0.75);
        ctx.stroke();
      }
      break;
    }
    case 'wardrobe': {
      ctx.setLineDash([3 * px, 2 * px]);
      ctx.beginPath();
      if (L >= W) { ctx.moveTo(L * 0.1, cy); ctx.lineTo(L * 0.9, cy); } else { ctx.moveTo(cx, W * 0.1); ctx.lineTo(cx, W * 0.9); }
      ctx.stroke();
      ctx.setLineDash([]);
      break;
    }
    case 'drawer-unit': {
      ctx.beginPath();
      const n = 3;
      for (let i = 1; i <= n; i++) {
        const t = i / (n + 1);
        if (m.facing === 'left' || m.facing === 'right') { ctx.moveTo(L * 0.15, W * t); ctx.lineTo(L * 0.85, W * t); } else { ctx.moveTo(L * t, W * 0.15); ctx.lineTo(L * t, W * 0.85); }
      }
      ctx.stroke();
      break;
    }
    case 'table': {
      roundRect(ctx, L * 0.08, W * 0.08, L * 0.84, W * 0.84, short * 0.1);
      ctx.stroke();
      break;
    }
    case 'step': {
      ctx.beginPath();
      for (const t of [0.35, 0.6]) {
        ctx.moveTo(L * (t - 0.12), W * 0.25); ctx.lineTo(L * t, cy); ctx.lineTo(L * (t - 0.12), W * 0.75);
      }
      ctx.stroke();
      break;
    }
    default:
      break;
  }
}

/** A short heavy bar on the working face: the side the module is used from. */
function drawFacing(ctx: Ctx, m: ModuleLook, px: number) {
  const L = m.length, W = m.width;
  ctx.save();
  ctx.strokeStyle = theme.ink;
  ctx.lineWidth = 2.5 * px;
  ctx.beginPath();
  const f = 0.3;
  switch (m.facing) {
    case 'front': ctx.moveTo(0, W * f); ctx.lineTo(0, W * (1 - f)); break;
    case 'rear': ctx.moveTo(L, W * f); ctx.lineTo(L, W * (1 - f)); break;
    case 'left': ctx.moveTo(L * f, 0); ctx.lineTo(L * (1 - f), 0); break;
    case 'right': ctx.moveTo(L * f, W); ctx.lineTo(L * (1 - f), W); break;
  }
  ctx.stroke();
  ctx.restore();
}

function drawLabel(ctx: Ctx, text: string, L: number, W: number, o: DrawOptions, px: number) {
  const size = 11 * px;
  ctx.font = `500 ${size}px ${o.fonts?.text ?? canvasFonts.text}`;
  ctx.textAlign = 'center';
  ctx.textBaseline = 'middle';
  const maxW = L - 8 * px;
  let t = text;
  while (t.length > 1 && ctx.measureText(t).width > maxW) t = t.slice(0, -2) + '…';
  const w = ctx.measureText(t).width;
  const y = W / 2 + (W * o.scale > 44 ? Math.min(W * 0.3, 14 * px) : 0);
  ctx.fillStyle = 'rgba(245,242,234,0.85)';
  ctx.fillRect(L / 2 - w / 2 - 2 * px, y - size * 0.65, w + 4 * px, size * 1.3);
  ctx.fillStyle = theme.ink;
  ctx.fillText(t, L / 2, y);
}

function opposite(f: Facing): Facing {
  return f === 'front' ? 'rear' : f === 'rear' ? 'front' : f === 'left' ? 'right' : 'left';
}
function bandRect(ctx: Ctx, side: Facing, L: number, W: number, band: number) {
  if (side === 'front') ctx.rect(0, 0, band, W);
  else if (side === 'rear') ctx.rect(L - band, 0, band, W);
  else if (side === 'left') ctx.rect(0, 0, L, band);
  else ctx.rect(0, W - band, L, band);
}
function circle(ctx: Ctx, x: number, y: number, r: number) {
  ctx.beginPath();
  ctx.arc(x, y, Math.max(0, r), 0, Math.PI * 2);
}
function roundRect(ctx: Ctx, x: number, y: number, w: number, h: number, r: number) {
  const rr = Math.max(0, Math.min(r, w / 2, h / 2));
  ctx.beginPath();
  ctx.moveTo(x + rr, y);
  ctx.arcTo(x + w, y, x + w, y + h, rr);
  ctx.arcTo(x + w, y + h, x, y + h, rr);
  ctx.arcTo(x, y + h, x, y, rr);
  ctx.arcTo(x, y, x + w, y, rr);
  ctx.closePath();
}
function clamp01(v: number) {
  return Number.isFinite(v) ? Math.min(1, Math.max(0, v)) : 0.75;
}
