/**
 * The bay's openings as plan marks, and which one is under the pointer. A window is the drafting
 * symbol on its wall line: the wall's thickness cut by two jamb lines with two thin glazing lines
 * between them, along the wall (a window in a door sits on the door's opening); a roof opening is
 * a dashed rectangle overhead with a cross and its word; a body point is a small circle just
 * outside the wall line, joined to it by a tick, and a point under the floor a circle with a cross.
 * Openings belong to the bay, so the marks never depend on the arrangement on show.
 * Pure math in mm (`px` is mm per screen pixel, for the sizes that stay the same on screen); never
 * reads the DOM or the store.
 */
import type { Bay, LayoutDoc, Opening } from '@/lib/layout/schema';
import type { Rect } from '@/lib/geometry/rect';
import { buildUpThickness } from '@/lib/layout/bay';
import { bodyPointAt, roofOpeningRect, wallRectInPlan, windowOnWall, type BayWall } from '@/lib/layout/openings';
import type { MeasureText, TextBox } from './labels';

export interface Segment {
  x0: number; y0: number;
  x1: number; y1: number;
}

export interface WindowMark {
  id: string;
  type: 'window';
  wall: BayWall;
  /** The wall's thickness over the glass's length, from the bare outer face to the lining. */
  rect: Rect;
  /** The two jamb lines across the wall at the glass's ends. */
  jambs: [Segment, Segment];
  /** The two glazing lines along the wall, at a third and two thirds of its thickness. */
  panes: [Segment, Segment];
  opens: boolean;
}

export interface RoofMark {
  id: string;
  type: 'roof-opening';
  kind: 'vent' | 'fan' | 'skylight';
  rect: Rect;
  /** Its two diagonals. */
  cross: [Segment, Segment];
  word: string;
}

export interface PointMark {
  id: string;
  type: 'body-point';
  underside: boolean;
  /** The marker's centre: outside the wall line for a point on a wall, on the point itself under the floor. */
  at: { x: number; y: number };
  /** Where the point is on the wall line (the marker's tick runs to here). */
  foot: { x: number; y: number };
  word: string;
}

export type OpeningMark = WindowMark | RoofMark | PointMark;

/** The smallest wall thickness a window symbol is drawn across, in screen px (so a bay with no build-up still shows it). */
export const WINDOW_MIN_PX = 8;
/** A body point's marker: its radius and how far outside the wall line its centre sits, in screen px. */
export const POINT_RADIUS_PX = 4;
export const POINT_OFFSET_PX = 12;
/** A roof opening's outline takes the pointer only this close (screen px), whatever the slop: it lies over modules. */
export const ROOF_EDGE_PX = 3;
/** The roof opening's line: long dashes (screen px), unlike the chain line of modules mounted outside. */
export const ROOF_OPENING_DASH_PX = [14, 4] as const;

const ROOF_WORDS: Record<RoofMark['kind'], string> = { vent: 'vent', fan: 'fan', skylight: 'skylight' };
const POINT_WORDS: Record<'fuel-filler' | 'heater-exhaust' | 'heater-intake' | 'gas-drop-vent', string> = {
  'fuel-filler': 'fuel filler',
  'heater-exhaust': 'exhaust',
  'heater-intake': 'intake',
  'gas-drop-vent': 'drop vent',
};

/** The window symbol on its wall, `t` mm thick (the wall's build-up, at least `WINDOW_MIN_PX` on screen). */
export function windowMark(bay: Pick<Bay, 'length' | 'width' | 'doors'>, floorT: number, t: number, o: Extract<Opening, { type: 'window' }>): WindowMark | null {
  const r = windowOnWall(bay, floorT, o);
  if (!r) return null;
  const rect = wallRectInPlan(bay, r, t);
  let jambs: [Segment, Segment], panes: [Segment, Segment];
  if (r.wall === 'rear') {
    jambs = [{ x0: rect.x0, y0: rect.y0, x1: rect.x1, y1: rect.y0 }, { x0: rect.x0, y0: rect.y1, x1: rect.x1, y1: rect.y1 }];
    const a = bay.length - t / 3, b = bay.length - (2 * t) / 3;
    panes = [{ x0: a, y0: rect.y0, x1: a, y1: rect.y1 }, { x0: b, y0: rect.y0, x1: b, y1: rect.y1 }];
  } else {
    jambs = [{ x0: rect.x0, y0: rect.y0, x1: rect.x0, y1: rect.y1 }, { x0: rect.x1, y0: rect.y0, x1: rect.x1, y1: rect.y1 }];
    const outer = r.wall === 'left' ? 0 : bay.width;
    const inward = r.wall === 'left' ? 1 : -1;
    const a = outer + (inward * t) / 3, b = outer + (inward * 2 * t) / 3;
    panes = [{ x0: rect.x0, y0: a, x1: rect.x1, y1: a }, { x0: rect.x0, y0: b, x1: rect.x1, y1: b }];
  }
  return { id: o.id, type: 'window', wall: r.wall, rect, jambs, panes, opens: o.opens };
}

