/**
 * The mass-and-balance table on the plan sheet: the same rows as the weight tab (per axle, each
 * group of masses, laden total, the plate's limits and the payload left) from `massBalance`
 * (lib/planning), with the centre of mass. Pure: flows text and lines onto the sheet.
 */
import type { LayoutDoc } from '../layout';
import { massBalance, type MassBalanceRow } from '../planning/mass-balance';
import { LINE, TYPE } from './drafting';
import type { ColumnFlow } from './flow';
import type { FontFace, SheetItem } from './primitives';
import { fit, lineHeight } from './typography';
import { formatWhole } from '../format';

const ROW = lineHeight(TYPE.label) + 1.2;
const NUMBER_COL = 26;
/** The narrowest width the mass table is printed at: three number columns and 50 mm for the row's name, mm. */
export const MASS_TABLE_MIN_WIDTH = 3 * NUMBER_COL + 50;

const kg = (n: number | null) => (n === null ? '—' : formatWhole(n));

function cells(x: number, y: number, width: number, texts: string[], font: FontFace): SheetItem[] {
  const labelWidth = width - 3 * NUMBER_COL;
  const pad = 1.2;
  const items: SheetItem[] = [{ type: 'text', x: x + pad, y: y + ROW - 1.6, text: fit(texts[0], TYPE.label, labelWidth - 2 * pad, font === 'mono' ? 'sans' : font), size: TYPE.label, font: font === 'mono' ? 'sans' : font }];
  texts.slice(1).forEach((t, i) => {
    const right = x + labelWidth + NUMBER_COL * (i + 1) - pad;
    items.push({ type: 'text', x: right, y: y + ROW - 1.6, text: fit(t, TYPE.label, NUMBER_COL - 2 * pad, font), size: TYPE.label, font, align: 'right' });
  });
  return items;
}

export function flowMassBalance(flow: ColumnFlow, doc: LayoutDoc): void {
  const b = massBalance(doc);
  flow.place(8, (x, y) => [{ type: 'text', x, y: y + 5, text: 'Mass and balance', size: TYPE.heading, font: 'sans-bold' }], ROW * 3);
  const header = (x: number, y: number, width: number): SheetItem[] => [
    { type: 'rect', x, y, w: width, h: ROW, fill: 'paper' },
    ...cells(x, y, width, ['Mass', 'Front axle, kg', 'Rear axle, kg', 'Total, kg'], 'sans-bold'),
    { type: 'line', x1: x, y1: y + ROW, x2: x + width, y2: y + ROW, width: LINE.thin, ink: 'ink' },
  ];
  const line = (r: Omit<MassBalanceRow, 'kg'> & { kg: number | null }, font: FontFace, rule: number) => (x: number, y: number, width: number): SheetItem[] => [
    ...cells(x, y, width, [r.label, kg(r.frontKg), kg(r.rearKg), kg(r.kg)], font),
    { type: 'line', x1: x, y1: y + ROW, x2: x + width, y2: y + ROW, width: rule, ink: rule > LINE.hair ? 'ink' : 'faint' },
  ];
  flow.withHeader(ROW, header, () => {
    for (const r of b.rows) flow.place(ROW, line(r, 'mono', LINE.hair));
  });
  flow.place(ROW, line(b.total, 'sans-bold', LINE.thin));
  flow.place(ROW, line({ label: 'Limit (plate)', kg: b.limits.kg, frontKg: b.limits.frontKg, rearKg: b.limits.rearKg }, 'mono', LINE.hair));
  const left = (n: number | null) => (n === null ? '—' : n < 0 ? `${kg(-n)} over` : kg(n));
  flow.place(ROW, (x, y, width) => [
    ...cells(x, y, width, ['Payload left', left(b.left.frontKg), left(b.left.rearKg), left(b.left.kg)], 'mono'),
    { type: 'line', x1: x, y1: y + ROW, x2: x + width, y2: y + ROW, width: LINE.thin, ink: 'ink' },
  ]);
  const com = b.centreOfMass ? `Laden centre of mass ${formatWhole(b.centreOfMass.x)} mm behind the front of the load floor, ${formatWhole(b.centreOfMass.y)} mm from the left wall.` : 'The split between the axles needs the wheelbase, the front axle position and the mass in running order on the front axle.';
  flow.place(ROW + 1, (x, y) => [{ type: 'text', x, y: y + ROW, text: `${com} Lever rule; planning figures — weigh the finished van, axle by axle.`, size: TYPE.small, ink: 'soft' }]);
}
