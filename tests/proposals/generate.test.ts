/**
 * The proposal generator against every bay template and a table of briefs: each proposal is a
 * valid stored document with no failing check and meets the brief (worked out here from the
 * document, not by the generator's own figures); impossible briefs get reasons naming the rule
 * and both numbers, worked out by hand from the template's figures; same brief and seed, same
 * proposals.
 */
import { describe, expect, it, vi } from 'vitest';
import { runChecks } from '@/lib/checks';
import { parseLayoutDoc } from '@/lib/layout/parse';
import { surfaceIn } from '@/lib/layout/bay';
import { BAY_TEMPLATES } from '@/lib/layout/templates';
import type { LayoutDoc } from '@/lib/layout/schema';
import { briefSchema, generateProposals, TYPICAL_BRIEF, type Brief, type ProposalResult } from '@/lib/proposals';

// Each case lays out and checks hundreds of candidates: seconds on a busy two-core machine.
vi.setConfig({ testTimeout: 60_000 });

const brief = (over: Partial<Brief>): Brief => briefSchema.parse({ ...TYPICAL_BRIEF, ...over });
const on = (template: string, over: Partial<Brief> = {}) => {
  const t = BAY_TEMPLATES.find((x) => x.id === template)!;
  // A roof under 1.8 m: nobody stands (the brief says so), as the trade builds low vans.
  return brief({ bay: { source: 'template', template }, standing: t.bay.height < 1900 ? null : 1800, ...over });
};

/** What the brief asks for, read from the document by this test. */
function assertMeetsBrief(b: Brief, doc: LayoutDoc) {
  const kinds = doc.modules.map((m) => m.kind);
  expect(doc.occupants.sleepers).toEqual(b.sleepers);
  expect(kinds.includes('toilet-cabinet')).toBe(b.toilet);
  expect(kinds.includes('shower-tray')).toBe(b.shower);
  if (b.kitchen.sink) expect(kinds).toContain('sink-unit');
  if (b.kitchen.hob) expect(kinds).toContain('hob');
  if (b.kitchen.fridge !== 'none') expect(kinds).toContain('fridge');
  const counter = doc.modules.filter((m) => m.kind === 'kitchen-counter' || m.kind === 'sink-unit').reduce((s, m) => s + m.length, 0);
  expect(counter).toBeGreaterThanOrEqual(b.kitchen.counterMin);
  // 10 L per person per day when none is entered (common practice, no source; the water plan's default).
  const fresh = doc.modules.filter((m) => m.kind === 'fresh-water-tank').reduce((s, m) => s + Number(m.props?.litres ?? 0), 0);
  expect(fresh).toBeGreaterThanOrEqual(b.water.days * b.water.people * 10);
  // Grey at least the fresh: NZS 5465 as quoted in New Zealand self-containment guidance (secondary).
  const grey = doc.modules.filter((m) => m.kind === 'grey-water-tank').reduce((s, m) => s + Number(m.props?.litres ?? 0), 0);
  expect(grey).toBeGreaterThanOrEqual(fresh);
  expect(doc.modules.filter((m) => m.kind === 'seat').length).toBe(b.beltedSeats);
  if (b.fuel === 'electric') {
    expect(kinds).not.toContain('gas-locker');
    for (const m of doc.modules) if (m.kind === 'hob' || m.kind === 'heater') expect(String(m.props?.fuel ?? '')).not.toMatch(/LPG|gas/i);
  }
  const beds = doc.modules.filter((m) => surfaceIn(m, 'sleep') === 'sleep');
  expect(beds.length).toBeGreaterThan(0);
  if (b.bed === 'lounge') expect(beds.some((m) => m.kind === 'bench-seat')).toBe(true);
  if (b.bed === 'across' || b.bed === 'lengthways') expect(beds.every((m) => m.kind === 'bed-platform')).toBe(true);
  if (b.garageHeight !== null) for (const m of beds) if (m.kind === 'bed-platform') expect(m.elevation).toBeGreaterThanOrEqual(b.garageHeight);
}

function assertSound(b: Brief, r: ProposalResult) {
  if (r.ok) {
    expect(r.proposals.length).toBeGreaterThan(0);
    for (const p of r.proposals) {
      const parsed = parseLayoutDoc(JSON.parse(JSON.stringify(p.doc)));
      expect(parsed.ok).toBe(true);
      const failing = runChecks(p.doc).findings.filter((f) => f.status === 'fail');
      expect(failing.map((f) => f.message)).toEqual([]);
      assertMeetsBrief(b, p.doc);
      expect(p.scores.every((s) => s.words.length > 20)).toBe(true);
    }
    const zonings = r.proposals.map((p) => p.zoning + p.pattern);
    expect(new Set(zonings).size).toBe(zonings.length);
  } else {
    expect(r.reasons.length).toBeGreaterThan(0);
    for (const reason of r.reasons) {
      expect(Number.isFinite(reason.measured) && Number.isFinite(reason.required)).toBe(true);
      expect(reason.message).toMatch(/\d/);
    }
  }
}

