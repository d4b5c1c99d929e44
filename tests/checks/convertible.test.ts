// The convertible interior as the trade builds it, each classic case worked by hand in a plain box
// bay (no build-up unless said, so heights above the finished floor are heights above the bare one).
// Figures are our own invented layouts; the sources of the numbers compared are named beside them.
import { describe, expect, it } from 'vitest';
import { runChecks } from '@/lib/checks';
import { modulesIn, surfaceIn } from '@/lib/layout/bay';
import { computeAxleLoads, waterPlan } from '@/lib/planning';
import { boxDoc, findings, l2h2Doc, mod, only } from './helpers';

const SEAT_BY_DAY = { travel: 'seat', lounge: 'seat', sleep: 'sleep' } as const;

describe('a lengthways made-up bed from two benches and two infills', () => {
  // Benches 1900 × 600 along each wall (y 0–600 and 1200–1800), cushion top 460 mm; two infill
  // boards 950 × 600 between them at 380 + 80 = 460 mm. Made up, the bed is 1900 long and
  // 600 + 600 + 600 = 1800 mm wide.
  const doc = boxDoc({
    occupants: { sleepers: [1800, 1650] },
    modules: [
      mod({ id: 'bench-l', kind: 'bench-seat', label: 'Left bench', x: 1000, y: 0, length: 1900, width: 600, height: 460, facing: 'right', surfaces: SEAT_BY_DAY }),
      mod({ id: 'bench-r', kind: 'bench-seat', label: 'Right bench', x: 1000, y: 1200, length: 1900, width: 600, height: 460, facing: 'left', surfaces: SEAT_BY_DAY }),
      mod({ id: 'infill-1', kind: 'bed-infill', label: 'Front infill', x: 1000, y: 600, length: 950, width: 600, elevation: 380, height: 80, facing: 'front', arrangements: ['sleep'], surfaces: { sleep: 'sleep' } }),
      mod({ id: 'infill-2', kind: 'bed-infill', label: 'Rear infill', x: 1950, y: 600, length: 950, width: 600, elevation: 380, height: 80, facing: 'front', arrangements: ['sleep'], surfaces: { sleep: 'sleep' } }),
    ],
  });

  it('passes length and width as one bed of all four pieces', () => {
    const length = only(doc, 'sleep.length', 'sleep');
    // The tallest sleeper needs 1800 + 100 mm (common practice, no source) = 1900 mm: exactly met.
    expect(length).toMatchObject({ status: 'pass', measured: 1900, required: 1900, moduleIds: ['bench-l', 'bench-r', 'infill-1', 'infill-2'] });
    // Two sleepers need 2 × 600 mm (common practice, no source) = 1200 mm; the bed is 1800 mm wide.
    expect(only(doc, 'sleep.width', 'sleep')).toMatchObject({ status: 'pass', measured: 1800, required: 1200 });
    expect(only(doc, 'sleep.level', 'sleep')).toMatchObject({ status: 'pass', measured: 0 });
  });

  it('the benches are still seats in travel and in the lounge, and stand in the travel plan', () => {
    for (const a of ['travel', 'lounge'] as const) {
      const present = modulesIn(doc, a).map((m) => m.id);
      expect(present).toEqual(['bench-l', 'bench-r']);
      for (const id of present) expect(surfaceIn(doc.modules.find((m) => m.id === id)!, a)).toBe('seat');
    }
    expect(surfaceIn(doc.modules[0], 'sleep')).toBe('sleep');
  });
});

