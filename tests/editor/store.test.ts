import { describe, expect, it } from 'vitest';
import { harness, mod, expectValid, testDoc } from './harness';
import { createEditorStore, isDirty } from '@/components/editor/store/editorStore';

describe('editor store: placing modules', () => {
  it('adds a module from its kind with the catalogue defaults, selected, as one undo entry', () => {
    const h = harness();
    const r = h.get().addModule('bench-seat');
    expect(r.ok).toBe(true);
    const m = h.byId(r.id!)!;
    expect(m).toMatchObject({ kind: 'bench-seat', length: 1100, width: 550, height: 460, surfaces: { travel: 'seat', lounge: 'seat', sleep: 'sleep' }, arrangements: ['travel', 'lounge', 'sleep'] });
    expect(m.id).toMatch(/^[A-Za-z0-9_-]+$/);
    // First free spot is against the lining, not inside the wall build-up band.
    expect(m.y).toBeGreaterThanOrEqual(36);
    expect(h.get().selection).toEqual([m.id]);
    expect(h.get().history.past).toHaveLength(1);
    expectValid(h.get().doc);
  });

  it('centres a dropped module on the drop point, snapped, and keeps it inside the lining', () => {
    const h = harness();
    const r = h.get().addModule('drawer-unit', { x: 1003, y: 10 });
    const m = h.byId(r.id!)!;
    expect(m.x).toBe(780); // 1003 - 225 = 778 -> 10 mm grid
    expect(m.y).toBe(36); // pulled out of the wall band onto the lining
  });

  it('does not place a module on top of another when looking for a free spot', () => {
    const h = harness([mod('a', { x: 0, y: 36, length: 450, width: 450 })]);
    const r = h.get().addModule('drawer-unit');
    const m = h.byId(r.id!)!;
    const overlaps = m.x < 450 && m.y < 486;
    expect(overlaps).toBe(false);
  });

  it('switches to an arrangement the new module exists in (a table lives in lounge)', () => {
    const h = harness();
    h.get().setArrangement('sleep');
    const r = h.get().addModule('table');
    expect(h.byId(r.id!)!.arrangements).toEqual(['lounge']);
    expect(h.get().arrangement).toBe('lounge');
  });

  it('refuses to edit a read-only layout, with a reason', async () => {
    const { createEditorStore } = await import('@/components/editor/store/editorStore');
    const { testDoc } = await import('./harness');
    const store = createEditorStore({ doc: testDoc([mod('a')]), version: 3, readOnly: true });
    store.getState().select(['a']);
    const r = store.getState().deleteSelection();
    expect(r).toEqual({ ok: false, error: 'This layout is view only.' });
    expect(store.getState().doc.modules).toHaveLength(1);
  });
});

