/**
 * The symbol of a placed module: its kind's symbol (declared with the kind in lib/layout/kinds.ts:
 * sink bowl, hob rings, tank fill line, pillow, backrest…) plus the heavy mark on its working face.
 * Plain shapes in the module's own millimetre frame (x along its length, y across its width,
 * origin at its min corner); the editor draws them with Konva and the plan sheet with its PDF/SVG
 * primitives, so the screen and the paper show the same thing. Pure data; must never draw or
 * import a renderer.
 */
import { kindSpec } from '../layout/kinds';
import type { Facing, ModuleKind } from '../layout/schema';
import type { Point, SymbolShape } from '../geometry/shapes';

export { circlePoints } from '../geometry/shapes';
export type { CircleShape, PathShape, SymbolDash, SymbolFill, SymbolShape, SymbolStroke } from '../geometry/shapes';

export interface SymbolModule {
  kind: ModuleKind;
  length: number;
  width: number;
  facing: Facing;
  props?: Record<string, unknown>;
}

/** The symbol of a module, working-face mark last. */
export function moduleSymbol(m: SymbolModule): SymbolShape[] {
  return [...kindSpec(m.kind).symbol(m), facingMark(m)];
}

/** A short heavy bar on the working face: the side the module is used from. */
function facingMark(m: SymbolModule): SymbolShape {
  const L = m.length, W = m.width, f = 0.3;
  const points: Point[] =
    m.facing === 'front' ? [[0, W * f], [0, W * (1 - f)]]
      : m.facing === 'rear' ? [[L, W * f], [L, W * (1 - f)]]
        : m.facing === 'left' ? [[L * f, 0], [L * (1 - f), 0]]
          : [[L * f, W], [L * (1 - f), W]];
  return { type: 'path', points, stroke: 'heavy' };
}
