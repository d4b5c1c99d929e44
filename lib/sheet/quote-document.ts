/**
 * The quote as a printed document: A4 portrait pages in the sheet's drawing model (primitives.ts),
 * rendered to PDF by the same renderer and faces as the plan sheet. It carries the workshop's
 * name and details, the client and layout, the revision it was priced from (and, when that was not
 * an approved revision, a line saying so), the date sent and the date it holds until, the priced
 * lines and totals, the deposit, the studio's terms, and the plan sheet's safety cautions.
 * Pure (data in, drawing out); its words come from lib/format, lib/layout/cautions and
 * lib/layout/drawing-issue. Must never read the database or a file.
 */
import { formatDate, formatMoney, quantityText } from '../format';
import { SHEET_CAUTIONS } from '../layout/cautions';
import type { PartsList } from '../planning/parts-list';
import { quoteRevisionWords } from '../planning/quote-words';
import { ColumnFlow } from './flow';
import { LINE, TYPE } from './drafting';
import type { SheetDocument, SheetItem, TextItem } from './primitives';
import { fit, lineHeight, printable, wrap } from './typography';

/** What a quote document shows: the quote's DTO (db/quotes.ts) satisfies it. */
export interface QuoteDocumentInput {
  reference: string;
  studioName: string;
  workshopDetails: string;
  clientName: string | null;
  layoutName: string;
  layoutVersion: number;
  revision: { letter: string; approved: boolean } | null;
  currency: string;
  parts: PartsList;
  grossMinor: number;
  depositPct: number;
  depositMinor: number;
  balanceMinor: number;
  note: string;
  sentAt: string;
  sentByName: string;
  validUntil: string | null;
  terms: string;
}

/** At most this many priced lines are printed; the totals always count every line (a quote is never cut short silently). */
export const QUOTE_LINE_LIMIT = 500;
/** Terms and notes longer than this are shortened on paper with a note (the settings cap them well below). */
const TEXT_LIMIT = 12_000;

const A4 = { width: 210, height: 297 } as const;
const MARGIN = 15;
const FOOTER = 8;

