/**
 * Quotes and their deposits. The workshop (owner, designer) prices a layout from the studio's
 * price list and sends the client a quote with a deposit; the layout's client opens a hosted
 * checkout for that deposit; the payment API's verified webhook (or the checkout's return,
 * checked against the API) marks it paid, exactly once.
 *
 * Rights, inside every function: a layout is seen by its studio's owners and designers and by
 * its one client; anyone else gets 404. Only the workshop previews prices or sends quotes (the
 * client gets 403); only the client the quote was sent to pays it (the workshop gets 403).
 * A quote freezes its parts list; sending a new one supersedes an unpaid one; once a deposit is
 * paid the layout's quote stays as it is. Returns DTOs, never rows; never stores card data.
 */
import 'server-only';
import { and, desc, eq, sql } from 'drizzle-orm';
import { getDb } from './client';
import { layouts, paymentEvents, payments, quotes, studios, users } from './schema';
import { BadRequestError, ConflictError, ForbiddenError, NotFoundError, VersionConflictError } from './errors';
import type { Actor } from './actor';
import { loadLayoutFor } from './access';
import { studioName } from './studios';
import { isUniqueViolation } from './sharing/pg-errors';
import { priceListOfStudio } from './prices';
import { computePartsList, quoteDeposit, type PartsList, type PriceList } from '../lib/planning/parts-list';
import type { LayoutDoc } from '../lib/layout/schema';
import type { CutListOptions } from '../lib/planning/cut-list';
import type { SendQuoteBody } from '../lib/api/planning-bodies';
import { formatMoney } from '../lib/format';
import { ISSUE_STATE_WORD, type RevisionState } from '../lib/layout/drawing-issue';
import { documentSource, type IssuedRevisionDto, type RevisionChoice } from './sharing/issued';
import { quoteTermsOf } from './studios';

/** The payment API takes no charge below this many minor units (0.50 in GBP/EUR/USD; from memory of its minimums). */
export const MIN_DEPOSIT_MINOR = 50;
/** …and none above this (the fake enforces the same cap). */
export const MAX_DEPOSIT_MINOR = 99_999_999;

export type QuoteStatus = 'sent' | 'superseded' | 'paid';

/** How people name a quote: the studio's running number, `Q-0007` (more digits past 9999). */
export function quoteReference(n: number): string {
  return `Q-${String(n).padStart(4, '0')}`;
}

export interface QuoteDto {
  id: string;
  /** What people read and quote back: `Q-0007`, numbered per studio. Never the id. */
  reference: string;
  layoutId: string;
  layoutName: string;
  layoutVersion: number;
  /** The issued revision it was priced from and whether it was approved when sent; null: the preliminary layout. */
  revision: { letter: string; approved: boolean } | null;
  status: QuoteStatus;
  currency: string;
  parts: PartsList;
  grossMinor: number;
  depositPct: number;
  depositMinor: number;
  /** What is left to pay after the deposit. */
  balanceMinor: number;
  note: string;
  sentAt: string;
  sentByName: string;
  paidAt: string | null;
  receiptSentAt: string | null;
  receiptTo: string | null;
  clientName: string | null;
  studioName: string;
  /** The last day the quote holds (ISO time), null for quotes sent before validity was recorded. */
  validUntil: string | null;
  /** The studio's terms and its details, as they were when the quote was sent. */
  terms: string;
  workshopDetails: string;
  /** The asking actor is the client this quote waits on. */
  canPay: boolean;
}

export interface PartsPreviewDto {
  layoutId: string;
  layoutName: string;
  /** The layout version of the copy priced (a revision's frozen version, or the saved preliminary's). */
  version: number;
  /** The issued revision priced; null: the preliminary layout as last saved. */
  revision: IssuedRevisionDto | null;
  priceListExists: boolean;
  parts: PartsList | null;
}

type QuoteRow = typeof quotes.$inferSelect;

