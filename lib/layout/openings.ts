/**
 * Openings seen as geometry: where a window lies on its wall, a roof opening in plan, a body point
 * on the body, and how far a body point is from an opening — the one home for these, read by the
 * clearance rules, the heat-loss figures and (later) the elevations and the roof plan.
 *
 * Frames: a wall is seen from inside the van, measured `along` from its start — the FRONT end of a
 * side wall, the LEFT end of the rear wall (as doors are) — and up in z above the BARE load floor.
 * In bay coordinates the left wall is the plane y = 0, the right wall y = bay width, the rear wall
 * x = bay length, the roof z = bay height; the bare-metal skin, where the glass and the outlets are.
 *
 * Pure: plain numbers in, plain numbers out; must never decide pass or fail (that is lib/checks)
 * nor import UI, framework or database code.
 */
import { rectFromExtent, type Rect } from '../geometry/rect';
import type { Bay, BodyPoint, Door, Opening, RoofOpening, WindowOpening } from './schema';

export type BayWall = 'left' | 'right' | 'rear';

/** A wall's length from its start to its end (mm): side walls the bay's length, the rear its width. */
export function wallLength(bay: Pick<Bay, 'length' | 'width'>, wall: BayWall): number {
  return wall === 'rear' ? bay.width : bay.length;
}

/** A rectangle on one wall: along it from its start, and in z above the bare floor (mm). */
export interface WallRect {
  wall: BayWall;
  along0: number;
  along1: number;
  z0: number;
  z1: number;
}

/** An axis-aligned box in bay coordinates (flat on one axis for a pane, a door, a roof opening). */
export interface Box3 {
  x0: number; x1: number;
  y0: number; y1: number;
  z0: number; z1: number;
}

export interface Point3 {
  x: number;
  y: number;
  z: number;
}

export function windows(bay: Pick<Bay, 'openings'>): WindowOpening[] {
  return bay.openings.filter((o): o is WindowOpening => o.type === 'window');
}

export function roofOpenings(bay: Pick<Bay, 'openings'>): RoofOpening[] {
  return bay.openings.filter((o): o is RoofOpening => o.type === 'roof-opening');
}

export function bodyPoints(bay: Pick<Bay, 'openings'>, kind?: BodyPoint['kind']): BodyPoint[] {
  return bay.openings.filter((o): o is BodyPoint => o.type === 'body-point' && (kind === undefined || o.kind === kind));
}

/** The door a window is in, or undefined for a window in a wall (or a door that is gone). */
export function windowDoor(bay: Pick<Bay, 'doors'>, w: WindowOpening): Door | undefined {
  return w.wall === 'door' ? bay.doors.find((d) => d.id === w.door) : undefined;
}

/**
 * A window's glass on its wall, seen from inside: a window in a door is carried onto the door's
 * wall (the door's offset plus the window's position), drawn closed. `floorT` is the floor's
 * build-up, since the sill is measured from the finished floor. Null for a door that is gone.
 */
export function windowOnWall(bay: Pick<Bay, 'doors'>, floorT: number, w: WindowOpening): WallRect | null {
  let wall: BayWall;
  let start = 0;
  if (w.wall === 'door') {
    const door = windowDoor(bay, w);
    if (!door) return null;
    wall = door.wall;
    start = door.offset;
  } else {
    wall = w.wall;
  }
  const along0 = start + w.position;
  const z0 = floorT + w.sillHeight;
  return { wall, along0, along1: along0 + w.width, z0, z1: z0 + w.height };
}

/** Glass area of a window, m². */
export function windowAreaM2(w: Pick<WindowOpening, 'width' | 'height'>): number {
  return (w.width * w.height) / 1e6;
}

/** A roof opening's rectangle in plan (bay coordinates, like a module's footprint). */
export function roofOpeningRect(o: Pick<RoofOpening, 'x' | 'y' | 'length' | 'width'>): Rect {
  return rectFromExtent(o.x, o.y, o.length, o.width);
}

