// The PDF read back with pdfjs-dist (legacy build, node): page sizes per ISO 216 at 72 pt per
// inch, the title block text, and a known dimension drawn at the stated scale.
import { beforeAll, describe, expect, it } from 'vitest';
import { composeSheet, mmToPt, renderPdf, type SheetRequest } from '@/lib/sheet';
import { starterLayout } from '@/lib/layout';
import { horizontalOfLength, readPdf, type PdfPageRead } from './read-pdf';
import { fontsReady } from './sheet-fonts';

const doc = starterLayout('starter-l-lounge')!; // bay 3100 × 1800 × 2000 mm
const details = { studio: 'Saltmarsh Van Works', client: 'Priya Nair', layout: 'Nair — L2H2 weekender', revision: 'C', date: '2025-12-02' };

async function pdfOf(over: Partial<SheetRequest>) {
  const r = composeSheet({ doc, report: { ok: true, findings: [] }, paper: 'a4', scale: 20, units: 'mm', details, ...over });
  if (!r.ok) throw new Error(r.message);
  return readPdf(await renderPdf(r.sheet, { created: new Date('2025-12-02T09:00:00Z'), fonts: await fontsReady }));
}

/** The dimension line under a text label: a horizontal segment a little below the text, spanning it. */
function dimensionLineUnder(page: PdfPageRead, label: string) {
  const texts = page.texts.filter((t) => t.str === label);
  return texts.flatMap((t) =>
    page.segments.filter((s) => Math.abs(s.y1 - s.y2) < 0.01 && s.y1 < t.y && t.y - s.y1 < 6 && Math.min(s.x1, s.x2) < t.x && Math.max(s.x1, s.x2) > t.x),
  );
}

describe('A4 at 1:20', () => {
  let read: Awaited<ReturnType<typeof readPdf>>;
  beforeAll(async () => {
    read = await pdfOf({});
  });

  it('has landscape A4 pages: 297 × 210 mm = 841.89 × 595.28 pt (ISO 216; 1 pt = 1/72 in)', () => {
    expect(read.pages.length).toBeGreaterThanOrEqual(5);
    for (const p of read.pages) {
      expect(p.width).toBeCloseTo(841.89, 1);
      expect(p.height).toBeCloseTo(595.28, 1);
    }
  });

  it('carries the title block on every page', () => {
    read.pages.forEach((p, i) => {
      for (const s of ['BAYWRIGHT', 'Saltmarsh Van Works', 'Nair — L2H2 weekender', 'Priya Nair', 'C', '2025-12-02', '1:20', 'millimetres (mm)', `${i + 1} of ${read.pages.length} · A4`]) {
        expect(p.texts.map((t) => t.str)).toContain(s);
      }
      expect(p.text).toContain('true when printed at 100 % on A4 landscape');
    });
    expect(read.title).toBe('Nair — L2H2 weekender — plan sheet');
  });

  it('draws the 3100 mm bay length as a line of 155 mm = 439.37 pt', () => {
    const lines = dimensionLineUnder(read.pages[0], '3100 mm');
    expect(lines).toHaveLength(1);
    const [line] = lines;
    expect(Math.abs(line.x2 - line.x1)).toBeCloseTo(439.37, 1);
    expect(Math.abs(line.x2 - line.x1)).toBeCloseTo(mmToPt(155), 1);
  });

  it('draws the 1800 mm bay width as a vertical line of 90 mm = 255.12 pt', () => {
    const vertical = read.pages[0].segments.filter((s) => Math.abs(s.x1 - s.x2) < 0.01 && Math.abs(Math.abs(s.y2 - s.y1) - mmToPt(90)) < 0.05);
    expect(vertical.length).toBeGreaterThan(0);
  });

  it('runs the right wall from the bulkhead to the rear bench at 2550 mm: a line of 127.5 mm = 361.42 pt', () => {
    // Travel (page 1): the right wall's first module (the rear bench, a seat in travel) starts 2550 mm
    // from the front; at 1:20 that is 2550 / 20 = 127.5 mm on paper, × 72 / 25.4 = 361.42 pt.
    const p = read.pages[0];
    const runs = horizontalOfLength(p, 361.42, 0.05);
    expect(runs).toHaveLength(1);
    const [run] = runs;
    const end = Math.max(run.x1, run.x2);
    const start = Math.min(run.x1, run.x2);
    // Its figure, "2550", is set centred under the tick at its end (IBM Plex Mono: 600/1000 em a figure, 4 × 0.6 × 5.5 pt wide).
    const figure = p.texts.find((t) => t.str === '2550' && Math.abs(t.x + 6.6 - end) < 1.5);
    expect(figure).toBeDefined();
    // The left wall's figures stand at their distance from the same front: 1650 mm → 82.5 mm = 233.86 pt.
    const at1650 = p.texts.filter((t) => t.str === '1650').map((t) => t.x + 6.6 - start);
    expect(at1650.some((d) => Math.abs(d - 233.86) < 1.5)).toBe(true);
  });

  it('has a scale bar of 1000 mm at 1:20 = 50 mm = 141.73 pt, in ten 100 mm blocks of 14.17 pt', () => {
    const p = read.pages[0];
    // In the title block (its top is 10 + 24 mm = 96.38 pt above the page's foot), not a 100 mm run of a running dimension.
    const blocks = horizontalOfLength(p, mmToPt(5), 0.02).filter((b) => Math.max(b.y1, b.y2) < 96.38);
    // Each block is a rectangle: its top and bottom edges are 5 mm segments.
    expect(blocks.length).toBeGreaterThanOrEqual(20);
    const xs = [...new Set(blocks.map((b) => Math.round(Math.min(b.x1, b.x2) * 100) / 100))].sort((a, b) => a - b);
    expect(xs).toHaveLength(10);
    expect(xs[9] + mmToPt(5) - xs[0]).toBeCloseTo(141.73, 1);
    expect(p.texts.map((t) => t.str)).toContain('1000 mm');
  });

  it('has the schedule, the checks and the safety cautions', () => {
    const all = read.pages.map((p) => p.text).join(' ');
    expect(all).toContain('Module schedule');
    expect(all).toContain('Checks');
    expect(all).toContain('Safety cautions');
    expect(all).toMatch(/LPG installations must be designed/);
  });
});

