/**
 * Renders a SheetDocument into a PDF with pdf-lib: one page per sheet page at its exact paper size
 * (mm → pt at 72 / 25.4), the product's own faces embedded as subsets (the caller passes their
 * bytes, see fonts.ts), and no scaling of any kind, so a drawing at 1:20 is 1:20 when printed at
 * 100 %. Pure (bytes out); must never touch the network or the file system.
 */
import {
  beginText, degrees, drawText, endText, fill, fillAndStroke, LineCapStyle, lineTo, moveText, moveTo, PDFDocument, rectangle, rgb, setDashPattern,
  setFillingColor, setFontAndSize, setLineCap, setLineWidth, setStrokingColor, showText, stroke, type PDFFont, type PDFHexString, type PDFName,
  type PDFOperator, type PDFPage, type RGB,
} from 'pdf-lib';
import fontkit from '@pdf-lib/fontkit';
import { SHEET_FONT_FEATURES, type SheetFonts } from './fonts';
import { PT_PER_MM } from './paper';
import { INK_HEX, type FontFace, type Ink, type LineItem, type SheetDocument, type SheetItem } from './primitives';
import { printable, textWidth } from './typography';

const COLOURS = new Map<Ink, RGB>(
  (Object.keys(INK_HEX) as Ink[]).map((ink) => {
    const hex = INK_HEX[ink];
    return [ink, rgb(parseInt(hex.slice(1, 3), 16) / 255, parseInt(hex.slice(3, 5), 16) / 255, parseInt(hex.slice(5, 7), 16) / 255)];
  }),
);
const colour = (ink: Ink | undefined): RGB => COLOURS.get(ink ?? 'ink')!;

export interface PdfOptions {
  /** The faces' bytes (fonts/*.woff, named in fonts.ts). */
  fonts: SheetFonts;
  /** Fixed dates make byte-identical output for tests. */
  created?: Date;
  author?: string;
}

/**
 * One face as embedded in this document. A text's glyph codes depend only on the text, so each
 * distinct text is laid out once per document (the same number tag is drawn in three plans).
 */
class Face {
  private readonly codes = new Map<string, PDFHexString>();
  constructor(readonly font: PDFFont) {}
  encode(text: string): PDFHexString {
    let code = this.codes.get(text);
    if (!code) this.codes.set(text, (code = this.font.encodeText(text)));
    return code;
  }
}

/**
 * The drawing state of one page's content stream: colours, line width and dash are written only
 * when they change (a sheet has tens of thousands of marks in a handful of pens), and every mark
 * goes out as plain path or text operators rather than one saved-and-restored group per mark.
 */
class Pen {
  private fillInk: Ink | null = null;
  private strokeInk: Ink | null = null;
  private lineWidth: number | null = null;
  private dash = '';
  readonly ops: PDFOperator[] = [setLineCap(LineCapStyle.Butt)];
  private readonly fontKeys = new Map<FontFace, PDFName>();

  constructor(private readonly page: PDFPage, private readonly faces: Map<FontFace, Face>) {}

  fillWith(ink: Ink): void {
    if (ink !== this.fillInk) this.ops.push(setFillingColor(colour(ink)));
    this.fillInk = ink;
  }

  strokeWith(ink: Ink, width: number, dash: number[] | undefined): void {
    if (ink !== this.strokeInk) this.ops.push(setStrokingColor(colour(ink)));
    this.strokeInk = ink;
    if (width !== this.lineWidth) this.ops.push(setLineWidth(width));
    this.lineWidth = width;
    const key = dash ? dash.join(' ') : '';
    if (key !== this.dash) this.ops.push(setDashPattern(dash ?? [], 0));
    this.dash = key;
  }

  fontKey(face: FontFace): PDFName {
    let key = this.fontKeys.get(face);
    if (!key) {
      const { font } = this.faces.get(face)!;
      this.fontKeys.set(face, (key = this.page.node.newFontDictionary(font.name, font.ref)));
    }
    return key;
  }

  /** Everything drawn so far, into the page's content stream. */
  finish(): void {
    // In slices: one call with tens of thousands of arguments can overflow the stack.
    for (let i = 0; i < this.ops.length; i += 4096) this.page.pushOperators(...this.ops.slice(i, i + 4096));
    this.ops.length = 0;
  }
}

