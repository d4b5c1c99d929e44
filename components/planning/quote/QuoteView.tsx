/**
 * A quote as its client and the workshop see it: status (word and icon), the frozen parts
 * lines, materials, labour, VAT, the total, the deposit and what is left to pay, who sent it
 * and when, and — once paid — when, and where the receipt went. Plain markup (server or
 * client); the pay button is its own client component. Shows the DTO; computes nothing but
 * formatting.
 */
import { CircleCheck, Clock, CircleSlash } from 'lucide-react';
import type { QuoteDto } from '@/db/quotes';
import { formatMoney, quantityText } from '../money';
import { formatDateTime } from '@/lib/format';


export function QuoteStatus({ quote }: { quote: QuoteDto }) {
  if (quote.status === 'paid') return <span className="inline-flex items-center gap-1 rounded-sm bg-moss-light px-2 py-0.5 text-sm font-semibold text-ink" data-testid="quote-status"><CircleCheck size={14} aria-hidden="true" className="text-moss" />Deposit paid</span>;
  if (quote.status === 'superseded') return <span className="inline-flex items-center gap-1 rounded-sm bg-paper-deep px-2 py-0.5 text-sm text-ink-soft" data-testid="quote-status"><CircleSlash size={14} aria-hidden="true" />Replaced by a newer quote</span>;
  return <span className="inline-flex items-center gap-1 rounded-sm bg-ochre-light px-2 py-0.5 text-sm font-semibold text-ink" data-testid="quote-status"><Clock size={14} aria-hidden="true" className="text-ochre" />Waiting for the deposit</span>;
}

export function QuoteView({ quote }: { quote: QuoteDto }) {
  const m = (n: number | null) => formatMoney(n, quote.currency);
  const p = quote.parts;
  return (
    <article className="panel space-y-4 p-5" data-testid="quote">
      <header className="flex flex-wrap items-start justify-between gap-3">
        <div>
          <h2 className="text-lg font-semibold">Quote {quote.reference}</h2>
          <p className="text-sm text-ink-soft">
            {quote.studioName} · sent by {quote.sentByName} on {formatDateTime(quote.sentAt)} · priced from layout version <span className="font-mono">{quote.layoutVersion}</span>
            {quote.clientName ? ` · for ${quote.clientName}` : ''}
          </p>
        </div>
        <QuoteStatus quote={quote} />
      </header>
      {quote.note && <blockquote className="border-l-2 border-copper pl-3 text-sm whitespace-pre-wrap">{quote.note}</blockquote>}
      <div className="overflow-x-auto">
        <table className="w-full text-left text-sm">
          <thead className="border-b border-paper-edge text-xs text-ink-soft"><tr><th className="py-1.5">Item</th><th className="text-right">Qty</th><th className="text-right">Unit price</th><th className="text-right">Net</th></tr></thead>
          <tbody>
            {p.lines.map((l) => (
              <tr key={l.key} className="border-t border-paper-edge">
                <td className="py-1">{l.description}</td>
                <td className="text-right font-mono">{quantityText(l.qty, l.unit)}</td>
                <td className="text-right font-mono">{m(l.unitPriceMinor)}</td>
                <td className="text-right font-mono">{m(l.netMinor)}</td>
              </tr>
            ))}
          </tbody>
          <tfoot className="border-t-2 border-ink">
            <tr><td className="py-1" colSpan={3}>Materials</td><td className="text-right font-mono">{m(p.materialsMinor)}</td></tr>
            <tr><td className="py-1" colSpan={3}>Workshop labour, <span className="font-mono">{Math.round(p.labourHours * 100) / 100} h</span></td><td className="text-right font-mono">{m(p.labourMinor)}</td></tr>
            <tr><td className="py-1" colSpan={3}>VAT <span className="font-mono">{p.vatPct} %</span></td><td className="text-right font-mono">{m(p.vatMinor)}</td></tr>
            <tr className="font-semibold"><td className="py-1.5" colSpan={3}>Total</td><td className="text-right font-mono" data-testid="quote-total">{m(quote.grossMinor)}</td></tr>
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
    </article>
  );
}
