/**
 * Where a request came from, decided once per connection and never by the caller: the client's
 * address for rate limits, and whether it came over HTTPS (HSTS, `Secure` cookies).
 *
 * Next's server (`next start`) keeps an `X-Forwarded-For` / `-Proto` / `-Host` the caller sent and
 * only fills them in when absent, and route handlers never see the socket. So the server process
 * listens on Node's documented `http.server.request.start` diagnostics channel
 * (`installConnectionPolicy`, from instrumentation-node.ts), which runs before Next reads the
 * request, and there:
 * - stamps the socket's address into PEER_HEADER, replacing anything the caller sent by that name;
 * - unless a trusted proxy is configured (TRUST_PROXY) and the connection comes from it, replaces
 *   the caller's X-Forwarded-For with the socket address, X-Forwarded-Proto with the connection's
 *   own scheme (https when the public URL is https), and drops X-Forwarded-Host;
 * - sends Strict-Transport-Security on every answer to an HTTPS request.
 *
 * TRUST_PROXY: unset = no proxy (the connection is the client); a whole number n = n proxies in
 * front, the client is the n-th address from the right of X-Forwarded-For + the socket address; a
 * comma-separated list of addresses or CIDR ranges = the proxies' addresses, the client is the
 * right-most address not in it.
 */
import { BlockList, isIP } from 'node:net';
import diagnostics from 'node:diagnostics_channel';
import type { IncomingMessage, ServerResponse } from 'node:http';
import type { Socket } from 'node:net';
import { log } from '@/lib/log';

/** Set only by the connection policy; a caller-sent copy is always replaced. */
export const PEER_HEADER = 'x-baywright-peer';
export const HSTS = 'max-age=63072000; includeSubDomains';

export type ProxyTrust = { kind: 'none' } | { kind: 'hops'; hops: number } | { kind: 'list'; list: BlockList; text: string };

let cachedTrust: { raw: string | undefined; trust: ProxyTrust } | undefined;

function normalise(address: string): string {
  const a = address.trim().replace(/^\[|\]$/g, '');
  return a.startsWith('::ffff:') && isIP(a.slice(7)) === 4 ? a.slice(7) : a;
}

/** Parses TRUST_PROXY; throws with a clear message on a value it cannot read (start-up fails). */
export function parseTrustProxy(raw: string | undefined): ProxyTrust {
  const text = (raw ?? '').trim();
  if (!text || text === '0' || text === 'false') return { kind: 'none' };
  if (/^\d+$/.test(text)) {
    const hops = Number(text);
    if (hops > 16) throw new Error(`TRUST_PROXY: ${hops} proxies is more than any real deployment has (at most 16)`);
    return { kind: 'hops', hops };
  }
  const list = new BlockList();
  for (const part of text.split(',').map((p) => p.trim()).filter(Boolean)) {
    const [addr, bits] = part.split('/');
    const family = isIP(normalise(addr));
    if (!family) throw new Error(`TRUST_PROXY: "${part}" is not an address, a CIDR range or a number of proxies`);
    const type = family === 4 ? 'ipv4' : 'ipv6';
    if (bits === undefined) list.addAddress(normalise(addr), type);
    else {
      const prefix = Number(bits);
      if (!/^\d+$/.test(bits) || prefix > (family === 4 ? 32 : 128)) throw new Error(`TRUST_PROXY: "${part}" has no valid prefix length`);
      list.addSubnet(normalise(addr), prefix, type);
    }
  }
  return { kind: 'list', list, text };
}

export function proxyTrust(): ProxyTrust {
  const raw = process.env.TRUST_PROXY;
  if (!cachedTrust || cachedTrust.raw !== raw) cachedTrust = { raw, trust: parseTrustProxy(raw) };
  return cachedTrust.trust;
}

function trusted(list: BlockList, address: string): boolean {
  const a = normalise(address);
  const family = isIP(a);
  return family !== 0 && list.check(a, family === 4 ? 'ipv4' : 'ipv6');
}

/** True when the public address of the app (AUTH_URL or BAYWRIGHT_PUBLIC_URL) is https. */
export function publicUrlIsHttps(): boolean {
  return [process.env.AUTH_URL, process.env.BAYWRIGHT_PUBLIC_URL].some((u) => (u ?? '').trim().toLowerCase().startsWith('https://'));
}

