/**
 * Checkout Sessions of the fake payment API: validating a create request (only what Baywright's
 * deposit flow sends: mode=payment, line_items with price_data, success_url, cancel_url,
 * metadata, customer_email, client_reference_id) and the session object in the wire shape the
 * official SDK expects. Unknown parameters are refused, as the real service does, so a typo in
 * the app shows up in tests.
 *
 * Part of the local fake payment API only (test and demo); no real money, keys or card data.
 */
import { randomBytes } from 'node:crypto';
import type { FormValue } from './form-body';

export class ParamError extends Error {
  constructor(message: string, readonly param?: string) {
    super(message);
  }
}

export interface LineItem {
  name: string;
  description?: string;
  currency: string;
  unitAmount: number;
  quantity: number;
}

export interface CheckoutSession {
  id: string;
  object: 'checkout.session';
  amount_subtotal: number;
  amount_total: number;
  cancel_url: string;
  client_reference_id: string | null;
  created: number;
  currency: string;
  customer_email: string | null;
  customer_details: { email: string | null } | null;
  expires_at: number;
  livemode: false;
  metadata: Record<string, string>;
  mode: 'payment';
  payment_intent: string | null;
  payment_status: 'unpaid' | 'paid';
  status: 'open' | 'complete';
  success_url: string;
  url: string | null;
}

export interface StoredSession {
  session: CheckoutSession;
  lineItems: LineItem[];
}

const ALLOWED = new Set(['mode', 'line_items', 'success_url', 'cancel_url', 'metadata', 'customer_email', 'client_reference_id', 'payment_method_types', 'expand']);

export function randomId(prefix: string): string {
  return `${prefix}_${randomBytes(18).toString('base64url').replace(/[-_]/g, 'x')}`;
}

function str(v: FormValue | undefined, param: string, required = true): string | undefined {
  if (v === undefined) {
    if (required) throw new ParamError(`Missing required param: ${param}.`, param);
    return undefined;
  }
  if (typeof v !== 'string') throw new ParamError(`Invalid value for ${param}: expected a string.`, param);
  return v;
}

function int(v: FormValue | undefined, param: string, min: number): number {
  const s = str(v, param)!;
  if (!/^\d+$/.test(s)) throw new ParamError(`Invalid integer: ${s}`, param);
  const n = Number(s);
  if (!Number.isSafeInteger(n) || n < min) throw new ParamError(`Invalid value for ${param}: must be at least ${min}.`, param);
  return n;
}

function url(v: FormValue | undefined, param: string): string {
  const s = str(v, param)!;
  // The session-id placeholder is filled in on redirect; it must not upset URL parsing.
  let parsed: URL;
  try {
    parsed = new URL(s.replace('{CHECKOUT_SESSION_ID}', 'x'));
  } catch {
    throw new ParamError(`Not a valid URL: ${param}.`, param);
  }
  if (parsed.protocol !== 'http:' && parsed.protocol !== 'https:') throw new ParamError(`Not a valid URL: ${param} must be http or https.`, param);
  return s;
}

