'use client';
/**
 * The bay's openings on the plan (windows on their wall lines, roof openings dashed overhead, body
 * points outside the wall), the same in every arrangement. Drawn in the drawing layer over the
 * modules; redrawn when the openings, the build-up or the zoom change. The opening being dragged is
 * drawn faint here while the overlay draws where it is going. Never listens for events.
 */
import { memo, useMemo } from 'react';
import { Shape } from './konva';
import type Konva from 'konva';
import type { LayoutDoc } from '@/lib/layout';
import { openingMarks } from '../geometry/openingMarks';
import { drawOpeningMarks } from './openingsDrawing';
import type { CanvasFonts } from './useCanvasFonts';

export const OpeningsShape = memo(function OpeningsShape({ bay, buildUp, scale, fonts, dragging }: { bay: LayoutDoc['bay']; buildUp: LayoutDoc['buildUp']; scale: number; fonts: CanvasFonts; dragging: string | null }) {
  const px = 1 / scale;
  const marks = useMemo(() => openingMarks({ bay, buildUp }, px), [bay, buildUp, px]);
  if (marks.length === 0) return null;
  return (
    <Shape
      name="openings"
      listening={false}
      sceneFunc={(c: Konva.Context) => {
        drawOpeningMarks(c._context, marks.filter((m) => m.id !== dragging), px, fonts);
        if (dragging) drawOpeningMarks(c._context, marks.filter((m) => m.id === dragging), px, fonts, true);
      }}
    />
  );
});
