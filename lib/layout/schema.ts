/**
 * The layout document's parts — bay, build-up, occupants, modules, settings — as one zod schema
 * (the small `zod/mini` build, so the editor validates every edit with this same schema in the
 * browser). `document.ts` puts them together into the whole document. Plain, serialisable data;
 * every length is an integer number of millimetres, every mass kilograms. Coordinates: origin at
 * the front-left corner of the bare-metal load floor, x rearwards, y across to the right wall, z up
 * from the bare floor. A module's kind-specific values (`props`) are typed per kind: the schema is
 * a union on `kind`, each branch taking its values from the kind registry (`kinds.ts`).
 *
 * Must never import React, Konva, Next or the database (lint-enforced).
 */
import * as z from 'zod/mini';
import { KINDS, kindValuesSchema, MODULE_KINDS, type KindValues, type ModuleKind } from './kinds';
import {
  ARRANGEMENTS, BAY_LIMITS, BODY_POINT_KINDS, BODY_POINT_WALLS, FACINGS, MATTRESS_REGIONS, MODULE_LIMITS, MOUNTS, OPENING_LIMITS,
  OPENING_TYPES, ROOF_OPENING_KINDS, SURFACE_CHOICES, SURFACES, WINDOW_WALLS,
} from './vocabulary';

export {
  ARRANGEMENTS, BAY_LIMITS, BODY_POINT_KINDS, BODY_POINT_WALLS, FACINGS, MATTRESS_REGIONS, MODULE_KINDS, MODULE_LIMITS, MOUNTS, OPENING_LIMITS,
  OPENING_TYPES, ROOF_OPENING_KINDS, SURFACE_CHOICES, SURFACES, WINDOW_WALLS,
};
export type { ModuleKind };
export type { LayoutDoc, LayoutDocInput } from './document';

/** An integer length in millimetres. Bounded so no arithmetic can overflow into nonsense. */
const mmBetween = (min: number, max: number) =>
  z.int('must be a whole number of millimetres').check(z.refine((v) => v >= min && v <= max, `must be between ${min} and ${max} mm`));
const mm = (max = 100_000) => mmBetween(0, max);
/** A signed integer length (positions may sit left of or in front of the origin while being fixed). */
const mmSigned = (limit = 100_000) => mmBetween(-limit, limit);
const id = z.string().check(z.minLength(1, 'letters, digits, - and _ only (1–64)'), z.maxLength(64, 'letters, digits, - and _ only (1–64)'), z.regex(/^[A-Za-z0-9_-]+$/, 'letters, digits, - and _ only'));
/** Text a person typed: bounded, and free of control characters (PostgreSQL cannot even store NUL). */
export const plainText = (max: number) =>
  z.string().check(z.maxLength(max, `at most ${max} characters`), z.refine((s) => !/[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F]/.test(s), 'control characters are not allowed'));
const text = plainText;
const atMost = (n: number, what: string) => z.maxLength(n, `at most ${n} ${what}`);

export type Arrangement = (typeof ARRANGEMENTS)[number];
export const arrangementSchema = z.enum(ARRANGEMENTS);

export type Facing = (typeof FACINGS)[number];

export type Surface = (typeof SURFACES)[number];
export type SurfaceChoice = (typeof SURFACE_CHOICES)[number];
export type Mount = (typeof MOUNTS)[number];

/**
 * What a module's top is used as, per arrangement ('none': nothing). An arrangement left out, or one
 * the module is not present in, has no surface. Version 2's single `surface` migrates to this.
 */
export const surfacesSchema = z.strictObject({
  travel: z.optional(z.enum(SURFACE_CHOICES)),
  lounge: z.optional(z.enum(SURFACE_CHOICES)),
  sleep: z.optional(z.enum(SURFACE_CHOICES)),
});
export type Surfaces = z.infer<typeof surfacesSchema>;

export const moduleKindSchema = z.enum(MODULE_KINDS);

export const wheelArchSchema = z.strictObject({
  side: z.enum(['left', 'right']),
  x: mm(),
  length: mm(),
  /** How far the arch stands in from its wall. */
  width: mm(),
  height: mm(),
});
export type WheelArch = z.infer<typeof wheelArchSchema>;

export const doorSchema = z.strictObject({
  id,
  wall: z.enum(['left', 'right', 'rear']),
  /** Along that wall from its front end (side walls) or its left end (rear wall). */
  offset: mm(),
  width: mm(),
});
export type Door = z.infer<typeof doorSchema>;

