/**
 * Pure edits of the layout document for the editor's store: place, move, resize, rotate,
 * duplicate, delete and patch modules, each returning a new document (the old one is kept
 * untouched for undo). Every length written is rounded to whole millimetres and checked against
 * the document schema itself (lib/layout/schema.ts). Must never touch React, Konva or the network.
 */
import { KINDS, kindSpec } from '@/lib/layout/kinds';
import { firstProblem, moduleSchema, type Arrangement, type Facing, type LayoutDoc, type Module, type ModuleKind } from '@/lib/layout/schema';
import { rectFromExtent, rectsOverlap } from '@/lib/geometry/rect';
import { footprintRect, inArrangement, linedInterior, mountedInside, roomFacing, shareAnArrangement, type Footprint } from '@/lib/layout/bay';
import { snapToStep } from '../geometry/snapping';
import { newModuleId } from './ids';

export class EditError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'EditError';
  }
}

/** Positions are kept inside the schema's signed range; sizes inside its unsigned one. */
const POS_LIMIT = 100_000;
const clampPos = (v: number) => Math.max(-POS_LIMIT, Math.min(POS_LIMIT, Math.round(v)));

/** Round every length and refuse anything the schema would refuse, naming the field. */
export function checkedModule(m: Module): Module {
  const rounded: Module = {
    ...m,
    x: clampPos(m.x),
    y: clampPos(m.y),
    length: Math.round(m.length),
    width: Math.round(m.width),
    elevation: Math.round(m.elevation),
    height: Math.round(m.height),
  };
  const problem = firstProblem(moduleSchema, rounded);
  if (problem) throw new EditError(problem);
  return rounded;
}

function replaceModules(doc: LayoutDoc, changed: Map<string, Module>): LayoutDoc {
  return { ...doc, modules: doc.modules.map((m) => changed.get(m.id) ?? m) };
}

/** A new module of `kind` with the kind's defaults (lib/layout/kinds.ts). */
export function moduleFromKind(kind: ModuleKind, id: string): Module {
  if (!Object.hasOwn(KINDS, kind)) throw new EditError(`unknown module kind "${String(kind)}"`);
  const spec = kindSpec(kind);
  return checkedModule({
    id,
    kind,
    x: 0,
    y: 0,
    length: spec.length,
    width: spec.width,
    elevation: spec.elevation,
    height: spec.height,
    facing: 'front',
    arrangements: [...spec.arrangements],
    ...(spec.mount ? { mount: spec.mount } : {}),
    ...(spec.surfaces ? { surfaces: { ...spec.surfaces } } : {}),
    massKg: spec.massKg,
    ...(spec.props ? { props: { ...spec.props } } : {}),
  } as Module);
}

/**
 * Checks one module of every kind the shelf offers, and throws the results away: zod builds a
 * schema's parser on its first use (a few ms, four times that on a tablet), so the editor calls
 * this while idle and the first module placed does not pay for it.
 */
export function warmModuleCheck(): void {
  for (const kind of Object.keys(KINDS) as ModuleKind[]) moduleFromKind(kind, 'warm-up');
}

/** Where a new module mounted outside the body goes when no point is given: mid-width, behind the rear or mid-bay. */
function outsideSpot(doc: LayoutDoc, m: Module): { x: number; y: number } {
  const y = Math.round((doc.bay.width - m.width) / 2);
  return m.mount === 'rear' ? { x: doc.bay.length, y } : { x: Math.round((doc.bay.length - m.length) / 2), y };
}

/**
 * Where a new module goes when no point is given: the first spot on a 50 mm scan of the lined
 * interior where it overlaps nothing it shares an arrangement with; the middle of the bay if
 * the van is full.
 */
export function freeSpot(doc: LayoutDoc, m: Pick<Module, 'length' | 'width' | 'arrangements' | 'elevation' | 'height'>): { x: number; y: number } {
  const lined = linedInterior(doc);
  const others = doc.modules.filter((o) => shareAnArrangement(o, m) && o.elevation < m.elevation + m.height && m.elevation < o.elevation + o.height);
  const step = 50;
  for (let x = lined.x0; x + m.length <= lined.x1; x += step) {
    for (let y = lined.y0; y + m.width <= lined.y1; y += step) {
      const r = rectFromExtent(x, y, m.length, m.width);
      if (!others.some((o) => rectsOverlap(footprintRect(o), r))) return { x, y };
    }
  }
  return { x: Math.round((doc.bay.length - m.length) / 2), y: Math.round((doc.bay.width - m.width) / 2) };
}

/**
 * Place a new module. With `centre`, it is centred there (snapped to `step`) and pulled inside the
 * lined interior when it fits; without, it goes to the first free spot.
 */
export function placeModule(doc: LayoutDoc, kind: ModuleKind, centre?: { x: number; y: number }, step = 10): { doc: LayoutDoc; module: Module } {
  const taken = new Set(doc.modules.map((m) => m.id));
  const base = moduleFromKind(kind, newModuleId(taken));
  let pos: { x: number; y: number };
  if (centre && Number.isFinite(centre.x) && Number.isFinite(centre.y)) {
    const lined = linedInterior(doc);
    let x = snapToStep(centre.x - base.length / 2, step);
    let y = snapToStep(centre.y - base.width / 2, step);
    if (base.length <= lined.x1 - lined.x0) x = Math.min(Math.max(x, lined.x0), lined.x1 - base.length);
    if (base.width <= lined.y1 - lined.y0) y = Math.min(Math.max(y, lined.y0), lined.y1 - base.width);
    pos = { x, y };
  } else {
    pos = base.mount ? outsideSpot(doc, base) : freeSpot(doc, base);
  }
  // Behind the rear doors means behind the rear of the bay, whatever point it was dropped at.
  if (base.mount === 'rear') pos = { ...pos, x: doc.bay.length };
  // Against a wall, it faces the room from that wall.
  const facing = roomFacing(doc, { ...base, ...pos }) ?? base.facing;
  const placed = checkedModule({ ...base, ...pos, facing });
  if (doc.modules.length >= 5000) throw new EditError('a layout holds at most 5000 modules');
  return { doc: { ...doc, modules: [...doc.modules, placed] }, module: placed };
}