describe('editor store: moving with snapping', () => {
  it('snaps a drag to the 10 mm grid and commits one undo entry on drop', () => {
    const h = harness([mod('a', { x: 1000, y: 800 })]);
    h.get().select(['a']);
    h.get().beginMove(['a']);
    h.get().dragTo(123.4, 57.8);
    h.get().dragTo(133.4, 67.2);
    expect(h.byId('a')!.x).toBe(1000); // nothing written while dragging
    h.get().commitGesture();
    expect(h.byId('a')).toMatchObject({ x: 1130, y: 870 });
    expect(h.get().history.past).toHaveLength(1);
    h.get().undo();
    expect(h.byId('a')).toMatchObject({ x: 1000, y: 800 });
  });

  it('a drag let go counts as unsaved until it is committed, and a cancelled one no longer does', () => {
    const h = harness([mod('a', { x: 1000, y: 800 })]);
    h.get().beginMove(['a']);
    h.get().dragTo(200, 0);
    expect(isDirty(h.get())).toBe(false);
    h.get().releaseGesture();
    expect(h.get().gestureReleased).toBe(true);
    expect(isDirty(h.get())).toBe(true); // nothing written yet, but a leave guard must hold
    h.get().commitGesture();
    expect(h.get().gestureReleased).toBe(false);
    expect(h.byId('a')!.x).toBe(1200);
    expect(isDirty(h.get())).toBe(true); // now the document itself differs from the saved one
    h.get().beginMove(['a']);
    h.get().releaseGesture();
    h.get().cancelGesture();
    expect(h.get().gestureReleased).toBe(false);
    h.get().releaseGesture(); // no gesture: nothing to release
    expect(h.get().gestureReleased).toBe(false);
  });

  it('sticks to the wall lining and to a neighbour edge within the threshold, with guides', () => {
    const h = harness([mod('a', { x: 1000, y: 800 }), mod('b', { x: 2000, y: 300, length: 300 })]);
    // Threshold is 8 px at the fitted zoom; find it in mm.
    const threshold = 8 / h.get().viewport.scale;
    h.get().beginMove(['a']);
    // Bring the top edge 3 mm short of the lining (y = 36) and the right edge 4 mm short of b's left edge (x = 2000).
    h.get().dragTo(2000 - 1400 - 4, 36 + 3 - 800);
    const g = h.get().gesture!;
    expect(g.kind).toBe('move');
    if (g.kind !== 'move') return;
    expect(3).toBeLessThan(threshold);
    expect(g.preview.dx).toBe(596 + 4);
    expect(g.preview.dy).toBe(36 - 800);
    expect(g.preview.guides.map((x) => `${x.axis}@${x.at}`).sort()).toEqual(['x@2000', 'y@36']);
  });

  it('moves freely to the millimetre with snapping off', () => {
    const h = harness([mod('a', { x: 1000, y: 800 })]);
    h.get().setSteps({ enabled: false });
    h.get().beginMove(['a']);
    h.get().dragTo(12.6, -7.2);
    h.get().commitGesture();
    expect(h.byId('a')).toMatchObject({ x: 1013, y: 793 });
  });

  it('uses the chosen grid step (50 mm)', () => {
    const h = harness([mod('a', { x: 1000, y: 800 })]);
    h.get().setSteps({ step: 50 });
    h.get().beginMove(['a']);
    h.get().dragTo(80, 130);
    h.get().commitGesture();
    expect(h.byId('a')).toMatchObject({ x: 1100, y: 950 });
  });
});

describe('editor store: resize, rotate, duplicate, delete', () => {
  it('resizes from the south-east handle, snapping the moving edges only', () => {
    const h = harness([mod('a', { x: 1000, y: 800, length: 400, width: 400 })]);
    h.get().beginResize('a', 'se');
    h.get().dragTo(201, 98);
    h.get().commitGesture();
    expect(h.byId('a')).toMatchObject({ x: 1000, y: 800, length: 600, width: 500 });
    expect(h.get().history.past.map((e) => e.label)).toEqual(['Resize module']);
  });

  it('never lets a resize turn a module inside out', () => {
    const h = harness([mod('a', { x: 1000, y: 800, length: 400, width: 400 })]);
    h.get().beginResize('a', 'w');
    h.get().dragTo(900, 0);
    h.get().commitGesture();
    const a = h.byId('a')!;
    expect(a.length).toBeGreaterThanOrEqual(20);
    expect(a.x + a.length).toBe(1400);
    expectValid(h.get().doc);
  });

  it('rotates 90° about the centre, swapping the footprint and turning the facing clockwise', () => {
    const h = harness([mod('a', { x: 1000, y: 800, length: 600, width: 400, facing: 'front' })]);
    h.get().select(['a']);
    h.get().rotateSelection();
    expect(h.byId('a')).toMatchObject({ x: 1100, y: 700, length: 400, width: 600, facing: 'left' });
    h.get().rotateSelection();
    h.get().rotateSelection();
    h.get().rotateSelection();
    expect(h.byId('a')).toMatchObject({ x: 1000, y: 800, length: 600, width: 400, facing: 'front' });
    expect(h.get().history.past).toHaveLength(4);
  });

  it('duplicates the selection with fresh ids and selects the copies', () => {
    const h = harness([mod('a'), mod('b', { x: 1500 })]);
    h.get().select(['a', 'b']);
    h.get().duplicateSelection();
    const doc = h.get().doc;
    expect(doc.modules).toHaveLength(4);
    expect(h.get().selection).toHaveLength(2);
    expect(h.get().selection).not.toContain('a');
    expect(new Set(doc.modules.map((m) => m.id)).size).toBe(4);
    expectValid(doc);
  });

  it('deletes the selection and undo brings it back, selected again', () => {
    const h = harness([mod('a'), mod('b', { x: 1500 })]);
    h.get().select(['b']);
    h.get().deleteSelection();
    expect(h.get().doc.modules.map((m) => m.id)).toEqual(['a']);
    expect(h.get().selection).toEqual([]);
    h.get().undo();
    expect(h.get().doc.modules.map((m) => m.id)).toEqual(['a', 'b']);
    expect(h.get().selection).toEqual(['b']);
  });

  it('refuses a patch the schema refuses, naming the field, and leaves the document alone', () => {
    const h = harness([mod('a')]);
    const before = h.get().doc;
    const r = h.get().updateModule('a', { height: 0 });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error).toMatch(/^Height: /);
    expect(h.get().doc).toBe(before);
    expect(h.get().history.past).toHaveLength(0);
  });

  it('rounds every length written to whole millimetres', () => {
    const h = harness([mod('a')]);
    h.get().updateModule('a', { x: 100.6, length: 333.3 });
    expect(h.byId('a')).toMatchObject({ x: 101, length: 333 });
    expectValid(h.get().doc);
  });
});

