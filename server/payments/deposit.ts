/**
 * The deposit flow against the payment API: open a hosted checkout for the client's quote,
 * take the verified `checkout.session.completed` webhook, and check a session on the client's
 * return from the checkout (in case the webhook is late). Every path that can mark a deposit
 * paid goes through `recordDepositPaid`, which does it once; the receipt goes with that one
 * change only.
 *
 * Uses the official SDK only for Checkout Sessions create/retrieve and
 * `webhooks.constructEvent`. Must never trust an unverified event, store card data, or log
 * signatures and secrets.
 */
import 'server-only';
import { log } from '@/lib/log';
import type Stripe from 'stripe';
import type { Actor } from '@/db/actor';
import { checkoutSessionOfLayout, quoteForCheckout, recordCheckoutOpened, recordDepositPaid, type PaidOutcome, type ProviderPayment } from '@/db/quotes';
import { webhookSecret } from './config';
import { mailReceipt, quotePath, type MailOutcome } from './deposit-mail';
import { returnOrigin } from './return-origin';
import { stripeClient } from './stripe';

/** A checkout page stays usable this long before we open a fresh one (the API's own expiry is 24 h). */
const REUSE_OPEN_CHECKOUT_MS = 60 * 60 * 1000;

export class WebhookRefused extends Error {
  readonly status = 400;
}

export async function openDepositCheckout(req: Request, actor: Actor, layoutId: string): Promise<{ url: string; sessionId: string }> {
  const target = await quoteForCheckout(actor, layoutId);
  const stripe = stripeClient();
  const open = target.openPayment;
  if (open && open.checkoutUrl && Date.now() - Date.parse(open.createdAt) < REUSE_OPEN_CHECKOUT_MS) {
    const again = await stripe.checkout.sessions.retrieve(open.checkoutSessionId);
    if (again.status === 'open' && again.url) return { url: again.url, sessionId: again.id };
  }
  const q = target.quote;
  const back = `${returnOrigin(req)}${quotePath(layoutId)}`;
  const session = await stripe.checkout.sessions.create({
    mode: 'payment',
    line_items: [{
      quantity: 1,
      price_data: {
        currency: q.currency.toLowerCase(),
        unit_amount: q.depositMinor,
        product_data: { name: `Deposit (${q.depositPct} %) for ${q.layoutName}`.slice(0, 250), description: `${q.studioName}: quote ${q.reference}` },
      },
    }],
    success_url: `${back}?paid={CHECKOUT_SESSION_ID}`,
    cancel_url: `${back}?cancelled=1`,
    customer_email: target.clientEmail,
    client_reference_id: q.id,
    metadata: { quoteId: q.id, layoutId, studioId: target.studioId },
  }, { idempotencyKey: `deposit-${q.id}-${Math.floor(Date.now() / REUSE_OPEN_CHECKOUT_MS)}` });
  if (!session.url) throw new Error('the payment API opened a checkout without a page to send the client to');
  await recordCheckoutOpened(actor, target, { id: session.id, url: session.url, amountMinor: session.amount_total ?? -1, currency: session.currency ?? '' });
  return { url: session.url, sessionId: session.id };
}

function fromSession(s: Stripe.Checkout.Session, event?: { id: string; type: string }): ProviderPayment {
  return {
    checkoutSessionId: s.id,
    paymentStatus: s.payment_status,
    amountTotal: s.amount_total ?? null,
    currency: s.currency ?? null,
    quoteId: s.metadata?.quoteId ?? null,
    providerPaymentId: typeof s.payment_intent === 'string' ? s.payment_intent : s.payment_intent?.id ?? null,
    event,
  };
}

export interface WebhookResult {
  outcome: PaidOutcome | { kind: 'ignored'; reason: string };
  receipt: MailOutcome | null;
}

/** Verifies the event with the SDK's own helper (400 when the signature fails), then records it. */
export async function takeWebhook(req: Request): Promise<WebhookResult> {
  const signature = req.headers.get('stripe-signature');
  if (!signature) throw new WebhookRefused('No Stripe-Signature header: this endpoint takes only signed payment events.');
  const payload = await req.text();
  if (payload.length > 1_000_000) throw new WebhookRefused('The event is larger than any payment event.');
  const secret = webhookSecret();
  let event: Stripe.Event;
  try {
    event = stripeClient().webhooks.constructEvent(payload, signature, secret);
  } catch {
    throw new WebhookRefused('The event signature does not verify; nothing was changed.');
  }
  if (event.type !== 'checkout.session.completed' && event.type !== 'checkout.session.async_payment_succeeded') {
    return { outcome: { kind: 'ignored', reason: `event type ${event.type} is not used` }, receipt: null };
  }
  const session = event.data.object as Stripe.Checkout.Session;
  const payment = fromSession(session, { id: event.id, type: event.type });
  const outcome = await recordDepositPaid(payment);
  if (outcome.kind === 'ignored') log.warn('payment event ignored', { eventId: event.id, reason: outcome.reason });
  const receipt = outcome.kind === 'paid' ? await mailReceipt(req, outcome.quoteId, payment.providerPaymentId) : null;
  return { outcome, receipt };
}

/**
 * On the client's return from the checkout: if this layout's checkout session is paid by the
 * API's own account of it, record it (a no-op when the webhook was first). Never throws for a
 * bad or foreign session id: it simply changes nothing.
 */
export async function checkReturnedSession(req: Request, actor: Actor, layoutId: string, sessionId: string): Promise<PaidOutcome | null> {
  const ours = await checkoutSessionOfLayout(actor, layoutId, sessionId);
  if (!ours) return null;
  let session: Stripe.Checkout.Session;
  try {
    session = await stripeClient().checkout.sessions.retrieve(ours);
  } catch (err) {
    log.error('could not check the returned checkout', { error: err });
    return null;
  }
  const payment = fromSession(session);
  const outcome = await recordDepositPaid(payment);
  if (outcome.kind === 'paid') await mailReceipt(req, outcome.quoteId, payment.providerPaymentId);
  return outcome;
}
