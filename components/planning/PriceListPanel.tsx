'use client';
/**
 * Settings → Price list: what each part a parts list can ask for costs (net of VAT, per its
 * fixed unit), the workshop hours it takes, the labour rate, VAT and currency. The owner edits
 * and saves the whole list; designers read it; clients never see this panel. A price left empty
 * means "not priced" (quotes are refused until it is), never zero.
 */
import { useMemo } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import * as z from 'zod/mini';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { toast } from '@/components/ui/toast';
import { apiFetch } from '@/lib/api/client-fetch';
import { PRICE_KEYS, priceKeyInfo, type PriceKeyInfo } from '@/lib/planning/price-keys';
import type { PriceList } from '@/lib/planning';
import type { PriceListDto } from '@/db/prices';
import { moneyText, parseMoneyMinor } from './money';
import { parseWithUnit, shown } from './quantities';
import { usePriceList } from './usePriceList';

const CATEGORY_TITLE: Record<PriceKeyInfo['category'], string> = { module: 'Modules', sheet: 'Sheet goods', cable: 'Cable', electrics: 'Electrics', safety: 'Safety' };

const money = (required: boolean) => z.pipe(z.string(), z.transform((s: string, ctx) => {
  if (s.trim() === '') {
    if (required) ctx.issues.push({ code: 'custom', input: s, message: 'required' });
    return undefined;
  }
  const v = parseMoneyMinor(s);
  if (v === null) {
    ctx.issues.push({ code: 'custom', input: s, message: 'an amount, e.g. 12.50' });
    return z.NEVER;
  }
  return v;
}));
const hours = z.pipe(z.string(), z.transform((s: string, ctx) => {
  if (s.trim() === '') return undefined;
  const v = parseWithUnit(s, ['h']);
  if (v === null || v < 0 || v > 1000) {
    ctx.issues.push({ code: 'custom', input: s, message: 'hours, 0 to 1000' });
    return z.NEVER;
  }
  return v;
}));

const schema = z.object({
  currency: z.string().check(z.trim(), z.toUpperCase(), z.regex(/^[A-Z]{3}$/, 'a three-letter code, e.g. GBP')),
  labourRate: money(true),
  vatPct: z.pipe(z.string(), z.transform((s: string, ctx) => {
    const v = parseWithUnit(s, ['%']);
    if (v === null || v < 0 || v > 100) {
      ctx.issues.push({ code: 'custom', input: s, message: '0 to 100 %' });
      return z.NEVER;
    }
    return v;
  })),
  rows: z.array(z.object({ key: z.string(), price: money(false), hours })),
});
type Input = z.input<typeof schema>;

function rowsFor(list: PriceList): PriceKeyInfo[] {
  const extra = Object.keys(list.items).filter((k) => !PRICE_KEYS.some((p) => p.key === k)).map((k) => priceKeyInfo(k)).filter((p): p is PriceKeyInfo => p !== null);
  return [...PRICE_KEYS, ...extra];
}

