// Clearance rules measured on drawn openings (lib/checks/clearance.ts). Each rule at, just inside
// and just outside its figure, worked by hand below. Every figure is common practice with no
// source (SOURCES.windowCover, roofOpening, exhaust, gasVent, intake): 300 mm near a wall, a
// quarter of the glass, 300 mm under a roof opening's frame, exhaust 300 mm from openings and
// 500 mm from the fuel filler, gas drop vent 500 mm, intake 300 mm from the exhaust. The bay is
// the plain box of helpers.ts with no build-up (so heights above the finished floor are heights
// above the bare floor): 3000 × 1800 × 2000, one rear door across the whole rear (x = 3000, y 0–1800, z 0–2000).
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { runChecks, type Finding } from '@/lib/checks';
import { layoutDocSchema, starterLayout, type LayoutDoc, type LayoutDocInput } from '@/lib/layout';
import { OUTLET_CAUTION } from '@/lib/layout/cautions';
import { boxDoc, mod } from './helpers';

type OpeningInput = NonNullable<LayoutDocInput['bay']['openings']>[number];
type ModuleInput = LayoutDocInput['modules'][number];

const REAR_DOOR = { id: 'rear', wall: 'rear' as const, offset: 0, width: 1800 };

function docWith(openings: OpeningInput[], modules: ModuleInput[] = [], extra: Partial<LayoutDocInput> = {}): LayoutDoc {
  const base = boxDoc({ bay: { doors: [REAR_DOOR], openings }, modules });
  return layoutDocSchema.parse({ ...base, ...extra });
}

const of = (doc: LayoutDoc, id: string): Finding[] => runChecks(doc).findings.filter((f) => f.id === id);

/** Left-wall window, 1000 mm from the front, 1000 wide, sill 1000, 400 high: glass 1000 × 400 = 400 000 mm². */
const leftWindow: OpeningInput = { id: 'win', type: 'window', wall: 'left', position: 1000, sillHeight: 1000, width: 1000, height: 400, opens: true };

describe('clearance.window: a quarter of the glass (common practice, no source)', () => {
  const wardrobe = (o: Partial<ModuleInput> = {}) => mod({ id: 'ward', kind: 'wardrobe', x: 1000, y: 0, length: 1000, width: 500, height: 1100, facing: 'right', ...o } as ModuleInput);

  it('at the limit: a wardrobe 1100 mm high hides 1000 × 100 = 100 000 mm² = 25 % exactly: not more, so it meets', () => {
    const [f] = of(docWith([leftWindow], [wardrobe()]), 'clearance.window');
    expect(f).toMatchObject({ status: 'pass', measured: 25, required: 25, unit: '%', openingIds: ['win'] });
  });

  it('just outside: 1101 mm hides 1000 × 101 = 101 000 mm² = 25.25 % → needs attention, naming the wardrobe', () => {
    const [f] = of(docWith([leftWindow], [wardrobe({ height: 1101 })]), 'clearance.window');
    expect(f).toMatchObject({ status: 'warn', measured: 25.3, required: 25, moduleIds: ['ward'], openingIds: ['win'] }); // 25.25 shown to one decimal
    expect(f.message).toMatch(/Wardrobe \(25\.3 %\) hides more than 25 %/);
  });

  it('just inside: 1099 mm hides 99 000 mm² = 24.75 %', () => {
    expect(of(docWith([leftWindow], [wardrobe({ height: 1099 })]), 'clearance.window')[0]).toMatchObject({ status: 'pass', measured: 24.8 });
  });

  it('only modules within 300 mm of the wall stand in front of it: a gap of 300 counts, 301 does not', () => {
    expect(of(docWith([leftWindow], [wardrobe({ y: 300, height: 1400 })]), 'clearance.window')[0].status).toBe('warn'); // 1000 × 400 = 100 %
    expect(of(docWith([leftWindow], [wardrobe({ y: 301, height: 1400 })]), 'clearance.window')[0]).toMatchObject({ status: 'pass', measured: 0 });
  });

  it('an overhead locker crossing the glass needs attention whatever the share: 1000 × 50 = 12.5 %', () => {
    // Locker underside 1350, top 1700: it meets the glass (z 1000–1400) over 50 mm.
    const locker = mod({ id: 'lock', kind: 'overhead-locker', x: 1000, y: 0, length: 1000, width: 350, elevation: 1350, height: 350 } as ModuleInput);
    const [f] = of(docWith([leftWindow], [locker]), 'clearance.window');
    expect(f).toMatchObject({ status: 'warn', measured: 12.5, moduleIds: ['lock'] });
    expect(f.message).toMatch(/Overhead locker crosses/);
    // 1 mm higher (underside at the glass top, 1400) it no longer meets the glass.
    expect(of(docWith([leftWindow], [{ ...locker, elevation: 1400 }]), 'clearance.window')[0].status).toBe('pass');
  });

  it('a piece made up at night only (sleep) is not counted: a window is covered at night anyway', () => {
    expect(of(docWith([leftWindow], [wardrobe({ height: 1400, arrangements: ['sleep'] })]), 'clearance.window')[0].status).toBe('pass');
  });

  it('a window in the rear door is measured across the van: the door’s 0 + 400 = 400 to 1000 mm from the left end', () => {
    const rearWin: OpeningInput = { id: 'rw', type: 'window', wall: 'door', door: 'rear', position: 400, sillHeight: 1000, width: 600, height: 400, opens: false };
    // A cupboard against the rear wall (x 2700–3000, gap 0) from y 400 to 1000, 1200 high: covers 600 × 200 = 50 %.
    const cupboard = mod({ id: 'cup', kind: 'wardrobe', x: 2700, y: 400, length: 300, width: 600, height: 1200, facing: 'front' } as ModuleInput);
    expect(of(docWith([rearWin], [cupboard]), 'clearance.window')[0]).toMatchObject({ status: 'warn', measured: 50 });
  });
});

