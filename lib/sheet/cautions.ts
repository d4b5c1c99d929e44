/**
 * The safety cautions every plan sheet carries, whatever the layout holds: gas, 230 V, heating,
 * seats and belts, weight limits, deferring to local codes and licensed practice. Their words
 * live with every other caution in lib/layout/cautions; this file flows them onto the sheet.
 */
import { SHEET_CAUTIONS } from '../layout/cautions';
import type { ColumnFlow } from './flow';
import { TYPE } from './drafting';
import type { SheetItem } from './primitives';
import { lineHeight, wrap } from './typography';

export type Caution = (typeof SHEET_CAUTIONS)[number];

/** The sheet's cautions (their words live in lib/layout/cautions). */
export const SAFETY_CAUTIONS: Caution[] = SHEET_CAUTIONS;

export function flowCautions(flow: ColumnFlow): void {
  const size = TYPE.label;
  const lh = lineHeight(size);
  flow.place(8, (x, y) => [{ type: 'text', x, y: y + 5, text: 'Safety cautions', size: TYPE.heading, font: 'sans-bold' }], lh * 4);
  for (const c of SAFETY_CAUTIONS) {
    const lines = wrap(c.text, size, flow.columnWidth - 3);
    flow.place(lh * (lines.length + 1) + 1.6, (x, y) => {
      const items: SheetItem[] = [{ type: 'text', x, y: y + lh, text: c.topic, size, font: 'sans-bold' }];
      lines.forEach((t, i) => items.push({ type: 'text', x: x + 3, y: y + lh * (i + 2), text: t, size }));
      return items;
    });
  }
}
