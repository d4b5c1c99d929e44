'use client';
/**
 * Rulers in screen space along the top and left of the plan, drawn in the overlay layer (one
 * canvas fewer: every canvas of the plan is copied at each compositor commit) under a group that
 * undoes the layer's world transform. Never listens for events.
 */
import { memo } from 'react';
import { Group, Shape } from './konva';
import type Konva from 'konva';
import type { LengthUnit } from '@/lib/layout';
import type { Viewport } from '../geometry/viewport';
import { drawRulers } from './rulerDrawing';
import type { CanvasFonts } from './useCanvasFonts';

export const Rulers = memo(function Rulers({ viewport, units, fonts }: { viewport: Viewport; units: LengthUnit; fonts: CanvasFonts }) {
  // The layer draws world mm at (origin + mm × scale); this group maps that back to screen px.
  const k = 1 / viewport.scale;
  return (
    <Group listening={false} name="rulers" x={-viewport.originX * k} y={-viewport.originY * k} scaleX={k} scaleY={k}>
      <Shape sceneFunc={(c: Konva.Context) => drawRulers(c._context, viewport, units, fonts)} listening={false} />
    </Group>
  );
});
