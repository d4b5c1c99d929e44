// Sleep rules and mattress sizes. Mattress sizes are the sizes the bed trade sells in each region —
// common practice, no published standard consulted (UK single 90 × 190 cm … super king
// 180 × 200 cm; continental 90/140/160/180 × 200 cm; US twin 38 × 75 in … California king
// 72 × 84 in, all from memory); inches at 25.4 mm exactly (international yard and pound agreement,
// 1959). Bed rules are common practice, no source.
import { describe, expect, it } from 'vitest';
import { largestFittingMattress, MATTRESSES, runChecks } from '@/lib/checks';
import { boxDoc, findings, mod, only } from './helpers';

const byName = (region: 'uk' | 'eu' | 'us') => Object.fromEntries(MATTRESSES[region].map((m) => [m.name, [m.width, m.length]]));

describe('standard mattress sizes (trade sizes, common practice)', () => {
  it('UK: single 90×190, small double 120×190, double 135×190, king 150×200, super king 180×200 cm', () => {
    expect(byName('uk')).toEqual({ 'UK single': [900, 1900], 'UK small double': [1200, 1900], 'UK double': [1350, 1900], 'UK king': [1500, 2000], 'UK super king': [1800, 2000] });
  });
  it('EU: 90, 140, 160, 180 × 200 cm', () => {
    expect(Object.values(byName('eu'))).toEqual([[900, 2000], [1400, 2000], [1600, 2000], [1800, 2000]]);
  });
  it('US: twin 38×75, full 54×75, queen 60×80, king 76×80, California king 72×84 in, at 25.4 mm to the inch (worked by hand)', () => {
    expect(byName('us')).toEqual({
      'US twin': [965.2, 1905], 'US full': [1371.6, 1905], 'US queen': [1524, 2032], 'US king': [1930.4, 2032], 'US California king': [1828.8, 2133.6],
    });
  });
  it('picks the largest that fits, either region', () => {
    expect(largestFittingMattress('uk', 2000, 1500)?.name).toBe('UK king');
    expect(largestFittingMattress('uk', 1999, 1500)?.name).toBe('UK double');
    expect(largestFittingMattress('eu', 2000, 1400)?.name).toBe('EU double');
    expect(largestFittingMattress('us', 2032, 1524)?.name).toBe('US queen');
    expect(largestFittingMattress('us', 2032, 1523.9)?.name).toBe('US full');
    expect(largestFittingMattress('us', 1904, 1000)?.name).toBeUndefined(); // 75 in = 1905 mm
    expect(largestFittingMattress('uk', 1899, 2000)).toBeUndefined();
  });
});

// Plain box bay (no build-up): beds are bed-platform modules with a sleep surface.
const bed = (id: string, x: number, y: number, length: number, width: number, extra: Partial<Parameters<typeof mod>[0]> = {}) =>
  mod({ id, kind: 'bed-platform', x, y, length, width, elevation: 600, height: 200, surfaces: { travel: 'sleep', lounge: 'sleep', sleep: 'sleep' }, facing: 'front', ...extra });

