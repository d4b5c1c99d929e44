// Laying out the plan sheet: what fits where, what is suggested when it does not, and that every
// required part (plans, section, schedule, checks with sources, cautions, title block) is there.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { composeSheet, fitOf, renderPdf, suggestFit, type SheetRequest } from '@/lib/sheet';
import { printable, textWidth, wrap } from '@/lib/sheet/typography';
import { starterLayout, bayTemplate, emptyLayout, type LayoutDoc } from '@/lib/layout';
import type { CheckReport } from '@/lib/checks/types';
import { diffRevisions } from '@/lib/layout/revision-diff';
import type { Column } from '@/lib/sheet/flow';
import type { TextItem } from '@/lib/sheet/primitives';
import { fontsReady } from './sheet-fonts';

const lounge = starterLayout('starter-l-lounge')!;
const details = { studio: 'Saltmarsh Van Works', client: 'Priya Nair', layout: 'Nair — L2H2 weekender', revision: 'B', date: '2025-12-02' };
const report: CheckReport = {
  ok: false,
  findings: [
    { id: 'sleep.length', status: 'fail', arrangement: 'sleep', measured: 1850, required: 1900, unit: 'mm', message: 'Bed 1850 mm long; needs 1900 mm for the tallest sleeper (1800 mm + 100 mm).', source: 'Common practice, no source' },
    { id: 'headroom.standing', status: 'pass', measured: 1910, required: 1800, unit: 'mm', message: 'Clear standing height 1910 mm ≥ 1800 mm.', source: 'Common practice, no source' },
    { id: 'walkway.width', status: 'warn', arrangement: 'lounge', message: 'Narrowest corridor 480 mm.', source: 'EN 1645-1 (secondary citation)' },
  ],
};

function request(over: Partial<SheetRequest> = {}): SheetRequest {
  return { doc: lounge, report, paper: 'a4', scale: 20, units: 'mm', details, ...over };
}

function textsOf(page: { items: { type: string }[] }): string[] {
  return page.items.filter((i): i is { type: 'text'; text: string } => i.type === 'text').map((i) => i.text);
}

function bay(length: number, width: number, height: number): LayoutDoc {
  return emptyLayout('Big', { length, width, height, wheelArches: [], doors: [], bulkhead: true, cabSeats: 2 });
}

describe('fitting the bay to the paper', () => {
  it('fits an L2H2 bay on A4 at 1:20 and 1:25 but not at 1:10 (177 mm of plan height + dimensions > 158 mm)', () => {
    expect(fitOf(lounge, 'a4', 20).fits).toBe(true);
    expect(fitOf(lounge, 'a4', 25).fits).toBe(true);
    const tight = fitOf(lounge, 'a4', 10);
    expect(tight.fits).toBe(false);
    expect(tight.available).toEqual({ width: 269, height: 158 });
  });

  it('says so clearly and suggests 1:20 on A4 for an L2H2 bay at 1:10', () => {
    const r = composeSheet(request({ scale: 10 }));
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.message).toMatch(/does not fit on A4 landscape at 1:10/);
    expect(r.message).toMatch(/3100 × 1800 mm/);
    expect(r.message).toMatch(/Choose 1:20 on A4/);
    expect(r.suggestion).toEqual({ paper: 'a4', scale: 20 });
  });

  it('suggests A3 when no scale fits on A4 (a 7 m bay), and nothing for a 12 m one', () => {
    expect(suggestFit(bay(7000, 2000, 2500), 'a4')).toEqual({ paper: 'a3', scale: 20 });
    const r = composeSheet(request({ doc: bay(7000, 2000, 2500), scale: 25 }));
    expect(!r.ok && r.message).toMatch(/No scale fits on A4; choose 1:20 on A3/);
    const huge = composeSheet(request({ doc: bay(12000, 2500, 3000), paper: 'a3', scale: 25 }));
    expect(huge.ok).toBe(false);
    if (!huge.ok) {
      expect(huge.suggestion).toBeNull();
      expect(huge.message).toMatch(/None of 1:10, 1:20 or 1:25 fits/);
    }
  });

  it('puts all three plans and the section on one A3 page at 1:20 when nothing hangs under the floor, one per page on A4', () => {
    // Rows at 1:20: [travel, lounge] 118.9 mm high and [sleep, section] max(118.9, 116) mm: 118.9 + 6 + 118.9 = 243.8 ≤ 245 mm.
    const interior = { ...lounge, modules: lounge.modules.filter((m) => m.mount !== 'under-floor') };
    const a3 = composeSheet(request({ doc: interior, paper: 'a3' }));
    const a4 = composeSheet(request());
    if (!a3.ok || !a4.ok) throw new Error('does not fit');
    const figures = ['plan:travel', 'plan:lounge', 'plan:sleep', 'section'];
    expect(a3.blocks.filter((b) => figures.includes(b.what)).map((b) => b.page)).toEqual([0, 0, 0, 0]);
    expect(a4.blocks.filter((b) => figures.includes(b.what)).map((b) => b.page)).toEqual([0, 1, 2, 3]);
    // Then the wall elevations and the roof plan (tests/sheet/layout.test.ts has their sizes): on A3
    // [left, right] 128.5 mm high on a second page, [rear, bulkhead] 116 and the roof 108 on a third
    // (128.5 + 6 + 116 = 250.5 > 245; 116 + 6 + 108 = 230 ≤ 245); on A4 four pages more.
    expect(a3.figurePages).toBe(3);
    expect(a4.figurePages).toBe(8);
    // The demo lounge's underslung tank brings the road line 550 mm under the floor into the section:
    // 6 + (2000 + 550)/20 + 10 = 143.5 mm, and 118.9 + 6 + 143.5 = 268.4 > 245 mm: the section's row
    // on a second page, and the elevations and roof plan on two more.
    const withTank = composeSheet(request({ paper: 'a3' }));
    expect(withTank.ok && withTank.figurePages).toBe(4);
  });

  it('fits a long L4H3 bay at 1:20 on A4', () => {
    const l4 = emptyLayout('L4', bayTemplate('l4h3')!.bay);
    expect(composeSheet(request({ doc: l4 })).ok).toBe(true);
  });
});