describe('other papers and scales', () => {
  it('makes A3 pages of 420 × 297 mm = 1190.55 × 841.89 pt', async () => {
    const read = await pdfOf({ paper: 'a3' });
    expect(read.pages[0].width).toBeCloseTo(1190.55, 1);
    expect(read.pages[0].height).toBeCloseTo(841.89, 1);
    expect(read.pages[0].text).toContain('1 of');
    // Two plans share the first row (175 + 6 + 175 = 356 mm of 392 mm); the third plan sits beside the
    // section on the second page (the section reaches down to the road under the underslung tank,
    // so the two rows, 118.9 + 6 + 143.5 = 268.4 mm, are higher than the 245 mm drawing area).
    expect(dimensionLineUnder(read.pages[0], '3100 mm')).toHaveLength(2);
    expect(dimensionLineUnder(read.pages[1], '3100 mm')).toHaveLength(1);
  });

  it('draws the bay length at 1:25 as 124 mm = 351.50 pt, and at 1:10 on A3 as 310 mm = 878.74 pt', async () => {
    const at25 = await pdfOf({ scale: 25 });
    const [l25] = dimensionLineUnder(at25.pages[0], '3100 mm');
    expect(Math.abs(l25.x2 - l25.x1)).toBeCloseTo(351.5, 1);
    // At 1:10 the demo lounge's section with its road line 550 mm under the floor needs 6 + 255 + 10 = 271 mm > 245 mm
    // (tests/sheet/layout.test.ts); without the underslung tank it fits: 6 + 200 + 10 = 216 mm.
    const at10 = await pdfOf({ paper: 'a3', scale: 10, doc: { ...doc, modules: doc.modules.filter((m) => m.mount !== 'under-floor') } });
    const [l10] = dimensionLineUnder(at10.pages[0], '3100 mm');
    expect(Math.abs(l10.x2 - l10.x1)).toBeCloseTo(878.74, 1);
    expect(at10.pages[0].texts.map((t) => t.str)).toContain('500 mm'); // the bar is 500 mm at 1:10
  });

  it('writes "Preliminary" without a revision letter', async () => {
    const read = await pdfOf({ details: { ...details, revision: undefined } });
    expect(read.pages[0].texts.map((t) => t.str)).toContain('Preliminary');
  });
});
