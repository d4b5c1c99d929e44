// The plan sheet in the product's faces: the metric table matches the fonts (read independently
// with fontkit, the library pdf-lib itself uses), the PDF embeds IBM Plex as subsets, names no
// library as its producer, and text drawn in it reads back.
import path from 'node:path';
import fs from 'node:fs';
import { describe, expect, it } from 'vitest';
import fontkit from '@pdf-lib/fontkit';
import { PDFDocument, PDFName, PDFDict, PDFRawStream, PDFRef, decodePDFRawStream } from 'pdf-lib';
import { composeSheet, renderPdf, SHEET_FONT_FILES } from '@/lib/sheet';
import { textWidth, printable } from '@/lib/sheet/typography';
import { PT_PER_MM } from '@/lib/sheet/paper';
import { woffToSfnt } from '@/server/api/woff';
import { starterLayout } from '@/lib/layout';
import { fontsReady } from './sheet-fonts';
import { readPdf } from './read-pdf';

const fontDir = path.join(__dirname, '..', '..', 'fonts');

describe('the sheet faces', () => {
  it.each(Object.entries(SHEET_FONT_FILES))('%s: widths from the table equal the font’s own advance widths', (face, file) => {
    const font = fontkit.create(Buffer.from(woffToSfnt(fs.readFileSync(path.join(fontDir, file)))));
    for (const text of ['Bed length 1 900 mm', 'Clear standing height 1910 mm', 'Gas & ventilation — 2 × 11 kg', 'ÀÉÎõü £€ 0123456789']) {
      const run = font.layout(printable(text), { liga: false, calt: false, clig: false, rlig: false, dlig: false, kern: false });
      const units = run.glyphs.reduce((sum, g) => sum + g.advanceWidth, 0);
      const expectedMm = (units / font.unitsPerEm) * 10 / PT_PER_MM;
      expect(textWidth(text, 10, face as 'sans')).toBeCloseTo(expectedMm, 6);
    }
  });

  it('unwraps WOFF into an sfnt that starts with the TrueType version tag', () => {
    const sfnt = woffToSfnt(fs.readFileSync(path.join(fontDir, SHEET_FONT_FILES.mono)));
    expect([...sfnt.subarray(0, 4)]).toEqual([0, 1, 0, 0]);
    expect(() => woffToSfnt(new Uint8Array(60))).toThrow(/not a WOFF/);
  });
});

describe('the PDF', () => {
  it('embeds IBM Plex Sans and Mono as subsets and says it is a Baywright plan sheet', async () => {
    const doc = starterLayout('starter-l-lounge')!;
    const r = composeSheet({ doc, report: { ok: true, findings: [] }, paper: 'a4', scale: 20, units: 'mm', details: { studio: 'S', client: 'C', layout: 'L', revision: 'A', date: '2025-12-02' } });
    if (!r.ok) throw new Error(r.message);
    const bytes = await renderPdf(r.sheet, { fonts: await fontsReady });
    const pdf = await PDFDocument.load(bytes, { updateMetadata: false });
    expect(pdf.getProducer()).toBe('Baywright plan sheet');
    const fontNames = new Set<string>();
    let embeddedBytes = 0;
    for (const [, obj] of pdf.context.enumerateIndirectObjects()) {
      const dict = obj instanceof PDFDict ? obj : obj instanceof PDFRawStream ? obj.dict : null;
      if (!dict) continue;
      if (dict.get(PDFName.of('Type')) === PDFName.of('Font')) {
        const base = dict.get(PDFName.of('BaseFont'));
        if (base) fontNames.add(base.toString());
      }
      const file = dict.get(PDFName.of('FontFile2'));
      if (file instanceof PDFRef) {
        const stream = pdf.context.lookup(file);
        if (stream instanceof PDFRawStream) embeddedBytes += decodePDFRawStream(stream).decode().byteLength;
      }
    }
    const names = [...fontNames].join(' ');
    expect(names).toMatch(/IBMPlexSans-Regular/);
    expect(names).toMatch(/IBMPlexSans-SemiBold/);
    expect(names).toMatch(/IBMPlexMono-Regular/);
    expect(names).not.toMatch(/Helvetica|Courier/);
    // Subsets, not whole fonts: the embedded font programs are smaller than the whole faces.
    const fonts = await fontsReady;
    const whole = fonts.sans.byteLength + fonts['sans-bold'].byteLength + fonts.mono.byteLength;
    expect(embeddedBytes).toBeGreaterThan(0);
    expect(embeddedBytes).toBeLessThan(whole * 0.8);
    const read = await readPdf(bytes);
    expect(read.pages[0].text).toContain('L');
  });
});
