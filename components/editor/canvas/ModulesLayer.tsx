'use client';
/**
 * The modules of the arrangement on show, in draw order, with the phantom arrangement under
 * them, and then all their labels, clear of each other and of what else the plan writes (door
 * and cab words, the overall dimensions, the openings' words: planWords.ts). Left as drawn during a gesture (the drag layer washes a moved
 * module's origin and draws it where it goes). Never listens for events; redrawn only when the
 * document, arrangement or zoom changes, never per pointer move.
 */
import { memo, useMemo } from 'react';
import { Group } from './konva';
import type { Arrangement, LayoutDoc, LengthUnit, Module } from '@/lib/layout';
import type { Viewport } from '../geometry/viewport';
import { drawOrder } from '../geometry/hitTest';
import { ModuleLabels, ModuleShape } from './ModuleShape';
import { canvasMeasure, labelRequestOf } from './moduleSymbols';
import { placePlanLabels, rememberedWidths } from '../geometry/labels';
import type { OpeningMark } from '../geometry/openingMarks';
import { planLineBoxes, planTextBoxes } from '../geometry/planWords';
import type { CanvasFonts } from './useCanvasFonts';
import { inArrangement } from '@/lib/layout/bay';

interface Props {
  modules: Module[];
  arrangement: Arrangement;
  phantom: Arrangement | null;
  /** Redraw when the view moves (line widths follow the scale). */
  viewport: Viewport;
  fonts: CanvasFonts;
  fontsReady: number;
  /** The person's units, for the size written in each module. */
  units: LengthUnit;
  /** The bay and its openings' marks at this zoom: the labels keep clear of their words. */
  bay: LayoutDoc['bay'];
  openings: readonly OpeningMark[];
}

/** A 2D context of its own for measuring label text (never drawn on). */
let measuring: CanvasRenderingContext2D | null = null;
function measuringContext(): CanvasRenderingContext2D | null {
  if (!measuring && typeof document !== 'undefined') measuring = document.createElement('canvas').getContext('2d');
  return measuring;
}

export const ModulesLayer = memo(function ModulesLayer({ modules, arrangement, phantom, viewport, fonts, fontsReady, units, bay, openings }: Props) {
  const { shown, phantoms } = useMemo(() => {
    return {
      shown: drawOrder(modules.filter((m) => inArrangement(m, arrangement))),
      phantoms: phantom ? modules.filter((m) => inArrangement(m, phantom) && !inArrangement(m, arrangement)) : [],
    };
  }, [modules, arrangement, phantom]);
  // Labels for the whole plan at this scale, clear of each other (the pan plays no part).
  const scale = viewport.scale;
  const measure = useMemo(() => {
    const ctx = measuringContext();
    void fontsReady; // measured again once the faces have loaded
    return ctx ? rememberedWidths(canvasMeasure(ctx, fonts)) : undefined;
  }, [fonts, fontsReady]);
  const placements = useMemo(() => {
    if (!measure) return undefined;
    const items = shown.map((m) => ({ id: m.id, x: m.x * scale, y: m.y * scale, ...labelRequestOf(m, { scale, units }) }));
    return placePlanLabels(items, measure, [...planTextBoxes({ bay }, openings, scale, units, measure), ...planLineBoxes({ bay }, scale)]);
  }, [shown, scale, units, measure, bay, openings]);
  return (
    <Group listening={false} name="modules">
      {shown.map((m) => (
        <ModuleShape key={m.id} module={m} fonts={fonts} labelled={false} fontsReady={fontsReady} />
      ))}
      {phantoms.map((m) => (
        <ModuleShape key={`phantom-${m.id}`} module={m} fonts={fonts} phantom fontsReady={fontsReady} />
      ))}
      {/* Every name after every body: a module drawn later never covers an earlier one's label. */}
      <ModuleLabels modules={shown} fonts={fonts} units={units} placements={placements} fontsReady={fontsReady} />
    </Group>
  );
});
