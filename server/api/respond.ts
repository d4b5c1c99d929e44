/**
 * The shape of every route handler: session → rights → zod → work → DTO. `handle` turns the data
 * layer's deliberate errors into 4xx answers and anything unexpected into a bare 500 with no
 * stack or SQL in the body; `readJson` enforces the content type and a size limit before parsing.
 */
import 'server-only';
import { NextResponse } from 'next/server';
import type { z } from 'zod';
import { issuesFromZod, type FieldIssue } from '@/lib/layout/parse';
import { actorFromRequest } from '@/server/auth/session';
import type { Actor } from '@/db/actor';
import { ConflictError } from '@/db/errors';
import { WorkPoolBusyError, WorkPoolClosedError } from '@/lib/workers/pool';
import { correlationId, describeError, log, routeOf } from '@/lib/log';

export class HttpError extends Error {
  constructor(readonly status: number, message: string, readonly extra: Record<string, unknown> = {}) {
    super(message);
  }
}

export function json(body: unknown, init: ResponseInit = {}): NextResponse {
  return NextResponse.json(body, init);
}

export function problem(status: number, error: string, extra: Record<string, unknown> = {}): NextResponse {
  return NextResponse.json({ error, ...extra }, { status });
}

/** Ample for a layout of a few thousand modules; anything larger is refused before parsing. */
export const MAX_JSON_BYTES = 2 * 1024 * 1024;

/**
 * The body as JSON text, checked the way `readJson` checks it except that the text is parsed only
 * when it could hold a NUL or a lone surrogate (then here, to name the field): for work that parses
 * a large document off this thread. Whoever parses it must still answer 400 for text that is not JSON.
 */
export async function readJsonText(req: Request, maxBytes = MAX_JSON_BYTES): Promise<string> {
  const type = req.headers.get('content-type') ?? '';
  if (!/^application\/json\b/i.test(type)) throw new HttpError(415, 'Send the body as application/json.');
  const declared = Number(req.headers.get('content-length') ?? '0');
  if (declared > maxBytes) throw new HttpError(413, `The body is larger than ${Math.round(maxBytes / 1024)} KB.`);
  const text = await readLimited(req, maxBytes);
  if (!text.trim()) throw new HttpError(400, 'The body is empty; send a JSON document.');
  // Walking every string of a large document costs more than its parse; the walk (which names
  // the field) runs only when the text could hold a NUL or a lone surrogate: as an escape, or raw
  // (a raw NUL is not valid JSON). A false alarm only means the walk runs.
  if (mayHoldUnstorableText(text)) refuseUnstorableText(parseJsonText(text));
  return text;
}

export const NOT_JSON = 'The body is not valid JSON.';

function parseJsonText(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch {
    throw new HttpError(400, NOT_JSON);
  }
}

function refuseUnstorableText(value: unknown): void {
  const bad = unstorableText(value);
  if (bad) {
    throw new HttpError(400, 'Some fields are not valid.', {
      issues: [{ path: bad.path, message: bad.nul ? 'text may not contain NUL characters' : 'text has a broken character (a lone UTF-16 surrogate)' }],
    });
  }
}

export async function readJson(req: Request, maxBytes = MAX_JSON_BYTES): Promise<unknown> {
  return parseJsonText(await readJsonText(req, maxBytes));
}

function mayHoldUnstorableText(text: string): boolean {
  return !text.isWellFormed() || /\\u(0000|[dD][89a-fA-F])/.test(text);
}

/**
 * PostgreSQL text and jsonb cannot hold U+0000, and a lone UTF-16 surrogate is not text at all
 * (it cannot be encoded as UTF-8): refuse either at the door, naming the field, rather than fail
 * in the database. Keys count as well as values. Iterative, so depth costs no stack.
 */
