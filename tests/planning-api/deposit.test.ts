// The deposit flow against the local fake payment API, driven through the official SDK: the
// checkout route as each role, the hosted checkout's Pay, the signed webhook (verified by the
// SDK's constructEvent), replays, forged events, the return-visit check, and the receipt mail.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { eq } from 'drizzle-orm';
import * as quoteRoute from '@/app/api/layouts/[id]/quote/route';
import * as checkout from '@/app/api/layouts/[id]/quote/checkout/route';
import * as webhook from '@/app/api/payments/webhook/route';
import { layouts, paymentEvents, payments, quotes } from '@/db/schema';
import type { Db } from '@/db/client';
import { loadActor } from '@/db/actor';
import { startFakeStripe, signatureHeader, type FakeStripe } from '@/dev/fakes/stripe';
import type { FakeSmtp } from '@/dev/fakes/smtp/server';
import { setFakeStripeAddress } from '@/server/payments/config';
import { stripeClient } from '@/server/payments/stripe';
import { checkReturnedSession } from '@/server/payments/deposit';
import { useFreshDb } from '../helpers/db';
import { call } from '../helpers/http';
import { buildWorld, type World } from '../helpers/world';
import { as, mailFor, startMailSink, type Who } from '../sharing/helpers';

const SECRET = 'whsec_test_planning_api';
let db: Db;
let w: World;
let mail: FakeSmtp;
let fake: FakeStripe;
let silentFake: FakeStripe;
let forwarder: Server;
let quoteId: string;

/** Hands the fake's webhook deliveries to the route handler in this process, as Next would. */
function startForwarder(): Promise<Server> {
  const server = createServer((req, res) => {
    const chunks: Buffer[] = [];
    req.on('data', (c: Buffer) => chunks.push(c));
    req.on('end', async () => {
      const headers = new Headers();
      for (const [k, v] of Object.entries(req.headers)) if (typeof v === 'string') headers.set(k, v);
      headers.set('host', 'localhost:3000');
      const out = await webhook.POST(new Request('http://localhost:3000/api/payments/webhook', { method: 'POST', headers, body: Buffer.concat(chunks) }), { params: Promise.resolve({}) });
      res.writeHead(out.status, { 'content-type': 'application/json' }).end(await out.text());
    });
  });
  return new Promise((resolve) => server.listen(0, '127.0.0.1', () => resolve(server)));
}

beforeAll(async () => {
  db = await useFreshDb();
  w = await buildWorld(db);
  mail = await startMailSink();
  process.env.STRIPE_WEBHOOK_SECRET = SECRET;
  forwarder = await startForwarder();
  fake = await startFakeStripe({ port: 0, webhookUrl: `http://127.0.0.1:${(forwarder.address() as AddressInfo).port}/api/payments/webhook`, webhookSecret: SECRET });
  silentFake = await startFakeStripe({ port: 0 }); // delivers no webhooks: the return-visit check must do
  setFakeStripeAddress({ host: '127.0.0.1', port: fake.port });
  const [layout] = await db.select({ version: layouts.version }).from(layouts).where(eq(layouts.id, w.clientLayoutId));
  const sent = await call(quoteRoute.POST, { method: 'POST', as: w.designer, params: { id: w.clientLayoutId }, json: { layoutVersion: layout.version, depositPct: 25, confirmUnapproved: true } });
  expect(sent.status).toBe(201);
  quoteId = sent.body.quote.id;
});

afterAll(async () => {
  setFakeStripeAddress(null);
  delete process.env.STRIPE_WEBHOOK_SECRET;
  await fake?.stop();
  await silentFake?.stop();
  await new Promise<void>((r) => (forwarder ? forwarder.close(() => r()) : r()));
  await mail?.close();
});

async function quoteRow(id = quoteId) {
  const [row] = await db.select().from(quotes).where(eq(quotes.id, id));
  return row;
}

const signed = (payload: string, secret = SECRET) => ({ 'content-type': 'application/json', 'stripe-signature': signatureHeader(payload, secret) });

