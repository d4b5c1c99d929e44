/**
 * Tables for build planning: the studio's price list, the quotes sent to a layout's client, the
 * deposit payments taken through the payment API's hosted checkout, and the payment events
 * received by the webhook (kept so a replayed event is recognised and changes nothing).
 * Re-exported by db/schema.ts so one drizzle schema covers them.
 *
 * Money is integer minor units (pence, cents). A quote freezes the parts list it was priced
 * from, so later price or layout changes never alter what the client was asked to pay.
 * Must never import anything but drizzle and plain types; no card data is ever stored.
 */
import { sql } from 'drizzle-orm';
import { pgTable, pgEnum, boolean, text, timestamp, integer, doublePrecision, jsonb, uuid, index, uniqueIndex, type AnyPgColumn } from 'drizzle-orm/pg-core';
import type { PartsList, PriceEntry } from '../lib/planning/parts-list';
// Base tables come from db/schema.ts, which re-exports this file: referenced lazily in callbacks only.
import { layouts, revisions, studios, users } from './schema';

/** One price list per studio: what each part costs, workshop hours per part, labour rate and VAT. */
export const priceLists = pgTable('price_lists', {
  studioId: uuid('studio_id').primaryKey().references((): AnyPgColumn => studios.id, { onDelete: 'cascade' }),
  /** ISO 4217 code, upper case (GBP, EUR). */
  currency: text('currency').notNull(),
  labourRateMinor: integer('labour_rate_minor').notNull().default(0),
  vatPct: doublePrecision('vat_pct').notNull().default(0),
  /** Keyed `module:<kind>`, `sheet:<material>`, `cable:<mm²>`, `battery:<chemistry>`, `solar`, `alarm:co|lpg`. */
  items: jsonb('items').$type<Record<string, PriceEntry>>().notNull().default({}),
  updatedBy: uuid('updated_by').references((): AnyPgColumn => users.id, { onDelete: 'set null' }),
  updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
});

/** `sent`: waiting for the deposit; `superseded`: replaced by a newer quote; `paid`: deposit received. */
export const quoteStatusEnum = pgEnum('quote_status', ['sent', 'superseded', 'paid']);

export const quotes = pgTable(
  'quotes',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    layoutId: uuid('layout_id').notNull().references((): AnyPgColumn => layouts.id, { onDelete: 'cascade' }),
    /** Copied from the layout so a rights check needs no join; a layout never changes studio. */
    studioId: uuid('studio_id').notNull().references((): AnyPgColumn => studios.id, { onDelete: 'cascade' }),
    /** Numbered per studio in the order sent (shown as its reference, `Q-0007`); never reused. */
    number: integer('number').notNull(),
    /** The client the quote was sent to. */
    clientId: uuid('client_id').references((): AnyPgColumn => users.id, { onDelete: 'set null' }),
    /** The layout version the parts list was priced from. */
    layoutVersion: integer('layout_version').notNull(),
    /** The issued revision the parts list was priced from; null: the preliminary layout (or a quote sent before revisions were recorded). */
    revisionId: uuid('revision_id').references((): AnyPgColumn => revisions.id, { onDelete: 'set null' }),
    /** Its letter, kept with the quote so the record survives the revision. */
    revisionLetter: text('revision_letter'),
    /** Whether that revision was approved when the quote was sent (false for the preliminary). */
    revisionApproved: boolean('revision_approved').notNull().default(false),
    /** The last day the quote holds (end of that day in the studio's time zone is the printer's business). */
    validUntil: timestamp('valid_until', { withTimezone: true }),
    /** The studio's terms and details as they were when the quote was sent (frozen with it). */
    terms: text('terms').notNull().default(''),
    workshopDetails: text('workshop_details').notNull().default(''),
    status: quoteStatusEnum('status').notNull().default('sent'),
    currency: text('currency').notNull(),
    /** The parts list as priced when the quote was sent (frozen). */
    parts: jsonb('parts').$type<PartsList>().notNull(),
    grossMinor: integer('gross_minor').notNull(),
    depositPct: doublePrecision('deposit_pct').notNull(),
    depositMinor: integer('deposit_minor').notNull(),
    note: text('note').notNull().default(''),
    sentBy: uuid('sent_by').references((): AnyPgColumn => users.id, { onDelete: 'set null' }),
    /** Name at the time of sending, so the record survives the account. */
    sentByName: text('sent_by_name').notNull(),
    sentAt: timestamp('sent_at', { withTimezone: true }).notNull().defaultNow(),
    paidAt: timestamp('paid_at', { withTimezone: true }),
    /** When the receipt mail was handed to the mail server, and to whom. */
    receiptSentAt: timestamp('receipt_sent_at', { withTimezone: true }),
    receiptTo: text('receipt_to'),
  },
  (t) => [
    index('quotes_layout').on(t.layoutId, t.sentAt),
    uniqueIndex('quotes_studio_number').on(t.studioId, t.number),
    // At most one quote per layout waiting for its deposit: two racing "send" requests cannot both land.
    uniqueIndex('quotes_one_open').on(t.layoutId).where(sql`${t.status} = 'sent'`),
    // At most one paid quote per layout.
    uniqueIndex('quotes_one_paid').on(t.layoutId).where(sql`${t.status} = 'paid'`),
  ],
);

export const paymentStatusEnum = pgEnum('payment_status', ['open', 'paid']);

/** One hosted checkout opened for a quote's deposit. */
export const payments = pgTable(
  'payments',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    // Money is never deleted with its layout: a quote with a payment row cannot go (checked at the
    // end of the statement, so removing a whole studio, which takes the payment too, still works).
    quoteId: uuid('quote_id').notNull().references((): AnyPgColumn => quotes.id, { onDelete: 'no action' }),
    studioId: uuid('studio_id').notNull().references((): AnyPgColumn => studios.id, { onDelete: 'cascade' }),
    /** The payment API's Checkout Session id (cs_…). */
    checkoutSessionId: text('checkout_session_id').notNull(),
    checkoutUrl: text('checkout_url'),
    amountMinor: integer('amount_minor').notNull(),
    currency: text('currency').notNull(),
    status: paymentStatusEnum('status').notNull().default('open'),
    /** The payment API's payment id (pi_…), once paid. */
    providerPaymentId: text('provider_payment_id'),
    createdBy: uuid('created_by').references((): AnyPgColumn => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    paidAt: timestamp('paid_at', { withTimezone: true }),
  },
  (t) => [uniqueIndex('payments_session').on(t.checkoutSessionId), index('payments_quote').on(t.quoteId, t.createdAt)],
);

/** Every webhook event accepted (signature verified), once: a replay finds its id here. */
export const paymentEvents = pgTable('payment_events', {
  eventId: text('event_id').primaryKey(),
  type: text('type').notNull(),
  checkoutSessionId: text('checkout_session_id'),
  /** What the app did with it: `paid`, `already-paid`, `ignored: …`. */
  outcome: text('outcome').notNull(),
  receivedAt: timestamp('received_at', { withTimezone: true }).notNull().defaultNow(),
});
