/**
 * Screen ↔ plan arithmetic for comment pins: which pin a click hit, and which whole-millimetre
 * point of the plan a click names. Uses the editor's one viewport transform. Pure: no DOM, no
 * Konva, no React.
 */
import type { Arrangement } from '@/lib/layout/schema';
import { toScreenX, toScreenY, toWorld, type Viewport } from '@/components/editor/geometry/viewport';

/** Marker radius on screen, whatever the zoom (≈ 22 px targets: common practice, no source). */
export const PIN_RADIUS_PX = 11;

export interface PinView {
  id: string;
  number: number;
  arrangement: Arrangement;
  x: number;
  y: number;
  resolved: boolean;
}

/** The pin of this arrangement under a screen point (the nearest, within its radius), or null. */
export function pinAt(pins: PinView[], arrangement: Arrangement, viewport: Viewport, sx: number, sy: number, slackPx = 3): PinView | null {
  let best: { pin: PinView; d: number } | null = null;
  for (const pin of pins) {
    if (pin.arrangement !== arrangement) continue;
    const d = Math.hypot(toScreenX(viewport, pin.x) - sx, toScreenY(viewport, pin.y) - sy);
    if (d <= PIN_RADIUS_PX + slackPx && (!best || d < best.d)) best = { pin, d };
  }
  return best?.pin ?? null;
}

/** The plan point under a screen point, in whole millimetres. */
export function planPointAt(viewport: Viewport, sx: number, sy: number): { x: number; y: number } {
  const w = toWorld(viewport, sx, sy);
  return { x: Math.round(w.x), y: Math.round(w.y) };
}
