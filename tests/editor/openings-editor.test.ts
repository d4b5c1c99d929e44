// Openings in the editor: the store's commands (add, edit, move along the wall, hold at the wall's
// end, snap to a module's edge, undo and redo, the keyboard), the plan marks worked by hand, and
// hit testing. The harness bay (tests/editor/harness.ts) is 3400 × 1800 × 1900 mm with 36 mm walls
// (24 + 12), no floor or roof build-up, and one sliding door on the right wall at 150 mm, 1200 mm wide.
import { describe, expect, it } from 'vitest';
import { harness, mod, expectValid } from './harness';
import { dispatchKey } from '@/components/editor/commands/keyboard';
import type { KeyLike } from '@/components/editor/commands/shortcuts';
import type { Opening } from '@/lib/layout/schema';
import { snapAlong, wallTargets } from '@/components/editor/geometry/snapping';
import { openingAt, openingMarks, roofOpeningInside, markHitPoint, ROOF_OPENING_DASH_PX, type PointMark, type RoofMark, type WindowMark } from '@/components/editor/geometry/openingMarks';
import { openingAnnouncement } from '@/components/editor/panels/SelectionAnnouncer';

const key = (k: string, over: Partial<KeyLike> = {}): KeyLike => ({ key: k, ctrlKey: false, metaKey: false, shiftKey: false, altKey: false, ...over });
const openingOf = (h: ReturnType<typeof harness>, id: string) => h.get().doc.bay.openings.find((o) => o.id === id) as Opening;

/** A harness with 1 screen px = 1 mm, so the snap reach (8 px) is 8 mm. */
function atScale1(modules = [] as ReturnType<typeof mod>[]) {
  const h = harness(modules);
  h.get().setViewport({ ...h.get().viewport, scale: 1 });
  return h;
}

describe('adding openings', () => {
  it('adds a window in the middle of the left wall with the invented defaults, selected, as one undo step', () => {
    const h = harness();
    const r = h.get().addOpening('window');
    expect(r.ok).toBe(true);
    // (3400 − 700) / 2 = 1350, already on the 50 mm search step.
    expect(openingOf(h, r.id!)).toMatchObject({ type: 'window', wall: 'left', position: 1350, width: 700, height: 450, sillHeight: 900, opens: true });
    expect(h.get().openingSelection).toBe(r.id);
    expect(h.get().selection).toEqual([]);
    expect(h.get().history.past).toHaveLength(1);
    expectValid(h.get().doc);
  });

  it('puts a second window beside the first, not on it', () => {
    const h = harness();
    h.get().addOpening('window');
    const r = h.get().addOpening('window');
    // The first holds 1350…2050; stepping 50 mm out from 1350, the first clear start is 1350 + 14 × 50 = 2050.
    expect(openingOf(h, r.id!)).toMatchObject({ wall: 'left', position: 2050 });
    expectValid(h.get().doc);
  });

  it('adds roof openings along the roof’s middle, clear of each other', () => {
    const h = harness();
    const a = h.get().addOpening('vent');
    const b = h.get().addOpening('skylight');
    // Vent 400 × 400 at x = 4 × 50 = 200, y = (1800 − 400) / 2 = 700.
    expect(openingOf(h, a.id!)).toMatchObject({ type: 'roof-opening', kind: 'vent', x: 200, y: 700, length: 400, width: 400 });
    // Skylight 700 × 500: the vent ends at 600, one 50 mm step clear → 650; y = (1800 − 500) / 2 = 650.
    expect(openingOf(h, b.id!)).toMatchObject({ kind: 'skylight', x: 650, y: 650, length: 700, width: 500 });
  });

  it('adds body points: the heater exhaust under the floor, the fuel filler on the left wall', () => {
    const h = harness();
    const ex = h.get().addOpening('heater-exhaust');
    const inl = h.get().addOpening('heater-intake');
    const ff = h.get().addOpening('fuel-filler');
    // Under the floor from a third of the length: 3400 / 3 = 1133 → 1150 on the 50 mm step; 400 from the left side.
    expect(openingOf(h, ex.id!)).toMatchObject({ type: 'body-point', kind: 'heater-exhaust', wall: 'underside', position: 1150, across: 400, height: 0 });
    // The intake keeps 300 mm from the exhaust: 1150 + 300 = 1450.
    expect(openingOf(h, inl.id!)).toMatchObject({ wall: 'underside', position: 1450 });
    expect(openingOf(h, ff.id!)).toMatchObject({ kind: 'fuel-filler', wall: 'left', position: 300, height: 700 });
    expectValid(h.get().doc);
  });
});

