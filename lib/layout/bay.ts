/**
 * The bay model: the layout document seen as geometry, in bay coordinates (mm, origin at the
 * front-left corner of the bare-metal floor, x rearwards, y across). One home for the build-up
 * thicknesses, the clear height, the lined interior, the wheel-arch boxes, door openings, module
 * footprints, arrangement membership, what a module's top is in each arrangement and where it is mounted — the editor, the checks, the plan sheet and every SVG
 * view read the bay through here, so none of them re-derives "where the lining is" differently.
 * Pure: plain rectangles from lib/geometry in, plain numbers out; must never decide pass or fail
 * (that is lib/checks) nor import UI, framework or database code.
 */
import type { Opening } from '../geometry/freeFloor';
import { rectFromExtent, type Rect } from '../geometry/rect';
import type { Arrangement, Door, Facing, LayoutDoc, Module, Mount, Surface } from './schema';

/** A placed box as the document writes it: min corner and extents along x and y. */
export interface Footprint {
  x: number;
  y: number;
  length: number;
  width: number;
}

// ---- build-up ---------------------------------------------------------------------------------

/** The total thickness of a stack of build-up layers (mm). */
export function layersThickness(layers: readonly { thickness: number }[] | undefined): number {
  return (layers ?? []).reduce((sum, l) => sum + l.thickness, 0);
}

export interface BuildUpThickness {
  floorT: number;
  roofT: number;
  wallT: number;
}

export function buildUpThickness(doc: Pick<LayoutDoc, 'buildUp'>): BuildUpThickness {
  return { floorT: layersThickness(doc.buildUp?.floor), roofT: layersThickness(doc.buildUp?.roof), wallT: layersThickness(doc.buildUp?.walls) };
}

/** Floor-to-lining height once floor and roof build-up are in (mm). */
export function clearHeight(doc: Pick<LayoutDoc, 'bay' | 'buildUp'>): number {
  const t = buildUpThickness(doc);
  return doc.bay.height - t.floorT - t.roofT;
}

// ---- plan -------------------------------------------------------------------------------------

/**
 * The lined interior in plan: wall lining to wall lining across (y from the wall build-up to
 * bay width − wall build-up), bulkhead to rear along. Not clamped: a build-up thicker than half
 * the bay leaves an inverted box, inside which nothing fits.
 */
export function linedInterior(doc: Pick<LayoutDoc, 'bay' | 'buildUp'>): Rect {
  const wallT = buildUpThickness(doc).wallT;
  return { x0: 0, y0: wallT, x1: doc.bay.length, y1: doc.bay.width - wallT };
}

export interface ArchBox {
  side: 'left' | 'right';
  /** Plan footprint: against the left wall (y = 0) or the right wall (y = bay width). */
  rect: Rect;
  /** Top of the arch above the bare floor. */
  height: number;
}

export function archBoxes(doc: Pick<LayoutDoc, 'bay'>): ArchBox[] {
  return (doc.bay.wheelArches ?? []).map((a) => ({
    side: a.side,
    height: a.height,
    rect: rectFromExtent(a.x, a.side === 'left' ? 0 : doc.bay.width - a.width, a.length, a.width),
  }));
}

export interface DoorOpening {
  door: Door;
  opening: Opening;
}

/** Doors as openings of the lined interior: right wall = max y, left wall = min y, rear = max x. */
export function doorOpenings(doc: Pick<LayoutDoc, 'bay'>): DoorOpening[] {
  return (doc.bay.doors ?? []).map((door) => ({
    door,
    opening: {
      edge: door.wall === 'right' ? 'maxY' : door.wall === 'left' ? 'minY' : 'maxX',
      from: door.offset,
      to: door.offset + door.width,
    },
  }));
}

/** A placed box (a module, a drag) as a rectangle. */
export function footprintRect(f: Footprint): Rect {
  return rectFromExtent(f.x, f.y, f.length, f.width);
}

/** A rectangle written back the document's way. */
export function rectFootprint(r: Rect): Footprint {
  return { x: r.x0, y: r.y0, length: r.x1 - r.x0, width: r.y1 - r.y0 };
}

/** The module's footprint in plan. */
export const moduleRect: (m: Footprint) => Rect = footprintRect;

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

/**
 * The way a module should face when it stands against one wall of the lined interior: into the
 * room, away from that wall (left wall → faces right, right wall → left, rear → front, bulkhead →
 * rear). A side wall wins over an end wall in a corner; null when it touches no wall, or both side
 * walls (it spans the van).
 */
