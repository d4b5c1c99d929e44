// fit.solar (lib/checks/solar.ts): solar panels on the roof, each rule at, just inside and just
// outside its figure, worked by hand below. Both figures are common practice, no source
// (SOURCES.solarEdge: 50 mm from every roof edge; SOURCES.solarOpening: 100 mm around a roof vent,
// fan or skylight). The overlap rule is plain geometry (SOURCES.overlap, no outside source). The
// bay is helpers.ts's plain box: 3000 × 1800 mm in plan, no build-up. Panels are the kind's
// invented default, 1480 × 670 mm.
import { describe, expect, it } from 'vitest';
import { runChecks, type Finding } from '@/lib/checks';
import { layoutDocSchema, starterLayout, type LayoutDoc, type LayoutDocInput } from '@/lib/layout';
import { fitSolar } from '@/lib/checks/solar';
import { boxDoc, mod } from './helpers';

type OpeningInput = NonNullable<LayoutDocInput['bay']['openings']>[number];
type ModuleInput = LayoutDocInput['modules'][number];

const panel = (id: string, x: number, y: number, o: Partial<ModuleInput> = {}): ModuleInput =>
  mod({ id, kind: 'solar-panel', x, y, length: 1480, width: 670, height: 35, facing: 'front', mount: 'roof', props: { ratedWatts: 175 }, ...o } as ModuleInput);

/** Roof vent 400 × 400 at x 2000–2400, y 700–1100. */
const vent: OpeningInput = { id: 'vent', type: 'roof-opening', kind: 'vent', x: 2000, y: 700, length: 400, width: 400, frameHeight: 40 };

function docWith(modules: ModuleInput[], openings: OpeningInput[] = []): LayoutDoc {
  return layoutDocSchema.parse(boxDoc({ modules, bay: { openings } }));
}
const solar = (doc: LayoutDoc): Finding[] => runChecks(doc).findings.filter((f) => f.id === 'fit.solar');
/** The finding about the roof edge for one panel (the one without openingIds and with a single module). */
const edgeOf = (fs: Finding[], id: string) => fs.filter((f) => f.moduleIds?.length === 1 && f.moduleIds[0] === id && !f.openingIds);
const openingOf = (fs: Finding[], id: string) => fs.filter((f) => f.moduleIds?.[0] === id && f.openingIds);
const overlaps = (fs: Finding[]) => fs.filter((f) => (f.moduleIds?.length ?? 0) === 2);

describe('fit.solar: 50 mm from every roof edge (common practice, no source)', () => {
  // Panel at y 600 (600–1270): left 600, right 1800 − 1270 = 530; rear 3000 − (x + 1480). The front edge governs.
  it('49 mm from the front edge needs attention, saying it is 1 mm closer than the 50 mm', () => {
    const [f] = edgeOf(solar(docWith([panel('p', 49, 600)])), 'p');
    expect(f).toMatchObject({ status: 'warn', measured: 49, required: 50, unit: 'mm' });
    expect(f.message).toMatch(/49 mm from the front edge of the roof, 1 mm closer than the 50 mm/);
    expect(f.source).toMatch(/Common practice, no source/);
  });

  it('50 mm exactly meets; 51 mm meets', () => {
    expect(edgeOf(solar(docWith([panel('p', 50, 600)])), 'p')[0]).toMatchObject({ status: 'pass', measured: 50 });
    expect(edgeOf(solar(docWith([panel('p', 51, 600)])), 'p')[0]).toMatchObject({ status: 'pass', measured: 51 });
  });

  it('the nearest edge governs: at x 1470 the rear edge is 3000 − 1470 − 1480 = 50 mm; at y 1131 the right edge is 1800 − 1131 − 670 = −1 mm, past it: does not meet', () => {
    expect(edgeOf(solar(docWith([panel('p', 1470, 600)])), 'p')[0]).toMatchObject({ status: 'pass', measured: 50 });
    const [f] = edgeOf(solar(docWith([panel('p', 600, 1131)])), 'p');
    expect(f).toMatchObject({ status: 'fail', measured: -1 });
    expect(f.message).toMatch(/reaches 1 mm past the right edge/);
  });

  it('a layout with no panel on the roof has no fit.solar finding, and a panel mounted inside is not judged as one on the roof', () => {
    expect(solar(docWith([]))).toEqual([]);
    expect(solar(docWith([panel('p', 0, 0, { mount: 'inside' })]))).toEqual([]);
  });
});