describe('editing and deleting openings', () => {
  it('changes a field as one undo step, and undo and redo bring it back with the opening selected', () => {
    const h = harness();
    const id = h.get().addOpening('window').id!;
    expect(h.get().updateOpening(id, { position: 400 }).ok).toBe(true);
    expect(openingOf(h, id)).toMatchObject({ position: 400 });
    expect(h.get().history.past).toHaveLength(2);
    h.get().undo();
    expect(openingOf(h, id)).toMatchObject({ position: 1350 });
    expect(h.get().openingSelection).toBe(id);
    h.get().redo();
    expect(openingOf(h, id)).toMatchObject({ position: 400 });
    h.get().undo();
    h.get().undo();
    expect(h.get().doc.bay.openings).toEqual([]);
    expect(h.get().openingSelection).toBeNull();
    h.get().redo();
    expect(openingOf(h, id)).toMatchObject({ position: 1350 });
    expect(h.get().openingSelection).toBe(id);
  });

  it('refuses a window that would run past the end of its wall, with the schema’s words, and leaves no undo step', () => {
    const h = harness();
    const id = h.get().addOpening('window').id!;
    // 3000 + 700 = 3700 > 3400, the left wall's length.
    const r = h.get().updateOpening(id, { position: 3000 });
    expect(r).toEqual({ ok: false, error: 'window runs past the end of the left wall (3400 mm)' });
    expect(openingOf(h, id)).toMatchObject({ position: 1350 });
    expect(h.get().history.past).toHaveLength(1);
  });

  it('removes the optional blind frame depth when set to undefined, and refuses a change of type', () => {
    const h = harness();
    const id = h.get().addOpening('window').id!;
    h.get().updateOpening(id, { frameDepth: 40 });
    expect(openingOf(h, id)).toMatchObject({ frameDepth: 40 });
    h.get().updateOpening(id, { frameDepth: undefined });
    expect('frameDepth' in openingOf(h, id)).toBe(false);
    expect(h.get().updateOpening(id, { type: 'roof-opening' }).ok).toBe(false);
  });

  it('deletes the selected opening with the Delete key, as one undo step', () => {
    const h = harness();
    const id = h.get().addOpening('vent').id!;
    const r = dispatchKey(key('Delete'), h.get(), false);
    expect(r.command?.id).toBe('edit.delete');
    expect(h.get().doc.bay.openings).toEqual([]);
    expect(h.get().openingSelection).toBeNull();
    h.get().undo();
    expect(openingOf(h, id)).toMatchObject({ kind: 'vent' });
  });

  it('still refuses to delete a door that holds a window', () => {
    const h = harness();
    const id = h.get().addOpening('window').id!;
    expect(h.get().updateOpening(id, { wall: 'door', door: 'slide', position: 100 }).ok).toBe(true);
    const r = h.get().updateBay({ doors: [] });
    expect(r.ok).toBe(false);
    expect(h.get().doc.bay.doors).toHaveLength(1);
  });

  it('selecting a module clears the opening selection and Escape clears it too', () => {
    const h = harness([mod('a')]);
    h.get().addOpening('window');
    h.get().select(['a']);
    expect(h.get().openingSelection).toBeNull();
    const id = h.get().addOpening('fan').id!;
    expect(h.get().openingSelection).toBe(id);
    dispatchKey(key('Escape'), h.get(), false);
    expect(h.get().openingSelection).toBeNull();
  });

  it('a finding that names only openings selects the first and highlights them all', () => {
    const h = harness([mod('a')]);
    const w = h.get().addOpening('window').id!;
    const ex = h.get().addOpening('heater-exhaust').id!;
    h.get().setHighlight([], [ex, w]);
    expect(h.get().openingSelection).toBe(ex);
    expect(h.get().openingHighlight).toEqual([ex, w]);
    // One naming a module and an opening selects the module and halos the opening.
    h.get().setHighlight(['a'], [w]);
    expect(h.get().selection).toEqual(['a']);
    expect(h.get().openingSelection).toBeNull();
    expect(h.get().openingHighlight).toEqual([w]);
  });
});

