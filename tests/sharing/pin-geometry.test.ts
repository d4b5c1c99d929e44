// Turning clicks on the plan into comment pins: the point under the pointer in whole mm, and
// which pin a click hits, at any zoom and pan (the editor's one viewport transform).
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { pinAt, planPointAt, PIN_RADIUS_PX, type PinView } from '@/components/sharing/pinGeometry';
import type { Viewport } from '@/components/editor/geometry/viewport';
import { px } from '@/components/editor/types';

const view = (scale: number, ox = 60, oy = 40): Viewport => ({ scale, originX: px(ox), originY: px(oy), width: px(1200), height: px(700) });
const pins: PinView[] = [
  { id: 'a', number: 1, arrangement: 'sleep', x: 1000, y: 500, resolved: false },
  { id: 'b', number: 2, arrangement: 'travel', x: 1000, y: 500, resolved: false },
  { id: 'c', number: 3, arrangement: 'sleep', x: 1040, y: 500, resolved: true },
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

describe('pinAt', () => {
  it('finds the nearest pin of the arrangement on show within its radius', () => {
    const v = view(0.25);
    const at = (x: number, y: number) => [60 + x * 0.25, 40 + y * 0.25] as const;
    expect(pinAt(pins, 'sleep', v, ...at(1000, 500))?.id).toBe('a');
    expect(pinAt(pins, 'travel', v, ...at(1000, 500))?.id).toBe('b');
    // 40 mm apart is 10 px at this zoom: the click nearer to c gets c.
    expect(pinAt(pins, 'sleep', v, ...at(1036, 500))?.id).toBe('c');
    expect(pinAt(pins, 'lounge', v, ...at(1000, 500))).toBeNull();
  });

  it('misses outside the marker, whatever the zoom', () => {
    for (const scale of [0.05, 0.25, 2]) {
      const v = view(scale);
      const sx = 60 + 1000 * scale;
      const sy = 40 + 500 * scale;
      expect(pinAt([pins[0]], 'sleep', v, sx, sy - (PIN_RADIUS_PX + 2))?.id).toBe('a');
      expect(pinAt([pins[0]], 'sleep', v, sx, sy - (PIN_RADIUS_PX + 4))).toBeNull();
    }
  });
});
