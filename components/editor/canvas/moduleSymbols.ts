/**
 * How each module kind is drawn on the plan: its material family's hatching (timber hatch,
 * upholstery stipple, water fill line, electrics dotted border, gas double outline) and its own
 * symbol and working-face mark from the one symbol table shared with the plan sheet
 * (lib/symbols/module-symbols.ts), and its label. Draws in mm on a context already transformed by the layer; line widths and text are
 * sized in screen pixels via `scale`. Never reads the store; never creates Konva nodes.
 */
import { KINDS } from '@/lib/layout/kinds';
import type { Facing, Module } from '@/lib/layout/schema';
import { theme, canvasFonts } from '../theme';
import { fillHatch } from './hatching';
import { moduleSymbol } from '@/lib/symbols/module-symbols';

export interface ModuleLook {
  kind: Module['kind'];
  label?: string;
  length: number;
  width: number;
  facing: Facing;
  props?: Module['props'];
  /** Outside the body (under the floor, on the roof, behind the rear doors): drawn with a chain outline. */
  mount?: Module['mount'];
}

/** The few words a plan label adds for an outside-mounted module. */
const MOUNT_TAG = { 'under-floor': 'under floor', roof: 'on roof', rear: 'behind doors' } as const;

export interface DrawOptions {
  /** Screen px per mm. */
  scale: number;
  phantom?: boolean;
  fonts?: { text: string; mono: string };
}

type Ctx = CanvasRenderingContext2D;

/** Kinds fixed above head height, drawn in plan as hidden-above lines (dashed, unfilled). */
export function isOverhead(kind: Module['kind']): boolean {
  return kind === 'overhead-locker';
}

export function drawModule(ctx: Ctx, m: ModuleLook, o: DrawOptions): void {
  const spec = KINDS[m.kind];
  const px = 1 / o.scale;
  const L = m.length, W = m.width;
  ctx.save();
  if (o.phantom) ctx.globalAlpha = 0.45;

  // Base sheet and family hatching. Things overhead are drawn as the drafting convention has it:
  // a dashed outline with no fill, so what stands below them (the kitchen) stays readable.
  const overhead = isOverhead(m.kind);
  ctx.beginPath();
  ctx.rect(0, 0, L, W);
  ctx.fillStyle = o.phantom ? 'rgba(245,242,234,0.2)' : theme.paper;
  if (!overhead) ctx.fill();
  if (!o.phantom && !overhead) {
    if (spec.family === 'timber') fillHatch(ctx, 'timber');
    else if (spec.family === 'upholstery') fillHatch(ctx, 'stipple');
  }

  // Outline by family.
  ctx.lineWidth = 1.25 * px;
  ctx.strokeStyle = theme.ink;
  // Phantom line (alternate position): long dash, two short dashes. Hidden edges: plain dashes.
  ctx.setLineDash(o.phantom ? [12 * px, 2.5 * px, 2.5 * px, 2.5 * px, 2.5 * px, 2.5 * px] : overhead || m.kind === 'bed-infill' ? [5 * px, 3 * px] : []);
  if (spec.family === 'electrics' && !o.phantom) ctx.setLineDash([1.2 * px, 2.6 * px]);
  // Outside the body: a heavier chain line (long dash, dot), whatever its family.
  const outside = m.mount !== undefined && m.mount !== 'inside';
  if (outside && !o.phantom) {
    ctx.lineWidth = 1.8 * px;
    ctx.setLineDash([9 * px, 2.5 * px, 1.5 * px, 2.5 * px]);
  }
  ctx.strokeRect(0, 0, L, W);
  ctx.setLineDash([]);
  if (spec.family === 'gas' && !o.phantom) {
    const inset = Math.min(3 * px, L / 4, W / 4);
    ctx.lineWidth = 0.9 * px;
    ctx.strokeRect(inset, inset, L - 2 * inset, W - 2 * inset);
  }

  const screenMin = Math.min(L, W) * o.scale;
  if (!o.phantom && screenMin >= 10) {
    drawSymbol(ctx, m, px);
  }
  const label = m.label || spec.title;
  if (screenMin >= 18 && L * o.scale >= 36) drawLabel(ctx, outside ? `${label} (${MOUNT_TAG[m.mount as keyof typeof MOUNT_TAG]})` : label, L, W, o, px);
  ctx.restore();
}

/** The kind's symbol and working-face mark from the shared table (lib/symbols), in screen-sized pens. */
function drawSymbol(ctx: Ctx, m: ModuleLook, px: number) {
  for (const shape of moduleSymbol({ kind: m.kind, length: m.length, width: m.width, facing: m.facing, props: m.props })) {
    ctx.beginPath();
    if (shape.type === 'circle') ctx.arc(shape.cx, shape.cy, Math.max(0, shape.r), 0, Math.PI * 2);
    else {
      shape.points.forEach(([x, y], i) => (i === 0 ? ctx.moveTo(x, y) : ctx.lineTo(x, y)));
      if (shape.closed) ctx.closePath();
    }
    if (shape.fill === 'water') fillHatch(ctx, 'wash');
    else if (shape.fill) {
      ctx.fillStyle = shape.fill === 'paper' ? theme.paper : 'rgba(138,150,155,0.25)';
      ctx.fill();
    }
    if (shape.stroke === 'none') continue;
    const heavy = shape.stroke === 'heavy';
    ctx.strokeStyle = heavy ? theme.ink : theme.inkSoft;
    ctx.lineWidth = (heavy ? 2.5 : 1) * px;
    ctx.setLineDash(shape.dash === 'dashed' ? [4 * px, 2 * px] : shape.dash === 'dotted' ? [1.2 * px, 2.6 * px] : []);
    ctx.stroke();
  }
  ctx.setLineDash([]);
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

