// Things overhead on the plan follow the drafting convention for features above the cutting plane
// (hidden or overhead lines: dashed, nothing filled, as in BS 8888 / ISO 128-2 line types — from
// memory of the standards' line-type tables): an overhead locker must not paint over the kitchen below it.
import { describe, expect, it } from 'vitest';
import { drawModule } from '@/components/editor/canvas/moduleSymbols';
import { recordingContext } from './recorder';

const look = (kind: 'overhead-locker' | 'kitchen-counter') => ({ kind, length: 1200, width: 350, facing: 'right' as const });

describe('overhead modules on the plan', () => {
  it('an overhead locker is a dashed outline with no fill of its own', () => {
    const { ctx, calls } = recordingContext();
    drawModule(ctx, look('overhead-locker'), { scale: 0.3 });
    const outline = calls.find((c) => c.op === 'strokeRect');
    expect(outline?.dash.length).toBeGreaterThan(0);
    const firstOutline = calls.indexOf(outline!);
    expect(calls.slice(0, firstOutline).filter((c) => c.op === 'fill' || c.op === 'fillRect')).toEqual([]);
  });

  it('a counter below keeps its solid outline and its paper fill', () => {
    const { ctx, calls } = recordingContext();
    drawModule(ctx, look('kitchen-counter'), { scale: 0.3 });
    const outline = calls.find((c) => c.op === 'strokeRect')!;
    expect(outline.dash).toEqual([]);
    expect(calls.slice(0, calls.indexOf(outline)).some((c) => c.op === 'fill')).toBe(true);
  });
});
