/**
 * The official `stripe` SDK, set up for this process: pointed at the local fake payment API
 * unless this is a real deployment (server/payments/config). One client per key and address.
 * Only the endpoints the deposit flow needs are used (Checkout Sessions create and retrieve) and
 * webhooks are verified with the SDK's own `webhooks.constructEvent`.
 * Must never be imported by client components, and never log keys or signatures.
 */
import 'server-only';
import Stripe from 'stripe';
import { fakeStripeAddress, stripeApiKey, usesFakePayments } from './config';

type GlobalWithClient = typeof globalThis & { __baywrightStripe?: { key: string; client: Stripe } };
const g = globalThis as GlobalWithClient;

export function stripeClient(): Stripe {
  const apiKey = stripeApiKey();
  const fake = usesFakePayments() ? fakeStripeAddress() : null;
  const key = `${apiKey}@${fake ? `${fake.host}:${fake.port}` : 'service'}`;
  if (g.__baywrightStripe?.key !== key) {
    const client = fake
      ? new Stripe(apiKey, { host: fake.host, port: fake.port, protocol: 'http', maxNetworkRetries: 1, timeout: 10_000 })
      : new Stripe(apiKey, { maxNetworkRetries: 2, timeout: 20_000 });
    g.__baywrightStripe = { key, client };
  }
  return g.__baywrightStripe.client;
}

export type { Stripe };