async function toDto(row: QuoteRow, layoutName: string, actor: Actor): Promise<QuoteDto> {
  const db = await getDb();
  const [client] = row.clientId ? await db.select({ name: users.name }).from(users).where(eq(users.id, row.clientId)).limit(1) : [];
  return {
    id: row.id,
    reference: quoteReference(row.number),
    layoutId: row.layoutId,
    layoutName,
    layoutVersion: row.layoutVersion,
    revision: row.revisionLetter ? { letter: row.revisionLetter, approved: row.revisionApproved } : null,
    status: row.status,
    currency: row.currency,
    parts: row.parts,
    grossMinor: row.grossMinor,
    depositPct: row.depositPct,
    depositMinor: row.depositMinor,
    balanceMinor: row.grossMinor - row.depositMinor,
    note: row.note,
    sentAt: row.sentAt.toISOString(),
    sentByName: row.sentByName,
    paidAt: row.paidAt?.toISOString() ?? null,
    receiptSentAt: row.receiptSentAt?.toISOString() ?? null,
    receiptTo: row.receiptTo,
    clientName: client?.name ?? null,
    studioName: await studioName(row.studioId),
    validUntil: row.validUntil?.toISOString() ?? null,
    terms: row.terms,
    workshopDetails: row.workshopDetails,
    canPay: row.status === 'sent' && actor.role === 'client' && row.clientId === actor.userId,
  };
}

async function latestQuoteRow(layoutId: string): Promise<QuoteRow | null> {
  const db = await getDb();
  const [row] = await db.select().from(quotes).where(eq(quotes.layoutId, layoutId)).orderBy(desc(quotes.sentAt)).limit(1);
  return row ?? null;
}

/** The layout's current quote (the newest one), or null when none was sent. Any reader of the layout. */
export async function getCurrentQuote(actor: Actor, layoutId: string): Promise<QuoteDto | null> {
  const layout = await loadLayoutFor(actor, layoutId);
  const row = await latestQuoteRow(layout.id);
  return row ? toDto(row, layout.name, actor) : null;
}

function priced(doc: LayoutDoc, list: PriceList, cut: CutListOptions): PartsList {
  try {
    return computePartsList(doc, list, cut);
  } catch (err) {
    if (err instanceof RangeError) throw new BadRequestError(`The parts list cannot be priced: ${err.message}.`);
    throw err;
  }
}

/**
 * The parts list of one copy of the layout — a chosen issued revision, by default the latest
 * approved (else the latest issued), the preliminary only when chosen — priced from the studio's
 * list. Workshop only.
 */
export async function previewPartsList(actor: Actor, layoutId: string, cut: CutListOptions = {}, revision?: RevisionChoice): Promise<PartsPreviewDto> {
  await loadLayoutFor(actor, layoutId, { forEdit: 'see the working parts list' });
  const source = await documentSource(actor, layoutId, revision);
  const list = await priceListOfStudio(actor.studioId);
  return {
    layoutId: source.layoutId,
    layoutName: source.layoutName,
    version: source.layoutVersion,
    revision: source.revision,
    priceListExists: list !== null,
    parts: list ? priced(source.doc, list, cut) : null,
  };
}

/** What the answer carries when a send needs the designer's confirmation first. */
export const CONFIRM_UNAPPROVED = 'unapproved-revision';

/** Why a quote's revision is not an approved one, in the words the confirmation and the quote use. */
export function unapprovedWords(revision: { letter: string; state: string } | null): string {
  if (!revision) return 'This quote is priced from the preliminary layout: no revision has been issued and approved for it.';
  return `Revision ${revision.letter} is not approved yet (${ISSUE_STATE_WORD[revision.state as RevisionState] ?? revision.state}).`;
}

