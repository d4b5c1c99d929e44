// A plan sheet of a layout with thousands of modules stays bounded: each figure draws at most 150
// modules (FIGURE_MODULE_LIMIT, our own choice) and says how many it leaves out, the PDF stays under
// 2 MB and the print view's SVG under 2 MB ÷ 2.4 (its page carries the markup about 2.35 times:
// tests/hardening/hostile-work.test.ts), and the SVG writer escapes every text and shares its styles.
import { describe, expect, it } from 'vitest';
import { composeSheet, renderPdf, sheetPageSvg, type SheetPage, type SheetRequest } from '@/lib/sheet';
import type { LayoutDoc } from '@/lib/layout';
import { maximumBuildUp, stackedOnOneSpot } from '../hardening/fixtures/adversarial-layouts';
import { fontsReady } from './sheet-fonts';

const MB = 1024 * 1024;
const PRINT_MARKUP_LIMIT = (2 * MB) / 2.4;

function sheetOf(doc: LayoutDoc, over: Partial<SheetRequest> = {}) {
  const r = composeSheet({ doc, report: null, paper: 'a3', scale: 25, units: 'mm', details: { studio: 'Saltmarsh Van Works', client: 'Priya Nair', layout: doc.name, date: '2026-12-03' }, ...over });
  if (!r.ok) throw new Error(r.message);
  return r.sheet;
}

const texts = (pages: SheetPage[]) => pages.flatMap((p) => p.items.flatMap((i) => (i.type === 'text' ? [i.text] : [])));

describe('a sheet of 5,000 modules on one spot', () => {
  const doc = stackedOnOneSpot(5000);
  const sheet = sheetOf(doc);

  it('draws the first 150 modules in each plan and in the section, and says so under each', () => {
    const said = texts(sheet.pages);
    // Every module is in all three arrangements: three plans and the section each leave 5000 − 150 = 4,850 out.
    expect(said.filter((t) => t === 'Only the first 150 of 5000 modules are drawn; 4850 more are left out of this plan.')).toHaveLength(3);
    expect(said.filter((t) => t === 'Only the first 150 of 5000 modules are drawn; 4850 more are left out of this section.')).toHaveLength(1);
    // Module 150 is drawn in each plan (its number tag; the section numbers only modules at least
    // 4 mm wide on paper, and these are 0.2 mm), module 151 in no plan; the schedule lists the first
    // 300, so 151 is there once.
    expect(said.filter((t) => t === '150')).toHaveLength(3 + 1);
    expect(said.filter((t) => t === '151')).toHaveLength(1);
  });

  it('stays a bounded drawing: under 15,000 marks, a PDF under 2 MB and an SVG print view under 2 MB ÷ 2.4', async () => {
    const marks = sheet.pages.reduce((n, p) => n + p.items.length, 0);
    expect(marks).toBeLessThan(15_000);
    const pdf = await renderPdf(sheet, { fonts: await fontsReady });
    expect(pdf.byteLength).toBeLessThan(2 * MB);
    const svg = sheet.pages.map((p, i) => sheetPageSvg(p, `s${i + 1}-`)).join('');
    expect(svg.length).toBeLessThan(PRINT_MARKUP_LIMIT);
  }, 30_000);
});

describe('a sheet of 150 modules (the most a plan draws)', () => {
  const sheet = sheetOf(maximumBuildUp(150));

  it('draws every module (nothing left out) and its print view is under 2 MB ÷ 2.4', () => {
    expect(texts(sheet.pages).some((t) => t.startsWith('Only the first'))).toBe(false);
    // Three plans and the section; the wall elevations draw only the first 100 modules against each
    // wall (ELEVATION_MODULE_LIMIT), and say so, so module 150 is not on them: it is in the three
    // plans, the section and the schedule.
    expect(texts(sheet.pages).filter((t) => /only the first 100 of 150 modules against it drawn/.test(t))).toHaveLength(2);
    expect(texts(sheet.pages).filter((t) => t === '150')).toHaveLength(3 + 1 + 1);
    const svg = sheet.pages.map((p, i) => sheetPageSvg(p, `s${i + 1}-`)).join('');
    expect(svg.length).toBeLessThan(PRINT_MARKUP_LIMIT);
  });
});

describe('a sheet of 5,000 solar panels on the roof, each a different size (the roof plan\'s worst input)', () => {
  const base = stackedOnOneSpot(5000);
  const doc: LayoutDoc = {
    ...base,
    modules: base.modules.map((m, i) => ({ ...m, kind: 'solar-panel', mount: 'roof', x: (i * 7) % 2000, y: (i * 13) % 1000, length: 1480 + (i % 50), width: 670 + (i % 30), height: 35 }) as LayoutDoc['modules'][number]),
  };
  const sheet = sheetOf(doc);

  it('draws the first 100 on the roof plan and says how many are left out', () => {
    const said = texts(sheet.pages);
    expect(said.some((t) => t.includes('only the first 100 of 5000 on the roof drawn'))).toBe(true);
    const roofMarks = sheet.pages.flatMap((p) => p.items).filter((i) => i.type === 'rect' && i.tag?.startsWith('roof:module:'));
    expect(roofMarks).toHaveLength(100);
  });

  it('keeps its print view under 2 MB', () => {
    const svg = sheet.pages.map((p, i) => sheetPageSvg(p, `s${i + 1}-`)).join('');
    expect(svg.length).toBeLessThan(2 * MB);
  });
});

describe('the SVG writer', () => {
  const page: SheetPage = {
    width: 297,
    height: 210,
    items: [
      { type: 'text', x: 10, y: 20, text: 'Bench </text><script>alert(1)</script> & "seat"', size: 8 },
      { type: 'rect', x: 1.23456, y: 2, w: 3, h: 4, fill: 'white', stroke: 'ink', width: 0.3 },
      { type: 'rect', x: 5, y: 6, w: 7, h: 8, fill: 'white', stroke: 'ink', width: 0.3 },
      { type: 'line', x1: 0, y1: 0, x2: 10, y2: 10, width: 0.1, ink: 'faint' },
      { type: 'line', x1: 0, y1: 5, x2: 10, y2: 15, width: 0.1, ink: 'faint' },
      { type: 'line', x1: 0, y1: 0, x2: 100, y2: 0, width: 0.18, ink: 'ink', tag: 'dimension:bay-length:travel' },
    ],
  };
  const svg = sheetPageSvg(page, 's7-');

  it('escapes what people typed: a label can never become markup', () => {
    expect(svg).toContain('Bench &lt;/text&gt;&lt;script&gt;alert(1)&lt;/script&gt; &amp; "seat"');
    expect(svg).not.toMatch(/<script/i);
  });

  it('writes each style once as a class of this page, rounds to 1/100 mm, and strokes a run of lines as one path', () => {
    expect(svg.match(/<rect class="s7-1"/g)).toHaveLength(2);
    expect(svg).toContain('.s7-1{fill:#FFFFFF;stroke:#1E2A2F;stroke-width:0.3px}');
    expect(svg).toContain('x="1.23"');
    expect(svg).toContain('<path class="s7-2" d="M0 0L10 10M0 5L10 15"/>');
    expect(svg).toContain('data-tag="dimension:bay-length:travel"');
    // 8 pt = 8 × 25.4 / 72 mm = 2.822 mm
    expect(svg).toContain('font-size:2.822px');
  });
});
