/**
 * Saving the build plan: `PUT /api/layouts/:id` with the document and `If-Match: <version>`, the
 * same contract as the editor's autosave. Every answer becomes a typed result — saved, someone
 * saved first (412, with their version), refused fields (400), read-only (401/403), or an error
 * — so the page can say exactly what happened. Must never retry a refused save by itself.
 */
import type { LayoutDoc } from '@/lib/layout';

export type SaveOutcome =
  | { kind: 'saved'; version: number }
  | { kind: 'conflict'; theirs: { version: number; doc: LayoutDoc; updatedBy: string | null } }
  | { kind: 'invalid'; message: string; issues: { path: string; message: string }[] }
  | { kind: 'forbidden'; message: string }
  | { kind: 'error'; message: string };

export async function saveLayoutDoc(layoutId: string, doc: LayoutDoc, version: number, fetchFn: typeof fetch = fetch): Promise<SaveOutcome> {
  let res: Response;
  try {
    res = await fetchFn(`/api/layouts/${encodeURIComponent(layoutId)}`, {
      method: 'PUT',
      headers: { 'content-type': 'application/json', 'if-match': String(version) },
      body: JSON.stringify({ doc }),
    });
  } catch {
    return { kind: 'error', message: 'Could not reach the server; your entries are kept on this page.' };
  }
  const body = (await res.json().catch(() => ({}))) as Record<string, unknown>;
  const message = typeof body.error === 'string' ? body.error : `Saving failed (HTTP ${res.status}).`;
  if (res.ok && Number.isInteger(body.version)) return { kind: 'saved', version: body.version as number };
  if (res.status === 412) {
    const cur = body.current as { version?: unknown; doc?: unknown; updatedBy?: unknown } | undefined;
    if (cur && Number.isInteger(cur.version) && cur.doc && typeof cur.doc === 'object') {
      return { kind: 'conflict', theirs: { version: cur.version as number, doc: cur.doc as LayoutDoc, updatedBy: typeof cur.updatedBy === 'string' ? cur.updatedBy : null } };
    }
    return { kind: 'error', message: 'Someone saved first, and the server did not send their version: reload the page.' };
  }
  if (res.status === 400) {
    const issues = Array.isArray(body.issues) ? (body.issues as { path: string; message: string }[]).filter((i) => i && typeof i.message === 'string') : [];
    return { kind: 'invalid', message, issues };
  }
  if (res.status === 401 || res.status === 403) return { kind: 'forbidden', message };
  return { kind: 'error', message };
}

/** The document with its systems sections replaced (an undefined section removed; no systems left → none). */
export function withSystems(doc: LayoutDoc, patch: Partial<NonNullable<LayoutDoc['systems']>>): LayoutDoc {
  const merged: Record<string, unknown> = { ...(doc.systems ?? {}), ...patch };
  for (const k of Object.keys(merged)) if (merged[k] === undefined) delete merged[k];
  const { systems: _old, ...rest } = doc;
  return Object.keys(merged).length ? { ...rest, systems: merged as LayoutDoc['systems'] } : rest;
}

/** JSON with object keys sorted, so two equal documents compare equal whatever their key order (the database reorders keys). */
export function stableJson(value: unknown): string {
  return JSON.stringify(value, (_k, v: unknown) =>
    v && typeof v === 'object' && !Array.isArray(v) ? Object.fromEntries(Object.entries(v as Record<string, unknown>).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))) : v,
  );
}
