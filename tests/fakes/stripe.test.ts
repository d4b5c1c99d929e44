// The local fake payment API, driven by the official `stripe` SDK exactly as the deposit flow will
// use it, with the webhook verified by the SDK's own `stripe.webhooks.constructEvent`.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { createHmac } from 'node:crypto';
import Stripe from 'stripe';
import { parseFormBody, signatureHeader, startFakeStripe, type FakeStripe } from '@/dev/fakes/stripe';

const SECRET = 'whsec_baywright_fake';
const KEY = 'sk_test_baywright_fake';

interface Received { body: string; signature: string | undefined }

let fake: FakeStripe;
let hook: Server;
const received: Received[] = [];
let stripe: Stripe;

beforeAll(async () => {
  hook = createServer((req, res) => {
    const chunks: Buffer[] = [];
    req.on('data', (c: Buffer) => chunks.push(c));
    req.on('end', () => {
      received.push({ body: Buffer.concat(chunks).toString('utf8'), signature: req.headers['stripe-signature'] as string | undefined });
      res.writeHead(200).end('{"received":true}');
    });
  });
  await new Promise<void>((r) => hook.listen(0, '127.0.0.1', () => r()));
  const hookPort = (hook.address() as AddressInfo).port;
  fake = await startFakeStripe({ port: 0, webhookUrl: `http://127.0.0.1:${hookPort}/api/payments/webhook`, webhookSecret: SECRET });
  stripe = new Stripe(KEY, { host: '127.0.0.1', port: fake.port, protocol: 'http', maxNetworkRetries: 0 });
});

afterAll(async () => {
  await fake?.stop();
  await new Promise<void>((r) => hook.close(() => r()));
});

async function newSession(extra: Partial<Stripe.Checkout.SessionCreateParams> = {}) {
  return stripe.checkout.sessions.create({
    mode: 'payment',
    line_items: [{ quantity: 1, price_data: { currency: 'gbp', unit_amount: 125_000, product_data: { name: 'Deposit for revision B', description: 'Rear-bed conversion' } } }],
    success_url: 'http://127.0.0.1:3000/quotes/q1?paid={CHECKOUT_SESSION_ID}',
    cancel_url: 'http://127.0.0.1:3000/quotes/q1',
    metadata: { quoteId: 'q1', layoutId: 'lay-7' },
    customer_email: 'client@example.com',
    ...extra,
  });
}

describe('fake payment API through the official SDK', () => {
  it('creates a Checkout Session with a cs_test_ id and a hosted page on the fake', async () => {
    const s = await newSession();
    expect(s.id).toMatch(/^cs_test_/);
    expect(s.object).toBe('checkout.session');
    expect(s.amount_total).toBe(125_000);
    expect(s.currency).toBe('gbp');
    expect(s.payment_status).toBe('unpaid');
    expect(s.metadata).toEqual({ quoteId: 'q1', layoutId: 'lay-7' });
    expect(s.customer_email).toBe('client@example.com');
    expect(s.url).toBe(`${fake.url}/checkout/${s.id}`);
    const again = await stripe.checkout.sessions.retrieve(s.id);
    expect(again.id).toBe(s.id);
    expect(again.status).toBe('open');
  });

  it('sums several line items with quantities', async () => {
    const s = await newSession({ line_items: [
      { quantity: 2, price_data: { currency: 'gbp', unit_amount: 1000, product_data: { name: 'A' } } },
      { quantity: 1, price_data: { currency: 'gbp', unit_amount: 250, product_data: { name: 'B' } } },
    ] });
    expect(s.amount_total).toBe(2250);
  });

  it('hosted page → Pay → signed checkout.session.completed webhook → redirect to success_url → retrieve shows paid', async () => {
    const s = await newSession();
    const page = await fetch(s.url!);
    expect(page.status).toBe(200);
    const html = await page.text();
    expect(html).toContain('<button type="submit">Pay</button>');
    expect(html).toContain('href="http://127.0.0.1:3000/quotes/q1"'); // cancel link
    expect(html).toContain('£1,250.00');

    const before = received.length;
    const pay = await fetch(`${fake.url}/checkout/${s.id}/pay`, { method: 'POST', redirect: 'manual' });
    expect(pay.status).toBe(303);
    expect(pay.headers.get('location')).toBe(`http://127.0.0.1:3000/quotes/q1?paid=${s.id}`);

    expect(received.length).toBe(before + 1);
    const delivery = received[received.length - 1];
    expect(delivery.signature).toMatch(/^t=\d+,v1=[0-9a-f]{64}$/);
    const event = stripe.webhooks.constructEvent(delivery.body, delivery.signature!, SECRET);
    expect(event.type).toBe('checkout.session.completed');
    const obj = event.data.object as Stripe.Checkout.Session;
    expect(obj.id).toBe(s.id);
    expect(obj.payment_status).toBe('paid');
    expect(obj.metadata?.quoteId).toBe('q1');
    expect(fake.deliveries.at(-1)).toMatchObject({ sessionId: s.id, status: 200 });

    const after = await stripe.checkout.sessions.retrieve(s.id);
    expect(after.payment_status).toBe('paid');
    expect(after.status).toBe('complete');
    expect(after.payment_intent).toMatch(/^pi_test_/);

    // Paying twice sends no second event.
    const again = await fetch(`${fake.url}/checkout/${s.id}/pay`, { method: 'POST', redirect: 'manual' });
    expect(again.status).toBe(303);
    expect(received.length).toBe(before + 1);
  });

  it('a tampered payload or a wrong secret is rejected by the SDK helper', async () => {
    const s = await newSession();
    await fetch(`${fake.url}/checkout/${s.id}/pay`, { method: 'POST', redirect: 'manual' });
    const d = received[received.length - 1];
    const tampered = d.body.replace('"payment_status": "paid"', '"payment_status": "unpaid"');
    expect(tampered).not.toBe(d.body);
    expect(() => stripe.webhooks.constructEvent(tampered, d.signature!, SECRET)).toThrow(Stripe.errors.StripeSignatureVerificationError);
    expect(() => stripe.webhooks.constructEvent(d.body, d.signature!, 'whsec_someone_else')).toThrow(Stripe.errors.StripeSignatureVerificationError);
    expect(() => stripe.webhooks.constructEvent(d.body, 't=1,v1=00', SECRET)).toThrow(Stripe.errors.StripeSignatureVerificationError);
  });

  it('signs exactly as documented: HMAC-SHA256 over "t.payload"', () => {
    const header = signatureHeader('{"a":1}', 'whsec_x', 1700000000);
    expect(header).toBe('t=1700000000,v1=' + createHmac('sha256', 'whsec_x').update('1700000000.{"a":1}').digest('hex'));
    const ev = stripe.webhooks.constructEvent('{"id":"evt_1","object":"event","type":"x","data":{"object":{}}}', signatureHeader('{"id":"evt_1","object":"event","type":"x","data":{"object":{}}}', 'whsec_x'), 'whsec_x');
    expect(ev.id).toBe('evt_1');
  });

  it('the cancel path leaves the session unpaid', async () => {
    const s = await newSession();
    const html = await (await fetch(s.url!)).text();
    expect(html).toMatch(/Cancel and go back/);
    expect((await stripe.checkout.sessions.retrieve(s.id)).payment_status).toBe('unpaid');
  });
});

