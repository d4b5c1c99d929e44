/**
 * The Details panel's form model: what the fields hold (text, so lengths can be typed in any unit:
 * "1200", "120 cm", "47.2 in") and the zod schema (the small `zod/mini` build, as everywhere on the client) that turns them into a module patch in whole
 * millimetres. Pure: no React, so it is tested on its own.
 */
import * as z from 'zod/mini';
import { ARRANGEMENTS, FACINGS, MODULE_LIMITS, MOUNTS, SURFACE_CHOICES } from '@/lib/layout/vocabulary';
import { kindSpec, MODULE_KINDS } from '@/lib/layout/kinds';
import type { Module } from '@/lib/layout/schema';
import { parseLength, toUnit, type LengthUnit } from '@/lib/layout/units';

export interface ModuleFormValues {
  label: string;
  kind: Module['kind'];
  x: string;
  y: string;
  length: string;
  width: string;
  elevation: string;
  height: string;
  facing: Module['facing'];
  arrangements: Module['arrangements'];
  /** The top in each arrangement; '' when the module says nothing there. */
  surfaces: Record<Module['arrangements'][number], '' | (typeof SURFACE_CHOICES)[number]>;
  mount: NonNullable<Module['mount']>;
  massKg: string;
  props: Record<string, string | boolean>;
}

function lengthField(unit: LengthUnit, min: number, max: number, what: string) {
  return z.pipe(z.string(), z.transform((s: string, ctx) => {
    const v = parseLength(s, unit);
    if (v === null) {
      ctx.issues.push({ code: 'custom', input: s, message: `${what}: type a length, e.g. 1200, 120 cm or 47 in` });
      return z.NEVER;
    }
    if (v < min || v > max) {
      ctx.issues.push({ code: 'custom', input: s, message: `${what} must be between ${min} and ${max} mm` });
      return z.NEVER;
    }
    return v;
  }));
}

/** Built once per unit (there are three): building a zod schema costs more than a parse with it. */
const schemas = new Map<LengthUnit, ReturnType<typeof buildSchema>>();

export function moduleFormSchema(unit: LengthUnit) {
  let schema = schemas.get(unit);
  if (!schema) schemas.set(unit, (schema = buildSchema(unit)));
  return schema;
}

function buildSchema(unit: LengthUnit) {
  return z.object({
    label: z.string().check(z.maxLength(80, 'at most 80 characters'), z.refine((s) => !/[\u0000-\u001F\u007F]/.test(s), 'no control characters')),
    kind: z.enum(MODULE_KINDS),
    x: lengthField(unit, MODULE_LIMITS.position.min, MODULE_LIMITS.position.max, 'Position along'),
    y: lengthField(unit, MODULE_LIMITS.position.min, MODULE_LIMITS.position.max, 'Position across'),
    length: lengthField(unit, MODULE_LIMITS.length.min, MODULE_LIMITS.length.max, 'Length'),
    width: lengthField(unit, MODULE_LIMITS.width.min, MODULE_LIMITS.width.max, 'Width'),
    elevation: lengthField(unit, MODULE_LIMITS.elevation.min, MODULE_LIMITS.elevation.max, 'Elevation'),
    height: lengthField(unit, MODULE_LIMITS.height.min, MODULE_LIMITS.height.max, 'Height'),
    facing: z.enum(FACINGS),
    arrangements: z.array(z.enum(ARRANGEMENTS)).check(z.minLength(1, 'a module exists in at least one arrangement')),
    surfaces: z.object({
      travel: z.union([z.literal(''), z.enum(SURFACE_CHOICES)]),
      lounge: z.union([z.literal(''), z.enum(SURFACE_CHOICES)]),
      sleep: z.union([z.literal(''), z.enum(SURFACE_CHOICES)]),
    }),
    mount: z.enum(MOUNTS),
    massKg: z.pipe(z.string(), z.transform((s: string, ctx) => {
      const t = s.trim().replace(/\s*kg$/i, '');
      if (t === '') return undefined;
      const v = Number(t.replace(',', '.'));
      if (!Number.isFinite(v) || v < MODULE_LIMITS.massKg.min || v > MODULE_LIMITS.massKg.max) {
        ctx.issues.push({ code: 'custom', input: s, message: `Mass: a number of kg from ${MODULE_LIMITS.massKg.min} to ${MODULE_LIMITS.massKg.max}` });
        return z.NEVER;
      }
      return Math.round(v * 10) / 10;
    })),
    props: z.record(z.string(), z.union([z.string(), z.boolean()])),
  });
}

export type ModuleFormOutput = z.output<ReturnType<typeof buildSchema>>;