export function createSession(params: Record<string, FormValue>, hostedBase: string, now = Math.floor(Date.now() / 1000)): StoredSession {
  for (const key of Object.keys(params)) {
    if (!ALLOWED.has(key)) throw new ParamError(`Received unknown parameter: ${key}`, key);
  }
  const mode = str(params.mode, 'mode');
  if (mode !== 'payment') throw new ParamError('Only mode=payment is supported by this test payment API.', 'mode');
  const success_url = url(params.success_url, 'success_url');
  const cancel_url = url(params.cancel_url, 'cancel_url');

  const rawItems = params.line_items;
  if (rawItems === undefined) throw new ParamError('Missing required param: line_items.', 'line_items');
  if (!Array.isArray(rawItems) || rawItems.length === 0) throw new ParamError('line_items must be a non-empty list.', 'line_items');
  if (rawItems.length > 100) throw new ParamError('line_items may hold at most 100 items.', 'line_items');
  const lineItems: LineItem[] = rawItems.map((raw, i) => {
    const p = `line_items[${i}]`;
    if (typeof raw !== 'object' || Array.isArray(raw)) throw new ParamError(`Invalid object: ${p}.`, p);
    for (const k of Object.keys(raw)) if (k !== 'price_data' && k !== 'quantity') throw new ParamError(`Received unknown parameter: ${p}[${k}]`, `${p}[${k}]`);
    const pd = raw.price_data;
    if (pd === undefined) throw new ParamError(`Missing required param: ${p}[price_data] (this test payment API has no stored prices).`, `${p}[price_data]`);
    if (typeof pd !== 'object' || Array.isArray(pd)) throw new ParamError(`Invalid object: ${p}[price_data].`, `${p}[price_data]`);
    for (const k of Object.keys(pd)) if (!['currency', 'unit_amount', 'product_data'].includes(k)) throw new ParamError(`Received unknown parameter: ${p}[price_data][${k}]`, `${p}[price_data][${k}]`);
    const currency = str(pd.currency, `${p}[price_data][currency]`)!.toLowerCase();
    if (!/^[a-z]{3}$/.test(currency)) throw new ParamError(`Invalid currency: ${currency}.`, `${p}[price_data][currency]`);
    const unitAmount = int(pd.unit_amount, `${p}[price_data][unit_amount]`, 0);
    const product = pd.product_data;
    if (typeof product !== 'object' || product === null || Array.isArray(product)) throw new ParamError(`Missing required param: ${p}[price_data][product_data].`, `${p}[price_data][product_data]`);
    const name = str(product.name, `${p}[price_data][product_data][name]`)!;
    if (!name.trim()) throw new ParamError(`${p}[price_data][product_data][name] must not be empty.`, `${p}[price_data][product_data][name]`);
    const description = str(product.description, `${p}[price_data][product_data][description]`, false);
    const quantity = int(raw.quantity, `${p}[quantity]`, 1);
    return { name, description, currency, unitAmount, quantity };
  });
  const currency = lineItems[0].currency;
  if (lineItems.some((l) => l.currency !== currency)) throw new ParamError('All line_items must use the same currency.', 'line_items');
  const amount = lineItems.reduce((a, l) => a + l.unitAmount * l.quantity, 0);
  if (!Number.isSafeInteger(amount) || amount > 99_999_999) throw new ParamError('Amount must be no more than 99,999,999 in the smallest currency unit.', 'line_items');

  const metadata: Record<string, string> = {};
  if (params.metadata !== undefined) {
    const md = params.metadata;
    if (typeof md !== 'object' || Array.isArray(md)) throw new ParamError('Invalid object: metadata.', 'metadata');
    const entries = Object.entries(md);
    if (entries.length > 50) throw new ParamError('metadata may hold at most 50 keys.', 'metadata');
    for (const [k, v] of entries) {
      if (typeof v !== 'string') throw new ParamError(`Invalid value for metadata[${k}]: expected a string.`, `metadata[${k}]`);
      if (k.length > 40) throw new ParamError('metadata keys may be at most 40 characters.', `metadata[${k}]`);
      if (v.length > 500) throw new ParamError('metadata values may be at most 500 characters.', `metadata[${k}]`);
      metadata[k] = v;
    }
  }
  const customer_email = str(params.customer_email, 'customer_email', false) ?? null;
  if (customer_email !== null && !/^[^\s@]+@[^\s@]+\.[^\s@]+$/.test(customer_email)) throw new ParamError(`Invalid email address: ${customer_email}`, 'customer_email');
  const client_reference_id = str(params.client_reference_id, 'client_reference_id', false) ?? null;
  if (client_reference_id !== null && client_reference_id.length > 200) throw new ParamError('client_reference_id may be at most 200 characters.', 'client_reference_id');

  const id = randomId('cs_test');
  return {
    lineItems,
    session: {
      id,
      object: 'checkout.session',
      amount_subtotal: amount,
      amount_total: amount,
      cancel_url,
      client_reference_id,
      created: now,
      currency,
      customer_email,
      customer_details: null,
      expires_at: now + 24 * 3600,
      livemode: false,
      metadata,
      mode: 'payment',
      payment_intent: null,
      payment_status: 'unpaid',
      status: 'open',
      success_url,
      url: `${hostedBase}/checkout/${id}`,
    },
  };
}

/** Marks a session paid and complete; returns false when it already was (no second event). */
export function markPaid(stored: StoredSession): boolean {
  const s = stored.session;
  if (s.payment_status === 'paid') return false;
  s.payment_status = 'paid';
  s.status = 'complete';
  s.payment_intent = randomId('pi_test');
  s.customer_details = { email: s.customer_email };
  s.url = null; // a completed session no longer has a checkout page to visit
  return true;
}
