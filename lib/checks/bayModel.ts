/**
 * The layout document seen as geometry: build-up thicknesses, the lined interior, wheel-arch
 * boxes, door openings and module footprints, in bay coordinates (mm, origin front-left of the
 * bare-metal floor). Every rule family reads the document through this one place, so a rule
 * never re-derives "what floor is" differently. Pure: no UI, framework or database imports.
 */
import { rectFromExtent, type Opening, type Rect } from '../geometry';
import { kindSpec } from '../layout/kinds';
import type { Arrangement, Door, LayoutDoc, Module } from '../layout/schema';
import { RULE_CONSTANTS } from './settings';

export interface BuildUpThickness {
  /** Sum of the floor layers. */
  floorT: number;
  roofT: number;
  wallT: number;
}

export function buildUpThickness(doc: LayoutDoc): BuildUpThickness {
  const sum = (layers: { thickness: number }[] | undefined) => (layers ?? []).reduce((t, l) => t + l.thickness, 0);
  return { floorT: sum(doc.buildUp?.floor), roofT: sum(doc.buildUp?.roof), wallT: sum(doc.buildUp?.walls) };
}

/** The lined interior in plan: wall linings on both sides, none front or rear. */
export function linedInterior(doc: LayoutDoc, wallT: number): Rect {
  return { x0: 0, y0: wallT, x1: doc.bay.length, y1: doc.bay.width - wallT };
}

export interface ArchBox {
  side: 'left' | 'right';
  rect: Rect;
  /** Top of the arch above the bare floor. */
  height: number;
}

export function archBoxes(doc: LayoutDoc): ArchBox[] {
  return (doc.bay.wheelArches ?? []).map((a) => ({
    side: a.side,
    height: a.height,
    rect: a.side === 'left' ? { x0: a.x, y0: 0, x1: a.x + a.length, y1: a.width } : { x0: a.x, y0: doc.bay.width - a.width, x1: a.x + a.length, y1: doc.bay.width },
  }));
}

export interface DoorOpening {
  door: Door;
  opening: Opening;
}

/** Doors as openings of the lined interior: right wall = max y, left wall = min y, rear = max x. */
export function doorOpenings(doc: LayoutDoc): DoorOpening[] {
  return (doc.bay.doors ?? []).map((door) => ({
    door,
    opening: {
      edge: door.wall === 'right' ? 'maxY' : door.wall === 'left' ? 'minY' : 'maxX',
      from: door.offset,
      to: door.offset + door.width,
    },
  }));
}

export function moduleRect(m: Module): Rect {
  return rectFromExtent(m.x, m.y, m.length, m.width);
}

export function inArrangement(m: Module, a: Arrangement): boolean {
  return m.arrangements.includes(a);
}

/** Underside below 1000 mm above the finished floor (common practice, RULE_CONSTANTS.floorBlockBelow). */
export function blocksFloor(m: Module): boolean {
  return m.elevation < RULE_CONSTANTS.floorBlockBelow;
}

export function usedFromFront(m: Module): boolean {
  return kindSpec(m.kind)?.usedFromFront ?? false;
}

/** Underside and top above the BARE floor. */
export function undersideAboveBare(m: Module, floorT: number): number {
  return floorT + m.elevation;
}
export function topAboveBare(m: Module, floorT: number): number {
  return floorT + m.elevation + m.height;
}

/**
 * Where a person's centre must stand to work the module: the strip in front of its facing side,
 * up to `reach` mm out, exactly as long as that side (so a corner touched from beside does not count).
 */
export function workingZone(m: Module, reach: number): Rect {
  const r = moduleRect(m);
  switch (m.facing) {
    case 'front':
      return { x0: r.x0 - reach, y0: r.y0, x1: r.x0, y1: r.y1 };
    case 'rear':
      return { x0: r.x1, y0: r.y0, x1: r.x1 + reach, y1: r.y1 };
    case 'left':
      return { x0: r.x0, y0: r.y0 - reach, x1: r.x1, y1: r.y0 };
    case 'right':
      return { x0: r.x0, y0: r.y1, x1: r.x1, y1: r.y1 + reach };
  }
}

/** A door in words, by its wall, width and place — never its id. */
export function describeDoor(door: Door): string {
  if (door.wall === 'rear') return `rear door (${door.width} mm wide)`;
  return `${door.wall}-hand door (${door.width} mm wide, ${door.offset} mm from the front)`;
}
