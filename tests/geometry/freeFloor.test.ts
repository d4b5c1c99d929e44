// The free-floor sweep for a person-sized disk: hand-worked limits (a gap exactly as wide as the
// disk passes, 1 mm less does not), door widths, diagonal squeezes, and fast-check properties
// against a brute-force oracle (a 5 mm grid of centre positions, exact distances, flood fill).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { FreeFloorModel, pointRectDistance, widestRouteBounds, widestRouteIntoZone, type Opening, type Rect } from '@/lib/geometry';

const room: Rect = { x0: 0, y0: 0, x1: 3000, y1: 1000 };
const leftEnd: Opening = { edge: 'minX', from: 0, to: 1000 };
const farEnd: Rect = { x0: 2700, y0: 0, x1: 3000, y1: 1000 };

function corridor(gap: number): FreeFloorModel {
  // Two benches along x leaving an aisle `gap` wide from y = 300.
  return new FreeFloorModel({ interior: room, obstacles: [{ x0: 500, y0: 0, x1: 2500, y1: 300 }, { x0: 500, y0: 300 + gap, x1: 2500, y1: 1000 }], openings: [leftEnd] });
}

describe('free floor by hand', () => {
  it('a 450 mm disk passes an aisle exactly 450 mm wide and not one 449 mm wide', () => {
    expect(corridor(450).sweep(225).reachesZone(farEnd)).toBe(true);
    expect(corridor(449).sweep(225).reachesZone(farEnd)).toBe(false);
    expect(corridor(451).sweep(225.5).reachesZone(farEnd)).toBe(true); // 451 mm disk, 451 mm aisle
  });
  it('an aisle running across (along y) exactly as wide as the disk passes; 1 mm less does not', () => {
    const across = (gap: number) =>
      new FreeFloorModel({
        interior: { x0: 0, y0: 0, x1: 2000, y1: 2000 },
        obstacles: [{ x0: 0, y0: 700, x1: 800, y1: 1300 }, { x0: 800 + gap, y0: 700, x1: 2000, y1: 1300 }],
        openings: [{ edge: 'minY', from: 0, to: 2000 }],
      });
    const top: Rect = { x0: 0, y0: 1500, x1: 2000, y1: 2000 };
    expect(across(500).sweep(250).reachesZone(top)).toBe(true);
    expect(across(499).sweep(250).reachesZone(top)).toBe(false);
  });
  it('a door admits a disk exactly its width, not a wider one; the centre starts just inside the edge', () => {
    const door = (width: number) => new FreeFloorModel({ interior: room, obstacles: [], openings: [{ edge: 'maxY', from: 1000, to: 1000 + width }] });
    expect(door(450).sweep(225).anyEntry).toBe(true);
    expect(door(449).sweep(225).anyEntry).toBe(false);
    const f = door(600).sweep(225);
    expect(f.reachesZone({ x0: 1225, y0: 775, x1: 1225, y1: 775 })).toBe(true); // at the door, tangent to the wall line
    expect(f.reachesZone({ x0: 2500, y0: 0, x1: 2550, y1: 300 })).toBe(true); // and from there anywhere on the open floor
    // a zero-width zone is only seen on a column: pass its x as a mark to measure there exactly
    const marked = new FreeFloorModel({ interior: room, obstacles: [], openings: [{ edge: 'maxY', from: 1000, to: 1600 }], marks: [1224] }).sweep(225);
    expect(marked.reachesZone({ x0: 1224, y0: 0, x1: 1224, y1: 700 })).toBe(true);
  });
  it('a rear door (max x) admits the disk between its jambs only', () => {
    const m = new FreeFloorModel({ interior: room, obstacles: [{ x0: 2500, y0: 0, x1: 3000, y1: 600 }], openings: [{ edge: 'maxX', from: 100, to: 900 }] });
    expect(m.sweep(150).anyEntry).toBe(true); // door y 100..900, free above y 600: centre 750..750 fits exactly (900 − 150)
    expect(m.sweep(151).anyEntry).toBe(false);
  });
  it('a diagonal squeeze between two corners 500 mm apart passes a 470 mm disk, not a 501 mm one', () => {
    // Bottom-left block to (1000, 1000), top-right block from (1300, 1400): the corners are 500 mm apart.
    const m = new FreeFloorModel({
      interior: { x0: 0, y0: 0, x1: 2400, y1: 2400 },
      obstacles: [{ x0: 0, y0: 0, x1: 1000, y1: 1000 }, { x0: 1300, y0: 1400, x1: 2400, y1: 2400 }],
      openings: [{ edge: 'minX', from: 1000, to: 2400 }],
    });
    const bottomRight: Rect = { x0: 1800, y0: 0, x1: 2400, y1: 600 };
    expect(m.sweep(235).reachesZone(bottomRight)).toBe(true);
    expect(m.sweep(250.5).reachesZone(bottomRight)).toBe(false);
  });
  it('touching is allowed but overlapping is not, for a point-sized walker too', () => {
    // (the blocks run past the walls: a point could otherwise slide along the wall line itself)
    const m = new FreeFloorModel({ interior: room, obstacles: [{ x0: 1000, y0: -10, x1: 1200, y1: 500 }, { x0: 1000, y0: 500, x1: 1200, y1: 1010 }], openings: [leftEnd] });
    expect(m.sweep(0).reachesZone(farEnd)).toBe(true); // the seam at y = 500 is a line of free points
    const closed = new FreeFloorModel({ interior: room, obstacles: [{ x0: 1000, y0: -10, x1: 1200, y1: 501 }, { x0: 1000, y0: 500, x1: 1200, y1: 1010 }], openings: [leftEnd] });
    expect(closed.sweep(0).reachesZone(farEnd)).toBe(false);
  });
  it('bad input gives clear errors or an empty floor, never a crash', () => {
    expect(() => corridor(450).sweep(Number.NaN)).toThrow(RangeError);
    expect(() => new FreeFloorModel({ interior: { x0: 0, y0: 0, x1: Infinity, y1: 1 }, obstacles: [], openings: [] })).toThrow(RangeError);
    expect(() => new FreeFloorModel({ interior: room, obstacles: [], openings: [], fillStep: 0 })).toThrow(RangeError);
    const tight = new FreeFloorModel({ interior: { x0: 0, y0: 0, x1: 3000, y1: 400 }, obstacles: [{ x0: NaN, y0: 0, x1: 1, y1: 1 }], openings: [leftEnd] }).sweep(225);
    expect(tight.anyEntry).toBe(false);
    expect(tight.reachesZone(room)).toBe(false);
  });
  it('route bounds: the 548 mm aisle bounds the far end, a 500 mm door bounds everything', () => {
    const f = corridor(548).sweep(225);
    expect(widestRouteIntoZone(f, widestRouteBounds(f), farEnd)).toBeCloseTo(548, 6);
    const narrowDoor = new FreeFloorModel({ interior: room, obstacles: [{ x0: 500, y0: 0, x1: 2500, y1: 300 }], openings: [{ edge: 'minX', from: 400, to: 900 }] }).sweep(225);
    expect(widestRouteIntoZone(narrowDoor, widestRouteBounds(narrowDoor), farEnd)).toBe(500);
  });
});

