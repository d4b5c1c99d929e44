/**
 * Screen ↔ plan arithmetic for mark-ups (keyed notes): where a mark-up's numbered hexagon sits
 * beside the point it is about (a short leader joins them), which mark-up a click hit (its
 * hexagon or its point), and which whole-millimetre point of the plan a click names. Uses the
 * editor's one viewport transform. Pure: no DOM, no Konva, no React.
 */
import type { Arrangement } from '@/lib/layout/schema';
import { toScreenX, toScreenY, toWorld, type Viewport } from '@/components/editor/geometry/viewport';

/** Hexagon radius on screen, whatever the zoom (≈ 22 px targets: common practice, no source). */
export const MARKUP_RADIUS_PX = 11;
/** Where the hexagon sits from its point, on screen: up and to the right, along a 45° leader. */
export const MARKUP_OFFSET_PX = { x: 26, y: -26 } as const;
/** A click this close to a mark-up's point also opens it. */
export const MARKUP_POINT_SLACK_PX = 6;

export interface MarkupView {
  id: string;
  number: number;
  arrangement: Arrangement;
  /** The point of the plan the note is about, in bay millimetres. */
  x: number;
  y: number;
  settled: boolean;
}

/** The points of a regular hexagon (flat top and bottom) of circumradius r about (0, 0). */
export function hexagonPoints(r: number): number[] {
  const out: number[] = [];
  for (let i = 0; i < 6; i++) {
    const a = (Math.PI / 3) * i;
    out.push(r * Math.cos(a), r * Math.sin(a));
  }
  return out;
}

/** The mark-up of this arrangement under a screen point (its hexagon or its point; the nearest), or null. */
export function markupAt(markups: MarkupView[], arrangement: Arrangement, viewport: Viewport, sx: number, sy: number, slackPx = 3): MarkupView | null {
  let best: { m: MarkupView; d: number } | null = null;
  for (const m of markups) {
    if (m.arrangement !== arrangement) continue;
    const px = toScreenX(viewport, m.x);
    const py = toScreenY(viewport, m.y);
    const dHex = Math.hypot(px + MARKUP_OFFSET_PX.x - sx, py + MARKUP_OFFSET_PX.y - sy);
    const dPoint = Math.hypot(px - sx, py - sy);
    const d = dHex <= MARKUP_RADIUS_PX + slackPx ? dHex : dPoint <= MARKUP_POINT_SLACK_PX ? dPoint : Infinity;
    if (d < Infinity && (!best || d < best.d)) best = { m, d };
  }
  return best?.m ?? null;
}

/** The plan point under a screen point, in whole millimetres. */
export function planPointAt(viewport: Viewport, sx: number, sy: number): { x: number; y: number } {
  const w = toWorld(viewport, sx, sy);
  return { x: Math.round(w.x), y: Math.round(w.y) };
}
