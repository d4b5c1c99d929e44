/**
 * The drawing-office marks of a revision on the plan sheet: the revision table (letter, date,
 * description, by — oldest first, up to the revision printed) flowed with the sheet's text, and
 * the revision clouds with their delta triangles drawn on each arrangement's plan round what
 * changed since the revision before. Pure: revisions and a diff in, sheet items out.
 */
import { boundingRect, deltaTriangle, revisionCloud, type Rect } from '../geometry';
import type { Arrangement } from '../layout';
import type { RevisionDiff } from '../layout/revision-diff';
import type { ColumnFlow } from './flow';
import { LINE, TYPE } from './drafting';
import type { SheetItem } from './primitives';
import { fit, lineHeight, wrap } from './typography';
import { inArrangement, moduleRect as rectOf } from '../layout/bay';

export interface RevisionRow {
  letter: string;
  /** YYYY-MM-DD */
  date: string;
  description: string;
  by: string | null;
}

/** What the sheet's plans mark: the changes of `letter` against the revision before it. */
export interface RevisionChanges {
  letter: string;
  diff: RevisionDiff;
}

const ROW = lineHeight(TYPE.label) + 1.2;

export function flowRevisionTable(flow: ColumnFlow, rows: RevisionRow[]): void {
  if (!rows.length) return;
  const size = TYPE.label;
  const lh = lineHeight(size);
  const cols = (x: number, width: number) => ({ rev: x, date: x + 9, desc: x + 29, by: x + width - 28, end: x + width });
  flow.place(8, (x, y) => [{ type: 'text', x, y: y + 5, text: 'Revisions', size: TYPE.heading, font: 'sans-bold' }], ROW * 3);
  const header = (x: number, y: number, width: number): SheetItem[] => {
    const c = cols(x, width);
    return [
      { type: 'rect', x, y, w: width, h: ROW, fill: 'paper' },
      { type: 'text', x: c.rev + 1, y: y + ROW - 1.6, text: 'Rev', size, font: 'sans-bold' },
      { type: 'text', x: c.date + 1, y: y + ROW - 1.6, text: 'Date', size, font: 'sans-bold' },
      { type: 'text', x: c.desc + 1, y: y + ROW - 1.6, text: 'Description', size, font: 'sans-bold' },
      { type: 'text', x: c.by + 1, y: y + ROW - 1.6, text: 'By', size, font: 'sans-bold' },
      { type: 'line', x1: x, y1: y + ROW, x2: x + width, y2: y + ROW, width: LINE.thin, ink: 'ink' },
    ];
  };
  flow.withHeader(ROW, header, () => {
    for (const r of rows) {
      const descWidth = flow.columnWidth - 29 - 28 - 2;
      const lines = wrap(r.description || 'Issued for approval', size, descWidth).slice(0, 4);
      const h = Math.max(ROW, lh * lines.length + 1.6);
      flow.place(h, (x, y, width) => {
        const c = cols(x, width);
        const items: SheetItem[] = [
          { type: 'text', x: c.rev + 1, y: y + lh, text: r.letter, size, font: 'mono' },
          { type: 'text', x: c.date + 1, y: y + lh, text: r.date, size, font: 'mono' },
          { type: 'text', x: c.by + 1, y: y + lh, text: fit(r.by ?? '—', size, 26), size },
          { type: 'line', x1: x, y1: y + h, x2: x + width, y2: y + h, width: LINE.hair, ink: 'faint' },
        ];
        lines.forEach((t, i) => items.push({ type: 'text', x: c.desc + 1, y: y + lh * (i + 1), text: t, size }));
        return items;
      });
    }
  });
}

/** Bay-millimetre areas to cloud in one arrangement: added, removed and changed modules (old and new place together). */
export function cloudAreas(diff: RevisionDiff, arrangement: Arrangement): Rect[] {
  const out: Rect[] = [];
  for (const m of diff.added) if (inArrangement(m, arrangement)) out.push(rectOf(m));
  for (const m of diff.removed) if (inArrangement(m, arrangement)) out.push(rectOf(m));
  for (const c of diff.changed) {
    const here = inArrangement(c.after, arrangement);
    const there = inArrangement(c.before, arrangement);
    if (here && there) out.push(boundingRect([rectOf(c.before), rectOf(c.after)])!);
    else if (here || there) out.push(rectOf(here ? c.after : c.before));
  }
  return out;
}

/**
 * Clouds and delta triangles on one plan. `toPaper` turns bay millimetres into sheet millimetres;
 * sizes are in sheet millimetres so the marks read the same at 1:10 and 1:25.
 */
export function drawRevisionClouds(areas: Rect[], letter: string, toPaper: (x: number, y: number) => [number, number]): SheetItem[] {
  const items: SheetItem[] = [];
  const tri = 4.2;
  for (const a of areas) {
    const [x0, y0] = toPaper(a.x0, a.y0);
    const [x1, y1] = toPaper(a.x1, a.y1);
    const cloud = revisionCloud({ x0, y0, x1, y1 }, { margin: 1.2, arc: 4, bulge: 0.28, samples: 6 });
    items.push({ type: 'polygon', points: cloud, stroke: 'copper', width: LINE.medium });
    const right = Math.max(...cloud.map((p) => p[0]));
    const top = Math.min(...cloud.map((p) => p[1]));
    const cx = right + tri * 0.15;
    const cy = top + tri * 0.2;
    items.push({ type: 'polygon', points: deltaTriangle(cx, cy, tri), stroke: 'copper', fill: 'white', width: LINE.thin });
    items.push({ type: 'text', x: cx, y: cy + 1.1, text: letter, size: letter.length > 1 ? 4.5 : 6, font: 'mono', ink: 'copper', align: 'center' });
  }
  return items;
}
