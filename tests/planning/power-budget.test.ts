import { describe, expect, it } from 'vitest';
import { autonomyDays, batteryAhFor, powerBudget, pvwattsLosses, PVWATTS_DEFAULT_LOSS_PARTS, PVWATTS_DEFAULT_LOSSES_PCT, solarDailyWh, usableWh, loadPreset } from '@/lib/planning';
import { baseDoc, withModules, withSystems } from './fixtures';

describe('solar yield', () => {
  it('PVWatts default losses multiply to 14.08 % (pvlib pvwatts_losses formula)', () => {
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

  it("the builder's system balance: surplus in summer and spring/autumn, a deficit in winter", () => {
    const b = powerBudget(builder);
    const [summer, shoulder, winter] = b.seasons;
    const yieldAt = (psh: number) => 300 * psh * (1 - PVWATTS_DEFAULT_LOSSES_PCT / 100) * 0.85;
    expect(summer.chargeWh).toBeCloseTo(yieldAt(5), 6);
    expect(summer.netWh).toBeCloseTo(yieldAt(5) - 356.4, 6); // ≈ +739 Wh
    expect(shoulder.netWh).toBeGreaterThan(0); // ≈ +301 Wh
    expect(winter.netWh).toBeCloseTo(yieldAt(1) - 356.4, 6); // ≈ −137 Wh
    expect(winter.netWh).toBeLessThan(0);
    expect(winter.daysToEmpty).toBeCloseTo(1140 / (356.4 - yieldAt(1)), 6); // ≈ 8.3 days
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
    expect(b.dailyUseWh).toBeCloseTo(12 * 4 + (90 * 2) / 0.9, 6);
    expect(b.alternatorWh).toBeCloseTo(30 * 12.8, 6);
    expect(b.hookupWh).toBeCloseTo(20 * 12.8, 6);
    expect(b.seasons[0].chargeWh).toBeCloseTo((384 + 256) * 0.95, 6);
    expect(b.requiredAh).toBeCloseTo((248 * 2) / (0.8 * 12.8), 6);
  });

  it('says what is missing without a battery or any charging', () => {
    const b = powerBudget(baseDoc());
    expect(b.battery).toBeNull();
    expect(b.missing).toEqual(expect.arrayContaining(['systems.power.battery']));
    expect(b.missing.some((m) => m.includes('solar'))).toBe(true);
  });
});
