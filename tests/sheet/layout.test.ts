// The plan sheet's one layout model (lib/sheet/sheet-layout.ts), for the demo lounge layout: blocks
// never overlap each other, stay inside the drawing area (so clear of the frame margins and the
// title block), drawings sit side by side where their widths fit the area's width, and the page
// count is what the sizes below work out to. All sizes are worked by hand from the paper and
// margin constants (ISO 216 sizes; 10 mm margin, 4 mm inset, 24 mm title block, 4 mm gap).
import { describe, expect, it } from 'vitest';
import { composeSheet, sheetPageSvg, type SheetRequest } from '@/lib/sheet';
import { starterLayout } from '@/lib/layout';
import type { CheckReport } from '@/lib/checks/types';
import type { PlacedBlock } from '@/lib/sheet/sheet-layout';

const lounge = starterLayout('starter-l-lounge')!; // bay 3100 × 1800 × 2000 mm, a grey tank hanging 200 mm under the floor
const details = { studio: 'Saltmarsh Van Works', client: 'Priya Nair', layout: 'Nair — L2H2 weekender', revision: 'B', date: '2025-12-02' };
const report: CheckReport = {
  ok: false,
  findings: [
    { id: 'sleep.length', status: 'fail', arrangement: 'sleep', measured: 1850, required: 1900, unit: 'mm', message: 'Bed 1850 mm long; needs 1900 mm for the tallest sleeper (1800 mm + 100 mm).', source: 'Common practice, no source' },
    { id: 'headroom.standing', status: 'pass', measured: 1910, required: 1800, unit: 'mm', message: 'Clear standing height 1910 mm ≥ 1800 mm.', source: 'Common practice, no source' },
  ],
};

function compose(over: Partial<SheetRequest>) {
  const r = composeSheet({ doc: lounge, report, paper: 'a4', scale: 20, units: 'mm', details, ...over });
  if (!r.ok) throw new Error(r.message);
  return r;
}

// Drawing areas by hand: x from 10 + 4 = 14 mm; width = paper width − 2 × 10 − 2 × 4;
// height = paper height − 2 × 10 − 24 (title block) − 4 (gap) − 4 (inset).
const AREA = {
  a3: { x: 14, y: 14, width: 420 - 20 - 8, height: 297 - 20 - 24 - 4 - 4 }, // 392 × 245; title block from y = 297 − 10 − 24 = 263
  a4: { x: 14, y: 14, width: 297 - 20 - 8, height: 210 - 20 - 24 - 4 - 4 }, // 269 × 158; title block from y = 210 − 10 − 24 = 176
};
const TITLE_TOP = { a3: 263, a4: 176 };

// Figure sizes at 1:20 by hand (plan margins 13 + 7 across; the section's 13 + 16 across, 6 + 10 down):
//   plan     13 + 3100/20 + 7 = 175 mm wide
//   section  13 + 3100/20 + 16 = 184 mm wide; 6 + (2000 + 550)/20 + 10 = 143.5 mm high
//            (the road line 550 mm below the load floor: the tank hangs under it)
//   left wall elevation  17 + 3100/20 + 7 = 179 mm wide (the level figures' band, 3 + 1.2 + 2 × 5.6 = 15.4 → 16, and 1 mm);
//            4 + (2000 + 250)/20 + 12 = 128.5 mm high (the fuel filler sits 250 mm below the bare floor on that wall)
//   right wall elevation 179 mm wide, 4 + 2000/20 + 12 = 116 mm high
//   rear wall and bulkhead elevations 17 + 1800/20 + 7 = 114 mm wide, 116 mm high
//   roof plan 17 + 3100/20 + 7 = 179 mm wide, 10 + 1800/20 + 8 = 108 mm high (the ordinate band above, 3 + 0.7 + 2 × 2.3 = 8.3 → 9, and 1 mm)
const PLAN_W = 175;
const SECTION_W = 184;
const SECTION_H = 143.5;
const ELEVATION_SIDE_W = 179;
const ELEVATION_END_W = 114;
const GAP = 6;

