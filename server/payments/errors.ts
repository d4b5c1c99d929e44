/**
 * Turns trouble with the payment API into clear answers for the deposit routes: not set up →
 * 503; the API unreachable or refusing → 502 saying nothing was charged. Anything else is left
 * for the route's generic handling. Must never put the API's raw error (which may echo keys or
 * parameters) into an answer; the server log gets the message.
 */
import 'server-only';
import { log } from '@/lib/log';
import Stripe from 'stripe';
import { HttpError } from '@/server/api/respond';
import { PaymentsNotConfigured } from './config';

export function asPaymentHttpError(err: unknown): unknown {
  if (err instanceof PaymentsNotConfigured) return new HttpError(503, err.message);
  if (err instanceof Stripe.errors.StripeError) {
    log.error('payment API error', { type: err.type, message: err.message });
    return new HttpError(502, 'The payment service did not answer as expected; nothing was charged. Try again in a moment.');
  }
  return err;
}