export function roomFacing(doc: Pick<LayoutDoc, 'bay' | 'buildUp'>, f: Footprint): Facing | null {
  const lined = linedInterior(doc);
  const left = f.y <= lined.y0;
  const right = f.y + f.width >= lined.y1;
  if (left && right) return null;
  if (left) return 'right';
  if (right) return 'left';
  if (f.x + f.length >= lined.x1) return 'front';
  if (f.x <= lined.x0) return 'rear';
  return null;
}

// ---- heights ----------------------------------------------------------------------------------

/** Underside above the BARE floor (the document's elevation is above the finished floor). */
export function undersideAboveBare(m: Pick<Module, 'elevation'>, floorT: number): number {
  return floorT + m.elevation;
}
export function topAboveBare(m: Pick<Module, 'elevation' | 'height'>, floorT: number): number {
  return floorT + m.elevation + m.height;
}

// ---- arrangements -----------------------------------------------------------------------------

/** Whether the module exists in the arrangement. */
export function inArrangement(m: Pick<Module, 'arrangements'>, arrangement: Arrangement): boolean {
  return m.arrangements.includes(arrangement);
}

/** The modules present in one arrangement, in document order. */
export function modulesIn<M extends Pick<Module, 'arrangements'>>(doc: { modules: M[] }, arrangement: Arrangement): M[] {
  return doc.modules.filter((m) => inArrangement(m, arrangement));
}

/** Whether two modules ever stand in the bay at the same time. */
export function shareAnArrangement(a: Pick<Module, 'arrangements'>, b: Pick<Module, 'arrangements'>): boolean {
  return a.arrangements.some((x) => inArrangement(b, x));
}

/**
 * What the module's top is used as in one arrangement: its `surfaces` entry there, nothing when it
 * says 'none', has no entry, or the module is not present in that arrangement.
 */
export function surfaceIn(m: Pick<Module, 'arrangements' | 'surfaces'>, arrangement: Arrangement): Surface | undefined {
  if (!inArrangement(m, arrangement)) return undefined;
  const s = m.surfaces?.[arrangement];
  return s === undefined || s === 'none' ? undefined : s;
}

// ---- mounting -----------------------------------------------------------------------------------

/** Where the module is mounted ('inside' when the document does not say). */
export function mountOf(m: Pick<Module, 'mount'>): Mount {
  return m.mount ?? 'inside';
}

/** Whether the module stands inside the body (so the interior fit, walkway, headroom and sleep rules apply). */
export function mountedInside(m: Pick<Module, 'mount'>): boolean {
  return mountOf(m) === 'inside';
}

/** The document with only the modules inside the body: what the interior rules read. */
export function interiorOf<D extends { modules: Pick<Module, 'mount'>[] }>(doc: D): D {
  return doc.modules.every(mountedInside) ? doc : { ...doc, modules: doc.modules.filter(mountedInside) };
}

/** The modules mounted outside the body (under the floor, on the roof, behind the rear doors). */
export function outsideModules<M extends Pick<Module, 'mount'>>(doc: { modules: M[] }): M[] {
  return doc.modules.filter((m) => !mountedInside(m));
}

type SectionModule = Pick<Module, 'mount' | 'x' | 'length' | 'elevation' | 'height'>;

/**
 * Where a module stands in the side section, as heights above the bare floor (z = 0): inside the
 * body and behind the rear doors from the finished floor up by its elevation; under the floor
 * hanging below it, its top at the bare floor; on the roof standing on it.
 */
export function sectionBand(m: SectionModule, bayHeight: number, floorT: number): { z0: number; z1: number } {
  const mount = mountOf(m);
  if (mount === 'under-floor') return { z0: -m.height, z1: 0 };
  if (mount === 'roof') return { z0: bayHeight, z1: bayHeight + m.height };
  return { z0: floorT + m.elevation, z1: floorT + m.elevation + m.height };
}

/** How far the side section reaches past the bare bay for the modules outside it (mm): below the floor, above the roof, behind the rear. One pass. */
export function sectionReach(doc: Pick<LayoutDoc, 'bay' | 'modules'>, floorT: number): { below: number; above: number; behind: number } {
  let below = 0;
  let above = 0;
  let behind = 0;
  for (const m of doc.modules) {
    if (mountedInside(m)) continue;
    const { z0, z1 } = sectionBand(m, doc.bay.height, floorT);
    below = Math.max(below, -z0);
    above = Math.max(above, z1 - doc.bay.height);
    behind = Math.max(behind, m.x + m.length - doc.bay.length);
  }
  return { below, above, behind };
}
