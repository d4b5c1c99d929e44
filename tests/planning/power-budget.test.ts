import { describe, expect, it } from 'vitest';
import { autonomyDays, batteryAhFor, powerBudget, pvwattsLosses, PVWATTS_DEFAULT_LOSS_PARTS, PVWATTS_DEFAULT_LOSSES_PCT, solarDailyWh, usableWh, loadPreset } from '@/lib/planning';
import { baseDoc, withModules, withSystems } from './fixtures';

describe('solar yield', () => {
  // NREL/TP-6A20-62641 (PVWatts Version 5 Manual; secondary): 1 − 0.98 × 0.97 × 1 × 0.98 × 0.98 ×
  // 0.995 × 0.985 × 0.99 × 1 × 0.97 = 0.140757, i.e. 14.08 %, worked by hand.
  it('default losses multiply to 14.08 % (NREL/TP-6A20-62641, secondary)', () => {
    expect(pvwattsLosses()).toBeCloseTo(14.08, 2);
    expect(PVWATTS_DEFAULT_LOSSES_PCT).toBeCloseTo(14.0757, 3);
  });
  it('combines losses multiplicatively, not by adding them', () => {
    const added = Object.values(PVWATTS_DEFAULT_LOSS_PARTS).reduce((a, b) => a + b, 0);
    expect(added).toBe(15);
    expect(pvwattsLosses({ ...PVWATTS_DEFAULT_LOSS_PARTS, soiling: 0, shading: 0, mismatch: 0, wiring: 0, connections: 0, lid: 0, nameplateRating: 0, availability: 50 })).toBeCloseTo(50, 9);
  });
  it('daily yield: 300 W × 5 h × (1 − 14.08 %) ≈ 1288.9 Wh', () => {
    expect(solarDailyWh(300, 5)).toBeCloseTo(1288.87, 1);
  });
  it('rejects out-of-range losses and negative input', () => {
    expect(() => pvwattsLosses({ ...PVWATTS_DEFAULT_LOSS_PARTS, soiling: 120 })).toThrow(/soiling/);
    expect(() => solarDailyWh(-1, 5)).toThrow(/watts/);
  });
});

describe('battery sizing', () => {
  it('500 Wh/day over 2 days needs 97.7 Ah of LiFePO4 at 80 % and 12.8 V', () => {
    expect(batteryAhFor({ dailyWh: 500, days: 2, usableDodPct: 80, volts: 12.8 })).toBeCloseTo(97.66, 2);
  });
  it('… or 166.7 Ah of lead-acid at 50 % and 12 V', () => {
    expect(batteryAhFor({ dailyWh: 500, days: 2, usableDodPct: 50, volts: 12 })).toBeCloseTo(166.67, 2);
  });
  it('usable energy and autonomy', () => {
    expect(usableWh(190, 12, 50)).toBe(1140);
    expect(autonomyDays(1140, 356.4)).toBeCloseTo(3.2, 2);
    expect(autonomyDays(1000, 0)).toBe(Infinity);
    expect(() => batteryAhFor({ dailyWh: 500, days: 2, usableDodPct: 0, volts: 12 })).toThrow(/depth of discharge/);
  });
});

describe('powerBudget', () => {
  // A practising builder's system (common practice): 190 Ah 12 V battery (AGM assumed), 300 W of
  // solar, running a 49 L compressor fridge (kind default 45 W at a third duty cycle). Peak sun
  // hours are our invented mid-latitude figures: summer 5, spring/autumn 3, winter 1.
  const builder = withSystems(
    withModules(baseDoc(), [{ id: 'fridge', kind: 'fridge', props: { litres: 49, watts: 45, dutyCycle: 0.33 } }]),
    { power: { battery: { chemistry: 'agm', capacityAh: 190, volts: 12 }, solar: { watts: 300, peakSunHours: { summer: 5, shoulder: 3, winter: 1 } } } },
  );

  it("the builder's system: fridge 356.4 Wh/day, 1140 Wh usable, 3.2 days without sun", () => {
    const b = powerBudget(builder);
    expect(b.dailyUseWh).toBeCloseTo(45 * 0.33 * 24, 6);
    expect(b.battery!.usableWh).toBe(1140);
    expect(b.autonomyDays).toBeCloseTo(3.2, 1);
  });

  it("the builder's system balance, worked by hand: +739.1 Wh in summer, +300.9 Wh in spring/autumn, −137.3 Wh in winter", () => {
    // Solar: 300 W × 5 h × (1 − 0.140757) = 1288.87 Wh (losses: NREL/TP-6A20-62641, secondary);
    // into an AGM battery at 85 % charge efficiency (common practice, no source) = 1095.54 Wh;
    // less the fridge's 45 W × 0.33 × 24 h = 356.4 Wh → +739.14 Wh. Winter: 300 × 1 h × 0.859243
    // × 0.85 = 219.11 Wh → −137.29 Wh; the usable 190 Ah × 12 V × 50 % = 1140 Wh lasts
    // 1140 ÷ 137.29 = 8.30 days.
    const b = powerBudget(builder);
    const [summer, shoulder, winter] = b.seasons;
    expect(summer.chargeWh).toBeCloseTo(1095.54, 1);
    expect(summer.netWh).toBeCloseTo(739.14, 1);
    expect(shoulder.netWh).toBeCloseTo(300.92, 1);
    expect(winter.chargeWh).toBeCloseTo(219.11, 1);
    expect(winter.netWh).toBeCloseTo(-137.29, 1);
    expect(winter.daysToEmpty).toBeCloseTo(8.30, 2);
  });

  it('counts entered loads, AC loads through the inverter, alternator and hook-up charging', () => {
    const doc = withSystems(baseDoc(), {
      power: {
        battery: { chemistry: 'lifepo4', capacityAh: 100, volts: 12.8 },
        loads: [
          { id: 'lights', ...loadPreset('led-lights')!.load },
          { id: 'kettle', label: 'Laptop charger on 230 V', watts: 90, hoursPerDay: 2, supply: 'ac' },
        ],
        alternator: { amps: 30, drivingHoursPerDay: 1 },
        hookup: { chargerAmps: 10, hoursPerDay: 2 },
        inverterEfficiencyPct: 90,
      },
    });
    const b = powerBudget(doc);
    // Worked by hand: lights 12 W × 4 h = 48 Wh; the 230 V laptop 90 W × 2 h ÷ 0.90 inverter
    // efficiency (common practice, no source) = 200 Wh; 248 Wh in all. Alternator 30 A × 1 h ×
    // 12.8 V = 384 Wh, hook-up 10 A × 2 h × 12.8 V = 256 Wh, together 640 Wh × 0.95 (LiFePO4 charge
    // efficiency, common practice, no source) = 608 Wh. Two days of 248 Wh at 80 % of 12.8 V:
    // 496 ÷ 10.24 = 48.44 Ah.
    expect(b.dailyUseWh).toBeCloseTo(248, 9);
    expect(b.alternatorWh).toBeCloseTo(384, 9);
    expect(b.hookupWh).toBeCloseTo(256, 9);
    expect(b.seasons[0].chargeWh).toBeCloseTo(608, 9);
    expect(b.requiredAh).toBeCloseTo(48.4375, 4);
  });

  it('says what is missing without a battery or any charging', () => {
    const b = powerBudget(baseDoc());
    expect(b.battery).toBeNull();
    expect(b.missing.map((n) => n.label)).toEqual(['Battery capacity and nominal volts', 'Solar panels, alternator charger or hook-up charger']);
    expect(b.missing.every((n) => n.where === 'power')).toBe(true);
  });
});
