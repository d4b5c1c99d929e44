/**
 * A client's brief for proposals: the bay (a template or measured), who sleeps and stands, the
 * bed wanted, the kitchen, water, wet room, fuel, garage and what matters most. One zod schema,
 * shared by the form on "New layout" (so `zod/mini`, as the browser's other forms), the route that
 * validates the request and the generator.
 * Pure: must never import React, Next, the database or the services.
 */
import * as z from 'zod/mini';
import { baySchema } from '../layout/schema';
import { MATTRESSES } from '../checks/mattress';

export const BED_PREFERENCES = ['across', 'lengthways', 'lounge', 'any'] as const;
export type BedPreference = (typeof BED_PREFERENCES)[number];
export const BED_PREFERENCE_WORDS: Record<BedPreference, string> = {
  across: 'Fixed bed across the van',
  lengthways: 'Fixed bed lengthways',
  lounge: 'Made up from the lounge',
  any: 'No preference',
};

/**
 * Mattress classes, smallest first, from the UK trade sizes the check engine already holds
 * (lib/checks/mattress.ts, SOURCES.mattressUk). `none` asks for no standard size.
 */
export const MATTRESS_CLASSES = ['none', 'single', 'small-double', 'double', 'king', 'super-king'] as const;
export type MattressClass = (typeof MATTRESS_CLASSES)[number];
const UK_NAMES: Record<Exclude<MattressClass, 'none'>, string> = {
  single: 'UK single',
  'small-double': 'UK small double',
  double: 'UK double',
  king: 'UK king',
  'super-king': 'UK super king',
};
/** The class's mattress (width across the sleeper × length, mm), or null for `none`. */
export function mattressOfClass(c: MattressClass): { name: string; width: number; length: number } | null {
  if (c === 'none') return null;
  const m = MATTRESSES.uk.find((x) => x.name === UK_NAMES[c]);
  return m ? { name: m.name, width: m.width, length: m.length } : null;
}

/** Fridge sizes a designer picks from; litres and the unit's footprint are common practice, no source. */
export const FRIDGE_SIZES = ['none', 'small', 'medium', 'large'] as const;
export type FridgeSize = (typeof FRIDGE_SIZES)[number];
export const FRIDGE_UNITS: Record<Exclude<FridgeSize, 'none'>, { litres: number; length: number; width: number; height: number }> = {
  small: { litres: 30, length: 400, width: 450, height: 500 },
  medium: { litres: 50, length: 450, width: 480, height: 560 },
  large: { litres: 85, length: 500, width: 500, height: 850 },
};

export const PRIORITIES = ['floor', 'bed', 'storage', 'balance'] as const;
export type Priority = (typeof PRIORITIES)[number];
export const PRIORITY_WORDS: Record<Priority, string> = {
  floor: 'Floor space',
  bed: 'Bed size',
  storage: 'Storage',
  balance: 'Weight balance',
};

const whole = (min: number, max: number, what: string) =>
  z.int(`${what} in whole numbers`).check(z.gte(min, `${what}: at least ${min}`), z.lte(max, `${what}: at most ${max}`));
const stature = whole(900, 2300, 'a stature in millimetres');

export const briefBaySchema = z.discriminatedUnion('source', [
  z.strictObject({ source: z.literal('template'), template: z.string().check(z.regex(/^[a-z0-9-]{1,40}$/, 'pick a bay template')) }),
  z.strictObject({ source: z.literal('measured'), bay: baySchema }),
]);

export const briefSchema = z.strictObject({
  bay: briefBaySchema,
  sleepers: z.array(stature).check(z.minLength(1, 'at least one sleeper'), z.maxLength(6, 'at most six sleepers')),
  /** The tallest person who must stand upright; null when nobody stands (a low roof). */
  standing: z.nullable(stature),
  /** Belted travel seats wanted behind the cab (the cab's own seats are counted by the bay). */
  beltedSeats: whole(0, 4, 'belted seats behind the cab'),
  bed: z.enum(BED_PREFERENCES),
  mattress: z.enum(MATTRESS_CLASSES),
  kitchen: z.strictObject({
    counterMin: whole(0, 3000, 'counter length in millimetres'),
    sink: z.boolean(),
    hob: z.boolean(),
    fridge: z.enum(FRIDGE_SIZES),
  }),
  water: z.strictObject({
    days: whole(1, 14, 'days between fills'),
    people: whole(1, 8, 'people using water'),
  }),
  toilet: z.boolean(),
  shower: z.boolean(),
  fuel: z.enum(['gas', 'electric']),
  /** Clear height wanted under a fixed bed for a garage, mm; null for none. */
  garageHeight: z.nullable(whole(200, 1200, 'garage height in millimetres')),
  priority: z.enum(PRIORITIES),
  /** Varies the order candidates are tried in; the same brief and seed give the same proposals. */
  seed: z._default(whole(0, 2 ** 31 - 1, 'seed'), 1),
});
export type Brief = z.infer<typeof briefSchema>;
export type BriefInput = z.input<typeof briefSchema>;

/** A typical two-sleeper brief: the form's starting values and the benchmark's case. */
export const TYPICAL_BRIEF: Brief = {
  bay: { source: 'template', template: 'l2h2' },
  sleepers: [1800, 1650],
  standing: 1800,
  beltedSeats: 0,
  bed: 'any',
  mattress: 'none',
  kitchen: { counterMin: 800, sink: true, hob: true, fridge: 'medium' },
  water: { days: 2, people: 2 },
  toilet: false,
  shower: false,
  fuel: 'gas',
  garageHeight: null,
  priority: 'floor',
  seed: 1,
};
