// The revision comparison as a pure function: modules added, removed, moved, resized, turned,
// edited; bay changes; findings that changed status. Plus invariants checked with fast-check.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { diffFindings, diffRevisions, type FindingLike } from '@/lib/layout/revision-diff';
import { starterLayout } from '@/lib/layout/templates';
import type { LayoutDoc, Module } from '@/lib/layout/schema';

const base = (): LayoutDoc => structuredClone(starterLayout('starter-l-lounge')!);
const withModules = (doc: LayoutDoc, modules: Module[]): LayoutDoc => ({ ...doc, modules });

describe('diffRevisions', () => {
  it('finds nothing between a document and its copy', () => {
    const doc = base();
    const d = diffRevisions(doc, structuredClone(doc));
    expect(d).toMatchObject({ added: [], removed: [], changed: [], moved: [], resized: [], bay: [] });
    expect(d.unchanged).toBe(doc.modules.length);
  });

  it('names added and removed modules by id', () => {
    const before = base();
    const [first, ...rest] = before.modules;
    const extra: Module = { ...first, id: 'new-locker', kind: 'overhead-locker', label: 'Locker over the door' };
    const after = withModules(before, [...rest, extra]);
    const d = diffRevisions(before, after);
    expect(d.added.map((m) => m.id)).toEqual(['new-locker']);
    expect(d.removed.map((m) => m.id)).toEqual([first.id]);
    expect(d.unchanged).toBe(rest.length);
  });

  it('tells a move from a resize and measures both in mm', () => {
    const before = base();
    const [a, b, ...rest] = before.modules;
    const after = withModules(before, [{ ...a, x: a.x + 150, elevation: a.elevation + 20 }, { ...b, height: b.height - 40 }, ...rest]);
    const d = diffRevisions(before, after);
    expect(d.moved).toEqual([a.id]);
    expect(d.resized).toEqual([b.id]);
    const moved = d.changed.find((c) => c.id === a.id)!;
    expect(moved.moved).toEqual({ dx: 150, dy: 0, dz: 20 });
    expect(moved.resized).toBeNull();
    expect(d.changed.find((c) => c.id === b.id)!.resized).toEqual({ dLength: 0, dWidth: 0, dHeight: -40, rotated: false });
  });

  it('reports a 90° turn as a resize with length and width swapped', () => {
    const before = base();
    const m = before.modules.find((x) => x.length !== x.width)!;
    const after = withModules(before, before.modules.map((x) => (x.id === m.id ? { ...x, length: m.width, width: m.length } : x)));
    const c = diffRevisions(before, after).changed.find((x) => x.id === m.id)!;
    expect(c.resized?.rotated).toBe(true);
    expect(c.resized?.dLength).toBe(m.width - m.length);
  });

  it('lists edits that are neither move nor resize', () => {
    const before = base();
    const m = before.modules[0];
    const after = withModules(before, [{ ...m, label: 'Renamed', facing: m.facing === 'left' ? 'right' : 'left', arrangements: ['sleep'], props: { watts: 99 } }, ...before.modules.slice(1)]);
    const c = diffRevisions(before, after).changed[0];
    expect(c.other).toEqual(expect.arrayContaining(['label', 'facing', 'arrangements', 'props']));
    expect(c.moved).toBeNull();
  });

  it('ignores the order of arrangements and of props', () => {
    const before = base();
    const m = { ...before.modules[0], kind: 'fridge' as const, arrangements: ['travel', 'lounge'] as Module['arrangements'], props: { litres: 1, watts: 2 } };
    const m2 = { ...m, arrangements: ['lounge', 'travel'] as Module['arrangements'], props: { watts: 2, litres: 1 } };
    expect(diffRevisions(withModules(before, [m]), withModules(before, [m2])).changed).toEqual([]);
  });

  it('reports bay, build-up and occupant changes', () => {
    const before = base();
    const after: LayoutDoc = {
      ...before,
      bay: { ...before.bay, height: before.bay.height + 100, bulkhead: !before.bay.bulkhead },
      buildUp: { ...before.buildUp, floor: [...before.buildUp.floor, { material: 'Cork', thickness: 6 }] },
      occupants: { ...before.occupants, standingHeight: 1900 },
    };
    const fields = diffRevisions(before, after).bay.map((b) => b.field);
    expect(fields).toEqual(expect.arrayContaining(['height', 'bulkhead', 'buildUp', 'occupants']));
    expect(diffRevisions(before, after).bay.find((b) => b.field === 'height')).toEqual({ field: 'height', before: String(before.bay.height), after: String(before.bay.height + 100) });
  });

  const moduleArb = fc.record({
    id: fc.constantFrom('m1', 'm2', 'm3', 'm4', 'm5', 'm6'),
    x: fc.integer({ min: 0, max: 3000 }),
    y: fc.integer({ min: 0, max: 1700 }),
    length: fc.integer({ min: 100, max: 2000 }),
    width: fc.integer({ min: 100, max: 1500 }),
  });
  const docArb = fc.uniqueArray(moduleArb, { selector: (m) => m.id, maxLength: 6 }).map((ms) =>
    withModules(base(), ms.map((m) => ({ ...base().modules[0], ...m }))),
  );

  it('accounts for every module exactly once (property)', () => {
    fc.assert(fc.property(docArb, docArb, (a, b) => {
      const d = diffRevisions(a, b);
      // Every module of the later document is added, changed or unchanged; of the earlier one, removed, changed or unchanged.
      expect(d.added.length + d.changed.length + d.unchanged).toBe(b.modules.length);
      expect(d.removed.length + d.changed.length + d.unchanged).toBe(a.modules.length);
    }));
  });

  it('is symmetric: swapping the sides swaps added and removed and negates moves (property)', () => {
    fc.assert(fc.property(docArb, docArb, (a, b) => {
      const ab = diffRevisions(a, b);
      const ba = diffRevisions(b, a);
      expect(ab.added.map((m) => m.id).sort()).toEqual(ba.removed.map((m) => m.id).sort());
      expect(ab.moved.sort()).toEqual(ba.moved.sort());
      for (const c of ab.changed) {
        const back = ba.changed.find((x) => x.id === c.id)!;
        if (c.moved) expect(back.moved).toEqual({ dx: -c.moved.dx || 0, dy: -c.moved.dy || 0, dz: -c.moved.dz || 0 });
      }
    }));
  });
});