function completedEvent(session: object, id = `evt_test_${Math.random().toString(36).slice(2)}`) {
  return JSON.stringify({ id, object: 'event', type: 'checkout.session.completed', created: Math.floor(Date.now() / 1000), livemode: false, data: { object: session } });
}

describe('POST /api/layouts/:id/quote/checkout', () => {
  it.each([['anonymous', 401], ['designer', 403], ['owner', 403], ['otherClient', 404], ['foreignOwner', 404], ['foreignClient', 404]] as [Who, number][])(
    'refuses the %s with %i and opens nothing', async (who, status) => {
      const res = await call(checkout.POST, { method: 'POST', as: as(w, who), params: { id: w.clientLayoutId } });
      expect(res.status).toBe(status);
      expect(await db.select().from(payments)).toHaveLength(0);
    },
  );

  it('answers 502 and opens nothing when the payment API does not answer', async () => {
    setFakeStripeAddress({ host: '127.0.0.1', port: 1 });
    const res = await call(checkout.POST, { method: 'POST', as: w.client, params: { id: w.clientLayoutId } });
    setFakeStripeAddress({ host: '127.0.0.1', port: fake.port });
    expect(res.status).toBe(502);
    expect(res.body.error).toMatch(/nothing was charged/);
    expect(await db.select().from(payments)).toHaveLength(0);
  });

  it('opens a hosted checkout for the deposit, for the client, and reuses it while open', async () => {
    const res = await call(checkout.POST, { method: 'POST', as: w.client, params: { id: w.clientLayoutId } });
    expect(res.status).toBe(201);
    expect(res.body.url).toBe(`${fake.url}/checkout/${res.body.sessionId}`);
    const session = await stripeClient().checkout.sessions.retrieve(res.body.sessionId);
    const q = await quoteRow();
    expect(session.amount_total).toBe(q.depositMinor);
    expect(session.currency).toBe('gbp');
    expect(session.metadata).toMatchObject({ quoteId, layoutId: w.clientLayoutId });
    expect(session.customer_email).toBe('priya@client.test');
    expect(session.success_url).toBe(`http://localhost:3000/layouts/${w.clientLayoutId}/quote?paid={CHECKOUT_SESSION_ID}`);
    const again = await call(checkout.POST, { method: 'POST', as: w.client, params: { id: w.clientLayoutId } });
    expect(again.body.sessionId).toBe(res.body.sessionId);
    const rows = await db.select().from(payments);
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ status: 'open', amountMinor: q.depositMinor, currency: 'GBP', quoteId });
  });
});

describe('POST /api/payments/webhook: refusals', () => {
  async function openSession() {
    const [p] = await db.select().from(payments).where(eq(payments.quoteId, quoteId));
    return stripeClient().checkout.sessions.retrieve(p.checkoutSessionId);
  }

  it.each([
    ['no signature', (body: string) => ({ 'content-type': 'application/json', body })],
    ['a signature made with another secret', (body: string) => ({ ...signed(body, 'whsec_someone_else'), body })],
    ['a body changed after signing', (body: string) => ({ ...signed(body), body: body.replace('"unpaid"', '"paid"') })],
    ['a garbage signature header', (body: string) => ({ 'content-type': 'application/json', 'stripe-signature': 't=1,v1=abc', body })],
  ])('answers %s with 400 and changes nothing', async (_what, build) => {
    const session = await openSession();
    const { body, ...headers } = build(completedEvent({ ...session, payment_status: 'unpaid' }));
    const res = await call(webhook.POST, { method: 'POST', headers, body });
    expect(res.status).toBe(400);
    expect(res.body.error).toMatch(/signature/i);
    expect((await quoteRow()).status).toBe('sent');
    expect(await db.select().from(paymentEvents)).toHaveLength(0);
  });

  it('ignores, without marking paid, a signed event whose amount is not the deposit', async () => {
    const session = await openSession();
    const payload = completedEvent({ ...session, payment_status: 'paid', status: 'complete', amount_total: 1 });
    const res = await call(webhook.POST, { method: 'POST', headers: signed(payload), body: payload });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ outcome: 'ignored', reason: expect.stringMatching(/amount/) });
    expect((await quoteRow()).status).toBe('sent');
  });

  it('ignores a signed event for a session that is not ours, and event types it does not use', async () => {
    const stranger = completedEvent({ id: 'cs_test_unknown', object: 'checkout.session', payment_status: 'paid', amount_total: 100, currency: 'gbp', metadata: {} });
    const r1 = await call(webhook.POST, { method: 'POST', headers: signed(stranger), body: stranger });
    expect(r1.body).toMatchObject({ outcome: 'ignored', reason: expect.stringMatching(/no checkout of ours/) });
    const other = JSON.stringify({ id: 'evt_test_other', object: 'event', type: 'customer.created', data: { object: {} } });
    const r2 = await call(webhook.POST, { method: 'POST', headers: signed(other), body: other });
    expect(r2.status).toBe(200);
    expect(r2.body.outcome).toBe('ignored');
    expect((await quoteRow()).status).toBe('sent');
  });
});

