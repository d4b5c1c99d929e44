'use client';
/**
 * The workshop's side of the quote, on the build-plan page: the layout's current quote and its
 * status, and a form to send a new one — deposit % and a note — priced by the server from the
 * chosen issued revision (by default the latest approved; the preliminary only when chosen) and
 * the studio price list. A revision that is not approved (or the preliminary) is sent only after
 * the designer confirms, and the quote says so. Holds the send while the page has unsaved
 * entries, while nothing is shared with a client, or once a deposit is paid. Never prices
 * anything itself beyond the preview of the deposit.
 */
import Link from 'next/link';
import { useMemo, useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import * as z from 'zod/mini';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { Send, ExternalLink, TriangleAlert } from 'lucide-react';
import { toast } from '@/components/ui/toast';
import { apiFetch, ApiError } from '@/lib/api/client-fetch';
import { computePartsList, quoteDeposit } from '@/lib/planning';
import type { LayoutDoc } from '@/lib/layout';
import type { QuoteDto } from '@/db/quotes';
import { formatMoney } from '../money';
import { parseWithUnit } from '../quantities';
import { usePriceList } from '../usePriceList';
import type { CutOptions } from '../cut/CutListPanel';
import { QuoteStatus } from './QuoteView';
import { formatDateTime } from '@/lib/format';

const schema = z.object({
  depositPct: z.pipe(z.string(), z.transform((s: string, ctx) => {
    const v = parseWithUnit(s, ['%']);
    if (v === null || v <= 0 || v > 100 || Math.abs(Math.round(v * 100) - v * 100) > 1e-6) {
      ctx.issues.push({ code: 'custom', input: s, message: 'a percentage above 0 and at most 100, e.g. 25 %' });
      return z.NEVER;
    }
    return v;
  })),
  note: z.string().check(z.trim(), z.maxLength(1000, 'at most 1000 characters')),
});

export function useCurrentQuote(layoutId: string) {
  return useQuery({ queryKey: ['quote', layoutId], queryFn: () => apiFetch<{ quote: QuoteDto | null }>(`/api/layouts/${encodeURIComponent(layoutId)}/quote`) });
}

export function QuotePanel({ layoutId, savedDoc, savedVersion, revision, clientName, dirty, cut, canSend }: {
  layoutId: string;
  savedDoc: LayoutDoc;
  savedVersion: number;
  /** The revision priced; null: the preliminary layout as last saved. */
  revision: { letter: string; state: string } | null;
  clientName: string | null;
  dirty: boolean;
  cut: CutOptions;
  canSend: boolean;
}) {
  const qc = useQueryClient();
  const current = useCurrentQuote(layoutId);
  const prices = usePriceList();
  const form = useForm<z.input<typeof schema>, unknown, z.output<typeof schema>>({ resolver: zodResolver(schema), mode: 'onChange', defaultValues: { depositPct: '25', note: '' } });
  const pct = parseWithUnit(form.watch('depositPct'), ['%']);
  const preview = useMemo(() => {
    if (!prices.data?.exists) return null;
    try {
      return computePartsList(savedDoc, prices.data, cut);
    } catch {
      return null;
    }
  }, [savedDoc, prices.data, cut]);
  /** The server asked for a confirmation: the revision is not approved. Holds the values to send again. */
  const [confirming, setConfirming] = useState<{ message: string; values: z.output<typeof schema> } | null>(null);
  const send = useMutation({
    mutationFn: ({ values: v, confirmed }: { values: z.output<typeof schema>; confirmed: boolean }) =>
      apiFetch<{ quote: QuoteDto; mail: string }>(`/api/layouts/${encodeURIComponent(layoutId)}/quote`, {
        method: 'POST',
        json: {
          layoutVersion: savedVersion, revision: revision?.letter ?? 'preliminary', depositPct: v.depositPct,
          ...(v.note ? { note: v.note } : {}), cut, ...(confirmed ? { confirmUnapproved: true } : {}),
        },
      }),
    onSuccess: (res) => {
      setConfirming(null);
      toast.success(res.mail === 'sent' ? `Quote sent to ${clientName ?? 'the client'}` : res.mail === 'not-configured' ? 'Quote saved; mail is not set up on this server, so tell the client yourself' : 'Quote saved; the mail to the client could not be sent');
      qc.setQueryData(['quote', layoutId], { quote: res.quote });
    },
    onError: (err, vars) => {
      if (err instanceof ApiError && err.status === 409 && err.body.confirm === 'unapproved-revision') setConfirming({ message: err.message, values: vars.values });
      else if (err instanceof ApiError && err.status === 412) toast.error('The layout was saved elsewhere since this page loaded: reload to price the latest version.');
      else toast.error(err.message);
    },
  });
  const q = current.data?.quote ?? null;
  const paid = q?.status === 'paid';
  const blocker = !canSend ? 'Only the workshop sends quotes.'
    : !clientName ? 'Share this layout with a client before sending a quote.'
      : paid ? 'The deposit is paid: this layout’s quote stays as it is.'
        : dirty ? 'Your latest entries are being saved: the quote is priced from the saved version.'
          : prices.data && !prices.data.exists ? 'Set up the studio price list first.'
            : preview && preview.unpriced.length ? `Price these first: ${preview.unpriced.join(', ')}.` : null;

  return (
    <div className="grid gap-6 xl:grid-cols-2" data-testid="quote-panel">
      <section className="panel space-y-3 p-4" aria-label="Current quote">
        <h3 className="font-semibold">Current quote</h3>
        {current.isPending ? <p className="text-sm text-ink-soft" role="status">Loading…</p>
          : current.isError ? <p className="text-sm text-brick" role="alert">{current.error.message}</p>
            : !q ? <p className="text-sm text-ink-soft">No quote sent yet.</p>
              : (
                <div className="space-y-2 text-sm">
                  <QuoteStatus quote={q} />
                  <p>Total <span className="font-mono">{formatMoney(q.grossMinor, q.currency)}</span>, deposit {q.depositPct} % <span className="font-mono">{formatMoney(q.depositMinor, q.currency)}</span>; sent by {q.sentByName} on {formatDateTime(q.sentAt)}.</p>
                  {q.paidAt && <p>Paid on {formatDateTime(q.paidAt)}{q.receiptTo ? `; receipt sent to ${q.receiptTo}` : ''}.</p>}
                </div>
              )}
        <Link className="inline-flex items-center gap-1 text-sm text-copper underline" href={`/layouts/${layoutId}/quote`}>
          <ExternalLink size={14} aria-hidden="true" /> Open the quote page (what the client sees)
        </Link>
      </section>
      <form className="panel space-y-3 p-4" onSubmit={form.handleSubmit((v) => send.mutate({ values: v, confirmed: false }))} noValidate aria-label="Send a quote">
        <h3 className="font-semibold">Send a quote{clientName ? ` to ${clientName}` : ''}</h3>
        <p className="text-sm text-ink-soft">Priced from {revision ? <>revision <span className="font-mono">{revision.letter}</span></> : 'the preliminary layout, as last saved'}.</p>
        <fieldset disabled={!!blocker || send.isPending} className="space-y-3">
          <div>
            <label className="label" htmlFor="q-dep">Deposit</label>
            <span className="flex w-32 items-center rounded-sm border border-ink-faint bg-white/70">
              <input id="q-dep" className="w-full bg-transparent px-2 py-1.5 font-mono text-sm outline-none" inputMode="decimal" {...form.register('depositPct')} aria-invalid={!!form.formState.errors.depositPct} />
              <span className="pr-2 font-mono text-xs text-ink-faint">%</span>
            </span>
            {form.formState.errors.depositPct && <p className="field-error">{form.formState.errors.depositPct.message}</p>}
          </div>
          <div>
            <label className="label" htmlFor="q-note">Note to the client</label>
            <textarea id="q-note" rows={3} className="field" {...form.register('note')} placeholder="e.g. Fitting from March; the deposit books the workshop slot." />
            {form.formState.errors.note && <p className="field-error">{form.formState.errors.note.message}</p>}
          </div>
          {preview && !preview.unpriced.length && (
            <p className="text-sm">
              Total <span className="font-mono">{formatMoney(preview.grossMinor, preview.currency)}</span> incl. VAT
              {pct !== null && pct > 0 && pct <= 100 && <> · deposit <span className="font-mono" data-testid="deposit-preview">{formatMoney(quoteDeposit(preview.grossMinor, pct), preview.currency)}</span></>}
              <span className="text-ink-soft"> ({revision ? `revision ${revision.letter}` : `saved version ${savedVersion}`})</span>
            </p>
          )}
          <button type="submit" className="btn-primary"><Send size={14} aria-hidden="true" />{send.isPending ? 'Sending…' : 'Send quote'}</button>
        </fieldset>
        {blocker && <p className="text-sm text-ink-soft" role="note">{blocker}</p>}
        {confirming && (
          <div role="alertdialog" aria-labelledby="quote-confirm-title" className="space-y-2 rounded-sm border border-ochre bg-ochre-light p-3 text-sm" data-testid="quote-confirm">
            <p id="quote-confirm-title" className="flex gap-2 font-semibold"><TriangleAlert size={16} className="mt-0.5 shrink-0 text-ochre" aria-hidden="true" />Send a quote for a revision that is not approved?</p>
            <p>{confirming.message}</p>
            <div className="flex gap-2">
              <button type="button" className="btn-primary" disabled={send.isPending} onClick={() => send.mutate({ values: confirming.values, confirmed: true })}>Send anyway, saying so on the quote</button>
              <button type="button" className="btn-quiet" onClick={() => setConfirming(null)}>Cancel</button>
            </div>
          </div>
        )}
      </form>
    </div>
  );
}
