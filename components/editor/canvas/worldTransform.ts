/**
 * Layer props that place a world (mm) layer on screen: the one viewport transform, as Konva
 * position and scale. Never used for screen-space layers (rulers).
 */
import type { Viewport } from '../geometry/viewport';

export function worldLayerProps(v: Viewport) {
  return { x: v.originX, y: v.originY, scaleX: v.scale, scaleY: v.scale };
}