describe('a transverse fixed bed over a garage (our L2H2 bay: 2000 mm bare, 24 mm floor, 26 mm roof build-up)', () => {
  // Platform across the rear, x 1700–3100, y 36–1764 (1728 mm across the van, 1400 mm along it),
  // underside 900 mm over the garage, 100 mm thick: mattress top 1000 mm above the finished floor.
  const bed = mod({ id: 'bed', kind: 'bed-platform', label: 'Cross bed', x: 1700, y: 36, length: 1400, width: 1728, elevation: 900, height: 100, facing: 'front', surfaces: { travel: 'sleep', lounge: 'sleep', sleep: 'sleep' } });
  const step = mod({ id: 'step', kind: 'step', label: 'Bed step', x: 1300, y: 900, length: 300, width: 300, height: 300, facing: 'rear' });
  const rearDoor = { doors: [{ id: 'rear', wall: 'rear' as const, offset: 150, width: 1500 }] };

  it('is slept across the van and reports its sitting headroom: 2000 − 24 − 26 − 1000 = 950 mm, under the 965 mm sitting height', () => {
    const doc = l2h2Doc({ modules: [bed, step], bay: rearDoor, occupants: { sleepers: [1600] } });
    // 1728 mm across the van against 1600 + 100 = 1700 mm.
    const length = only(doc, 'sleep.length', 'sleep');
    expect(length).toMatchObject({ status: 'pass', measured: 1728, required: 1700 });
    expect(length.message).toMatch(/across the van/);
    // Sitting height of the 95th-percentile British man, 965 mm (Pheasant & Haslegrave, Bodyspace,
    // Table 10.1, from memory): 15 mm short, so lying down only — a warning.
    const head = only(doc, 'sleep.headroom', 'sleep');
    expect(head).toMatchObject({ status: 'warn', measured: 950, required: 965, moduleIds: ['bed'] });
    expect(head.message).toMatch(/950 mm from the mattress top up to the lined roof; 15 mm short of sitting up/);
  });

  it('a locker over it is the lowest thing above: 1450 − 1000 = 450 mm, and it is named', () => {
    const locker = mod({ id: 'locker', kind: 'overhead-locker', label: 'Bed locker', x: 1700, y: 36, length: 1400, width: 350, elevation: 1450, height: 350, facing: 'right' });
    const head = only(l2h2Doc({ modules: [bed, step, locker], bay: rearDoor, occupants: { sleepers: [1600] } }), 'sleep.headroom', 'sleep');
    expect(head).toMatchObject({ status: 'warn', measured: 450, moduleIds: ['bed', 'locker'] });
    expect(head.message).toMatch(/up to the underside of Bed locker/);
  });

  it('its way out: the rear door borders it, and at 1000 mm (over 800 mm, EN 747-1 from memory) it needs its step', () => {
    const withStep = only(l2h2Doc({ modules: [bed, step], bay: rearDoor, occupants: { sleepers: [1600] } }), 'egress.sleep', 'sleep');
    expect(withStep).toMatchObject({ status: 'pass', moduleIds: ['bed', 'step'] });
    expect(withStep.message).toMatch(/rear door \(1500 mm wide\) borders it/);
    expect(withStep.message).toMatch(/1000 mm above the floor, so it needs a ladder or step: Bed step beside it/);
    // The step 401 mm away (x 999–1299, bed from 1700) is too far; with none the bed fails.
    const far = only(l2h2Doc({ modules: [bed, { ...step, x: 999 }], bay: rearDoor, occupants: { sleepers: [1600] } }), 'egress.sleep', 'sleep');
    expect(far.status).toBe('fail');
    expect(far.message).toMatch(/no ladder or step stands within 400 mm/);
  });
});

describe('a bunk over the lounge bed', () => {
  // Lounge bed: one 1900 × 1200 cushion set, top 300 + 160 = 460 mm. Bunk: 1800 × 700 board at
  // 1150 mm, top 1250 mm: 790 mm higher, far more than the 150 mm step (common practice) that
  // separates places. Box bay 2000 mm high, no build-up.
  const lounge = mod({ id: 'lounge', kind: 'bed-platform', label: 'Lounge bed', x: 0, y: 0, length: 1900, width: 1200, elevation: 300, height: 160, facing: 'front' , surfaces: { sleep: 'sleep' } });
  const bunk = mod({ id: 'bunk', kind: 'bed-platform', label: 'Upper bunk', x: 0, y: 1100, length: 1800, width: 700, elevation: 1150, height: 100, facing: 'front', arrangements: ['sleep'], surfaces: { sleep: 'sleep' } });
  const ladder = mod({ id: 'ladder', kind: 'step', label: 'Bunk ladder', x: 1800, y: 1200, length: 100, width: 100, height: 1150, facing: 'front', arrangements: ['sleep'] });
  const doc = boxDoc({ modules: [lounge, bunk, ladder], occupants: { sleepers: [1800, 1650, 1200] } });

  it('is its own sleeping place, not a bed “1140 mm out of level” with the lounge bed', () => {
    const places = findings(runChecks(doc), 'sleep.place', 'sleep');
    expect(places.map((p) => p.moduleIds)).toEqual([['lounge'], ['bunk']]);
    expect(places.map((p) => p.measured)).toEqual([460, 1250]);
    expect(places[1].message).toMatch(/^Bed 2 \(Upper bunk\) is a sleeping place of its own: mattress top 1250 mm/);
    expect(findings(runChecks(doc), 'sleep.level').every((f) => f.status === 'pass')).toBe(true);
  });

  it('each place has its own headroom: 1150 − 460 = 690 mm under the bunk, 2000 − 1250 = 750 mm over it', () => {
    const head = findings(runChecks(doc), 'sleep.headroom', 'sleep');
    expect(head.map((f) => [f.moduleIds, f.measured, f.status])).toEqual([
      [['lounge', 'bunk'], 690, 'warn'],
      [['bunk'], 750, 'warn'],
    ]);
  });

  it('the child goes to the bunk (1200 + 100 = 1300 mm ≤ 1800 mm), and the bunk’s way out is its ladder', () => {
    const length = findings(runChecks(doc), 'sleep.length', 'sleep');
    expect(length[1]).toMatchObject({ status: 'pass', measured: 1800, required: 1300, moduleIds: ['bunk'] });
    const out = findings(runChecks(doc), 'egress.sleep', 'sleep')[1];
    expect(out.message).toMatch(/Bunk ladder beside it/);
  });

  it('pieces 150 mm apart in height still make one bed (and fail its level); 151 mm apart they are two places', () => {
    const low = mod({ id: 'low', kind: 'bed-infill', x: 0, y: 0, length: 1900, width: 700, elevation: 300, height: 100, facing: 'front', arrangements: ['sleep'], surfaces: { sleep: 'sleep' } });
    const high = (dz: number) => mod({ id: 'high', kind: 'bed-infill', x: 0, y: 700, length: 1900, width: 700, elevation: 300 + dz, height: 100, facing: 'front', arrangements: ['sleep'], surfaces: { sleep: 'sleep' } });
    const one = runChecks(boxDoc({ modules: [low, high(150)] }));
    expect(findings(one, 'sleep.place')).toHaveLength(1);
    expect(only(boxDoc({ modules: [low, high(150)] }), 'sleep.level')).toMatchObject({ status: 'fail', measured: 150 });
    expect(findings(runChecks(boxDoc({ modules: [low, high(151)] })), 'sleep.place')).toHaveLength(2);
  });
});