describe('what the sheet holds', () => {
  const r = composeSheet(request({ paper: 'a3' }));
  if (!r.ok) throw new Error(r.message);
  const all = r.sheet.pages.flatMap(textsOf).join('\n');

  it('has a plan per arrangement and the side section', () => {
    for (const caption of ['Travel: driving, belted seats in use', 'Lounge: parked, daytime', 'Sleep: beds made up', 'Side section along the length']) expect(all).toContain(caption);
    const tags = r.sheet.pages.slice(0, r.figurePages).flatMap((p) => p.items).filter((i) => i.type === 'line' && i.tag).map((i) => (i as { tag: string }).tag);
    expect(tags).toEqual(expect.arrayContaining(['dimension:bay-length:travel', 'dimension:bay-length:lounge', 'dimension:bay-length:sleep', 'dimension:clear-height']));
  });

  it('puts the title block on every page, with the sheet number', () => {
    r.sheet.pages.forEach((page, i) => {
      const t = textsOf(page);
      expect(t).toEqual(expect.arrayContaining(['Saltmarsh Van Works', 'Nair — L2H2 weekender', 'Priya Nair', 'B', '2025-12-02', '1:20', 'millimetres (mm)', `${i + 1} of ${r.sheet.pages.length} · A3`]));
    });
  });

  it('says "Preliminary" when there is no revision letter, and names a missing client', () => {
    const w = composeSheet(request({ details: { ...details, revision: null, client: null } }));
    if (!w.ok) throw new Error(w.message);
    expect(textsOf(w.sheet.pages[0])).toEqual(expect.arrayContaining(['Preliminary', 'No client named']));
  });

  it('prints where an issued revision stands, its revision table, and clouds with the letter round what changed', () => {
    const moved = { ...lounge, modules: lounge.modules.map((m, i) => (i === 0 ? { ...m, x: m.x + 200 } : m)) };
    const everywhere = lounge.modules[0].arrangements.length;
    const plain = composeSheet(request({ doc: moved, details: { ...details, issueState: 'changes-asked' } }));
    const marked = composeSheet(request({
      doc: moved,
      details: { ...details, issueState: 'changes-asked' },
      revisions: [
        { letter: 'A', date: '2025-11-20', description: 'First proposal', by: 'Ivo Brandt' },
        { letter: 'B', date: '2025-12-02', description: 'Bed moved 200 mm rearwards', by: 'Ivo Brandt' },
      ],
      changes: { letter: 'B', diff: diffRevisions(lounge, moved) },
    }));
    if (!plain.ok || !marked.ok) throw new Error('does not fit');
    const all = marked.sheet.pages.flatMap((p) => textsOf(p));
    expect(textsOf(marked.sheet.pages[0])).toEqual(expect.arrayContaining(['Revision · Returned for changes', 'B']));
    expect(all).toEqual(expect.arrayContaining(['Revisions', 'Rev', 'Date', 'Description', 'By', 'First proposal', 'Bed moved 200 mm rearwards', '2025-11-20']));
    // One cloud (a polygon of many points) and one delta triangle (three points) per arrangement the module is in.
    const polys = (r: typeof marked) => (r.ok ? r.sheet.pages.flatMap((p) => p.items.filter((i): i is Extract<typeof i, { type: 'polygon' }> => i.type === 'polygon')) : []);
    const extra = polys(marked).length - polys(plain).length;
    expect(extra).toBe(2 * everywhere);
    expect(polys(marked).filter((p) => p.stroke === 'copper' && p.points.length === 3)).toHaveLength(everywhere);
    expect(polys(marked).filter((p) => p.stroke === 'copper' && p.points.length > 20)).toHaveLength(everywhere);
    // The triangles carry the letter.
    expect(marked.sheet.pages.flatMap((p) => p.items).filter((i) => i.type === 'text' && i.text === 'B' && i.ink === 'copper')).toHaveLength(everywhere);
  });

  it('lists every module in the schedule with kind, size, elevation and mass', () => {
    expect(all).toContain('Module schedule');
    for (const [i, m] of lounge.modules.entries()) {
      expect(all).toContain(`${m.length} × ${m.width} × ${m.height}`);
      expect(all.split('\n')).toContain(String(i + 1));
    }
    expect(all).toContain(`${lounge.modules.length} modules`);
  });

  it('shows the check summary, failures first, with each status in words and each source', () => {
    expect(all).toContain('1 does not meet, 1 needs attention, 1 meets');
    const fail = all.indexOf('x Does not meet · Bed length · sleep');
    const warn = all.indexOf('! Needs attention · Walkway width · lounge');
    const pass = all.indexOf('+ Meets · Standing headroom');
    expect(fail).toBeGreaterThan(-1);
    expect(fail).toBeLessThan(warn);
    expect(warn).toBeLessThan(pass);
    expect(all).toContain('Source: EN 1645-1 (secondary citation)');
    expect(all).toContain('Clear standing height 1910 mm >= 1800 mm.');
  });

  it('carries the safety cautions for gas, 230 V, heating, seats and belts, weight limits', () => {
    for (const topic of ['Safety cautions', 'Gas', '230 V', 'Heating', 'Seats and belts', 'Weight limits']) expect(all.split('\n')).toContain(topic);
    expect(all).toMatch(/local/);
  });

  it('says plainly when the checks could not run', () => {
    const none = composeSheet(request({ report: null, checksUnavailable: 'the check engine is not available' }));
    if (!none.ok) throw new Error(none.message);
    const text = none.sheet.pages.flatMap(textsOf).join(' ');
    expect(text).toMatch(/The checks could not be run for this sheet: the check engine is not available/);
  });

  it('writes dimensions in the studio’s units', () => {
    const inches = composeSheet(request({ units: 'in', paper: 'a3' }));
    if (!inches.ok) throw new Error(inches.message);
    const t = inches.sheet.pages[0].items.filter((i) => i.type === 'text').map((i) => (i as { text: string }).text);
    expect(t).toContain('122.05 in'); // 3100 mm / 25.4
    expect(inches.sheet.pages.flatMap(textsOf)).toContain('inches (in)');
  });
});

