/**
 * Starts this process's local fake payment API once (dev reloads get the same one), for
 * dev/fakes/local-services. Port: FAKE_STRIPE_PORT, default 12111; when the default is taken
 * (another app process on this machine runs its own fake) it falls back to a free port, and
 * publishes whichever it got for server/payments. Webhooks go to this app's own
 * `/api/payments/webhook` on 127.0.0.1 and PORT (FAKE_STRIPE_WEBHOOK_URL overrides), signed with
 * server/payments' webhook secret.
 *
 * Must never run in production unless asked (server/local-mode), listen beyond loopback, or
 * sign with anything but the local secret.
 */
import 'server-only';
import { log } from '../../../lib/log';
import { DEFAULT_FAKE_STRIPE_PORT, setFakeStripeAddress, webhookSecret } from '../../../server/payments/config';
import { startFakeStripe, type FakeStripe } from './server';

type GlobalWithFake = typeof globalThis & { __baywrightFakeStripeServer?: Promise<FakeStripe> };
const g = globalThis as GlobalWithFake;

/** This app's own webhook endpoint, as seen from the fake on the same machine. */
export function localWebhookUrl(env: Record<string, string | undefined> = process.env): string {
  if (env.FAKE_STRIPE_WEBHOOK_URL) return new URL(env.FAKE_STRIPE_WEBHOOK_URL).toString();
  const port = Number(env.PORT ?? 3000);
  if (!Number.isInteger(port) || port <= 0 || port > 65535) throw new Error(`PORT must be a port number, got "${env.PORT}"`);
  return `http://127.0.0.1:${port}/api/payments/webhook`;
}

async function start(): Promise<FakeStripe> {
  const explicit = process.env.FAKE_STRIPE_PORT;
  const port = explicit ? Number(explicit) : DEFAULT_FAKE_STRIPE_PORT;
  if (!Number.isInteger(port) || port < 0 || port > 65535) throw new Error(`FAKE_STRIPE_PORT must be a port number, got "${explicit}"`);
  const options = { webhookUrl: localWebhookUrl(), webhookSecret: webhookSecret() };
  let fake: FakeStripe;
  try {
    fake = await startFakeStripe({ ...options, port });
  } catch (err) {
    if (explicit || (err as NodeJS.ErrnoException).code !== 'EADDRINUSE') throw err;
    fake = await startFakeStripe({ ...options, port: 0 });
    log.info('port taken; the local payment API uses another', { wanted: port, port: fake.port });
  }
  setFakeStripeAddress({ host: '127.0.0.1', port: fake.port });
  log.info('local test payment API listening (no real payments)', { address: fake.url, webhooks: options.webhookUrl });
  return fake;
}

export function startFakeStripeOnce(): Promise<FakeStripe> {
  g.__baywrightFakeStripeServer ??= start().catch((err) => {
    g.__baywrightFakeStripeServer = undefined;
    throw err;
  });
  return g.__baywrightFakeStripeServer;
}