// ---- brute-force oracle -------------------------------------------------------------------
const STEP = 5;

function oracleReaches(interior: Rect, obstacles: Rect[], opening: Opening, zone: Rect, r: number): boolean {
  const x0 = interior.x0 + r, x1 = interior.x1 - r, y0 = interior.y0 + r, y1 = interior.y1 - r;
  if (x0 > x1 || y0 > y1) return false;
  const nx = Math.floor((x1 - x0) / STEP) + 1, ny = Math.floor((y1 - y0) / STEP) + 1;
  const free = new Uint8Array(nx * ny);
  for (let i = 0; i < nx; i++) for (let j = 0; j < ny; j++) {
    const px = x0 + i * STEP, py = y0 + j * STEP;
    free[i * ny + j] = obstacles.every((o) => pointRectDistance(px, py, o) >= r) ? 1 : 0;
  }
  const seen = new Uint8Array(nx * ny);
  const stack: number[] = [];
  for (let i = 0; i < nx; i++) for (let j = 0; j < ny; j++) {
    const px = x0 + i * STEP, py = y0 + j * STEP;
    const onEntry = opening.edge === 'minX' ? i === 0 && py >= opening.from + r && py <= opening.to - r : opening.edge === 'maxY' ? j === ny - 1 && px >= opening.from + r && px <= opening.to - r : false;
    if (onEntry && free[i * ny + j]) { seen[i * ny + j] = 1; stack.push(i * ny + j); }
  }
  while (stack.length) {
    const k = stack.pop()!;
    const i = Math.floor(k / ny), j = k % ny;
    const px = x0 + i * STEP, py = y0 + j * STEP;
    if (px >= zone.x0 && px <= zone.x1 && py >= zone.y0 && py <= zone.y1) return true;
    for (const [a, b] of [[i + 1, j], [i - 1, j], [i, j + 1], [i, j - 1]]) {
      if (a < 0 || b < 0 || a >= nx || b >= ny) continue;
      const q = a * ny + b;
      if (free[q] && !seen[q]) { seen[q] = 1; stack.push(q); }
    }
  }
  return false;
}

