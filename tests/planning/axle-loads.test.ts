import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { computeAxleLoads, leverSplit, leverPosition } from '@/lib/planning';
import { baseDoc, VAN, withModules, withSystems } from './fixtures';

describe('leverSplit (moments about the front axle)', () => {
  it('hand-worked lever case: 100 kg at 2.8 m behind the front axle, wheelbase 3.665 m → rear 76.40 kg, front 23.60 kg', () => {
    const s = leverSplit(100, 2800, 3665);
    expect(s.rearKg).toBeCloseTo(76.4, 2);
    expect(s.frontKg).toBeCloseTo(23.6, 2);
  });

  it('hand-worked case behind the rear axle: 30 kg at 4.5 m lightens the front by 6.83 kg', () => {
    const s = leverSplit(30, 4500, 3665);
    expect(s.frontKg).toBeCloseTo(-6.83, 2);
    expect(s.rearKg).toBeCloseTo(36.83, 2);
  });

  it('a load ahead of the front axle lightens the rear', () => {
    expect(leverSplit(50, -500, 3665).rearKg).toBeLessThan(0);
    expect(leverSplit(50, -500, 3665).frontKg).toBeGreaterThan(50);
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
    // Centre of mass: 950/2200 of the 3700 mm wheelbase behind the front axle at −800 mm:
    // 0.431818 × 3700 = 1597.73 mm, so x = 797.73 mm.
    expect(r.centreOfMass!.x).toBeCloseTo(797.73, 2);
  });

  it('adds a module by the lever rule, its own massKg overriding the kind default', () => {
    // A 100 kg module centred 2.8 m behind the front axle (centre x = 2000, axle at −800), wheelbase
    // 3.7 m: rear 100 × 2.8 / 3.7 = 75.68 kg, front 24.32 kg (lever rule, statics).
    const doc = withSystems(withModules(baseDoc(), [{ id: 'box', kind: 'drawer-unit', x: 1750, length: 500, massKg: 100 }]), { vehicle: VAN, load: { personalEffectsKg: 0, travellers: 1 } });
    const r = computeAxleLoads(doc);
    expect(r.axles!.rearKg - 950).toBeCloseTo(75.68, 2);
    expect(r.axles!.frontKg - 1250).toBeCloseTo(24.32, 2);
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
    // EN 1646-2 (secondary): 3 persons, 6.0 m overall → 10 × 3 + 10 × 6 = 90 kg of effects.
    const doc = withSystems(withModules(baseDoc(), [{ id: 's1', kind: 'seat', x: 300, massKg: 30 }]), { vehicle: VAN });
    const r = computeAxleLoads(doc);
    expect(r.seats).toBe(3); // two cab seats + one belted travel seat
    expect(r.items.filter((i) => i.group === 'occupant')).toHaveLength(2);
    expect(r.items.find((i) => i.group === 'effects')!.massKg).toBe(90);
    expect(r.totalKg).toBe(2200 + 30 + 150 + 90);
    expect(r.builtKg).toBe(2230);
  });

  it('counts every declared person: 4 seats, 2 cab seats, no seat drawn → 3 passengers, laden 2425 kg, and says where they were put', () => {
    // Worked by hand: 2200 kg in running order (driver included) + 3 × 75 kg = 2425 kg (75 kg a
    // person: Reg. (EU) No 1230/2012 Annex I Part A 2.6.2.1, from memory). Counting one passenger
    // gave 2275 kg.
    const doc = withSystems(baseDoc(), { vehicle: { ...VAN, seats: 4 }, load: { personalEffectsKg: 0 } });
    const r = computeAxleLoads(doc);
    expect(r.items.filter((i) => i.group === 'occupant')).toHaveLength(3);
    expect(r.totalKg).toBe(2425);
    expect(r.assumptions.join(' ')).toMatch(/2 passengers have no seat drawn and are placed at the cab row/);
    // Cab row at x = −300 (cabSeatX), 500 mm behind the front axle at −800, wheelbase 3700 mm:
    // each 75 kg puts 75 × 500 / 3700 = 10.135 kg on the rear axle, 64.865 kg on the front.
    expect(r.axles!.frontKg).toBeCloseTo(1250 + 3 * 64.865, 2);
    expect(r.axles!.rearKg).toBeCloseTo(950 + 3 * 10.135, 2);
  });

  it('a bike rack behind the rear axle lightens the front axle', () => {
    const without = computeAxleLoads(withSystems(baseDoc(), { vehicle: VAN, load: { personalEffectsKg: 0, travellers: 1 } }));
    const withRack = computeAxleLoads(withSystems(baseDoc(), { vehicle: VAN, load: { personalEffectsKg: 0, travellers: 1, items: [{ id: 'bikes', label: 'Two bikes on rack', massKg: 30, x: 3700 }] } }));
    // 30 kg at 4.5 m behind the front axle (x = 3700, axle at −800), wheelbase 3.7 m:
    // rear 30 × 4.5 / 3.7 = 36.49 kg, front 30 − 36.49 = −6.49 kg.
    expect(withRack.axles!.frontKg - without.axles!.frontKg).toBeCloseTo(-6.49, 2);
  });

  it('names what is missing instead of failing when vehicle data is absent', () => {
    const r = computeAxleLoads(baseDoc());
    expect(r.axles).toBeNull();
    expect(r.centreOfMass).toBeNull();
    expect(r.missing.map((n) => n.label)).toEqual(expect.arrayContaining(['Wheelbase', 'Front axle position', 'Mass in running order']));
    expect(r.missing.every((n) => n.where === 'weight')).toBe(true);
  });

  it('property: moving any one mass along x changes the two axle loads by equal and opposite amounts, and their sum never changes', () => {
    fc.assert(fc.property(
      fc.array(fc.record({ x: fc.integer({ min: 0, max: 2600 }), massKg: fc.double({ min: 0, max: 300, noNaN: true }) }), { minLength: 1, maxLength: 8 }),
      fc.nat(),
      fc.integer({ min: -3000, max: 8000 }),
      (mods, pick, dx) => {
        const k = pick % mods.length;
        const build = (shift: number) => computeAxleLoads(withSystems(
          withModules(baseDoc(), mods.map((m, i) => ({ id: `m${i}`, kind: 'drawer-unit', x: m.x + (i === k ? shift : 0), massKg: m.massKg }))),
          { vehicle: VAN, load: { personalEffectsKg: 0, travellers: 1 } },
        ));
        const before = build(0);
        const after = build(dx);
        const dFront = after.axles!.frontKg - before.axles!.frontKg;
        const dRear = after.axles!.rearKg - before.axles!.rearKg;
        expect(dFront + dRear).toBeCloseTo(0, 6);
        expect(after.totalKg).toBeCloseTo(before.totalKg, 9);
        // And by the lever rule: moving m by dx moves m·dx/wheelbase from front to rear.
        expect(dRear).toBeCloseTo((mods[k].massKg * dx) / VAN.wheelbaseMm, 6);
      },
    ), { numRuns: 60 });
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
