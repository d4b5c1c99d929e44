/**
 * Starts the local fake payment API as its own process for the demo and e2e runs:
 *   FAKE_STRIPE_PORT=12111 FAKE_STRIPE_WEBHOOK_URL=http://127.0.0.1:3000/api/payments/webhook \
 *   STRIPE_WEBHOOK_SECRET=whsec_baywright_fake npx tsx dev/fakes/stripe/run.ts
 * Prints its URL, stops cleanly on SIGINT/SIGTERM. Test keys only; never a real service.
 */
import { startFakeStripe } from './server';

async function main(): Promise<void> {
  const port = Number(process.env.FAKE_STRIPE_PORT ?? 12111);
  if (!Number.isInteger(port) || port < 0 || port > 65535) throw new Error(`FAKE_STRIPE_PORT must be a port number, got "${process.env.FAKE_STRIPE_PORT}"`);
  const fake = await startFakeStripe({
    port,
    webhookUrl: process.env.FAKE_STRIPE_WEBHOOK_URL,
    webhookSecret: process.env.STRIPE_WEBHOOK_SECRET,
  });
  console.log(`fake payment API listening on ${fake.url}${process.env.FAKE_STRIPE_WEBHOOK_URL ? `, webhooks to ${process.env.FAKE_STRIPE_WEBHOOK_URL}` : ', no webhook URL set'}`);
  const stop = () => {
    fake.stop().then(() => process.exit(0), () => process.exit(1));
  };
  process.once('SIGINT', stop);
  process.once('SIGTERM', stop);
}

main().catch((err: unknown) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
