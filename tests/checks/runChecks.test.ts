// The whole engine: our starter layouts, the two facts of the trade built from our own L2H2
// template (common practice, stated by a practising builder: a person 1870 mm tall stands upright
// in a high-roof van after floor and roof insulation; an L-shaped lounge makes up into a UK king
// bed, 1500 × 2000 mm, slept lengthways), the report contract on every finding, and properties.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { checkLayoutInput, runChecks, SOURCES } from '@/lib/checks';
import { bayTemplate, DEFAULT_BUILD_UP, layoutDocSchema, parseLayoutDoc, starterLayout, type LayoutDoc } from '@/lib/layout';
import { generateLayout } from './fixtures/generatedLayout';
import { findings, l2h2Doc, mod, only } from './helpers';

const OURS = /^(fit|walkway|headroom|sleep|egress|travel)\./;
const ourFindings = (doc: LayoutDoc) => runChecks(doc).findings.filter((f) => OURS.test(f.id));

describe('starter layouts', () => {
  it('the L-shaped lounge passes every geometry rule, the table leaving a 600 mm corridor to the right wheel arch', () => {
    const doc = starterLayout('starter-l-lounge')!;
    const report = runChecks(doc);
    const mine = report.findings.filter((f) => OURS.test(f.id) && f.id !== 'sleep.headroom');
    expect(mine.filter((f) => f.status !== 'pass')).toEqual([]);
    // The upper bunk (underside 1150 mm, top 1250 mm) leaves room to lie, not to sit up, under and over it:
    // lower bed 1150 − (300 + 160) = 690 mm; bunk 2000 − 24 − 26 − 1250 = 700 mm; both below 965 mm.
    expect(findings(report, 'sleep.headroom').map((f) => [f.status, f.measured])).toEqual([['warn', 690], ['warn', 700]]);
    // Moved back 40 mm onto the bench's edge (table at y 560–960, arch from y 1800 − 210 = 1590), the warning is gone.
    expect(only(doc, 'walkway.width', 'lounge').measured).toBeGreaterThanOrEqual(550);
    // The same layout with the table where it was (y 650–1050) is squeezed to 1590 − 1050 = 540 mm: a warning, not a failure.
    const squeezed = { ...doc, modules: doc.modules.map((m) => (m.id === 'table' ? { ...m, y: 650 } : m)) };
    expect(only(squeezed, 'walkway.width', 'lounge')).toMatchObject({ status: 'warn', measured: 540 });
    // Two places: the lounge bed (benches and infill, 2000 × 1500) and the upper bunk (1450 × 700), largest first.
    const [length, bunk] = findings(report, 'sleep.length', 'sleep');
    expect(length).toMatchObject({ measured: 2000, moduleIds: ['bench-left', 'bench-rear', 'infill'] });
    expect(length.message).toMatch(/UK king \(1500 × 2000 mm\) slept lengthways/);
    expect(bunk).toMatchObject({ measured: 1450, moduleIds: ['bunk'] });
    expect(findings(report, 'sleep.width', 'sleep').map((f) => f.measured)).toEqual([1500, 700]);
    expect(only(doc, 'headroom.standing')).toMatchObject({ status: 'pass', measured: 1950, required: 1890 }); // 2000 − 24 − 26 clear; 1870 mm stature + 20 mm margin
  });
  it('the fixed rear bed: every unit can be worked from inside; turned to face the rear doors under the bed, the electrics bay cannot', () => {
    const doc = starterLayout('starter-rear-bed')!;
    expect(ourFindings(doc).filter((f) => f.status === 'fail')).toEqual([]);
    const turned = { ...doc, modules: doc.modules.map((m) => (m.id === 'electrics' ? { ...m, x: 3150, y: 900, facing: 'rear' as const } : m)) };
    for (const a of ['travel', 'lounge']) expect(only(turned, 'walkway.reach', a)).toMatchObject({ status: 'fail', moduleIds: ['electrics'], measured: 6, required: 7 });
    const mine = ourFindings(turned).filter((f) => f.status === 'fail');
    expect(mine.map((f) => f.id)).toEqual(['walkway.reach', 'walkway.reach']);
    expect(only(doc, 'sleep.length', 'sleep').message).toMatch(/UK double/);
    expect(only(doc, 'egress.sleep', 'sleep').status).toBe('pass');
  });
});

