/**
 * Measuring and wrapping text for the sheet with the metrics of the PDF standard fonts
 * (Helvetica for text, Courier for dimensions), so a line that fits in the PDF also fits in the
 * SVG view (which asks for the metric-compatible Arial / Courier New). The standard fonts encode
 * WinAnsi only: `printable` maps the few symbols we use to plain equivalents and replaces the
 * rest, so no user text can make PDF generation throw. Pure; never draws.
 */
import { StandardFontEmbedder, StandardFonts } from 'pdf-lib';
import { PT_PER_MM } from './paper';
import type { FontFace } from './primitives';

const FONT_NAME: Record<FontFace, StandardFonts> = {
  sans: StandardFonts.Helvetica,
  'sans-bold': StandardFonts.HelveticaBold,
  mono: StandardFonts.Courier,
};

const embedders = new Map<FontFace, StandardFontEmbedder>();
function embedder(face: FontFace): StandardFontEmbedder {
  let e = embedders.get(face);
  if (!e) {
    e = StandardFontEmbedder.for(FONT_NAME[face] as never); // same names, typed by another package
    embedders.set(face, e);
  }
  return e;
}

export function standardFontName(face: FontFace): StandardFonts {
  return FONT_NAME[face];
}

/** Symbols outside WinAnsi that our own wording uses, spelled the plain way. */
const PLAIN: Record<string, string> = {
  '≤': '<=',
  '≥': '>=',
  '→': '->',
  '←': '<-',
  '≈': '~',
  '−': '-',
  '‑': '-',
  '✓': 'ok',
  '✗': 'x',
  '⚠': '!',
  'λ': 'lambda ',
  'Δ': 'delta ',
  'μ': 'µ',
  'Ω': 'ohm',
  '₂': '2',
  '\u00A0': ' ',
  '\u2009': ' ',
  '\u202F': ' ',
};

/** Text the standard fonts can encode: known symbols spelled out, anything else as "?". */
export function printable(text: string): string {
  const enc = embedder('sans').encoding;
  let out = '';
  for (const ch of String(text).replace(/[\r\n\t]+/g, ' ')) {
    const mapped = PLAIN[ch] ?? ch;
    for (const c of mapped) {
      const cp = c.codePointAt(0)!;
      out += cp >= 0x20 && enc.canEncodeUnicodeCodePoint(cp) ? c : '?';
    }
  }
  return out;
}

/** Width of a text in mm at `size` pt. */
export function textWidth(text: string, size: number, face: FontFace = 'sans'): number {
  return embedder(face).widthOfTextAtSize(printable(text), size) / PT_PER_MM;
}

/** Line height in mm for `size` pt type (1.25 leading). */
export function lineHeight(size: number): number {
  return (size * 1.25) / PT_PER_MM;
}

/** Greedy word wrap into lines no wider than `widthMm`; a word longer than a line is broken. */
export function wrap(text: string, size: number, widthMm: number, face: FontFace = 'sans'): string[] {
  const words = printable(text).split(/\s+/).filter(Boolean);
  const lines: string[] = [];
  let line = '';
  const push = () => {
    if (line) lines.push(line);
    line = '';
  };
  for (let word of words) {
    while (textWidth(word, size, face) > widthMm && word.length > 1) {
      // Break an over-long word (a long file name, a URL) where it overflows.
      let cut = word.length - 1;
      while (cut > 1 && textWidth(word.slice(0, cut), size, face) > widthMm) cut--;
      push();
      lines.push(word.slice(0, cut));
      word = word.slice(cut);
    }
    const candidate = line ? `${line} ${word}` : word;
    if (textWidth(candidate, size, face) <= widthMm) line = candidate;
    else {
      push();
      line = word;
    }
  }
  push();
  return lines.length ? lines : [''];
}

/** Shortens a text with "…" to fit `widthMm` (for table cells). */
export function fit(text: string, size: number, widthMm: number, face: FontFace = 'sans'): string {
  const t = printable(text);
  if (textWidth(t, size, face) <= widthMm) return t;
  let n = t.length;
  while (n > 0 && textWidth(`${t.slice(0, n)}…`, size, face) > widthMm) n--;
  return n > 0 ? `${t.slice(0, n)}…` : '';
}
