// Walkway rules, hand-worked in a plain 3000 × 1800 box (no build-up, no arches) entered by a
// full-width rear door, and in our L2H2 template. The walkway person is a disk 450 mm across
// (EN 1646-1 walkway width for motor caravans, from memory); arm's reach 700 mm (common practice, no source).
import { describe, expect, it } from 'vitest';
import { boxDoc, l2h2Doc, mod, only } from './helpers';

const counter = mod({ id: 'counter', kind: 'kitchen-counter', x: 0, y: 0, length: 2000, width: 600, facing: 'right' });
const wardrobeFrom = (y: number) => mod({ id: 'wardrobe', kind: 'wardrobe', x: 0, y, length: 2000, width: 1800 - y, height: 1750, facing: 'left' });

describe('walkway.reach', () => {
  it('passes through an aisle exactly 450 mm wide, reaching both sides', () => {
    const f = only(boxDoc({ modules: [counter, wardrobeFrom(1050)] }), 'walkway.reach', 'lounge');
    expect(f).toMatchObject({ status: 'pass', measured: 2, required: 2, unit: 'modules' });
  });
  it('fails when the aisle is 449 mm, naming both modules', () => {
    const f = only(boxDoc({ modules: [counter, wardrobeFrom(1049)] }), 'walkway.reach', 'travel');
    expect(f).toMatchObject({ status: 'fail', measured: 0, required: 2, moduleIds: ['counter', 'wardrobe'] });
    expect(f.message).toMatch(/450 mm wide/);
  });
  it('reaches a front exactly 700 mm away across a low tank, not 701 mm', () => {
    // The tank in front of the counter is 475 mm deep: the disk's centre stops 225 mm beyond it, 700 mm from the counter front.
    const tank = (depth: number) => mod({ id: 'tank', kind: 'fresh-water-tank', x: 0, y: 600, length: 2000, width: depth, height: 300 });
    expect(only(boxDoc({ modules: [counter, tank(475)] }), 'walkway.reach', 'lounge').status).toBe('pass');
    const f = only(boxDoc({ modules: [counter, tank(476)] }), 'walkway.reach', 'lounge');
    expect(f).toMatchObject({ status: 'fail', moduleIds: ['counter'] });
    expect(f.message).toMatch(/700 mm/);
  });
  it('touching a corner from beside the module does not count', () => {
    const small = mod({ id: 'counter', kind: 'kitchen-counter', x: 0, y: 0, length: 400, width: 600, facing: 'right' });
    const blocker = mod({ id: 'tank', kind: 'grey-water-tank', x: 0, y: 600, length: 400, width: 1200, height: 250 });
    expect(only(boxDoc({ modules: [small, blocker] }), 'walkway.reach', 'lounge').status).toBe('fail');
  });
  it('a module facing the wall cannot be worked', () => {
    const f = only(boxDoc({ modules: [{ ...counter, facing: 'left' }] }), 'walkway.reach', 'lounge');
    expect(f.status).toBe('fail');
  });
  it('things above 1000 mm do not block the floor; lower ones do', () => {
    const shelf = (elevation: number) => mod({ id: 'shelf', kind: 'overhead-locker', x: 0, y: 600, length: 2000, width: 1200, elevation, height: 200 });
    expect(only(boxDoc({ modules: [counter, shelf(1000)] }), 'walkway.reach', 'lounge').status).toBe('pass');
    expect(only(boxDoc({ modules: [counter, shelf(999)] }), 'walkway.reach', 'lounge').status).toBe('fail');
  });
  it('each arrangement sees only its own modules', () => {
    const table = mod({ id: 'table', kind: 'table', x: 0, y: 0, length: 700, width: 500, elevation: 700, height: 30, facing: 'left', arrangements: ['lounge'] });
    expect(only(boxDoc({ modules: [table] }), 'walkway.reach', 'lounge').status).toBe('fail');
    expect(only(boxDoc({ modules: [table] }), 'walkway.reach', 'travel')).toMatchObject({ status: 'pass', measured: 0, required: 0 });
  });
  it('a door narrower than the walkway lets nobody in; a door exactly as wide does', () => {
    const withDoor = (w: number) => boxDoc({ modules: [counter], bay: { doors: [{ id: 'rear', wall: 'rear', offset: 900, width: w }] } });
    expect(only(withDoor(450), 'walkway.reach', 'lounge').status).toBe('pass');
    const f = only(withDoor(449), 'walkway.reach', 'lounge');
    expect(f.status).toBe('fail');
    expect(f.message).toMatch(/No door lets a 450 mm person in/);
  });
  it('no doors: a clear warning saying what is missing, in both arrangements', () => {
    for (const a of ['travel', 'lounge']) {
      const f = only(boxDoc({ modules: [counter], bay: { doors: [] } }), 'walkway.reach', a);
      expect(f).toMatchObject({ status: 'warn', measured: 0, required: 1, unit: 'doors' });
      expect(f.message).toMatch(/No door/);
    }
  });
  it('in the L2H2 bay the slide door lets the walker in past the right-hand lining', () => {
    const sink = mod({ id: 'sink', kind: 'sink-unit', x: 0, y: 36, length: 450, width: 500, facing: 'right' });
    // Block the rear door with a bench across the whole back so the slide door is the only way in.
    const bench = mod({ id: 'bench', kind: 'bench-seat', x: 2550, y: 36, length: 550, width: 1698, elevation: 300, height: 160, facing: 'front' });
    const f = only(l2h2Doc({ modules: [sink, bench] }), 'walkway.reach', 'lounge');
    expect(f.status).toBe('pass');
    const noSlide = l2h2Doc({ modules: [sink, bench], bay: { doors: [{ id: 'rear', wall: 'rear', offset: 150, width: 1500 }] } });
    expect(only(noSlide, 'walkway.reach', 'lounge')).toMatchObject({ status: 'fail', measured: 0, required: 2 });
  });
});