const layoutArb = fc.record({
  obstacles: fc.array(fc.record({ x: fc.integer({ min: 0, max: 1400 }), y: fc.integer({ min: 0, max: 900 }), w: fc.integer({ min: 50, max: 700 }), h: fc.integer({ min: 50, max: 500 }) }), { minLength: 1, maxLength: 6 })
    .map((os) => os.map(({ x, y, w, h }) => ({ x0: x, y0: y, x1: x + w, y1: y + h }))),
  r: fc.integer({ min: 60, max: 220 }),
  zone: fc.record({ x: fc.integer({ min: 0, max: 1300 }), y: fc.integer({ min: 0, max: 800 }) }).map(({ x, y }) => ({ x0: x, y0: y, x1: x + 200, y1: y + 200 })),
  door: fc.integer({ min: 0, max: 900 }),
});

describe('free floor against a brute-force oracle (fast-check)', () => {
  const interior: Rect = { x0: 0, y0: 0, x1: 1500, y1: 1000 };
  it('never claims a way the oracle cannot find with a slightly smaller disk, and never misses one a slightly larger disk has', () => {
    fc.assert(fc.property(layoutArb, ({ obstacles, r, zone, door }) => {
      const opening: Opening = { edge: 'maxY', from: door, to: door + 600 };
      const sweep = new FreeFloorModel({ interior, obstacles, openings: [opening], marks: [zone.x0, zone.x1] }).sweep(r).reachesZone(zone);
      if (sweep) expect(oracleReaches(interior, obstacles, opening, zone, r - 2 * STEP)).toBe(true);
      if (oracleReaches(interior, obstacles, opening, zone, r + 25)) expect(sweep).toBe(true);
    }), { numRuns: 60 });
  });
  it('a bigger disk never reaches more than a smaller one', () => {
    fc.assert(fc.property(layoutArb, fc.integer({ min: 1, max: 80 }), ({ obstacles, r, zone, door }, more) => {
      const model = new FreeFloorModel({ interior, obstacles, openings: [{ edge: 'maxY', from: door, to: door + 600 }], marks: [zone.x0, zone.x1] });
      if (model.sweep(r + more).reachesZone(zone)) expect(model.sweep(r).reachesZone(zone)).toBe(true);
    }), { numRuns: 150 });
  });
});
