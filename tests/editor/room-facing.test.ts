// Sensible placing: a module new or moved against a wall faces the room from that wall, so a
// counter pushed against the left wall is worked from the walkway without turning it by hand.
// Sliding along the wall, or moving in the open, keeps the facing it has.
import { describe, expect, it } from 'vitest';
import { runChecks } from '@/lib/checks';
import { linedInterior } from '@/lib/layout/bay';
import { harness } from './harness';

describe('a module against a wall faces the room', () => {
  it('a new counter goes to the first free spot against the left wall and faces right, into the room', () => {
    const h = harness();
    const r = h.get().addModule('kitchen-counter');
    const m = h.byId(r.id!)!;
    expect(m.y).toBe(linedInterior(h.get().doc).y0);
    expect(m.facing).toBe('right');
  });

  it('moved across to the right wall it faces left; nudged along that wall it keeps facing left; turned by hand and nudged, it keeps the hand-set facing', () => {
    const h = harness();
    const id = h.get().addModule('kitchen-counter').id!;
    const lined = linedInterior(h.get().doc);
    const m = h.byId(id)!;
    h.get().moveSelection(0, lined.y1 - m.width - m.y);
    expect(h.byId(id)!.facing).toBe('left');
    h.get().updateModule(id, { facing: 'front' }, 'Edit facing');
    h.get().nudgeSelection(10, 0);
    expect(h.byId(id)!.facing).toBe('front');
  });

  it('a counter dropped in the middle of the van keeps facing the cab', () => {
    const h = harness();
    const doc = h.get().doc;
    const r = h.get().addModule('kitchen-counter', { x: doc.bay.length / 2, y: doc.bay.width / 2 });
    expect(h.byId(r.id!)!.facing).toBe('front');
  });

  it('the counter placed against the left wall is reached from the walkway in travel; facing the cab it would not be', () => {
    const h = harness();
    const id = h.get().addModule('kitchen-counter').id!;
    const reach = (doc: ReturnType<typeof h.get>['doc']) => runChecks(doc).findings.find((f) => f.id === 'walkway.reach' && f.arrangement === 'travel')!;
    expect(reach(h.get().doc)).toMatchObject({ status: 'pass', measured: 1, required: 1 });
    const turned = { ...h.get().doc, modules: h.get().doc.modules.map((m) => (m.id === id ? { ...m, facing: 'front' as const } : m)) };
    expect(reach(turned)).toMatchObject({ status: 'fail', measured: 0 });
    // In that nearly empty van the walkway result says what blocks what, never “width 0 mm”.
    const width = runChecks(turned).findings.find((f) => f.id === 'walkway.width' && f.arrangement === 'travel')!;
    expect(width.message).not.toMatch(/\b0 mm/);
    expect(width.message).toMatch(/cannot stand in front of anything worked from its front — Kitchen counter \(facing front\): each front faces a wall/);
  });
});