/** A roof opening's area, m². */
export function roofOpeningAreaM2(o: Pick<RoofOpening, 'length' | 'width'>): number {
  return (o.length * o.width) / 1e6;
}

/** Where a window (or a door) lies in plan: a strip of the wall line, `depth` mm into the room from the bare wall. */
export function wallRectInPlan(bay: Pick<Bay, 'length' | 'width'>, r: Pick<WallRect, 'wall' | 'along0' | 'along1'>, depth = 0): Rect {
  if (r.wall === 'left') return { x0: r.along0, x1: r.along1, y0: 0, y1: depth };
  if (r.wall === 'right') return { x0: r.along0, x1: r.along1, y0: bay.width - depth, y1: bay.width };
  return { x0: bay.length - depth, x1: bay.length, y0: r.along0, y1: r.along1 };
}

/** A rectangle on a wall as a flat box in bay coordinates. */
export function wallRectBox(bay: Pick<Bay, 'length' | 'width'>, r: WallRect): Box3 {
  const plan = wallRectInPlan(bay, r);
  return { ...plan, z0: r.z0, z1: r.z1 };
}

/** A door's opening as a flat box on its wall, from the bare floor to the roof (doors carry no height). */
export function doorBox(bay: Pick<Bay, 'length' | 'width' | 'height'>, door: Door): Box3 {
  return wallRectBox(bay, { wall: door.wall, along0: door.offset, along1: door.offset + door.width, z0: 0, z1: bay.height });
}

/** A roof opening as a flat box in the roof plane. */
export function roofOpeningBox(bay: Pick<Bay, 'height'>, o: RoofOpening): Box3 {
  const r = roofOpeningRect(o);
  return { ...r, z0: bay.height, z1: bay.height };
}

/** A body point in bay coordinates, on the bare-metal skin (the underside: at the floor, less how far it hangs). */
export function bodyPointAt(bay: Pick<Bay, 'length' | 'width'>, p: BodyPoint): Point3 {
  if (p.wall === 'underside') return { x: p.position, y: p.across ?? 0, z: p.height };
  if (p.wall === 'left') return { x: p.position, y: 0, z: p.height };
  if (p.wall === 'right') return { x: p.position, y: bay.width, z: p.height };
  return { x: bay.length, y: p.position, z: p.height };
}

/** A body point as a box of no size. */
export function pointBox(p: Point3): Box3 {
  return { x0: p.x, x1: p.x, y0: p.y, y1: p.y, z0: p.z, z1: p.z };
}

/**
 * Straight-line distance (mm) from a point to the nearest point of a box — to an opening's edge
 * when the point is outside it, 0 when it is on it. On one wall this is the distance in the wall's
 * plane; round a corner it is the straight line, shorter than the way along the body, so a rule
 * reading it errs towards asking for more room.
 */
export function distanceToBox(p: Point3, b: Box3): number {
  const dx = Math.max(b.x0 - p.x, 0, p.x - b.x1);
  const dy = Math.max(b.y0 - p.y, 0, p.y - b.y1);
  const dz = Math.max(b.z0 - p.z, 0, p.z - b.z1);
  return Math.hypot(dx, dy, dz);
}

/**
 * Where any opening lies as a box in bay coordinates (windows on their wall, roof openings in the
 * roof, body points as points), or null for a window in a door that is gone.
 */
export function openingBox(bay: Pick<Bay, 'length' | 'width' | 'height' | 'doors'>, floorT: number, o: Opening): Box3 | null {
  if (o.type === 'window') {
    const r = windowOnWall(bay, floorT, o);
    return r ? wallRectBox(bay, r) : null;
  }
  if (o.type === 'roof-opening') return roofOpeningBox(bay, o);
  return pointBox(bodyPointAt(bay, o));
}