describe('editor store: multi-select', () => {
  it('click, shift-click toggles, and a marquee catches what it touches', () => {
    const h = harness([mod('a', { x: 100, y: 100 }), mod('b', { x: 1000, y: 100 }), mod('c', { x: 2000, y: 1000 })]);
    h.get().select(['a']);
    h.get().select(['b'], 'toggle');
    expect(h.get().selection).toEqual(['a', 'b']);
    h.get().select(['a'], 'toggle');
    expect(h.get().selection).toEqual(['b']);
    h.get().beginMarquee(50, 50, false);
    h.get().dragTo(1000, 100); // to (1050, 150): touches a and b
    h.get().commitGesture();
    expect(h.get().selection.sort()).toEqual(['a', 'b']);
    h.get().beginMarquee(1900, 900, true);
    h.get().dragTo(200, 200);
    h.get().commitGesture();
    expect(h.get().selection.sort()).toEqual(['a', 'b', 'c']);
    expect(h.get().history.past).toHaveLength(0); // selection is not an edit
  });

  it('moves a multi-selection together in one gesture', () => {
    const h = harness([mod('a', { x: 100, y: 100 }), mod('b', { x: 1000, y: 600 })]);
    h.get().select(['a', 'b']);
    h.get().beginMove(['a', 'b']);
    h.get().dragTo(200, 150); // the top edge lands 40 mm from the wheel arch face (y = 210): beyond the snap reach
    h.get().commitGesture();
    expect(h.byId('a')).toMatchObject({ x: 300, y: 250 });
    expect(h.byId('b')).toMatchObject({ x: 1200, y: 750 });
    h.get().undo();
    expect(h.byId('a')).toMatchObject({ x: 100, y: 100 });
    expect(h.byId('b')).toMatchObject({ x: 1000, y: 600 });
  });
});