describe('moving openings', () => {
  it('arrow keys move a window along its side wall only: 1 mm, Shift 10 mm; up and down do nothing', () => {
    const h = harness();
    const id = h.get().addOpening('window').id!;
    dispatchKey(key('ArrowRight'), h.get(), false);
    expect(openingOf(h, id)).toMatchObject({ position: 1351 });
    dispatchKey(key('ArrowLeft', { shiftKey: true }), h.get(), false);
    expect(openingOf(h, id)).toMatchObject({ position: 1341 });
    const before = h.get().doc;
    dispatchKey(key('ArrowDown'), h.get(), false);
    expect(h.get().doc).toBe(before);
    // The burst of nudges is one undo step: undo goes back to where it was added.
    h.get().undo();
    expect(openingOf(h, id)).toMatchObject({ position: 1350 });
  });

  it('on the rear wall the along-wall keys are up and down (the rear wall runs left to right across the van)', () => {
    const h = harness();
    const id = h.get().addOpening('window').id!;
    h.get().updateOpening(id, { wall: 'rear', position: 500 });
    dispatchKey(key('ArrowDown', { shiftKey: true }), h.get(), false);
    expect(openingOf(h, id)).toMatchObject({ position: 510 });
    const before = h.get().doc;
    dispatchKey(key('ArrowRight'), h.get(), false);
    expect(h.get().doc).toBe(before);
  });

  it('a nudge stops at the wall’s end: a 700 mm window on the 3400 mm left wall goes no further than 2700', () => {
    const h = harness();
    const id = h.get().addOpening('window').id!;
    h.get().nudgeSelection(5000, 0);
    expect(openingOf(h, id)).toMatchObject({ position: 2700 });
    h.get().nudgeSelection(-9000, 0);
    expect(openingOf(h, id)).toMatchObject({ position: 0 });
  });

  it('a point under the floor and a roof opening move in plan, held inside the bay', () => {
    const h = harness();
    const ex = h.get().addOpening('heater-exhaust').id!;
    h.get().nudgeSelection(10, 20);
    expect(openingOf(h, ex)).toMatchObject({ position: 1160, across: 420 });
    const v = h.get().addOpening('vent').id!;
    h.get().nudgeSelection(-500, 9000);
    // x 200 − 500 → held at 0; y 700 + 9000 → held at 1800 − 400 = 1400.
    expect(openingOf(h, v)).toMatchObject({ x: 0, y: 1400 });
  });

  it('a drag moves a window along its wall only, snaps its end to a module’s edge, and commits as one undo step', () => {
    // A module standing on the left lining (y = 36) from x = 1000 to 1400.
    const h = atScale1([mod('a', { x: 1000, y: 36, length: 400, width: 400 })]);
    const id = h.get().addOpening('window').id!;
    h.get().beginOpeningMove(id);
    // 1350 − 345 = 1005 is within 8 mm of the module's edge at 1000 → 1000; the 500 mm across the wall is ignored.
    h.get().dragTo(-345, 500);
    const g = h.get().gesture;
    expect(g?.kind === 'opening' && g.preview.opening).toMatchObject({ wall: 'left', position: 1000 });
    expect(g?.kind === 'opening' && g.preview.guides).toEqual([{ axis: 'x', at: 1000, from: -100, to: 300 }]);
    expect(openingOf(h, id)).toMatchObject({ position: 1350 }); // nothing written until the drag ends
    expect(h.get().commitGesture().ok).toBe(true);
    expect(openingOf(h, id)).toMatchObject({ position: 1000 });
    expect(h.get().history.past).toHaveLength(2);
    h.get().undo();
    expect(openingOf(h, id)).toMatchObject({ position: 1350 });
  });

  it('a drag away from any edge lands on the 10 mm step, and stops at the wall’s end', () => {
    const h = atScale1();
    const id = h.get().addOpening('window').id!;
    h.get().beginOpeningMove(id);
    h.get().dragTo(123, 0); // 1473 → 1470
    let g = h.get().gesture;
    expect(g?.kind === 'opening' && g.preview.opening).toMatchObject({ position: 1470 });
    h.get().dragTo(9000, 0);
    g = h.get().gesture;
    expect(g?.kind === 'opening' && g.preview.opening).toMatchObject({ position: 2700 });
    h.get().cancelGesture();
    expect(openingOf(h, id)).toMatchObject({ position: 1350 });
    expect(h.get().history.past).toHaveLength(1);
  });
});

