import { describe, expect, it } from 'vitest';
// Sources: NZS 5465 (secondary) for water; DVGW G 607 / EN 1949 and EN 721 (secondary) for gas;
// EN ISO 6946 (surface resistances Table 7, from memory) and typical declared λ (from memory) for heat.
import { CONDUCTIVITIES, conductivityOf, en721Ventilation, gasInventory, heatLoss, lockerVentRequiredCm2, RSE, RSI, uValue, waterPlan } from '@/lib/planning';
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
    expect(u.rTotal).toBeCloseTo(0.9290, 4);
    expect(u.u).toBeCloseTo(1.076, 3);
    expect(u.unknown).toEqual([]);
  });
  it('surface resistances by direction of heat flow (EN ISO 6946 Table 7, from memory)', () => {
    expect(RSI).toEqual({ roof: 0.1, walls: 0.13, floor: 0.17 });
    expect(RSE).toBe(0.04);
    expect(uValue([], 'floor').u).toBeCloseTo(1 / 0.21, 9);
  });
  it.each([
    ['Mineral wool', 'mineral-wool', 0.037], ['Glass wool batt', 'mineral-wool', 0.037], ['Rock wool slab', 'mineral-wool', 0.037], ['Stone wool', 'mineral-wool', 0.037],
    ['Sheep wool', 'sheep-wool', 0.038], ['Wool insulation', 'sheep-wool', 0.038],
    ['PIR board', 'pir', 0.022], ['XPS foam board', 'xps', 0.034], ['EPS', 'eps', 0.036], ['Closed-cell foam', 'elastomer', 0.036],
    ['Polyester fibre', 'polyester', 0.04], ['Cork board', 'cork', 0.04], ['Plywood lining', 'plywood', 0.13], ['MDF panel', 'mdf', 0.14],
    ['Pine cladding', 'softwood', 0.13], ['Vinyl flooring', 'pvc', 0.17], ['Carpet lining', 'carpet', 0.06], ['Rubber mat', 'rubber', 0.17],
    ['Steel skin', 'steel', 50], ['Aluminium sheet', 'aluminium', 160], ['GRP sheet', 'grp', 0.3],
  ])('“%s” resolves to %s at λ %s (specific names before the bare word “wool”)', (name, id, lambda) => {
    const hit = conductivityOf(name)!;
    expect(hit.lambda).toBe(lambda);
    expect(hit.title).toBe(CONDUCTIVITIES.find((c) => c.id === id)!.title);
  });
  it('every match word of the table resolves to its own material (no entry shadows another)', () => {
    for (const c of CONDUCTIVITIES) for (const word of c.match) expect(conductivityOf(word)!.title, word).toBe(c.title);
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
    const L = 3.1, W = 1.8, H = 2.0; // the L2H2 template's bay
    const walls = h.faces.find((f) => f.face === 'walls')!;
    expect(walls.areaM2).toBeCloseTo(2 * L * H + 2 * W * H - 0.5, 9);
    expect(h.windowsWPerK).toBeCloseTo(1.4, 9);
    expect(h.ventilationWPerK).toBeCloseTo(0.34 * 1.5 * L * W * H, 9);
    // Worked by hand (EN ISO 6946; λ XPS 0.034, plywood 0.13, vinyl 0.17, closed-cell foam 0.036):
    // floor R = 0.17 + 0.04 + 0.010/0.034 + 0.012/0.13 + 0.002/0.17 = 0.6082 → U 1.6442 × 5.58 m² = 9.175 W/K;
    // roof R = 0.10 + 0.04 + 0.020/0.036 + 0.006/0.13 = 0.7417 → U 1.3482 × 5.58 m² = 7.523 W/K;
    // walls (2 × 3.1 × 2.0 + 2 × 1.8 × 2.0 − 0.5 = 19.1 m²) R = 0.9290 → U 1.0765 × 19.1 = 20.560 W/K;
    // window 0.5 × 2.8 = 1.4 W/K; air 0.34 × 1.5 × 11.16 m³ = 5.692 W/K. Total 44.350 W/K; × 25 K = 1108.75 W.
    expect(h.faces.find((f) => f.face === 'floor')!.wPerK).toBeCloseTo(9.175, 3);
    expect(h.faces.find((f) => f.face === 'roof')!.wPerK).toBeCloseTo(7.523, 3);
    expect(walls.wPerK).toBeCloseTo(20.560, 3);
    expect(h.totalWPerK).toBeCloseTo(44.350, 3);
    expect(h.requiredW).toBeCloseTo(1108.75, 2);
    expect(h.heaterW).toBe(2000);
  });
});
