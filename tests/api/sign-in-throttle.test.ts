// Sign-in throttling, OWASP ASVS 4.0.3 V2.2.1: anti-automation against brute force and
// against lockout attacks ("ever increasing delays between attempts", "IP address
// restrictions", no more than 100 failed attempts per hour on one account). Every attempt is
// reserved in the database before the password is compared.
import { afterEach, beforeAll, beforeEach, describe, expect, it, vi } from 'vitest';
import { PEER_HEADER } from '@/server/auth/address';
import * as signUpRoute from '@/app/api/sign-up/route';
import { authenticate, SIGN_IN_FAILURE_LIMIT, SIGN_IN_RULES } from '@/db/accounts';
import { clearAllThrottles, reserve } from '@/db/throttle';
import * as password from '@/lib/auth/password';
import { useFreshDb } from '../helpers/db';
import { call } from '../helpers/http';

const PASSWORD = 'tide-table-gravel-42';

beforeAll(async () => {
  await useFreshDb();
  const res = await call(signUpRoute.POST, { method: 'POST', json: { name: 'Rhys Owner', email: 'rhys@throttle.test', password: PASSWORD }, headers: { [PEER_HEADER]: '10.77.0.1' } });
  expect(res.status).toBe(201);
});
beforeEach(async () => {
  await clearAllThrottles();
  vi.restoreAllMocks();
  // The clock stands still during each test, so the 1 s wait the tenth failure earns has not
  // run out when the eleventh attempt is counted, however slowly a loaded machine (or a pool
  // of real PostgreSQL connections) gets to it. The tests that move time pass their own dates.
  vi.useFakeTimers({ toFake: ['Date'] });
});
afterEach(() => {
  vi.useRealTimers();
});