/** Distance (mm) from a body point to an opening's nearest edge (Infinity for a window in a door that is gone). */
export function pointToOpening(bay: Pick<Bay, 'length' | 'width' | 'height' | 'doors'>, floorT: number, p: BodyPoint, o: Opening): number {
  const b = openingBox(bay, floorT, o);
  return b ? distanceToBox(bodyPointAt(bay, p), b) : Infinity;
}

// ---- names --------------------------------------------------------------------------------------

/** Each roof opening and body point kind in words (sentence case). */
export const ROOF_OPENING_WORDS: Record<RoofOpening['kind'], string> = { vent: 'Roof vent', fan: 'Roof fan', skylight: 'Skylight' };
export const BODY_POINT_WORDS: Record<BodyPoint['kind'], string> = { 'fuel-filler': 'Fuel filler', 'heater-exhaust': 'Heater exhaust', 'heater-intake': 'Heater intake', 'gas-drop-vent': 'Gas locker drop-out vent' };

/** What an opening is, without where (its label, else its kind in words): "Window in the rear door", "Roof vent". */
export function openingTitle(bay: Pick<Bay, 'doors'>, o: Opening): string {
  if (o.label?.trim()) return o.label.trim();
  if (o.type === 'window') {
    const door = windowDoor(bay, o);
    return door ? `Window in ${doorName(door)}` : `Window in the ${o.wall} wall`;
  }
  return o.type === 'roof-opening' ? ROOF_OPENING_WORDS[o.kind] : BODY_POINT_WORDS[o.kind];
}

/** A door in words, by its wall — never its id. */
export function doorName(door: Door): string {
  return door.wall === 'rear' ? 'the rear door' : `the ${door.wall}-hand door`;
}

/** An opening in words: its label, else what and where it is — never its id. */
export function openingName(bay: Pick<Bay, 'doors'>, o: Opening): string {
  if (o.label?.trim()) return o.label.trim();
  if (o.type === 'window') {
    const door = windowDoor(bay, o);
    if (door) return `the window in ${doorName(door)} (${o.position} mm along it)`;
    return `the ${o.wall}-wall window at ${o.position} mm`;
  }
  if (o.type === 'roof-opening') return `the ${ROOF_OPENING_WORDS[o.kind].toLowerCase()} at ${o.x} mm from the front`;
  const what = BODY_POINT_WORDS[o.kind].toLowerCase();
  return o.wall === 'underside' ? `the ${what} under the floor at ${o.position} mm from the front` : `the ${what} on the ${o.wall} wall at ${o.position} mm`;
}

/** Half the side of the square a body point stands for in plan (mm). */
export const BODY_POINT_HALF = 60;
/** How far into the room a window's pane is drawn from the bare wall line when the walls are thinner (mm). */
export const PANE_DEPTH_MIN = 40;

/** Where an opening lies in plan, or null for a window in a door that is gone. */
export function openingPlanRect(bay: Pick<Bay, 'length' | 'width' | 'doors'>, o: Opening, paneDepth = PANE_DEPTH_MIN): Rect | null {
  if (o.type === 'window') {
    const r = windowOnWall(bay, 0, o);
    return r ? wallRectInPlan(bay, r, paneDepth) : null;
  }
  if (o.type === 'roof-opening') return roofOpeningRect(o);
  const p = bodyPointAt(bay, o);
  return { x0: p.x - BODY_POINT_HALF, y0: p.y - BODY_POINT_HALF, x1: p.x + BODY_POINT_HALF, y1: p.y + BODY_POINT_HALF };
}

/** The middle of an opening in plan: where a mark-up placed at it goes (whole millimetres). */
export function openingPlanPoint(bay: Pick<Bay, 'length' | 'width' | 'doors'>, o: Opening): { x: number; y: number } | null {
  const r = openingPlanRect(bay, o);
  return r ? { x: Math.round((r.x0 + r.x1) / 2), y: Math.round((r.y0 + r.y1) / 2) } : null;
}
