// Running dimensions and key clearances on the plan sheet's plans: stations from the front along
// each wall, figures stacked greedily without collisions, the bed length and walkway width as the
// check report measured them. Expected values worked by hand from the starter layout's numbers.
import { describe, expect, it } from 'vitest';
import { composeSheet, type SheetRequest } from '@/lib/sheet';
import { placeFigures, RUN_ROWS, stations, wallOf } from '@/lib/sheet/running-dimensions';
import { starterLayout } from '@/lib/layout';
import type { CheckReport } from '@/lib/checks/types';
import type { LineItem, SheetItem, TextItem } from '@/lib/sheet/primitives';

const doc = starterLayout('starter-l-lounge')!; // bay 3100 × 1800 mm
const details = { studio: 'Saltmarsh Van Works', client: 'Priya Nair', layout: 'Nair — L2H2 weekender', revision: 'B', date: '2025-12-02' };

function sheet(report: CheckReport | null, over: Partial<SheetRequest> = {}) {
  const r = composeSheet({ doc, report, paper: 'a3', scale: 20, units: 'mm', details, ...over });
  if (!r.ok) throw new Error(r.message);
  // The drawing pages (on A3 the demo lounge's plans and section take two: its section reaches down to the road).
  return r.sheet.pages.slice(0, r.figurePages).flatMap((p) => p.items);
}
const lines = (items: SheetItem[], prefix: string) => items.filter((i): i is LineItem => i.type === 'line' && (i.tag ?? '').startsWith(prefix));
const texts = (items: SheetItem[]) => items.filter((i): i is TextItem => i.type === 'text').map((t) => t.text);

describe('stations and walls', () => {
  it('takes the front and each module end once, in order, inside the bay', () => {
    expect(stations([{ x: 450, length: 450 }, { x: 0, length: 450 }, { x: 2900, length: 400 }], 3100)).toEqual([0, 450, 900, 2900]);
  });

  it('dimensions a module along the wall its middle is nearer', () => {
    expect(wallOf({ y: 36, width: 500 }, 1800)).toBe('left'); // middle at 286 mm
    expect(wallOf({ y: 730, width: 500 }, 1800)).toBe('right'); // middle at 980 mm, past 900
  });
});

describe('greedy rows of figures', () => {
  const f = (at: number) => ({ station: at, at, text: String(at), width: 4 });
  it('keeps a figure in the first row it clears (0.8 mm apart), moves a crowded one out, leaves off what finds no room', () => {
    // Centres 10, 12, 14, 20 mm, 4 mm wide: 10 → row 0 (8–12); 12 → row 1 (10–14); 14 → row 0 would start
    // at 12 < 12 + 0.8, row 1 at 12 < 14 + 0.8: no room with two rows; 20 → row 0 (18–22).
    const { placed, leftOff } = placeFigures([f(10), f(12), f(14), f(20)]);
    expect(RUN_ROWS).toBe(2);
    expect(placed.map((p) => [p.station, p.row])).toEqual([[10, 0], [12, 1], [20, 0]]);
    expect(leftOff).toBe(1);
    // No two figures in a row overlap.
    for (const row of [0, 1]) {
      const inRow = placed.filter((p) => p.row === row);
      for (let i = 1; i < inRow.length; i++) expect(inRow[i].x0).toBeGreaterThanOrEqual(inRow[i - 1].x1 + 0.8);
    }
  });
});

describe('running dimensions on the plans', () => {
  const items = sheet(null);
  it('runs the left wall of the travel plan through every station from the front, 1:20', () => {
    // Travel, left wall: sink 0–450, fridge 450–900, worktop 450–1100, hob 550–1000, locker 0–1100,
    // fresh-water tank 1150–1650, heater 2000–2400, side bench 1100–3100 (a seat in travel) →
    // stations 0, 450, 550, 900, 1000, 1100, 1150, 1650, 2000, 2400, 3100.
    const runs = lines(items, 'dimension:running-left:travel:');
    expect(runs.map((l) => Number(l.tag!.split(':').pop()))).toEqual([450, 550, 900, 1000, 1100, 1150, 1650, 2000, 2400, 3100]);
    // Together they are 3100 / 20 = 155 mm of paper, from the front.
    const total = runs.reduce((n, l) => n + Math.abs(l.x2 - l.x1), 0);
    expect(total).toBeCloseTo(155, 6);
    // The right wall: the rear bench 2550–3100 (its middle is right of the centre line) and the
    // electrics bay 2650–3050; the grey tank hangs under the floor and is no station:
    // 2550 / 20 = 127.5, 100 / 20 = 5, 400 / 20 = 20, 50 / 20 = 2.5 mm.
    expect(lines(items, 'dimension:running-right:travel:').map((l) => Math.abs(l.x2 - l.x1))).toEqual([127.5, 5, 20, 2.5]);
  });
});

describe('key clearances from the check report', () => {
  const report: CheckReport = {
    ok: true,
    findings: [
      { id: 'sleep.length', status: 'pass', arrangement: 'sleep', moduleIds: [doc.modules[5].id, doc.modules[7].id], measured: 1950, required: 1900, unit: 'mm', message: 'Bed', source: 'x' },
      { id: 'walkway.width', status: 'pass', arrangement: 'lounge', measured: 640, required: 600, unit: 'mm', message: 'Walkway', source: 'x' },
    ],
  };
  const items = sheet(report);
  it('draws the bed length of the sleeping place as measured: 1950 mm → 97.5 mm at 1:20', () => {
    const [bed] = lines(items, 'clearance:bed-length:sleep:');
    expect(bed).toBeDefined();
    expect(Math.hypot(bed.x2 - bed.x1, bed.y2 - bed.y1)).toBeCloseTo(97.5, 6);
    expect(texts(items)).toContain('bed 1950 mm');
    expect(lines(items, 'clearance:bed-length:travel')).toHaveLength(0);
  });

  it('writes the walkway width under its own arrangement only, with what is comfortable', () => {
    expect(texts(items)).toContain('Clear walkway 640 mm (comfortable 600 mm), as checked');
    expect(texts(items).filter((t) => t.startsWith('Clear walkway'))).toHaveLength(1);
  });
});
