import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { computeAxleLoads, leverSplit, leverPosition } from '@/lib/planning';
import { baseDoc, VAN, withModules, withSystems } from './fixtures';

describe('leverSplit (moments about the front axle)', () => {
  it('hand-worked lever case: 100 kg at 2.8 m behind the front axle, wheelbase 3.7 m → rear 2800/3700 × 100 = 75.68 kg, front 24.32 kg', () => {
    const s = leverSplit(100, 2800, 3700);
    expect(s.rearKg).toBeCloseTo(75.68, 2);
    expect(s.frontKg).toBeCloseTo(24.32, 2);
  });

  it('hand-worked case behind the rear axle: 30 kg at 4.5 m lightens the front by 30 × 4500/3700 − 30 = 6.49 kg', () => {
    const s = leverSplit(30, 4500, 3700);
    expect(s.frontKg).toBeCloseTo(-6.49, 2);
    expect(s.rearKg).toBeCloseTo(36.49, 2);
  });

  it('a load ahead of the front axle lightens the rear', () => {
    expect(leverSplit(50, -500, 3700).rearKg).toBeLessThan(0);
    expect(leverSplit(50, -500, 3700).frontKg).toBeGreaterThan(50);
  });

  it('rejects a zero wheelbase and non-finite input with a clear error', () => {
    expect(() => leverSplit(10, 100, 0)).toThrow(/wheelbase/);
    expect(() => leverSplit(Number.NaN, 100, 3000)).toThrow(/finite/);
    expect(() => leverPosition(0, 0, 3000)).toThrow(/positive/);
  });

  it('property: front + rear = total, always', () => {
    fc.assert(fc.property(
      fc.double({ min: 0, max: 5000, noNaN: true }),
      fc.double({ min: -5000, max: 12000, noNaN: true }),
      fc.double({ min: 1000, max: 8000, noNaN: true }),
      (m, d, wb) => {
        const s = leverSplit(m, d, wb);
        expect(s.frontKg + s.rearKg).toBeCloseTo(m, 6);
      },
    ));
  });
});

describe('computeAxleLoads', () => {
  it('places the base vehicle from its axle split and returns that split with nothing aboard', () => {
    const doc = withSystems(baseDoc(), { vehicle: VAN, load: { personalEffectsKg: 0, travellers: 1 } });
    const r = computeAxleLoads(doc);
    expect(r.totalKg).toBeCloseTo(2200, 6);
    expect(r.axles!.frontKg).toBeCloseTo(1250, 6);
    expect(r.axles!.rearKg).toBeCloseTo(950, 6);
    // Centre of mass: 950/2200 of the wheelbase behind the front axle.
    expect(r.centreOfMass!.x).toBeCloseTo(-800 + (950 / 2200) * 3700, 6);
  });

  it('adds a module by the lever rule, its own massKg overriding the kind default', () => {
    // A 100 kg module centred 2.8 m behind the front axle: centre x = 2000, front axle at −800.
    const doc = withSystems(withModules(baseDoc(), [{ id: 'box', kind: 'drawer-unit', x: 1750, length: 500, massKg: 100 }]), { vehicle: VAN, load: { personalEffectsKg: 0, travellers: 1 } });
    const r = computeAxleLoads(doc);
    expect(r.axles!.rearKg - 950).toBeCloseTo(75.68, 1);
    expect(r.axles!.frontKg - 1250).toBeCloseTo(24.32, 1);
    const item = r.items.find((i) => i.id === 'module:box')!;
    expect(item.massKg).toBe(100);
  });

  it('uses the kind default mass when the module has none, and counts fresh water full and grey empty by default', () => {
    const doc = withSystems(withModules(baseDoc(), [
      { id: 'f', kind: 'fresh-water-tank', props: { litres: 70 } },
      { id: 'g', kind: 'grey-water-tank', props: { litres: 50 } },
    ]), { vehicle: VAN, load: { personalEffectsKg: 0, travellers: 1 } });
    const r = computeAxleLoads(doc);
    expect(r.items.find((i) => i.id === 'module:f')!.massKg).toBe(6); // kinds.ts default
    expect(r.items.find((i) => i.id === 'water:f')!.massKg).toBe(70);
    expect(r.items.find((i) => i.id === 'water:g')).toBeUndefined();
    expect(r.totalKg).toBeCloseTo(2200 + 6 + 5 + 70, 6);
  });

  it('seats passengers at 75 kg (driver already in running order) and adds EN 1646-2 personal effects by default', () => {
    const doc = withSystems(withModules(baseDoc(), [{ id: 's1', kind: 'seat', x: 300, massKg: 30 }]), { vehicle: VAN });
    const r = computeAxleLoads(doc);
    expect(r.seats).toBe(3); // two cab seats + one belted travel seat
    expect(r.items.filter((i) => i.group === 'occupant')).toHaveLength(2);
    const effects = r.items.find((i) => i.group === 'effects')!;
    expect(effects.massKg).toBeCloseTo(10 * 3 + 10 * 6.0 + 30, 6);
    expect(r.totalKg).toBeCloseTo(2200 + 30 + 150 + effects.massKg, 6);
    expect(r.builtKg).toBeCloseTo(2230, 6);
  });

  it('a bike rack behind the rear axle lightens the front axle', () => {
    const without = computeAxleLoads(withSystems(baseDoc(), { vehicle: VAN, load: { personalEffectsKg: 0, travellers: 1 } }));
    const withRack = computeAxleLoads(withSystems(baseDoc(), { vehicle: VAN, load: { personalEffectsKg: 0, travellers: 1, items: [{ id: 'bikes', label: 'Two bikes on rack', massKg: 30, x: 3700 }] } }));
    // 30 kg at 4.5 m behind the front axle (x = 3700, axle at −800), wheelbase 3.7 m: front −6.49 kg.
    expect(withRack.axles!.frontKg - without.axles!.frontKg).toBeCloseTo(-6.49, 2);
  });

  it('names what is missing instead of failing when vehicle data is absent', () => {
    const r = computeAxleLoads(baseDoc());
    expect(r.axles).toBeNull();
    expect(r.centreOfMass).toBeNull();
    expect(r.missing).toEqual(expect.arrayContaining(['systems.vehicle.wheelbaseMm', 'systems.vehicle.frontAxleX', 'systems.vehicle.massInRunningOrderKg']));
  });

  it('property: front + rear = total for any set of modules and payload', () => {
    fc.assert(fc.property(
      fc.array(fc.record({ x: fc.integer({ min: 0, max: 2600 }), massKg: fc.double({ min: 0, max: 300, noNaN: true }) }), { maxLength: 12 }),
      fc.array(fc.record({ x: fc.integer({ min: -3000, max: 8000 }), massKg: fc.double({ min: 0, max: 200, noNaN: true }) }), { maxLength: 4 }),
      (mods, items) => {
        const doc = withSystems(
          withModules(baseDoc(), mods.map((m, i) => ({ id: `m${i}`, kind: 'drawer-unit', x: m.x, massKg: m.massKg }))),
          { vehicle: VAN, load: { items: items.map((p, i) => ({ id: `p${i}`, label: 'load', massKg: p.massKg, x: p.x })) } },
        );
        const r = computeAxleLoads(doc);
        expect(r.axles!.frontKg + r.axles!.rearKg).toBeCloseTo(r.totalKg, 6);
      },
    ), { numRuns: 60 });
  });
});
