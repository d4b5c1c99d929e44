// The connection policy and client addresses (server/auth/address.ts), in-process: what a caller
// sends in forwarded headers counts only when TRUST_PROXY says a proxy sent it; HTTPS (HSTS,
// Secure cookies) follows the public URL or the trusted proxy. The same against the real server:
// tests/system/connection.test.ts.
import { afterEach, describe, expect, it } from 'vitest';
import type { IncomingMessage, ServerResponse } from 'node:http';
import type { Socket } from 'node:net';
import { applyConnectionPolicy, clientAddress, HSTS, parseTrustProxy, PEER_HEADER, requestIsSecure } from '@/server/auth/address';
import { sessionCookieName, secureCookiesSetting } from '@/server/auth/secret';

const saved = { TRUST_PROXY: process.env.TRUST_PROXY, AUTH_URL: process.env.AUTH_URL, BAYWRIGHT_PUBLIC_URL: process.env.BAYWRIGHT_PUBLIC_URL };
afterEach(() => {
  for (const [k, v] of Object.entries(saved)) {
    if (v === undefined) delete process.env[k];
    else process.env[k] = v;
  }
});
function env(vars: Partial<Record<keyof typeof saved, string>>) {
  for (const k of Object.keys(saved)) delete process.env[k];
  Object.assign(process.env, vars);
}

/** Runs the policy on a raw request from `remote` and returns what Next would then see. */
function arrive(remote: string, headers: Record<string, string>, tls = false) {
  const incoming = { headers: { ...headers } } as unknown as IncomingMessage;
  const set = new Map<string, string>();
  const response = { setHeader: (k: string, v: string) => set.set(k.toLowerCase(), v) } as unknown as ServerResponse;
  applyConnectionPolicy(incoming, response, { remoteAddress: remote, encrypted: tls } as unknown as Socket);
  const seen = new Headers(incoming.headers as Record<string, string>);
  return { request: new Request('http://app.test/', { headers: seen }), headers: seen, response: set };
}

describe('without TRUST_PROXY', () => {
  it('the connection address is the client, whatever X-Forwarded-For and the stamp header say', () => {
    env({});
    const { request, headers } = arrive('::ffff:192.0.2.10', { 'x-forwarded-for': '203.0.113.9', [PEER_HEADER]: '203.0.113.10', 'x-forwarded-host': 'evil.test' });
    expect(clientAddress(request)).toBe('192.0.2.10');
    expect(headers.get('x-forwarded-for')).toBe('192.0.2.10');
    expect(headers.get('x-forwarded-host')).toBeNull();
  });
  it('X-Forwarded-Proto from the caller is replaced by the connection’s scheme: no HSTS, no Secure cookies', () => {
    env({});
    const { request, headers, response } = arrive('192.0.2.10', { 'x-forwarded-proto': 'https' });
    expect(headers.get('x-forwarded-proto')).toBe('http');
    expect(requestIsSecure(request)).toBe(false);
    expect(response.has('strict-transport-security')).toBe(false);
    expect(secureCookiesSetting()).toBe(false);
    expect(sessionCookieName()).toBe('authjs.session-token');
  });
  it('a TLS connection is https', () => {
    env({});
    const { request, response } = arrive('192.0.2.10', {}, true);
    expect(requestIsSecure(request)).toBe(true);
    expect(response.get('strict-transport-security')).toBe(HSTS);
  });
  it('an https public URL makes every answer HSTS and every cookie Secure', () => {
    env({ BAYWRIGHT_PUBLIC_URL: 'https://plans.example.test' });
    const { request, response } = arrive('192.0.2.10', {});
    expect(response.get('strict-transport-security')).toBe(HSTS);
    expect(requestIsSecure(request)).toBe(true);
    expect(secureCookiesSetting()).toBe(true);
    expect(sessionCookieName()).toBe('__Secure-authjs.session-token');
    env({ AUTH_URL: 'https://plans.example.test' });
    expect(secureCookiesSetting()).toBe(true);
  });
  it('a request that never passed the policy has no address of its own: one shared bucket', () => {
    env({});
    expect(clientAddress(new Request('http://app.test/', { headers: { 'x-forwarded-for': '203.0.113.9' } }))).toBe('unknown');
  });
});

describe('with TRUST_PROXY', () => {
  it('a hop count takes the address that many places from the right', () => {
    env({ TRUST_PROXY: '1' });
    expect(clientAddress(arrive('10.0.0.2', { 'x-forwarded-for': '198.51.100.1, 203.0.113.5' }).request)).toBe('203.0.113.5');
    env({ TRUST_PROXY: '2' });
    expect(clientAddress(arrive('10.0.0.2', { 'x-forwarded-for': '198.51.100.1, 203.0.113.5, 10.0.0.1' }).request)).toBe('203.0.113.5');
    // Fewer addresses than hops: the furthest one there is.
    expect(clientAddress(arrive('10.0.0.2', {}).request)).toBe('10.0.0.2');
  });
  it('a CIDR list trusts only those proxies, and skips them from the right', () => {
    env({ TRUST_PROXY: '10.0.0.0/8, fd00::/8' });
    expect(clientAddress(arrive('10.1.2.3', { 'x-forwarded-for': '198.51.100.1, 203.0.113.5, 10.0.0.9' }).request)).toBe('203.0.113.5');
    // A caller that is not one of the proxies gets its own connection address, forwarded headers replaced.
    const direct = arrive('203.0.113.77', { 'x-forwarded-for': '1.2.3.4', 'x-forwarded-proto': 'https' });
    expect(clientAddress(direct.request)).toBe('203.0.113.77');
    expect(requestIsSecure(direct.request)).toBe(false);
  });
  it('X-Forwarded-Proto from the trusted proxy decides HTTPS, HSTS and per-request Secure cookies', () => {
    env({ TRUST_PROXY: '1' });
    const https = arrive('10.0.0.2', { 'x-forwarded-proto': 'https' });
    expect(requestIsSecure(https.request)).toBe(true);
    expect(https.response.get('strict-transport-security')).toBe(HSTS);
    const http = arrive('10.0.0.2', { 'x-forwarded-proto': 'http' });
    expect(requestIsSecure(http.request)).toBe(false);
    expect(http.response.has('strict-transport-security')).toBe(false);
    expect(secureCookiesSetting()).toBeUndefined(); // Auth.js follows the request's scheme
  });
  it('refuses values it cannot read, with a message naming the variable', () => {
    expect(() => parseTrustProxy('proxy.internal')).toThrow(/TRUST_PROXY/);
    expect(() => parseTrustProxy('10.0.0.0/40')).toThrow(/prefix/);
    expect(() => parseTrustProxy('99')).toThrow(/at most 16/);
    expect(parseTrustProxy('')).toEqual({ kind: 'none' });
  });
});
