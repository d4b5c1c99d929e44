/**
 * The title block along the foot of every page, our own layout: the Baywright mark and studio;
 * layout and client; revision (its letter and where it stands, else "Preliminary") and date; the scale with a
 * scale bar; units, paper and sheet number. Pure: details in, sheet items out.
 */
import { ISSUE_STATE_WORD, issueWords, PRELIMINARY_WORD, type LayoutState } from '../layout/drawing-issue';
import { LINE, scaleBar } from './drafting';
import { PAPER_MM, type Paper } from './paper';
import type { SheetItem } from './primitives';
import { fit } from './typography';

export interface TitleDetails {
  studio: string;
  client: string | null;
  layout: string;
  /** Revision letter (A, B, … AA) of an issued revision; absent for the layout as it stands (preliminary). */
  revision?: string | null;
  /** Where that revision stands: issued for approval, approved, returned for changes. */
  issueState?: LayoutState | null;
  /** The date the sheet was made, as YYYY-MM-DD. */
  date: string;
  units: string;
}

export const REVISION_LETTER = /^[A-Z]{1,3}$/;

export function revisionWords(revision?: string | null, state?: LayoutState | null): string {
  return issueWords(revision, state);
}

/** A scale bar that fits the title block: 1 m, or 500 mm at 1:10. */
export function scaleBarLength(scale: number): number {
  return scale <= 10 ? 500 : 1000;
}

export function drawTitleBlock(
  box: { x: number; y: number; width: number; height: number },
  details: TitleDetails,
  sheet: { paper: Paper; scale: number; page: number; pages: number },
): SheetItem[] {
  const items: SheetItem[] = [{ type: 'rect', x: box.x, y: box.y, w: box.width, h: box.height, stroke: 'ink', width: LINE.medium, fill: 'white' }];
  const fixed = [52, 74, 40, 38];
  const widths = [...fixed, box.width - fixed.reduce((a, b) => a + b, 0)];
  const xs = widths.reduce<number[]>((acc, w, i) => [...acc, (acc[i] ?? box.x) + w], [box.x]);
  for (let i = 1; i < widths.length; i++) items.push({ type: 'line', x1: xs[i], y1: box.y, x2: xs[i], y2: box.y + box.height, width: LINE.thin, ink: 'ink' });
  const mid = box.y + box.height / 2;
  for (let i = 1; i < 4; i++) items.push({ type: 'line', x1: xs[i], y1: mid, x2: xs[i + 1], y2: mid, width: LINE.hair, ink: 'soft' });

  const field = (cell: number, row: 0 | 1, label: string, value: string, bold = false) => {
    const x = xs[cell] + 2;
    const y = box.y + row * (box.height / 2);
    const w = widths[cell] - 4;
    items.push({ type: 'text', x, y: y + 3.6, text: label, size: 5, ink: 'soft' });
    items.push({ type: 'text', x, y: y + 9, text: fit(value, 8, w, bold ? 'sans-bold' : 'sans'), size: 8, font: bold ? 'sans-bold' : 'sans' });
  };

  // Cell 0: the mark and the studio.
  items.push({ type: 'rect', x: xs[0] + 2, y: box.y + 2.5, w: 3.2, h: 3.2, fill: 'copper' });
  items.push({ type: 'text', x: xs[0] + 6.6, y: box.y + 5.4, text: 'BAYWRIGHT', size: 7, font: 'sans-bold', ink: 'copper' });
  items.push({ type: 'text', x: xs[0] + 2, y: box.y + 11.5, text: 'Studio', size: 5, ink: 'soft' });
  items.push({ type: 'text', x: xs[0] + 2, y: box.y + 16.5, text: fit(details.studio, 8.5, widths[0] - 4, 'sans-bold'), size: 8.5, font: 'sans-bold' });
  items.push({ type: 'text', x: xs[0] + 2, y: box.y + box.height - 2, text: 'Plan sheet: check every dimension on the van', size: 4.5, ink: 'soft' });

  field(1, 0, 'Layout', details.layout, true);
  field(1, 1, 'Client', details.client ?? 'No client named');
  field(2, 0, details.revision && details.issueState ? `Revision · ${ISSUE_STATE_WORD[details.issueState]}` : 'Revision', details.revision ? details.revision : PRELIMINARY_WORD, Boolean(details.revision));
  field(2, 1, 'Date', details.date);
  field(3, 0, 'Units', details.units);
  field(3, 1, 'Sheet', `${sheet.page} of ${sheet.pages} · ${PAPER_MM[sheet.paper].label}`);

  // Cell 4: scale and bar.
  const sx = xs[4] + 2;
  items.push({ type: 'text', x: sx, y: box.y + 3.6, text: 'Scale', size: 5, ink: 'soft' });
  items.push({ type: 'text', x: sx, y: box.y + 9.5, text: `1:${sheet.scale}`, size: 11, font: 'sans-bold' });
  items.push({ type: 'text', x: sx + 16, y: box.y + 9.2, text: `true when printed at 100 % on ${PAPER_MM[sheet.paper].label} landscape`, size: 5.5, ink: 'soft' });
  items.push(...scaleBar(sx, box.y + 13.5, sheet.scale, scaleBarLength(sheet.scale), 100));
  return items;
}