export async function renderPdf(sheet: SheetDocument, options: PdfOptions): Promise<Uint8Array> {
  const pdf = await PDFDocument.create();
  pdf.registerFontkit(fontkit);
  pdf.setTitle(printable(sheet.title));
  pdf.setCreator('Baywright');
  pdf.setProducer('Baywright plan sheet');
  if (options.author) pdf.setAuthor(printable(options.author));
  if (options.created) {
    pdf.setCreationDate(options.created);
    pdf.setModificationDate(options.created);
  }
  const faces = new Map<FontFace, Face>();
  for (const face of ['sans', 'sans-bold', 'mono'] as FontFace[]) {
    faces.set(face, new Face(await pdf.embedFont(options.fonts[face], { subset: true, features: { ...SHEET_FONT_FEATURES } })));
  }

  for (const p of sheet.pages) {
    const page = pdf.addPage([p.width * PT_PER_MM, p.height * PT_PER_MM]);
    const pen = new Pen(page, faces);
    // Runs of lines with the same pen go out as one path: hatching is thousands of strokes.
    let run: LineItem[] = [];
    const flush = () => {
      if (run.length) strokeLines(pen, run, p.height);
      run = [];
    };
    for (const item of p.items) {
      if (item.type === 'line') {
        if (run.length && !samePen(run[0], item)) flush();
        run.push(item);
        continue;
      }
      flush();
      drawItem(page, pen, item, p.height, faces);
    }
    flush();
    pen.finish();
  }
  return pdf.save({ useObjectStreams: false });
}

/** Points to 1/100 pt (≈ 3.5 µm on paper): far below any printer, and a much smaller file. */
function pt(v: number): number {
  return Math.round(v * 100) / 100;
}

function samePen(a: LineItem, b: LineItem): boolean {
  return a.width === b.width && (a.ink ?? 'ink') === (b.ink ?? 'ink') && String(a.dash ?? '') === String(b.dash ?? '');
}

function strokeLines(pen: Pen, lines: LineItem[], pageHeightMm: number) {
  const X = (mm: number) => pt(mm * PT_PER_MM);
  const Y = (mm: number) => pt((pageHeightMm - mm) * PT_PER_MM);
  const first = lines[0];
  pen.strokeWith(first.ink ?? 'ink', X(first.width), first.dash?.map(X));
  for (const l of lines) pen.ops.push(moveTo(X(l.x1), Y(l.y1)), lineTo(X(l.x2), Y(l.y2)));
  pen.ops.push(stroke());
}

function drawItem(page: PDFPage, pen: Pen, item: SheetItem, pageHeightMm: number, faces: Map<FontFace, Face>) {
  const X = (mm: number) => pt(mm * PT_PER_MM);
  const Y = (mm: number) => pt((pageHeightMm - mm) * PT_PER_MM);
  switch (item.type) {
    case 'line':
      strokeLines(pen, [item], pageHeightMm);
      return;
    case 'rect': {
      if (!item.fill && !item.stroke) return;
      if (item.fill) pen.fillWith(item.fill);
      if (item.stroke) pen.strokeWith(item.stroke, X(item.width ?? 0.2), item.dash?.map(X));
      pen.ops.push(rectangle(X(item.x), Y(item.y + item.h), X(item.w), X(item.h)));
      pen.ops.push(item.fill && item.stroke ? fillAndStroke() : item.fill ? fill() : stroke());
      return;
    }
    case 'polygon': {
      if (item.points.length < 2) return;
      // Rare (arrows, circles): pdf-lib's own path drawing, which saves and restores its state.
      pen.finish();
      const [first, ...rest] = item.points;
      // SVG path in points, y measured down from the page's top: pdf-lib flips it for us.
      const path = `M ${X(first[0])} ${X(first[1])} ${rest.map(([px, py]) => `L ${X(px)} ${X(py)}`).join(' ')} Z`;
      page.drawSvgPath(path, {
        x: 0,
        y: X(pageHeightMm),
        color: item.fill ? colour(item.fill) : undefined,
        borderColor: item.stroke ? colour(item.stroke) : undefined,
        borderWidth: item.stroke ? X(item.width ?? 0.2) : 0,
      });
      return;
    }
    case 'text': {
      const faceName = item.font ?? 'sans';
      const face = faces.get(faceName)!;
      const text = printable(item.text);
      if (!text) return;
      // The faces' own advance widths (font-metrics.ts, checked against the fonts), as the layout measured it.
      const width = textWidth(text, item.size, faceName) * PT_PER_MM;
      const shift = item.align === 'center' ? width / 2 : item.align === 'right' ? width : 0;
      const key = pen.fontKey(faceName);
      if (item.rotate === 90) {
        pen.ops.push(...drawText(face.encode(text), { x: X(item.x), y: Y(item.y) - shift, size: item.size, font: key, color: colour(item.ink), rotate: degrees(90), xSkew: degrees(0), ySkew: degrees(0) }));
      } else {
        pen.fillWith(item.ink ?? 'ink');
        pen.ops.push(beginText(), setFontAndSize(key, item.size), moveText(X(item.x) - shift, Y(item.y)), showText(face.encode(text)), endText());
      }
      return;
    }
  }
}
