/**
 * The bay as the generator sees it: lined interior, clear height, arches as boxes, the side
 * door's span and the keep-clear entries — worked out once per brief from the bay model
 * (lib/layout/bay.ts), never again per candidate. Proposals are built with the side door on the
 * right; a bay whose side door is on the left is mirrored in, and its proposals mirrored out.
 * Pure: must never import React, Next, the database or the services.
 */
import type { Bay, LayoutDoc } from '../layout/schema';
import { archBoxes, buildUpThickness, clearHeight, linedInterior } from '../layout/bay';
import { DEFAULT_BUILD_UP } from '../layout/templates';
import type { Rect } from '../geometry/rect';
import { doorEntries, type Part, type Zone } from './parts';

export interface Frame {
  bay: Bay;
  mirrored: boolean;
  L: number;
  Y0: number;
  Y1: number;
  floorT: number;
  wallT: number;
  clear: number;
  arches: { side: 'left' | 'right'; rect: Rect; height: number }[];
  /** The side door's span along the right wall, or null. */
  sideDoor: { x0: number; x1: number } | null;
  entries: Zone[];
  /** Elevation above the finished floor that clears every arch (mm, up to the next 10). */
  archClearElevation: number;
}

function mirrorBay(bay: Bay): Bay {
  return {
    ...bay,
    wheelArches: bay.wheelArches.map((a) => ({ ...a, side: a.side === 'left' ? 'right' : 'left' })),
    doors: bay.doors.map((d) => ({ ...d, wall: d.wall === 'left' ? 'right' : d.wall === 'right' ? 'left' : d.wall, offset: d.wall === 'rear' ? bay.width - d.offset - d.width : d.offset })),
  };
}

export function frameOf(bay: Bay): Frame {
  const leftOnly = bay.doors.some((d) => d.wall === 'left') && !bay.doors.some((d) => d.wall === 'right');
  const b = leftOnly ? mirrorBay(bay) : bay;
  const doc = { bay: b, buildUp: DEFAULT_BUILD_UP } as Pick<LayoutDoc, 'bay' | 'buildUp'>;
  const t = buildUpThickness(doc);
  const lined = linedInterior(doc);
  const side = b.doors.filter((d) => d.wall === 'right').sort((p, q) => q.width - p.width)[0];
  const arches = archBoxes(doc);
  const highest = arches.reduce((h, a) => Math.max(h, a.height), 0);
  return {
    bay: b,
    mirrored: leftOnly,
    L: b.length,
    Y0: lined.y0,
    Y1: lined.y1,
    floorT: t.floorT,
    wallT: t.wallT,
    clear: clearHeight(doc),
    arches,
    sideDoor: side ? { x0: side.offset, x1: side.offset + side.width } : null,
    entries: doorEntries(b, t.wallT),
    archClearElevation: Math.max(0, Math.ceil((highest - t.floorT) / 10) * 10),
  };
}

/** A part drawn for the mirrored bay, put back into the real one. */
export function unmirror(p: Part, width: number): Part {
  const facing = p.facing === 'left' ? 'right' : p.facing === 'right' ? 'left' : p.facing;
  return { ...p, y: width - p.y - p.width, facing };
}

/** The free spans of a wall between x0 and x1 once arches (and, on the right, the door entry) are taken out. */
export function wallSpans(f: Frame, wall: 'left' | 'right', x0: number, x1: number): [number, number][] {
  const blocked: [number, number][] = f.arches.filter((a) => a.side === wall).map((a) => [a.rect.x0, a.rect.x1]);
  if (wall === 'right') for (const z of f.entries) if (z.rect.y1 >= f.Y1) blocked.push([z.rect.x0, z.rect.x1]);
  blocked.sort((a, b) => a[0] - b[0]);
  const spans: [number, number][] = [];
  let at = x0;
  for (const [b0, b1] of blocked) {
    if (b1 <= at || b0 >= x1) continue;
    if (b0 > at) spans.push([at, b0]);
    at = Math.max(at, b1);
  }
  if (at < x1) spans.push([at, x1]);
  return spans;
}

/** The band across the van clear of arches over x0..x1 (the floor between them). */
export function betweenArches(f: Frame, x0: number, x1: number): [number, number] {
  let y0 = f.Y0, y1 = f.Y1;
  for (const a of f.arches) {
    if (a.rect.x1 <= x0 || a.rect.x0 >= x1) continue;
    if (a.side === 'left') y0 = Math.max(y0, a.rect.y1 + 10);
    else y1 = Math.min(y1, a.rect.y0 - 10);
  }
  return [y0, y1];
}
