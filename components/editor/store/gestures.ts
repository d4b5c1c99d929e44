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
import { snapMove, snapResize, snapTargets, type HandleId, type SnapGuide, type SnapOptions, type SnapTargets } from '../geometry/snapping';

export type Gesture =
  | { kind: 'move'; ids: string[]; box: Footprint; targets: SnapTargets; preview: { dx: number; dy: number; guides: SnapGuide[] } }
  | { kind: 'resize'; ids: [string]; handle: HandleId; start: Footprint; targets: SnapTargets; preview: { rect: Footprint; guides: SnapGuide[] } }
  | { kind: 'marquee'; ids: string[]; additive: boolean; base: string[]; origin: { x: number; y: number }; preview: { rect: Footprint; hits: string[] } };

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
    case 'marquee': {
      const rect = { x: g.origin.x, y: g.origin.y, length: dx, width: dy };
      return { ...g, preview: { rect, hits: modulesInMarquee(modulesIn(doc, arrangement), rect) } };
    }
  }
}