describe('facts of the trade (common practice, stated by a practising builder), built from our L2H2 template', () => {
  const bay = bayTemplate('l2h2')!.bay;
  // Our own L-shaped lounge: a side bench along the left wall, a rear bench across the back, and an
  // infill board that slides out between them at night, all cushions at 300 mm on the 24 mm floor.
  const cushions = { elevation: 300, height: 160, surfaces: { travel: 'sleep', lounge: 'sleep', sleep: 'sleep' } as const };
  const lounge = (sleepers: number[]) =>
    layoutDocSchema.parse({
      schemaVersion: 4,
      name: 'L-lounge from the L2H2 template',
      bay,
      buildUp: DEFAULT_BUILD_UP,
      occupants: { standingHeight: 1870, sleepers },
      modules: [
        mod({ id: 'galley', kind: 'kitchen-counter', x: 0, y: 36, length: 1100, width: 550, facing: 'right' }),
        mod({ id: 'side-bench', kind: 'bench-seat', x: 1100, y: 36, length: 2000, width: 500, facing: 'right', arrangements: ['lounge', 'sleep'], ...cushions }),
        mod({ id: 'rear-bench', kind: 'bench-seat', x: 2600, y: 536, length: 500, width: 1198, facing: 'front', arrangements: ['lounge', 'sleep'], ...cushions }),
        mod({ id: 'slide-out', kind: 'bed-infill', x: 1100, y: 536, length: 1500, width: 1000, facing: 'front', arrangements: ['sleep'], ...cushions }),
      ],
    });
  it('a person 1870 mm tall stands upright after the floor (24 mm) and roof (26 mm) build-up', () => {
    expect(only(lounge([1870, 1700]), 'headroom.standing').status).toBe('pass');
  });
  it('the L-shaped lounge converts into a UK king (1500 × 2000 mm) slept lengthways, long and wide enough for two', () => {
    const doc = lounge([1870, 1700]);
    const length = only(doc, 'sleep.length', 'sleep');
    expect(length).toMatchObject({ status: 'pass', measured: 2000 });
    expect(length.message).toMatch(/UK king \(1500 × 2000 mm\) slept lengthways/);
    expect(only(doc, 'sleep.width', 'sleep')).toMatchObject({ status: 'pass', measured: 1500, required: 1200 });
    expect(only(doc, 'sleep.level', 'sleep').status).toBe('pass');
    expect(only(doc, 'egress.sleep', 'sleep').status).toBe('pass');
    expect(ourFindings(doc).filter((f) => f.status === 'fail')).toEqual([]);
  });
  it('a 1910 mm sleeper would need 2010 mm: the same bed fails its length', () => {
    expect(only(lounge([1910]), 'sleep.length', 'sleep')).toMatchObject({ status: 'fail', required: 2010 });
  });
});

