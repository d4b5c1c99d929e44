'use client';
/**
 * "Pay deposit": asks the server to open the hosted checkout for this quote's deposit, then
 * sends the browser there. The card step happens on the payment service's page (locally, the
 * test checkout); this button never sees card data. Errors are said in words, never swallowed.
 */
import { useState } from 'react';
import { CreditCard } from 'lucide-react';
import { toast } from '@/components/ui/toast';
import { apiFetch } from '@/lib/api/client-fetch';
import { formatMoney } from '../money';

export function PayDepositButton({ layoutId, depositMinor, currency }: { layoutId: string; depositMinor: number; currency: string }) {
  const [busy, setBusy] = useState(false);
  const pay = async () => {
    setBusy(true);
    try {
      const { url } = await apiFetch<{ url: string }>(`/api/layouts/${encodeURIComponent(layoutId)}/quote/checkout`, { method: 'POST' });
      const target = new URL(url);
      if (target.protocol !== 'https:' && target.protocol !== 'http:') throw new Error('The payment service sent an address we will not open.');
      window.location.assign(target.toString());
    } catch (err) {
      toast.error(err instanceof Error ? err.message : 'Could not open the checkout.');
      setBusy(false);
    }
  };
  return (
    <button type="button" className="btn-primary px-5 py-2 text-base" onClick={pay} disabled={busy}>
      <CreditCard size={16} aria-hidden="true" />
      {busy ? 'Opening the checkout…' : `Pay deposit ${formatMoney(depositMinor, currency)}`}
    </button>
  );
}