function lastValue(header: string | null | undefined): string {
  return (header ?? '').split(',').pop()?.trim().toLowerCase() ?? '';
}

/** Does the connection policy take the proxy headers of a request from this peer as they are? */
function proxyHeadersTrusted(peer: string, trust: ProxyTrust): boolean {
  if (trust.kind === 'none') return false;
  if (trust.kind === 'hops') return trust.hops > 0;
  return trusted(trust.list, peer);
}

/**
 * The connection policy for one request, before Next reads it (see the header of this file).
 * Exported for the tests; the server calls it through `installConnectionPolicy`.
 */
export function applyConnectionPolicy(request: IncomingMessage, response: ServerResponse | undefined, socket: Socket | undefined): void {
  const headers = request.headers;
  const peer = normalise(socket?.remoteAddress ?? '') || 'unknown';
  delete headers[PEER_HEADER];
  headers[PEER_HEADER] = peer;
  const trust = proxyTrust();
  if (!proxyHeadersTrusted(peer, trust)) {
    const tls = Boolean((socket as { encrypted?: boolean } | undefined)?.encrypted);
    headers['x-forwarded-for'] = peer;
    headers['x-forwarded-proto'] = tls || publicUrlIsHttps() ? 'https' : 'http';
    delete headers['x-forwarded-host'];
  }
  if (response && (publicUrlIsHttps() || lastValue(headers['x-forwarded-proto'] as string | undefined) === 'https')) {
    response.setHeader('Strict-Transport-Security', HSTS);
  }
}

const INSTALLED = Symbol.for('baywright.connectionPolicy');
type Holder = { [INSTALLED]?: boolean };

/** Subscribes the connection policy to every HTTP request this process serves (once). */
export function installConnectionPolicy(): void {
  const holder = globalThis as Holder;
  if (holder[INSTALLED]) return;
  proxyTrust(); // a bad TRUST_PROXY stops start-up here, with its message
  diagnostics.subscribe('http.server.request.start', (message) => {
    const { request, response, socket } = message as { request: IncomingMessage; response?: ServerResponse; socket?: Socket };
    applyConnectionPolicy(request, response, socket);
  });
  holder[INSTALLED] = true;
}

export function connectionPolicyInstalled(): boolean {
  return (globalThis as Holder)[INSTALLED] === true;
}

let warned = false;

/**
 * The caller's network address, for rate limits: the connection's address, or with TRUST_PROXY
 * the client's address as the trusted proxies reported it. Every limiter keys on this one function.
 * Without the connection policy (a server that did not run instrumentation) there is no trustworthy
 * address: every caller then shares the bucket "unknown", which errs on the side of refusing.
 */
export function clientAddress(request: Request | undefined): string {
  const headers = request?.headers;
  const peer = connectionPolicyInstalled() ? headers?.get(PEER_HEADER)?.trim() : undefined;
  if (!peer) {
    if (!warned && process.env.NODE_ENV === 'production') {
      warned = true;
      log.warn('no connection address on a request: the connection policy is not installed; all callers share one rate-limit bucket');
    }
    return 'unknown';
  }
  const trust = proxyTrust();
  if (!proxyHeadersTrusted(peer, trust)) return peer.slice(0, 64);
  const chain = [...(headers?.get('x-forwarded-for') ?? '').split(','), peer].map(normalise).filter(Boolean);
  let client: string;
  if (trust.kind === 'hops') client = chain[Math.max(0, chain.length - 1 - trust.hops)];
  else {
    let i = chain.length - 1;
    while (i > 0 && trust.kind === 'list' && trusted(trust.list, chain[i])) i--;
    client = chain[i];
  }
  return client.slice(0, 64);
}

/**
 * Did this request reach us over HTTPS? True when the public URL is https; otherwise what
 * X-Forwarded-Proto says — which the connection policy has already set from the connection
 * itself unless a trusted proxy sent it.
 */
export function requestIsSecure(request: Request | undefined): boolean {
  if (publicUrlIsHttps()) return true;
  return lastValue(request?.headers.get('x-forwarded-proto')) === 'https';
}