describe('a tank counts what its drawn size holds', () => {
  // Drawn 480 × 330 × 300 mm outside: 47.52 L. Less a 5 mm wall on every face (common practice,
  // no source): 470 × 320 × 290 mm = 43.616 L — within the wall allowance of the 47 L drawn.
  const tank = (props?: { litres?: number; fillFraction?: number }) =>
    mod({ id: 'fresh', kind: 'fresh-water-tank', label: 'Fresh tank', x: 100, y: 100, length: 480, width: 330, height: 300, facing: 'front', ...(props ? { props } : {}) });

  it('counts 43.6 L from its drawn size, not the 70 L a typed default would say, and its water mass from that', () => {
    const w = waterPlan(boxDoc({ modules: [tank()] }));
    expect(w.freshL).toBeCloseTo(43.616, 3);
    expect(47.52 - w.freshL).toBeLessThanOrEqual(47.52 - 43.616 + 1e-9);
    expect(w.freshBasis).toBe('drawn');
    expect(w.freshFullKg).toBeCloseTo(43.616, 3); // 1 kg per litre (round figure, errs heavy)
    const doc = boxDoc({ modules: [tank()] });
    const water = computeAxleLoads(doc).items.find((i) => i.id === 'water:fresh')!;
    expect(water.massKg).toBeCloseTo(43.616, 3);
    expect(water.label).toMatch(/43\.6 L \(from its drawn size, less a 5 mm wall\)/);
  });

  it('a fill fraction of 0.9 takes 90 %: 39.25 L', () => {
    expect(waterPlan(boxDoc({ modules: [tank({ fillFraction: 0.9 })] })).freshL).toBeCloseTo(39.2544, 3);
  });

  it('a typed capacity larger than the drawn inside is a finding; one that fits is not', () => {
    const over = only(boxDoc({ modules: [tank({ litres: 70 })] }), 'water.capacity');
    expect(over).toMatchObject({ status: 'fail', measured: 70, required: 43.6, moduleIds: ['fresh'] });
    expect(over.message).toMatch(/“Fresh tank” is typed as 70\.0 L; drawn 480 × 330 × 300 mm, its inside holds 43\.6 L/);
    expect(only(boxDoc({ modules: [tank({ litres: 40 })] }), 'water.capacity').status).toBe('pass');
    expect(waterPlan(boxDoc({ modules: [tank({ litres: 40 })] })).freshBasis).toBe('typed');
  });
});

