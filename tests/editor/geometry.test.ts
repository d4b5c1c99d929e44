import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { fitToBay, gridSpacing, toScreenX, toScreenY, toWorld, zoomAt, clampScale, MAX_SCALE, type Viewport } from '@/components/editor/geometry/viewport';
import { moduleDimensions, overallDimensions } from '@/components/editor/geometry/dimensions';
import { drawOrder, handleAt, moduleAt, modulesInMarquee } from '@/components/editor/geometry/hitTest';
import { snapMove, snapResize, snapTargets } from '@/components/editor/geometry/snapping';
import { clearHeight, linedInterior } from '@/lib/layout/bay';
import { rulerStep } from '@/components/editor/canvas/rulerDrawing';
import { testDoc, mod } from './harness';
import { px } from '@/components/editor/types';

const vp = (over: Partial<Viewport> = {}): Viewport => ({ scale: 0.25, originX: px(40), originY: px(30), width: px(1000), height: px(600), ...over });

describe('viewport transform', () => {
  it('round-trips world and screen coordinates (property)', () => {
    fc.assert(fc.property(fc.double({ min: 0.02, max: 12, noNaN: true }), fc.integer({ min: -5000, max: 5000 }), fc.integer({ min: -5000, max: 5000 }), (scale, x, y) => {
      const v = vp({ scale });
      const w = toWorld(v, toScreenX(v, x), toScreenY(v, y));
      expect(w.x).toBeCloseTo(x, 6);
      expect(w.y).toBeCloseTo(y, 6);
    }));
  });

  it('zooming keeps the point under the pointer still', () => {
    fc.assert(fc.property(fc.double({ min: 0.5, max: 2, noNaN: true }), fc.integer({ min: 0, max: 1000 }), fc.integer({ min: 0, max: 600 }), (f, sx, sy) => {
      const v = vp();
      const before = toWorld(v, sx, sy);
      const after = toWorld(zoomAt(v, f, sx, sy), sx, sy);
      expect(after.x).toBeCloseTo(before.x, 6);
      expect(after.y).toBeCloseTo(before.y, 6);
    }));
  });

  it('fit-to-bay shows the whole bay centred inside the margin, and scale is clamped', () => {
    const v = fitToBay(vp(), 4500, 1800, 72);
    expect(toScreenX(v, 0)).toBeGreaterThanOrEqual(72 - 1e-9);
    expect(toScreenX(v, 4500)).toBeLessThanOrEqual(1000 - 72 + 1e-9);
    expect(toScreenY(v, 0)).toBeGreaterThanOrEqual(0);
    expect((toScreenX(v, 0) + toScreenX(v, 4500)) / 2).toBeCloseTo(500);
    expect(clampScale(1e9)).toBe(MAX_SCALE);
    expect(clampScale(Number.NaN)).toBe(1);
  });

  it('the grid is 100 mm at working zoom, finer when zoomed in, coarser when zoomed out', () => {
    expect(gridSpacing(0.25).minor).toBe(100);
    expect(gridSpacing(2).minor).toBe(10);
    expect(gridSpacing(0.05).minor).toBe(500);
    expect(gridSpacing(0.005).minor).toBe(1000);
  });

  it('ruler steps stay at least 64 px apart in every unit', () => {
    for (const unit of ['mm', 'cm', 'in'] as const) for (const scale of [0.05, 0.25, 1, 4]) {
      const step = rulerStep(scale, unit);
      const mmPer = unit === 'mm' ? 1 : unit === 'cm' ? 10 : 25.4;
      expect(step * mmPer * scale).toBeGreaterThanOrEqual(64);
      expect((step / 2) * mmPer * scale).toBeLessThan(64 * 2.5 + 1);
    }
  });
});

describe('bay geometry', () => {
  it('lined interior and clear height follow the build-up', () => {
    const doc = testDoc();
    // 1800 − 36 mm wall = 1764
    expect(linedInterior(doc)).toEqual({ x0: 0, y0: 36, x1: 3400, y1: 1764 });
    // 1900 − (10 + 12 + 2) floor − (20 + 6) roof
    expect(clearHeight(doc)).toBe(1850);
  });
});

