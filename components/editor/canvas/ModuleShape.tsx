'use client';
/**
 * One module on the plan as ONE Konva shape whose scene function draws its kind's symbol.
 * Memoised on the module object, so only modules that changed are redrawn by React. Does not
 * listen for events: hit testing is done in mm by the pointer hook.
 */
import { memo } from 'react';
import { Shape } from './konva';
import type Konva from 'konva';
import type { LengthUnit, Module } from '@/lib/layout';
import { drawModule } from './moduleSymbols';
import type { CanvasFonts } from './useCanvasFonts';
import type { LabelPlacement } from '../geometry/labels';

export function moduleSceneFunc(phantom: boolean) {
  return (context: Konva.Context, shape: Konva.Shape) => {
    const m = shape.getAttr('module') as Module;
    const fonts = shape.getAttr('fonts') as CanvasFonts | undefined;
    const units = shape.getAttr('units') as LengthUnit | undefined;
    const placement = shape.getAttr('placement') as LabelPlacement | undefined;
    // World layers carry the viewport scale (px per mm); width/height attrs may differ from the
    // module's own during a live resize.
    const scale = shape.getLayer()?.scaleX() || 1;
    drawModule(context._context, { kind: m.kind, label: m.label, length: shape.width(), width: shape.height(), facing: m.facing, props: m.props, mount: m.mount }, { scale, phantom, fonts, units, placement });
  };
}

const solid = moduleSceneFunc(false);
const phantomDrawn = moduleSceneFunc(true);

export const ModuleShape = memo(function ModuleShape({ module, fonts, units, placement, phantom = false, fontsReady = 0 }: { module: Module; fonts: CanvasFonts; units?: LengthUnit; placement?: LabelPlacement; phantom?: boolean; fontsReady?: number }) {
  return (
    <Shape
      id={phantom ? undefined : `module-${module.id}`}
      x={module.x}
      y={module.y}
      width={module.length}
      height={module.width}
      module={module}
      fonts={fonts}
      units={units}
      placement={placement}
      fontsReady={fontsReady}
      sceneFunc={phantom ? phantomDrawn : solid}
      listening={false}
      perfectDrawEnabled={false}
    />
  );
});