describe('paying on the hosted checkout', () => {
  let sessionId: string;
  let paidEventId: string;

  it('Pay → signed webhook → quote paid → receipt in the outbox → back to the quote', async () => {
    const [p] = await db.select().from(payments).where(eq(payments.quoteId, quoteId));
    sessionId = p.checkoutSessionId;
    const page = await fetch(`${fake.url}/checkout/${sessionId}`);
    expect(await page.text()).toMatch(/no money moves/);
    const pay = await fetch(`${fake.url}/checkout/${sessionId}/pay`, { method: 'POST', redirect: 'manual' });
    expect(pay.status).toBe(303);
    expect(pay.headers.get('location')).toBe(`http://localhost:3000/layouts/${w.clientLayoutId}/quote?paid=${sessionId}`);
    const delivery = fake.deliveries.find((d) => d.sessionId === sessionId)!;
    expect(delivery.status).toBe(200);
    paidEventId = delivery.eventId;

    const q = await quoteRow();
    expect(q.status).toBe('paid');
    expect(q.paidAt).toBeInstanceOf(Date);
    expect(q.receiptTo).toBe('priya@client.test');
    const [payment] = await db.select().from(payments).where(eq(payments.checkoutSessionId, sessionId));
    expect(payment.status).toBe('paid');
    expect(payment.providerPaymentId).toMatch(/^pi_test_/);
    const receipts = (await mailFor(db, 'priya@client.test')).filter((m) => /^Receipt: deposit of £/.test(m.parsed.subject ?? ''));
    expect(receipts).toHaveLength(1);
    const text = receipts[0].parsed.text ?? '';
    expect(text).toContain(`£${(q.depositMinor / 100).toLocaleString('en-GB', { minimumFractionDigits: 2 })}`);
    expect(text).toContain(`/layouts/${w.clientLayoutId}/quote`);
    expect(text).toMatch(/not a VAT invoice/);
    // The receipt carries the caution: licensed fitters certify gas, 230 V, heater and belt work.
    expect(text).toMatch(/qualified, licensed fitters to local codes/);

    const shown = await call(quoteRoute.GET, { as: w.client, params: { id: w.clientLayoutId } });
    expect(shown.body.quote).toMatchObject({ status: 'paid', canPay: false, receiptTo: 'priya@client.test' });
  });

  it('treats a replay of the same event as already handled: 200, nothing changed, no second receipt', async () => {
    const session = await stripeClient().checkout.sessions.retrieve(sessionId);
    const payload = completedEvent(session, paidEventId);
    const before = await quoteRow();
    const res = await call(webhook.POST, { method: 'POST', headers: signed(payload), body: payload });
    expect(res.status).toBe(200);
    expect(res.body.outcome).toBe('duplicate-event');
    expect(await quoteRow()).toEqual(before);
    expect((await mailFor(db, 'priya@client.test')).filter((m) => /^Receipt/.test(m.parsed.subject ?? ''))).toHaveLength(1);
  });

  it('treats a second, different event for the paid session as already paid', async () => {
    const session = await stripeClient().checkout.sessions.retrieve(sessionId);
    const payload = completedEvent(session);
    const res = await call(webhook.POST, { method: 'POST', headers: signed(payload), body: payload });
    expect(res.body.outcome).toBe('already-paid');
    expect((await mailFor(db, 'priya@client.test')).filter((m) => /^Receipt/.test(m.parsed.subject ?? ''))).toHaveLength(1);
  });

  it('finds the deposit already paid on the return visit', async () => {
    const actor = (await loadActor(w.client.id, w.client.studioId, 0))!;
    const outcome = await checkReturnedSession(new Request('http://localhost:3000/'), actor, w.clientLayoutId, sessionId);
    expect(outcome?.kind).toBe('already-paid');
  });

  it('refuses a second checkout (409) and a new quote (409) once the deposit is paid', async () => {
    const again = await call(checkout.POST, { method: 'POST', as: w.client, params: { id: w.clientLayoutId } });
    expect(again.status).toBe(409);
    const [layout] = await db.select({ version: layouts.version }).from(layouts).where(eq(layouts.id, w.clientLayoutId));
    const resend = await call(quoteRoute.POST, { method: 'POST', as: w.designer, params: { id: w.clientLayoutId }, json: { layoutVersion: layout.version, depositPct: 30, confirmUnapproved: true } });
    expect(resend.status).toBe(409);
    expect((await db.select().from(quotes).where(eq(quotes.layoutId, w.clientLayoutId))).filter((q) => q.status === 'paid')).toHaveLength(1);
  });
});