describe('text for the standard fonts', () => {
  it('spells out symbols the standard fonts lack and never throws on any text (property)', async () => {
    expect(printable('≤ 5 → 6 λ')).toBe('<= 5 -> 6 lambda ');
    fc.assert(fc.property(fc.string({ unit: 'grapheme', maxLength: 60 }), (s) => {
      const p = printable(s);
      expect(typeof textWidth(p, 8)).toBe('number');
      for (const line of wrap(s, 8, 30)) expect(textWidth(line, 8)).toBeLessThanOrEqual(30 + 1e-9);
    }), { numRuns: 200 });
  });

  it('renders a sheet whose names use scripts the fonts cannot show', async () => {
    const r = composeSheet(request({ details: { ...details, client: '山田 花子', layout: 'Ferienbus „Möwe“ ✓' } }));
    if (!r.ok) throw new Error(r.message);
    const bytes = await renderPdf(r.sheet, { fonts: await fontsReady });
    expect(bytes.byteLength).toBeGreaterThan(1000);
  });
});

describe('a layout with very many findings', () => {
  it('lists the first findings (failures first) and counts the rest', async () => {
    const { MAX_FINDINGS_LISTED } = await import('@/lib/sheet/checks-summary');
    const many: CheckReport = {
      ok: false,
      findings: Array.from({ length: 400 }, (_, i) => ({ id: `fit.overlap`, status: i < 300 ? ('pass' as const) : ('fail' as const), message: `Finding ${i}`, source: 'Layout geometry' })),
    };
    const r = composeSheet(request({ report: many, paper: 'a3' }));
    if (!r.ok) throw new Error(r.message);
    const text = r.sheet.pages.flatMap(textsOf).join('\n');
    expect(text.match(/x Does not meet · Modules do not overlap/g)).toHaveLength(100);
    expect(text.match(/\+ Meets · Modules do not overlap/g)).toHaveLength(MAX_FINDINGS_LISTED - 100);
    expect(text).toContain(`…and ${400 - MAX_FINDINGS_LISTED} more findings not listed here (${400 - MAX_FINDINGS_LISTED} meet).`);
    expect(text).not.toMatch(/fit\.overlap/);
  });
});

