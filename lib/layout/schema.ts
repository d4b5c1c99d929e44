/**
 * The layout document: the one contract between the editor, the server, the check engine and
 * the stored rows. Plain, serialisable data; every length is an integer number of millimetres,
 * every mass kilograms. Coordinates: origin at the front-left corner of the bare-metal load floor,
 * x rearwards, y across to the right wall, z up from the bare floor.
 *
 * Must never import React, Konva, Next or the database (lint-enforced).
 */
import { z } from 'zod';
import { systemsSchema } from './systems';
import { ARRANGEMENTS, BAY_LIMITS, FACINGS, MATTRESS_REGIONS, MODULE_KINDS, MODULE_LIMITS, SURFACES } from './vocabulary';

export { ARRANGEMENTS, BAY_LIMITS, FACINGS, MATTRESS_REGIONS, MODULE_KINDS, MODULE_LIMITS, SURFACES };

/** An integer length in millimetres. Bounded so no arithmetic can overflow into nonsense. */
const mm = (max = 100_000) => z.number().int('must be a whole number of millimetres').min(0).max(max);
/** A signed integer length (positions may sit left of or in front of the origin while being fixed). */
const mmSigned = (limit = 100_000) => z.number().int('must be a whole number of millimetres').min(-limit).max(limit);
const id = z.string().min(1).max(64).regex(/^[A-Za-z0-9_-]+$/, 'letters, digits, - and _ only');
/** Text a person typed: bounded, and free of control characters (PostgreSQL cannot even store NUL). */
export const plainText = (max: number) =>
  z.string().max(max).refine((s) => !/[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F]/.test(s), 'control characters are not allowed');
const text = plainText;

export type Arrangement = (typeof ARRANGEMENTS)[number];
export const arrangementSchema = z.enum(ARRANGEMENTS);

export type Facing = (typeof FACINGS)[number];

export type Surface = (typeof SURFACES)[number];

export type ModuleKind = (typeof MODULE_KINDS)[number];
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


export const baySchema = z
  .strictObject({
    length: mm(BAY_LIMITS.length.max).min(BAY_LIMITS.length.min, `a bay is at least ${BAY_LIMITS.length.min} mm long`),
    width: mm(BAY_LIMITS.width.max).min(BAY_LIMITS.width.min, `a bay is at least ${BAY_LIMITS.width.min} mm wide`),
    height: mm(BAY_LIMITS.height.max).min(BAY_LIMITS.height.min, `a bay is at least ${BAY_LIMITS.height.min} mm high`),
    wheelArches: z.array(wheelArchSchema).max(8).default([]),
    doors: z.array(doorSchema).max(12).default([]),
    bulkhead: z.boolean().default(true),
    cabSeats: z.number().int().min(0).max(9).default(2),
  })
  .superRefine((bay, ctx) => {
    bay.doors.forEach((door, i) => {
      const wallLength = door.wall === 'rear' ? bay.width : bay.length;
      if (door.offset + door.width > wallLength) {
        ctx.addIssue({ code: 'custom', path: ['doors', i, 'width'], message: `door runs past the end of the ${door.wall} wall (${wallLength} mm)` });
      }
    });
    bay.wheelArches.forEach((arch, i) => {
      if (arch.x + arch.length > bay.length) {
        ctx.addIssue({ code: 'custom', path: ['wheelArches', i, 'length'], message: `wheel arch runs past the rear of the bay (${bay.length} mm)` });
      }
    });
  });
export type Bay = z.infer<typeof baySchema>;

export const layerSchema = z.strictObject({
  material: text(80).pipe(z.string().min(1, 'name the material')),
  thickness: mm(1000),
});
export type Layer = z.infer<typeof layerSchema>;

export const buildUpSchema = z.strictObject({
  floor: z.array(layerSchema).max(12).default([]),
  roof: z.array(layerSchema).max(12).default([]),
  walls: z.array(layerSchema).max(12).default([]),
});
export type BuildUp = z.infer<typeof buildUpSchema>;

export const occupantsSchema = z.strictObject({
  /** The stature of the tallest person who must stand upright, in mm. */
  standingHeight: mm(2800).default(1800),
  /** Statures of the people who sleep in the van, in mm. */
  sleepers: z.array(mm(2800).min(300)).max(12).default([]),
});
export type Occupants = z.infer<typeof occupantsSchema>;

/** Kind-specific values: tank litres, fridge watts, whether a seat is belted, … Flat and small. */
export const modulePropsSchema = z
  .record(z.string().max(40).regex(/^[A-Za-z][A-Za-z0-9]*$/, 'prop names are letters and digits'), z.union([z.number().finite(), z.boolean(), text(200)]))
  .refine((r) => Object.keys(r).length <= 32, 'at most 32 props');


export const moduleSchema = z.strictObject({
  id,
  kind: moduleKindSchema,
  label: text(80).optional(),
  x: mmSigned(MODULE_LIMITS.position.max),
  y: mmSigned(MODULE_LIMITS.position.max),
  length: mm(MODULE_LIMITS.length.max).min(MODULE_LIMITS.length.min, 'a module has a length'),
  width: mm(MODULE_LIMITS.width.max).min(MODULE_LIMITS.width.min, 'a module has a width'),
  /** Underside above the FINISHED floor. */
  elevation: mm(MODULE_LIMITS.elevation.max),
  height: mm(MODULE_LIMITS.height.max).min(MODULE_LIMITS.height.min, 'a module has a height'),
  facing: z.enum(FACINGS),
  arrangements: z.array(arrangementSchema).min(1, 'a module exists in at least one arrangement').max(3)
    .refine((a) => new Set(a).size === a.length, 'each arrangement once'),
  surface: z.enum(SURFACES).optional(),
  massKg: z.number().finite().min(MODULE_LIMITS.massKg.min).max(MODULE_LIMITS.massKg.max).optional(),
  props: modulePropsSchema.optional(),
});
export type Module = z.infer<typeof moduleSchema>;

export type MattressRegion = (typeof MATTRESS_REGIONS)[number];

export const settingsSchema = z.strictObject({
  walkwayMin: mm(2000).optional(),
  bedAllowance: mm(1000).optional(),
  bedWidthPerSleeper: mm(2000).optional(),
  levelTolerance: mm(500).optional(),
  headMargin: mm(1000).optional(),
  mattressRegion: z.enum(MATTRESS_REGIONS).optional(),
});
export type LayoutSettings = z.infer<typeof settingsSchema>;


export const layoutDocSchema = z
  .strictObject({
    schemaVersion: z.literal(1),
    name: text(120).pipe(z.string().trim().min(1, 'give the layout a name')),
    bay: baySchema,
    buildUp: buildUpSchema,
    occupants: occupantsSchema,
    modules: z.array(moduleSchema).max(5000),
    settings: settingsSchema.optional(),
    systems: systemsSchema.optional(),
  })
  .superRefine((doc, ctx) => {
    const seen = new Set<string>();
    doc.modules.forEach((m, i) => {
      if (seen.has(m.id)) ctx.addIssue({ code: 'custom', path: ['modules', i, 'id'], message: `module id "${m.id}" is used twice` });
      seen.add(m.id);
    });
  });
export type LayoutDoc = z.infer<typeof layoutDocSchema>;
/** What a caller may send before defaults are filled in. */
export type LayoutDocInput = z.input<typeof layoutDocSchema>;