describe('editor store: undo per gesture, Escape cancel', () => {
  it('collapses a burst of nudges into one entry, but not nudges far apart in time', () => {
    const h = harness([mod('a', { x: 1000, y: 800 })]);
    h.get().select(['a']);
    for (let i = 0; i < 5; i++) {
      h.clock.t += 100;
      h.get().nudgeSelection(1, 0);
    }
    h.clock.t += 100;
    h.get().nudgeSelection(0, 10);
    expect(h.byId('a')).toMatchObject({ x: 1005, y: 810 });
    expect(h.get().history.past).toHaveLength(1);
    h.clock.t += 5000;
    h.get().nudgeSelection(-1, 0);
    expect(h.get().history.past).toHaveLength(2);
    h.get().undo();
    expect(h.byId('a')).toMatchObject({ x: 1005, y: 810 });
    h.get().undo();
    expect(h.byId('a')).toMatchObject({ x: 1000, y: 800 });
    h.get().redo();
    h.get().redo();
    expect(h.byId('a')).toMatchObject({ x: 1004, y: 810 });
  });

  it('Escape during a drag leaves the document and history exactly as they were', () => {
    const h = harness([mod('a', { x: 1000, y: 800 })]);
    const before = h.get().doc;
    h.get().beginMove(['a']);
    h.get().dragTo(300, 300);
    h.get().cancelGesture();
    expect(h.get().gesture).toBeNull();
    expect(h.get().doc).toBe(before);
    expect(h.get().history.past).toHaveLength(0);
    h.get().commitGesture(); // a stray pointer-up after Escape does nothing
    expect(h.get().doc).toBe(before);
  });

  it('Escape during a resize leaves the size alone', () => {
    const h = harness([mod('a', { x: 1000, y: 800 })]);
    h.get().beginResize('a', 'e');
    h.get().dragTo(500, 0);
    h.get().cancelGesture();
    expect(h.byId('a')!.length).toBe(400);
  });

  it('a new edit after undo clears redo', () => {
    const h = harness([mod('a')]);
    h.get().select(['a']);
    h.get().rotateSelection();
    h.get().undo();
    expect(h.get().history.future).toHaveLength(1);
    h.get().nudgeSelection(1, 0);
    expect(h.get().history.future).toHaveLength(0);
  });

  it('knows when the document is unsaved, and undoing back to the saved state is clean', () => {
    const h = harness([mod('a')]);
    expect(isDirty(h.get())).toBe(false);
    h.get().select(['a']);
    h.get().rotateSelection();
    expect(isDirty(h.get())).toBe(true);
    h.get().undo();
    expect(isDirty(h.get())).toBe(false);
    h.get().redo();
    h.get().markSaved(h.get().doc, 2);
    expect(isDirty(h.get())).toBe(false);
    expect(h.get().version).toBe(2);
  });
});

describe('editor store: arrangements', () => {
  it('membership: an infill lives in sleep only; toggling adds and removes, never the last one', () => {
    const h = harness();
    h.get().setArrangement('sleep');
    const { id } = h.get().addModule('bed-infill');
    expect(h.byId(id!)!.arrangements).toEqual(['sleep']);
    const r = h.get().toggleMembership(id!, 'sleep');
    expect(r.ok).toBe(false);
    h.get().toggleMembership(id!, 'travel');
    expect(h.byId(id!)!.arrangements).toEqual(['travel', 'sleep']);
    h.get().toggleMembership(id!, 'sleep');
    expect(h.byId(id!)!.arrangements).toEqual(['travel']);
    expectValid(h.get().doc);
  });

  it('switching arrangement drops selected modules that do not exist there, and select-all stays inside it', () => {
    const h = harness([mod('bed', { arrangements: ['sleep'] }), mod('table', { arrangements: ['lounge'], x: 2000 })]);
    h.get().setArrangement('lounge');
    h.get().selectAll();
    expect(h.get().selection).toEqual(['table']);
    h.get().setArrangement('sleep');
    expect(h.get().selection).toEqual([]);
    h.get().selectAll();
    expect(h.get().selection).toEqual(['bed']);
  });

  it('snaps only to modules of the arrangement on show', () => {
    const h = harness([mod('a', { x: 1000, y: 800 }), mod('phantom', { x: 1404, y: 800, arrangements: ['sleep'] })]);
    h.get().setArrangement('lounge');
    h.get().beginMove(['a']);
    h.get().dragTo(2, 0);
    const g = h.get().gesture!;
    if (g.kind !== 'move') throw new Error('expected a move');
    expect(g.preview.guides).toEqual([]);
    expect(g.preview.dx).toBe(0); // the grid, not the sleep-only module 2 mm away... 1002 -> 1000
  });

  it('the phantom overlay cannot show the arrangement already on show', () => {
    const h = harness();
    h.get().setArrangement('lounge');
    h.get().setPhantom('lounge');
    expect(h.get().phantom).toBeNull();
    h.get().setPhantom('sleep');
    expect(h.get().phantom).toBe('sleep');
    h.get().setArrangement('sleep');
    expect(h.get().phantom).toBeNull();
  });
});

