/**
 * Pure edits of the bay's openings (windows, roof openings, body points) for the editor's store:
 * add one at a free spot, patch, move (along its wall for a window or a body point, in plan for a
 * roof opening, held inside what it belongs to) and delete, each returning a new document. Every
 * write is checked against the bay schema itself (`baySchema`, whose `openingProblem` keeps each
 * opening inside its wall, door or roof), so there is no second copy of the rules here.
 * Openings belong to the bay, not to an arrangement: nothing here reads the arrangement.
 * Must never touch React, Konva or the network.
 */
import { baySchema, firstProblem, type BodyPoint, type LayoutDoc, type Opening, type RoofOpening, type WindowOpening } from '@/lib/layout/schema';
import { rectsOverlap } from '@/lib/geometry/rect';
import { roofOpeningRect, wallLength, type BayWall } from '@/lib/layout/openings';
import { buildUpThickness } from '@/lib/layout/bay';
import { EditError } from './moduleEdits';
import { newModuleId } from './ids';

/** What the Openings group on the Parts shelf adds, in the order it lists them. */
export const OPENING_PRESETS = ['window', 'vent', 'fan', 'skylight', 'heater-exhaust', 'heater-intake', 'gas-drop-vent', 'fuel-filler'] as const;
export type OpeningPreset = (typeof OPENING_PRESETS)[number];

/** The words on the shelf's buttons (trade words, DEVELOPERS.md glossary). */
export const OPENING_PRESET_WORDS: Record<OpeningPreset, string> = {
  window: 'Window',
  vent: 'Roof vent',
  fan: 'Roof fan',
  skylight: 'Skylight',
  'heater-exhaust': 'Heater exhaust',
  'heater-intake': 'Heater intake',
  'gas-drop-vent': 'Gas drop vent',
  'fuel-filler': 'Fuel filler',
};

/**
 * Invented starting sizes (common practice, no source: a typical side window and roof-light size
 * class, not any maker's part). The person types the real ones in Details.
 */
export const OPENING_DEFAULTS = {
  window: { width: 700, height: 450, sillHeight: 900 },
  vent: { length: 400, width: 400, frameHeight: 60 },
  fan: { length: 400, width: 400, frameHeight: 80 },
  skylight: { length: 700, width: 500, frameHeight: 60 },
  /** Body points on a wall stand this high above the bare floor; the fuel filler sits higher. */
  pointHeight: 300,
  fillerHeight: 700,
  /** A new body point keeps this far from any other on the same wall (so two are never stacked). */
  pointSpacing: 300,
} as const;

/** How far a search for a free spot steps (mm). */
const SEARCH_STEP = 50;

/** Check a bay with its openings against the schema; the first problem in words, or null. */
export function openingsProblem(doc: LayoutDoc, openings: Opening[]): string | null {
  const problem = firstProblem(baySchema, { ...doc.bay, openings });
  if (!problem) return null;
  // "openings.3.width: window runs past…" → "window runs past…"; other bay fields keep their path.
  return problem.replace(/^openings\.\d+\.?[A-Za-z]*: /, '');
}

function withOpenings(doc: LayoutDoc, openings: Opening[]): LayoutDoc {
  const problem = openingsProblem(doc, openings);
  if (problem) throw new EditError(problem);
  return { ...doc, bay: { ...doc.bay, openings } };
}

function takenIds(doc: LayoutDoc): Set<string> {
  return new Set([...doc.bay.openings.map((o) => o.id), ...doc.modules.map((m) => m.id), ...doc.bay.doors.map((d) => d.id)]);
}

function newOpeningId(doc: LayoutDoc): string {
  // Prefixed 'o' so an opening's id never reads like a module's.
  return `o${newModuleId(takenIds(doc)).slice(1)}`;
}

/** The wall a window or body point lies on, following a window in a door to the door's wall; null for the underside or a roof opening. */
export function wallOfOpening(doc: Pick<LayoutDoc, 'bay'>, o: Opening): BayWall | null {
  if (o.type === 'roof-opening') return null;
  if (o.type === 'window' && o.wall === 'door') return doc.bay.doors.find((d) => d.id === o.door)?.wall ?? null;
  if (o.wall === 'underside') return null;
  return o.wall as BayWall;
}

/**
 * How far along its wall (or door) a window or a body point may run: [min, max] of `position`.
 * A window's glass stays inside the wall or the door; a body point is a point, so it may reach
 * the wall's end.
 */
