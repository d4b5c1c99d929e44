/**
 * The safety cautions every plan sheet carries, whatever the layout holds: gas, 230 V, heating,
 * seats and belts, weight limits. They defer to local codes and licensed practice; the
 * standards named are the usual European ones, cited from memory (check the edition in force
 * where the van is registered). Pure text and its flow onto the sheet.
 */
import type { ColumnFlow } from './flow';
import { TYPE } from './drafting';
import type { SheetItem } from './primitives';
import { lineHeight, wrap } from './typography';

export interface Caution {
  topic: string;
  text: string;
}

export const SAFETY_CAUTIONS: Caution[] = [
  {
    topic: 'Gas',
    text: 'LPG installations must be designed, fitted, leak-tested and certified by a competent gas engineer to local rules (in Europe, EN 1949 for habitation vehicles — from memory). Keep cylinders in a sealed, floor-vented locker, fit low-level and high-level ventilation, and a gas alarm.',
  },
  {
    topic: '230 V',
    text: 'Mains (230 V) wiring, shore hook-up, inverters and their protection must be installed and tested by a qualified electrician to local wiring rules (IEC 60364-7-721 for caravans and motor caravans — from memory). Fuse every 12 V circuit at its source and size cables for their current and length.',
  },
  {
    topic: 'Heating',
    text: 'Fuel-burning heaters and cookers need combustion air and an exhaust led outside as their maker specifies; fit a carbon-monoxide alarm and a smoke alarm. Install heaters to the maker\'s instructions and local rules.',
  },
  {
    topic: 'Seats and belts',
    text: 'Seats used while driving must be type-approved with belts and anchorages tested as local vehicle rules require (UN ECE R14, R16 and R17 — from memory). No one may travel on a bed, a bench without approved belts, or a lounge seat.',
  },
  {
    topic: 'Weight limits',
    text: 'Weigh the finished van, full of water, gas, people and kit, on a weighbridge: it must stay within its plated gross vehicle weight and both axle loads. The masses on this sheet are planning figures, not measurements.',
  },
  {
    topic: 'This sheet',
    text: 'A planning drawing, not a certificate. Local codes and licensed practice decide; measure the van itself before cutting anything.',
  },
];

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