describe('errors in the SDK’s own shapes', () => {
  it('refuses a missing or live key', async () => {
    const live = new Stripe('sk_live_not_here', { host: '127.0.0.1', port: fake.port, protocol: 'http', maxNetworkRetries: 0 });
    await expect(live.checkout.sessions.retrieve('cs_test_x')).rejects.toBeInstanceOf(Stripe.errors.StripeAuthenticationError);
    const bare = await fetch(`${fake.url}/v1/checkout/sessions`, { method: 'POST', body: 'mode=payment' });
    expect(bare.status).toBe(401);
    expect((await bare.json()).error.message).toMatch(/API key/);
  });

  it('names the bad parameter', async () => {
    await expect(newSession({ line_items: [] })).rejects.toMatchObject({ type: 'StripeInvalidRequestError', param: 'line_items' });
    await expect(newSession({ success_url: 'ftp://nowhere' })).rejects.toMatchObject({ param: 'success_url' });
    await expect(newSession({ customer_email: 'not-an-email' })).rejects.toMatchObject({ param: 'customer_email' });
    await expect(newSession({ mode: 'subscription' })).rejects.toMatchObject({ param: 'mode' });
    await expect(newSession({ line_items: [{ quantity: 1, price: 'price_123' }] })).rejects.toMatchObject({ param: 'line_items[0][price]' });
    await expect(newSession({ locale: 'fr' } as Partial<Stripe.Checkout.SessionCreateParams>)).rejects.toMatchObject({ message: expect.stringMatching(/unknown parameter: locale/) });
  });

  it('unknown session → 404 resource_missing; unknown endpoint → 404; hosted page for a stranger id → 404', async () => {
    await expect(stripe.checkout.sessions.retrieve('cs_test_nope')).rejects.toMatchObject({ statusCode: 404, code: 'resource_missing' });
    const other = await fetch(`${fake.url}/v1/customers`, { headers: { Authorization: `Bearer ${KEY}` } });
    expect(other.status).toBe(404);
    expect((await fetch(`${fake.url}/checkout/cs_test_nope`)).status).toBe(404);
  });

  it('malformed and oversized bodies get a 4xx, never a crash', async () => {
    const bad = await fetch(`${fake.url}/v1/checkout/sessions`, { method: 'POST', headers: { Authorization: `Bearer ${KEY}`, 'Content-Type': 'application/x-www-form-urlencoded' }, body: 'a]b=1' });
    expect(bad.status).toBe(400);
    const proto = await fetch(`${fake.url}/v1/checkout/sessions`, { method: 'POST', headers: { Authorization: `Bearer ${KEY}` }, body: '__proto__[x]=1' });
    expect(proto.status).toBe(400);
    const big = await fetch(`${fake.url}/v1/checkout/sessions`, { method: 'POST', headers: { Authorization: `Bearer ${KEY}` }, body: 'x='.padEnd(1_100_000, 'y') });
    expect(big.status).toBe(413);
    // Still serving afterwards.
    expect((await newSession()).id).toMatch(/^cs_test_/);
  });
});

describe('form body reading', () => {
  it('reads the SDK’s bracket encoding into nested objects and arrays', () => {
    const p = parseFormBody('mode=payment&line_items[0][quantity]=1&line_items[0][price_data][currency]=gbp&line_items[1][quantity]=2&metadata[quoteId]=q%201&expand[]=line_items');
    expect(p).toEqual({ mode: 'payment', line_items: [{ quantity: '1', price_data: { currency: 'gbp' } }, { quantity: '2' }], metadata: { quoteId: 'q 1' }, expand: ['line_items'] });
    expect(() => parseFormBody('a=1&a[b]=2')).toThrow(/both/);
  });
});