describe('diffFindings', () => {
  const f = (id: string, status: FindingLike['status'], extra: Partial<FindingLike> = {}): FindingLike => ({ id, status, message: `${id} ${status}`, ...extra });

  it('lists findings whose status changed, worse first', () => {
    const before = [f('sleep.length', 'fail', { arrangement: 'sleep' }), f('walkway.width', 'pass', { arrangement: 'lounge' }), f('fit.inside', 'pass')];
    const after = [f('sleep.length', 'pass', { arrangement: 'sleep' }), f('walkway.width', 'warn', { arrangement: 'lounge' }), f('fit.inside', 'pass')];
    const changes = diffFindings(before, after);
    expect(changes.map((c) => [c.id, c.before, c.after, c.direction])).toEqual([
      ['walkway.width', 'pass', 'warn', 'worse'],
      ['sleep.length', 'fail', 'pass', 'better'],
    ]);
  });

  it('keeps findings apart by arrangement and by module, whatever the module order', () => {
    const before = [f('fit.overlap', 'fail', { moduleIds: ['a', 'b'] }), f('headroom.standing', 'pass', { arrangement: 'lounge' })];
    const after = [f('fit.overlap', 'fail', { moduleIds: ['b', 'a'] }), f('headroom.standing', 'pass', { arrangement: 'lounge' }), f('headroom.standing', 'fail', { arrangement: 'sleep' })];
    const changes = diffFindings(before, after);
    expect(changes).toHaveLength(1);
    expect(changes[0]).toMatchObject({ id: 'headroom.standing', arrangement: 'sleep', before: null, after: 'fail', direction: 'worse' });
  });

  it('counts a vanished warning as better and ignores passes that come and go', () => {
    const changes = diffFindings([f('egress.sleep', 'warn'), f('travel.seats', 'pass')], [f('sleep.width', 'pass')]);
    expect(changes.map((c) => [c.id, c.before, c.after, c.direction])).toEqual([['egress.sleep', 'warn', null, 'better']]);
  });

  it('numbers repeated findings of one rule in one place instead of merging them', () => {
    const changes = diffFindings([f('mass.axle', 'pass'), f('mass.axle', 'pass')], [f('mass.axle', 'pass'), f('mass.axle', 'fail')]);
    expect(changes).toHaveLength(1);
    expect(changes[0].key).toMatch(/#2$/);
  });
});
