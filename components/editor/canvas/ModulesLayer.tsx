'use client';
/**
 * The modules of the arrangement on show, in draw order, with the phantom arrangement under
 * them. Modules being dragged are hidden by the drag layer, by hand, for the gesture. Never listens for
 * events; redrawn only when the document, arrangement or zoom changes, never per pointer move.
 */
import { memo, useMemo } from 'react';
import { Group } from './konva';
import type { Arrangement, LengthUnit, Module } from '@/lib/layout';
import type { Viewport } from '../geometry/viewport';
import { drawOrder } from '../geometry/hitTest';
import { ModuleShape } from './ModuleShape';
import type { CanvasFonts } from './useCanvasFonts';
import { inArrangement } from '@/lib/layout/bay';

interface Props {
  modules: Module[];
  arrangement: Arrangement;
  phantom: Arrangement | null;
  hidden: readonly string[];
  /** Redraw when the view moves (line widths follow the scale). */
  viewport: Viewport;
  fonts: CanvasFonts;
  fontsReady: number;
  /** The person's units, for the size written in each module. */
  units: LengthUnit;
}

export const ModulesLayer = memo(function ModulesLayer({ modules, arrangement, phantom, hidden, fonts, fontsReady, units }: Props) {
  const { shown, phantoms } = useMemo(() => {
    const hide = new Set(hidden);
    return {
      shown: drawOrder(modules.filter((m) => inArrangement(m, arrangement) && !hide.has(m.id))),
      phantoms: phantom ? modules.filter((m) => inArrangement(m, phantom) && !inArrangement(m, arrangement)) : [],
    };
  }, [modules, arrangement, phantom, hidden]);
  return (
    <Group listening={false} name="modules">
      {shown.map((m) => (
        <ModuleShape key={m.id} module={m} fonts={fonts} units={units} fontsReady={fontsReady} />
      ))}
      {phantoms.map((m) => (
        <ModuleShape key={`phantom-${m.id}`} module={m} fonts={fonts} phantom fontsReady={fontsReady} />
      ))}
    </Group>
  );
});