describe('the return-visit check when the webhook never came', () => {
  it('marks the deposit paid from the payment API’s own record of the session, once', async () => {
    const [layout] = await db.select({ version: layouts.version }).from(layouts).where(eq(layouts.id, w.otherLayoutId));
    const sent = await call(quoteRoute.POST, { method: 'POST', as: w.owner, params: { id: w.otherLayoutId }, json: { layoutVersion: layout.version, depositPct: 10, confirmUnapproved: true } });
    expect(sent.status).toBe(201);
    setFakeStripeAddress({ host: '127.0.0.1', port: silentFake.port });
    try {
      const opened = await call(checkout.POST, { method: 'POST', as: w.otherClient, params: { id: w.otherLayoutId } });
      expect(opened.status).toBe(201);
      const tom = (await loadActor(w.otherClient.id, w.otherClient.studioId, 0))!;
      const req = new Request('http://localhost:3000/');
      // Not paid yet: nothing changes.
      expect((await checkReturnedSession(req, tom, w.otherLayoutId, opened.body.sessionId))?.kind).toBe('ignored');
      expect((await quoteRow(sent.body.quote.id)).status).toBe('sent');
      await fetch(`${silentFake.url}/checkout/${opened.body.sessionId}/pay`, { method: 'POST', redirect: 'manual' });
      expect((await quoteRow(sent.body.quote.id)).status).toBe('sent');
      // Another reader cannot use someone else's session id on this layout.
      const priya = (await loadActor(w.client.id, w.client.studioId, 0))!;
      await expect(checkReturnedSession(req, priya, w.otherLayoutId, opened.body.sessionId)).rejects.toMatchObject({ status: 404 });
      expect(await checkReturnedSession(req, tom, w.otherLayoutId, 'cs_test_not_ours')).toBeNull();
      expect((await checkReturnedSession(req, tom, w.otherLayoutId, opened.body.sessionId))?.kind).toBe('paid');
      expect((await checkReturnedSession(req, tom, w.otherLayoutId, opened.body.sessionId))?.kind).toBe('already-paid');
      expect((await quoteRow(sent.body.quote.id)).status).toBe('paid');
      expect((await mailFor(db, 'tom@client.test')).filter((m) => /^Receipt/.test(m.parsed.subject ?? ''))).toHaveLength(1);
    } finally {
      setFakeStripeAddress({ host: '127.0.0.1', port: fake.port });
    }
  });
});
