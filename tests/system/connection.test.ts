/**
 * Client addresses and HTTPS against the real production server (`next start`): a caller-set
 * X-Forwarded-For never chooses the rate-limit bucket when no proxy is trusted, and does choose
 * it when TRUST_PROXY says one proxy stands in front; X-Forwarded-Proto: https brings HSTS and
 * `__Secure-` session cookies only from a trusted proxy. The viewer-link limiter (a burst of 60
 * per address, app/api/v/viewer-guard.ts) is the probe: it answers before the token is looked up.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestServer, stopProcessGroup, type TestServer } from '../../scripts/lib/test-server';
import { DEMO_PASSWORD } from '../../lib/demo-accounts';

/** The system tests' port (`SYSTEM_TEST_PORT`, as in crash.test.ts) and the one after it. */
const PORT = Number(process.env.SYSTEM_TEST_PORT ?? 3291);

/** Each block runs its own server (own port and folder), started once and stopped after it. */
function serverFor(env: Record<string, string>, port: number, db: string) {
  const box: { server?: TestServer } = {};
  beforeAll(async () => {
    box.server = await startTestServer({ port, db, seed: true, fresh: true, quiet: true, env });
  }, 180_000);
  afterAll(async () => {
    if (box.server) await stopProcessGroup(box.server.process);
  });
  return () => box.server!;
}

/**
 * 200 viewer requests, each of which may say it comes from somewhere else. One bucket (a burst of
 * 60, refilled at 5 a second) runs dry well before the end however slow the machine; 200 buckets
 * of one request each never do.
 */
const BURST = 200;
async function burst(base: string, forwardedFor: (i: number) => string | null): Promise<number[]> {
  const statuses: number[] = [];
  for (let i = 0; i < BURST; i++) {
    const xff = forwardedFor(i);
    const res = await fetch(`${base}/api/v/no-such-link-${i}`, { headers: xff ? { 'x-forwarded-for': xff } : {} });
    statuses.push(res.status);
    await res.body?.cancel();
  }
  return statuses;
}

/** Signs in the way a browser does and returns the session cookie's Set-Cookie line. */
async function sessionSetCookie(base: string, headers: Record<string, string>): Promise<string> {
  const csrfRes = await fetch(`${base}/api/auth/csrf`, { headers });
  const { csrfToken } = (await csrfRes.json()) as { csrfToken: string };
  const jar = csrfRes.headers.getSetCookie().map((c) => c.split(';')[0]);
  const res = await fetch(`${base}/api/auth/callback/credentials`, {
    method: 'POST',
    redirect: 'manual',
    headers: { ...headers, 'content-type': 'application/x-www-form-urlencoded', cookie: jar.join('; ') },
    body: new URLSearchParams({ csrfToken, email: 'ivo@saltmarsh.test', password: DEMO_PASSWORD, callbackUrl: `${base}/layouts` }),
  });
  const line = res.headers.getSetCookie().find((c) => /authjs\.session-token=/.test(c));
  if (!line) throw new Error(`no session cookie (status ${res.status})`);
  return line;
}

describe('without a trusted proxy', () => {
  const server = serverFor({ TRUST_PROXY: '' }, PORT, 'system-connection');

  it('a caller-set X-Forwarded-For does not choose the rate-limit bucket', async () => {
    const statuses = await burst(server().url, (i) => `203.0.113.${i}`);
    expect(statuses.slice(0, 60).every((s) => s === 404)).toBe(true);
    expect(statuses).toContain(429);
  });

  it('X-Forwarded-Proto: https from the caller brings neither HSTS nor a __Secure- cookie', async () => {
    const res = await fetch(`${server().url}/api/health`, { headers: { 'x-forwarded-proto': 'https' } });
    expect(res.headers.get('strict-transport-security')).toBeNull();
    const cookie = await sessionSetCookie(server().url, { 'x-forwarded-proto': 'https' });
    expect(cookie).toMatch(/^authjs\.session-token=/);
    expect(cookie).not.toMatch(/;\s*Secure/i);
  });
});

describe('with TRUST_PROXY=1 (one proxy in front)', () => {
  const server = serverFor({ TRUST_PROXY: '1' }, PORT + 1, 'system-connection-proxy');

  it('the proxy-reported address chooses the bucket', async () => {
    const spread = await burst(server().url, (i) => `198.51.100.${i}`);
    expect(spread.every((s) => s === 404)).toBe(true);
    // The proxy appends the client last; an address the client put in front of it is not trusted.
    const one = await burst(server().url, (i) => `10.0.0.${i}, 192.0.2.7`);
    expect(one.slice(0, 60).every((s) => s === 404)).toBe(true);
    expect(one).toContain(429);
  });

  it('X-Forwarded-Proto: https from the proxy brings HSTS and a Secure __Secure- session cookie; http brings neither', async () => {
    const https = await fetch(`${server().url}/api/health`, { headers: { 'x-forwarded-proto': 'https' } });
    expect(https.headers.get('strict-transport-security')).toMatch(/max-age=\d+/);
    const plain = await fetch(`${server().url}/api/health`, { headers: { 'x-forwarded-proto': 'http' } });
    expect(plain.headers.get('strict-transport-security')).toBeNull();
    const secure = await sessionSetCookie(server().url, { 'x-forwarded-proto': 'https' });
    expect(secure).toMatch(/^__Secure-authjs\.session-token=/);
    expect(secure).toMatch(/;\s*Secure/i);
    const insecure = await sessionSetCookie(server().url, { 'x-forwarded-proto': 'http' });
    expect(insecure).toMatch(/^authjs\.session-token=/);
  });
});
