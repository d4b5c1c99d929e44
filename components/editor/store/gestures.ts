/**
 * Pointer gestures in progress: move, resize and marquee. A gesture holds its live preview
 * (snapped offset or rectangle, guides) but does not change the document until it is committed,
 * so Escape can drop it and a whole drag is one undo entry. Pure functions of the store's data;
 * must never touch Konva nodes (the canvas reads the preview and draws it).
 */
import type { Arrangement, LayoutDoc } from '@/lib/layout';
import { boundingRect } from '@/lib/geometry/rect';
import { footprintRect, modulesIn, rectFootprint, type Footprint } from '@/lib/layout/bay';
import { modulesInMarquee } from '../geometry/hitTest';
import { snapAlong, snapMove, snapResize, snapTargets, wallTargets, type HandleId, type SnapGuide, type SnapOptions, type SnapTargets } from '../geometry/snapping';
import type { Opening } from '@/lib/layout/schema';
import { roofOpeningRect } from '@/lib/layout/openings';
import { movedOpening, positionRange, wallOfOpening } from './openingEdits';

export type Gesture =
  | { kind: 'move'; ids: string[]; box: Footprint; targets: SnapTargets; preview: { dx: number; dy: number; guides: SnapGuide[] } }
  | { kind: 'resize'; ids: [string]; handle: HandleId; start: Footprint; targets: SnapTargets; preview: { rect: Footprint; guides: SnapGuide[] } }
  | { kind: 'marquee'; ids: string[]; additive: boolean; base: string[]; origin: { x: number; y: number }; preview: { rect: Footprint; hits: string[] } }
  /** An opening dragged: along its wall (window, body point on a wall) or in plan (roof opening, underside point). `ids` stays empty: no module moves. */
  | { kind: 'opening'; ids: string[]; start: Opening; along: OpeningAlong | null; targets: SnapTargets; preview: { opening: Opening; guides: SnapGuide[] } };

/** For an opening on a wall: the wall, where its span starts in wall coordinates, how long it is, and how far it may go. */
export interface OpeningAlong {
  wall: 'left' | 'right' | 'rear';
  /** The wall coordinate of `position` 0 (a door's offset for a window in a door). */
  origin: number;
  size: number;
  min: number;
  max: number;
  targets: number[];
}

export function startOpeningMove(doc: LayoutDoc, arrangement: Arrangement, id: string): Gesture | null {
  const o = doc.bay.openings.find((p) => p.id === id);
  if (!o) return null;
  const wall = wallOfOpening(doc, o);
  let along: OpeningAlong | null = null;
  if (wall && o.type !== 'roof-opening') {
    const origin = o.type === 'window' && o.wall === 'door' ? (doc.bay.doors.find((d) => d.id === o.door)?.offset ?? 0) : 0;
    const range = positionRange(doc, o);
    along = { wall, origin, size: o.type === 'window' ? o.width : 0, min: origin + range.min, max: origin + range.max, targets: wallTargets(doc, arrangement, wall) };
  }
  return { kind: 'opening', ids: [], start: o, along, targets: snapTargets(doc, arrangement, new Set()), preview: { opening: o, guides: [] } };
}

/** Where a dragged opening goes for a pointer offset (dx, dy) in plan mm, snapped and held inside its wall or the bay. */
export function dragOpening(g: Extract<Gesture, { kind: 'opening' }>, dx: number, dy: number, snap: SnapOptions, doc: LayoutDoc): Extract<Gesture, { kind: 'opening' }>['preview'] {
  const o = g.start;
  if (g.along && o.type !== 'roof-opening') {
    const a = g.along;
    const delta = a.wall === 'rear' ? dy : dx;
    const r = snapAlong(a.origin + o.position, a.size, delta, a.targets, snap, a.min, a.max);
    const opening = { ...o, position: r.start - a.origin } as Opening;
    const guides: SnapGuide[] = [];
    if (r.snapped !== null) {
      // A short line across the wall where the span stuck.
      const { length: L, width: W } = doc.bay;
      if (a.wall === 'rear') guides.push({ axis: 'y', at: r.snapped, from: L - 300, to: L + 100 });
      else guides.push({ axis: 'x', at: r.snapped, from: a.wall === 'left' ? -100 : W - 300, to: a.wall === 'left' ? 300 : W + 100 });
    }
    return { opening, guides };
  }
  if (o.type === 'roof-opening') {
    const box = { x: o.x, y: o.y, length: o.length, width: o.width };
    const s = snapMove(box, dx, dy, g.targets, snap);
    const opening = movedOpening(doc, o, s.dx, s.dy);
    const r = roofOpeningRect(opening as typeof o);
    // Guides only where the edge really stuck (holding inside the bay may have moved it off).
    return { opening, guides: s.guides.filter((gd) => (gd.axis === 'x' ? gd.at === r.x0 || gd.at === r.x1 : gd.at === r.y0 || gd.at === r.y1)) };
  }
  // A body point under the floor: a point moved in plan.
  const box = { x: o.position, y: o.type === 'body-point' ? (o.across ?? 0) : 0, length: 0, width: 0 };
  const s = snapMove(box, dx, dy, g.targets, snap);
  return { opening: movedOpening(doc, o, s.dx, s.dy), guides: s.guides };
}

export function startMove(doc: LayoutDoc, arrangement: Arrangement, ids: string[]): Gesture | null {
  const set = new Set(ids);
  const moving = doc.modules.filter((m) => set.has(m.id));
  const bounds = boundingRect(moving.map(footprintRect));
  if (!bounds) return null;
  const box = rectFootprint(bounds);
  return { kind: 'move', ids: moving.map((m) => m.id), box, targets: snapTargets(doc, arrangement, set), preview: { dx: 0, dy: 0, guides: [] } };
}

export function startResize(doc: LayoutDoc, arrangement: Arrangement, id: string, handle: HandleId): Gesture | null {
  const m = doc.modules.find((o) => o.id === id);
  if (!m) return null;
  const start: Footprint = { x: m.x, y: m.y, length: m.length, width: m.width };
  return { kind: 'resize', ids: [id], handle, start, targets: snapTargets(doc, arrangement, new Set([id])), preview: { rect: start, guides: [] } };
}

export function startMarquee(x: number, y: number, additive: boolean, base: string[]): Gesture {
  return { kind: 'marquee', ids: [], additive, base, origin: { x, y }, preview: { rect: { x, y, length: 0, width: 0 }, hits: [] } };
}

/** Advance a gesture to a pointer offset (dx, dy) in mm from where it started. */
export function dragGesture(g: Gesture, dx: number, dy: number, snap: SnapOptions, doc: LayoutDoc, arrangement: Arrangement): Gesture {
  if (!Number.isFinite(dx) || !Number.isFinite(dy)) return g;
  switch (g.kind) {
    case 'move':
      return { ...g, preview: snapMove(g.box, dx, dy, g.targets, snap) };
    case 'resize':
      return { ...g, preview: snapResize(g.start, g.handle, dx, dy, g.targets, snap) };
    case 'opening':
      return { ...g, preview: dragOpening(g, dx, dy, snap, doc) };
    case 'marquee': {
      const rect = { x: g.origin.x, y: g.origin.y, length: dx, width: dy };
      return { ...g, preview: { rect, hits: modulesInMarquee(modulesIn(doc, arrangement), rect) } };
    }
  }
}