describe('editor store: bay edits', () => {
  it('edits the bay as one undo entry and refuses a door past the end of its wall', () => {
    const h = harness();
    expect(h.get().updateBay({ length: 3600 }).ok).toBe(true);
    expect(h.get().doc.bay.length).toBe(3600);
    const r = h.get().updateBay({ doors: [{ id: 'rear', wall: 'rear', offset: 1000, width: 1500 }] });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error).toMatch(/rear wall/);
    h.get().undo();
    expect(h.get().doc.bay.length).toBe(3400);
  });

  it('edits build-up and occupants with validation', () => {
    const h = harness();
    expect(h.get().updateBuildUp({ ...h.get().doc.buildUp, walls: [{ material: 'Wool', thickness: 40 }] }).ok).toBe(true);
    expect(h.get().updateBuildUp({ ...h.get().doc.buildUp, walls: [{ material: '', thickness: 40 }] }).ok).toBe(false);
    expect(h.get().updateOccupants({ standingHeight: 1900, sleepers: [1900] }).ok).toBe(true);
    expect(h.get().updateOccupants({ standingHeight: 1900, sleepers: [100] }).ok).toBe(false);
    expect(h.get().history.past).toHaveLength(2);
  });
});

describe('editor store: the build plan’s inputs (systems)', () => {
  it('an edit of one section is one undo entry, keeps the others, and undoes to the document before', () => {
    const h = harness();
    const before = h.get().doc;
    expect(h.get().updateSystems({ water: { persons: 2 } }).ok).toBe(true);
    expect(h.get().updateSystems({ vehicle: { maxAuthorisedMassKg: 3500 } }, 'Maximum authorised mass').ok).toBe(true);
    expect(h.get().doc.systems).toEqual({ water: { persons: 2 }, vehicle: { maxAuthorisedMassKg: 3500 } });
    expect(h.get().history.past.map((e) => e.label)).toEqual(['Edit the build plan', 'Maximum authorised mass']);
    expect(isDirty(h.get())).toBe(true);
    h.get().undo();
    expect(h.get().doc.systems).toEqual({ water: { persons: 2 } });
    h.get().undo();
    expect(h.get().doc).toBe(before);
    h.get().redo();
    expect(h.get().doc.systems).toEqual({ water: { persons: 2 } });
    expectValid(h.get().doc);
  });

  it('typing into the same section within a burst merges into one entry; a pause starts another', () => {
    const clock = { t: 0 };
    const h = harness([], clock);
    for (const persons of [1, 2, 3]) {
      clock.t += 200;
      h.get().updateSystems({ water: { persons } });
    }
    expect(h.get().history.past).toHaveLength(1);
    clock.t += 5000;
    h.get().updateSystems({ water: { persons: 4 } });
    expect(h.get().history.past).toHaveLength(2);
    h.get().undo();
    expect(h.get().doc.systems).toEqual({ water: { persons: 3 } });
  });

  it('the same values again add no entry; removing the last section removes systems altogether', () => {
    const h = harness();
    h.get().updateSystems({ water: { persons: 2 } });
    const doc = h.get().doc;
    h.get().updateSystems({ water: { persons: 2 } });
    expect(h.get().doc).toBe(doc);
    expect(h.get().history.past).toHaveLength(1);
    h.get().updateSystems({ water: undefined });
    expect('systems' in h.get().doc).toBe(false);
  });

  it('is refused on a view-only layout', () => {
    const store = createEditorStore({ doc: testDoc(), version: 1, readOnly: true });
    expect(store.getState().updateSystems({ water: { persons: 2 } })).toEqual({ ok: false, error: 'This layout is view only.' });
    expect(store.getState().doc.systems).toBeUndefined();
  });
});