export async function sendQuote(actor: Actor, layoutId: string, input: SendQuoteBody, now = new Date()): Promise<QuoteDto> {
  const layout = await loadLayoutFor(actor, layoutId, { forEdit: 'send a quote' });
  const source = await documentSource(actor, layoutId, input.revision);
  if (input.layoutVersion !== source.layoutVersion) {
    throw new VersionConflictError({ version: source.layoutVersion, revision: source.revision?.letter ?? null });
  }
  if (!layout.clientId) throw new BadRequestError('Share this layout with a client before sending a quote.');
  const approved = source.revision?.state === 'approved';
  if (!approved && !input.confirmUnapproved) {
    throw new ConflictError(`${unapprovedWords(source.revision)} Confirm to send the quote anyway; it will say so.`, {
      confirm: CONFIRM_UNAPPROVED,
      revision: source.revision?.letter ?? null,
    });
  }
  const list = await priceListOfStudio(actor.studioId);
  if (!list) throw new BadRequestError('Set up the studio price list (Settings → Price list) before sending a quote.');
  const terms = await quoteTermsOf(layout.studioId);
  const parts = priced(source.doc, list, input.cut ?? {});
  if (parts.unpriced.length) {
    throw new BadRequestError(`Price these items first (Settings → Price list): ${parts.unpriced.join(', ')}.`);
  }
  if (parts.lines.length === 0 || parts.grossMinor <= 0) throw new BadRequestError('The parts list is empty: there is nothing to quote yet.');
  const depositMinor = quoteDeposit(parts.grossMinor, input.depositPct);
  if (depositMinor < MIN_DEPOSIT_MINOR) throw new BadRequestError(`A deposit of ${formatMoney(depositMinor, parts.currency)} is below what the checkout can take (${formatMoney(MIN_DEPOSIT_MINOR, parts.currency)}).`);
  if (depositMinor > MAX_DEPOSIT_MINOR) throw new BadRequestError('The deposit is larger than the checkout can take in one payment.');

  const db = await getDb();
  let row: QuoteRow;
  try {
    row = await db.transaction(async (tx) => {
      const [paid] = await tx.select({ id: quotes.id }).from(quotes).where(and(eq(quotes.layoutId, layout.id), eq(quotes.status, 'paid'))).limit(1);
      if (paid) throw new ConflictError('A deposit has already been paid on this layout’s quote; that quote stays as it is.');
      await tx.update(quotes).set({ status: 'superseded' }).where(and(eq(quotes.layoutId, layout.id), eq(quotes.status, 'sent')));
      // The studio row's lock orders concurrent sends, so numbers are neither repeated nor skipped.
      const [numbered] = await tx
        .update(studios)
        .set({ lastQuoteNumber: sql`${studios.lastQuoteNumber} + 1` })
        .where(eq(studios.id, layout.studioId))
        .returning({ number: studios.lastQuoteNumber });
      const [created] = await tx
        .insert(quotes)
        .values({
          layoutId: layout.id,
          studioId: layout.studioId,
          number: numbered.number,
          clientId: layout.clientId,
          layoutVersion: source.layoutVersion,
          revisionId: source.revision?.id ?? null,
          revisionLetter: source.revision?.letter ?? null,
          revisionApproved: approved,
          validUntil: new Date(now.getTime() + terms.validDays * 86_400_000),
          terms: terms.terms,
          workshopDetails: terms.details,
          status: 'sent',
          currency: parts.currency,
          parts,
          grossMinor: parts.grossMinor,
          depositPct: input.depositPct,
          depositMinor,
          note: input.note ?? '',
          sentBy: actor.userId,
          sentByName: actor.name,
          sentAt: now,
        })
        .returning();
      return created;
    });
  } catch (err) {
    if (isUniqueViolation(err)) throw new ConflictError('Another quote for this layout was sent at the same moment; reload to see it.');
    throw err;
  }
  return toDto(row, layout.name, actor);
}

export interface CheckoutTarget {
  quote: QuoteDto;
  studioId: string;
  clientEmail: string;
  /** A checkout already opened for this quote, to reuse while it is open. */
  openPayment: { checkoutSessionId: string; checkoutUrl: string | null; createdAt: string } | null;
}

