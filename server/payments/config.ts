/**
 * Where the deposit flow's payment API is and which keys it uses. Where local stand-ins are
 * allowed (outside production, or the demo and tests: server/local-mode) that is always the local fake payment API (dev/fakes/stripe)
 * on 127.0.0.1, with a test key and a webhook secret made for this data folder; a real
 * deployment sets STRIPE_SECRET_KEY and STRIPE_WEBHOOK_SECRET and the official service is used.
 *
 *   FAKE_STRIPE_PORT          port of the fake (default 12111; the running fake publishes its own)
 *   STRIPE_SECRET_KEY         API key; default `sk_test_baywright_local` for the fake
 *   STRIPE_WEBHOOK_SECRET     endpoint secret; default a random `whsec_local_…` kept beside the data folder
 *
 * Must never hold or print a real key, and never send a live key (`sk_live_…`) to the fake.
 */
import 'server-only';
import fs from 'node:fs';
import path from 'node:path';
import crypto from 'node:crypto';
import { localStandInsAllowed } from '../local-mode';

export const DEFAULT_FAKE_STRIPE_PORT = 12111;
export const LOCAL_TEST_KEY = 'sk_test_baywright_local';

export class PaymentsNotConfigured extends Error {
  readonly status = 503;
  constructor(what: string) {
    super(`Payments are not set up on this server: ${what}.`);
    this.name = 'PaymentsNotConfigured';
  }
}

/** The fake is used wherever local stand-ins are allowed; production never falls back to it. */
export function usesFakePayments(env: Record<string, string | undefined> = process.env): boolean {
  return localStandInsAllowed(env);
}

/** Whether deposits can be taken at all: the fake where allowed, else both real settings. */
export function paymentsConfigured(env: Record<string, string | undefined> = process.env): boolean {
  return usesFakePayments(env) || Boolean(env.STRIPE_SECRET_KEY && env.STRIPE_WEBHOOK_SECRET);
}

type GlobalWithFake = typeof globalThis & { __baywrightFakeStripeAddress?: { host: string; port: number } };
const g = globalThis as GlobalWithFake;

/** Called by the fake's starter once it listens (it may have fallen back to another port). */
export function setFakeStripeAddress(address: { host: string; port: number } | null): void {
  if (address) g.__baywrightFakeStripeAddress = address;
  else delete g.__baywrightFakeStripeAddress;
}

export function fakeStripeAddress(env: Record<string, string | undefined> = process.env): { host: string; port: number } {
  if (g.__baywrightFakeStripeAddress) return g.__baywrightFakeStripeAddress;
  const raw = env.FAKE_STRIPE_PORT;
  const port = raw === undefined || raw === '' ? DEFAULT_FAKE_STRIPE_PORT : Number(raw);
  if (!Number.isInteger(port) || port <= 0 || port > 65535) throw new PaymentsNotConfigured(`FAKE_STRIPE_PORT must be a port number, got "${raw}"`);
  return { host: '127.0.0.1', port };
}

export function stripeApiKey(env: Record<string, string | undefined> = process.env): string {
  const key = env.STRIPE_SECRET_KEY;
  if (usesFakePayments(env)) {
    if (key && !key.startsWith('sk_test_')) throw new PaymentsNotConfigured('the local test payment API takes only a test key (sk_test_…); unset STRIPE_SECRET_KEY');
    return key || LOCAL_TEST_KEY;
  }
  if (!key) throw new PaymentsNotConfigured('set STRIPE_SECRET_KEY');
  return key;
}

let cachedSecret: { file: string; secret: string } | undefined;

/** The file the generated secret lives in: one per data folder (./data/.stripe-webhook-secret-<db>). */
export function webhookSecretFile(env: Record<string, string | undefined> = process.env): string {
  const root = env.BAYWRIGHT_DATA_ROOT ?? path.join(process.cwd(), 'data');
  const db = (env.BAYWRIGHT_DB ?? 'dev').replace(/[^a-z0-9_-]/gi, '_');
  return path.join(root, `.stripe-webhook-secret-${db}`);
}

export function webhookSecret(env: Record<string, string | undefined> = process.env): string {
  if (env.STRIPE_WEBHOOK_SECRET) return env.STRIPE_WEBHOOK_SECRET;
  if (!usesFakePayments(env)) throw new PaymentsNotConfigured('set STRIPE_WEBHOOK_SECRET');
  const file = webhookSecretFile(env);
  if (cachedSecret?.file === file) return cachedSecret.secret;
  let secret: string;
  try {
    secret = fs.readFileSync(file, 'utf8').trim();
  } catch {
    fs.mkdirSync(path.dirname(file), { recursive: true });
    try {
      fs.writeFileSync(file, `whsec_local_${crypto.randomBytes(24).toString('base64url')}`, { flag: 'wx', mode: 0o600 });
    } catch {
      /* another process wrote it first */
    }
    secret = fs.readFileSync(file, 'utf8').trim();
  }
  if (!secret) throw new PaymentsNotConfigured(`the webhook secret file ${file} is empty`);
  cachedSecret = { file, secret };
  return secret;
}
