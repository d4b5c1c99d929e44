import { describe, expect, it } from 'vitest';
import { conductivityOf, en721Ventilation, gasInventory, heatLoss, lockerVentRequiredCm2, RSE, RSI, uValue, waterPlan } from '@/lib/planning';
import { baseDoc, withModules, withSystems } from './fixtures';

describe('waterPlan', () => {
  it('sums tanks, counts sleepers and days at the chosen use', () => {
    const doc = withSystems(withModules(baseDoc(), [
      { id: 'f1', kind: 'fresh-water-tank', props: { litres: 45 } },
      { id: 'f2', kind: 'fresh-water-tank', props: { litres: 25 } },
      { id: 'g', kind: 'grey-water-tank', props: { litres: 40 } },
    ]), { water: { litresPerPersonPerDay: 7 } });
    const w = waterPlan(doc);
    expect(w.freshL).toBe(70);
    expect(w.greyL).toBe(40);
    expect(w.persons).toBe(2); // emptyLayout has two sleepers
    expect(w.days).toBeCloseTo(5, 9);
    expect(w.nzsMinimumL).toBe(24); // NZS 5465: 4 L × 3 days × 2 people
    expect(w.freshFullKg).toBe(70);
  });
});

describe('gas and ventilation', () => {
  it('locker vent: at least 2 % of the floor and at least 100 cm² (DVGW G 607 / EN 1949 as cited)', () => {
    expect(lockerVentRequiredCm2(1600)).toBe(100); // 400 × 400 mm locker: 32 cm², so 100 governs
    expect(lockerVentRequiredCm2(8000)).toBe(160);
    expect(() => lockerVentRequiredCm2(-1)).toThrow(/floor area/);
  });
  it('EN 721 (as cited): bands by floor area and by flueless appliance', () => {
    expect(en721Ventilation(4.5, true, true)).toMatchObject({ highCm2: 75, lowCm2: 10 });
    expect(en721Ventilation(5.5, true, true)).toMatchObject({ highCm2: 100, lowCm2: 15 });
    expect(en721Ventilation(5.5, false, true)).toMatchObject({ highCm2: 15, lowCm2: 5 });
    expect(en721Ventilation(5.5, false, false)).toMatchObject({ highCm2: 30, lowCm2: 5 });
    expect(en721Ventilation(12, true, true)).toBeNull();
  });
  it('a hob burns gas unless its fuel says otherwise; a heater only when fuel is gas', () => {
    const doc = withModules(baseDoc(), [
      { id: 'hob', kind: 'hob' },
      { id: 'ind', kind: 'hob', props: { fuel: 'induction' } },
      { id: 'heat', kind: 'heater' },
      { id: 'locker', kind: 'gas-locker', props: { cylinders: 2, cylinderKg: 6 } },
    ]);
    const inv = gasInventory(doc);
    expect(inv.appliances.map((a) => a.moduleId)).toEqual(['hob']);
    expect(inv.cylinders).toBe(2);
    expect(inv.gasKg).toBe(12);
    expect(gasInventory(baseDoc()).present).toBe(false);
  });
});

describe('U-values and heat loss', () => {
  it('U of the default wall build-up, worked by hand (EN ISO 6946)', () => {
    // Closed-cell foam 24 mm at λ 0.036 → 0.6667; plywood 12 mm at λ 0.13 → 0.0923;
    // Rsi 0.13 + Rse 0.04 → R 0.9290 m²K/W → U 1.076 W/m²K.
    const u = uValue([{ material: 'Closed-cell foam', thickness: 24 }, { material: 'Plywood lining', thickness: 12 }], 'walls');
    expect(u.rTotal).toBeCloseTo(0.13 + 0.04 + 0.024 / 0.036 + 0.012 / 0.13, 9);
    expect(u.u).toBeCloseTo(1.076, 3);
    expect(u.unknown).toEqual([]);
  });
  it('surface resistances by direction of heat flow (EN ISO 6946 Table 7, from memory)', () => {
    expect(RSI).toEqual({ roof: 0.1, walls: 0.13, floor: 0.17 });
    expect(RSE).toBe(0.04);
    expect(uValue([], 'floor').u).toBeCloseTo(1 / 0.21, 9);
  });
  it('matches materials by name, declared overrides win, unknown materials are named', () => {
    expect(conductivityOf('XPS foam board')!.lambda).toBe(0.034);
    expect(conductivityOf('Vinyl flooring')!.lambda).toBe(0.17);
    expect(conductivityOf('Plywood')!.lambda).toBe(0.13);
    expect(conductivityOf('Wonderfoam', { wonderfoam: 0.03 })!.lambda).toBe(0.03);
    expect(conductivityOf('Wonderfoam')).toBeNull();
    const u = uValue([{ material: 'Wonderfoam', thickness: 30 }], 'roof');
    expect(u.unknown).toEqual(['Wonderfoam']);
  });
  it('heat loss: faces × U + windows + air change, and the heat needed at ΔT', () => {
    const doc = withSystems(withModules(baseDoc(), [{ id: 'h', kind: 'heater', props: { watts: 2000 } }]), {
      insulation: { deltaK: 25, airChangesPerHour: 1.5, windows: [{ id: 'w', face: 'walls', areaM2: 0.5, uValue: 2.8 }] },
    });
    const h = heatLoss(doc);
    const L = 3.1, W = 1.77, H = 1.95;
    const walls = h.faces.find((f) => f.face === 'walls')!;
    expect(walls.areaM2).toBeCloseTo(2 * L * H + 2 * W * H - 0.5, 9);
    expect(h.windowsWPerK).toBeCloseTo(1.4, 9);
    expect(h.ventilationWPerK).toBeCloseTo(0.34 * 1.5 * L * W * H, 9);
    const facesSum = h.faces.reduce((a, f) => a + f.u * f.areaM2, 0);
    expect(h.totalWPerK).toBeCloseTo(facesSum + 1.4 + 0.34 * 1.5 * L * W * H, 9);
    expect(h.requiredW).toBeCloseTo(h.totalWPerK * 25, 9);
    expect(h.heaterW).toBe(2000);
  });
});
