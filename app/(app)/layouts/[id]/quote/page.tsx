import type { Metadata } from 'next';
import Link from 'next/link';
import { headers } from 'next/headers';
import { notFound, redirect } from 'next/navigation';
import { ArrowLeft, CircleCheck, Download, Info, TriangleAlert } from 'lucide-react';
import { currentActor } from '@/server/auth/session';
import { getLayout } from '@/db/layouts';
import { getCurrentQuote } from '@/db/quotes';
import { NotFoundError } from '@/db/errors';
import { checkReturnedSession } from '@/server/payments/deposit';
import { QuoteView } from '@/components/planning/quote/QuoteView';
import { PayDepositButton } from '@/components/planning/quote/PayDepositButton';
import { QUOTE_CAUTION } from '@/lib/layout/cautions';
import { paymentsConfigured } from '@/server/payments/config';

export const metadata: Metadata = { title: 'Quote' };

/** The request this page was asked with, for links in a receipt sent from here. */
async function pageRequest(): Promise<Request> {
  const h = await headers();
  const host = h.get('host') ?? 'localhost';
  return new Request(`http://${host}/`);
}

/**
 * A layout's quote: what the client sees and pays the deposit from, and the workshop checks.
 * On the return from the hosted checkout (`?paid=<session>`) the session is checked with the
 * payment API, in case its webhook has not arrived yet.
 */
export default async function QuotePage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const actor = await currentActor();
  if (!actor) redirect('/sign-in');
  const { id } = await params;
  const query = await searchParams;
  const layout = await getLayout(actor, id).catch((err) => {
    if (err instanceof NotFoundError) notFound();
    throw err;
  });
  const returned = typeof query.paid === 'string' ? query.paid : null;
  if (returned) await checkReturnedSession(await pageRequest(), actor, layout.id, returned);
  const quote = await getCurrentQuote(actor, layout.id);
  const cancelled = query.cancelled === '1';
  return (
    <main className="mx-auto max-w-3xl space-y-4 px-6 py-6">
      <nav className="flex flex-wrap gap-4 text-sm" aria-label="Layout">
        <Link href={`/layouts/${layout.id}`} className="inline-flex items-center gap-1 text-ink-soft hover:text-ink"><ArrowLeft size={14} aria-hidden="true" /> The plan</Link>
        <Link href={`/layouts/${layout.id}/build`} className="text-ink-soft hover:text-ink">Build plan</Link>
      </nav>
      <h1 className="text-2xl font-semibold">Quote · {layout.name}</h1>
      {returned && quote?.status === 'paid' && (
        <p role="status" className="flex items-center gap-2 rounded-sm border border-moss bg-moss-light p-3 text-sm" data-testid="paid-banner">
          <CircleCheck size={16} className="text-moss" aria-hidden="true" /> Thank you: your deposit is paid.{quote.receiptTo ? ` A receipt is on its way to ${quote.receiptTo}.` : ''}
        </p>
      )}
      {returned && quote?.status !== 'paid' && (
        <p role="status" className="flex items-center gap-2 rounded-sm border border-ochre bg-ochre-light p-3 text-sm">
          <Info size={16} aria-hidden="true" /> The payment service has not confirmed the deposit yet. Reload this page in a moment.
        </p>
      )}
      {cancelled && quote?.status !== 'paid' && (
        <p role="status" className="flex items-center gap-2 rounded-sm border border-paper-edge bg-paper-deep p-3 text-sm"><Info size={16} aria-hidden="true" /> Payment cancelled: nothing was charged.</p>
      )}
      {!quote ? (
        <p className="panel p-6 text-sm text-ink-soft">{layout.canEdit ? 'No quote has been sent for this layout yet. Send one from the build plan’s Quote tab.' : 'Your workshop has not sent a quote for this layout yet.'}</p>
      ) : (
        <>
          <p className="flex justify-end">
            <a className="btn-quiet px-3 py-1.5 text-sm" href={`/api/layouts/${layout.id}/quote/pdf`} download data-testid="quote-pdf">
              <Download size={14} aria-hidden="true" /> Download the quote (PDF)
            </a>
          </p>
          <QuoteView quote={quote} />
          {quote.canPay && !paymentsConfigured() && (
            <p role="status" className="panel flex items-center gap-2 p-4 text-sm">
              <Info size={16} aria-hidden="true" /> Deposits cannot be paid here yet: payments are not set up on this server. Your workshop can take the deposit another way.
            </p>
          )}
          {quote.canPay && paymentsConfigured() && (
            <div className="panel flex flex-wrap items-center justify-between gap-3 p-4">
              <p className="text-sm">Pay the deposit on the payment service&apos;s secure page; you come back here when it is done.</p>
              <PayDepositButton layoutId={layout.id} depositMinor={quote.depositMinor} currency={quote.currency} />
            </div>
          )}
          <p role="note" className="flex gap-2 rounded-sm border border-ochre bg-ochre-light p-3 text-sm" data-testid="quote-caution">
            <TriangleAlert size={16} className="mt-0.5 shrink-0 text-ochre" aria-hidden="true" /> {QUOTE_CAUTION}
          </p>
          {quote.status === 'sent' && !quote.canPay && (
            <p className="text-sm text-ink-soft">{layout.canEdit ? 'Waiting for the client to pay the deposit.' : 'This quote was sent to someone else.'}</p>
          )}
        </>
      )}
    </main>
  );
}