describe('dimension strings', () => {
  it('overall size of the bay along and across', () => {
    const d = overallDimensions(testDoc(), 100);
    expect(d.map((x) => [x.axis, x.value])).toEqual([['x', 3400], ['y', 1800]]);
  });

  it('gaps to the lining on open sides and to the nearest neighbour where there is one', () => {
    const doc = testDoc([mod('a', { x: 1000, y: 500, length: 400, width: 400 }), mod('b', { x: 1600, y: 450, length: 300, width: 600 }), mod('c', { x: 200, y: 1300, length: 300, width: 300 })]);
    const a = doc.modules[0];
    const dims = moduleDimensions(doc, a, 'lounge');
    const byDir = Object.fromEntries(dims.filter((d) => d.role !== 'size').map((d) => [`${d.axis}:${d.from < (d.axis === 'x' ? a.x : a.y) ? 'before' : 'after'}`, d]));
    expect(byDir['y:before']).toMatchObject({ role: 'gap-lining', value: 500 - 36 });
    expect(byDir['y:after']).toMatchObject({ role: 'gap-lining', value: 1764 - 900 });
    expect(byDir['x:before']).toMatchObject({ role: 'gap-lining', value: 1000 });
    expect(byDir['x:after']).toMatchObject({ role: 'gap-module', value: 200, neighbourId: 'b' });
    expect(dims.filter((d) => d.role === 'size').map((d) => d.value)).toEqual([400, 400]);
  });

  it('a hob sitting on a counter is not the counter’s neighbour in plan', () => {
    const doc = testDoc([mod('counter', { x: 0, y: 36, length: 1200, width: 500, height: 900 }), mod('hob', { kind: 'hob', x: 600, y: 86, length: 450, width: 350, elevation: 900, height: 60 })]);
    const dims = moduleDimensions(doc, doc.modules[1], 'lounge');
    expect(dims.some((d) => d.neighbourId === 'counter')).toBe(false);
  });

  it('ignores modules of other arrangements', () => {
    const doc = testDoc([mod('a', { x: 1000 }), mod('bedonly', { x: 1500, arrangements: ['sleep'] })]);
    const dims = moduleDimensions(doc, doc.modules[0], 'lounge');
    expect(dims.find((d) => d.axis === 'x' && d.from >= 1400)).toMatchObject({ role: 'gap-lining', value: 3400 - 1400 });
  });
});

describe('hit testing', () => {
  it('finds the topmost module: a hob on a counter wins', () => {
    const doc = testDoc([mod('hob', { kind: 'hob', x: 600, y: 86, length: 450, width: 350, elevation: 900, height: 60 }), mod('counter', { x: 0, y: 36, length: 1200, width: 500, height: 900 })]);
    const ordered = drawOrder(doc.modules);
    expect(ordered.map((m) => m.id)).toEqual(['counter', 'hob']);
    expect(moduleAt(ordered, 700, 200)?.id).toBe('hob');
    expect(moduleAt(ordered, 100, 100)?.id).toBe('counter');
    expect(moduleAt(ordered, 2000, 1000)).toBeUndefined();
  });

  it('finds a handle within its radius and prefers the nearest', () => {
    const r = { x: 100, y: 100, length: 400, width: 200 };
    expect(handleAt(r, 502, 301, 5)).toBe('se');
    expect(handleAt(r, 300, 99, 5)).toBe('n');
    expect(handleAt(r, 300, 200, 5)).toBeUndefined();
  });

  it('a marquee dragged in any direction catches what it touches', () => {
    const ms = [mod('a', { x: 0, y: 0, length: 100, width: 100 }), mod('b', { x: 500, y: 500, length: 100, width: 100 })];
    expect(modulesInMarquee(ms, { x: 150, y: 150, length: -100, width: -100 })).toEqual(['a']);
    expect(modulesInMarquee(ms, { x: -10, y: -10, length: 700, width: 700 })).toEqual(['a', 'b']);
  });
});

describe('snapping', () => {
  const doc = testDoc([mod('a', { x: 1000, y: 800 }), mod('b', { x: 2000, y: 300 })]);
  const targets = snapTargets(doc, 'lounge', new Set(['a']));

  it('property: a snapped move lands on the grid or on a target edge', () => {
    const xs = new Set(targets.xs.map((t) => t.at));
    fc.assert(fc.property(fc.double({ min: -800, max: 800, noNaN: true }), fc.double({ min: -700, max: 700, noNaN: true }), fc.constantFrom(10, 50, 100), (dx, dy, step) => {
      const r = snapMove({ x: 1000, y: 800, length: 400, width: 400 }, dx, dy, targets, { enabled: true, step: step as 10 | 50 | 100, threshold: 12 });
      const nx = 1000 + r.dx;
      const onGrid = nx % step === 0;
      const onEdge = xs.has(nx) || xs.has(nx + 400);
      expect(onGrid || onEdge).toBe(true);
      expect(Number.isInteger(r.dx) && Number.isInteger(r.dy)).toBe(true);
      // Snapping never pulls further than half a step or the threshold.
      expect(Math.abs(r.dx - dx)).toBeLessThanOrEqual(Math.max(step / 2, 12) + 1e-9);
    }));
  });

  it('property: a resize never leaves a side under 20 mm and keeps the opposite edge', () => {
    fc.assert(fc.property(fc.constantFrom('n', 's', 'e', 'w', 'ne', 'nw', 'se', 'sw' as const), fc.double({ min: -3000, max: 3000, noNaN: true }), fc.double({ min: -3000, max: 3000, noNaN: true }), (h, dx, dy) => {
      const start = { x: 1000, y: 800, length: 400, width: 400 };
      const { rect } = snapResize(start, h, dx, dy, targets, { enabled: true, step: 10, threshold: 12 });
      expect(rect.length).toBeGreaterThanOrEqual(20);
      expect(rect.width).toBeGreaterThanOrEqual(20);
      if (h.includes('e')) expect(rect.x).toBe(1000);
      if (h.includes('w')) expect(rect.x + rect.length).toBe(1400);
      if (h.includes('s')) expect(rect.y).toBe(800);
      if (h.includes('n')) expect(rect.y + rect.width).toBe(1200);
    }));
  });
});