describe('fit.solar: 100 mm around a roof opening (common practice, no source)', () => {
  // Panel at y 600 (600–1270) overlaps the vent's 700–1100 across, so the gap is along x alone:
  // gap = 2000 − (x + 1480). x = 421 → 99 mm, 420 → 100 mm, 419 → 101 mm.
  it('99 mm from the vent needs attention, naming the vent and carrying its id', () => {
    const [f] = openingOf(solar(docWith([panel('p', 421, 600)], [vent])), 'p');
    expect(f).toMatchObject({ status: 'warn', measured: 99, required: 100, moduleIds: ['p'], openingIds: ['vent'] });
    expect(f.message).toMatch(/99 mm from the roof vent at 2000 mm from the front, closer than the 100 mm/);
  });

  it('100 mm exactly meets; 101 mm meets', () => {
    expect(openingOf(solar(docWith([panel('p', 420, 600)], [vent])), 'p')[0]).toMatchObject({ status: 'pass', measured: 100, openingIds: ['vent'] });
    expect(openingOf(solar(docWith([panel('p', 419, 600)], [vent])), 'p')[0]).toMatchObject({ status: 'pass', measured: 101 });
  });

  it('the distance is a straight line: a corner 60 mm and 80 mm off the vent is √(60² + 80²) = 100 mm away and meets', () => {
    // Panel 1480 × 500 ending at x 1940 (2000 − 60) and y 620 (700 − 80): x 460, y 120.
    expect(openingOf(solar(docWith([panel('p', 460, 120, { width: 500 })], [vent])), 'p')[0]).toMatchObject({ status: 'pass', measured: 100 });
  });

  it('a panel over the vent covers it: does not meet, measured 0', () => {
    // x 600: the panel runs to 2080, 80 mm over the vent's front edge.
    const [f] = openingOf(solar(docWith([panel('p', 600, 600)], [vent])), 'p');
    expect(f).toMatchObject({ status: 'fail', measured: 0, openingIds: ['vent'] });
    expect(f.message).toMatch(/covers the roof vent at 2000 mm from the front/);
  });
});

