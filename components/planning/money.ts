/**
 * Money in the planning screens: integer minor units (pence, cents) in the data, shown with the
 * currency sign, typed as `12.50`, `£12.50` or `12,50`. Pure TypeScript. Must never turn text
 * that is not an amount into zero.
 */
import { formatAmount } from '@/lib/format';

export { formatMoney } from '@/lib/format';

/** Minor units from `12.50`, `£12.50`, `€ 12,50`, `1,250.00`; null when it is not an amount. */
export function parseMoneyMinor(text: string): number | null {
  let s = text.trim().replace(/^[£€$]\s*/, '').replace(/\s*(GBP|EUR|USD)$/i, '');
  if (/^\d{1,3}(,\d{3})+(\.\d{1,2})?$/.test(s)) s = s.replace(/,/g, '');
  else s = s.replace(',', '.');
  if (!/^\d+(\.\d{1,2})?$/.test(s)) return null;
  const [whole, frac = ''] = s.split('.');
  return Number(whole) * 100 + Number(frac.padEnd(2, '0'));
}

export function moneyText(minor: number | undefined): string {
  return minor === undefined ? '' : formatAmount(minor);
}

export { quantityText } from '@/lib/format';