function overlaps(a: PlacedBlock, b: PlacedBlock): boolean {
  const e = 1e-6;
  return a.page === b.page && a.x < b.x + b.width - e && b.x < a.x + a.width - e && a.y < b.y + b.height - e && b.y < a.y + a.height - e;
}

function checkBlocks(paper: 'a3' | 'a4', blocks: PlacedBlock[]) {
  const area = AREA[paper];
  for (const b of blocks) {
    expect(b.x, b.what).toBeGreaterThanOrEqual(area.x - 1e-6);
    expect(b.y, b.what).toBeGreaterThanOrEqual(area.y - 1e-6);
    expect(b.x + b.width, b.what).toBeLessThanOrEqual(area.x + area.width + 1e-6);
    expect(b.y + b.height, b.what).toBeLessThanOrEqual(area.y + area.height + 1e-6);
    expect(b.y + b.height, b.what).toBeLessThan(TITLE_TOP[paper]);
  }
  for (let i = 0; i < blocks.length; i += 1) {
    for (let j = i + 1; j < blocks.length; j += 1) expect(overlaps(blocks[i], blocks[j]), `${blocks[i].what} on ${blocks[j].what}`).toBe(false);
  }
}

describe('A3 at 1:20', () => {
  const r = compose({ paper: 'a3' });
  const at = (what: string) => r.blocks.find((b) => b.what === what)!;

  it('never overlaps two blocks, and keeps every block inside the 392 × 245 mm drawing area, clear of the title block', () => {
    expect(r.blocks.filter((b) => b.what.startsWith('text:')).length).toBeGreaterThan(0);
    checkBlocks('a3', r.blocks);
  });

  it('sets a plan and the section side by side: 175 + 6 + 184 = 365 mm ≤ 392 mm', () => {
    expect(PLAN_W + GAP + SECTION_W).toBeLessThanOrEqual(AREA.a3.width);
    const sleep = at('plan:sleep');
    const section = at('section');
    expect(section.page).toBe(sleep.page);
    expect(section.y).toBe(sleep.y);
    expect(section.x).toBeCloseTo(sleep.x + PLAN_W + GAP, 6);
    expect(section.width).toBeCloseTo(SECTION_W, 6);
    expect(section.height).toBeCloseTo(SECTION_H, 6);
    // Two plans share the first row (175 + 6 + 175 = 356 ≤ 392; a third would need 537).
    expect(at('plan:lounge').page).toBe(at('plan:travel').page);
    expect(at('plan:lounge').x).toBeCloseTo(14 + PLAN_W + GAP, 6);
  });

  it('takes four pages of drawings and four in all, the schedule under the first row of plans', () => {
    // Rows: [travel, lounge] 118.9 mm high, [sleep, section] 143.5 mm: 118.9 + 6 + 143.5 = 268.4 > 245, so two pages;
    // then [left, right wall] 179 + 6 + 179 = 364 ≤ 392 wide, 128.5 high (page 3); [rear, bulkhead] 114 + 6 + 114 = 234
    // (a roof plan more would need 234 + 6 + 179 = 419 > 392), 116 high: 128.5 + 6 + 116 = 250.5 > 245, page 4;
    // [roof] 108 high under it: 116 + 6 + 108 = 230 ≤ 245.
    expect(r.figurePages).toBe(4);
    expect(['elevation:left', 'elevation:right'].map((w) => at(w).page)).toEqual([2, 2]);
    expect(at('elevation:right').x).toBeCloseTo(14 + ELEVATION_SIDE_W + GAP, 6);
    expect(['elevation:rear', 'elevation:bulkhead', 'roof-plan'].map((w) => at(w).page)).toEqual([3, 3, 3]);
    expect(at('elevation:bulkhead').x).toBeCloseTo(14 + ELEVATION_END_W + GAP, 6);
    expect(at('roof-plan').y).toBeCloseTo(14 + 116 + GAP, 6);
    const schedule = r.blocks.filter((b) => b.what === 'text:schedule');
    expect(schedule[0].page).toBe(0);
    expect(schedule[0].width).toBeCloseTo(AREA.a3.width, 6);
    // The notes (build plan, checks, cautions) fit the 245 − 128.5 − 6 = 110.5 mm under the wall
    // elevations on the third page, in columns: no page of text alone.
    expect(r.blocks.filter((b) => b.what === 'text:notes').every((b) => b.page === 2)).toBe(true);
    expect(r.sheet.pages).toHaveLength(4);
  });

  it('balances the notes over the last page’s columns: (392 + 6)/(78 + 6) = 4.7, so 4 columns of (392 − 3 × 6)/4 = 93.5 mm', () => {
    // Sixty findings make the notes run past the drawings onto a page of their own (the fifth).
    const findings = Array.from({ length: 60 }, (_, i) => ({ id: `rule.${i}`, status: 'warn' as const, message: `Finding number ${i} about something measured in the van that needs attention.`, source: 'Common practice, no source' }));
    const long = compose({ paper: 'a3', report: { ok: false, findings } });
    expect(long.sheet.pages).toHaveLength(5);
    const last = long.blocks.filter((b) => b.page === 4);
    expect(last.every((b) => b.what === 'text:notes')).toBe(true);
    expect(last).toHaveLength(4);
    for (const b of last) expect(b.width).toBeCloseTo(93.5, 6);
    expect(last.map((b) => b.x)).toEqual([14, 14 + 99.5, 14 + 2 * 99.5, 14 + 3 * 99.5].map((x) => expect.closeTo(x, 6)));
    // No column holds much more than the others: the tallest is under half the drawing area's 245 mm.
    expect(Math.max(...last.map((b) => b.height))).toBeLessThan(245 / 2);
  });
});

