/**
 * Reads a PDF back the way a checker would: pdfjs-dist's legacy build in node gives each page's
 * size, its text with positions, and every straight path segment in page points (the current
 * transformation matrix applied), so tests can measure what was drawn.
 */
import path from 'node:path';
import { getDocument, OPS } from 'pdfjs-dist/legacy/build/pdf.mjs';

export interface PdfText {
  str: string;
  x: number;
  y: number;
}
export interface PdfSegment {
  x1: number;
  y1: number;
  x2: number;
  y2: number;
}
export interface PdfPageRead {
  width: number;
  height: number;
  texts: PdfText[];
  segments: PdfSegment[];
  /** All the page's text joined with spaces, for "contains" checks. */
  text: string;
}

type M = [number, number, number, number, number, number];
const multiply = (m: M, n: M): M => [
  m[0] * n[0] + m[2] * n[1], m[1] * n[0] + m[3] * n[1],
  m[0] * n[2] + m[2] * n[3], m[1] * n[2] + m[3] * n[3],
  m[0] * n[4] + m[2] * n[5] + m[4], m[1] * n[4] + m[3] * n[5] + m[5],
];
const apply = (m: M, x: number, y: number): [number, number] => [m[0] * x + m[2] * y + m[4], m[1] * x + m[3] * y + m[5]];

export async function readPdf(bytes: Uint8Array): Promise<{ pages: PdfPageRead[]; title: string | undefined }> {
  const standardFontDataUrl = path.join(process.cwd(), 'node_modules/pdfjs-dist/standard_fonts') + path.sep;
  const pdf = await getDocument({ data: new Uint8Array(bytes), standardFontDataUrl, disableFontFace: true, verbosity: 0 }).promise;
  const meta = await pdf.getMetadata();
  const pages: PdfPageRead[] = [];
  for (let n = 1; n <= pdf.numPages; n++) {
    const page = await pdf.getPage(n);
    const [x0, y0, x1, y1] = page.view;
    const content = await page.getTextContent();
    const texts = content.items
      .filter((t): t is typeof t & { str: string; transform: number[] } => 'str' in t && (t as { str: string }).str.trim() !== '')
      .map((t) => ({ str: t.str, x: t.transform[4], y: t.transform[5] }));
    const ops = await page.getOperatorList();
    const segments: PdfSegment[] = [];
    let ctm: M = [1, 0, 0, 1, 0, 0];
    const stack: M[] = [];
    for (let i = 0; i < ops.fnArray.length; i++) {
      const fn = ops.fnArray[i];
      const args = ops.argsArray[i];
      if (fn === OPS.save) stack.push(ctm);
      else if (fn === OPS.restore) ctm = stack.pop() ?? [1, 0, 0, 1, 0, 0];
      else if (fn === OPS.transform) ctm = multiply(ctm, args as M);
      else if (fn === OPS.constructPath) {
        const data = (args[1] as ArrayLike<number>[])[0];
        if (!data) continue;
        let cur: [number, number] | null = null;
        let start: [number, number] | null = null;
        for (let k = 0; k < data.length; ) {
          const op = data[k];
          if (op === 0) { cur = apply(ctm, data[k + 1], data[k + 2]); start = cur; k += 3; }
          else if (op === 1) {
            const next = apply(ctm, data[k + 1], data[k + 2]);
            if (cur) segments.push({ x1: cur[0], y1: cur[1], x2: next[0], y2: next[1] });
            cur = next;
            k += 3;
          } else if (op === 2) { cur = apply(ctm, data[k + 5], data[k + 6]); k += 7; } // curveTo: keep the end point
          else if (op === 3) { cur = apply(ctm, data[k + 3], data[k + 4]); k += 5; } // quadratic
          else if (op === 4) { if (cur && start) segments.push({ x1: cur[0], y1: cur[1], x2: start[0], y2: start[1] }); cur = start; k += 1; }
          else break;
        }
      }
    }
    pages.push({ width: x1 - x0, height: y1 - y0, texts, segments, text: texts.map((t) => t.str).join(' ') });
  }
  const info = meta.info as { Title?: string } | undefined;
  await pdf.destroy();
  return { pages, title: info?.Title };
}

/** Horizontal segments whose length is `pt` within `tol`. */
export function horizontalOfLength(page: PdfPageRead, pt: number, tol = 0.05): PdfSegment[] {
  return page.segments.filter((s) => Math.abs(s.y1 - s.y2) < 0.01 && Math.abs(Math.abs(s.x2 - s.x1) - pt) <= tol);
}
