'use client';
/**
 * Settings → Quotes: what every quote the studio sends carries — the workshop's details (address,
 * telephone, mail, company and VAT numbers), its terms, and how many days a quote holds. Each
 * quote keeps the words it was sent with; changing them here changes only quotes sent later.
 * Owners edit; designers read.
 */
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import * as z from 'zod/mini';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { toast } from '@/components/ui/toast';
import { apiFetch } from '@/lib/api/client-fetch';
import type { QuoteTerms, StudioDto } from '@/db/studios';

const schema = z.object({
  details: z.string().check(z.maxLength(1000, 'at most 1000 characters')),
  terms: z.string().check(z.maxLength(8000, 'at most 8000 characters')),
  validDays: z.string().check(z.trim(), z.refine((s) => /^\d{1,3}$/.test(s) && Number(s) >= 1 && Number(s) <= 365, 'whole days from 1 to 365')),
});
type Values = z.infer<typeof schema>;

export function QuoteTermsPanel({ terms, canEdit }: { terms: QuoteTerms; canEdit: boolean }) {
  const qc = useQueryClient();
  const form = useForm<Values>({
    resolver: zodResolver(schema),
    defaultValues: { details: terms.details, terms: terms.terms, validDays: String(terms.validDays) },
  });
  const save = useMutation({
    mutationFn: (v: Values) => apiFetch<StudioDto>('/api/studio', { method: 'PATCH', json: { quote: { details: v.details, terms: v.terms, validDays: Number(v.validDays) } } }),
    onSuccess: () => {
      toast.success('Quote terms saved; quotes sent from now on carry them');
      qc.invalidateQueries();
    },
    onError: (err) => toast.error(err.message),
  });
  const err = (k: keyof Values) => form.formState.errors[k] && <p className="field-error">{form.formState.errors[k]?.message}</p>;
  return (
    <section className="panel p-5" id="quote-terms" aria-labelledby="quote-terms-title">
      <h2 id="quote-terms-title" className="text-lg font-semibold">Quotes</h2>
      <p className="mt-1 text-sm text-ink-soft">Printed on every quote and its PDF. A quote keeps the words it was sent with.</p>
      <form className="mt-3 grid gap-4" onSubmit={form.handleSubmit((v) => save.mutate(v))} noValidate>
        <fieldset disabled={!canEdit} className="contents">
          <div>
            <label className="label" htmlFor="q-details">Workshop details</label>
            <textarea id="q-details" rows={4} className="field" placeholder={'Unit 4, Quay Road\nTelephone and mail\nCompany and VAT numbers'} {...form.register('details')} />
            {err('details')}
          </div>
          <div>
            <label className="label" htmlFor="q-terms">Terms</label>
            <textarea id="q-terms" rows={6} className="field" placeholder="What the deposit secures, when the balance is due, what happens if the build changes…" {...form.register('terms')} />
            {err('terms')}
          </div>
          <div className="w-40">
            <label className="label" htmlFor="q-valid">Quotes hold for</label>
            <span className="flex items-center rounded-sm border border-ink-faint bg-white/70">
              <input id="q-valid" className="w-full bg-transparent px-2 py-1.5 font-mono text-sm outline-none" inputMode="numeric" {...form.register('validDays')} />
              <span className="pr-2 text-xs text-ink-faint">days</span>
            </span>
            {err('validDays')}
          </div>
          {canEdit ? (
            <div><button className="btn-primary" type="submit" disabled={save.isPending}>{save.isPending ? 'Saving…' : 'Save quote terms'}</button></div>
          ) : (
            <p className="text-sm text-ink-soft">Only the studio owner can change these.</p>
          )}
        </fieldset>
      </form>
    </section>
  );
}