describe('walkway.width', () => {
  it('measures the aisle: exactly 550 mm passes (450 + 100), 549 mm warns', () => {
    expect(only(boxDoc({ modules: [counter, wardrobeFrom(1150)] }), 'walkway.width', 'lounge')).toMatchObject({ status: 'pass', measured: 550, required: 550, unit: 'mm' });
    const f = only(boxDoc({ modules: [counter, wardrobeFrom(1149)] }), 'walkway.width', 'lounge');
    expect(f).toMatchObject({ status: 'warn', measured: 549, required: 550 });
    expect(f.message).toMatch(/549 mm/);
    expect(f.message).toMatch(/common practice, no source/);
  });
  it('is the narrowest place on the way, not where the walker stands', () => {
    // Wide hall at the rear, a 600 mm gap between two posts, then the counter's front beyond it.
    const posts = [mod({ id: 'p1', kind: 'wardrobe', x: 2100, y: 600, length: 100, width: 500, height: 1750, facing: 'rear' }), mod({ id: 'p2', kind: 'step', x: 2100, y: 1700, length: 100, width: 100, height: 200 })];
    const f = only(boxDoc({ modules: [mod({ ...counter, length: 1500 }), ...posts] }), 'walkway.width', 'lounge');
    expect(f.measured).toBe(600);
  });
  it('reports 0 mm and warns when nobody can get in; warns for no doors', () => {
    const blocked = boxDoc({ modules: [counter], bay: { doors: [{ id: 'rear', wall: 'rear', offset: 900, width: 300 }] } });
    expect(only(blocked, 'walkway.width', 'lounge')).toMatchObject({ status: 'warn', measured: 0 });
    // It says what blocks what: a 300 mm door against the 450 mm person.
    expect(only(blocked, 'walkway.width', 'lounge').message).toMatch(/nobody 450 mm wide gets in: the rear door \(300 mm wide\) is narrower than that/);
    const wardrobe = { ...counter, id: 'robe', kind: 'wardrobe' as const, label: 'Tall wardrobe', x: 2700, y: 0, length: 300, width: 1800, height: 1750 };
    expect(only(boxDoc({ modules: [wardrobe] }), 'walkway.width', 'lounge').message).toMatch(/Tall wardrobe stands in the rear door \(1800 mm wide\)/);
    expect(only(boxDoc({ bay: { doors: [] } }), 'walkway.width', 'travel')).toMatchObject({ status: 'warn', measured: 0 });
  });
  it('with nothing to reach it measures the widest person who gets in through a door', () => {
    expect(only(boxDoc(), 'walkway.width', 'lounge')).toMatchObject({ status: 'pass', measured: 1800 });
    expect(only(boxDoc({ bay: { doors: [{ id: 'rear', wall: 'rear', offset: 100, width: 700 }] } }), 'walkway.width', 'lounge').measured).toBe(700);
  });
});
