// Openings in the bay (schema version 4): windows in walls and doors, roof openings, points on the
// body. What the schema accepts and refuses, the 3 → 4 migration, and the geometry helpers in
// lib/layout/openings.ts, every expected value worked out by hand in the comments. Invented bay:
// 3000 × 1800 × 2000, a sliding door on the right at 150–1350, a rear door 150–1650.
import { describe, expect, it } from 'vitest';
import { parseLayoutDoc } from '@/lib/layout/parse';
import { BAY_TEMPLATES, starterLayout } from '@/lib/layout/templates';
import {
  bodyPointAt, distanceToBox, doorBox, openingBox, pointToOpening, roofOpeningAreaM2, roofOpeningRect, wallRectInPlan,
  windowAreaM2, windowOnWall, type Opening,
} from '@/lib/layout';

type Raw = Record<string, any>;

function bay(openings: unknown[]): Raw {
  return {
    length: 3000, width: 1800, height: 2000, wheelArches: [],
    doors: [{ id: 'slide', wall: 'right', offset: 150, width: 1200 }, { id: 'rear', wall: 'rear', offset: 150, width: 1500 }],
    bulkhead: true, cabSeats: 2, openings,
  };
}

function doc(openings: unknown[]): Raw {
  return { schemaVersion: 4, name: 'Openings van', bay: bay(openings), buildUp: { floor: [{ material: 'Plywood', thickness: 24 }], roof: [], walls: [] }, occupants: { standingHeight: 1800, sleepers: [] }, modules: [] };
}

const win = (o: Raw = {}): Raw => ({ id: 'w1', type: 'window', wall: 'left', position: 500, sillHeight: 1000, width: 600, height: 400, opens: true, ...o });
const vent = (o: Raw = {}): Raw => ({ id: 'v1', type: 'roof-opening', kind: 'vent', x: 400, y: 700, length: 400, width: 400, frameHeight: 40, ...o });
const point = (o: Raw = {}): Raw => ({ id: 'p1', type: 'body-point', kind: 'heater-exhaust', wall: 'underside', position: 2000, across: 300, height: -50, ...o });

function issues(openings: unknown[]): string[] {
  const r = parseLayoutDoc(doc(openings));
  return r.ok ? [] : r.issues.map((i) => `${i.path}: ${i.message}`);
}