describe('fit.solar: no overlaps on the roof (layout geometry, no outside source)', () => {
  it('two panels side by side touching (A y 100–770, B y 770–1440) meet: no overlap finding', () => {
    const fs = solar(docWith([panel('a', 100, 100), panel('b', 100, 770)]));
    expect(overlaps(fs)).toEqual([]);
    expect(fs.every((f) => f.status === 'pass')).toBe(true);
  });

  it('overlapping by 1 mm (B from y 769) does not meet, naming both panels by their labels', () => {
    const fs = solar(docWith([panel('a', 100, 100, { label: 'Front panel' }), panel('b', 100, 769, { label: 'Rear panel' })]));
    const [f] = overlaps(fs);
    expect(f).toMatchObject({ status: 'fail', measured: 1, required: 0 });
    expect([...f.moduleIds!].sort()).toEqual(['a', 'b']);
    expect(f.message).toMatch(/Front panel and Rear panel overlap by 1480 mm × 1 mm on the roof/);
  });

  it('a panel over a roof box does not meet; a panel over a module inside the body is no concern of this rule', () => {
    const box = mod({ id: 'box', kind: 'roof-box', x: 1500, y: 100, length: 1400, width: 800, height: 400, facing: 'front', mount: 'roof' } as ModuleInput);
    expect(overlaps(solar(docWith([panel('p', 100, 100), box])))).toHaveLength(1); // panel to 1580, box from 1500: 80 mm
    const counter = mod({ id: 'c', kind: 'kitchen-counter', x: 100, y: 100, length: 1200, width: 500 } as ModuleInput);
    expect(overlaps(solar(docWith([panel('p', 100, 100), counter])))).toEqual([]);
  });

  it('panels fit between the roof rails: clear of both meets; over a rail by 20 mm does not meet, naming the rail', () => {
    const rail = (id: string, y: number) => mod({ id, kind: 'roof-rail', x: 500, y, length: 2000, width: 40, height: 60, facing: 'front', mount: 'roof' } as ModuleInput);
    const rails = [rail('rail-l', 100), rail('rail-r', 1660)]; // y 100–140 and 1660–1700
    expect(overlaps(solar(docWith([...rails, panel('p', 600, 600)])))).toEqual([]);
    const [f] = overlaps(solar(docWith([...rails, panel('p', 600, 120)]))); // panel y 120–790 over rail 100–140: 20 mm
    expect(f).toMatchObject({ status: 'fail', measured: 20 });
    expect(f.message).toMatch(/Roof rail/);
  });

  it('two default panels dropped on a vent and on each other: each covers the vent and the pair overlaps (what the editor shows)', () => {
    // A x 1000–2480, y 600–1270; B x 1200–2680, y 650–1320: overlap 1280 × 620; both cover the vent (2000–2400 × 700–1100).
    const fs = solar(docWith([panel('a', 1000, 600), panel('b', 1200, 650)], [vent]));
    expect(openingOf(fs, 'a')[0]).toMatchObject({ status: 'fail', openingIds: ['vent'] });
    expect(openingOf(fs, 'b')[0]).toMatchObject({ status: 'fail', openingIds: ['vent'] });
    expect(overlaps(fs)).toEqual([expect.objectContaining({ status: 'fail', measured: 620 })]);
    // Unlabelled panels are told apart by where they are.
    expect(overlaps(fs)[0].message).toMatch(/The solar panel at 1000 mm from the front, 600 mm from the left and the solar panel at 1200 mm from the front, 650 mm from the left overlap by 1280 mm × 620 mm/);
  });

  it('stays bounded on a pile: 3000 panels on one spot stop with a finding saying so, quickly', () => {
    const pile = Array.from({ length: 3000 }, (_, i) => panel(`p${i}`, 100, 100));
    const doc = docWith(pile);
    const started = performance.now();
    const own = fitSolar(doc);
    expect(performance.now() - started).toBeLessThan(20_000);
    // 3000 pairs-in-waiting × 3000 / 2 ≈ 4.5 million comparisons would be needed; the budget is
    // 20 000 + 64 × 3000 × log2(3002) ≈ 2.24 million steps, so the sweep stops and says so.
    expect(own.some((f) => f.unit === 'steps' && f.status === 'warn')).toBe(true);
    expect(own.filter((f) => (f.moduleIds?.length ?? 0) === 2)).toHaveLength(40); // the pairs worded one by one
    expect(own.find((f) => f.unit === 'pairs')).toMatchObject({ status: 'fail' }); // the rest counted in one
    expect(solar(doc).length).toBeLessThanOrEqual(40); // the report lists at most 40 a rule, the last summing up the rest
  });
});

describe('fit.solar on the rear-bed starter (invented demo: two 175 W panels between the kitchen fan and the bed vent)', () => {
  it('both panels meet every part of the rule', () => {
    // Bay 3800 × 1800; panels x 1000–2480, y 230–900 and 900–1570 (touching). Kitchen fan x 450–850,
    // y 450–850: 1000 − 850 = 150 mm from the left panel (≥ 100); bed vent from x 2800: 2800 − 2480 = 320 mm.
    // Nearest roof edge: 230 mm (left of one, right of the other: 1800 − 1570), ≥ 50.
    const fs = solar(starterLayout('starter-rear-bed')!);
    expect(fs.length).toBe(4); // an edge and an opening finding per panel, no overlap
    expect(fs.every((f) => f.status === 'pass')).toBe(true);
    expect(edgeOf(fs, 'solar-left')[0].measured).toBe(230);
    expect(openingOf(fs, 'solar-left')[0]).toMatchObject({ measured: 150, openingIds: ['roof-fan'] });
  });
});