export function formValuesOf(m: Module, unit: LengthUnit): ModuleFormValues {
  const len = (v: number) => String(toUnit(v, unit));
  const props: Record<string, string | boolean> = {};
  for (const [k, v] of Object.entries(m.props ?? {})) props[k] = typeof v === 'boolean' ? v : String(v);
  return {
    label: m.label ?? '',
    kind: m.kind,
    x: len(m.x),
    y: len(m.y),
    length: len(m.length),
    width: len(m.width),
    elevation: len(m.elevation),
    height: len(m.height),
    facing: m.facing,
    arrangements: [...m.arrangements],
    surfaces: { travel: m.surfaces?.travel ?? '', lounge: m.surfaces?.lounge ?? '', sleep: m.surfaces?.sleep ?? '' },
    mount: m.mount ?? 'inside',
    massKg: m.massKg === undefined ? '' : String(m.massKg),
    props,
  };
}

/**
 * The kind's values as typed in: number fields go back as numbers (a blank one is left out) (text that does not read as one
 * stays text, and the schema names the field); yes/no and text fields as they are.
 */
function propsOut(kind: Module['kind'], values: Record<string, string | boolean>): Module['props'] {
  const fields = kindSpec(kind).values;
  const out: Record<string, string | number | boolean> = {};
  for (const [k, v] of Object.entries(values)) {
    if (typeof v === 'boolean' || fields[k]?.input !== 'number') out[k] = v;
    else if (v.trim() === '') continue; // left blank: the kind's worked-out default stands (a tank's drawn capacity)
    else {
      const n = Number(v.trim().replace(',', '.'));
      out[k] = Number.isFinite(n) ? n : v;
    }
  }
  return Object.keys(out).length ? (out as Module['props']) : undefined;
}

/** The per-arrangement tops as the document writes them: only the arrangements that say something. */
function surfacesOut(v: ModuleFormOutput['surfaces']): Module['surfaces'] {
  const out: NonNullable<Module['surfaces']> = {};
  for (const a of ARRANGEMENTS) if (v[a] !== '') out[a] = v[a];
  return Object.keys(out).length ? out : undefined;
}

/** The fields that changed, as a patch for the store (undefined clears an optional field). */
export function patchFrom(m: Module, v: ModuleFormOutput): Partial<Omit<Module, 'id'>> {
  const next: Partial<Omit<Module, 'id'>> = {
    label: v.label.trim() === '' ? undefined : v.label.trim(),
    kind: v.kind,
    x: v.x, y: v.y, length: v.length, width: v.width, elevation: v.elevation, height: v.height,
    facing: v.facing,
    arrangements: ARRANGEMENTS.filter((a) => v.arrangements.includes(a)),
    surfaces: surfacesOut(v.surfaces),
    mount: v.mount === 'inside' ? undefined : v.mount,
    massKg: v.massKg,
    props: propsOut(m.kind, v.props),
  };
  const patch: Partial<Omit<Module, 'id'>> = {};
  for (const key of Object.keys(next) as (keyof typeof next)[]) {
    if (JSON.stringify(next[key]) !== JSON.stringify(m[key])) (patch as Record<string, unknown>)[key] = next[key];
  }
  return patch;
}

/** A top-level field of the form, as the schema's issues name it. */
export type ModuleFormField = keyof ModuleFormValues;

export interface FormReading {
  /** What the form's readable fields change (empty when nothing does). */
  patch: Partial<Omit<Module, 'id'>>;
  /** Fields whose text could not be read: put back to the module's last valid value, with why. */
  reverted: { field: ModuleFormField; message: string; restored: ModuleFormValues[ModuleFormField] }[];
  /** The form's values after the reverts: what the fields show from here on. */
  values: ModuleFormValues;
}

/**
 * Reads the form as a person leaves a field: the fields that read apply, any field that does not
 * goes back to the module's last valid value and says why — never holding the focus, never
 * dropping the good fields with the bad.
 */
export function readModuleForm(m: Module, values: ModuleFormValues, unit: LengthUnit): FormReading {
  const schema = moduleFormSchema(unit);
  const lastValid = formValuesOf(m, unit);
  let current: ModuleFormValues = { ...values };
  const reverted: FormReading['reverted'] = [];
  // Two passes at most: the first puts back every field an issue names; the module's own values always read.
  for (let pass = 0; pass < 2; pass++) {
    const parsed = schema.safeParse(current);
    if (parsed.success) return { patch: patchFrom(m, parsed.data), reverted, values: current };
    for (const issue of parsed.error.issues) {
      const field = issue.path[0] as ModuleFormField | undefined;
      if (field === undefined || !(field in lastValid) || reverted.some((r) => r.field === field)) continue;
      reverted.push({ field, message: issue.message, restored: lastValid[field] });
      current = { ...current, [field]: lastValid[field] };
    }
  }
  return { patch: {}, reverted, values: lastValid };
}
