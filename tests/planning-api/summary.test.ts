// The build-planning summary for the plan sheet: numbers agree with the planning functions,
// lines carry units, and missing inputs are named rather than guessed.
import { describe, expect, it } from 'vitest';
import { starterLayout, emptyLayout, bayTemplate } from '@/lib/layout';
import { buildPlanSummary } from '@/lib/planning/summary';
import { computeAxleLoads, powerBudget, waterPlan } from '@/lib/planning';

describe('buildPlanSummary', () => {
  it('agrees with the planning functions on the rear-bed starter', () => {
    const doc = starterLayout('starter-rear-bed')!;
    const s = buildPlanSummary(doc);
    const m = computeAxleLoads(doc);
    expect(s.mass.totalKg).toBeCloseTo(m.totalKg, 6);
    expect(s.mass.frontKg! + s.mass.rearKg!).toBeCloseTo(m.totalKg, 6);
    expect(s.mass.payloadLeftKg).toBeCloseTo(3500 - m.builtKg, 6);
    expect(s.power.dailyUseWh).toBeCloseTo(powerBudget(doc).dailyUseWh, 6);
    expect(s.power.seasons).toHaveLength(3);
    expect(s.water.freshL).toBe(waterPlan(doc).freshL);
    expect(s.lines.map((l) => l.topic)).toEqual(['Mass', 'Axles', 'Payload', 'Power', 'Water']);
    expect(s.lines.find((l) => l.topic === 'Mass')!.text).toMatch(/^Laden [\d,]+ kg of 3,500 kg maximum authorised mass/);
    expect(s.lines.find((l) => l.topic === 'Water')!.text).toMatch(/Fresh 68\.0 L, grey 68\.9 L \(from the drawn tank size, less a 5 mm wall\); 4\.3 days at 8 L per person a day for 2/);
    // By hand: fresh 700 × 350 × 300 less a 5 mm wall = 690 × 340 × 290 mm = 68.034 L; grey 550 × 450 × 300 → 540 × 440 × 290 = 68.904 L;
    // 68.034 L ÷ (2 × 8 L a day) = 4.25 days.
    for (const l of s.lines) expect(l.text).toMatch(/\d+(\.\d)? ?(kg|Wh|L|days)|need|enter|No water/);
  });

  it('marks an axle over its limit', () => {
    const doc = starterLayout('starter-rear-bed')!;
    const over = { ...doc, systems: { ...doc.systems, vehicle: { ...doc.systems!.vehicle, maxRearAxleKg: 900 } } };
    expect(buildPlanSummary(over).lines.find((l) => l.topic === 'Axles')!.status).toBe('attention');
  });

  it('names what is missing on an empty bay and never invents a balance', () => {
    const doc = emptyLayout('Empty', bayTemplate('l2h2')!.bay);
    const s = buildPlanSummary(doc);
    expect(s.mass.frontKg).toBeNull();
    expect(s.power.seasons).toBeNull();
    expect(s.missing).toEqual(expect.arrayContaining(['Wheelbase', 'Battery capacity and nominal volts']));
    expect(s.lines.every((l) => l.status === 'unknown')).toBe(true);
  });
});

describe('the plan sheet carries the build-plan section', () => {
  it('puts one worded line per topic, with its state, before the checks', async () => {
    const { composeSheet } = await import('@/lib/sheet');
    const doc = starterLayout('starter-rear-bed')!;
    const r = composeSheet({ doc, report: { ok: true, findings: [] }, paper: 'a4', scale: 20, units: 'mm', details: { studio: 'S', client: 'C', layout: 'L', revision: 'A', date: '2025-12-02' } });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const texts = r.sheet.pages.flatMap((p) => p.items.filter((i): i is Extract<typeof i, { type: 'text' }> => i.type === 'text').map((i) => i.text));
    const at = texts.indexOf('Build plan');
    expect(at).toBeGreaterThan(-1);
    expect(texts.indexOf('Checks')).toBeGreaterThan(at);
    for (const topic of ['Mass · + Meets', 'Axles · + Meets', 'Payload · + Meets', 'Power · + Meets', 'Water · + Meets']) expect(texts).toContain(topic);
    expect(texts.join(' ')).toMatch(/Laden [\d,]+ kg of 3,500 kg maximum authorised mass/);
  });
});