/** The quote the asking client may pay now. Only the client it was sent to. */
export async function quoteForCheckout(actor: Actor, layoutId: string): Promise<CheckoutTarget> {
  const layout = await loadLayoutFor(actor, layoutId);
  if (!layout.isClient) throw new ForbiddenError('Only the client pays the deposit.');
  const row = await latestQuoteRow(layout.id);
  if (!row) throw new NotFoundError('There is no quote for this layout yet.');
  if (row.status === 'paid') throw new ConflictError('This deposit has already been paid.');
  if (row.clientId !== actor.userId) throw new ForbiddenError('This quote was sent to someone else.');
  const db = await getDb();
  const [open] = await db
    .select({ checkoutSessionId: payments.checkoutSessionId, checkoutUrl: payments.checkoutUrl, createdAt: payments.createdAt })
    .from(payments)
    .where(and(eq(payments.quoteId, row.id), eq(payments.status, 'open')))
    .orderBy(desc(payments.createdAt))
    .limit(1);
  return {
    quote: await toDto(row, layout.name, actor),
    studioId: row.studioId,
    clientEmail: actor.email,
    openPayment: open ? { ...open, createdAt: open.createdAt.toISOString() } : null,
  };
}

/** Records a hosted checkout opened for a quote's deposit. */
export async function recordCheckoutOpened(actor: Actor, target: CheckoutTarget, session: { id: string; url: string | null; amountMinor: number; currency: string }): Promise<void> {
  if (session.amountMinor !== target.quote.depositMinor || session.currency.toUpperCase() !== target.quote.currency) {
    throw new Error('the checkout session does not carry the quote’s deposit');
  }
  const db = await getDb();
  await db
    .insert(payments)
    .values({
      quoteId: target.quote.id,
      studioId: target.studioId,
      checkoutSessionId: session.id,
      checkoutUrl: session.url,
      amountMinor: session.amountMinor,
      currency: target.quote.currency,
      createdBy: actor.userId,
    })
    .onConflictDoNothing({ target: payments.checkoutSessionId });
}

/** What the payment API says happened, as read from a verified event or a retrieved session. */
export interface ProviderPayment {
  checkoutSessionId: string;
  paymentStatus: string;
  amountTotal: number | null;
  currency: string | null;
  /** `metadata.quoteId` of the session, if any. */
  quoteId: string | null;
  providerPaymentId: string | null;
  /** The webhook event, when it came by webhook (its id makes a replay recognisable). */
  event?: { id: string; type: string };
}

export type PaidOutcome =
  | { kind: 'paid'; quoteId: string; layoutId: string; studioId: string; clientId: string | null }
  | { kind: 'already-paid'; quoteId: string }
  | { kind: 'duplicate-event' }
  | { kind: 'ignored'; reason: string };

function outcomeText(o: PaidOutcome): string {
  return o.kind === 'ignored' ? `ignored: ${o.reason}` : o.kind;
}

/**
 * Marks a deposit paid from the payment API's word. Idempotent: a replayed event (same id) is
 * recognised and changes nothing; a second event or a return visit for a paid session finds the
 * quote paid already. No actor: the caller has verified the webhook signature, or retrieved the
 * session from the API itself. The amount, currency and quote must match what was opened.
 */