describe('moving openings: in a door and overhead', () => {
  it('a window in a door drags along the door’s wall and stops at the door’s end, not the wall’s', () => {
    const h = atScale1();
    const id = h.get().addOpening('window').id!;
    h.get().updateOpening(id, { wall: 'door', door: 'slide', position: 100, width: 600 });
    h.get().beginOpeningMove(id);
    h.get().dragTo(1000, 0);
    // The sliding door is 1200 mm wide: a 600 mm window goes no further than 1200 − 600 = 600 into it.
    h.get().commitGesture();
    expect(openingOf(h, id)).toMatchObject({ wall: 'door', door: 'slide', position: 600 });
  });

  it('a roof opening drags in plan and snaps its edge to a module’s edge', () => {
    const h = atScale1([mod('a', { x: 1000, y: 500, length: 400, width: 400 })]);
    const id = h.get().addOpening('vent').id!; // 200…600 × 700…1100
    h.get().beginOpeningMove(id);
    // x: 595…995, its rear edge 5 mm from the module's front edge at 1000 → x = 600; y: 700 is on the 10 mm step.
    h.get().dragTo(395, 0);
    h.get().commitGesture();
    expect(openingOf(h, id)).toMatchObject({ x: 600, y: 700 });
  });
});

describe('arrangement independence', () => {
  it('switching the arrangement never changes the openings nor drops the selected one', () => {
    const h = harness([mod('bed', { arrangements: ['sleep'] })]);
    h.get().addOpening('window');
    h.get().addOpening('vent');
    const id = h.get().addOpening('gas-drop-vent').id!;
    const openings = h.get().doc.bay.openings;
    const marks = openingMarks(h.get().doc, 1);
    for (const a of ['travel', 'sleep', 'lounge'] as const) {
      h.get().setArrangement(a);
      expect(h.get().doc.bay.openings).toBe(openings);
      expect(h.get().openingSelection).toBe(id);
      expect(openingMarks(h.get().doc, 1)).toEqual(marks);
    }
  });
});