/** A length that must be more than nothing: an opening's width, height, length. */
const sizeMm = (max = 100_000) => mmBetween(1, max);

/**
 * A window in a wall or a door (schema version 4). Along its wall the way doors are measured:
 * `position` runs from the wall's start — the FRONT end of a side wall, the LEFT end of the rear
 * wall (facing the direction of travel) — to the window's near edge; in a door it runs from the
 * door's own start edge (the door's `offset` on its wall) the same way. `sillHeight` is the bottom
 * of the glass above the FINISHED floor, like a module's elevation.
 */
export const wallWindowSchema = z.strictObject({
  id,
  type: z.literal('window'),
  label: z.optional(text(80)),
  wall: z.enum(WINDOW_WALLS),
  /** The door the window is in, by its id, when `wall` is 'door'. */
  door: z.optional(id),
  position: mm(),
  sillHeight: mm(),
  width: sizeMm(),
  height: sizeMm(),
  /** Whether it opens (a fixed pane does not). */
  opens: z.boolean(),
  /** How far a blind or fly-screen frame stands into the room from the lining, when there is one. */
  frameDepth: z.optional(mm(OPENING_LIMITS.frame)),
});
export type WindowOpening = z.infer<typeof wallWindowSchema>;

/**
 * A roof opening (vent, fan, skylight), placed in plan the way modules are: `x`, `y` its min
 * corner (front-left), `length` along x, `width` along y. `frameHeight` is how far its inside
 * frame (trim, blind, fan housing) hangs below the roof lining.
 */
export const roofOpeningSchema = z.strictObject({
  id,
  type: z.literal('roof-opening'),
  label: z.optional(text(80)),
  kind: z.enum(ROOF_OPENING_KINDS),
  x: mm(),
  y: mm(),
  length: sizeMm(),
  width: sizeMm(),
  frameHeight: z._default(mm(OPENING_LIMITS.frame), 0),
});
export type RoofOpening = z.infer<typeof roofOpeningSchema>;

/**
 * A point on the outside of the body: the fuel filler, the heater's exhaust outlet and combustion
 * intake, the gas locker's drop-out vent. On a wall: `position` along it from its start (as a
 * window) and `height` above the BARE load floor — the outside skin does not move with the floor's
 * build-up; negative below it (a sill, a skirt). On the underside: `position` from the front (x),
 * `across` from the left side (y), and `height` how far it hangs below the load floor, as a
 * negative number (0 at the floor's underside).
 */
export const bodyPointSchema = z.strictObject({
  id,
  type: z.literal('body-point'),
  label: z.optional(text(80)),
  kind: z.enum(BODY_POINT_KINDS),
  wall: z.enum(BODY_POINT_WALLS),
  position: mm(),
  /** Only on the underside: from the left side of the bay. */
  across: z.optional(mm()),
  height: mmBetween(-OPENING_LIMITS.belowFloor, 100_000),
});
export type BodyPoint = z.infer<typeof bodyPointSchema>;

export const openingSchema = z.discriminatedUnion('type', [wallWindowSchema, roofOpeningSchema, bodyPointSchema], 'unknown type of opening');
export type Opening = z.infer<typeof openingSchema>;
export type OpeningType = (typeof OPENING_TYPES)[number];

const bayMm = (limit: { min: number; max: number }, what: string) =>
  mm(limit.max).check(z.refine((v) => v >= limit.min, `a bay is at least ${limit.min} mm ${what}`));