export async function recordDepositPaid(p: ProviderPayment): Promise<PaidOutcome> {
  const db = await getDb();
  return db.transaction(async (tx) => {
    if (p.event) {
      const inserted = await tx
        .insert(paymentEvents)
        .values({ eventId: p.event.id, type: p.event.type, checkoutSessionId: p.checkoutSessionId, outcome: 'processing' })
        .onConflictDoNothing({ target: paymentEvents.eventId })
        .returning({ eventId: paymentEvents.eventId });
      if (!inserted.length) return { kind: 'duplicate-event' } as const;
    }
    const decide = async (): Promise<PaidOutcome> => {
      const [payment] = await tx.select().from(payments).where(eq(payments.checkoutSessionId, p.checkoutSessionId)).limit(1);
      if (!payment) return { kind: 'ignored', reason: 'no checkout of ours has this session id' };
      if (p.quoteId !== null && p.quoteId !== payment.quoteId) return { kind: 'ignored', reason: 'the session names another quote' };
      if (p.amountTotal !== payment.amountMinor || (p.currency ?? '').toUpperCase() !== payment.currency) return { kind: 'ignored', reason: 'the amount paid is not the deposit asked' };
      if (p.paymentStatus !== 'paid') return { kind: 'ignored', reason: `payment status is ${p.paymentStatus}` };
      const now = new Date();
      await tx
        .update(payments)
        .set({ status: 'paid', paidAt: now, providerPaymentId: p.providerPaymentId })
        .where(and(eq(payments.id, payment.id), eq(payments.status, 'open')));
      const [flipped] = await tx
        .update(quotes)
        .set({ status: 'paid', paidAt: now })
        .where(and(eq(quotes.id, payment.quoteId), eq(quotes.status, 'sent')))
        .returning({ id: quotes.id, layoutId: quotes.layoutId, studioId: quotes.studioId, clientId: quotes.clientId });
      if (flipped) return { kind: 'paid', quoteId: flipped.id, layoutId: flipped.layoutId, studioId: flipped.studioId, clientId: flipped.clientId };
      const [q] = await tx.select({ status: quotes.status }).from(quotes).where(eq(quotes.id, payment.quoteId)).limit(1);
      if (q?.status === 'paid') return { kind: 'already-paid', quoteId: payment.quoteId };
      // Paid through a checkout opened before a newer quote replaced this one: the money is
      // recorded on the payment row; the workshop must settle it with the client.
      return { kind: 'ignored', reason: 'the quote was superseded before it was paid; the payment is recorded for the workshop to settle' };
    };
    const outcome = await decide();
    if (p.event) await tx.update(paymentEvents).set({ outcome: outcomeText(outcome) }).where(eq(paymentEvents.eventId, p.event.id));
    return outcome;
  });
}

/** The session of this layout's current quote that the asking reader may check on return from the checkout. */
export async function checkoutSessionOfLayout(actor: Actor, layoutId: string, sessionId: string): Promise<string | null> {
  const layout = await loadLayoutFor(actor, layoutId);
  if (!/^cs_[A-Za-z0-9_]{1,200}$/.test(sessionId)) return null;
  const db = await getDb();
  const [row] = await db
    .select({ id: payments.checkoutSessionId })
    .from(payments)
    .innerJoin(quotes, eq(quotes.id, payments.quoteId))
    .where(and(eq(payments.checkoutSessionId, sessionId), eq(quotes.layoutId, layout.id)))
    .limit(1);
  return row?.id ?? null;
}

/** Who gets the receipt of a paid quote, and what it says. System use (after a verified payment). */
export async function receiptFacts(quoteId: string): Promise<{ quote: QuoteRow; layoutName: string; studioName: string; client: { email: string; name: string } | null } | null> {
  const db = await getDb();
  const [row] = await db.select().from(quotes).where(eq(quotes.id, quoteId)).limit(1);
  if (!row) return null;
  const [layout] = await db.select({ name: layouts.name }).from(layouts).where(eq(layouts.id, row.layoutId)).limit(1);
  const [client] = row.clientId ? await db.select({ email: users.email, name: users.name }).from(users).where(eq(users.id, row.clientId)).limit(1) : [];
  return { quote: row, layoutName: layout?.name ?? 'your layout', studioName: await studioName(row.studioId), client: client ?? null };
}

export async function markReceiptSent(quoteId: string, to: string): Promise<void> {
  const db = await getDb();
  await db.update(quotes).set({ receiptSentAt: new Date(), receiptTo: to }).where(eq(quotes.id, quoteId));
}