describe('snapping along a wall', () => {
  const opts = { enabled: true, step: 10 as const, threshold: 8 };
  it('sticks the near or the far end to a target within reach, else lands on the step, and holds inside min…max', () => {
    // Span 1350…2050 moved −345 → 1005…1705: 1005 is 5 mm from 1000.
    expect(snapAlong(1350, 700, -345, [0, 1000, 3400], opts, 0, 2700)).toEqual({ start: 1000, snapped: 1000 });
    // Moved +1343 → 2693…3393: the far end is 7 mm from 3400 → start 2700.
    expect(snapAlong(1350, 700, 1343, [0, 3400], opts, 0, 2700)).toEqual({ start: 2700, snapped: 3400 });
    // No target within 8 mm: 1350 + 123 = 1473 → 1470.
    expect(snapAlong(1350, 700, 123, [0, 3400], opts, 0, 2700)).toEqual({ start: 1470, snapped: null });
    // Past the end: held at 2700, its far end on the wall's end 3400.
    expect(snapAlong(1350, 700, 5000, [0, 3400], opts, 0, 2700)).toEqual({ start: 2700, snapped: 3400 });
    // Moving freely: whole mm, no step.
    expect(snapAlong(1350, 700, 3.4, [1354], { ...opts, enabled: false }, 0, 2700)).toEqual({ start: 1353, snapped: null });
  });

  it('a wall’s targets are its ends, its doors’ edges and the edges of modules standing near it', () => {
    const h = harness([mod('near', { x: 1000, y: 1764 - 400, length: 400, width: 400 }), mod('far', { x: 2000, y: 36, length: 300, width: 300 })]);
    // Right wall: 0, the door 150…1350, the module by the right lining 1000…1400, not the one by the left wall.
    expect(wallTargets(h.get().doc, 'lounge', 'right')).toEqual([0, 150, 1000, 1350, 1400, 3400]);
  });
});

describe('plan marks, worked by hand', () => {
  it('a window on the left wall is the wall’s 36 mm thickness over the glass, jambs at its ends, panes at 12 and 24 mm', () => {
    const h = harness();
    h.get().addOpening('window'); // left wall, 1350…2050
    const [m] = openingMarks(h.get().doc, 1) as WindowMark[];
    expect(m.rect).toEqual({ x0: 1350, x1: 2050, y0: 0, y1: 36 });
    expect(m.jambs).toEqual([{ x0: 1350, y0: 0, x1: 1350, y1: 36 }, { x0: 2050, y0: 0, x1: 2050, y1: 36 }]);
    expect(m.panes).toEqual([{ x0: 1350, y0: 12, x1: 2050, y1: 12 }, { x0: 1350, y0: 24, x1: 2050, y1: 24 }]);
  });

  it('on the right wall and the rear wall the symbol is measured in from the bare outer face', () => {
    const h = harness();
    const a = h.get().addOpening('window').id!;
    h.get().updateOpening(a, { wall: 'right', position: 2000 });
    const b = h.get().addOpening('window').id!;
    h.get().updateOpening(b, { wall: 'rear', position: 550 });
    const [right, rear] = openingMarks(h.get().doc, 1) as WindowMark[];
    // Right: outer face y = 1800, lining at 1800 − 36 = 1764; panes at 1800 − 12 = 1788 and 1800 − 24 = 1776.
    expect(right.rect).toEqual({ x0: 2000, x1: 2700, y0: 1764, y1: 1800 });
    expect(right.panes.map((p) => p.y0)).toEqual([1788, 1776]);
    // Rear: outer face x = 3400, lining at 3364; the glass runs 550…1250 across the van; panes at 3388 and 3376.
    expect(rear.rect).toEqual({ x0: 3364, x1: 3400, y0: 550, y1: 1250 });
    expect(rear.panes.map((p) => p.x0)).toEqual([3388, 3376]);
    expect(rear.jambs).toEqual([{ x0: 3364, y0: 550, x1: 3400, y1: 550 }, { x0: 3364, y0: 1250, x1: 3400, y1: 1250 }]);
  });

  it('a window in a door sits on the door’s opening: the sliding door starts at 150, so 100 mm into it is 250 on the wall', () => {
    const h = harness();
    const id = h.get().addOpening('window').id!;
    h.get().updateOpening(id, { wall: 'door', door: 'slide', position: 100, width: 600 });
    const [m] = openingMarks(h.get().doc, 1) as WindowMark[];
    expect(m.wall).toBe('right');
    expect(m.rect).toEqual({ x0: 250, x1: 850, y0: 1764, y1: 1800 });
  });

  it('with no wall build-up the symbol is still 8 screen px thick: 16 mm at 2 mm per px', () => {
    const h = harness();
    h.get().updateBuildUp({ ...h.get().doc.buildUp, walls: [] });
    h.get().addOpening('window');
    const [m] = openingMarks(h.get().doc, 2) as WindowMark[];
    expect(m.rect.y1 - m.rect.y0).toBe(16);
  });

  it('a roof opening is its rectangle with both diagonals, in long dashes unlike the chain line of outside modules', () => {
    const h = harness();
    h.get().addOpening('fan'); // 200…600 × 700…1100
    const [m] = openingMarks(h.get().doc, 1) as RoofMark[];
    expect(m).toMatchObject({ kind: 'fan', word: 'fan', rect: { x0: 200, x1: 600, y0: 700, y1: 1100 } });
    expect(m.cross).toEqual([{ x0: 200, y0: 700, x1: 600, y1: 1100 }, { x0: 200, y0: 1100, x1: 600, y1: 700 }]);
    // The outside-module chain line is long–short–dot (moduleSymbols.ts: 9, 2.5, 1.5, 2.5 px); this is two numbers.
    expect([...ROOF_OPENING_DASH_PX]).toEqual([14, 4]);
  });

  it('a body point on a wall is marked 12 px outside the wall line; one under the floor on the point itself', () => {
    const h = harness();
    h.get().addOpening('fuel-filler'); // left wall at 300
    h.get().addOpening('heater-exhaust'); // under the floor at 1150, 400 across
    const [ff, ex] = openingMarks(h.get().doc, 0.5) as PointMark[];
    // 12 px × 0.5 mm/px = 6 mm outside the left wall (y = 0).
    expect(ff).toMatchObject({ underside: false, at: { x: 300, y: -6 }, foot: { x: 300, y: 0 }, word: 'fuel filler' });
    expect(ex).toMatchObject({ underside: true, at: { x: 1150, y: 400 }, word: 'exhaust' });
  });
});

