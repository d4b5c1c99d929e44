/**
 * Reading what a designer types into the build-planning forms: masses (`2100`, `2100 kg`,
 * `2.1 t`, `4630 lb`), lengths in the person's display unit (`3450`, `345 cm`, `3.45 m`,
 * `136 in`), cable runs in metres (`3`, `300 cm`, `10 ft`), and plain quantities with their unit
 * (`45 W`, `190 Ah`, `12.8 V`, `14.08 %`). And zod field builders that turn a form's text into
 * the numbers `doc.systems` holds, with a clear message when the text is not a quantity.
 *
 * Pure TypeScript (no React): the forms and the tests use it alike. Must never round a value
 * the schema keeps exact, and never accept a number without telling which unit it was read in.
 */
import * as z from 'zod/mini';
import { parseLength, toUnit, type LengthUnit } from '@/lib/layout/units';

/** 1 lb = 0.45359237 kg exactly (international yard and pound agreement, 1959). */
export const KG_PER_LB = 0.45359237;
/** 1 ft = 0.3048 m exactly (same agreement). */
export const M_PER_FT = 0.3048;

const NUMBER = String.raw`(-?\d+(?:[.,]\d+)?)`;

function toNumber(s: string): number {
  return Number(s.replace(',', '.'));
}

/** kg from `2100`, `2100 kg`, `2.1 t`, `4630 lb`; null when the text is not a mass. */
export function parseMassKg(text: string): number | null {
  const m = new RegExp(`^\\s*${NUMBER}\\s*(kg|t|tonnes?|lbs?)?\\s*$`, 'i').exec(text);
  if (!m) return null;
  const v = toNumber(m[1]);
  const unit = (m[2] ?? 'kg').toLowerCase();
  const kg = unit === 'kg' ? v : unit.startsWith('t') ? v * 1000 : v * KG_PER_LB;
  return Number.isFinite(kg) ? Math.round(kg * 1000) / 1000 : null;
}

/** Metres from `3`, `3 m`, `300 cm`, `3000 mm`, `10 ft`, `120 in`; null otherwise. */
export function parseMetres(text: string): number | null {
  const m = new RegExp(`^\\s*${NUMBER}\\s*(m|cm|mm|ft|feet|in|inch|inches|")?\\s*$`, 'i').exec(text);
  if (!m) return null;
  const v = toNumber(m[1]);
  const unit = (m[2] ?? 'm').toLowerCase();
  const factor = unit === 'm' ? 1 : unit === 'cm' ? 0.01 : unit === 'mm' ? 0.001 : unit === 'ft' || unit === 'feet' ? M_PER_FT : 0.0254;
  const metres = v * factor;
  return Number.isFinite(metres) ? Math.round(metres * 10000) / 10000 : null;
}

/** A number, optionally followed by one of `units` (case-insensitive); null otherwise. */
export function parseWithUnit(text: string, units: string[]): number | null {
  const alternatives = units.map((u) => u.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')).join('|');
  const m = new RegExp(`^\\s*${NUMBER}\\s*(?:${alternatives})?\\s*$`, 'i').exec(text);
  if (!m) return null;
  const v = toNumber(m[1]);
  return Number.isFinite(v) ? v : null;
}

/** How a stored number is shown in a field (no trailing zeros, no unit: the field shows it). */
export function shown(n: number | undefined): string {
  if (n === undefined) return '';
  return String(Math.round(n * 10000) / 10000);
}

export function shownLength(mm: number | undefined, unit: LengthUnit): string {
  return mm === undefined ? '' : String(toUnit(mm, unit));
}

interface Range {
  min?: number;
  max?: number;
  /** Whole numbers only (after conversion). */
  int?: boolean;
}

function quantity(read: (s: string) => number | null, example: string, unitWord: string, range: Range) {
  return (required: boolean) =>
    z.pipe(z.string(), z.transform((raw: string, ctx): number | undefined => {
      const s = raw.trim();
      if (s === '') {
        if (required) ctx.issues.push({ code: 'custom', input: raw, message: 'required' });
        return undefined;
      }
      const v = read(s);
      if (v === null) {
        ctx.issues.push({ code: 'custom', input: raw, message: `type ${example}` });
        return z.NEVER;
      }
      const n = range.int ? Math.round(v) : v;
      if (range.min !== undefined && n < range.min) ctx.issues.push({ code: 'custom', input: raw, message: `at least ${range.min} ${unitWord}` });
      if (range.max !== undefined && n > range.max) ctx.issues.push({ code: 'custom', input: raw, message: `at most ${range.max} ${unitWord}` });
      return n;
    }));
}

/** Optional and required field builders; each returns a zod schema from form text to a number. */
export const field = {
  mass: (r: Range = {}) => quantity(parseMassKg, 'a mass, e.g. 2100 kg or 2.1 t', 'kg', { min: 0, ...r }),
  length: (unit: LengthUnit, r: Range = {}) => quantity((s) => parseLength(s, unit), `a length, e.g. 1200 ${unit}, 120 cm or 1.2 m`, 'mm', { int: true, ...r }),
  metres: (r: Range = {}) => quantity(parseMetres, 'a length in metres, e.g. 3 m or 300 cm', 'm', { min: 0, ...r }),
  plain: (units: string[], example: string, r: Range = {}) => quantity((s) => parseWithUnit(s, units), example, units[0] ?? '', r),
};

/** Drops undefined members, and returns undefined for an object left empty. */
export function compact<T extends Record<string, unknown>>(o: T): Partial<T> | undefined {
  const out: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(o)) if (v !== undefined) out[k] = v;
  return Object.keys(out).length ? (out as Partial<T>) : undefined;
}

/** Tri-state answers (not answered / yes / no) for facts whose absence means "ask". */
export const triState = z.pipe(z.enum(['', 'yes', 'no']), z.transform((v: '' | 'yes' | 'no') => (v === '' ? undefined : v === 'yes')));
export function triStateOf(v: boolean | undefined): '' | 'yes' | 'no' {
  return v === undefined ? '' : v ? 'yes' : 'no';
}
