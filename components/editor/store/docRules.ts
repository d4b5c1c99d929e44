/**
 * What the layout schema (lib/layout/schema.ts) requires of a module, a bay, the build-up and the
 * occupants, checked by hand so the editor's first load does not carry zod (the Details and Bay
 * forms, which load on first use, do). tests/editor/docRules.test.ts keeps these rules in step
 * with the zod schema by property tests. Returns the first problem as "field: message", or null.
 * Must never accept what the schema refuses.
 */
import { KINDS } from '@/lib/layout/kinds';
import type { Arrangement, Bay, BuildUp, Facing, Module, Occupants, Surface } from '@/lib/layout/schema';

export const EDITOR_ARRANGEMENTS: readonly Arrangement[] = ['travel', 'lounge', 'sleep'];
export const EDITOR_FACINGS: readonly Facing[] = ['front', 'rear', 'left', 'right'];
export const EDITOR_SURFACES: readonly Surface[] = ['sleep', 'seat', 'counter'];

const ID = /^[A-Za-z0-9_-]+$/;
const CONTROL = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F]/;
const PROP_NAME = /^[A-Za-z][A-Za-z0-9]*$/;

const isInt = (v: unknown): v is number => typeof v === 'number' && Number.isInteger(v);
function mm(v: unknown, field: string, min: number, max: number): string | null {
  if (!isInt(v)) return `${field}: must be a whole number of millimetres`;
  if (v < min || v > max) return `${field}: must be between ${min} and ${max} mm`;
  return null;
}
function text(v: unknown, field: string, max: number): string | null {
  if (typeof v !== 'string') return `${field}: must be text`;
  if (v.length > max) return `${field}: at most ${max} characters`;
  if (CONTROL.test(v)) return `${field}: control characters are not allowed`;
  return null;
}
const first = (...checks: (string | null)[]) => checks.find((c) => c !== null) ?? null;

export function moduleProblem(m: Module): string | null {
  if (typeof m.id !== 'string' || m.id.length < 1 || m.id.length > 64 || !ID.test(m.id)) return 'id: letters, digits, - and _ only (1–64)';
  if (!Object.prototype.hasOwnProperty.call(KINDS, m.kind)) return `kind: unknown kind "${String(m.kind)}"`;
  const arr = m.arrangements;
  return first(
    m.label === undefined ? null : text(m.label, 'label', 80),
    mm(m.x, 'x', -100_000, 100_000),
    mm(m.y, 'y', -100_000, 100_000),
    mm(m.length, 'length', 1, 100_000),
    mm(m.width, 'width', 1, 100_000),
    mm(m.elevation, 'elevation', 0, 5000),
    mm(m.height, 'height', 1, 5000),
    EDITOR_FACINGS.includes(m.facing) ? null : 'facing: front, rear, left or right',
    !Array.isArray(arr) || arr.length < 1 ? 'arrangements: a module exists in at least one arrangement' : null,
    Array.isArray(arr) && (arr.length > 3 || arr.some((a) => !EDITOR_ARRANGEMENTS.includes(a)) || new Set(arr).size !== arr.length) ? 'arrangements: each of travel, lounge, sleep at most once' : null,
    m.surface === undefined || EDITOR_SURFACES.includes(m.surface) ? null : 'surface: sleep, seat or counter',
    m.massKg === undefined || (typeof m.massKg === 'number' && Number.isFinite(m.massKg) && m.massKg >= 0 && m.massKg <= 5000) ? null : 'massKg: from 0 to 5000 kg',
    m.props === undefined ? null : propsProblem(m.props),
  );
}

function propsProblem(props: NonNullable<Module['props']>): string | null {
  if (typeof props !== 'object' || props === null || Array.isArray(props)) return 'props: must be an object';
  const keys = Object.keys(props);
  if (keys.length > 32) return 'props: at most 32 props';
  for (const k of keys) {
    if (k.length > 40 || !PROP_NAME.test(k)) return `props.${k}: prop names are letters and digits`;
    const v = props[k];
    if (typeof v === 'number') { if (!Number.isFinite(v)) return `props.${k}: must be a finite number`; }
    else if (typeof v === 'string') { const t = text(v, `props.${k}`, 200); if (t) return t; }
    else if (typeof v !== 'boolean') return `props.${k}: number, true/false or text`;
  }
  return null;
}

export function bayProblem(bay: Bay): string | null {
  const base = first(mm(bay.length, 'length', 500, 100_000), mm(bay.width, 'width', 500, 100_000), mm(bay.height, 'height', 500, 100_000));
  if (base) return base;
  if (typeof bay.bulkhead !== 'boolean') return 'bulkhead: yes or no';
  if (!isInt(bay.cabSeats) || bay.cabSeats < 0 || bay.cabSeats > 9) return 'cabSeats: a whole number from 0 to 9';
  if (!Array.isArray(bay.wheelArches) || bay.wheelArches.length > 8) return 'wheelArches: at most 8';
  if (!Array.isArray(bay.doors) || bay.doors.length > 12) return 'doors: at most 12';
  for (const [i, a] of bay.wheelArches.entries()) {
    const p = first(
      a.side === 'left' || a.side === 'right' ? null : `wheelArches.${i}.side: left or right`,
      mm(a.x, `wheelArches.${i}.x`, 0, 100_000), mm(a.length, `wheelArches.${i}.length`, 0, 100_000),
      mm(a.width, `wheelArches.${i}.width`, 0, 100_000), mm(a.height, `wheelArches.${i}.height`, 0, 100_000),
      a.x + a.length > bay.length ? `wheelArches.${i}.length: wheel arch runs past the rear of the bay (${bay.length} mm)` : null,
    );
    if (p) return p;
  }
  for (const [i, d] of bay.doors.entries()) {
    const wall = d.wall === 'rear' ? bay.width : bay.length;
    const p = first(
      typeof d.id === 'string' && d.id.length >= 1 && d.id.length <= 64 && ID.test(d.id) ? null : `doors.${i}.id: letters, digits, - and _ only`,
      d.wall === 'left' || d.wall === 'right' || d.wall === 'rear' ? null : `doors.${i}.wall: left, right or rear`,
      mm(d.offset, `doors.${i}.offset`, 0, 100_000), mm(d.width, `doors.${i}.width`, 0, 100_000),
      d.offset + d.width > wall ? `doors.${i}.width: door runs past the end of the ${d.wall} wall (${wall} mm)` : null,
    );
    if (p) return p;
  }
  return null;
}

export function buildUpProblem(b: BuildUp): string | null {
  for (const part of ['floor', 'roof', 'walls'] as const) {
    const layers = b[part];
    if (!Array.isArray(layers) || layers.length > 12) return `${part}: at most 12 layers`;
    for (const [i, l] of layers.entries()) {
      const p = first(
        text(l.material, `${part}.${i}.material`, 80),
        typeof l.material === 'string' && l.material.length < 1 ? `${part}.${i}.material: name the material` : null,
        mm(l.thickness, `${part}.${i}.thickness`, 0, 1000),
      );
      if (p) return p;
    }
  }
  return null;
}

export function occupantsProblem(o: Occupants): string | null {
  const s = mm(o.standingHeight, 'standingHeight', 0, 2800);
  if (s) return s;
  if (!Array.isArray(o.sleepers) || o.sleepers.length > 12) return 'sleepers: at most 12';
  for (const [i, h] of o.sleepers.entries()) {
    const p = mm(h, `sleepers.${i}`, 300, 2800);
    if (p) return p;
  }
  return null;
}