describe('hit testing openings', () => {
  it('finds a window by its symbol, a body point by its marker, a roof opening by its outline; the inside of a roof opening is asked for separately', () => {
    const h = harness();
    const w = h.get().addOpening('window').id!; // left, 1350…2050, 0…36
    const ff = h.get().addOpening('fuel-filler').id!; // marker at (300, −12) at 1 mm/px
    const v = h.get().addOpening('vent').id!; // 200…600 × 700…1100
    const marks = openingMarks(h.get().doc, 1);
    expect(openingAt(marks, 1700, 20, 1, 5)?.id).toBe(w);
    expect(openingAt(marks, 1700, 40, 1, 5)?.id).toBe(w); // 4 mm inside the lining, within the 5 mm slop
    expect(openingAt(marks, 1700, 50, 1, 5)).toBeUndefined();
    expect(openingAt(marks, 302, -10, 1, 5)?.id).toBe(ff); // 2.8 mm from the marker's centre, radius 4
    expect(openingAt(marks, 202, 900, 1, 5)?.id).toBe(v); // 2 mm inside its front edge (the outline reaches 3 px = 3 mm)
    // A roof opening's outline reaches 3 px whatever the slop: 5 mm off its rear edge (x = 600) at 1 mm/px misses even with 14 mm of slop.
    expect(openingAt(marks, 605, 900, 1, 14)).toBeUndefined();
    expect(openingAt(marks, 400, 900, 1, 5)).toBeUndefined(); // its middle: left to the modules first
    expect(roofOpeningInside(marks, 400, 900)?.id).toBe(v);
    // Each mark's click point hits its own mark.
    for (const m of marks) expect(openingAt(marks, markHitPoint(m).x, markHitPoint(m).y, 1, 5)?.id).toBe(m.id);
  });
});

describe('announcing the selected opening', () => {
  it('says what it is and where, in the person’s units', () => {
    const h = harness();
    const id = h.get().addOpening('window').id!;
    expect(openingAnnouncement(h.get().doc.bay, openingOf(h, id), 'mm')).toBe(
      'Window in the left wall selected: 1350 mm from the left wall’s front end, sill 900 mm above the floor, 700 mm wide by 450 mm high, opens.',
    );
  });
});