function PriceListForm({ list, canEdit }: { list: PriceListDto; canEdit: boolean }) {
  const qc = useQueryClient();
  const rows = useMemo(() => rowsFor(list), [list]);
  const form = useForm<Input, unknown, z.output<typeof schema>>({
    resolver: zodResolver(schema),
    defaultValues: {
      currency: list.currency,
      labourRate: moneyText(list.exists ? list.labourRateMinor : undefined),
      vatPct: shown(list.vatPct),
      rows: rows.map((r) => ({ key: r.key, price: moneyText(list.items[r.key]?.priceMinor), hours: shown(list.items[r.key]?.labourHours) })),
    },
  });
  const save = useMutation({
    mutationFn: (v: z.output<typeof schema>) => {
      const items: PriceList['items'] = {};
      v.rows.forEach((r, i) => {
        if (r.price === undefined) return;
        const info = rows[i];
        items[r.key] = { unit: info.unit, priceMinor: r.price, ...(r.hours !== undefined ? { labourHours: r.hours } : {}), ...(list.items[r.key]?.label ? { label: list.items[r.key].label } : {}) };
      });
      return apiFetch<PriceListDto>('/api/studio/prices', { method: 'PUT', json: { currency: v.currency, labourRateMinor: v.labourRate!, vatPct: v.vatPct, items } });
    },
    onSuccess: (saved) => {
      qc.setQueryData(['price-list'], saved);
      toast.success('Price list saved');
    },
    onError: (err) => toast.error(err.message),
  });
  const e = form.formState.errors;
  const currency = form.watch('currency');
  const groups = [...new Set(rows.map((r) => r.category))];
  return (
    <form onSubmit={form.handleSubmit((v) => save.mutate(v))} noValidate className="mt-3 space-y-4">
      <fieldset disabled={!canEdit || save.isPending} className="space-y-4">
        <div className="grid gap-4 sm:grid-cols-3">
          <div><label className="label" htmlFor="pl-cur">Currency</label><input id="pl-cur" className="field font-mono" {...form.register('currency')} />{e.currency && <p className="field-error">{e.currency.message}</p>}</div>
          <div><label className="label" htmlFor="pl-rate">Labour rate ({currency} per hour, net)</label><input id="pl-rate" className="field font-mono" inputMode="decimal" {...form.register('labourRate')} />{e.labourRate && <p className="field-error">{e.labourRate.message}</p>}</div>
          <div><label className="label" htmlFor="pl-vat">VAT (%)</label><input id="pl-vat" className="field font-mono" inputMode="decimal" {...form.register('vatPct')} />{e.vatPct && <p className="field-error">{e.vatPct.message}</p>}</div>
        </div>
        {groups.map((g) => (
          <details key={g} className="rounded-sm border border-paper-edge" open={g === 'module' || rows.some((r, i) => r.category === g && !!e.rows?.[i])}>
            <summary className="cursor-pointer px-3 py-2 text-sm font-semibold">{CATEGORY_TITLE[g]}</summary>
            <table className="w-full text-left text-sm">
              <thead className="text-xs text-ink-soft"><tr><th className="px-3 py-1">Item</th><th className="max-[480px]:hidden">Per</th><th>Price ({currency}, net)</th><th>Workshop hours</th></tr></thead>
              <tbody>
                {rows.map((r, i) => r.category !== g ? null : (
                  <tr key={r.key} className="border-t border-paper-edge">
                    <td className="px-3 py-1">
                      {r.description}
                      {/* On a phone the unit goes under the item rather than in a column of its own. */}
                      <span className="block font-mono text-xs text-ink-soft min-[480px]:hidden">per {r.unit}</span>
                    </td>
                    <td className="font-mono text-xs text-ink-soft max-[480px]:hidden">{r.unit}</td>
                    <td className="py-1 pr-2">
                      <input aria-label={`Price of ${r.description}`} className="field w-20 font-mono sm:w-28" inputMode="decimal" placeholder="not priced" {...form.register(`rows.${i}.price`)} />
                      {e.rows?.[i]?.price && <p className="field-error">{e.rows[i]?.price?.message}</p>}
                    </td>
                    <td className="py-1 pr-3">
                      <input aria-label={`Workshop hours for ${r.description}`} className="field w-16 font-mono sm:w-24" inputMode="decimal" {...form.register(`rows.${i}.hours`)} />
                      {e.rows?.[i]?.hours && <p className="field-error">{e.rows[i]?.hours?.message}</p>}
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </details>
        ))}
        {canEdit && <button className="btn-primary" type="submit">{save.isPending ? 'Saving…' : 'Save price list'}</button>}
      </fieldset>
      {!canEdit && <p className="text-sm text-ink-soft">Only the studio owner can change the price list.</p>}
    </form>
  );
}

export function PriceListPanel({ canEdit }: { canEdit: boolean }) {
  const q = usePriceList();
  return (
    <section className="panel p-5" id="price-list" aria-labelledby="price-list-title">
      <h2 id="price-list-title" className="text-lg font-semibold">Price list</h2>
      <p className="text-sm text-ink-soft">Prices net of VAT, per the unit shown. Parts lists and quotes are priced from this list; an empty price means not priced (quotes wait for it).</p>
      {q.isPending ? <p className="mt-3 text-sm text-ink-soft" role="status">Loading…</p>
        : q.isError ? <p className="mt-3 text-sm text-brick" role="alert">Could not load the price list: {q.error.message}</p>
          : (
            <>
              {!q.data.exists && <p className="mt-3 rounded-sm border border-ochre bg-ochre-light p-2 text-sm">No price list yet{canEdit ? ': enter your prices and save.' : '.'}</p>}
              <PriceListForm key={q.data.updatedAt ?? 'new'} list={q.data} canEdit={canEdit} />
            </>
          )}
    </section>
  );
}
