/**
 * The module schedule: one row per module, numbered as on the plans — kind, label, size
 * (length × width × height), position, elevation above the finished floor, where it is mounted
 * (inside the body, under the floor, on the roof, behind the rear doors), mass and the
 * arrangements it exists in — flowed across pages with the header repeated, at most
 * SCHEDULE_MAX_ROWS rows. Pure.
 */
import { kindSpec } from '../layout/kinds';
import { formatLength } from '../layout/units';
import { mountOf } from '../layout/bay';
import type { LayoutDoc, LengthUnit, Module } from '../layout';
import type { ColumnFlow } from './flow';
import { LINE, TYPE } from './drafting';
import type { SheetItem } from './primitives';
import { fit, lineHeight } from './typography';

interface Column {
  title: string;
  /** Share of the table width (the label column takes what is left). */
  width: number;
  cell: (m: Module, n: number) => string;
  font?: 'mono' | 'sans';
  align?: 'left' | 'right';
}

export function scheduleColumns(units: LengthUnit): Column[] {
  const len = (v: number) => formatLength(v, units);
  const bare = (v: number) => formatLength(v, units).replace(/ (mm|cm|in)$/, '');
  return [
    { title: 'No.', width: 9, cell: (_m, n) => String(n), align: 'right' },
    { title: 'Kind', width: 32, cell: (m) => kindSpec(m.kind).title },
    { title: 'Label', width: 0, cell: (m) => m.label ?? '' },
    { title: `Size L × W × H (${units})`, width: 48, cell: (m) => `${bare(m.length)} × ${bare(m.width)} × ${bare(m.height)}`, font: 'mono' },
    { title: `Position x, y (${units})`, width: 36, cell: (m) => `${bare(m.x)}, ${bare(m.y)}`, font: 'mono' },
    { title: 'Elevation', width: 22, cell: (m) => len(m.elevation), font: 'mono', align: 'right' },
    { title: 'Mounted', width: 20, cell: (m) => MOUNTED_CELL[mountOf(m)] },
    { title: 'Mass', width: 18, cell: (m) => `${kgOf(m)} kg`, font: 'mono', align: 'right' },
    { title: 'Arrangements', width: 40, cell: (m) => m.arrangements.join(', ') },
  ];
}

/** The Mounted column's words: the glossary's "mounted" places, short enough for the column. */
export const MOUNTED_CELL = { inside: 'inside', 'under-floor': 'under floor', roof: 'on roof', rear: 'behind' } as const;

/** The narrowest width the schedule is printed at: its fixed columns and 40 mm for the label, mm. */
export const SCHEDULE_MIN_WIDTH = scheduleColumns('mm').reduce((sum, c) => sum + c.width, 0) + 40;

/** The module's own mass, or its kind's typical mass (marked with ~). */
function kgOf(m: Module): string {
  if (m.massKg !== undefined) return trim(m.massKg);
  return `~${trim(kindSpec(m.kind).massKg)}`;
}
function trim(n: number): string {
  return Number.isInteger(n) ? String(n) : n.toFixed(1);
}

const ROW = lineHeight(TYPE.label) + 1.2;

/**
 * Rows the printed schedule lists (common practice, no source: a van has tens of modules; a few
 * hundred rows is already a dozen pages). Beyond it one line says how many more there are, so a
 * layout of thousands of modules cannot make a sheet of a hundred pages.
 */
export const SCHEDULE_MAX_ROWS = 300;

export function flowSchedule(flow: ColumnFlow, doc: LayoutDoc, units: LengthUnit): void {
  const cols = scheduleColumns(units);
  const total = doc.modules.reduce((sum, m) => sum + (m.massKg ?? kindSpec(m.kind).massKg), 0);
  const header = (x: number, y: number, width: number): SheetItem[] => {
    const xs = positions(cols, x, width);
    const items: SheetItem[] = [{ type: 'rect', x, y, w: width, h: ROW, fill: 'paper' }];
    cols.forEach((c, i) => items.push(cellText(c.title, xs[i], xs[i + 1], y + ROW - 1.6, 'sans-bold', c.align)));
    items.push({ type: 'line', x1: x, y1: y + ROW, x2: x + width, y2: y + ROW, width: LINE.thin, ink: 'ink' });
    return items;
  };
  flow.place(8, (x, y) => [{ type: 'text', x, y: y + 5, text: 'Module schedule', size: TYPE.heading, font: 'sans-bold' }], ROW * 3);
  if (doc.modules.length === 0) {
    flow.place(ROW, (x, y) => [{ type: 'text', x, y: y + ROW - 1.6, text: 'No modules placed yet.', size: TYPE.label, ink: 'soft' }]);
    return;
  }
  const listed = doc.modules.slice(0, SCHEDULE_MAX_ROWS);
  flow.withHeader(ROW, header, () => {
    listed.forEach((m, i) => {
      flow.place(ROW, (x, y, width) => {
        const xs = positions(cols, x, width);
        const items: SheetItem[] = cols.map((c, j) => cellText(c.cell(m, i + 1), xs[j], xs[j + 1], y + ROW - 1.6, c.font ?? 'sans', c.align));
        items.push({ type: 'line', x1: x, y1: y + ROW, x2: x + width, y2: y + ROW, width: LINE.hair, ink: 'faint' });
        return items;
      });
    });
  });
  if (listed.length < doc.modules.length) {
    flow.place(ROW, (x, y) => [{ type: 'text', x, y: y + ROW - 1.6, text: `… and ${doc.modules.length - listed.length} more modules, not listed here (the first ${listed.length} are).`, size: TYPE.label, ink: 'soft' }]);
  }
  flow.place(ROW + 1, (x, y, width) => [
    { type: 'line', x1: x, y1: y + 0.3, x2: x + width, y2: y + 0.3, width: LINE.thin, ink: 'ink' },
    { type: 'text', x, y: y + ROW, text: `${doc.modules.length} modules · ${trim(total)} kg as listed (~ = the kind's typical mass; weigh the finished build).`, size: TYPE.small, ink: 'soft' },
  ]);
}

function positions(cols: Column[], x: number, width: number): number[] {
  const fixed = cols.reduce((s, c) => s + c.width, 0);
  const flexible = Math.max(20, width - fixed);
  const xs = [x];
  for (const c of cols) xs.push(xs[xs.length - 1] + (c.width || flexible));
  return xs;
}

function cellText(text: string, x0: number, x1: number, baseline: number, font: 'mono' | 'sans' | 'sans-bold', align: 'left' | 'right' = 'left'): SheetItem {
  const pad = 1.2;
  const size = TYPE.label;
  const t = fit(text, size, x1 - x0 - 2 * pad, font);
  return { type: 'text', x: align === 'right' ? x1 - pad : x0 + pad, y: baseline, text: t, size, font, align };
}