describe('the report contract', () => {
  const docs = [starterLayout('starter-l-lounge')!, starterLayout('starter-rear-bed')!, l2h2Doc(), generateLayout(20), l2h2Doc({ occupants: { sleepers: [] }, bay: { doors: [] } })];
  it('every finding of ours carries measured, required, unit, message and source, and per-arrangement rules name theirs', () => {
    for (const doc of docs) {
      for (const f of ourFindings(doc)) {
        expect(Number.isFinite(f.measured), `${f.id} measured`).toBe(true);
        expect(Number.isFinite(f.required), `${f.id} required`).toBe(true);
        expect(f.unit, f.id).toMatch(/\S/);
        expect(f.message.length, f.id).toBeGreaterThan(20);
        expect(f.source, f.id).toMatch(/\w{3}/);
        if (/^(walkway|sleep|egress|travel|headroom\.overhead)/.test(f.id)) expect(f.arrangement, f.id).toBeDefined();
        expect(f.message).not.toMatch(/undefined|NaN/);
      }
    }
  });
  it('two counters drawn 300 mm into each other: ok is false, and the one failure is the 300 × 500 mm overlap', () => {
    // Hand-worked: counter A spans x 0–1200, counter B x 900–2100, both y 600–1100 (clear of the
    // wheel arches) and 0–900 mm high, so they share 300 mm × 500 mm of floor.
    const doc = l2h2Doc({ modules: [
      mod({ id: 'a', kind: 'kitchen-counter', x: 0, y: 600, length: 1200, width: 500, facing: 'right' }),
      mod({ id: 'b', kind: 'kitchen-counter', x: 900, y: 600, length: 1200, width: 500, facing: 'right' }),
    ] });
    const r = runChecks(doc);
    expect(r.ok).toBe(false);
    const fails = r.findings.filter((f) => f.status === 'fail');
    expect(fails.map((f) => f.id)).toEqual(['fit.overlap']);
    expect(fails[0]).toMatchObject({ moduleIds: ['a', 'b'], measured: 300, required: 0 });
    expect(fails[0].message).toMatch(/overlap by 300 mm × 500 mm/);
  });
  it('every rule id of DESIGN.md appears for a full layout', () => {
    const ids = new Set(runChecks(starterLayout('starter-l-lounge')!).findings.map((f) => f.id));
    for (const id of ['fit.inside', 'fit.wheel-arch', 'fit.overlap', 'walkway.width', 'walkway.reach', 'headroom.standing', 'headroom.overhead', 'sleep.length', 'sleep.width', 'sleep.level', 'travel.seats', 'egress.sleep']) expect(ids.has(id), id).toBe(true);
  });
  it('no doors and no sleepers: clear warnings saying what is missing, no crash', () => {
    const doc = l2h2Doc({ occupants: { sleepers: [] }, bay: { doors: [] }, modules: [mod({ id: 'bed', kind: 'bed-platform', x: 1100, y: 36, length: 2000, width: 1400, elevation: 600, height: 300, surfaces: { travel: 'sleep', lounge: 'sleep', sleep: 'sleep' }, facing: 'front' })] });
    const warned = runChecks(doc).findings.filter((f) => f.status === 'warn').map((f) => f.message);
    expect(warned.some((m) => /No door opening is drawn/.test(m))).toBe(true);
    expect(warned.some((m) => /no sleepers are listed/.test(m))).toBe(true);
  });
  it('no source or message names a program, a library, a shop, a web address or “the brief”; none prints an id or a document path', () => {
    const banned = /\b[\w-]+\.(org|com|co\.uk|net)\b|convert-units|pvlib|library|as cited in the brief|systems\.[a-z]|“[A-Za-z0-9_-]{6,}”/i;
    for (const [key, s] of Object.entries(SOURCES)) expect(`${s.cite} ${s.brief}`, key).not.toMatch(banned);
    for (const doc of [...docs, starterLayout('starter-l-lounge')!]) {
      for (const f of runChecks(doc).findings) {
        expect(`${f.message} ${f.source ?? ''}`, f.id).not.toMatch(banned);
        expect(f.message, f.id).not.toContain(f.id);
      }
    }
  });
});

