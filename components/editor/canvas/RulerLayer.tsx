'use client';
/** Rulers in screen space along the top and left of the plan. Never listens for events. */
import { memo } from 'react';
import { Layer, Shape } from './konva';
import type Konva from 'konva';
import type { LengthUnit } from '@/lib/layout';
import type { Viewport } from '../geometry/viewport';
import { drawRulers } from './rulerDrawing';
import type { CanvasFonts } from './useCanvasFonts';

export const RulerLayer = memo(function RulerLayer({ viewport, units, fonts }: { viewport: Viewport; units: LengthUnit; fonts: CanvasFonts }) {
  return (
    <Layer listening={false} name="rulers">
      <Shape sceneFunc={(c: Konva.Context) => drawRulers(c._context, viewport, units, fonts)} listening={false} />
    </Layer>
  );
});
