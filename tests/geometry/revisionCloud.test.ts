// The revision cloud round a changed module: it encloses the rectangle with its margin, never
// strays further than margin + bulge, has a whole number of scallops per side, and every scallop
// bulges outwards. The delta triangle is equilateral about its centre. Pure geometry (no source needed).
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { deltaTriangle, revisionCloud } from '@/lib/geometry';

const rect = { x0: 100, y0: 200, x1: 700, y1: 500 };

describe('revisionCloud', () => {
  it('stays outside the grown rectangle and inside it grown by the bulge (property)', () => {
    fc.assert(fc.property(
      fc.integer({ min: -5000, max: 5000 }), fc.integer({ min: -5000, max: 5000 }),
      fc.integer({ min: 1, max: 4000 }), fc.integer({ min: 1, max: 4000 }),
      fc.integer({ min: 0, max: 200 }), fc.integer({ min: 80, max: 600 }), fc.double({ min: 0.05, max: 0.5, noNaN: true }),
      (x, y, w, h, margin, arc, bulge) => {
        const r = { x0: x, y0: y, x1: x + w, y1: y + h };
        const pts = revisionCloud(r, { margin, arc, bulge });
        expect(pts.length).toBeGreaterThanOrEqual(4);
        // Largest chord on a side is at most 1.5 × arc (rounding) or the whole side when it is shorter.
        const maxOut = margin + bulge * Math.max(1.5 * arc, w + 2 * margin, h + 2 * margin) + 1e-6;
        // Counted rather than asserted point by point: thousands of points per case.
        let inside = 0;
        let beyond = 0;
        for (const [px, py] of pts) {
          const outside = px <= r.x0 - margin + 1e-6 || px >= r.x1 + margin - 1e-6 || py <= r.y0 - margin + 1e-6 || py >= r.y1 + margin - 1e-6;
          if (!outside) inside++;
          if (px < r.x0 - maxOut || px > r.x1 + maxOut || py < r.y0 - maxOut || py > r.y1 + maxOut) beyond++;
        }
        expect({ inside, beyond }).toEqual({ inside: 0, beyond: 0 });
      },
    ), { numRuns: 100 });
  });

  it('cuts each side into whole scallops of about the asked length', () => {
    // 600 + 2 × 50 = 700 long, 300 + 100 = 400 high; arc 100 → 7 + 4 + 7 + 4 = 22 scallops of 6 points each.
    const pts = revisionCloud(rect, { margin: 50, arc: 100, samples: 7 });
    expect(pts).toHaveLength(22 * 6);
    // Every scallop starts on the grown rectangle's outline: the first is its top-left corner.
    expect(pts[0][0]).toBeCloseTo(50, 9);
    expect(pts[0][1]).toBeCloseTo(150, 9);
  });

  it('bulges outwards: the middle of the first top scallop rises above the top edge by bulge × chord', () => {
    const pts = revisionCloud(rect, { margin: 0, arc: 100, bulge: 0.3, samples: 7 });
    // Top edge 600 long → 6 scallops of 100; the 4th sample (index 3) is the crown of the first.
    expect(pts[3][0]).toBeCloseTo(150, 9);
    expect(pts[3][1]).toBeCloseTo(200 - 30, 9);
  });
});

describe('deltaTriangle', () => {
  it('is equilateral, upright and centred', () => {
    const t = deltaTriangle(10, 20, 6);
    const d = (a: number[], b: number[]) => Math.hypot(a[0] - b[0], a[1] - b[1]);
    expect(d(t[0], t[1])).toBeCloseTo(6, 9);
    expect(d(t[1], t[2])).toBeCloseTo(6, 9);
    expect(d(t[2], t[0])).toBeCloseTo(6, 9);
    expect((t[0][0] + t[1][0] + t[2][0]) / 3).toBeCloseTo(10, 9);
    expect((t[0][1] + t[1][1] + t[2][1]) / 3).toBeCloseTo(20, 9);
    expect(t[0][1]).toBeLessThan(t[1][1]); // apex up (y down)
  });
});
