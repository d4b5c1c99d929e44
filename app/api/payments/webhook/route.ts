import { handle, HttpError, json } from '@/server/api/respond';
import { takeWebhook, WebhookRefused } from '@/server/payments/deposit';
import { asPaymentHttpError } from '@/server/payments/errors';

export const dynamic = 'force-dynamic';

/**
 * Payment events from the payment API: verified with the SDK's own `webhooks.constructEvent`
 * against the endpoint secret (bad or missing signature → 400, nothing changed), then recorded
 * once — a replayed event answers 200 and changes nothing. No session: the signature is the
 * only credential, and no browser sends this.
 */
export const POST = handle(async (req) => {
  try {
    const { outcome, receipt } = await takeWebhook(req);
    return json({ received: true, outcome: outcome.kind, ...(outcome.kind === 'ignored' ? { reason: outcome.reason } : {}), ...(receipt ? { receipt } : {}) });
  } catch (err) {
    if (err instanceof WebhookRefused) throw new HttpError(400, err.message);
    throw asPaymentHttpError(err);
  }
});