describe('the schema', () => {
  it('accepts a window in a wall, one in a door, a roof vent and a body point', () => {
    const r = parseLayoutDoc(doc([win(), win({ id: 'w2', wall: 'door', door: 'slide', position: 150, width: 900 }), vent(), point()]));
    expect(r.ok).toBe(true);
    if (r.ok) expect(r.value.bay.openings.map((o) => o.type)).toEqual(['window', 'window', 'roof-opening', 'body-point']);
  });

  it('fills in a roof opening’s frame height of 0 when none is given', () => {
    const { frameHeight: _f, ...bare } = vent();
    const r = parseLayoutDoc(doc([bare]));
    expect(r.ok && r.value.bay.openings[0]).toMatchObject({ frameHeight: 0 });
  });

  it('keeps a window inside its wall: 500 + 2500 = 3000 fits the 3000 mm left wall exactly, 1 mm more does not', () => {
    expect(issues([win({ width: 2500 })])).toEqual([]);
    expect(issues([win({ width: 2501 })])).toEqual(['bay.openings.0.width: window runs past the end of the left wall (3000 mm)']);
    // The rear wall is the bay's width, 1800 mm: 1200 + 600 = 1800 fits, 1201 does not.
    expect(issues([win({ wall: 'rear', position: 1200 })])).toEqual([]);
    expect(issues([win({ wall: 'rear', position: 1201 })])).toHaveLength(1);
  });

  it('keeps a window in a door inside that door, and the door must exist', () => {
    // The sliding door is 1200 mm wide: 300 + 900 = 1200 fits; 301 does not.
    expect(issues([win({ wall: 'door', door: 'slide', position: 300, width: 900 })])).toEqual([]);
    expect(issues([win({ wall: 'door', door: 'slide', position: 301, width: 900 })])).toEqual(['bay.openings.0.width: window runs past the end of door "slide" (1200 mm)']);
    expect(issues([win({ wall: 'door', door: 'barn' })])).toEqual(['bay.openings.0.door: there is no door "barn"']);
    expect(issues([win({ wall: 'door' })])).toEqual(['bay.openings.0.door: name the door the window is in']);
    expect(issues([win({ door: 'slide' })])).toEqual(['bay.openings.0.door: a window in a wall names no door']);
  });

  it('keeps a window below the roof: sill 1600 + 400 = 2000 is the 2000 mm roof exactly', () => {
    expect(issues([win({ sillHeight: 1600 })])).toEqual([]);
    expect(issues([win({ sillHeight: 1601 })])).toEqual(['bay.openings.0.height: window runs above the roof (2000 mm)']);
  });

  it('refuses sizes of nothing, fractions of a millimetre and negative positions', () => {
    expect(issues([win({ width: 0 })])).toHaveLength(1);
    expect(issues([vent({ length: 0 })])).toHaveLength(1);
    expect(issues([win({ position: 10.5 })])).toHaveLength(1);
    expect(issues([vent({ x: -1 })])).toHaveLength(1);
  });

  it('keeps a roof opening inside the roof: 2600 + 400 = 3000 long, 1400 + 400 = 1800 across', () => {
    expect(issues([vent({ x: 2600, y: 1400 })])).toEqual([]);
    expect(issues([vent({ x: 2601 })])).toEqual(['bay.openings.0.length: roof opening runs past the rear of the bay (3000 mm)']);
    expect(issues([vent({ y: 1401 })])).toEqual(['bay.openings.0.width: roof opening runs past the right wall (1800 mm)']);
  });

  it('places body points on a wall or the underside, and only the underside takes a distance across', () => {
    expect(issues([point({ wall: 'left', across: undefined, position: 3000, height: 1999 })])).toEqual([]);
    expect(issues([point({ wall: 'left', across: undefined, position: 3001 })])).toEqual(['bay.openings.0.position: point lies past the end of the left wall (3000 mm)']);
    expect(issues([point({ wall: 'left' })])).toEqual(['bay.openings.0.across: only a point on the underside takes a distance across']);
    expect(issues([point({ across: undefined })])).toEqual(['bay.openings.0.across: a point on the underside needs its distance from the left side']);
    expect(issues([point({ height: 1 })])).toEqual(['bay.openings.0.height: a point on the underside is at or below the floor (0 or less)']);
    expect(issues([point({ across: 1801 })])).toEqual(['bay.openings.0.across: point lies past the right side (1800 mm)']);
    expect(issues([point({ height: -2001 })])).toHaveLength(1);
  });

  it('refuses an unknown type or kind, an id used twice, and more than 64 openings', () => {
    expect(issues([{ ...win(), type: 'porthole' }])).toHaveLength(1);
    expect(issues([vent({ kind: 'chimney' })])).toHaveLength(1);
    expect(issues([win(), vent({ id: 'w1' })])).toEqual(['bay.openings.1.id: opening id "w1" is used twice']);
    const many = Array.from({ length: 64 }, (_, i) => vent({ id: `v${i}`, x: (i % 7) * 400, y: Math.floor(i / 7) * 150 }));
    expect(issues(many)).toEqual([]);
    expect(issues([...many, vent({ id: 'one-more' })])).toEqual(['bay.openings: at most 64 openings']);
  });
});

describe('the 3 → 4 migration', () => {
  it('gives a version-3 document an empty list of openings and nothing else', () => {
    const v3: Raw = { ...doc([]), schemaVersion: 3 };
    delete v3.bay.openings;
    const r = parseLayoutDoc(structuredClone(v3));
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.value.schemaVersion).toBe(4);
    expect(r.value.bay).toEqual({ ...v3.bay, openings: [] });
    expect(r.value.buildUp).toEqual(v3.buildUp);
  });

  it('every template and starter carries openings that parse', () => {
    for (const t of BAY_TEMPLATES) {
      expect(t.bay.openings.some((o) => o.type === 'window' && o.wall === 'door'), t.id).toBe(true);
      expect(t.bay.openings.some((o) => o.type === 'roof-opening'), t.id).toBe(true);
      expect(t.bay.openings.some((o) => o.type === 'body-point' && o.kind === 'fuel-filler'), t.id).toBe(true);
    }
    for (const id of ['starter-rear-bed', 'starter-l-lounge']) expect(starterLayout(id)!.bay.openings.length).toBeGreaterThan(4);
  });
});

