// Fit rules, hand-worked in our L2H2 template with the default build-up (floor 24, roof 26, walls
// 36 mm): lined interior y 36..1764 (1800 − 36), x 0..3100, lined roof 2000 − 26 = 1974 mm above the bare floor
// (1950 mm above the 24 mm floor build-up); arches
// x 1700..2650, standing in 210 mm, 320 mm high. Each rule: pass, exactly at the limit, fail.
import { describe, expect, it } from 'vitest';
import { runChecks } from '@/lib/checks';
import { findings, l2h2Doc, mod, only } from './helpers';

const box = (over: Partial<Parameters<typeof mod>[0]>) => mod({ id: 'box', kind: 'drawer-unit', x: 500, y: 600, length: 400, width: 400, ...over });

describe('fit.inside', () => {
  it('passes exactly against the linings, the front, the rear and the lined roof (0 mm to spare)', () => {
    const doc = l2h2Doc({ modules: [box({ id: 'left', y: 36 }), box({ id: 'right', y: 1764 - 400, x: 1000 }), box({ id: 'front', x: 0, y: 700 }), box({ id: 'rear', x: 2700, y: 700 }), box({ id: 'high', x: 1500, y: 700, elevation: 1000, height: 950 })] });
    const f = only(doc, 'fit.inside');
    expect(f).toMatchObject({ status: 'pass', measured: 0, required: 0, unit: 'mm' });
  });
  it.each([
    ['left wall lining', { y: 35 }, -1],
    ['right wall lining', { y: 1765 - 400 }, -1],
    ['front of the bay', { x: -1 }, -1],
    ['rear of the bay', { x: 2701 }, -1],
    ['lined roof', { elevation: 1000, height: 951 }, -1],
  ])('fails 1 mm into the %s', (where, over, margin) => {
    const f = only(l2h2Doc({ modules: [box(over)] }), 'fit.inside');
    expect(f).toMatchObject({ status: 'fail', measured: margin, required: 0, moduleIds: ['box'] });
    expect(f.message).toContain(where.split(' ')[0]);
    expect(f.message).toMatch(/1 mm/);
  });
  it('an empty layout passes with a plain message', () => {
    expect(only(l2h2Doc(), 'fit.inside')).toMatchObject({ status: 'pass', measured: 0 });
  });
});

describe('fit.wheel-arch', () => {
  const overArch = (elevation: number) => l2h2Doc({ modules: [box({ x: 1800, y: 36, elevation, height: 300 })] });
  it('passes when the underside (24 mm floor + elevation) is exactly the 320 mm arch height', () => {
    expect(only(overArch(296), 'fit.wheel-arch')).toMatchObject({ status: 'pass', measured: 320, required: 320 });
    expect(only(overArch(400), 'fit.wheel-arch')).toMatchObject({ status: 'pass', measured: 424 });
  });
  it('fails 1 mm lower, naming the module and the arch', () => {
    const f = only(overArch(295), 'fit.wheel-arch');
    expect(f).toMatchObject({ status: 'fail', measured: 319, required: 320, unit: 'mm', moduleIds: ['box'] });
    expect(f.message).toMatch(/left wheel arch/);
  });
  it('a module beside the arch (touching its box in plan) is not over it', () => {
    const f = only(l2h2Doc({ modules: [box({ x: 1800, y: 210, elevation: 0 })] }), 'fit.wheel-arch');
    expect(f).toMatchObject({ status: 'pass', unit: 'modules', measured: 0 });
  });
});

