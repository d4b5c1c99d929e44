'use client';
/**
 * The static drawing under the modules: the drafting grid, the bay (bare metal, build-up band,
 * wheel arches, doors, cab end) and the overall dimension strings. Never listens for events and
 * is not redrawn during a drag.
 */
import { memo } from 'react';
import { Group, Shape } from './konva';
import type Konva from 'konva';
import type { LayoutDoc, LengthUnit } from '@/lib/layout';
import { visibleWorld, type Viewport } from '../geometry/viewport';
import { drawBay, drawGrid } from './bayDrawing';
import { drawDimension } from './dimensionDrawing';
import { overallDimensions } from '../geometry/dimensions';
import { OVERALL_OFFSET_PX } from '../geometry/planWords';
import type { CanvasFonts } from './useCanvasFonts';

interface Props {
  bay: LayoutDoc['bay'];
  buildUp: LayoutDoc['buildUp'];
  viewport: Viewport;
  units: LengthUnit;
  fonts: CanvasFonts;
}

export const SheetLayer = memo(function SheetLayer({ bay, buildUp, viewport, units, fonts }: Props) {
  const scale = viewport.scale;
  const doc = { bay, buildUp } as LayoutDoc;
  return (
    <Group listening={false} name="sheet">
      <Shape
        sceneFunc={(c: Konva.Context) => drawGrid(c._context, scale, visibleWorld(viewport), bay)}
        listening={false}
      />
      <Shape sceneFunc={(c: Konva.Context) => drawBay(c._context, doc, scale, fonts)} listening={false} />
      <Shape
        sceneFunc={(c: Konva.Context) => {
          for (const d of overallDimensions(doc, OVERALL_OFFSET_PX / scale)) drawDimension(c._context, d, scale, units, undefined, fonts);
        }}
        listening={false}
      />
    </Group>
  );
});
