'use client';
/**
 * The bay's openings on the plan (windows on their wall lines, roof openings dashed overhead, body
 * points outside the wall), the same in every arrangement. Drawn in the drawing layer over the
 * modules; redrawn when the openings, the build-up or the zoom change. The opening being dragged is
 * drawn faint here while the overlay draws where it is going. Never listens for events.
 */
import { memo } from 'react';
import { Shape } from './konva';
import type Konva from 'konva';
import type { OpeningMark } from '../geometry/openingMarks';
import { drawOpeningMarks } from './openingsDrawing';
import type { CanvasFonts } from './useCanvasFonts';

/** `marks` are the openings at this zoom (openingMarks with px = 1 / scale), shared with the module labels. */
export const OpeningsShape = memo(function OpeningsShape({ marks, scale, fonts, dragging }: { marks: readonly OpeningMark[]; scale: number; fonts: CanvasFonts; dragging: string | null }) {
  const px = 1 / scale;
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
