/**
 * Calling route handlers in-process the way Next does: a Request in, a Response out, with a real
 * Auth.js session cookie minted by Auth.js's own encoder.
 */
import { encode } from 'next-auth/jwt';
import { authSecret, sessionCookieName, SESSION_MAX_AGE_S } from '../../server/auth/secret';

export interface SessionUser {
  id: string;
  studioId: string;
  role?: 'owner' | 'designer' | 'client';
  sessionVersion?: number;
  /** When the session signed in (seconds); now by default. */
  signedInAt?: number;
}

// Minting a cookie costs a key derivation and an encryption; a test file asks for the same few
// users' cookies thousands of times (the fuzz). The same claims within the same minute get the
// same cookie, as a browser would keep sending one.
const minted = new Map<string, Promise<string>>();

export function sessionCookie(user: SessionUser): Promise<string> {
  const key = JSON.stringify([sessionCookieName(), authSecret(), user.id, user.studioId, user.role, user.sessionVersion ?? 0, user.signedInAt ?? null, Math.floor(Date.now() / 60_000)]);
  let cookie = minted.get(key);
  if (!cookie) {
    if (minted.size > 1000) minted.clear();
    cookie = mintSessionCookie(user);
    minted.set(key, cookie);
    cookie.catch(() => minted.delete(key));
  }
  return cookie;
}

/** Every session token this process minted: the log tests check that none of them is ever logged. */
export const mintedSessionTokens = new Set<string>();

async function mintSessionCookie(user: SessionUser): Promise<string> {
  const name = sessionCookieName();
  const token = await encode({
    token: { uid: user.id, studioId: user.studioId, role: user.role, sv: user.sessionVersion ?? 0, sat: user.signedInAt ?? Math.floor(Date.now() / 1000), sub: user.id },
    secret: authSecret(),
    salt: name,
    maxAge: SESSION_MAX_AGE_S,
  });
  mintedSessionTokens.add(token);
  return `${name}=${token}`;
}

type Handler = (req: Request, ctx: any) => Promise<Response>;

export interface CallOptions {
  method?: string;
  path?: string;
  params?: Record<string, string>;
  json?: unknown;
  body?: string | Uint8Array<ArrayBuffer>;
  headers?: Record<string, string>;
  as?: SessionUser | null;
}

export async function call(handler: Handler, options: CallOptions = {}): Promise<{ status: number; body: any; headers: Headers }> {
  const headers: Record<string, string> = { host: 'localhost:3000', ...options.headers };
  if (options.as) headers.cookie = await sessionCookie(options.as);
  let body: string | Uint8Array<ArrayBuffer> | undefined = options.body;
  if (options.json !== undefined) {
    body = JSON.stringify(options.json);
    headers['content-type'] ??= 'application/json';
  }
  const req = new Request(`http://localhost:3000${options.path ?? '/'}`, { method: options.method ?? 'GET', headers, body });
  const res = await handler(req, { params: Promise.resolve(options.params ?? {}) });
  const text = await res.text();
  let parsed: unknown = text;
  try {
    parsed = text ? JSON.parse(text) : null;
  } catch {
    /* not JSON */
  }
  return { status: res.status, body: parsed, headers: res.headers };
}
