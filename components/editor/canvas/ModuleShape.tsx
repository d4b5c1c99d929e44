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
import { drawModule, drawModuleLabel } from './moduleSymbols';
import type { CanvasFonts } from './useCanvasFonts';
import type { LabelPlacement } from '../geometry/labels';

/** `labelled`: false draws the body only (the plan's labels come after all bodies: ModuleLabels). */
export function moduleSceneFunc(phantom: boolean, labelled = true) {
  return (context: Konva.Context, shape: Konva.Shape) => {
    const m = shape.getAttr('module') as Module;
    const fonts = shape.getAttr('fonts') as CanvasFonts | undefined;
    const units = shape.getAttr('units') as LengthUnit | undefined;
    const placement = shape.getAttr('placement') as LabelPlacement | undefined;
    // World layers carry the viewport scale (px per mm); width/height attrs may differ from the
    // module's own during a live resize.
    const scale = shape.getLayer()?.scaleX() || 1;
    drawModule(context._context, { kind: m.kind, label: m.label, length: shape.width(), width: shape.height(), facing: m.facing, props: m.props, mount: m.mount }, { scale, phantom, fonts, units, placement, label: labelled });
  };
}

const solid = moduleSceneFunc(false);
const bodyOnly = moduleSceneFunc(false, false);
const phantomDrawn = moduleSceneFunc(true);

/** `labelled` false: the body only, for a plan that writes its labels after all bodies (ModuleLabels). */
export const ModuleShape = memo(function ModuleShape({ module, fonts, units, placement, phantom = false, labelled = true, fontsReady = 0 }: { module: Module; fonts: CanvasFonts; units?: LengthUnit; placement?: LabelPlacement; phantom?: boolean; labelled?: boolean; fontsReady?: number }) {
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
      sceneFunc={phantom ? phantomDrawn : labelled ? solid : bodyOnly}
      listening={false}
      perfectDrawEnabled={false}
    />
  );
});

/** Draws every label of the plan's modules in one shape, after (over) all of their bodies. */
function labelsSceneFunc(context: Konva.Context, shape: Konva.Shape) {
  const modules = shape.getAttr('modules') as Module[];
  const placements = shape.getAttr('placements') as Map<string, LabelPlacement> | undefined;
  const fonts = shape.getAttr('fonts') as CanvasFonts | undefined;
  const units = shape.getAttr('units') as LengthUnit | undefined;
  const scale = shape.getLayer()?.scaleX() || 1;
  const ctx = context._context;
  for (const m of modules) {
    ctx.save();
    ctx.translate(m.x, m.y);
    drawModuleLabel(ctx, { kind: m.kind, label: m.label, length: m.length, width: m.width, facing: m.facing, props: m.props, mount: m.mount }, { scale, fonts, units, placement: placements?.get(m.id) });
    ctx.restore();
  }
}

export const ModuleLabels = memo(function ModuleLabels({ modules, fonts, units, placements, fontsReady = 0 }: { modules: Module[]; fonts: CanvasFonts; units?: LengthUnit; placements?: Map<string, LabelPlacement>; fontsReady?: number }) {
  return (
    <Shape
      name="module-labels"
      modules={modules}
      fonts={fonts}
      units={units}
      placements={placements}
      fontsReady={fontsReady}
      sceneFunc={labelsSceneFunc}
      listening={false}
      perfectDrawEnabled={false}
    />
  );
});