describe('mass and balance on the sheet', () => {
  it('prints the weight tab’s mass-and-balance table: heading, the vehicle row and the laden total', () => {
    const r = composeSheet(request());
    if (!r.ok) throw new Error(r.message);
    const all = r.sheet.pages.flatMap(textsOf).join('\n');
    expect(all).toMatch(/Mass and balance/);
    expect(all).toMatch(/Vehicle in running order \(driver included\)/);
    // The starter's demo van: 2,100 kg in running order, 1,250 kg of it on the front axle.
    expect(all).toMatch(/2,100/);
    expect(all).toMatch(/1,250/);
    expect(all).toMatch(/Payload left/);
    expect(all).toMatch(/Laden centre of mass \d[\d,]* mm behind the front of the load floor/);
  });
});

describe('the check summary in a narrow column', () => {
  it('wraps every line of the checks to the column, the counts line too', async () => {
    const { flowChecks } = await import('@/lib/sheet/checks-summary');
    const { ColumnFlow } = await import('@/lib/sheet/flow');
    // Counts in three figures make the opening line about twice as long as a 70 mm column.
    const finding = (i: number, status: 'fail' | 'warn' | 'pass') => ({ id: 'fit.overlap', status, message: `Finding ${i}`, source: 'Layout geometry' });
    const big: CheckReport = {
      ok: false,
      findings: [...Array.from({ length: 112 }, (_, i) => finding(i, 'fail')), ...Array.from({ length: 124 }, (_, i) => finding(i, 'warn')), ...Array.from({ length: 156 }, (_, i) => finding(i, 'pass'))],
    };
    const width = 70;
    const columns: Column[] = [];
    const flow = new ColumnFlow({ next: () => { const c: Column = { x: 10, y: 10, width, height: 2000, items: [], fresh: true }; columns.push(c); return c; } }, width);
    flowChecks(flow, big);
    const texts = columns.flatMap((c) => c.items).filter((i): i is TextItem => i.type === 'text');
    const counts = texts.filter((t) => t.font === 'sans-bold' && /do not meet|need attention|meet/.test(t.text) && !/·/.test(t.text));
    expect(counts.length).toBeGreaterThanOrEqual(2); // the counts line, wrapped
    expect(counts.map((t) => t.text).join(' ')).toContain('112 do not meet');
    for (const t of texts) expect(t.x - 10 + textWidth(t.text, t.size, t.font ?? 'sans'), t.text).toBeLessThanOrEqual(width + 0.01);
  });
});
