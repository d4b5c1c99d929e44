/**
 * Sends the mail of the deposit flow after the change it reports is stored: the quote to the
 * client, and the receipt once the deposit is paid (recorded on the quote, so the page can say
 * where it went). A mail that cannot be sent never undoes the payment or the quote: the outcome
 * says `not-sent` and the server log says why. Must never mail anyone but the quote's client.
 */
import 'server-only';
import { log } from '@/lib/log';
import type { Actor } from '@/db/actor';
import type { QuoteDto } from '@/db/quotes';
import { markReceiptSent, quoteReference, receiptFacts } from '@/db/quotes';
import { layoutClient } from '@/db/sharing/recipients';
import { depositReceiptMail, quoteSentMail } from '@/server/mail/receipt';
import { returnOrigin } from './return-origin';
import { mailConfigured, sendMail } from '@/server/mail/transport';

export type MailOutcome = 'sent' | 'not-sent' | 'no-recipient' | 'not-configured';

function logNotSent(err: unknown): MailOutcome {
  log.error('mail not sent', { error: err });
  return 'not-sent';
}

export function quotePath(layoutId: string): string {
  return `/layouts/${encodeURIComponent(layoutId)}/quote`;
}

export async function mailQuoteToClient(req: Request, actor: Actor, quote: QuoteDto): Promise<MailOutcome> {
  const client = await layoutClient(quote.layoutId);
  if (!client) return 'no-recipient';
  if (!mailConfigured()) return 'not-configured';
  try {
    const url = `${returnOrigin(req)}${quotePath(quote.layoutId)}`;
    await sendMail({
      ...quoteSentMail({
        clientName: client.name, studioName: quote.studioName, designerName: actor.name, layoutName: quote.layoutName, quoteRef: quote.reference,
        grossMinor: quote.grossMinor, depositMinor: quote.depositMinor, depositPct: quote.depositPct, currency: quote.currency, note: quote.note, url,
      }),
      to: client,
      studioId: actor.studioId,
      sender: { userId: actor.userId, studioId: actor.studioId },
    });
    return 'sent';
  } catch (err) {
    return logNotSent(err);
  }
}

/** The receipt for a quote just marked paid; `req` supplies the link's origin where no public URL is set. */
export async function mailReceipt(req: Request, quoteId: string, paymentRef: string | null): Promise<MailOutcome> {
  const facts = await receiptFacts(quoteId);
  if (!facts?.client || facts.quote.status !== 'paid') return 'no-recipient';
  if (!mailConfigured()) return 'not-configured';
  const q = facts.quote;
  try {
    const url = `${returnOrigin(req)}${quotePath(q.layoutId)}`;
    await sendMail({
      ...depositReceiptMail({
        clientName: facts.client.name, studioName: facts.studioName, layoutName: facts.layoutName,
        quoteRef: quoteReference(q.number), depositMinor: q.depositMinor, grossMinor: q.grossMinor,
        currency: q.currency, paidAt: q.paidAt ?? new Date(), paymentRef, url,
      }),
      to: facts.client,
      studioId: q.studioId,
    });
  } catch (err) {
    return logNotSent(err);
  }
  await markReceiptSent(q.id, facts.client.email);
  return 'sent';
}
