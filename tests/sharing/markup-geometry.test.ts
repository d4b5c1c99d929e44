// Turning clicks on the plan into mark-ups (keyed notes): the point under the pointer in whole mm,
// and which mark-up a click hits — its hexagon, set off along its leader, or its point — at any
// zoom and pan (the editor's one viewport transform).
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { hexagonPoints, markupAt, planPointAt, MARKUP_OFFSET_PX, MARKUP_POINT_SLACK_PX, MARKUP_RADIUS_PX, type MarkupView } from '@/components/sharing/markupGeometry';
import type { Viewport } from '@/components/editor/geometry/viewport';
import { px } from '@/components/editor/types';

const view = (scale: number, ox = 60, oy = 40): Viewport => ({ scale, originX: px(ox), originY: px(oy), width: px(1200), height: px(700) });
const markups: MarkupView[] = [
  { id: 'a', number: 1, arrangement: 'sleep', x: 1000, y: 500, settled: false },
  { id: 'b', number: 2, arrangement: 'travel', x: 1000, y: 500, settled: false },
  { id: 'c', number: 3, arrangement: 'sleep', x: 1040, y: 500, settled: true },
];

describe('planPointAt', () => {
  it('inverts the viewport to whole millimetres', () => {
    expect(planPointAt(view(0.25), 60 + 250, 40 + 125)).toEqual({ x: 1000, y: 500 });
    expect(planPointAt(view(0.5, -100, 0), 400, 300)).toEqual({ x: 1000, y: 600 });
  });

  it('lands within half a pixel of the clicked point at any zoom and pan (property)', () => {
    fc.assert(fc.property(
      fc.double({ min: 0.02, max: 12, noNaN: true }), fc.integer({ min: -2000, max: 2000 }), fc.integer({ min: -2000, max: 2000 }),
      fc.integer({ min: 0, max: 6000 }), fc.integer({ min: 0, max: 2500 }),
      (scale, ox, oy, x, y) => {
        const v = view(scale, ox, oy);
        const p = planPointAt(v, ox + x * scale, oy + y * scale);
        expect(Math.abs(p.x - x)).toBeLessThanOrEqual(0.5 + 1e-9);
        expect(Math.abs(p.y - y)).toBeLessThanOrEqual(0.5 + 1e-9);
        expect(Number.isInteger(p.x) && Number.isInteger(p.y)).toBe(true);
      },
    ));
  });
});

describe('hexagonPoints', () => {
  it('gives six corners, all at the circumradius', () => {
    const pts = hexagonPoints(10);
    expect(pts).toHaveLength(12);
    for (let i = 0; i < 12; i += 2) expect(Math.hypot(pts[i], pts[i + 1])).toBeCloseTo(10, 9);
  });
});

describe('markupAt', () => {
  const hexOf = (v: Viewport, m: MarkupView) => [v.originX + m.x * v.scale + MARKUP_OFFSET_PX.x, v.originY + m.y * v.scale + MARKUP_OFFSET_PX.y] as const;

  it('finds the mark-up of the arrangement on show by its hexagon or its point', () => {
    const v = view(0.25);
    expect(markupAt(markups, 'sleep', v, ...hexOf(v, markups[0]))?.id).toBe('a');
    expect(markupAt(markups, 'travel', v, ...hexOf(v, markups[1]))?.id).toBe('b');
    // The point itself: 1000 mm is 60 + 250 px.
    expect(markupAt(markups, 'sleep', v, 60 + 250, 40 + 125)?.id).toBe('a');
    // 40 mm apart is 10 px at this zoom: the click on c's hexagon gets c.
    expect(markupAt(markups, 'sleep', v, ...hexOf(v, markups[2]))?.id).toBe('c');
    expect(markupAt(markups, 'lounge', v, ...hexOf(v, markups[0]))).toBeNull();
  });

  it('misses outside the hexagon and away from the point, whatever the zoom', () => {
    for (const scale of [0.05, 0.25, 2]) {
      const v = view(scale);
      const [hx, hy] = hexOf(v, markups[0]);
      expect(markupAt([markups[0]], 'sleep', v, hx, hy - (MARKUP_RADIUS_PX + 2))?.id).toBe('a');
      expect(markupAt([markups[0]], 'sleep', v, hx, hy - (MARKUP_RADIUS_PX + 4))).toBeNull();
      const sx = 60 + 1000 * scale;
      const sy = 40 + 500 * scale;
      expect(markupAt([markups[0]], 'sleep', v, sx - MARKUP_POINT_SLACK_PX, sy)?.id).toBe('a');
      expect(markupAt([markups[0]], 'sleep', v, sx - MARKUP_POINT_SLACK_PX - 2, sy)).toBeNull();
    }
  });
});
