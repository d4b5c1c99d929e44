/**
 * Edits of `doc.systems`, the build plan's inputs (vehicle, power, water, gas, heat): pure
 * functions from one document to the next, used by the editor store's `updateSystems`. Never
 * touches modules or the bay; never holds state.
 */
import type { LayoutDoc, Systems } from '@/lib/layout';

/** JSON with object keys sorted, so two equal values compare equal whatever their key order (the database reorders keys). */
export function stableJson(value: unknown): string {
  return JSON.stringify(value, (_k, v: unknown) =>
    v && typeof v === 'object' && !Array.isArray(v) ? Object.fromEntries(Object.entries(v as Record<string, unknown>).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))) : v,
  );
}

/**
 * The document with the named systems sections replaced (an undefined section removed; no
 * sections left → no `systems`). The same document back when nothing changes, so a form that
 * re-reads the same values adds no undo entry.
 */
export function withSystems(doc: LayoutDoc, patch: Partial<Systems>): LayoutDoc {
  const merged: Record<string, unknown> = { ...(doc.systems ?? {}), ...patch };
  for (const k of Object.keys(merged)) if (merged[k] === undefined) delete merged[k];
  const next = Object.keys(merged).length ? (merged as Systems) : undefined;
  if (stableJson(next ?? null) === stableJson(doc.systems ?? null)) return doc;
  const { systems: _old, ...rest } = doc;
  return next ? { ...rest, systems: next } : rest;
}
