// Headroom rules. Statures from published anthropometric tables: British adults aged 19–65
// (Pheasant & Haslegrave, Bodyspace, 3rd ed., Table 10.1 — from memory): men 5th/50th/95th
// percentile 1625/1740/1855 mm; US adults 19–65 men 95th percentile 1870 mm (same table set, from
// memory). Shoe allowance 25 mm (Bodyspace, from memory). The 20 mm margin is common practice, no
// source. The bay heights are our own templates.
import { describe, expect, it } from 'vitest';
import { bayTemplate } from '@/lib/layout';
import { boxDoc, l2h2Doc, mod, only } from './helpers';

const SHOES = 25; // Bodyspace shoe correction for men, from memory
const UK_MEN = { p5: 1625, p50: 1740, p95: 1855 }; // Bodyspace Table 10.1 (from memory)
const US_MEN_P95 = 1870; // same tables, US adults 19–65 (from memory)

describe('headroom.standing', () => {
  it('L2H2 (2000 mm bare) after the default build-up (24 mm floor, 26 mm roof) leaves 2000 − 50 = 1950 mm clear', () => {
    const f = only(l2h2Doc(), 'headroom.standing');
    expect(f.measured).toBe(1950);
    expect(f.message).toMatch(/Clear standing height 1950 mm after 24 mm floor and 26 mm roof build-up/);
  });
  it('a 95th-percentile British man in shoes (1855 + 25 = 1880 mm) needs 1880 + 20 = 1900 mm: pass, and the bay fits people up to 1950 − 20 = 1930 mm', () => {
    const f = only(l2h2Doc({ occupants: { standingHeight: UK_MEN.p95 + SHOES } }), 'headroom.standing');
    // required is the figure the shortfall is measured against: 1880 mm stature + 20 mm margin = 1900 mm.
    expect(f).toMatchObject({ status: 'pass', measured: 1950, required: 1900, unit: 'mm' });
    expect(f.message).toMatch(/fits people up to 1930 mm tall with the margin/);
  });
  it('1 mm taller than 1930 is inside the margin: warn; exactly the clear height still stands: warn; 1 mm more: fail', () => {
    const warn = only(l2h2Doc({ occupants: { standingHeight: 1931 } }), 'headroom.standing');
    expect(warn).toMatchObject({ status: 'warn', measured: 1950, required: 1951 });
    expect(warn.message).toMatch(/needs 1951 mm \(the tallest person’s 1931 mm stature \+ 20 mm margin\).*1 mm short of the margin/);
    expect(only(l2h2Doc({ occupants: { standingHeight: 1950 } }), 'headroom.standing').status).toBe('warn');
    const f = only(l2h2Doc({ occupants: { standingHeight: 1951 } }), 'headroom.standing');
    expect(f).toMatchObject({ status: 'fail', required: 1971 });
    expect(f.message).toMatch(/cannot stand upright: 1 mm short of their stature, 21 mm short with the margin/);
  });
  it('a 95th-percentile US man in shoes (1870 + 25 = 1895 mm) needs 1915 mm and stands in L2H2 (1950 mm clear): pass', () => {
    expect(only(l2h2Doc({ occupants: { standingHeight: US_MEN_P95 + SHOES } }), 'headroom.standing').status).toBe('pass');
  });
  it('in a standard-roof L2H1 (1500 mm bare, 1450 mm clear) even a 5th-percentile British man (1625 + 25 mm) cannot stand', () => {
    const h1 = bayTemplate('l2h1')!.bay;
    const f = only(l2h2Doc({ bay: h1, occupants: { standingHeight: UK_MEN.p5 + SHOES } }), 'headroom.standing');
    expect(f).toMatchObject({ status: 'fail', measured: 1450 });
  });
  it('common practice stated by a practising builder: a person 1870 mm tall stands upright in a high-roof (H2) van after floor and roof insulation', () => {
    expect(only(l2h2Doc({ occupants: { standingHeight: 1870 } }), 'headroom.standing').status).toBe('pass');
  });
  it('thicker build-up costs headroom: 100 mm of roof insulation more (2000 − 24 − 126 = 1850 mm clear) turns the 1870 mm pass into a fail', () => {
    const doc = l2h2Doc({ occupants: { standingHeight: 1870 }, buildUp: { floor: [{ material: 'Ply', thickness: 24 }], roof: [{ material: 'PIR board', thickness: 126 }], walls: [] } });
    expect(only(doc, 'headroom.standing')).toMatchObject({ status: 'fail', measured: 1850 });
  });
});

describe('headroom.standing out of range', () => {
  it('a build-up thicker than the bay is high is reported as an input out of range, never as a negative height', () => {
    const doc = l2h2Doc({ buildUp: { floor: [{ material: 'Ply', thickness: 1000 }], roof: [{ material: 'PIR board', thickness: 1000 }], walls: [] } });
    const f = only(doc, 'headroom.standing');
    expect(f).toMatchObject({ status: 'fail', measured: 0 });
    expect(f.message).toMatch(/an input is out of range/);
  });
});

describe('headroom.overhead', () => {
  // Box bay, no build-up: counter along the left (y 0..600) facing right, so the walkway centres run at y ≥ 825.
  const counter = mod({ id: 'counter', kind: 'kitchen-counter', x: 0, y: 0, length: 2000, width: 600 });
  const locker = (width: number, elevation = 1500) => mod({ id: 'locker', kind: 'overhead-locker', x: 0, y: 0, length: 2000, width, elevation, height: 350 });
  it('warns for a locker at 1500 mm hanging over the walkway, for a 1800 mm person, in each walkway arrangement', () => {
    for (const a of ['travel', 'lounge']) {
      const f = only(boxDoc({ modules: [counter, locker(900)] }), 'headroom.overhead', a);
      expect(f).toMatchObject({ status: 'warn', moduleIds: ['locker'], measured: 1500, required: 1800 });
      expect(f.message).toMatch(/head strike/);
    }
  });
  it('a locker flush with the counter front is beside the walkway, not over it; 1 mm further out is over it', () => {
    expect(only(boxDoc({ modules: [counter, locker(600)] }), 'headroom.overhead', 'lounge').status).toBe('pass');
    expect(only(boxDoc({ modules: [counter, locker(601)] }), 'headroom.overhead', 'lounge').status).toBe('warn');
  });
  it('an underside exactly at the standing height passes; exactly 1000 mm still counts as overhead', () => {
    expect(only(boxDoc({ modules: [counter, locker(900, 1800)] }), 'headroom.overhead', 'lounge').status).toBe('pass');
    expect(only(boxDoc({ modules: [counter, locker(900, 1000)] }), 'headroom.overhead', 'lounge').status).toBe('warn');
  });
  it('a locker over a part of the floor nobody can reach is no head strike', () => {
    const walledOff = mod({ id: 'screen', kind: 'wardrobe', x: 2200, y: 0, length: 100, width: 1800, height: 1750, facing: 'rear' });
    const f = only(boxDoc({ modules: [counter, walledOff, locker(900)] }), 'headroom.overhead', 'lounge');
    expect(f.status).toBe('pass');
  });
});