export function positionRange(doc: Pick<LayoutDoc, 'bay'>, o: WindowOpening | BodyPoint): { min: number; max: number } {
  if (o.type === 'window') {
    const along = o.wall === 'door' ? (doc.bay.doors.find((d) => d.id === o.door)?.width ?? 0) : wallLength(doc.bay, o.wall);
    return { min: 0, max: Math.max(0, along - o.width) };
  }
  const along = o.wall === 'underside' ? doc.bay.length : wallLength(doc.bay, o.wall);
  return { min: 0, max: along };
}

const clamp = (v: number, lo: number, hi: number) => Math.max(lo, Math.min(hi, Math.round(v)));

/** Spans already taken along a wall (doors and windows), to find a free place for a new window. */
function takenAlong(doc: LayoutDoc, wall: BayWall): [number, number][] {
  const spans: [number, number][] = doc.bay.doors.filter((d) => d.wall === wall).map((d) => [d.offset, d.offset + d.width]);
  for (const o of doc.bay.openings) {
    if (o.type !== 'window') continue;
    if (o.wall === wall) spans.push([o.position, o.position + o.width]);
  }
  return spans;
}

function freeWindow(doc: LayoutDoc): WindowOpening {
  const { floorT, roofT } = buildUpThickness(doc);
  const d = OPENING_DEFAULTS.window;
  // Fit the default into a low bay: the glass stays under the roof.
  const height = Math.max(1, Math.min(d.height, doc.bay.height - floorT - roofT - 200));
  const sillHeight = Math.max(0, Math.min(d.sillHeight, doc.bay.height - floorT - height - 50));
  for (const wall of ['left', 'right', 'rear'] as const) {
    const len = wallLength(doc.bay, wall);
    const width = Math.min(d.width, len);
    const spans = takenAlong(doc, wall);
    // The middle of a side wall first (where a window usually goes), then outwards.
    const start = wall === 'rear' ? Math.round((len - width) / 2) : Math.round((len - width) / 2 / SEARCH_STEP) * SEARCH_STEP;
    const tries: number[] = [start];
    for (let k = 1; k * SEARCH_STEP <= len; k++) tries.push(start + k * SEARCH_STEP, start - k * SEARCH_STEP);
    for (const pos of tries) {
      if (pos < 0 || pos + width > len) continue;
      if (spans.some(([a, b]) => pos < b && pos + width > a)) continue;
      return { id: '', type: 'window', wall, position: pos, sillHeight, width, height, opens: true };
    }
  }
  return { id: '', type: 'window', wall: 'left', position: 0, sillHeight, width: Math.min(d.width, doc.bay.length), height, opens: true };
}

function freeRoofOpening(doc: LayoutDoc, kind: RoofOpening['kind']): RoofOpening {
  const d = OPENING_DEFAULTS[kind];
  const length = Math.min(d.length, doc.bay.length);
  const width = Math.min(d.width, doc.bay.width);
  const y = Math.round((doc.bay.width - width) / 2);
  const taken = doc.bay.openings.filter((o): o is RoofOpening => o.type === 'roof-opening').map(roofOpeningRect);
  // Along the roof's middle line, from the front, clear of the other roof openings by a step.
  for (let x = SEARCH_STEP * 4; x + length <= doc.bay.length; x += SEARCH_STEP) {
    const r = { x0: x - SEARCH_STEP, y0: y, x1: x + length + SEARCH_STEP, y1: y + width };
    if (!taken.some((t) => rectsOverlap(t, r))) return { id: '', type: 'roof-opening', kind, x, y, length, width, frameHeight: d.frameHeight };
  }
  return { id: '', type: 'roof-opening', kind, x: 0, y, length, width, frameHeight: d.frameHeight };
}

function freeBodyPoint(doc: LayoutDoc, kind: BodyPoint['kind']): BodyPoint {
  // Invented class-typical places: the fuel filler on the left wall near the front; the heater's
  // exhaust and intake and the gas locker's drop vent through the floor.
  const wall: BodyPoint['wall'] = kind === 'fuel-filler' ? 'left' : 'underside';
  const height = kind === 'fuel-filler' ? Math.min(OPENING_DEFAULTS.fillerHeight, doc.bay.height) : 0;
  const across = wall === 'underside' ? Math.round(Math.min(400, doc.bay.width / 2)) : undefined;
  const others = doc.bay.openings.filter((o): o is BodyPoint => o.type === 'body-point' && o.wall === wall);
  const len = wall === 'underside' ? doc.bay.length : wallLength(doc.bay, wall);
  const first = kind === 'fuel-filler' ? 300 : Math.round(len / 3 / SEARCH_STEP) * SEARCH_STEP;
  for (let pos = first; pos <= len; pos += SEARCH_STEP) {
    if (others.every((p) => Math.abs(p.position - pos) >= OPENING_DEFAULTS.pointSpacing)) {
      return { id: '', type: 'body-point', kind, wall, position: pos, height, ...(across !== undefined ? { across } : {}) };
    }
  }
  return { id: '', type: 'body-point', kind, wall, position: 0, height, ...(across !== undefined ? { across } : {}) };
}

