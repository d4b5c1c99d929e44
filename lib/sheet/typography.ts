/**
 * Measuring and wrapping text for the sheet with the metrics of its own faces (IBM Plex Sans and
 * Mono, embedded in the PDF and loaded by the SVG view), so a line that fits in the PDF also fits
 * in the SVG view. `printable` spells the few symbols the faces lack the plain way and replaces
 * anything else they cannot draw, so no user text can make PDF generation throw. Pure; never draws.
 */
import { FONT_METRICS } from './font-metrics';
import { PT_PER_MM } from './paper';
import type { FontFace } from './primitives';

function table(packed: string): Map<number, number> {
  const widths = new Map<number, number>();
  for (const pair of packed.split(',')) {
    const [cp, w] = pair.split(':');
    widths.set(parseInt(cp, 36), Number(w));
  }
  return widths;
}

const WIDTHS: Record<FontFace, Map<number, number>> = {
  sans: table(FONT_METRICS.sans),
  'sans-bold': table(FONT_METRICS['sans-bold']),
  mono: table(FONT_METRICS.mono),
};

/** Characters every face can draw. */
const DRAWABLE = new Set([...WIDTHS.sans.keys()].filter((cp) => WIDTHS['sans-bold'].has(cp) && WIDTHS.mono.has(cp)));

/** Symbols our own wording uses that the faces lack, spelled the plain way (only used when missing). */
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

/** Text the faces can draw: characters they lack spelled the plain way, anything else as "?". */
export function printable(text: string): string {
  let out = '';
  for (const ch of String(text).replace(/[\r\n\t]+/g, ' ')) {
    const cp = ch.codePointAt(0)!;
    if (DRAWABLE.has(cp)) {
      out += ch;
      continue;
    }
    for (const c of PLAIN[ch] ?? '?') out += DRAWABLE.has(c.codePointAt(0)!) ? c : '?';
  }
  return out;
}

/** Width of a text in mm at `size` pt (the text as `printable` makes it). */
export function textWidth(text: string, size: number, face: FontFace = 'sans'): number {
  const widths = WIDTHS[face];
  let em = 0;
  for (const ch of printable(text)) em += widths.get(ch.codePointAt(0)!) ?? 0;
  return (em * size) / 1000 / PT_PER_MM;
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

/**
 * The first of `names` (longest first: a label, the kind's title, its short name, its abbreviation)
 * that fits `widthMm` whole, or '' when none does: a drawing's label is never cut short, it falls
 * back to a shorter name or to none (the schedule number still names the thing).
 */
export function firstThatFits(names: readonly (string | undefined)[], size: number, widthMm: number, face: FontFace = 'sans'): string {
  for (const name of names) {
    const t = name === undefined ? '' : printable(name).trim();
    if (t && textWidth(t, size, face) <= widthMm) return t;
  }
  return '';
}

/**
 * A caption's notes joined with " · " in the order given, leaving out the least needed ones (lowest
 * `need` first) until the line fits `widthMm`; the ones marked `need: Infinity` are always kept.
 */
export function notesThatFit(notes: readonly { text: string; need: number }[], size: number, widthMm: number, face: FontFace = 'sans'): string {
  let kept = notes.filter((n) => n.text);
  const line = () => kept.map((n) => n.text).join(' · ');
  while (textWidth(line(), size, face) > widthMm) {
    const droppable = kept.filter((n) => n.need !== Infinity);
    if (!droppable.length) break;
    const least = droppable.reduce((a, b) => (b.need < a.need ? b : a));
    kept = kept.filter((n) => n !== least);
  }
  return line();
}

/** Shortens a text with "…" to fit `widthMm` (for table cells). */
export function fit(text: string, size: number, widthMm: number, face: FontFace = 'sans'): string {
  const t = printable(text);
  if (textWidth(t, size, face) <= widthMm) return t;
  let n = t.length;
  while (n > 0 && textWidth(`${t.slice(0, n)}…`, size, face) > widthMm) n--;
  return n > 0 ? `${t.slice(0, n)}…` : '';
}