export function composeQuoteDocument(q: QuoteDocumentInput): SheetDocument {
  const area = { x: MARGIN, y: MARGIN, width: A4.width - 2 * MARGIN, height: A4.height - 2 * MARGIN - FOOTER };
  const pages: SheetItem[][] = [];
  const flow = new ColumnFlow(area, 1, () => {
    const items: SheetItem[] = [];
    pages.push(items);
    return items;
  }, 0);
  const w = area.width;
  const size = TYPE.caption;
  const lh = lineHeight(size);
  const text = (x: number, y: number, t: string, extra: Partial<TextItem> = {}): TextItem => ({ type: 'text', x, y, text: t, size, ...extra });

  /** A paragraph (line breaks kept), wrapped to the width. */
  const paragraph = (body: string, opts: { indent?: number; font?: TextItem['font']; ink?: TextItem['ink'] } = {}) => {
    const indent = opts.indent ?? 0;
    const capped = body.length > TEXT_LIMIT ? `${body.slice(0, TEXT_LIMIT)} … (shortened on paper; the full text is on the quote page)` : body;
    for (const para of capped.split(/\r?\n/)) {
      const lines = para.trim() ? wrap(para, size, w - indent, opts.font ?? 'sans') : [''];
      for (const l of lines) flow.place(lh, (x, y) => [text(x + indent, y + lh * 0.8, l, { font: opts.font, ink: opts.ink })]);
    }
  };
  const heading = (t: string) => {
    flow.gap(2);
    flow.place(lineHeight(TYPE.heading) + 1.5, (x, y) => [
      text(x, y + lineHeight(TYPE.heading) * 0.8, t, { size: TYPE.heading, font: 'sans-bold' }),
      { type: 'line', x1: x, y1: y + lineHeight(TYPE.heading) + 0.5, x2: x + w, y2: y + lineHeight(TYPE.heading) + 0.5, width: LINE.thin, ink: 'soft' },
    ], lh * 3);
  };

  // The workshop and the quote.
  const big = 14;
  flow.place(lineHeight(big) + 1, (x, y) => [
    text(x, y + lineHeight(big) * 0.8, fit(q.studioName, big, w * 0.6, 'sans-bold'), { size: big, font: 'sans-bold' }),
    text(x + w, y + lineHeight(big) * 0.8, `Quote ${q.reference}`, { size: big, font: 'sans-bold', align: 'right' }),
  ]);
  if (q.workshopDetails.trim()) paragraph(q.workshopDetails, { ink: 'soft' });
  flow.gap(3);
  const facts: [string, string][] = [
    ['For', q.clientName ?? '—'],
    ['Layout', q.layoutName],
    ['Revision', quoteRevisionWords(q.revision, q.layoutVersion).line],
    ['Sent', `${formatDate(q.sentAt)} by ${q.sentByName}`],
    ['Valid until', q.validUntil ? formatDate(q.validUntil) : 'not stated'],
  ];
  for (const [k, v] of facts) {
    flow.place(lh, (x, y) => [text(x, y + lh * 0.8, k, { ink: 'soft' }), text(x + 28, y + lh * 0.8, fit(v, size, w - 28), { font: k === 'Revision' || k === 'Valid until' ? 'sans-bold' : 'sans' })]);
  }
  const unapproved = quoteRevisionWords(q.revision, q.layoutVersion).unapproved;
  if (unapproved) {
    flow.gap(1.5);
    paragraph(`! ${unapproved}`, { font: 'sans-bold', ink: 'ochre' });
  }
  if (q.note.trim()) {
    flow.gap(2);
    paragraph(q.note, { indent: 3 });
  }

  // The priced lines.
  heading('Priced lines');
  const money = (n: number | null) => formatMoney(n, q.currency);
  const cols = { qty: w * 0.62, unit: w * 0.8, net: w };
  const row = (cells: [string, string, string, string], font: TextItem['font'] = 'sans') => (x: number, y: number): SheetItem[] => [
    text(x, y + lh * 0.8, fit(cells[0], size, cols.qty - 22, font), { font }),
    text(x + cols.qty, y + lh * 0.8, cells[1], { align: 'right', font: font === 'sans' ? 'mono' : font }),
    text(x + cols.unit, y + lh * 0.8, cells[2], { align: 'right', font: font === 'sans' ? 'mono' : font }),
    text(x + cols.net, y + lh * 0.8, cells[3], { align: 'right', font: font === 'sans' ? 'mono' : font }),
  ];
  const shown = q.parts.lines.slice(0, QUOTE_LINE_LIMIT);
  flow.withHeader(lh + 1, (x, y) => [...row(['Item', 'Qty', 'Unit price', 'Net'], 'sans-bold')(x, y), { type: 'line', x1: x, y1: y + lh + 0.4, x2: x + w, y2: y + lh + 0.4, width: LINE.hair, ink: 'faint' }], () => {
    for (const l of shown) flow.place(lh, row([l.description, quantityText(l.qty, l.unit), money(l.unitPriceMinor), money(l.netMinor)]));
  });
  if (q.parts.lines.length > shown.length) paragraph(`… and ${q.parts.lines.length - shown.length} more lines, counted in the totals below (the full list is on the quote page).`, { ink: 'soft' });
  flow.place(1.5, (x, y) => [{ type: 'line', x1: x, y1: y + 0.7, x2: x + w, y2: y + 0.7, width: LINE.medium }]);
  const total = (label: string, amount: string, font: TextItem['font'] = 'sans') => flow.place(lh, (x, y) => [
    text(x, y + lh * 0.8, label, { font }),
    text(x + w, y + lh * 0.8, amount, { align: 'right', font: font === 'sans' ? 'mono' : font }),
  ]);
  total('Materials', money(q.parts.materialsMinor));
  total(`Workshop labour, ${Math.round(q.parts.labourHours * 100) / 100} h`, money(q.parts.labourMinor));
  total(`VAT ${q.parts.vatPct} %`, money(q.parts.vatMinor));
  total('Total', money(q.grossMinor), 'sans-bold');
  flow.gap(2);
  total(`Deposit (${q.depositPct} %)`, money(q.depositMinor), 'sans-bold');
  total('Left to pay after it', money(q.balanceMinor));

  // Terms and cautions.
  if (q.terms.trim()) {
    heading('Terms');
    paragraph(q.terms);
  }
  heading('Safety cautions');
  for (const c of SHEET_CAUTIONS) {
    flow.place(lh, (x, y) => [text(x, y + lh * 0.8, c.topic, { font: 'sans-bold' })], lh);
    paragraph(c.text, { indent: 3 });
  }

  // A footer on every page: the reference and "page n of m".
  const title = printable(`Quote ${q.reference} · ${q.layoutName}`);
  return {
    title,
    pages: pages.map((items, i) => ({
      width: A4.width,
      height: A4.height,
      items: [
        ...items,
        { type: 'line', x1: MARGIN, y1: A4.height - MARGIN - 4, x2: A4.width - MARGIN, y2: A4.height - MARGIN - 4, width: LINE.hair, ink: 'faint' },
        text(MARGIN, A4.height - MARGIN, fit(title, TYPE.small, area.width - 30), { size: TYPE.small, ink: 'soft' }),
        text(A4.width - MARGIN, A4.height - MARGIN, `Page ${i + 1} of ${pages.length}`, { size: TYPE.small, ink: 'soft', align: 'right' }),
      ],
    })),
  };
}

