'use client';
/**
 * The parts list of the chosen revision (or, when chosen, the preliminary layout), priced from the studio's price list: one sortable table
 * (TanStack Table) of modules by kind, sheet goods from the cut list, cable per cross-section,
 * battery, solar and alarms, with labour hours; then materials, labour at the studio rate, VAT
 * and the total. Unpriced lines are flagged, never counted as zero. The CSV download is the
 * saved version's, from the server. Computes through `computePartsList` only.
 */
import { useMemo } from 'react';
import Link from 'next/link';
import { createColumnHelper } from '@tanstack/react-table';
import { Download, CircleAlert } from 'lucide-react';
import { DataTable } from '@/components/ui/DataTable';
import { computePartsList, type PartsLine } from '@/lib/planning';
import type { LayoutDoc } from '@/lib/layout';
import { usePriceList } from '../usePriceList';
import { formatMoney, quantityText } from '../money';
import type { CutOptions } from '../cut/CutListPanel';

const col = createColumnHelper<PartsLine>();
const CATEGORY = { module: 'Module', sheet: 'Sheet goods', cable: 'Cable', electrics: 'Electrics', safety: 'Safety' } as const;

export function csvHref(layoutId: string, cut: CutOptions, revision: string | null): string {
  const q = new URLSearchParams({ format: 'csv', kerf: String(cut.kerfMm), trim: String(cut.trimMm), grain: cut.respectGrain ? '1' : '0', revision: revision ?? 'preliminary' });
  return `/api/layouts/${encodeURIComponent(layoutId)}/quote/parts?${q}`;
}

export function PartsListPanel({ layoutId, doc, cut, dirty, revision }: { layoutId: string; doc: LayoutDoc; cut: CutOptions; dirty: boolean; revision: string | null }) {
  const prices = usePriceList();
  const result = useMemo(() => {
    if (!prices.data?.exists) return null;
    try {
      return { ok: true as const, list: computePartsList(doc, prices.data, cut) };
    } catch (err) {
      return { ok: false as const, error: err instanceof Error ? err.message : String(err) };
    }
  }, [doc, prices.data, cut]);
  const currency = prices.data?.currency ?? 'GBP';
  const columns = useMemo(() => [
    col.accessor('description', { header: 'Item', cell: (c) => <span>{c.getValue()}</span> }),
    col.accessor('category', { header: 'Category', cell: (c) => <span className="text-ink-soft">{CATEGORY[c.getValue()]}</span> }),
    col.accessor('qty', { header: 'Qty', meta: { align: 'right' }, cell: (c) => <span className="font-mono">{quantityText(c.getValue(), c.row.original.unit)}</span> }),
    col.accessor('unitPriceMinor', {
      header: 'Unit price',
      meta: { align: 'right' },
      cell: (c) => c.getValue() === null
        ? <span className="inline-flex items-center gap-1 text-brick"><CircleAlert size={12} aria-hidden="true" />not priced</span>
        : <span className="font-mono">{formatMoney(c.getValue(), currency)}<span className="text-ink-faint">/{c.row.original.unit}</span></span>,
    }),
    col.accessor('netMinor', { header: 'Net', meta: { align: 'right' }, cell: (c) => <span className="font-mono">{formatMoney(c.getValue(), currency)}</span> }),
    col.accessor('labourHours', { header: 'Labour h', meta: { align: 'right' }, cell: (c) => <span className="font-mono">{Math.round(c.getValue() * 100) / 100}</span> }),
  ], [currency]);
  if (prices.isPending) return <p className="panel p-4 text-sm text-ink-soft" role="status">Loading the price list…</p>;
  if (prices.isError) return <p className="panel border-brick p-4 text-sm" role="alert">Could not load the price list: {prices.error.message}</p>;
  if (!prices.data.exists) {
    return <p className="panel p-4 text-sm">No price list yet. The studio owner sets one up in <Link className="text-copper underline" href="/settings#price-list">Settings → Price list</Link>.</p>;
  }
  if (!result?.ok) return <p className="panel border-brick p-4 text-sm" role="alert">The parts list cannot be priced: {result?.error}</p>;
  const list = result.list;
  return (
    <div className="space-y-3" data-testid="parts-list">
      <div className="flex flex-wrap items-center gap-3">
        <a className="btn-quiet" href={csvHref(layoutId, cut, revision)} download><Download size={14} aria-hidden="true" /> Download CSV</a>
        <span className="text-xs text-ink-soft">{revision ? `From revision ${revision} as issued, with the cut-list options shown.` : dirty ? 'The CSV and the quote use the saved version; your latest entries are being saved.' : 'From the saved version, with the cut-list options shown.'}</span>
      </div>
      {list.unpriced.length > 0 && (
        <p className="rounded-sm border border-brick bg-brick-light p-2 text-sm" role="alert">
          Not priced yet: {[...new Set(list.lines.filter((l) => l.unitPriceMinor === null).map((l) => l.description))].join(', ')}. Add them in <Link className="text-copper underline" href="/settings#price-list">Settings → Price list</Link> before sending a quote.
        </p>
      )}
      <DataTable
        data={list.lines}
        columns={columns}
        headCase="normal"
        dense
        rowProps={(row) => ({ 'data-key': row.original.key })}
        footer={(
          <>
            <tr><td className="px-3 py-1" colSpan={4}>Materials</td><td className="px-3 text-right font-mono">{formatMoney(list.materialsMinor, currency)}</td><td /></tr>
            <tr><td className="px-3 py-1" colSpan={4}>Labour, <span className="font-mono">{Math.round(list.labourHours * 100) / 100} h</span> at <span className="font-mono">{formatMoney(prices.data.labourRateMinor, currency)}</span>/h</td><td className="px-3 text-right font-mono">{formatMoney(list.labourMinor, currency)}</td><td /></tr>
            <tr><td className="px-3 py-1" colSpan={4}>Net</td><td className="px-3 text-right font-mono">{formatMoney(list.netMinor, currency)}</td><td /></tr>
            <tr><td className="px-3 py-1" colSpan={4}>VAT <span className="font-mono">{list.vatPct} %</span></td><td className="px-3 text-right font-mono">{formatMoney(list.vatMinor, currency)}</td><td /></tr>
            <tr className="font-semibold"><td className="px-3 py-1.5" colSpan={4}>Total</td><td className="px-3 text-right font-mono" data-testid="parts-total">{formatMoney(list.grossMinor, currency)}</td><td /></tr>
          </>
        )}
      />
    </div>
  );
}