describe('a rack behind the rear axle unloads the front axle (the lever rule)', () => {
  // Wheelbase 3450 mm, front axle 800 mm ahead of the bay: the rear axle is at x = 2650. A 30 kg
  // rack centred 600 mm behind it (x 3150–3350 behind a 3100 mm bay, centre 3250) changes the front
  // axle load by −30 × 600 ÷ 3450 = −5.217 kg and puts 30 × 4050 ÷ 3450 = 35.217 kg on the rear
  // (statics: moments about the front axle).
  const vehicle = { massInRunningOrderKg: 2100, frontAxleRunningOrderKg: 1250, wheelbaseMm: 3450, frontAxleX: -800 };
  const base = (extra: ReturnType<typeof mod>[]) => ({ ...boxDoc({ length: 3100, modules: extra }), systems: { vehicle } });

  it('front −5.217 kg, rear +35.217 kg', () => {
    const rack = mod({ id: 'rack', kind: 'drawer-unit', label: 'Rear rack', x: 3150, y: 400, length: 200, width: 1000, height: 400, facing: 'rear', massKg: 30, mount: 'rear' });
    const without = computeAxleLoads(base([]) as never).axles!;
    const withRack = computeAxleLoads(base([rack]) as never).axles!;
    expect(withRack.frontKg - without.frontKg).toBeCloseTo(-5.217, 3);
    expect(withRack.rearKg - without.rearKg).toBeCloseTo(35.217, 3);
  });
});

describe('modules outside the body', () => {
  // Our L2H2 bay: 3100 × 1800, arches x 1700–2650 standing in 210 mm from each wall. Envelope under
  // the floor: load floor 550 mm above the road − 200 mm ground clearance kept = 350 mm (both
  // common practice, no source).
  const tank = (over: Partial<ReturnType<typeof mod>> = {}) =>
    mod({ id: 'grey', kind: 'grey-water-tank', label: 'Underslung tank', x: 1000, y: 700, length: 600, width: 400, height: 200, facing: 'front', mount: 'under-floor', ...over });

  it('an underslung tank 200 mm deep inside the floor pan passes; 400 mm deep is 50 mm too deep', () => {
    expect(only(l2h2Doc({ modules: [tank()] }), 'fit.outside')).toMatchObject({ status: 'pass', measured: 200, required: 350 });
    const deep = only(l2h2Doc({ modules: [tank({ height: 400 })] }), 'fit.outside');
    expect(deep).toMatchObject({ status: 'fail', measured: 400, required: 350 });
    expect(deep.message).toMatch(/hangs 400 mm below the floor, 50 mm more than the 350 mm allowed/);
    // A floor 650 mm above the road allows 650 − 200 = 450 mm.
    expect(only(l2h2Doc({ modules: [tank({ height: 400 })], settings: { floorAboveRoad: 650 } }), 'fit.outside').status).toBe('pass');
  });

  it('under a wheel arch is a failure naming the arch', () => {
    const f = only(l2h2Doc({ modules: [tank({ x: 1800, y: 0 })] }), 'fit.outside');
    expect(f.status).toBe('fail');
    expect(f.message).toMatch(/under the left wheel arch/);
  });

  it('behind the rear doors: 1000 mm of projection passes, 1001 mm warns, reaching into the body fails', () => {
    const rack = (x: number, length: number) => mod({ id: 'rack', kind: 'drawer-unit', label: 'Bike rack', x, y: 300, length, width: 1200, height: 800, facing: 'rear', mount: 'rear' });
    expect(only(l2h2Doc({ modules: [rack(3100, 1000)] }), 'fit.outside')).toMatchObject({ status: 'pass', measured: 1000 });
    expect(only(l2h2Doc({ modules: [rack(3100, 1001)] }), 'fit.outside')).toMatchObject({ status: 'warn', measured: 1001 });
    expect(only(l2h2Doc({ modules: [rack(3000, 500)] }), 'fit.outside').status).toBe('fail');
  });

  it('is left out of the interior rules: a tank under a counter is no overlap, and it blocks no walkway', () => {
    const counter = mod({ id: 'counter', kind: 'kitchen-counter', x: 1000, y: 36, length: 1200, width: 600, facing: 'right' });
    const doc = l2h2Doc({ modules: [counter, tank({ y: 36 })] });
    expect(only(doc, 'fit.overlap')).toMatchObject({ status: 'pass' });
    expect(findings(runChecks(doc), 'fit.inside').flatMap((f) => f.moduleIds ?? [])).not.toContain('grey');
    const alone = runChecks(l2h2Doc({ modules: [counter] }));
    const withTank = runChecks(doc);
    expect(findings(withTank, 'walkway.width').map((f) => f.measured)).toEqual(findings(alone, 'walkway.width').map((f) => f.measured));
  });
});