const TABLE: [string, Partial<Brief>][] = [
  ['one sleeper', { sleepers: [1750], water: { days: 2, people: 1 } }],
  ['two sleepers', {}],
  ['four sleepers', { sleepers: [1800, 1700, 1400, 1300], water: { days: 2, people: 4 } }],
  ['two sleepers, toilet and shower', { toilet: true, shower: true }],
];

describe('proposals for every bay template', () => {
  for (const t of BAY_TEMPLATES) {
    for (const [name, over] of TABLE) {
      it(`${t.id}: ${name}`, () => {
        const b = on(t.id, over);
        assertSound(b, generateProposals(b));
      });
    }
  }
});

describe('each bed preference, with and without a wet room', () => {
  for (const bed of ['across', 'lengthways', 'lounge', 'any'] as const) {
    for (const wet of [false, true]) {
      it(`l4h2: ${bed}${wet ? ', toilet and shower' : ''}`, () => {
        // Sleepers short enough to sleep across the 1728 mm lined width: 1600 + 100 ≤ 1728.
        const b = on('l4h2', { bed, toilet: wet, shower: wet, sleepers: [1600, 1550] });
        const r = generateProposals(b);
        expect(r.ok).toBe(true);
        assertSound(b, r);
      });
    }
  }

  it('a typical two-sleeper brief in a long high bay gets at least three different proposals', () => {
    const r = generateProposals(on('l3h2'));
    expect(r.proposals.length).toBeGreaterThanOrEqual(3);
    expect(new Set(r.proposals.map((p) => p.pattern)).size).toBeGreaterThanOrEqual(3);
  });

  it('an all-electric brief with belted seats and a toilet only', () => {
    const b = on('l4h3', { fuel: 'electric', beltedSeats: 2, toilet: true, shower: false, kitchen: { counterMin: 1000, sink: true, hob: true, fridge: 'large' } });
    const r = generateProposals(b);
    assertSound(b, r);
  });
});

describe('honest impossibility', () => {
  it('a bed across for a 1.87 m sleeper in a 1.80 m bay names the rule and both numbers', () => {
    // Needs 1870 + 100 mm allowance (common practice, no source) = 1970 mm; lined width
    // 1800 − 2 × (24 + 12) mm wall build-up = 1728 mm.
    const r = generateProposals(on('l3h2', { bed: 'across', sleepers: [1870, 1650] }));
    expect(r.ok).toBe(false);
    const bed = r.reasons.find((x) => x.rule === 'Bed length');
    expect(bed).toBeDefined();
    expect(bed!.required).toBe(1970);
    expect(bed!.measured).toBe(1728);
    expect(bed!.message).toContain('1970 mm');
    expect(bed!.message).toContain('1728 mm');
    expect(r.nearest.length).toBeGreaterThan(0);
    expect(r.nearest[0].misses.length).toBeGreaterThan(0);
  });

  it('standing upright in a standard-roof bay', () => {
    // Clear height 1500 − (10 + 12 + 2) floor − (20 + 6) roof = 1450 mm; needs 1800 + 20 mm margin = 1820 mm.
    const r = generateProposals(on('l4h2', { standing: 1800, bay: { source: 'measured', bay: { ...BAY_TEMPLATES.find((t) => t.id === 'l4h2')!.bay, height: 1500, openings: [] } } })); // the high roof's door windows would stand above a 1500 mm roof
    expect(r.ok).toBe(false);
    const head = r.reasons.find((x) => x.rule === 'Standing headroom' || /Standing upright/.test(x.message));
    expect(head).toBeDefined();
    expect(head!.measured).toBe(1450);
    expect(head!.required).toBe(1820);
    expect(head!.message).toContain('1450 mm');
    expect(head!.message).toContain('1820 mm');
  });

  it('a 600 mm garage under a fixed bed in a standard-roof bay leaves no room to sit up', () => {
    // 1450 mm clear − 600 mm garage − 200 mm platform and mattress = 650 mm; sitting up needs 850 mm (common practice).
    const r = generateProposals(on('l2h1', { bed: 'across', sleepers: [1600, 1500], garageHeight: 600 }));
    expect(r.ok).toBe(false);
    const sit = r.reasons.find((x) => x.rule === 'sitting headroom over the bed');
    expect(sit).toBeDefined();
    expect(sit!.measured).toBe(650);
    expect(sit!.required).toBe(850);
  });

  it('four sleepers sharing one bed in a 1.80 m bay', () => {
    // Four sleepers × 600 mm each (common practice, no source) = 2400 mm; the widest bed is the lined width, 1728 mm.
    const r = generateProposals(on('l4h2', { bed: 'lengthways', sleepers: [1800, 1700, 1400, 1300] }));
    expect(r.ok).toBe(false);
    const width = r.reasons.find((x) => x.rule === 'Bed width');
    expect(width).toBeDefined();
    expect(width!.required).toBe(2400);
    expect(width!.measured).toBe(1728);
  });
});

