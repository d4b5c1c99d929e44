/**
 * Reading a layout document from untrusted input: step-by-step migration of older documents to
 * the current schema, then validation. Errors come back as a list of field paths and messages so
 * an API can return them as a 400 and a form can show them beside the field.
 */
import type { z } from 'zod/mini';
import { CURRENT_SCHEMA_VERSION, layoutDocSchema, type LayoutDoc } from './document';
import { kindSpec, KINDS, type ModuleKind } from './kinds';

export { CURRENT_SCHEMA_VERSION };

export interface FieldIssue {
  /** Dotted path into the document, e.g. `modules.3.width`; empty for the document itself. */
  path: string;
  message: string;
}

export type ParseResult<T> = { ok: true; value: T } | { ok: false; issues: FieldIssue[] };

/** One step per old version: `migrations[n]` turns a version-n document into version n+1. */
const migrations: Record<number, (doc: Record<string, unknown>) => Record<string, unknown>> = {
  // 0: documents written before the version field existed carry everything version 1 has.
  0: (doc) => ({ ...doc, schemaVersion: 1 }),
  // 1: a module's `props` was a free bag of names; now each kind declares its values (kinds.ts).
  // Values the module's kind declares are kept (a number or yes/no typed as text is read as one);
  // names the kind does not declare, and values outside their limits, are dropped.
  1: (doc) => ({ ...doc, schemaVersion: 2, modules: Array.isArray(doc.modules) ? doc.modules.map(typedProps) : doc.modules }),
  // 2: a module's top had one `surface` for every arrangement; now it says what it is in each
  // (`surfaces`). The old value becomes the value in every arrangement the module is present in,
  // so the checks read exactly what they read before. `mount` is new and defaults to inside.
  2: (doc) => ({ ...doc, schemaVersion: 3, modules: Array.isArray(doc.modules) ? doc.modules.map(surfacesPerArrangement) : doc.modules }),
  // 3: the bay had doors only; now it also holds its windows, roof openings and body points
  // (`bay.openings`). A version-3 document has none drawn, so it gets an empty list and is
  // otherwise unchanged. A bay that is not an object is left for validation to report.
  3: (doc) => ({ ...doc, schemaVersion: 4, bay: withOpenings(doc.bay) }),
};

function withOpenings(bay: unknown): unknown {
  if (typeof bay !== 'object' || bay === null || Array.isArray(bay) || Object.hasOwn(bay, 'openings')) return bay;
  return { ...bay, openings: [] };
}

function surfacesPerArrangement(m: unknown): unknown {
  if (typeof m !== 'object' || m === null || Array.isArray(m) || !Object.hasOwn(m, 'surface')) return m;
  const { surface, ...rest } = m as Record<string, unknown>;
  if (surface === undefined) return rest;
  // Anything but a known arrangement list is left for validation to report on the module.
  const present = Array.isArray(rest.arrangements) ? rest.arrangements.filter((a): a is string => typeof a === 'string') : [];
  const surfaces: Record<string, unknown> = {};
  for (const a of present) surfaces[a] = surface;
  return { ...rest, surfaces };
}

function typedProps(m: unknown): unknown {
  if (typeof m !== 'object' || m === null || Array.isArray(m)) return m;
  const { props, ...rest } = m as Record<string, unknown>;
  const kind = rest.kind;
  if (props === undefined || typeof kind !== 'string' || !Object.hasOwn(KINDS, kind)) return m;
  if (typeof props !== 'object' || props === null || Array.isArray(props)) return rest;
  const fields = kindSpec(kind as ModuleKind).values;
  const out: Record<string, unknown> = {};
  for (const [key, raw] of Object.entries(props)) {
    const field = Object.hasOwn(fields, key) ? fields[key] : undefined;
    if (!field) continue;
    const value = field.input === 'number' && typeof raw === 'string' && raw.trim() !== '' ? Number(raw.trim().replace(',', '.'))
      : field.input === 'boolean' && (raw === 'true' || raw === 'false') ? raw === 'true'
        : field.input === 'text' && typeof raw === 'number' ? String(raw)
          : raw;
    if (field.schema.safeParse(value).success) out[key] = value;
  }
  return Object.keys(out).length > 0 ? { ...rest, props: out } : rest;
}

export function issuesFromZod(error: { issues: readonly z.core.$ZodIssue[] }): FieldIssue[] {
  return error.issues.map((issue) => ({
    path: issue.path.map(String).join('.'),
    message: issue.message,
  }));
}

export function migrateLayoutDoc(input: unknown): ParseResult<unknown> {
  if (typeof input !== 'object' || input === null || Array.isArray(input)) {
    return { ok: false, issues: [{ path: '', message: 'a layout document must be a JSON object' }] };
  }
  let doc = input as Record<string, unknown>;
  let version = doc.schemaVersion === undefined ? 0 : doc.schemaVersion;
  if (typeof version !== 'number' || !Number.isInteger(version) || version < 0) {
    return { ok: false, issues: [{ path: 'schemaVersion', message: 'schemaVersion must be a whole number' }] };
  }
  if (version > CURRENT_SCHEMA_VERSION) {
    return { ok: false, issues: [{ path: 'schemaVersion', message: `schemaVersion ${version} is newer than this server understands (${CURRENT_SCHEMA_VERSION})` }] };
  }
  while (version < CURRENT_SCHEMA_VERSION) {
    doc = migrations[version](doc);
    version += 1;
  }
  return { ok: true, value: doc };
}

/** Migrate, then validate. Never throws on bad input. */
export function parseLayoutDoc(input: unknown): ParseResult<LayoutDoc> {
  const migrated = migrateLayoutDoc(input);
  if (!migrated.ok) return migrated;
  const result = layoutDocSchema.safeParse(migrated.value);
  if (!result.success) return { ok: false, issues: issuesFromZod(result.error) };
  return { ok: true, value: result.data };
}
