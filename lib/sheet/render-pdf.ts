/**
 * Renders a SheetDocument into a PDF with pdf-lib: one page per sheet page at its exact paper size
 * (mm → pt at 72 / 25.4), the product's own faces embedded as subsets (the caller passes their
 * bytes, see fonts.ts), and no scaling of any kind, so a drawing at 1:20 is 1:20 when printed at
 * 100 %. Pure (bytes out); must never touch the network or the file system.
 */
import {
  LineCapStyle, PDFDocument, degrees, lineTo, moveTo, popGraphicsState, pushGraphicsState, rgb, setDashPattern, setLineCap,
  setLineWidth, setStrokingColor, stroke, type PDFFont, type PDFOperator, type PDFPage, type RGB,
} from 'pdf-lib';
import fontkit from '@pdf-lib/fontkit';
import { SHEET_FONT_FEATURES, type SheetFonts } from './fonts';
import { PT_PER_MM } from './paper';
import { INK_HEX, type FontFace, type Ink, type LineItem, type SheetDocument, type SheetItem } from './primitives';
import { printable } from './typography';

function colour(ink: Ink | undefined): RGB {
  const hex = INK_HEX[ink ?? 'ink'];
  return rgb(parseInt(hex.slice(1, 3), 16) / 255, parseInt(hex.slice(3, 5), 16) / 255, parseInt(hex.slice(5, 7), 16) / 255);
}

export interface PdfOptions {
  /** The faces' bytes (fonts/*.woff, named in fonts.ts). */
  fonts: SheetFonts;
  /** Fixed dates make byte-identical output for tests. */
  created?: Date;
  author?: string;
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
  const fonts = new Map<FontFace, PDFFont>();
  for (const face of ['sans', 'sans-bold', 'mono'] as FontFace[]) {
    fonts.set(face, await pdf.embedFont(options.fonts[face], { subset: true, features: { ...SHEET_FONT_FEATURES } }));
  }

  for (const p of sheet.pages) {
    const page = pdf.addPage([p.width * PT_PER_MM, p.height * PT_PER_MM]);
    // Runs of lines with the same pen go out as one path: hatching is thousands of strokes.
    let run: LineItem[] = [];
    const flush = () => {
      if (run.length) strokeLines(page, run, p.height);
      run = [];
    };
    for (const item of p.items) {
      if (item.type === 'line') {
        if (run.length && !samePen(run[0], item)) flush();
        run.push(item);
        continue;
      }
      flush();
      drawItem(page, item, p.height, fonts);
    }
    flush();
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

function strokeLines(page: PDFPage, lines: LineItem[], pageHeightMm: number) {
  const X = (mm: number) => pt(mm * PT_PER_MM);
  const Y = (mm: number) => pt((pageHeightMm - mm) * PT_PER_MM);
  const first = lines[0];
  const ops: PDFOperator[] = [pushGraphicsState(), setStrokingColor(colour(first.ink)), setLineWidth(X(first.width)), setLineCap(LineCapStyle.Butt)];
  if (first.dash) ops.push(setDashPattern(first.dash.map(X), 0));
  for (const l of lines) ops.push(moveTo(X(l.x1), Y(l.y1)), lineTo(X(l.x2), Y(l.y2)));
  ops.push(stroke(), popGraphicsState());
  page.pushOperators(...ops);
}

function drawItem(page: PDFPage, item: SheetItem, pageHeightMm: number, fonts: Map<FontFace, PDFFont>) {
  const X = (mm: number) => pt(mm * PT_PER_MM);
  const Y = (mm: number) => pt((pageHeightMm - mm) * PT_PER_MM);
  switch (item.type) {
    case 'line':
      strokeLines(page, [item], pageHeightMm);
      return;
    case 'rect':
      page.drawRectangle({
        x: X(item.x),
        y: Y(item.y + item.h),
        width: X(item.w),
        height: X(item.h),
        color: item.fill ? colour(item.fill) : undefined,
        borderColor: item.stroke ? colour(item.stroke) : undefined,
        borderWidth: item.stroke ? X(item.width ?? 0.2) : 0,
        borderDashArray: item.dash?.map(X),
      });
      return;
    case 'polygon': {
      if (item.points.length < 2) return;
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
      const font = fonts.get(item.font ?? 'sans')!;
      const text = printable(item.text);
      if (!text) return;
      const width = font.widthOfTextAtSize(text, item.size);
      const shift = item.align === 'center' ? width / 2 : item.align === 'right' ? width : 0;
      if (item.rotate === 90) {
        page.drawText(text, { x: X(item.x), y: Y(item.y) - shift, size: item.size, font, color: colour(item.ink), rotate: degrees(90) });
      } else {
        page.drawText(text, { x: X(item.x) - shift, y: Y(item.y), size: item.size, font, color: colour(item.ink) });
      }
      return;
    }
  }
}