describe('properties (fast-check)', () => {
  const base = starterLayout('starter-l-lounge')!;
  const only1 = (doc: LayoutDoc, a: string) => JSON.stringify(runChecks(doc).findings.filter((f) => f.arrangement === a));
  it('moving a module never changes the result of an arrangement it is not in', () => {
    const expected = { travel: only1(base, 'travel'), sleep: only1(base, 'sleep') };
    fc.assert(
      fc.property(fc.integer({ min: -300, max: 2800 }), fc.integer({ min: -100, max: 1500 }), (x, y) => {
        // The table lives only in the lounge arrangement.
        const moved: LayoutDoc = { ...base, modules: base.modules.map((m) => (m.id === 'table' ? { ...m, x, y } : m)) };
        expect(only1(moved, 'travel')).toBe(expected.travel);
        expect(only1(moved, 'sleep')).toBe(expected.sleep);
      }),
      { numRuns: 25 },
    );
    const travelLounge = { travel: only1(base, 'travel'), lounge: only1(base, 'lounge') };
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 2000 }), fc.integer({ min: 0, max: 900 }), (x, y) => {
        const moved: LayoutDoc = { ...base, modules: base.modules.map((m) => (m.id === 'infill' ? { ...m, x, y } : m)) };
        expect(only1(moved, 'travel')).toBe(travelLounge.travel);
        expect(only1(moved, 'lounge')).toBe(travelLounge.lounge);
      }),
      { numRuns: 25 },
    );
  });
  it('random documents never crash a rule family', () => {
    const kinds = ['bed-platform', 'bed-infill', 'bench-seat', 'seat', 'table', 'kitchen-counter', 'fridge', 'wardrobe', 'overhead-locker', 'electrics-bay'] as const;
    const moduleArb = fc.record({
      kind: fc.constantFrom(...kinds),
      x: fc.integer({ min: -500, max: 4000 }),
      y: fc.integer({ min: -200, max: 2000 }),
      length: fc.integer({ min: 1, max: 2500 }),
      width: fc.integer({ min: 1, max: 2000 }),
      elevation: fc.integer({ min: 0, max: 2500 }),
      height: fc.integer({ min: 1, max: 2500 }),
      facing: fc.constantFrom('front', 'rear', 'left', 'right'),
      arrangements: fc.subarray(['travel', 'lounge', 'sleep'] as const, { minLength: 1 }),
      surfaces: fc.option(fc.record({ travel: fc.constantFrom('sleep', 'seat', 'counter', 'none'), lounge: fc.constantFrom('sleep', 'seat', 'counter', 'none'), sleep: fc.constantFrom('sleep', 'seat', 'counter', 'none') }, { requiredKeys: [] }), { nil: undefined }),
      mount: fc.constantFrom('inside', 'inside', 'inside', 'under-floor', 'roof', 'rear'),
    });
    const docArb = fc.record({
      modules: fc.array(moduleArb, { maxLength: 25 }),
      doors: fc.array(fc.record({ wall: fc.constantFrom('left', 'right', 'rear'), offset: fc.integer({ min: 0, max: 1500 }), width: fc.integer({ min: 0, max: 1700 }) }), { maxLength: 4 }),
      sleepers: fc.array(fc.integer({ min: 300, max: 2300 }), { maxLength: 5 }),
      walls: fc.integer({ min: 0, max: 900 }),
      walkwayMin: fc.integer({ min: 0, max: 2000 }),
    });
    fc.assert(
      fc.property(docArb, (g) => {
        const input = {
          schemaVersion: 4,
          name: 'random',
          bay: { length: 3100, width: 1800, height: 2000, wheelArches: bayTemplate('l2h2')!.bay.wheelArches, doors: g.doors.map((d, i) => ({ ...d, id: `d${i}` })).filter((d) => d.offset + d.width <= (d.wall === 'rear' ? 1800 : 3100)) },
          buildUp: { floor: [], roof: [], walls: [{ material: 'foam', thickness: g.walls }] },
          occupants: { standingHeight: 1800, sleepers: g.sleepers },
          modules: g.modules.map((m, i) => ({ ...m, id: `m${i}` })),
          settings: { walkwayMin: g.walkwayMin },
        };
        const parsed = parseLayoutDoc(input);
        expect(parsed.ok).toBe(true);
        if (!parsed.ok) return;
        const report = runChecks(parsed.value);
        expect(report.findings.filter((f) => f.id.endsWith('.unchecked'))).toEqual([]);
      }),
      { numRuns: 60 },
    );
  });
});

describe('untrusted input and scale', () => {
  it('checkLayoutInput returns field issues for bad input and a report for good input, never throwing', () => {
    for (const bad of [null, 42, 'layout', [], {}, { schemaVersion: 1, name: 'x' }, { ...starterLayout('starter-l-lounge')!, modules: [{ id: 'a b', kind: 'rocket' }] }]) {
      const r = checkLayoutInput(bad);
      expect(r.ok).toBe(false);
      if (!r.ok) expect(r.issues.length).toBeGreaterThan(0);
    }
    const good = checkLayoutInput(JSON.parse(JSON.stringify(starterLayout('starter-l-lounge'))));
    expect(good.ok && good.report.ok).toBe(true);
  });
  // How long it takes is measured by the benchmark (`npm run bench:checks`), not here.
  it('a generated 2000-module layout: no overlapping pairs, 100 beds, every unit reached', () => {
    const doc = generateLayout(2000);
    const report = runChecks(doc);
    expect(findings(report, 'fit.overlap')).toEqual([expect.objectContaining({ status: 'pass' })]);
    // 100 beds: the first 39 are listed one by one, one more finding sums up the other 61 (REPORT_LIMITS).
    const beds = findings(report, 'sleep.length');
    expect(beds).toHaveLength(40);
    expect(beds.at(-1)).toMatchObject({ unit: 'findings', measured: 61 });
    expect(beds.at(-1)!.message).toMatch(/61 more results of this rule are not listed/);
    expect(findings(report, 'walkway.reach', 'lounge')[0]).toMatchObject({ status: 'pass', required: 1300 });
  });
});