export const baySchema = z
  .strictObject({
    length: bayMm(BAY_LIMITS.length, 'long'),
    width: bayMm(BAY_LIMITS.width, 'wide'),
    height: bayMm(BAY_LIMITS.height, 'high'),
    wheelArches: z._default(z.array(wheelArchSchema).check(atMost(8, 'wheel arches')), []),
    doors: z._default(z.array(doorSchema).check(atMost(12, 'doors')), []),
    /** Windows, roof openings and body points (schema version 4). */
    openings: z._default(z.array(openingSchema).check(atMost(OPENING_LIMITS.count, 'openings')), []),
    bulkhead: z._default(z.boolean(), true),
    cabSeats: z._default(z.int('a whole number from 0 to 9').check(z.refine((v) => v >= 0 && v <= 9, 'a whole number from 0 to 9')), 2),
  })
  .check(z.superRefine((bay, ctx) => {
    bay.doors.forEach((door, i) => {
      const wallLength = door.wall === 'rear' ? bay.width : bay.length;
      if (door.offset + door.width > wallLength) {
        ctx.addIssue({ code: 'custom', path: ['doors', i, 'width'], message: `door runs past the end of the ${door.wall} wall (${wallLength} mm)`, input: door });
      }
    });
    const openingIds = new Set<string>();
    bay.openings.forEach((o, i) => {
      const problem = openingProblem(bay, o);
      if (problem) ctx.addIssue({ code: 'custom', path: ['openings', i, problem.field], message: problem.message, input: o });
      if (openingIds.has(o.id)) ctx.addIssue({ code: 'custom', path: ['openings', i, 'id'], message: `opening id "${o.id}" is used twice`, input: o.id });
      openingIds.add(o.id);
    });
    bay.wheelArches.forEach((arch, i) => {
      if (arch.x + arch.length > bay.length) {
        ctx.addIssue({ code: 'custom', path: ['wheelArches', i, 'length'], message: `wheel arch runs past the rear of the bay (${bay.length} mm)`, input: arch });
      }
    });
  }));
export type Bay = z.infer<typeof baySchema>;
/** A bay as a caller may write it, before defaults (no openings, no doors…) are filled in. */
export type BayInput = z.input<typeof baySchema>;

type BayFrame = Pick<z.output<typeof doorSchema>, 'id' | 'wall' | 'offset' | 'width'>;

/** Whether an opening lies inside the bay it belongs to; the first field at fault and why, or null. */
function openingProblem(bay: { length: number; width: number; height: number; doors: BayFrame[] }, o: Opening): { field: string; message: string } | null {
  const wallLength = (wall: 'left' | 'right' | 'rear') => (wall === 'rear' ? bay.width : bay.length);
  if (o.type === 'window') {
    let along: number;
    let where: string;
    if (o.wall === 'door') {
      const door = bay.doors.find((d) => d.id === o.door);
      if (!door) return { field: 'door', message: o.door === undefined ? 'name the door the window is in' : `there is no door "${o.door}"` };
      along = door.width;
      where = `door "${door.id}" (${along} mm)`;
    } else {
      if (o.door !== undefined) return { field: 'door', message: 'a window in a wall names no door' };
      along = wallLength(o.wall);
      where = `the ${o.wall} wall (${along} mm)`;
    }
    if (o.position + o.width > along) return { field: 'width', message: `window runs past the end of ${where}` };
    if (o.sillHeight + o.height > bay.height) return { field: 'height', message: `window runs above the roof (${bay.height} mm)` };
    return null;
  }
  if (o.type === 'roof-opening') {
    if (o.x + o.length > bay.length) return { field: 'length', message: `roof opening runs past the rear of the bay (${bay.length} mm)` };
    if (o.y + o.width > bay.width) return { field: 'width', message: `roof opening runs past the right wall (${bay.width} mm)` };
    return null;
  }
  if (o.wall === 'underside') {
    if (o.across === undefined) return { field: 'across', message: 'a point on the underside needs its distance from the left side' };
    if (o.position > bay.length) return { field: 'position', message: `point lies behind the rear of the bay (${bay.length} mm)` };
    if (o.across > bay.width) return { field: 'across', message: `point lies past the right side (${bay.width} mm)` };
    if (o.height > 0) return { field: 'height', message: 'a point on the underside is at or below the floor (0 or less)' };
    return null;
  }
  if (o.across !== undefined) return { field: 'across', message: 'only a point on the underside takes a distance across' };
  if (o.position > wallLength(o.wall)) return { field: 'position', message: `point lies past the end of the ${o.wall} wall (${wallLength(o.wall)} mm)` };
  if (o.height > bay.height) return { field: 'height', message: `point lies above the roof (${bay.height} mm)` };
  return null;
}

export const layerSchema = z.strictObject({
  material: text(80).check(z.minLength(1, 'name the material')),
  thickness: mm(1000),
});
export type Layer = z.infer<typeof layerSchema>;

export const buildUpSchema = z.strictObject({
  floor: z._default(z.array(layerSchema).check(atMost(12, 'layers')), []),
  roof: z._default(z.array(layerSchema).check(atMost(12, 'layers')), []),
  walls: z._default(z.array(layerSchema).check(atMost(12, 'layers')), []),
});
export type BuildUp = z.infer<typeof buildUpSchema>;

