/**
 * A local fake of the few payment-API endpoints Baywright's deposit flow uses, speaking the wire
 * format of the official `stripe` SDK: form-encoded requests, JSON responses, `Authorization:
 * Bearer sk_test_…`, errors as `{ error: { type, message, param } }`.
 *
 *   POST /v1/checkout/sessions        create (mode=payment, line_items[].price_data, …)
 *   GET  /v1/checkout/sessions/:id    retrieve
 *   GET  /checkout/:id                hosted test checkout page (Pay button, cancel link)
 *   POST /checkout/:id/pay            mark paid, POST a signed `checkout.session.completed`
 *                                     event to `webhookUrl`, then 303 to success_url
 *
 * `startFakeStripe({ port, webhookUrl, webhookSecret })` → `{ url, port, stop(), deliveries }`.
 * Point the SDK at it with `new Stripe('sk_test_…', { host: '127.0.0.1', port, protocol: 'http' })`.
 * Binds to 127.0.0.1 only. Must never forward anything to a real payment service, accept a live
 * key (`sk_live_…` is refused) or ask for card data.
 */
import { createServer, type IncomingMessage, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import { createSession, markPaid, ParamError, randomId, type CheckoutSession, type StoredSession } from './checkout-sessions';
import { FormBodyError, parseFormBody } from './form-body';
import { checkoutPage, escapeHtml } from './hosted-page';
import { signatureHeader } from './webhook-signature';

export interface FakeStripeOptions {
  /** 0 (default) picks a free port. */
  port?: number;
  /** Where `checkout.session.completed` events are POSTed. */
  webhookUrl?: string;
  /** The endpoint secret the app verifies with (e.g. `whsec_baywright_fake`). */
  webhookSecret?: string;
  /** API version stamped on events (the fake does not version its behaviour). */
  apiVersion?: string;
}

export interface WebhookDelivery {
  eventId: string;
  type: string;
  sessionId: string;
  status: number | null;
  error?: string;
}

export interface FakeStripe {
  url: string;
  port: number;
  /** Every webhook delivery attempt, in order. */
  deliveries: WebhookDelivery[];
  stop(): Promise<void>;
}

const MAX_BODY = 1_000_000;

class HttpError extends Error {
  constructor(readonly status: number, message: string, readonly type = 'invalid_request_error', readonly param?: string, readonly code?: string) {
    super(message);
  }
}

function readBody(req: IncomingMessage): Promise<string> {
  return new Promise((resolve, reject) => {
    let size = 0;
    const chunks: Buffer[] = [];
    req.on('data', (c: Buffer) => {
      size += c.length;
      if (size <= MAX_BODY) chunks.push(c); // past the limit: keep draining, answer 413 at the end
    });
    req.on('end', () => (size > MAX_BODY ? reject(new HttpError(413, 'Request body too large (1 MB at most).')) : resolve(Buffer.concat(chunks).toString('utf8'))));
    req.on('error', reject);
  });
}

function sendJson(res: ServerResponse, status: number, body: unknown): void {
  const text = JSON.stringify(body, null, 2);
  res.writeHead(status, { 'Content-Type': 'application/json', 'Request-Id': randomId('req'), 'Content-Length': Buffer.byteLength(text) });
  res.end(text);
}

function sendHtml(res: ServerResponse, status: number, html: string): void {
  res.writeHead(status, {
    'Content-Type': 'text/html; charset=utf-8',
    'Content-Security-Policy': "default-src 'none'; style-src 'unsafe-inline'",
    'X-Content-Type-Options': 'nosniff',
    'Content-Length': Buffer.byteLength(html),
  });
  res.end(html);
}

function requireKey(req: IncomingMessage): void {
  const auth = req.headers.authorization ?? '';
  const m = /^Bearer (\S+)$/.exec(auth);
  if (!m) throw new HttpError(401, 'You did not provide an API key. Send it as Authorization: Bearer sk_test_….');
  if (!m[1].startsWith('sk_test_')) throw new HttpError(401, `Invalid API key: this local test payment API accepts only test keys (sk_test_…).`);
}

export async function startFakeStripe(options: FakeStripeOptions = {}): Promise<FakeStripe> {
  const sessions = new Map<string, StoredSession>();
  const idempotent = new Map<string, string>();
  const deliveries: WebhookDelivery[] = [];
  let base = '';

  async function deliver(session: CheckoutSession): Promise<void> {
    if (!options.webhookUrl) return;
    const event = {
      id: randomId('evt_test'),
      object: 'event',
      api_version: options.apiVersion ?? '2025-01-01.baywright-fake',
      created: Math.floor(Date.now() / 1000),
      data: { object: session },
      livemode: false,
      pending_webhooks: 1,
      request: { id: null, idempotency_key: null },
      type: 'checkout.session.completed',
    };
    const payload = JSON.stringify(event, null, 2);
    const record: WebhookDelivery = { eventId: event.id, type: event.type, sessionId: session.id, status: null };
    deliveries.push(record);
    try {
      const headers: Record<string, string> = { 'Content-Type': 'application/json; charset=utf-8' };
      if (options.webhookSecret) headers['Stripe-Signature'] = signatureHeader(payload, options.webhookSecret, event.created);
      const res = await fetch(options.webhookUrl, { method: 'POST', headers, body: payload, signal: AbortSignal.timeout(10_000) });
      record.status = res.status;
      await res.arrayBuffer();
    } catch (err) {
      record.error = err instanceof Error ? err.message : String(err);
    }
  }

  async function handle(req: IncomingMessage, res: ServerResponse): Promise<void> {
    const u = new URL(req.url ?? '/', 'http://127.0.0.1');
    const path = u.pathname;
    const method = req.method ?? 'GET';

    if (path === '/v1/checkout/sessions' && method === 'POST') {
      requireKey(req);
      const body = await readBody(req);
      const key = req.headers['idempotency-key'];
      if (typeof key === 'string' && idempotent.has(key)) return sendJson(res, 200, sessions.get(idempotent.get(key)!)!.session);
      let params;
      try {
        params = parseFormBody(body);
      } catch (err) {
        throw new HttpError(400, err instanceof FormBodyError ? err.message : 'Could not read the request body.');
      }
      const stored = createSession(params, base);
      sessions.set(stored.session.id, stored);
      if (typeof key === 'string') idempotent.set(key, stored.session.id);
      return sendJson(res, 200, stored.session);
    }

    const retrieve = /^\/v1\/checkout\/sessions\/([^/]+)$/.exec(path);
    if (retrieve && method === 'GET') {
      requireKey(req);
      const stored = sessions.get(decodeURIComponent(retrieve[1]));
      if (!stored) throw new HttpError(404, `No such checkout.session: '${decodeURIComponent(retrieve[1])}'`, 'invalid_request_error', 'session', 'resource_missing');
      return sendJson(res, 200, stored.session);
    }

    const page = /^\/checkout\/([^/]+)(\/pay)?$/.exec(path);
    if (page) {
      const stored = sessions.get(decodeURIComponent(page[1]));
      if (!stored) return sendHtml(res, 404, '<!doctype html><title>Not found</title><p>No such test checkout.</p>');
      if (!page[2] && method === 'GET') return sendHtml(res, 200, checkoutPage(stored));
      if (page[2] && method === 'POST') {
        await readBody(req);
        if (markPaid(stored)) await deliver(stored.session);
        const target = stored.session.success_url.replace('{CHECKOUT_SESSION_ID}', encodeURIComponent(stored.session.id));
        res.writeHead(303, { Location: target, 'Content-Type': 'text/html; charset=utf-8' });
        res.end(`<!doctype html><p>Paid. Continue to <a href="${escapeHtml(target)}">the studio</a>.</p>`);
        return;
      }
      res.writeHead(405, { Allow: page[2] ? 'POST' : 'GET' });
      res.end();
      return;
    }
    if (path.startsWith('/v1/')) throw new HttpError(404, `Unrecognized request URL (${method}: ${path}). This local test payment API implements only Checkout Sessions create and retrieve.`);
    sendHtml(res, 404, '<!doctype html><title>Not found</title><p>Nothing here.</p>');
  }

  const server = createServer((req, res) => {
    handle(req, res).catch((err: unknown) => {
      if (res.headersSent) return res.destroy();
      if (err instanceof ParamError) return sendJson(res, 400, { error: { type: 'invalid_request_error', message: err.message, param: err.param } });
      if (err instanceof HttpError) return sendJson(res, err.status, { error: { type: err.type, message: err.message, ...(err.param ? { param: err.param } : {}), ...(err.code ? { code: err.code } : {}) } });
      sendJson(res, 500, { error: { type: 'api_error', message: 'The local test payment API hit an unexpected error.' } });
    });
  });

  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(options.port ?? 0, '127.0.0.1', () => resolve());
  });
  const port = (server.address() as AddressInfo).port;
  base = `http://127.0.0.1:${port}`;
  return {
    url: base,
    port,
    deliveries,
    stop: () =>
      new Promise<void>((resolve, reject) => {
        server.close((err) => (err ? reject(err) : resolve()));
        server.closeAllConnections();
      }),
  };
}
