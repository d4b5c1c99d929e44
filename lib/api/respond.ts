/**
 * The shape of every route handler: session → rights → zod → work → DTO. `handle` turns the data
 * layer's deliberate errors into 4xx answers and anything unexpected into a bare 500 with no
 * stack or SQL in the body; `readJson` enforces the content type and a size limit before parsing.
 */
import 'server-only';
import { NextResponse } from 'next/server';
import type { z } from 'zod';
import { issuesFromZod, type FieldIssue } from '@/lib/layout/parse';
import { actorFromRequest } from '@/lib/auth/session';
import type { Actor } from '@/db/actor';

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

export async function readJson(req: Request, maxBytes = MAX_JSON_BYTES): Promise<unknown> {
  const type = req.headers.get('content-type') ?? '';
  if (!/^application\/json\b/i.test(type)) throw new HttpError(415, 'Send the body as application/json.');
  const declared = Number(req.headers.get('content-length') ?? '0');
  if (declared > maxBytes) throw new HttpError(413, `The body is larger than ${Math.round(maxBytes / 1024)} KB.`);
  const text = await readLimited(req, maxBytes);
  if (!text.trim()) throw new HttpError(400, 'The body is empty; send a JSON document.');
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch {
    throw new HttpError(400, 'The body is not valid JSON.');
  }
  if (containsNul(value)) throw new HttpError(400, 'Text in the body may not contain NUL characters.');
  return value;
}

/** PostgreSQL text and jsonb cannot hold U+0000; refuse it at the door rather than fail in the database. */
function containsNul(value: unknown): boolean {
  const stack: unknown[] = [value];
  while (stack.length) {
    const v = stack.pop();
    if (typeof v === 'string') {
      if (v.includes('\u0000')) return true;
    } else if (Array.isArray(v)) for (const x of v) stack.push(x);
    else if (v && typeof v === 'object') for (const [k, x] of Object.entries(v)) stack.push(k, x);
  }
  return false;
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
      return errorResponse(err);
    }
  };
}

export function errorResponse(err: unknown): Response {
  if (err instanceof HttpError) {
    const res = problem(err.status, err.message, err.extra);
    if (typeof err.extra.retryAfter === 'number') res.headers.set('Retry-After', String(err.extra.retryAfter));
    return res;
  }
  const status = (err as { status?: unknown })?.status;
  if (typeof status === 'number' && status >= 400 && status < 500) {
    const extra = status === 412 ? { current: (err as { current?: unknown }).current } : {};
    return problem(status, (err as Error).message, extra);
  }
  console.error('[baywright] unexpected error', err);
  return problem(500, 'Something went wrong on our side. Nothing was changed.');
}
