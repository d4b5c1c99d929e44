/**
 * Starts the local fakes of hosted services that this process needs, once per process (guarded
 * on globalThis so dev reloads do not start them twice). Each fake is registered here with the
 * condition under which it runs; production deployments point at the real services instead and
 * never start a fake unless asked (BAYWRIGHT_DEMO=1 or BAYWRIGHT_LOCAL_FAKES=1).
 */
import { log } from '../../lib/log';
import { localStandInsAllowed } from '../../server/local-mode';

type Starter = { name: string; wanted: () => boolean; start: () => Promise<void> };

const g = globalThis as typeof globalThis & { __baywrightServices?: Promise<void> };

/** Fakes run outside production, and in production only when the demo or a test asks (server/local-mode). */
export function fakesWanted(): boolean {
  return localStandInsAllowed();
}

/** The fakes this app starts itself; each entry imports its fake lazily. */
const STARTERS: Starter[] = [
  {
    // Development mail server: invitations and notifications land in /outbox (dev/fakes/smtp).
    name: 'mail server',
    wanted: () => fakesWanted() && !process.env.SMTP_URL,
    start: async () => {
      const { startFakeSmtpOnce } = await import('./smtp/server');
      await startFakeSmtpOnce();
    },
  },
  {
    // Local test payment API for the deposit flow: hosted checkout and signed webhooks (dev/fakes/stripe).
    name: 'payment API',
    wanted: () => fakesWanted(),
    start: async () => {
      const { startFakeStripeOnce } = await import('./stripe/start-once');
      await startFakeStripeOnce();
    },
  },
];

export function startLocalServices(): Promise<void> {
  g.__baywrightServices ??= (async () => {
    for (const s of STARTERS) {
      if (!s.wanted()) continue;
      try {
        await s.start();
      } catch (err) {
        log.error(`could not start the local ${s.name}`, { error: err });
      }
    }
  })();
  return g.__baywrightServices;
}
