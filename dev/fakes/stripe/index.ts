/**
 * The local fake payment API (test and demo only): start it, point the official SDK at it.
 * Must never be used against, or forward to, a real payment service.
 */
export { startFakeStripe, type FakeStripe, type FakeStripeOptions, type WebhookDelivery } from './server';
export { signatureHeader } from './webhook-signature';
export { parseFormBody } from './form-body';
