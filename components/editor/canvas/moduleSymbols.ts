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
import { KIND_SHORT_NAMES } from '@/lib/symbols/kind-short-names';
import { formatSize, type LengthUnit } from '@/lib/layout/units';
import { LABEL_LOOK, labelNames, placeModuleLabel, type LabelFace, type LabelPlacement, type LabelRequest, type MeasureText, type TextBox } from '../geometry/labels';

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
  /** The person's units for the size written in the module; without it no size is written. */
  units?: LengthUnit;
  /** The label's place worked out for the whole plan (`placePlanLabels`); without it, for this module alone. */
  placement?: LabelPlacement;
  /** False: the body only; the plan writes every label afterwards (`drawModuleLabel`), over all bodies. */
  label?: boolean;
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
  if (!o.phantom && o.label !== false) drawLabel(ctx, m, o, px);
  ctx.restore();
}

/**
 * A module's label alone, from the module's corner (the caller translates there). The plan draws
 * the labels after every module's body, so a module drawn later never covers an earlier one's name.
 */
export function drawModuleLabel(ctx: Ctx, m: ModuleLook, o: DrawOptions): void {
  ctx.save();
  drawLabel(ctx, m, o, 1 / o.scale);
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

/** What a module's label says: its names (with where it is mounted, if outside) and its size. */
export function labelRequestOf(m: ModuleLook, o: Pick<DrawOptions, 'scale' | 'units'>): LabelRequest {
  const names = labelNames(m.label, KINDS[m.kind].title, KIND_SHORT_NAMES[m.kind]);
  const outside = m.mount !== undefined && m.mount !== 'inside';
  return {
    width: m.length * o.scale,
    height: m.width * o.scale,
    names: outside ? { ...names, full: `${names.full} (${MOUNT_TAG[m.mount as keyof typeof MOUNT_TAG]})` } : names,
    dimension: o.units ? formatSize(m.length, m.width, o.units) : '',
  };
}

/** The canvas font of a label's face and size. */
export function labelFont(fonts: { text: string; mono: string } | undefined, face: LabelFace, size: number): string {
  const f = fonts ?? canvasFonts;
  return face === 'text' ? `500 ${size}px ${f.text}` : `${size}px ${f.mono}`;
}

/** Text measured on a 2D context, for `placeModuleLabel`. */
export function canvasMeasure(ctx: Ctx, fonts: DrawOptions['fonts']): MeasureText {
  return (text, face, size) => {
    ctx.font = labelFont(fonts, face, size);
    return ctx.measureText(text).width;
  };
}

/**
 * The module's name and size: the plan's placement when given (clear of every other module's label),
 * else placed for this module alone — the longest form of the name that fits, and the size below
 * it, along it or outside on a leader, never over it.
 */
function drawLabel(ctx: Ctx, m: ModuleLook, o: DrawOptions, px: number) {
  const placed = o.placement ?? placeModuleLabel(labelRequestOf(m, o), canvasMeasure(ctx, o.fonts));
  ctx.textAlign = 'center';
  ctx.textBaseline = 'middle';
  const put = (b: TextBox, face: LabelFace, size: number, ink: string) => {
    ctx.save();
    ctx.scale(px, px); // draw in screen px from the module's corner
    ctx.fillStyle = 'rgba(245,242,234,0.85)';
    ctx.fillRect(b.cx - b.width / 2 - 2, b.cy - b.height / 2, b.width + 4, b.height);
    ctx.translate(b.cx, b.cy);
    if (b.rotation) ctx.rotate(-Math.PI / 2);
    ctx.font = labelFont(o.fonts, face, size);
    ctx.fillStyle = ink;
    ctx.fillText(b.text, 0, 0);
    ctx.restore();
  };
  if (placed.leader) {
    const l = placed.leader;
    ctx.beginPath();
    ctx.moveTo(l.x0 * px, l.y0 * px);
    ctx.lineTo(l.x1 * px, l.y1 * px);
    ctx.strokeStyle = theme.inkSoft;
    ctx.lineWidth = 0.8 * px;
    ctx.stroke();
  }
  if (placed.name) put(placed.name, 'text', LABEL_LOOK.nameSize, theme.ink);
  if (placed.dimension) put(placed.dimension, 'mono', LABEL_LOOK.dimensionSize, theme.inkSoft);
}