describe('fit.overlap', () => {
  it('fails for two modules sharing space, naming both and the overlap', () => {
    const doc = l2h2Doc({ modules: [box({ id: 'a' }), box({ id: 'b', x: 800, y: 700 })] });
    const f = only(doc, 'fit.overlap');
    expect(f).toMatchObject({ status: 'fail', moduleIds: ['a', 'b'], measured: 100, required: 0 });
    expect(f.arrangement).toBeUndefined(); // they clash in all three arrangements; the message lists them
    expect(f.message).toMatch(/100 mm × 300 mm/);
    expect(f.message).toMatch(/travel, lounge and sleep/);
  });
  it('passes when they only touch in plan, or stack with touching heights (a hob on a counter)', () => {
    expect(only(l2h2Doc({ modules: [box({ id: 'a' }), box({ id: 'b', x: 900 })] }), 'fit.overlap').status).toBe('pass');
    const stacked = [box({ id: 'counter', height: 900 }), box({ id: 'hob', kind: 'hob', elevation: 900, height: 60 })];
    expect(only(l2h2Doc({ modules: stacked }), 'fit.overlap').status).toBe('pass');
    const oneMmInto = [box({ id: 'counter', height: 901 }), box({ id: 'hob', kind: 'hob', elevation: 900, height: 60 })];
    expect(only(l2h2Doc({ modules: oneMmInto }), 'fit.overlap').status).toBe('fail');
  });
  it('modules that never exist together do not clash; one shared arrangement is reported as such', () => {
    const apart = [box({ id: 'table', kind: 'table', arrangements: ['lounge'] }), box({ id: 'infill', kind: 'bed-infill', arrangements: ['sleep'] })];
    expect(only(l2h2Doc({ modules: apart }), 'fit.overlap').status).toBe('pass');
    const oneShared = [box({ id: 'table', kind: 'table', arrangements: ['lounge', 'travel'] }), box({ id: 'infill', kind: 'bed-infill', arrangements: ['sleep', 'lounge'] })];
    expect(only(l2h2Doc({ modules: oneShared }), 'fit.overlap')).toMatchObject({ status: 'fail', arrangement: 'lounge' });
  });
  it('reports a chain of clashing modules as one cluster naming them all, and separate clashes separately', () => {
    const row = Array.from({ length: 6 }, (_, i) => box({ id: `m${i}`, x: 300 + i * 300, y: 700 })); // 400 long every 300: neighbours overlap 100
    const apart = [box({ id: 'p', x: 300, y: 1200, width: 200 }), box({ id: 'q', x: 500, y: 1200, width: 200 })];
    const list = findings(runChecks(l2h2Doc({ modules: [...row, ...apart] })), 'fit.overlap');
    expect(list.map((f) => f.moduleIds)).toEqual([['m0', 'm1', 'm2', 'm3', 'm4', 'm5'], ['p', 'q']]);
    expect(list[0]).toMatchObject({ status: 'fail', measured: 100 });
    expect(list[0].message).toMatch(/^6 modules form one cluster/);
  });
  it('reports thousands of modules on one spot as one finding with capped ids, not one per pair', () => {
    const pile = Array.from({ length: 3000 }, (_, i) => box({ id: `s${i}`, length: 5, width: 5 }));
    const list = findings(runChecks(l2h2Doc({ modules: pile })), 'fit.overlap');
    expect(list).toHaveLength(1);
    expect(list[0]).toMatchObject({ status: 'fail', measured: 5 });
    expect(list[0].moduleIds).toHaveLength(200);
    expect(list[0].message).toMatch(/^3000 modules form one cluster/);
  });
  it('stops comparing pairs at its work limit and says so, with the pile it found', () => {
    // Every module a little different, all overlapping: n² pairs, no twins to fold.
    const pile = Array.from({ length: 3000 }, (_, i) => box({ id: `s${i}`, x: 300 + (i % 50), y: 500 + (i % 41), length: 800 + (i % 97) }));
    const list = findings(runChecks(l2h2Doc({ modules: pile })), 'fit.overlap');
    expect(list).toHaveLength(2);
    expect(list[0].message).toMatch(/^3000 modules form one cluster/);
    expect(list[1]).toMatchObject({ status: 'fail', unit: 'pairs' });
    expect(list[1].message).toMatch(/stopped after comparing/);
  });
});