describe('determinism', () => {
  it('the same brief and seed give the same proposals', () => {
    const b = on('l3h3', { seed: 42 });
    expect(JSON.stringify(generateProposals(b))).toBe(JSON.stringify(generateProposals(b)));
  });

  it('work is bounded by the candidate cap', () => {
    const r = generateProposals(on('l4h3', { toilet: true, shower: true }), { maxCandidates: 50 });
    expect(r.stats.checked).toBeLessThanOrEqual(50);
  });
});

describe('a second bed level for three or four sleepers', () => {
  const four = { sleepers: [1800, 1700, 1400, 1300], water: { days: 2, people: 4 } };
  // Clear height = bay height − floor build-up (10 + 12 + 2 = 24 mm) − roof build-up (20 + 6 = 26 mm).
  // Two levels over the lounge: bench top 300 mm (clears the arches) + 160 mm board = 460 mm,
  // + 750 mm to sit up head bowed + 150 mm drop-down bed + 750 mm over it = 2110 mm (common practice, no source).
  const TWO_LEVELS = 460 + 750 + 150 + 750;
  for (const t of BAY_TEMPLATES) {
    const clear = t.bay.height - 24 - 26;
    it(`${t.id}: four sleepers ${clear >= TWO_LEVELS ? 'sleep on two levels' : 'fail on the headroom for two levels'}`, () => {
      const b = on(t.id, four);
      const r = generateProposals(b);
      assertSound(b, r);
      if (clear >= TWO_LEVELS) {
        expect(r.ok).toBe(true);
        for (const p of r.proposals) {
          const report = runChecks(p.doc);
          // Two sleeping places, one over the other, each with its way out (and the upper its ladder).
          const places = report.findings.filter((f) => f.id === 'sleep.place');
          expect(places.length).toBe(2);
          const tops = places.map((f) => f.measured!).sort((x, y) => x - y);
          expect(tops[1] - tops[0]).toBeGreaterThan(150);
          expect(report.findings.filter((f) => f.id === 'egress.sleep').map((f) => f.status)).toEqual(['pass', 'pass']);
          expect(p.doc.modules.some((m) => m.kind === 'step' && m.arrangements.includes('sleep'))).toBe(true);
        }
      } else {
        expect(r.ok).toBe(false);
        const head = r.reasons.find((x) => x.rule === 'sitting headroom on two levels');
        expect(head).toBeDefined();
        expect(head!.measured).toBe(clear);
        expect(head!.required).toBe(TWO_LEVELS);
        expect(head!.message).toContain(`${clear} mm`);
        expect(head!.message).toContain(`${TWO_LEVELS} mm`);
      }
    });
  }

  it('a bunk over a bed across, for four sleepers short enough to sleep across', () => {
    // Across the 1728 mm lined width: 1600 + 100 mm allowance = 1700 mm ≤ 1728 mm.
    const b = on('l4h3', { ...four, bed: 'across', sleepers: [1600, 1550, 1400, 1300] });
    const r = generateProposals(b);
    expect(r.ok).toBe(true);
    assertSound(b, r);
    for (const p of r.proposals) {
      const beds = p.doc.modules.filter((m) => m.kind === 'bed-platform');
      expect(beds.length).toBe(2);
      const [low, high] = [...beds].sort((x, y) => x.elevation - y.elevation);
      // Upper underside 750 mm over the lower mattress top (bed 300 mm up + 200 mm platform and mattress = 500 mm).
      expect(high.elevation - (low.elevation + low.height)).toBe(750);
      // 2200 mm clear − (1250 + 150) mm upper top = 800 mm over the bunk.
      expect(2200 - (high.elevation + high.height)).toBeGreaterThanOrEqual(750);
    }
  });

  it('two sleepers are never given a second level', () => {
    const r = generateProposals(on('l4h3'));
    expect(r.proposals.every((p) => p.doc.modules.every((m) => m.kind !== 'step'))).toBe(true);
  });
});
