'use client';
/**
 * The modules of the arrangement on show, in draw order, with the ghosted arrangement under
 * them. Modules being dragged are hidden by the drag layer, by hand, for the gesture. Never listens for
 * events; redrawn only when the document, arrangement or zoom changes, never per pointer move.
 */
import { memo, useMemo } from 'react';
import { Layer } from './konva';
import type { Arrangement, Module } from '@/lib/layout';
import type { Viewport } from '../geometry/viewport';
import { drawOrder } from '../geometry/hitTest';
import { ModuleShape } from './ModuleShape';
import { worldLayerProps } from './worldTransform';
import type { CanvasFonts } from './useCanvasFonts';

interface Props {
  modules: Module[];
  arrangement: Arrangement;
  ghost: Arrangement | null;
  hidden: readonly string[];
  viewport: Viewport;
  fonts: CanvasFonts;
  fontsReady: number;
}

export const ModulesLayer = memo(function ModulesLayer({ modules, arrangement, ghost, hidden, viewport, fonts, fontsReady }: Props) {
  const { shown, ghosts } = useMemo(() => {
    const hide = new Set(hidden);
    return {
      shown: drawOrder(modules.filter((m) => m.arrangements.includes(arrangement) && !hide.has(m.id))),
      ghosts: ghost ? modules.filter((m) => m.arrangements.includes(ghost) && !m.arrangements.includes(arrangement)) : [],
    };
  }, [modules, arrangement, ghost, hidden]);
  return (
    <Layer {...worldLayerProps(viewport)} listening={false} name="modules">
      {shown.map((m) => (
        <ModuleShape key={m.id} module={m} fonts={fonts} fontsReady={fontsReady} />
      ))}
      {ghosts.map((m) => (
        <ModuleShape key={`ghost-${m.id}`} module={m} fonts={fonts} ghost fontsReady={fontsReady} />
      ))}
    </Layer>
  );
});