describe('clearance.roof-opening: 300 mm under the frame, and head strikes (common practice, no source)', () => {
  // Vent 400 × 400 at x 1000–1400, y 700–1100; frame 40 mm → its underside at 2000 − 40 = 1960 mm.
  const vent = (frameHeight = 40): OpeningInput => ({ id: 'vent', type: 'roof-opening', kind: 'vent', x: 1000, y: 700, length: 400, width: 400, frameHeight });
  const tall = (height: number) => mod({ id: 'tall', kind: 'wardrobe', x: 1100, y: 800, length: 500, width: 500, height } as ModuleInput);

  it('at the limit: a unit 1660 mm high leaves 1960 − 1660 = 300 mm → meets', () => {
    expect(of(docWith([vent()], [tall(1660)]), 'clearance.roof-opening')).toEqual([expect.objectContaining({ status: 'pass', measured: 300, required: 300, openingIds: ['vent'] })]);
  });

  it('just outside: 1661 mm leaves 299 mm → needs attention, naming it; just inside: 1659 leaves 301', () => {
    expect(of(docWith([vent()], [tall(1661)]), 'clearance.roof-opening')[0]).toMatchObject({ status: 'warn', measured: 299, moduleIds: ['tall'] });
    expect(of(docWith([vent()], [tall(1659)]), 'clearance.roof-opening')[0]).toMatchObject({ status: 'pass', measured: 301 });
  });

  it('a frame hanging below the 1800 mm stature over open floor is a head strike: 2000 − 201 = 1799 → does not meet', () => {
    const found = of(docWith([vent(201)]), 'clearance.roof-opening');
    expect(found).toHaveLength(2);
    expect(found[1]).toMatchObject({ status: 'fail', measured: 1799, required: 1800, openingIds: ['vent'] });
    // At the stature exactly (2000 − 200 = 1800) nobody strikes it: no head-strike finding.
    expect(of(docWith([vent(200)]), 'clearance.roof-opening')).toHaveLength(1);
  });

  it('over a bed covering the whole opening nobody stands under it; half covered, someone does', () => {
    // Bed platform x 900–2900, y 0–1800 covers the vent (x 1000–1400) wholly; underside 600 < 1000, so it stands on the floor.
    const bed = mod({ id: 'bed', kind: 'bed-platform', x: 900, y: 0, length: 2000, width: 1800, elevation: 600, height: 300 } as ModuleInput);
    expect(of(docWith([vent(300)], [bed]), 'clearance.roof-opening')[1]).toMatchObject({ status: 'pass', measured: 1700 });
    // From x 1200 only half the vent is over the bed: 1000–1200 is open floor.
    expect(of(docWith([vent(300)], [{ ...bed, x: 1200, length: 1700 }]), 'clearance.roof-opening')[1].status).toBe('fail');
  });
});

