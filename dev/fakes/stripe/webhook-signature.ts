/**
 * Signs webhook deliveries the way the payment service documents it: header
 * `Stripe-Signature: t=<unix seconds>,v1=<hex HMAC-SHA256 of "<t>.<raw body>" keyed by the
 * endpoint secret>`. The receiving app verifies with the official SDK's own
 * `stripe.webhooks.constructEvent`, never with this file.
 *
 * Part of the local fake payment API only; never holds real secrets.
 */
import { createHmac } from 'node:crypto';

export function signatureHeader(payload: string, secret: string, timestamp = Math.floor(Date.now() / 1000)): string {
  if (!secret) throw new Error('a webhook secret is needed to sign deliveries');
  const v1 = createHmac('sha256', secret).update(`${timestamp}.${payload}`, 'utf8').digest('hex');
  return `t=${timestamp},v1=${v1}`;
}