/** Every opening of the bay as a plan mark; `px` is mm per screen pixel at the current zoom. */
export function openingMarks(doc: Pick<LayoutDoc, 'bay' | 'buildUp'>, px: number): OpeningMark[] {
  const { floorT, wallT } = buildUpThickness(doc);
  const t = Math.max(wallT, WINDOW_MIN_PX * px);
  const out: OpeningMark[] = [];
  for (const o of doc.bay.openings) {
    if (o.type === 'window') {
      const m = windowMark(doc.bay, floorT, t, o);
      if (m) out.push(m);
    } else if (o.type === 'roof-opening') {
      const rect = roofOpeningRect(o);
      out.push({
        id: o.id, type: 'roof-opening', kind: o.kind, rect, word: ROOF_WORDS[o.kind],
        cross: [{ x0: rect.x0, y0: rect.y0, x1: rect.x1, y1: rect.y1 }, { x0: rect.x0, y0: rect.y1, x1: rect.x1, y1: rect.y0 }],
      });
    } else {
      const p = bodyPointAt(doc.bay, o);
      const foot = { x: p.x, y: p.y };
      const off = POINT_OFFSET_PX * px;
      const at = o.wall === 'left' ? { x: p.x, y: -off } : o.wall === 'right' ? { x: p.x, y: doc.bay.width + off } : o.wall === 'rear' ? { x: doc.bay.length + off, y: p.y } : foot;
      out.push({ id: o.id, type: 'body-point', underside: o.wall === 'underside', at, foot, word: POINT_WORDS[o.kind] });
    }
  }
  return out;
}

/** The size of a mark's word on screen, px (the plan's text face). */
export const MARK_WORD_PX = 9;

/** Where a roof opening's or body point's word is written, its centre in mm; a window has none. */
export function markWord(m: OpeningMark, px: number): { text: string; x: number; y: number } | null {
  if (m.type === 'roof-opening') return { text: m.word, x: (m.rect.x0 + m.rect.x1) / 2, y: m.rect.y0 + 8 * px };
  if (m.type === 'body-point') return { text: m.word, x: m.at.x, y: m.at.y + (m.underside || m.at.y >= m.foot.y ? 1 : -1) * 10 * px };
  return null;
}

/**
 * What the marks write or draw small on the plan that a module's label must keep clear of, as
 * boxes in the plan's px (mm × `scale`, as `placePlanLabels` takes them): each word, and each
 * body point's circle. Window symbols and roof outlines lie on walls and over modules and are
 * left to be written across.
 */
export function markTextBoxes(marks: readonly OpeningMark[], scale: number, measure: MeasureText): TextBox[] {
  const px = 1 / scale;
  const out: TextBox[] = [];
  for (const m of marks) {
    const w = markWord(m, px);
    if (w) out.push({ text: w.text, cx: w.x * scale, cy: w.y * scale, width: measure(w.text, 'text', MARK_WORD_PX) + 4, height: MARK_WORD_PX * 1.3, rotation: 0 });
    if (m.type === 'body-point') out.push({ text: '', cx: m.at.x * scale, cy: m.at.y * scale, width: 2 * POINT_RADIUS_PX + 2, height: 2 * POINT_RADIUS_PX + 2, rotation: 0 });
  }
  return out;
}

/** A mark's box in plan (for halos and selection outlines). */
export function markBox(m: OpeningMark, px: number): Rect {
  if (m.type !== 'body-point') return m.rect;
  const r = (POINT_RADIUS_PX + 2) * px;
  return { x0: m.at.x - r, y0: m.at.y - r, x1: m.at.x + r, y1: m.at.y + r };
}

const inRect = (r: Rect, x: number, y: number, slop: number) => x >= r.x0 - slop && x <= r.x1 + slop && y >= r.y0 - slop && y <= r.y1 + slop;

/**
 * The opening whose mark is under (x, y) in mm, with `slop` mm to spare: body points first (the
 * smallest), then windows, then a roof opening's outline within `ROOF_EDGE_PX`. A roof opening's
 * inside is left to the modules under it (`roofOpeningInside` asks after them), so a vent over the
 * counter does not hide it.
 */
export function openingAt(marks: OpeningMark[], x: number, y: number, px: number, slop: number): OpeningMark | undefined {
  for (const m of marks) {
    if (m.type !== 'body-point') continue;
    const reach = POINT_RADIUS_PX * px + slop;
    if (Math.hypot(x - m.at.x, y - m.at.y) <= reach || Math.hypot(x - m.foot.x, y - m.foot.y) <= slop) return m;
  }
  for (const m of marks) if (m.type === 'window' && inRect(m.rect, x, y, slop)) return m;
  for (const m of marks) {
    if (m.type !== 'roof-opening') continue;
    const edge = Math.min(slop, ROOF_EDGE_PX * px);
    if (inRect(m.rect, x, y, edge) && !inRect(m.rect, x, y, -edge)) return m;
  }
  return undefined;
}

/** The roof opening whose inside holds (x, y), the last drawn first. */
export function roofOpeningInside(marks: OpeningMark[], x: number, y: number): OpeningMark | undefined {
  for (let i = marks.length - 1; i >= 0; i--) {
    const m = marks[i];
    if (m.type === 'roof-opening' && inRect(m.rect, x, y, 0)) return m;
  }
  return undefined;
}

/** A point that selects the mark when clicked (mm): a window's middle, a roof opening's front edge, a body point's marker. */
export function markHitPoint(m: OpeningMark): { x: number; y: number } {
  if (m.type === 'body-point') return m.at;
  if (m.type === 'window') return { x: (m.rect.x0 + m.rect.x1) / 2, y: (m.rect.y0 + m.rect.y1) / 2 };
  return { x: m.rect.x0, y: (m.rect.y0 + m.rect.y1) / 2 };
}