/** A new opening of the preset's kind at a free spot, added to the bay. */
export function placeOpening(doc: LayoutDoc, preset: OpeningPreset): { doc: LayoutDoc; opening: Opening } {
  const base: Opening =
    preset === 'window' ? freeWindow(doc)
    : preset === 'vent' || preset === 'fan' || preset === 'skylight' ? freeRoofOpening(doc, preset)
    : freeBodyPoint(doc, preset);
  const opening = { ...base, id: newOpeningId(doc) } as Opening;
  return { doc: withOpenings(doc, [...doc.bay.openings, opening]), opening };
}

const LENGTH_KEYS = ['position', 'sillHeight', 'width', 'height', 'frameDepth', 'x', 'y', 'length', 'frameHeight', 'across'] as const;

/**
 * Change one opening's fields (lengths rounded to whole mm). A patch that changes what kind of
 * thing it is (`type`) or its id is refused. `undefined` removes an optional field.
 */
export function patchOpening(doc: LayoutDoc, id: string, patch: Record<string, unknown>): LayoutDoc {
  const i = doc.bay.openings.findIndex((o) => o.id === id);
  if (i < 0) throw new EditError('That opening is no longer in the layout.');
  if ('type' in patch || 'id' in patch) throw new EditError('An opening keeps its type and id.');
  const next: Record<string, unknown> = { ...doc.bay.openings[i], ...patch };
  for (const k of Object.keys(next)) if (next[k] === undefined) delete next[k];
  for (const k of LENGTH_KEYS) if (typeof next[k] === 'number') next[k] = Math.round(next[k] as number);
  const openings = doc.bay.openings.slice();
  openings[i] = next as Opening;
  return withOpenings(doc, openings);
}

export function deleteOpening(doc: LayoutDoc, id: string): LayoutDoc {
  if (!doc.bay.openings.some((o) => o.id === id)) return doc;
  return withOpenings(doc, doc.bay.openings.filter((o) => o.id !== id));
}

/**
 * An opening moved by (dx, dy) in plan mm: a window or a body point on a wall moves along that
 * wall only (x for a side wall, y for the rear wall; the other axis is ignored) and stops at the
 * wall's (or its door's) end; a body point on the underside and a roof opening move in plan and
 * stop at the bay's sides. Returns the opening, not yet written.
 */
export function movedOpening(doc: Pick<LayoutDoc, 'bay'>, o: Opening, dx: number, dy: number): Opening {
  if (o.type === 'roof-opening') {
    return { ...o, x: clamp(o.x + dx, 0, Math.max(0, doc.bay.length - o.length)), y: clamp(o.y + dy, 0, Math.max(0, doc.bay.width - o.width)) };
  }
  const range = positionRange(doc, o);
  if (o.type === 'body-point' && o.wall === 'underside') {
    return { ...o, position: clamp(o.position + dx, range.min, range.max), across: clamp((o.across ?? 0) + dy, 0, doc.bay.width) };
  }
  const wall = wallOfOpening(doc, o);
  const along = wall === 'rear' ? dy : dx;
  return { ...o, position: clamp(o.position + along, range.min, range.max) } as Opening;
}

/** Move one opening by (dx, dy) in plan (see `movedOpening`), written into the document. */
export function moveOpening(doc: LayoutDoc, id: string, dx: number, dy: number): LayoutDoc {
  const o = doc.bay.openings.find((p) => p.id === id);
  if (!o) throw new EditError('That opening is no longer in the layout.');
  const moved = movedOpening(doc, o, dx, dy);
  if (JSON.stringify(moved) === JSON.stringify(o)) return doc;
  return withOpenings(doc, doc.bay.openings.map((p) => (p.id === id ? moved : p)));
}

/** Put a moved opening (a committed drag) in place of the one with its id. */
export function replaceOpening(doc: LayoutDoc, opening: Opening): LayoutDoc {
  return withOpenings(doc, doc.bay.openings.map((p) => (p.id === opening.id ? opening : p)));
}