describe('sign-in throttling (OWASP ASVS 4.0.3 V2.2.1)', () => {
  it(`compares only ${SIGN_IN_FAILURE_LIMIT} of 20 simultaneous guesses from one address`, async () => {
    const compare = vi.spyOn(password, 'verifyPassword');
    const results = await Promise.all(Array.from({ length: 20 }, (_, i) => authenticate('rhys@throttle.test', `wrong-guess-${i}-xx`, '10.1.1.1')));
    expect(results.filter((r) => !r.ok && r.reason === 'invalid')).toHaveLength(SIGN_IN_FAILURE_LIMIT);
    expect(results.filter((r) => !r.ok && r.reason === 'rate_limited')).toHaveLength(20 - SIGN_IN_FAILURE_LIMIT);
    expect(compare).toHaveBeenCalledTimes(SIGN_IN_FAILURE_LIMIT);
  });

  it('makes the guessing address wait, even with the right password, and says for how long', async () => {
    for (let i = 0; i < SIGN_IN_FAILURE_LIMIT; i++) await authenticate('rhys@throttle.test', `wrong-guess-${i}-xx`, '10.1.1.2');
    const blocked = await authenticate('rhys@throttle.test', PASSWORD, '10.1.1.2');
    expect(blocked).toMatchObject({ ok: false, reason: 'rate_limited' });
    if (!blocked.ok && blocked.reason === 'rate_limited') expect(blocked.retryAfterS).toBeGreaterThanOrEqual(1);
  });

  it('never stops the owner signing in from another address after a burst of wrong passwords', async () => {
    await Promise.all(Array.from({ length: 30 }, (_, i) => authenticate('rhys@throttle.test', `wrong-guess-${i}-xx`, '10.1.1.3')));
    expect((await authenticate('rhys@throttle.test', PASSWORD, '10.2.2.2')).ok).toBe(true);
  });

  it('grows the wait after each further failure: 1 s, then 2 s, then 4 s', async () => {
    const rule = SIGN_IN_RULES.accountAtAddress;
    const t0 = Date.UTC(2026, 0, 1, 12);
    const at = (ms: number) => new Date(t0 + ms);
    for (let i = 0; i < rule.free; i++) expect((await reserve('t:grow', rule, at(0))).ok).toBe(true);
    expect(await reserve('t:grow', rule, at(500))).toEqual({ ok: false, retryAfterS: 1 });
    expect((await reserve('t:grow', rule, at(1000))).ok).toBe(true); // waited 1 s
    expect(await reserve('t:grow', rule, at(2500))).toEqual({ ok: false, retryAfterS: 1 });
    expect((await reserve('t:grow', rule, at(3000))).ok).toBe(true); // waited 2 s
    expect(await reserve('t:grow', rule, at(6000))).toEqual({ ok: false, retryAfterS: 1 });
    expect((await reserve('t:grow', rule, at(7000))).ok).toBe(true); // waited 4 s
    // An hour without attempts starts the count afresh.
    for (let i = 0; i < rule.free; i++) expect((await reserve('t:grow', rule, at(7000 + rule.quietMs + i))).ok).toBe(true);
  });

  it('caps the wait at 15 minutes', async () => {
    const rule = SIGN_IN_RULES.accountAtAddress;
    const t0 = Date.UTC(2026, 0, 2, 12);
    let now = t0;
    for (let i = 0; i < rule.free + 20; i++) {
      const r = await reserve('t:cap', rule, new Date(now));
      if (!r.ok) {
        expect(r.retryAfterS).toBeLessThanOrEqual(15 * 60);
        now += r.retryAfterS * 1000;
        i--;
      }
    }
    const last = await reserve('t:cap', rule, new Date(now));
    expect(last).toEqual({ ok: false, retryAfterS: 15 * 60 });
  });

  // The guesses below are many: the comparison is stubbed to a quick "no" to keep the test fast
  // (bcrypt at cost 11 takes a few hundred milliseconds each); the throttle is what is tested.
  it('slows one address guessing many accounts (password spraying)', async () => {
    const rule = SIGN_IN_RULES.address;
    const stub = vi.spyOn(password, 'verifyPassword').mockResolvedValue(false);
    for (let i = 0; i < rule.free; i++) await authenticate(`spray${i}@throttle.test`, 'spray-password-xx', '10.3.3.3');
    stub.mockRestore();
    expect(await authenticate('rhys@throttle.test', PASSWORD, '10.3.3.3')).toMatchObject({ ok: false, reason: 'rate_limited' });
    expect((await authenticate('rhys@throttle.test', PASSWORD, '10.4.4.4')).ok).toBe(true);
  });

  it('a success from an address does not lift the wait its earlier guesses earned', async () => {
    const rule = SIGN_IN_RULES.address;
    const stub = vi.spyOn(password, 'verifyPassword').mockResolvedValue(false);
    for (let i = 0; i < rule.free - 1; i++) await authenticate(`spray${i}@throttle.test`, 'spray-password-xx', '10.5.5.5');
    stub.mockRestore();
    // The guesser's own account signs in (the last free attempt) …
    expect((await authenticate('rhys@throttle.test', PASSWORD, '10.5.5.5')).ok).toBe(true);
    // … which gives that attempt back, but the next guess still earns the wait, and it holds.
    vi.spyOn(password, 'verifyPassword').mockResolvedValue(false);
    expect(await authenticate('spray-last@throttle.test', 'spray-password-xx', '10.5.5.5')).toEqual({ ok: false, reason: 'invalid' });
    vi.restoreAllMocks();
    expect((await authenticate('rhys@throttle.test', PASSWORD, '10.5.5.5'))).toMatchObject({ ok: false, reason: 'rate_limited' });
  });

  it('keeps one account under 100 failures an hour from many addresses', async () => {
    const rule = SIGN_IN_RULES.account;
    expect(rule.free).toBeLessThan(100);
    const compare = vi.spyOn(password, 'verifyPassword').mockResolvedValue(false);
    for (let i = 0; i < 110; i++) await authenticate('rhys@throttle.test', 'botnet-guess-xxxx', `10.9.${Math.floor(i / 5)}.${i % 5}`);
    expect(compare.mock.calls.length).toBeLessThan(100);
  });
});