describe('outlets: heater exhaust, gas drop vent, heater intake (common practice, no source)', () => {
  const exhaust = (o: Partial<OpeningInput> = {}): OpeningInput => ({ id: 'ex', type: 'body-point', kind: 'heater-exhaust', wall: 'underside', position: 2700, across: 900, height: 0, ...o } as OpeningInput);
  const pairWith = (findings: Finding[], other: string | null) => findings.find((f) => (other === null ? f.openingIds?.length === 1 : f.openingIds?.[1] === other))!;

  it('exhaust to the rear door (the plane x = 3000): at 2700, 300 mm → meets; at 2701, 299 → does not, with the caution', () => {
    expect(pairWith(of(docWith([exhaust()]), 'clearance.exhaust'), null)).toMatchObject({ status: 'pass', measured: 300, required: 300, openingIds: ['ex'] });
    const f = pairWith(of(docWith([exhaust({ position: 2701 })]), 'clearance.exhaust'), null);
    expect(f).toMatchObject({ status: 'fail', measured: 299, required: 300 });
    expect(f.message).toContain(OUTLET_CAUTION.heating);
    expect(pairWith(of(docWith([exhaust({ position: 2699 })]), 'clearance.exhaust'), null)).toMatchObject({ status: 'pass', measured: 301 });
  });

  it('exhaust to an opening window in the wall plane: a 3-4-5 triangle, √(180² + 240²) = 300 → meets', () => {
    // Window on the left wall along 1000–2000, glass z 1000–1400; exhaust on the left wall at 2180, 1640 high.
    const ex = exhaust({ wall: 'left', across: undefined, position: 2180, height: 1640 });
    expect(pairWith(of(docWith([leftWindow, ex]), 'clearance.exhaust'), 'win')).toMatchObject({ status: 'pass', measured: 300, openingIds: ['ex', 'win'] });
    // Beside the glass at mid-height, 2299 → 299 mm along the wall → does not meet.
    const near = exhaust({ wall: 'left', across: undefined, position: 2299, height: 1200 });
    expect(pairWith(of(docWith([leftWindow, near]), 'clearance.exhaust'), 'win')).toMatchObject({ status: 'fail', measured: 299 });
  });

  it('a fixed window is not measured; an opening one is', () => {
    const fixed = { ...leftWindow, opens: false };
    expect(of(docWith([fixed, exhaust()]), 'clearance.exhaust').filter((f) => f.openingIds?.includes('win'))).toEqual([]);
  });

  it('exhaust to the fuel filler wants 500 mm: 500 meets, 499 does not', () => {
    // Filler on the left wall at 1000, at floor height → (1000, 0, 0); exhaust under the floor at (1000, 500, 0) → 500 mm.
    const filler: OpeningInput = { id: 'fill', type: 'body-point', kind: 'fuel-filler', wall: 'left', position: 1000, height: 0 };
    expect(pairWith(of(docWith([filler, exhaust({ position: 1000, across: 500 })]), 'clearance.exhaust'), 'fill')).toMatchObject({ status: 'pass', measured: 500, required: 500 });
    expect(pairWith(of(docWith([filler, exhaust({ position: 1000, across: 499 })]), 'clearance.exhaust'), 'fill')).toMatchObject({ status: 'fail', measured: 499 });
  });

  it('gas drop vent wants 500 mm from the door and from the exhaust, with the gas caution', () => {
    // Vent under the floor at (2500, 900, 0): the rear door plane x = 3000 is 500 mm away → meets; at 2501, 499 → not.
    const vent = (position: number): OpeningInput => ({ id: 'gv', type: 'body-point', kind: 'gas-drop-vent', wall: 'underside', position, across: 900, height: 0 });
    expect(pairWith(of(docWith([vent(2500)]), 'clearance.gas-vent'), null)).toMatchObject({ status: 'pass', measured: 500, required: 500 });
    const f = pairWith(of(docWith([vent(2501)]), 'clearance.gas-vent'), null);
    expect(f).toMatchObject({ status: 'fail', measured: 499 });
    expect(f.message).toContain(OUTLET_CAUTION.gas);
    // Exhaust at (1000, 900, 0), vent at (1500, 900, 0): 500 → meets; at 1499: 499 → not.
    expect(pairWith(of(docWith([vent(1500), exhaust({ position: 1000 })]), 'clearance.gas-vent'), 'ex')).toMatchObject({ status: 'pass', measured: 500 });
    expect(pairWith(of(docWith([vent(1499), exhaust({ position: 1000 })]), 'clearance.gas-vent'), 'ex')).toMatchObject({ status: 'fail', measured: 499 });
  });

  it('heater intake wants 300 mm from the exhaust: 300 meets, 299 does not, 301 meets', () => {
    // Exhaust at (1000, 900, 0); intake at (1000 + d, 900, 0).
    const intake = (d: number): OpeningInput => ({ id: 'in', type: 'body-point', kind: 'heater-intake', wall: 'underside', position: 1000 + d, across: 900, height: 0 });
    const at = (d: number) => of(docWith([exhaust({ position: 1000 }), intake(d)]), 'clearance.intake');
    expect(at(300)).toEqual([expect.objectContaining({ status: 'pass', measured: 300, required: 300, openingIds: ['in', 'ex'] })]);
    expect(at(299)[0]).toMatchObject({ status: 'fail', measured: 299 });
    expect(at(301)[0]).toMatchObject({ status: 'pass', measured: 301 });
  });

  it('nothing drawn, nothing reported', () => {
    expect(runChecks(docWith([])).findings.filter((f) => f.id.startsWith('clearance.'))).toEqual([]);
  });
});

