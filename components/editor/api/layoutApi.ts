/**
 * The client's calls to the layout API: save with the version (If-Match) — the one save every
 * screen that edits a layout uses (the editor and the build plan, both through `useAutosave`) —
 * save a copy, run the live checks. Every answer becomes a typed result; a bad or missing response becomes a clear error,
 * never an exception the UI has not planned for. Must never import the database.
 */
import type { LayoutDoc } from '@/lib/layout';
import type { CheckReport } from '@/lib/checks/types';

export type FetchLike = (input: string, init?: RequestInit) => Promise<Response>;

export interface FieldIssue {
  path: string;
  message: string;
}

/** The copy someone else saved, as a 412 answer carries it. */
export interface SavedCopy {
  version: number;
  doc: LayoutDoc;
  updatedAt?: string;
  updatedBy?: string | null;
}

export type SaveResult =
  | { kind: 'saved'; version: number; updatedAt?: string }
  | { kind: 'conflict'; current: SavedCopy }
  | { kind: 'invalid'; message: string; issues: FieldIssue[] }
  | { kind: 'forbidden'; message: string }
  | { kind: 'error'; message: string; retry: boolean };

async function body(res: Response): Promise<Record<string, unknown>> {
  try {
    const v = await res.json();
    return v && typeof v === 'object' ? (v as Record<string, unknown>) : {};
  } catch {
    return {};
  }
}

const errorText = (b: Record<string, unknown>, fallback: string) => (typeof b.error === 'string' && b.error ? b.error : fallback);

export async function saveLayout(fetchFn: FetchLike, id: string, doc: LayoutDoc, version: number): Promise<SaveResult> {
  let res: Response;
  try {
    res = await fetchFn(`/api/layouts/${encodeURIComponent(id)}`, {
      method: 'PUT',
      headers: { 'content-type': 'application/json', 'if-match': String(version) },
      body: JSON.stringify({ doc }),
    });
  } catch {
    return { kind: 'error', message: 'Could not reach the server; your changes are kept here and will be saved when it answers.', retry: true };
  }
  const b = await body(res);
  if (res.ok) {
    const v = Number(b.version);
    if (!Number.isInteger(v)) return { kind: 'error', message: 'The server saved but sent no version.', retry: false };
    return { kind: 'saved', version: v, updatedAt: typeof b.updatedAt === 'string' ? b.updatedAt : undefined };
  }
  if (res.status === 412) {
    const cur = b.current as { version?: unknown; doc?: unknown; updatedAt?: unknown; updatedBy?: unknown } | undefined;
    if (cur && Number.isInteger(cur.version) && cur.doc && typeof cur.doc === 'object') {
      return {
        kind: 'conflict',
        current: {
          version: cur.version as number,
          doc: cur.doc as LayoutDoc,
          updatedAt: typeof cur.updatedAt === 'string' ? cur.updatedAt : undefined,
          updatedBy: typeof cur.updatedBy === 'string' ? cur.updatedBy : null,
        },
      };
    }
    return { kind: 'error', message: 'Someone saved first, and the server did not send their version.', retry: false };
  }
  if (res.status === 400) {
    const issues = Array.isArray(b.issues) ? (b.issues as FieldIssue[]).filter((i) => i && typeof i.message === 'string') : [];
    return { kind: 'invalid', message: errorText(b, 'The server refused the layout.'), issues };
  }
  if (res.status === 403 || res.status === 401) return { kind: 'forbidden', message: errorText(b, 'You may view this layout but not change it.') };
  return { kind: 'error', message: errorText(b, `Saving failed (HTTP ${res.status}).`), retry: res.status >= 500 || res.status === 429 };
}

export async function saveCopy(fetchFn: FetchLike, name: string, doc: LayoutDoc): Promise<{ ok: true; id: string } | { ok: false; message: string }> {
  try {
    const res = await fetchFn('/api/layouts', { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ name, doc: { ...doc, name } }) });
    const b = await body(res);
    if (res.ok && typeof b.id === 'string') return { ok: true, id: b.id };
    return { ok: false, message: errorText(b, `Could not save a copy (HTTP ${res.status}).`) };
  } catch {
    return { ok: false, message: 'Could not reach the server to save a copy.' };
  }
}

/** The check engine is not answering (not deployed yet, or failing): show "unavailable", never guess. */
export class ChecksUnavailable extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'ChecksUnavailable';
  }
}
export class ChecksRateLimited extends Error {
  constructor(public retryAfterMs: number) {
    super('Checks are busy; trying again shortly.');
    this.name = 'ChecksRateLimited';
  }
}
export class ChecksRefused extends Error {
  constructor(message: string, public issues: FieldIssue[]) {
    super(message);
    this.name = 'ChecksRefused';
  }
}

function isReport(v: unknown): v is CheckReport {
  const r = v as CheckReport;
  return !!r && typeof r.ok === 'boolean' && Array.isArray(r.findings) && r.findings.every((f) => f && typeof f.id === 'string' && typeof f.message === 'string' && ['pass', 'warn', 'fail'].includes(f.status));
}

export async function postChecks(fetchFn: FetchLike, doc: LayoutDoc, signal?: AbortSignal): Promise<CheckReport> {
  let res: Response;
  try {
    res = await fetchFn('/api/checks', { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify(doc), signal });
  } catch (e) {
    if ((e as Error)?.name === 'AbortError') throw e;
    throw new ChecksUnavailable('Could not reach the check service.');
  }
  const b = await body(res);
  if (res.ok) {
    if (!isReport(b)) throw new ChecksUnavailable('The check service sent an answer the editor cannot read.');
    return b;
  }
  if (res.status === 429) {
    const after = Number(b.retryAfter ?? res.headers.get('retry-after'));
    throw new ChecksRateLimited(Number.isFinite(after) && after > 0 ? (after < 60 ? after * 1000 : after) : 300);
  }
  if (res.status === 400) throw new ChecksRefused(errorText(b, 'The check service refused the layout.'), Array.isArray(b.issues) ? (b.issues as FieldIssue[]) : []);
  throw new ChecksUnavailable(errorText(b, `Checks are not available (HTTP ${res.status}).`));
}