export const occupantsSchema = z.strictObject({
  /** The stature of the tallest person who must stand upright, in mm. */
  standingHeight: z._default(mm(2800), 1800),
  /** Statures of the people who sleep in the van, in mm. */
  sleepers: z._default(z.array(mmBetween(300, 2800)).check(atMost(12, 'sleepers')), []),
});
export type Occupants = z.infer<typeof occupantsSchema>;

const limited = (l: { min: number; max: number }, need: string) =>
  mm(l.max).check(z.refine((v) => v >= l.min, need));

/** Everything a module has whatever its kind. */
const moduleBaseShape = {
  id,
  label: z.optional(text(80)),
  x: mmSigned(MODULE_LIMITS.position.max),
  y: mmSigned(MODULE_LIMITS.position.max),
  length: limited(MODULE_LIMITS.length, 'a module has a length'),
  width: limited(MODULE_LIMITS.width, 'a module has a width'),
  /** Underside above the FINISHED floor. */
  elevation: mm(MODULE_LIMITS.elevation.max),
  height: limited(MODULE_LIMITS.height, 'a module has a height'),
  facing: z.enum(FACINGS),
  arrangements: z.array(arrangementSchema).check(
    z.minLength(1, 'a module exists in at least one arrangement'),
    atMost(3, 'arrangements'),
    z.refine((a) => new Set(a).size === a.length, 'each arrangement once'),
  ),
  surfaces: z.optional(surfacesSchema),
  /** Inside the body (default), under the floor, on the roof or behind the rear doors. */
  mount: z.optional(z.enum(MOUNTS)),
  massKg: z.optional(z.number().check(z.refine((v) => v >= MODULE_LIMITS.massKg.min && v <= MODULE_LIMITS.massKg.max, `from ${MODULE_LIMITS.massKg.min} to ${MODULE_LIMITS.massKg.max} kg`))),
};
type ModuleBase = z.output<z.ZodMiniObject<typeof moduleBaseShape>>;
type ModuleBaseInput = z.input<z.ZodMiniObject<typeof moduleBaseShape>>;

/** A placed module: what every module has, its kind, and that kind's own typed values. */
export type Module = { [K in ModuleKind]: ModuleBase & { kind: K; props?: KindValues<K> } }[ModuleKind];
type ModuleInput = { [K in ModuleKind]: ModuleBaseInput & { kind: K; props?: KindValues<K> } }[ModuleKind];
/** The module of one kind. */
export type ModuleOf<K extends ModuleKind> = Extract<Module, { kind: K }>;

const moduleBranches = (Object.keys(KINDS) as ModuleKind[]).map((kind) =>
  z.strictObject({ ...moduleBaseShape, kind: z.literal(kind), props: z.optional(kindValuesSchema(kind)) }),
);
export const moduleSchema = z.discriminatedUnion('kind', moduleBranches as [(typeof moduleBranches)[number], ...(typeof moduleBranches)[number][]], 'unknown kind of module') as unknown as z.ZodMiniType<Module, ModuleInput>;

export type MattressRegion = (typeof MATTRESS_REGIONS)[number];

export const settingsSchema = z.strictObject({
  walkwayMin: z.optional(mm(2000)),
  bedAllowance: z.optional(mm(1000)),
  bedWidthPerSleeper: z.optional(mm(2000)),
  levelTolerance: z.optional(mm(500)),
  headMargin: z.optional(mm(1000)),
  mattressRegion: z.optional(z.enum(MATTRESS_REGIONS)),
  /** The load floor's height above the road, unladen (the envelope for modules under the floor). */
  floorAboveRoad: z.optional(mm(2000)),
});
export type LayoutSettings = z.infer<typeof settingsSchema>;

/** The layout's name: trimmed, never empty. */
export const layoutNameSchema = z.pipe(text(120), z.string().check(z.trim(), z.minLength(1, 'give the layout a name')));

/** The first problem with a value, as "field.path: message" (the editor's refusal), or null. */
export function firstProblem(schema: z.ZodMiniType, value: unknown): string | null {
  const r = schema.safeParse(value);
  if (r.success) return null;
  const issue = r.error.issues[0];
  const path = issue.path.map(String).join('.');
  return path ? `${path}: ${issue.message}` : issue.message;
}