function unstorableText(value: unknown): { path: string; nul: boolean } | null {
  const stack: [unknown, string][] = [[value, '']];
  const join = (path: string, key: string | number) => (path ? `${path}.${key}` : String(key));
  const check = (text: string, path: string) => (text.includes('\u0000') ? { path, nul: true } : !text.isWellFormed() ? { path, nul: false } : null);
  while (stack.length) {
    const [v, path] = stack.pop()!;
    if (typeof v === 'string') {
      const bad = check(v, path);
      if (bad) return bad;
    } else if (Array.isArray(v)) v.forEach((x, i) => stack.push([x, join(path, i)]));
    else if (v && typeof v === 'object') {
      for (const [k, x] of Object.entries(v)) {
        const bad = check(k, join(path, k));
        if (bad) return bad;
        stack.push([x, join(path, k)]);
      }
    }
  }
  return null;
}

async function readLimited(req: Request, maxBytes: number): Promise<string> {
  if (!req.body) return '';
  const reader = req.body.getReader();
  const chunks: Uint8Array[] = [];
  let size = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    size += value.byteLength;
    if (size > maxBytes) {
      await reader.cancel().catch(() => undefined);
      throw new HttpError(413, `The body is larger than ${Math.round(maxBytes / 1024)} KB.`);
    }
    chunks.push(value);
  }
  return new TextDecoder().decode(Buffer.concat(chunks));
}

export function parseWith<T extends z.ZodType>(schema: T, value: unknown): z.infer<T> {
  const result = schema.safeParse(value);
  if (!result.success) throw new HttpError(400, 'Some fields are not valid.', { issues: issuesFromZod(result.error) });
  return result.data;
}

export function invalid(issues: FieldIssue[]): HttpError {
  return new HttpError(400, 'Some fields are not valid.', { issues });
}

export async function requireActor(req: Request): Promise<Actor> {
  const actor = await actorFromRequest(req);
  if (!actor) throw new HttpError(401, 'Sign in to continue.');
  return actor;
}

/** State-changing requests from a browser must come from our own origin (CSRF). */
export function checkOrigin(req: Request): void {
  if (['GET', 'HEAD', 'OPTIONS'].includes(req.method)) return;
  const origin = req.headers.get('origin');
  if (!origin) return; // not a browser form or fetch: no ambient cookies are at risk
  const host = req.headers.get('x-forwarded-host') ?? req.headers.get('host');
  let originHost: string;
  try {
    originHost = new URL(origin).host;
  } catch {
    throw new HttpError(403, 'This request came from another site.');
  }
  if (!host || originHost !== host) throw new HttpError(403, 'This request came from another site.');
}

type Handler<C> = (req: Request, ctx: C) => Promise<Response>;

export function handle<C>(fn: Handler<C>): Handler<C> {
  return async (req, ctx) => {
    try {
      checkOrigin(req);
      return await fn(req, ctx);
    } catch (err) {
      return errorResponse(err, req);
    }
  };
}

/**
 * The answer for an error. Deliberate ones (HttpError, the data layer's 4xx errors) say what was
 * wrong; anything else is a fault: the log gets a correlation id, the route and the error's class
 * (lib/log cuts out parameters, tokens and hashes), and the 500 answer shows the same id.
 */
export function errorResponse(err: unknown, req?: Request): Response {
  if (err instanceof HttpError) {
    const res = problem(err.status, err.message, err.extra);
    const retry = err.extra.retryAfter;
    if (typeof retry === 'number' && retry > 0) res.headers.set('Retry-After', String(Math.ceil(retry)));
    return res;
  }
  // The work pool is full (or stopping): come back shortly; other requests keep flowing.
  if (err instanceof WorkPoolBusyError || err instanceof WorkPoolClosedError) {
    const retry = err instanceof WorkPoolBusyError ? err.retryAfterSeconds : 5;
    const res = problem(503, err.message, { retryAfter: retry });
    res.headers.set('Retry-After', String(retry));
    return res;
  }
  const status = (err as { status?: unknown })?.status;
  if (typeof status === 'number' && status >= 400 && status < 500) {
    const extra = status === 412 ? { current: (err as { current?: unknown }).current } : err instanceof ConflictError ? err.extra : {};
    return problem(status, (err as Error).message, extra);
  }
  const reference = correlationId();
  log.error('unexpected error', { reference, route: routeOf(req), ...describeError(err) });
  return problem(500, `Something went wrong on our side. Nothing was changed. If it happens again, quote reference ${reference}.`, { reference });
}