describe('A4 at 1:20', () => {
  const r = compose({ paper: 'a4' });

  it('never overlaps two blocks, and keeps every block inside the 269 × 158 mm drawing area, clear of the title block', () => {
    checkBlocks('a4', r.blocks);
  });

  it('keeps the plan and the section on pages of their own (175 + 6 + 184 = 365 mm > 269 mm), with text beside and below them', () => {
    expect(PLAN_W + GAP + SECTION_W).toBeGreaterThan(AREA.a4.width);
    // Then the left and the right wall elevations a page each (179 + 6 + 179 = 364 > 269), the rear and the
    // bulkhead side by side (114 + 6 + 114 = 234 ≤ 269; 116 high), and the roof plan (116 + 6 + 108 = 230 > 158): 4 + 4 pages.
    expect(r.figurePages).toBe(8);
    // Beside a plan: 269 − 175 − 6 = 88 mm, room for one 78 mm column of notes on the first page.
    const beside = r.blocks.find((b) => b.what === 'text:notes' && b.page === 0)!;
    expect(beside.x).toBeCloseTo(14 + PLAN_W + GAP, 6);
    expect(beside.width).toBeCloseTo(88, 6);
    // Below a plan: 158 − 118.9 − 6 = 33.1 mm of the full width: the schedule starts there.
    const below = r.blocks.find((b) => b.what === 'text:schedule')!;
    expect(below.page).toBe(0);
    expect(below.width).toBeCloseTo(269, 6);
    // Eight drawing pages; the schedule, the mass table and the notes all fit beside and below the drawings.
    expect(r.sheet.pages).toHaveLength(8);
  });

  it('the print view draws the same pages as the PDF model: one SVG per page, the notes beside the first plan', () => {
    const svg = sheetPageSvg(r.sheet.pages[0], 'p0-');
    expect(svg).toContain('data-tag="dimension:bay-length:travel"');
    expect(svg).toContain('Module schedule');
  });
});

describe('a bay that fits no page at the chosen scale', () => {
  it('is refused with the sizes and a scale that fits, as before (the section with its road band needs 271 mm at 1:10)', () => {
    // 6 + (2000 + 550)/10 + 10 = 271 mm > 245 mm on A3.
    const r = composeSheet({ doc: lounge, report, paper: 'a3', scale: 10, units: 'mm', details });
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.needed.height).toBeCloseTo(271, 6);
    expect(r.message).toMatch(/Choose 1:20 on A3/);
  });
});
