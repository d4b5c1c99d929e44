/**
 * A quote as its client and the workshop see it — the same document as its PDF: the workshop's
 * name and details, status (word and icon), the revision it was priced from (and a line when that
 * was not an approved revision), the date it holds until, the frozen parts lines, materials,
 * labour, VAT, the total, the deposit and what is left to pay, who sent it and when, and — once
 * paid — when, and where the receipt went; then the studio's terms. Plain markup (server or
 * client); the pay button is its own client component. Shows the DTO; computes nothing but
 * formatting.
 */
import { CircleCheck, Clock, CircleSlash, TriangleAlert } from 'lucide-react';
import type { QuoteDto } from '@/db/quotes';
import { formatMoney, quantityText } from '../money';
import { formatDate, formatDateTime } from '@/lib/format';
import { quoteRevisionWords } from '@/lib/planning/quote-words';
import { SHEET_CAUTIONS } from '@/lib/layout/cautions';


export function QuoteStatus({ quote }: { quote: QuoteDto }) {
  if (quote.status === 'paid') return <span className="inline-flex items-center gap-1 rounded-sm bg-moss-light px-2 py-0.5 text-sm font-semibold text-ink" data-testid="quote-status"><CircleCheck size={14} aria-hidden="true" className="text-moss" />Deposit paid</span>;
  if (quote.status === 'superseded') return <span className="inline-flex items-center gap-1 rounded-sm bg-paper-deep px-2 py-0.5 text-sm text-ink-soft" data-testid="quote-status"><CircleSlash size={14} aria-hidden="true" />Replaced by a newer quote</span>;
  return <span className="inline-flex items-center gap-1 rounded-sm bg-ochre-light px-2 py-0.5 text-sm font-semibold text-ink" data-testid="quote-status"><Clock size={14} aria-hidden="true" className="text-ochre" />Waiting for the deposit</span>;
}

export function QuoteView({ quote }: { quote: QuoteDto }) {
  const m = (n: number | null) => formatMoney(n, quote.currency);
  const p = quote.parts;
  const rev = quoteRevisionWords(quote.revision, quote.layoutVersion);
  return (
    <article className="panel space-y-4 p-5" data-testid="quote">
      <header className="flex flex-wrap items-start justify-between gap-3">
        <div>
          <p className="font-semibold" data-testid="quote-workshop">{quote.studioName}</p>
          {quote.workshopDetails && <p className="whitespace-pre-line text-xs text-ink-soft">{quote.workshopDetails}</p>}
        </div>
        <QuoteStatus quote={quote} />
      </header>
      <div>
        <h2 className="text-lg font-semibold">Quote {quote.reference}</h2>
        <p className="text-sm text-ink-soft">
          Sent by {quote.sentByName} on {formatDateTime(quote.sentAt)}{quote.clientName ? ` · for ${quote.clientName}` : ''}
        </p>
        <p className="text-sm"><span data-testid="quote-revision">{rev.line}</span>{quote.validUntil ? <> · valid until <span className="font-semibold" data-testid="quote-valid-until">{formatDate(quote.validUntil)}</span></> : null}</p>
      </div>
      {rev.unapproved && (
        <p role="note" className="flex gap-2 rounded-sm border border-ochre bg-ochre-light p-2 text-sm" data-testid="quote-unapproved">
          <TriangleAlert size={16} className="mt-0.5 shrink-0 text-ochre" aria-hidden="true" />{rev.unapproved}
        </p>
      )}
      {quote.note && <blockquote className="border-l-2 border-copper pl-3 text-sm whitespace-pre-wrap">{quote.note}</blockquote>}
      {/* Focusable, so a keyboard can scroll the lines sideways on a narrow phone. */}
      <div className="overflow-x-auto" tabIndex={0} role="region" aria-label="Quote lines">
        <table className="w-full text-left text-sm">
          <thead className="border-b border-paper-edge text-xs text-ink-soft"><tr><th className="py-1.5">Item</th><th className="pl-3 text-right">Qty</th><th className="pl-3 text-right max-[480px]:hidden">Unit price</th><th className="pl-3 text-right">Net</th></tr></thead>
          <tbody>
            {p.lines.map((l) => (
              <tr key={l.key} className="border-t border-paper-edge">
                <td className="py-1">{l.description}</td>
                <td className="pl-3 text-right font-mono">
                  {quantityText(l.qty, l.unit)}
                  {/* On a phone the unit price stands under the quantity rather than in a column of its own. */}
                  <span className="block text-xs text-ink-soft min-[480px]:hidden">at {m(l.unitPriceMinor)}</span>
                </td>
                <td className="pl-3 text-right font-mono max-[480px]:hidden">{m(l.unitPriceMinor)}</td>
                <td className="pl-3 text-right font-mono">{m(l.netMinor)}</td>
              </tr>
            ))}
          </tbody>
          <tfoot className="border-t-2 border-ink">
            <tr><td className="py-1" colSpan={2}>Materials</td><td className="max-[480px]:hidden" /><td className="text-right font-mono">{m(p.materialsMinor)}</td></tr>
            <tr><td className="py-1" colSpan={2}>Workshop labour, <span className="font-mono">{Math.round(p.labourHours * 100) / 100} h</span></td><td className="max-[480px]:hidden" /><td className="text-right font-mono">{m(p.labourMinor)}</td></tr>
            <tr><td className="py-1" colSpan={2}>VAT <span className="font-mono">{p.vatPct} %</span></td><td className="max-[480px]:hidden" /><td className="text-right font-mono">{m(p.vatMinor)}</td></tr>
            <tr className="font-semibold"><td className="py-1.5" colSpan={2}>Total</td><td className="max-[480px]:hidden" /><td className="text-right font-mono" data-testid="quote-total">{m(quote.grossMinor)}</td></tr>
          </tfoot>
        </table>
      </div>
      <dl className="grid gap-2 rounded-sm bg-paper-deep p-3 text-sm sm:grid-cols-3">
        <div><dt className="label">Deposit ({quote.depositPct} %)</dt><dd className="font-mono text-lg" data-testid="quote-deposit">{m(quote.depositMinor)}</dd></div>
        <div><dt className="label">Left to pay after it</dt><dd className="font-mono text-lg">{m(quote.balanceMinor)}</dd></div>
        <div>
          <dt className="label">Paid</dt>
          <dd className="text-sm" data-testid="quote-paid">
            {quote.paidAt ? <>on {formatDateTime(quote.paidAt)}{quote.receiptTo ? <>; receipt sent to <span className="font-mono">{quote.receiptTo}</span></> : '; receipt not sent yet'}</> : 'not yet'}
          </dd>
        </div>
      </dl>
      {quote.terms && (
        <section aria-label="Terms" data-testid="quote-terms">
          <h3 className="mb-1 text-sm font-semibold">Terms</h3>
          <p className="whitespace-pre-line text-sm">{quote.terms}</p>
        </section>
      )}
      <section aria-label="Safety cautions" data-testid="quote-cautions">
        <h3 className="mb-1 text-sm font-semibold">Safety cautions</h3>
        <dl className="space-y-1 text-xs">
          {SHEET_CAUTIONS.map((c) => (
            <div key={c.topic}><dt className="inline font-semibold">{c.topic}. </dt><dd className="inline">{c.text}</dd></div>
          ))}
        </dl>
      </section>
    </article>
  );
}
