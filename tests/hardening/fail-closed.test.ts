/**
 * Fail closed in production: with NODE_ENV=production and nothing asked for, no local fake runs
 * (mail, payments), deposits and invitations answer 503 "not set up" instead of faking, notices
 * say `mail: 'not-configured'`, and a missing AUTH_SECRET stops start-up with a clear message.
 * The demo (BAYWRIGHT_DEMO=1) and the test scripts (BAYWRIGHT_LOCAL_FAKES=1) ask for the fakes.
 * Everything here stays offline: no mail relay or payment service is contacted.
 */
import { afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import { eq } from 'drizzle-orm';
import { localStandInsAllowed } from '@/server/local-mode';
import { fakeSmtpWanted } from '@/dev/fakes/smtp/server';
import { paymentsConfigured, usesFakePayments } from '@/server/payments/config';
import { mailConfigured } from '@/server/mail/transport';
import { invitations, quotes } from '@/db/schema';
import type { Db } from '@/db/client';
import { useFreshDb } from '../helpers/db';
import { call } from '../helpers/http';
import { buildWorld, type World } from '../helpers/world';

const PROD = { NODE_ENV: 'production' };

describe('who may use local stand-ins', () => {
  it.each([
    [{ NODE_ENV: 'production' }, false],
    [{ NODE_ENV: 'production', BAYWRIGHT_REAL_SERVICES: '0' }, false],
    [{ NODE_ENV: 'production', BAYWRIGHT_DEMO: '1' }, true],
    [{ NODE_ENV: 'production', BAYWRIGHT_LOCAL_FAKES: '1' }, true],
    [{ NODE_ENV: 'development' }, true],
    [{ NODE_ENV: 'test' }, true],
    [{ NODE_ENV: 'development', BAYWRIGHT_LOCAL_FAKES: '0' }, false],
  ])('%o → %s', (env, allowed) => {
    expect(localStandInsAllowed(env)).toBe(allowed);
  });

  it('production starts no fake mail server and no fake payment API unless asked', () => {
    expect(fakeSmtpWanted(PROD)).toBe(false);
    expect(usesFakePayments(PROD)).toBe(false);
    expect(fakeSmtpWanted({ ...PROD, BAYWRIGHT_DEMO: '1' })).toBe(true);
    expect(usesFakePayments({ ...PROD, BAYWRIGHT_DEMO: '1' })).toBe(true);
  });

  it('production has deposits and mail only with their real settings', () => {
    expect(paymentsConfigured(PROD)).toBe(false);
    expect(paymentsConfigured({ ...PROD, STRIPE_SECRET_KEY: 'sk_live_x' })).toBe(false);
    expect(paymentsConfigured({ ...PROD, STRIPE_SECRET_KEY: 'sk_live_x', STRIPE_WEBHOOK_SECRET: 'whsec_x' })).toBe(true);
    expect(mailConfigured(PROD)).toBe(false);
    expect(mailConfigured({ ...PROD, SMTP_URL: 'smtp://relay.example:587' })).toBe(true);
  });
});

describe('the auth secret', () => {
  afterEach(() => {
    vi.unstubAllEnvs();
    vi.resetModules();
  });

  it('is never generated in production: start-up stops with a message that says what to set', async () => {
    vi.stubEnv('NODE_ENV', 'production');
    vi.stubEnv('AUTH_SECRET', '');
    vi.stubEnv('BAYWRIGHT_DEMO', '');
    vi.stubEnv('BAYWRIGHT_LOCAL_FAKES', '');
    vi.resetModules();
    const { authSecret } = await import('@/server/auth/secret');
    expect(() => authSecret()).toThrow(/AUTH_SECRET is not set.*openssl rand/);

    const { setLogSink } = await import('@/lib/log');
    const lines: string[] = [];
    const before = setLogSink((l) => lines.push(l));
    const exit = vi.spyOn(process, 'exit').mockImplementation(((code: number) => {
      throw new Error(`exit ${code}`);
    }) as never);
    try {
      const { startServer } = await import('@/instrumentation-node');
      await expect(startServer()).rejects.toThrow('exit 1');
      const entry = JSON.parse(lines.at(-1)!);
      expect(entry).toMatchObject({ level: 'error', event: 'cannot start' });
      expect(entry.message).toMatch(/AUTH_SECRET is not set/);
    } finally {
      exit.mockRestore();
      setLogSink(before);
    }
  });

  it('may be generated for the demo', async () => {
    vi.stubEnv('NODE_ENV', 'production');
    vi.stubEnv('AUTH_SECRET', '');
    vi.stubEnv('BAYWRIGHT_DEMO', '1');
    vi.resetModules();
    const { authSecret } = await import('@/server/auth/secret');
    expect(authSecret().length).toBeGreaterThanOrEqual(32);
  });
});

describe('the API of a production server without payments or mail', () => {
  let db: Db;
  let w: World;
  beforeAll(async () => {
    db = await useFreshDb();
    w = await buildWorld(db);
  });
  afterEach(() => vi.unstubAllEnvs());

  function production() {
    vi.stubEnv('NODE_ENV', 'production');
    // A production server has its secret; what it lacks here is mail and payments.
    vi.stubEnv('AUTH_SECRET', 'fail-closed-test-secret-kept-for-this-file');
    vi.stubEnv('BAYWRIGHT_DEMO', '');
    vi.stubEnv('BAYWRIGHT_LOCAL_FAKES', '');
    vi.stubEnv('SMTP_URL', '');
    vi.stubEnv('STRIPE_SECRET_KEY', '');
    vi.stubEnv('STRIPE_WEBHOOK_SECRET', '');
  }

  it('answers 503 "not set up" to the client paying a deposit, and opens no payment', async () => {
    await db.insert(quotes).values({
      layoutId: w.clientLayoutId, studioId: w.owner.studioId, number: 1, clientId: w.client.id, layoutVersion: 1, currency: 'GBP',
      parts: { lines: [] } as never, grossMinor: 500_000, depositPct: 20, depositMinor: 100_000, sentByName: 'Maren',
    });
    production();
    const checkout = await import('@/app/api/layouts/[id]/quote/checkout/route');
    const res = await call(checkout.POST, { method: 'POST', params: { id: w.clientLayoutId }, as: w.client });
    expect(res.status).toBe(503);
    expect(res.body.error).toMatch(/Payments are not set up on this server/);
  });

  it('answers 503 "not set up" to an invitation, and stores none', async () => {
    production();
    const route = await import('@/app/api/invitations/route');
    const before = (await db.select().from(invitations)).length;
    const res = await call(route.POST, { method: 'POST', as: w.owner, json: { name: 'Nell Client', email: 'nell@client.test' } });
    expect(res.status).toBe(503);
    expect(res.body.error).toMatch(/Mail is not set up on this server.*SMTP_URL/);
    expect((await db.select().from(invitations)).length).toBe(before);
    expect(await db.select().from(invitations).where(eq(invitations.email, 'nell@client.test'))).toEqual([]);
  });

  it('issues a revision but says the mail is not configured, never faking a send', async () => {
    production();
    const revisions = await import('@/app/api/layouts/[id]/revisions/route');
    const res = await call(revisions.POST, { method: 'POST', params: { id: w.clientLayoutId }, as: w.designer, json: { note: 'First issue' } });
    expect(res.status).toBe(201);
    expect(res.body.mail).toBe('not-configured');
  });
});