describe('geometry', () => {
  const b = { length: 3000, width: 1800, height: 2000, doors: [{ id: 'slide', wall: 'right' as const, offset: 150, width: 1200 }, { id: 'rear', wall: 'rear' as const, offset: 150, width: 1500 }] };
  const floorT = 24;

  it('puts a window on its wall: sill 1000 above a 24 mm floor is 1024 above the bare floor', () => {
    expect(windowOnWall(b, floorT, win() as never)).toEqual({ wall: 'left', along0: 500, along1: 1100, z0: 1024, z1: 1424 });
  });

  it('carries a window in a door onto the door’s wall: 150 + 100 = 250 from the rear wall’s left end', () => {
    expect(windowOnWall(b, floorT, win({ wall: 'door', door: 'rear', position: 100, width: 550 }) as never)).toEqual({ wall: 'rear', along0: 250, along1: 800, z0: 1024, z1: 1424 });
    expect(windowOnWall(b, floorT, win({ wall: 'door', door: 'gone' }) as never)).toBeNull();
  });

  it('areas: 600 × 400 mm = 0.24 m²; 400 × 400 mm = 0.16 m²', () => {
    expect(windowAreaM2({ width: 600, height: 400 })).toBeCloseTo(0.24, 10);
    expect(roofOpeningAreaM2({ length: 400, width: 400 })).toBeCloseTo(0.16, 10);
  });

  it('plan rectangles: a roof opening like a module, a window as a strip of its wall line', () => {
    expect(roofOpeningRect(vent() as never)).toEqual({ x0: 400, y0: 700, x1: 800, y1: 1100 });
    expect(wallRectInPlan(b, { wall: 'right', along0: 300, along1: 1200 }, 36)).toEqual({ x0: 300, x1: 1200, y0: 1764, y1: 1800 });
    expect(wallRectInPlan(b, { wall: 'rear', along0: 250, along1: 800 }, 36)).toEqual({ x0: 2964, x1: 3000, y0: 250, y1: 800 });
  });

  it('body points: the underside at (position, across, height); the rear wall at x = bay length', () => {
    expect(bodyPointAt(b, point() as never)).toEqual({ x: 2000, y: 300, z: -50 });
    expect(bodyPointAt(b, point({ wall: 'rear', across: undefined, position: 400, height: 300 }) as never)).toEqual({ x: 3000, y: 400, z: 300 });
    expect(bodyPointAt(b, point({ wall: 'right', across: undefined, position: 400, height: 300 }) as never)).toEqual({ x: 400, y: 1800, z: 300 });
  });

  it('distance to an opening’s edge, in the wall plane: a 3-4-5 triangle', () => {
    // Window on the left wall: along 500–1100, z 1024–1424. A point on the left wall at
    // position 1400, height 1824 is 300 mm past the end and 400 mm above the top: √(300² + 400²) = 500.
    const p = point({ wall: 'left', across: undefined, position: 1400, height: 1824 }) as never;
    expect(pointToOpening(b, floorT, p, win() as Opening)).toBeCloseTo(500, 9);
    // Beside the glass at its mid-height: only the 300 mm along the wall counts.
    expect(pointToOpening(b, floorT, point({ wall: 'left', across: undefined, position: 1400, height: 1200 }) as never, win() as Opening)).toBe(300);
    // On the glass: nothing.
    expect(pointToOpening(b, floorT, point({ wall: 'left', across: undefined, position: 800, height: 1200 }) as never, win() as Opening)).toBe(0);
  });

  it('round a corner the straight line counts: underside point to the sliding door', () => {
    // The door is the plane y = 1800, x 150–1350, z 0–2000. A point under the floor at x 2000,
    // y 1500, 50 mm down: 650 along x, 300 across, 50 below → √(650² + 300² + 50²) = √(422500 + 90000 + 2500) = √515000 ≈ 717.64.
    const door = doorBox(b, b.doors[0]);
    expect(door).toEqual({ x0: 150, x1: 1350, y0: 1800, y1: 1800, z0: 0, z1: 2000 });
    expect(distanceToBox({ x: 2000, y: 1500, z: -50 }, door)).toBeCloseTo(717.635, 3);
  });

  it('a roof opening lies in the roof plane; a point to a point is the plain distance', () => {
    expect(openingBox(b, floorT, vent() as Opening)).toEqual({ x0: 400, x1: 800, y0: 700, y1: 1100, z0: 2000, z1: 2000 });
    // Exhaust (2000, 300, −50) to an intake (2300, 700, −50): √(300² + 400²) = 500.
    expect(pointToOpening(b, floorT, point() as never, point({ id: 'p2', kind: 'heater-intake', position: 2300, across: 700 }) as Opening)).toBeCloseTo(500, 9);
  });
});