describe('the heater caution: declared ticks only where no outlet is drawn', () => {
  const heater = mod({ id: 'heater', kind: 'heater', x: 1000, y: 100, length: 400, width: 200, height: 200 } as ModuleInput);
  const systems = { heating: { fuel: 'diesel' as const, exhaustClearOfOpenings: true, intakeClearOfExhaust: true }, alarms: { co: true } };
  const caution = (openings: OpeningInput[]) => of(docWith(openings, [heater], { systems }), 'heat.heater-caution')[0];

  it('nothing drawn: the three ticks confirm it', () => {
    expect(caution([])).toMatchObject({ status: 'pass', measured: 3, required: 3 });
  });

  it('an exhaust drawn 299 mm from the rear door overrides the tick: 2 of 3, naming the measurement', () => {
    const f = caution([{ id: 'ex', type: 'body-point', kind: 'heater-exhaust', wall: 'underside', position: 2701, across: 900, height: 0 }]);
    expect(f).toMatchObject({ status: 'warn', measured: 2, required: 3, openingIds: ['ex'] });
    expect(f.message).toMatch(/measured on the drawing/);
    // Moved to 300 mm it is confirmed by the drawing.
    expect(caution([{ id: 'ex', type: 'body-point', kind: 'heater-exhaust', wall: 'underside', position: 2700, across: 900, height: 0 }])).toMatchObject({ status: 'pass', measured: 3 });
  });
});

describe('property: moving an opening along its wall changes only the findings about that opening', () => {
  /** The starter lounge layout (its own windows, roof fan, filler, exhaust and intake) plus the extra openings. */
  function layout(extra: OpeningInput[]): LayoutDoc {
    const base = starterLayout('starter-l-lounge')!;
    return layoutDocSchema.parse({ ...base, bay: { ...base.bay, openings: [...base.bay.openings, ...extra] } });
  }
  const unrelated = (doc: LayoutDoc, id: string) => runChecks(doc).findings.filter((f) => !f.openingIds?.includes(id));

  it('holds for windows and body points on the walls (seeded, 40 runs)', () => {
    // A second window on the right wall and a gas drop vent on the left wall, so each kind of pair is present.
    const extra: OpeningInput[] = [
      { id: 'right-win', type: 'window', wall: 'right', position: 1500, sillHeight: 900, width: 600, height: 400, opens: true },
      { id: 'gas-vent', type: 'body-point', kind: 'gas-drop-vent', wall: 'left', position: 600, height: -100 },
    ];
    const doc = layout(extra);
    const movable = doc.bay.openings.filter((o) => o.type === 'window' || (o.type === 'body-point' && o.wall !== 'underside'));
    fc.assert(
      fc.property(fc.integer({ min: 0, max: movable.length - 1 }), fc.double({ min: 0, max: 1, noNaN: true }), (which, at) => {
        const o = movable[which];
        const room = o.type === 'window'
          ? (o.wall === 'door' ? doc.bay.doors.find((d) => d.id === o.door)!.width : o.wall === 'rear' ? doc.bay.width : doc.bay.length) - o.width
          : o.type === 'body-point' && o.wall === 'rear' ? doc.bay.width : doc.bay.length;
        const position = Math.round(at * room);
        const moved = layoutDocSchema.parse({ ...doc, bay: { ...doc.bay, openings: doc.bay.openings.map((p) => (p.id === o.id ? { ...p, position } : p)) } });
        expect(unrelated(moved, o.id)).toEqual(unrelated(doc, o.id));
      }),
      { seed: 17, numRuns: 40 },
    );
  });
});