describe('sleep.length and sleep.width', () => {
  it('a 2000 × 1200 bed for sleepers 1900 and 1650 passes exactly (1900 + 100 long, 2 × 600 wide)', () => {
    const doc = boxDoc({ modules: [bed('bed', 1000, 0, 2000, 1200)], occupants: { sleepers: [1650, 1900] } });
    const length = only(doc, 'sleep.length', 'sleep');
    expect(length).toMatchObject({ status: 'pass', measured: 2000, required: 2000, unit: 'mm', moduleIds: ['bed'] });
    expect(length.message).toMatch(/for 2 sleepers \(1900 mm, 1650 mm\)/);
    expect(length.message).toMatch(/UK small double \(1200 × 1900 mm\) slept lengthways/);
    expect(only(doc, 'sleep.width', 'sleep')).toMatchObject({ status: 'pass', measured: 1200, required: 1200 });
  });
  it('fails 1 mm short in length and in width', () => {
    const doc = boxDoc({ modules: [bed('bed', 1000, 0, 1999, 1199)], occupants: { sleepers: [1650, 1900] } });
    expect(only(doc, 'sleep.length', 'sleep')).toMatchObject({ status: 'fail', measured: 1999, required: 2000 });
    expect(only(doc, 'sleep.width', 'sleep')).toMatchObject({ status: 'fail', measured: 1199, required: 1200 });
  });
  it('respects the settings: bed allowance 150 mm, 700 mm per sleeper, EU sizes', () => {
    const doc = boxDoc({ modules: [bed('bed', 1000, 0, 2000, 1400)], occupants: { sleepers: [1850, 1650] }, settings: { bedAllowance: 150, bedWidthPerSleeper: 700, mattressRegion: 'eu' } });
    expect(only(doc, 'sleep.length', 'sleep')).toMatchObject({ status: 'pass', required: 2000 });
    const w = only(doc, 'sleep.width', 'sleep');
    expect(w).toMatchObject({ status: 'pass', required: 1400 });
    expect(w.message).toMatch(/EU double/);
  });
  it('measures the largest rectangle inside the pieces, not their outline', () => {
    // An L of a 2000 × 700 board and a 700 × 1200 board: the clear rectangle is 2000 × 700, far short of two sleepers.
    const doc = boxDoc({ modules: [bed('long', 1000, 0, 2000, 700), bed('foot', 2300, 700, 700, 1100)], occupants: { sleepers: [1800, 1700] } });
    expect(only(doc, 'sleep.width', 'sleep')).toMatchObject({ status: 'fail', measured: 700 });
  });
  it('a bed slept across the van says so', () => {
    const doc = boxDoc({ modules: [bed('bed', 1500, 0, 1400, 1800)], occupants: { sleepers: [1650] } });
    expect(only(doc, 'sleep.length', 'sleep').message).toMatch(/lying across the van/);
    const fits = boxDoc({ modules: [bed('bed', 1000, 0, 1400, 1800)], occupants: { sleepers: [1650] }, settings: { mattressRegion: 'eu' } });
    expect(only(fits, 'sleep.width', 'sleep').message).toMatch(/None of the usual continental European mattress sizes fits/);
  });
  it('pieces closer than levelTolerance join one bed (the mattress bridges the seam); at the tolerance they are two beds', () => {
    const seam = (gap: number) => boxDoc({ modules: [bed('a', 900, 0, 1000, 1200), bed('b', 1900 + gap, 0, 1000, 1200)], occupants: { sleepers: [1850, 1600] } });
    const joined = findings(runChecks(seam(19)), 'sleep.length', 'sleep');
    expect(joined).toHaveLength(1);
    expect(joined[0]).toMatchObject({ status: 'pass', measured: 2019, moduleIds: ['a', 'b'] });
    const apart = findings(runChecks(seam(20)), 'sleep.length', 'sleep');
    expect(apart).toHaveLength(2);
    expect(apart.every((f) => f.status === 'fail')).toBe(true);
  });
  it('several beds: sleepers go to the beds (tallest to the largest first) and the message says which', () => {
    const doc = boxDoc({ modules: [bed('upper', 1000, 0, 2000, 800), bed('lower', 1000, 1000, 1900, 800)], occupants: { sleepers: [1650, 1820] } });
    const length = findings(runChecks(doc), 'sleep.length', 'sleep');
    expect(length.map((f) => [f.moduleIds, f.status, f.required])).toEqual([[['upper'], 'pass', 1920], [['lower'], 'pass', 1750]]);
    expect(length[0].message).toMatch(/^Bed 1 .*for 1 sleeper \(1820 mm\)/);
    expect(length[1].message).toMatch(/^Bed 2 .*for 1 sleeper \(1650 mm\)/);
  });
  it('more sleepers than the beds hold: the rest share the largest bed, which then fails its width', () => {
    const doc = boxDoc({ modules: [bed('upper', 1000, 0, 2000, 800), bed('lower', 1000, 1000, 1900, 800)], occupants: { sleepers: [1650, 1820, 1500] } });
    const width = findings(runChecks(doc), 'sleep.width', 'sleep');
    expect(width[0]).toMatchObject({ status: 'fail', required: 1200 });
    expect(width[1]).toMatchObject({ status: 'pass', required: 600 });
  });
  it('no sleepers listed: a clear warning, not a crash; no bed: a clear warning', () => {
    const noSleepers = only(boxDoc({ modules: [bed('bed', 1000, 0, 2000, 1400)], occupants: { sleepers: [] } }), 'sleep.length', 'sleep');
    expect(noSleepers.status).toBe('warn');
    expect(noSleepers.message).toMatch(/no sleepers are listed/);
    const noBed = only(boxDoc(), 'sleep.width', 'sleep');
    expect(noBed).toMatchObject({ status: 'warn', measured: 0, required: 1, unit: 'beds' });
    expect(noBed.message).toMatch(/No bed is made up/);
  });
  it('only pieces present in sleep make the bed', () => {
    const doc = boxDoc({ modules: [bed('bed', 1000, 0, 1000, 1400), bed('infill', 2000, 0, 1000, 1400, { kind: 'bed-infill', arrangements: ['lounge'] })], occupants: { sleepers: [1800] } });
    expect(only(doc, 'sleep.length', 'sleep')).toMatchObject({ status: 'fail', measured: 1400 });
  });
});

describe('sleep.level', () => {
  const twoPieces = (dz: number) => boxDoc({ modules: [bed('a', 900, 0, 1000, 1400), bed('b', 1900, 0, 1000, 1400, { elevation: 600 + dz })], occupants: { sleepers: [1800] } });
  it('passes when the tops differ by exactly the 20 mm tolerance, fails at 21 mm', () => {
    expect(only(twoPieces(20), 'sleep.level', 'sleep')).toMatchObject({ status: 'pass', measured: 20, required: 20, unit: 'mm', moduleIds: ['a', 'b'] });
    const f = only(twoPieces(21), 'sleep.level', 'sleep');
    expect(f).toMatchObject({ status: 'fail', measured: 21 });
    expect(f.message).toMatch(/pack the low pieces up/);
  });
  it('a one-piece bed is level', () => {
    expect(only(boxDoc({ modules: [bed('bed', 1000, 0, 2000, 1400)] }), 'sleep.level', 'sleep')).toMatchObject({ status: 'pass', measured: 0 });
  });
});
