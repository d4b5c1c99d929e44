/**
 * The parts list as CSV (RFC 4180: comma separated, CRLF line ends, fields quoted when they hold a
 * comma, quote or line break). Cells that a spreadsheet would read as a formula (starting with
 * = + - @ or a tab) are prefixed with an apostrophe so an opened file never runs one (the usual
 * CSV-injection guard). Amounts are written in major units with two decimals.
 *
 * Pure text. Must never import UI, framework or database code.
 */
import type { PartsList } from './parts-list';
import { formatAmount } from '../format';

function cell(value: string | number | null): string {
  let s = value === null ? '' : String(value);
  if (/^[=+\-@\t\r]/.test(s) && typeof value === 'string') s = `'${s}`;
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

function money(minor: number | null): string {
  return minor === null ? '' : formatAmount(minor);
}

export function partsListCsv(list: PartsList): string {
  const rows: (string | number | null)[][] = [['Item', 'Category', 'Quantity', 'Unit', `Unit price (${list.currency}, net)`, `Net (${list.currency})`, 'Labour hours']];
  for (const l of list.lines) rows.push([l.description, l.category, l.qty, l.unit, money(l.unitPriceMinor), money(l.netMinor), l.labourHours]);
  rows.push(['Materials', '', '', '', '', money(list.materialsMinor), '']);
  rows.push(['Labour', '', list.labourHours, 'h', '', money(list.labourMinor), '']);
  rows.push([`VAT ${list.vatPct} %`, '', '', '', '', money(list.vatMinor), '']);
  rows.push(['Total', '', '', '', '', money(list.grossMinor), '']);
  return rows.map((r) => r.map(cell).join(',')).join('\r\n') + '\r\n';
}
