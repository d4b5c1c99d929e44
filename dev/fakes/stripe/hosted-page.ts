/**
 * The fake payment API's hosted checkout page: a plain HTML page with the amount, the items, a
 * "Pay" button and a link back. It states plainly that it is a test page and no money moves.
 *
 * Part of the local fake payment API only; asks for no card data and must never imitate a real
 * payment provider's page.
 */
import type { StoredSession } from './checkout-sessions';
import { formatMoney as formatAmount } from '../../../lib/format';

export function escapeHtml(s: string): string {
  return s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
}


export function checkoutPage(stored: StoredSession): string {
  const s = stored.session;
  const rows = stored.lineItems
    .map((l) => `<tr><td>${escapeHtml(l.name)}${l.description ? `<br><small>${escapeHtml(l.description)}</small>` : ''}</td><td class="n">${l.quantity}</td><td class="n">${escapeHtml(formatAmount(l.unitAmount * l.quantity, l.currency))}</td></tr>`)
    .join('');
  const paid = s.payment_status === 'paid';
  return `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><title>Test checkout — ${escapeHtml(formatAmount(s.amount_total, s.currency))}</title>
<meta name="viewport" content="width=device-width, initial-scale=1">
<style>body{font:16px/1.5 system-ui,sans-serif;max-width:32rem;margin:3rem auto;padding:0 1rem;color:#1E2A2F;background:#F5F2EA}
table{width:100%;border-collapse:collapse}th,td{padding:.4rem .5rem;border-bottom:1px solid #ccc;text-align:left}.n{text-align:right;font-variant-numeric:tabular-nums}button{font:inherit;padding:.6rem 1.6rem;background:#A4522A;color:#fff;border:0;border-radius:4px;cursor:pointer}
.note{font-size:.85rem;border:1px dashed #A4522A;padding:.5rem}</style></head>
<body><main>
<p class="note">Test checkout on this machine: no real payment service is contacted and no money moves.</p>
<h1>Deposit: ${escapeHtml(formatAmount(s.amount_total, s.currency))}</h1>
${s.customer_email ? `<p>Receipt to ${escapeHtml(s.customer_email)}</p>` : ''}
<table><thead><tr><th>Item</th><th class="n">Qty</th><th class="n">Amount</th></tr></thead><tbody>${rows}</tbody></table>
${paid
    ? '<p role="status">This deposit has been paid.</p>'
    : `<form method="post" action="/checkout/${encodeURIComponent(s.id)}/pay"><p><button type="submit">Pay</button></p></form>
<p><a href="${escapeHtml(s.cancel_url)}">Cancel and go back</a></p>`}
</main></body></html>`;
}
