/**
 * The pieces a proposal is made of, in the bay's frame: a module as the document writes it (one
 * builder, so every proposal module has an id, a role and its arrangements), the surfaces each
 * role gives a module per arrangement (kept in one function, `surfacesOf`), and the bay's keep-clear zones (door entries, wheel arches).
 * Pure: must never import React, Next, the database or the services.
 */
import type { Rect } from '../geometry/rect';
import type { Arrangement, Bay, Facing, ModuleKind, SurfaceChoice, Surfaces } from '../layout/schema';
import type { LayoutDocInput } from '../layout/document';

type ModuleInput = LayoutDocInput['modules'][number];

/** What a module is for in a proposal; decides its surface and its words. */
export type Role =
  | 'bed' | 'bench-bed' | 'infill' | 'bench' | 'table' | 'seat'
  | 'counter' | 'sink' | 'hob' | 'fridge' | 'gas' | 'wardrobe' | 'locker'
  | 'fresh' | 'grey' | 'electrics' | 'heater' | 'toilet' | 'shower' | 'ladder';

/**
 * The one place a proposal decides what a module's top is used as, per arrangement it is in: what a
 * person lies, sits or works on. Bench seats that make up into the bed are seats by day (travel,
 * lounge) and sleeping surface by night, as the trade builds them.
 */
export function surfacesOf(role: Role, arrangements: readonly Arrangement[]): Surfaces | undefined {
  const day = (surface: SurfaceChoice): Surfaces => Object.fromEntries(arrangements.map((a) => [a, surface]));
  switch (role) {
    case 'bed':
    case 'infill':
      return day('sleep');
    case 'bench-bed':
      return Object.fromEntries(arrangements.map((a) => [a, a === 'sleep' ? 'sleep' : 'seat']));
    case 'bench':
    case 'seat':
      return day('seat');
    case 'counter':
    case 'sink':
    case 'table':
      return day('counter');
    default:
      return undefined;
  }
}

export const ALL: Arrangement[] = ['travel', 'lounge', 'sleep'];

export interface Part {
  role: Role;
  kind: ModuleKind;
  label: string;
  x: number;
  y: number;
  length: number;
  width: number;
  elevation: number;
  height: number;
  facing: Facing;
  arrangements: Arrangement[];
  props?: Record<string, number | boolean | string>;
}

export function toModule(p: Part, index: number): ModuleInput {
  const surfaces = surfacesOf(p.role, p.arrangements);
  return {
    id: `${p.role}-${index + 1}`,
    label: p.label,
    kind: p.kind,
    x: Math.round(p.x),
    y: Math.round(p.y),
    length: Math.round(p.length),
    width: Math.round(p.width),
    elevation: Math.round(p.elevation),
    height: Math.round(p.height),
    facing: p.facing,
    arrangements: p.arrangements,
    ...(surfaces ? { surfaces } : {}),
    ...(p.props ? { props: p.props } : {}),
  } as ModuleInput;
}

export function partRect(p: Pick<Part, 'x' | 'y' | 'length' | 'width'>): Rect {
  return { x0: p.x, y0: p.y, x1: p.x + p.length, y1: p.y + p.width };
}

/**
 * How deep into the van a side door's entry is kept clear of anything that stands in the travel
 * or lounge arrangement: a person stepping in and turning (common practice, no source).
 */
export const ENTRY_DEPTH = 500;

export interface Zone {
  rect: Rect;
  what: string;
}

/**
 * The door entries kept clear: each side door's span, ENTRY_DEPTH in from the lining. A rear
 * door opens outwards onto whatever stands against it (a bed end, a garage, a lounge back), so
 * it is kept clear only when the bay has no side door and it is the way in.
 */
export function doorEntries(bay: Bay, wallT: number): Zone[] {
  const side = bay.doors.filter((d) => d.wall !== 'rear');
  const out: Zone[] = side.map((d) => ({
    what: `the ${d.wall}-hand door's entry`,
    rect: d.wall === 'right'
      ? { x0: d.offset, x1: d.offset + d.width, y0: bay.width - wallT - ENTRY_DEPTH, y1: bay.width - wallT }
      : { x0: d.offset, x1: d.offset + d.width, y0: wallT, y1: wallT + ENTRY_DEPTH },
  }));
  if (side.length === 0) {
    for (const d of bay.doors) out.push({ what: "the rear door's entry", rect: { x0: bay.length - ENTRY_DEPTH, x1: bay.length, y0: d.offset, y1: d.offset + d.width } });
  }
  return out;
}

export function overlaps(a: Rect, b: Rect): boolean {
  return a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1;
}

/** Whether a part stands in a door entry in an arrangement where people come in (travel, lounge). */
export function inDoorEntry(p: Part, entries: Zone[]): Zone | undefined {
  if (!p.arrangements.some((a) => a === 'travel' || a === 'lounge')) return undefined;
  return entries.find((z) => overlaps(partRect(p), z.rect));
}

export const ceil10 = (n: number) => Math.ceil(n / 10) * 10;
