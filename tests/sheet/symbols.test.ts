// One symbol table for the editor and the sheet: every kind's symbol lies inside its module, the
// sheet draws a kind's symbol instead of the old crossed box, and the canvas draws the same shapes.
import { describe, expect, it } from 'vitest';
import { MODULE_KINDS, type Facing, type ModuleKind } from '@/lib/layout/schema';
import { moduleSymbol } from '@/lib/symbols/module-symbols';
import { symbolItems } from '@/lib/sheet/module-symbol';
import { drawModule } from '@/components/editor/canvas/moduleSymbols';

const FACINGS: Facing[] = ['front', 'rear', 'left', 'right'];

function recordingContext() {
  const calls: string[] = [];
  const ctx = new Proxy({} as Record<string, unknown>, {
    get(target, key: string) {
      if (key in target) return target[key];
      if (key === 'measureText') return () => ({ width: 10 });
      return (..._args: unknown[]) => void calls.push(key);
    },
    set(target, key: string, value) {
      target[key] = value;
      return true;
    },
  });
  return { ctx: ctx as unknown as CanvasRenderingContext2D, calls };
}

describe('the module symbol table', () => {
  it.each(MODULE_KINDS)('%s: every point of its symbol lies on or inside the module', (kind) => {
    for (const facing of FACINGS) {
      for (const [length, width] of [[600, 400], [400, 1200], [2000, 1400]]) {
        for (const shape of moduleSymbol({ kind, length, width, facing, props: { burners: 4, cylinders: 2, belted: true, fillLevel: 0.5 } })) {
          const pts = shape.type === 'circle' ? [[shape.cx - shape.r, shape.cy - shape.r], [shape.cx + shape.r, shape.cy + shape.r]] : shape.points;
          for (const [x, y] of pts) {
            expect(x).toBeGreaterThanOrEqual(-1e-9);
            expect(x).toBeLessThanOrEqual(length + 1e-9);
            expect(y).toBeGreaterThanOrEqual(-1e-9);
            expect(y).toBeLessThanOrEqual(width + 1e-9);
          }
        }
      }
    }
  });

  it('gives each kind a working-face mark, and the appliances a symbol of their own', () => {
    for (const kind of MODULE_KINDS) {
      const shapes = moduleSymbol({ kind, length: 600, width: 500, facing: 'right' });
      expect(shapes.filter((s) => s.type === 'path' && s.stroke === 'heavy')).toHaveLength(1);
    }
    const appliances: ModuleKind[] = ['hob', 'fridge', 'sink-unit', 'heater', 'gas-locker', 'electrics-bay'];
    for (const kind of appliances) expect(moduleSymbol({ kind, length: 600, width: 500, facing: 'right' }).length).toBeGreaterThan(1);
    // A two-burner hob: two rings of two circles each.
    expect(moduleSymbol({ kind: 'hob', length: 500, width: 300, facing: 'right', props: { burners: 2 } }).filter((s) => s.type === 'circle')).toHaveLength(4);
  });

  it('the sheet draws the hob rings, not a crossed box', () => {
    const hob = { kind: 'hob' as const, length: 500, width: 300, facing: 'right' as const, props: { burners: 2 } };
    const items = symbolItems(hob, 10, 20, 1 / 20);
    const lines = items.filter((i) => i.type === 'line');
    // 4 rings of 24 segments each, plus the working-face bar.
    expect(lines).toHaveLength(4 * 24 + 1);
    const diagonal = lines.some((l) => l.type === 'line' && Math.abs(l.x1 - 10) < 1e-9 && Math.abs(l.y1 - 20) < 1e-9 && Math.abs(l.x2 - 35) < 1e-9 && Math.abs(l.y2 - 35) < 1e-9);
    expect(diagonal).toBe(false);
    for (const l of lines) if (l.type === 'line') {
      expect(l.x1).toBeGreaterThanOrEqual(10 - 1e-9);
      expect(l.x1).toBeLessThanOrEqual(10 + 25 + 1e-9);
    }
    // Too small on paper: no symbol, only the outline and the number.
    expect(symbolItems(hob, 0, 0, 1 / 200)).toEqual([]);
  });

  it('the editor canvas draws the same shapes from the same table', () => {
    const hob = { kind: 'hob' as const, length: 500, width: 300, facing: 'front' as const, props: { burners: 3 } };
    const { ctx, calls } = recordingContext();
    drawModule(ctx, hob, { scale: 1 });
    const circles = moduleSymbol(hob).filter((s) => s.type === 'circle').length;
    expect(circles).toBe(6);
    expect(calls.filter((c) => c === 'arc')).toHaveLength(circles);
  });
});
