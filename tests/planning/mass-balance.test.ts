// The mass-and-balance table, worked by hand with the lever rule (statics: moments about the front
// axle) on our invented round-figure van (tests/planning/fixtures.ts): 2200 kg in running order,
// 1250 kg of it on the front axle, wheelbase 3700 mm, front axle 800 mm ahead of the load floor.
// 75 kg a passenger: Reg. (EU) No 1230/2012 Annex I Part A 2.6.2.1 (from memory).
import { describe, expect, it } from 'vitest';
import { massBalance } from '@/lib/planning';
import { baseDoc, VAN, withModules, withSystems } from './fixtures';

describe('massBalance', () => {
  const doc = withSystems(
    withModules(baseDoc(), [
      { id: 'k1', kind: 'kitchen-counter', x: 0, length: 1000, massKg: 40 }, // centre x 500: 1300 mm behind the axle
      { id: 'k2', kind: 'kitchen-counter', x: 1000, length: 1000, massKg: 40 }, // centre x 1500: 2300 mm
      { id: 't', kind: 'fresh-water-tank', x: 2500, length: 400, massKg: 5, props: { litres: 50 } }, // centre 2700: 3500 mm
    ]),
    { vehicle: VAN, load: { travellers: 2, personalEffectsKg: 0, freshFillPct: 50, items: [{ id: 'bikes', label: 'Two bikes on a rack', massKg: 30, x: 3700 }] } },
  );
  const b = massBalance(doc);
  const row = (label: string | RegExp) => b.rows.find((r) => (typeof label === 'string' ? r.label === label : label.test(r.label)))!;

  it('one row per group: vehicle, each kind of module, passengers, water, each payload item', () => {
    expect(b.rows.map((r) => r.label)).toEqual([
      'Vehicle in running order (driver included)',
      'Kitchen counter × 2',
      'Fresh water tank',
      'Passengers, 1 × 75 kg',
      'Water (fresh 50 % full, grey 0 %)',
      'Two bikes on a rack',
    ]);
  });
  it('splits each row by the lever rule', () => {
    expect(row('Vehicle in running order (driver included)')).toMatchObject({ kg: 2200, frontKg: 1250, rearKg: 950 });
    // Counters: 40 × 1300/3700 = 14.054 and 40 × 2300/3700 = 24.865 on the rear → 38.919 rear, 41.081 front.
    const counters = row('Kitchen counter × 2');
    expect(counters.kg).toBe(80);
    expect(counters.rearKg).toBeCloseTo(38.919, 3);
    expect(counters.frontKg).toBeCloseTo(41.081, 3);
    // Water: 50 L × 50 % = 25 kg at 3500 mm: rear 25 × 3500/3700 = 23.649.
    expect(row(/^Water/)).toMatchObject({ kg: 25 });
    expect(row(/^Water/).rearKg).toBeCloseTo(23.649, 3);
    // Cab passenger at x −300 (500 mm behind the axle): rear 75 × 500/3700 = 10.135.
    expect(row(/^Passengers/).rearKg).toBeCloseTo(10.135, 3);
    // Bikes 30 kg at 4500 mm behind the axle: rear 36.486, front −6.486 (they lift the front).
    expect(row('Two bikes on a rack').frontKg).toBeCloseTo(-6.486, 3);
  });
  it('totals, limits and payload left per column', () => {
    // 2200 + 80 + 5 + 75 + 25 + 30 = 2415 kg laden, 1085 kg left of 3500 kg.
    expect(b.total.kg).toBe(2415);
    expect(b.limits).toEqual({ kg: 3500, frontKg: 1850, rearKg: 2000 });
    expect(b.left.kg).toBe(1085);
    expect(b.left.frontKg! + b.left.rearKg!).toBeCloseTo(1850 + 2000 - 2415, 9);
    expect(b.total.frontKg! + b.total.rearKg!).toBeCloseTo(2415, 9);
  });
  it('without the axle geometry the rows stand, unsplit, and nothing is invented', () => {
    const plain = massBalance(withModules(baseDoc(), [{ id: 'k', kind: 'kitchen-counter', massKg: 40 }]));
    expect(plain.split).toBe(false);
    expect(plain.rows.every((r) => r.frontKg === null && r.rearKg === null)).toBe(true);
    expect(plain.left).toEqual({ kg: null, frontKg: null, rearKg: null });
  });
});