export function moveModules(doc: LayoutDoc, ids: readonly string[], dx: number, dy: number): LayoutDoc {
  const set = new Set(ids);
  const changed = new Map<string, Module>();
  for (const m of doc.modules) if (set.has(m.id)) changed.set(m.id, checkedModule(facingAfterMove(doc, m, { ...m, x: m.x + dx, y: m.y + dy })));
  return replaceModules(doc, changed);
}

/**
 * A module moved so that it now stands against a wall it did not stand against before faces the
 * room from that wall; sliding along a wall, or moving in the open, keeps the facing it has.
 * Outside-mounted modules keep theirs.
 */
function facingAfterMove(doc: LayoutDoc, before: Module, after: Module): Module {
  if (!mountedInside(after)) return after;
  const now = roomFacing(doc, after);
  return now !== null && now !== roomFacing(doc, before) ? { ...after, facing: now } : after;
}

export function resizeModule(doc: LayoutDoc, id: string, rect: Footprint): LayoutDoc {
  const m = doc.modules.find((o) => o.id === id);
  if (!m) throw new EditError(`no module "${id}"`);
  return replaceModules(doc, new Map([[id, checkedModule({ ...m, ...rect })]]));
}

/** Clockwise on the plan as drawn (cab on the left, left wall at the top). */
const CLOCKWISE: Record<Facing, Facing> = { left: 'rear', rear: 'right', right: 'front', front: 'left' };

/** Rotate each module 90° clockwise about its own centre: its footprint swaps, its facing turns. */
export function rotateModules(doc: LayoutDoc, ids: readonly string[]): LayoutDoc {
  const set = new Set(ids);
  const changed = new Map<string, Module>();
  for (const m of doc.modules) {
    if (!set.has(m.id)) continue;
    const cx = m.x + m.length / 2;
    const cy = m.y + m.width / 2;
    changed.set(m.id, checkedModule({ ...m, length: m.width, width: m.length, x: Math.round(cx - m.width / 2), y: Math.round(cy - m.length / 2), facing: CLOCKWISE[m.facing] }));
  }
  return replaceModules(doc, changed);
}

export function deleteModules(doc: LayoutDoc, ids: readonly string[]): LayoutDoc {
  const set = new Set(ids);
  return { ...doc, modules: doc.modules.filter((m) => !set.has(m.id)) };
}

/** Copies sit `offset` mm further rearwards and across; returns the new ids in order. */
export function duplicateModules(doc: LayoutDoc, ids: readonly string[], offset = 50): { doc: LayoutDoc; ids: string[] } {
  const taken = new Set(doc.modules.map((m) => m.id));
  const copies: Module[] = [];
  for (const m of doc.modules) {
    if (!ids.includes(m.id)) continue;
    const id = newModuleId(taken);
    taken.add(id);
    copies.push(checkedModule({ ...m, id, x: m.x + offset, y: m.y + offset, arrangements: [...m.arrangements], ...(m.props ? { props: { ...m.props } } : {}) }));
  }
  if (doc.modules.length + copies.length > 5000) throw new EditError('a layout holds at most 5000 modules');
  return { doc: { ...doc, modules: [...doc.modules, ...copies] }, ids: copies.map((c) => c.id) };
}

/** Replace fields of one module (Details panel). `id` cannot change here. */
export function patchModule(doc: LayoutDoc, id: string, patch: Partial<Omit<Module, 'id'>>): LayoutDoc {
  const m = doc.modules.find((o) => o.id === id);
  if (!m) throw new EditError(`no module "${id}"`);
  const next = { ...m, ...patch, id } as Module;
  // A new kind keeps only the values it declares (a tank's litres mean nothing to a wardrobe).
  if (patch.kind !== undefined && patch.kind !== m.kind && next.props) {
    const declared = kindSpec(next.kind).values;
    const kept = Object.fromEntries(Object.entries(next.props).filter(([k]) => Object.hasOwn(declared, k)));
    next.props = Object.keys(kept).length ? kept : undefined;
  }
  for (const key of Object.keys(next) as (keyof Module)[]) if (next[key] === undefined) delete next[key];
  return replaceModules(doc, new Map([[id, checkedModule(next)]]));
}

/** Add or remove one arrangement from a module's membership; a module keeps at least one. */
export function toggleMembership(doc: LayoutDoc, id: string, arrangement: Arrangement): LayoutDoc {
  const m = doc.modules.find((o) => o.id === id);
  if (!m) throw new EditError(`no module "${id}"`);
  const has = inArrangement(m, arrangement);
  if (has && m.arrangements.length === 1) throw new EditError('a module exists in at least one arrangement');
  const order: Arrangement[] = ['travel', 'lounge', 'sleep'];
  const arrangements = has ? m.arrangements.filter((a) => a !== arrangement) : order.filter((a) => a === arrangement || inArrangement(m, a));
  return patchModule(doc, id, { arrangements });
}
