/**
 * The words of the mail about a quote and its deposit: "your quote is ready" to the client when
 * the workshop sends it, and the receipt once the deposit is paid. Pure functions of their
 * inputs (names, amounts in minor units, dates, an absolute link the caller built), in the style
 * of messages.ts. Must never look anything up or send anything.
 */
import { QUOTE_CAUTION } from '../../lib/layout/cautions';
import { compose, oneLine, type ComposedMail } from './compose';

import { formatLongDate as day, formatMoney } from '../../lib/format';

export { formatMoney };

export function quoteSentMail(p: {
  clientName: string; studioName: string; designerName: string; layoutName: string; quoteRef: string;
  grossMinor: number; depositMinor: number; depositPct: number; currency: string; note: string; url: string;
}): ComposedMail {
  return compose(`Your quote for ${oneLine(p.layoutName, 80)} is ready`, {
    greeting: `Hello ${oneLine(p.clientName, 80)},`,
    paragraphs: [
      `${p.designerName} at ${p.studioName} has sent you quote ${p.quoteRef} for ${p.layoutName}: ${formatMoney(p.grossMinor, p.currency)} including VAT.`,
      `A deposit of ${p.depositPct} %, ${formatMoney(p.depositMinor, p.currency)}, books the build. You can look over every line of the quote and pay the deposit online.`,
    ],
    quote: p.note || undefined,
    action: { label: 'See the quote', url: p.url },
    footer: QUOTE_CAUTION,
  });
}

export function depositReceiptMail(p: {
  clientName: string; studioName: string; layoutName: string; quoteRef: string;
  depositMinor: number; grossMinor: number; currency: string; paidAt: Date; paymentRef: string | null; url: string;
}): ComposedMail {
  const balance = p.grossMinor - p.depositMinor;
  return compose(`Receipt: deposit of ${formatMoney(p.depositMinor, p.currency)} for ${oneLine(p.layoutName, 80)}`, {
    greeting: `Hello ${oneLine(p.clientName, 80)},`,
    paragraphs: [
      `Thank you: ${p.studioName} has received your deposit of ${formatMoney(p.depositMinor, p.currency)} for ${p.layoutName} on ${day(p.paidAt)}.`,
      `Quote total ${formatMoney(p.grossMinor, p.currency)} including VAT; left to pay after the deposit: ${formatMoney(balance, p.currency)}.`,
      `Quote reference ${p.quoteRef}${p.paymentRef ? `, payment reference ${p.paymentRef}` : ''}. This is a receipt for a deposit, not a VAT invoice.`,
    ],
    action: { label: 'See the paid quote', url: p.url },
    footer: `${QUOTE_CAUTION} Keep this mail as your record of the payment. Sent by Baywright on behalf of your workshop.`,
  });
}
