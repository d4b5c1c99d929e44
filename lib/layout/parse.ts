/**
 * Reading a layout document from untrusted input: step-by-step migration of older documents to
 * the current schema, then validation. Errors come back as a list of field paths and messages so
 * an API can return them as a 400 and a form can show them beside the field.
 */
import type { z } from 'zod';
import { layoutDocSchema, type LayoutDoc } from './schema';

export const CURRENT_SCHEMA_VERSION = 1;

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
};

export function issuesFromZod(error: z.ZodError): FieldIssue[] {
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
