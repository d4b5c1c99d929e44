// The array the power budget counts (lib/planning/solar-array.ts): the solar panels drawn on the
// roof, their rated watts summed, replace the typed "Solar panels" figure; where none is drawn the
// typed figure still works; peak sun hours are always the typed ones. Daily yield is
// W × peak sun hours × (1 − losses), losses the PVWatts defaults multiplied together:
// 1 − 0.98 × 0.97 × 0.98 × 0.98 × 0.995 × 0.985 × 0.99 × 0.97 = 0.140757 (A. P. Dobos, PVWatts
// Version 5 Manual, NREL/TP-6A20-62641, 2014 — secondary, as already used in solar-yield.ts), so
// (1 − losses) = 0.859243, the factor every figure below is worked with. Panel ratings are the kind's invented default (175 W) or typed here.
import { describe, expect, it } from 'vitest';
import { systemChecks } from '@/lib/checks/systems';
import { computePartsList, powerBudget, solarArray, type PriceList } from '@/lib/planning';
import type { LayoutDoc } from '@/lib/layout';
import { baseDoc, withModules, withSystems } from './fixtures';


const panel = (id: string, x: number, o: Record<string, unknown> = {}) => ({
  id, kind: 'solar-panel' as const, x, y: 300, length: 1480, width: 670, height: 35, mount: 'roof' as const, props: { ratedWatts: 175 }, ...o,
});
const battery = { chemistry: 'lifepo4' as const, capacityAh: 100, volts: 12.8 };
const sun = { summer: 4, shoulder: 3, winter: 1 };

function twoPanels(solar?: { watts?: number; peakSunHours: typeof sun }): LayoutDoc {
  return withSystems(withModules(baseDoc(), [panel('p1', 100), panel('p2', 1600)]), { power: { battery, ...(solar ? { solar } : {}) } });
}

describe('solar array: drawn panels replace the typed figure', () => {
  it('two 175 W panels on the roof are a 350 W array, whatever figure was typed (999 W here)', () => {
    const doc = twoPanels({ watts: 999, peakSunHours: sun });
    expect(solarArray(doc)).toEqual({ basis: 'drawn', watts: 350, panels: 2, moduleIds: ['p1', 'p2'] });
  });

  it('summer: 2 × 175 W × 4.0 h × 0.859243 = 1400 × 0.859243 = 1202.94 Wh a day; winter 350 × 1 × 0.859243 = 300.74 Wh', () => {
    const b = powerBudget(twoPanels({ watts: 999, peakSunHours: sun }));
    expect(b.solar?.basis).toBe('drawn');
    expect(b.seasons.find((s) => s.season === 'summer')!.solarWh).toBeCloseTo(1202.94, 1);
    expect(b.seasons.find((s) => s.season === 'winter')!.solarWh).toBeCloseTo(300.74, 1);
    expect(b.sunHoursMissing).toBe(false);
  });

  it('each panel’s own rating counts: 175 W + 200 W = 375 W; summer 375 × 4 × 0.859243 = 1288.86 Wh', () => {
    const doc = withSystems(withModules(baseDoc(), [panel('p1', 100), panel('p2', 1600, { props: { ratedWatts: 200 } })]), { power: { battery, solar: { peakSunHours: sun } } });
    expect(solarArray(doc)?.watts).toBe(375);
    expect(powerBudget(doc).seasons[0].solarWh).toBeCloseTo(1288.86, 1);
  });

  it('the balance says where the figure came from', () => {
    const f = systemChecks(twoPanels({ peakSunHours: sun })).filter((x) => x.id === 'power.balance');
    expect(f).toHaveLength(3);
    expect(f[0].message).toMatch(/solar 1,203 Wh from 2 solar panels drawn on the roof, 350 W rated, after 14\.08 % system losses/);
  });

  it('with panels drawn but no peak sun hours typed, the balance waits and asks for the three seasons’ sun', () => {
    const doc = twoPanels();
    const b = powerBudget(doc);
    expect(b.sunHoursMissing).toBe(true);
    expect(b.missing.map((n) => n.label)).toEqual(['Sun, summer', 'Sun, spring/autumn', 'Sun, winter']);
    const f = systemChecks(doc);
    expect(f.filter((x) => x.id === 'power.balance')).toEqual([]);
    expect(f.find((x) => x.id === 'power.input')?.needs).toEqual([
      { label: 'Sun, summer', where: 'power' }, { label: 'Sun, spring/autumn', where: 'power' }, { label: 'Sun, winter', where: 'power' },
    ]);
  });
});

describe('solar array: the typed figure where no panel is drawn', () => {
  it('300 W typed, summer 5 h: 300 × 5 × 0.859243 = 1288.86 Wh, and the message says it was typed', () => {
    const doc = withSystems(baseDoc(), { power: { battery, solar: { watts: 300, peakSunHours: { summer: 5, shoulder: 3, winter: 1 } } } });
    expect(solarArray(doc)).toEqual({ basis: 'typed', watts: 300, panels: 0, moduleIds: [] });
    expect(powerBudget(doc).seasons[0].solarWh).toBeCloseTo(1288.86, 1);
    expect(systemChecks(doc).find((x) => x.id === 'power.balance')!.message).toMatch(/from 300 W of solar panels, as typed on the power tab/);
  });

  it('a panel not mounted on the roof is not part of the array: the typed figure stands', () => {
    const doc = withSystems(withModules(baseDoc(), [panel('p1', 100, { mount: 'inside', y: 400 })]), { power: { battery, solar: { watts: 120, peakSunHours: sun } } });
    expect(solarArray(doc)).toMatchObject({ basis: 'typed', watts: 120 });
  });

  it('neither drawn nor typed: no array, and charging is asked for as before', () => {
    const doc = withSystems(baseDoc(), { power: { battery } });
    expect(solarArray(doc)).toBeNull();
    expect(powerBudget(doc).missing.map((n) => n.label)).toEqual(['Solar panels, alternator charger or hook-up charger']);
  });
});

describe('parts list: drawn panels are priced as modules, a typed array per watt', () => {
  const prices: PriceList = { currency: 'GBP', labourRateMinor: 0, vatPct: 0, items: { 'module:solar-panel': { unit: 'each', priceMinor: 19_000 }, solar: { unit: 'W', priceMinor: 110 } } };
  it('two drawn panels: 2 × £190 = £380 as modules, no per-watt line', () => {
    const list = computePartsList(twoPanels({ watts: 999, peakSunHours: sun }), prices);
    expect(list.lines.find((l) => l.key === 'module:solar-panel')).toMatchObject({ qty: 2, netMinor: 38_000 });
    expect(list.lines.find((l) => l.key === 'solar')).toBeUndefined();
  });
  it('typed 300 W and none drawn: 300 W × £1.10 = £330 on the per-watt line', () => {
    const doc = withSystems(baseDoc(), { power: { solar: { watts: 300, peakSunHours: sun } } });
    expect(computePartsList(doc, prices).lines.find((l) => l.key === 'solar')).toMatchObject({ qty: 300, netMinor: 33_000 });
  });
});
