/**
 * The inside of one plan sheet page as SVG markup, in the page's millimetres (the caller's <svg>
 * carries the size and viewBox). The same drawing model as the PDF, written compactly so a dense
 * page stays small: coordinates to 1/100 mm (10 µm, far below what a printer places), each distinct
 * style once in a <style> of classes named by `prefix` (one prefix per page, as every page's rules
 * are global in an HTML document), and runs of lines with the same pen as one path.
 * Pure: items in, text out; every text is escaped. Must never measure or lay anything out.
 */
import { PT_PER_MM } from './paper';
import { INK_HEX, type Ink, type LineItem, type SheetItem, type SheetPage } from './primitives';

const ANCHOR = { left: 'start', center: 'middle', right: 'end' } as const;
const MONO = 'var(--font-mono), monospace';

/** 1/100 mm, without trailing zeros. */
function n(v: number): string {
  const r = Math.round(v * 100) / 100;
  return Object.is(r, -0) ? '0' : String(r);
}

function escapeText(text: string): string {
  return text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;');
}

function escapeAttr(text: string): string {
  return escapeText(text).replace(/"/g, '&quot;');
}

const hex = (ink: Ink | undefined) => INK_HEX[ink ?? 'ink'];
const dashOf = (dash: readonly number[] | undefined) => (dash ? `;stroke-dasharray:${dash.map((d) => `${n(d)}px`).join(' ')}` : '');

/** The CSS declarations an item is drawn with (its geometry aside). */
function styleOf(item: SheetItem): string {
  switch (item.type) {
    case 'line':
      return `fill:none;stroke:${hex(item.ink)};stroke-width:${n(item.width)}px${dashOf(item.dash)}`;
    case 'rect':
    case 'polygon': {
      const fill = item.fill ? `fill:${hex(item.fill)}` : 'fill:none';
      const stroke = item.stroke ? `;stroke:${hex(item.stroke)};stroke-width:${n(item.width ?? 0.2)}px` : '';
      return fill + stroke + (item.type === 'rect' ? dashOf(item.dash) : '');
    }
    case 'text': {
      const anchor = item.align && item.align !== 'left' ? `;text-anchor:${ANCHOR[item.align]}` : '';
      const weight = item.font === 'sans-bold' ? ';font-weight:600' : '';
      const family = item.font === 'mono' ? `;font-family:${MONO}` : '';
      return `fill:${hex(item.ink)};font-size:${Math.round((item.size / PT_PER_MM) * 1000) / 1000}px${weight}${family}${anchor}`;
    }
  }
}

function shape(item: Exclude<SheetItem, LineItem>, cls: string): string {
  switch (item.type) {
    case 'rect':
      return `<rect class="${cls}" x="${n(item.x)}" y="${n(item.y)}" width="${n(item.w)}" height="${n(item.h)}"${item.tag ? ` data-tag="${escapeAttr(item.tag)}"` : ''}/>`;
    case 'polygon':
      return `<polygon class="${cls}" points="${item.points.map(([x, y]) => `${n(x)},${n(y)}`).join(' ')}"/>`;
    case 'text': {
      const turn = item.rotate === 90 ? ` transform="rotate(-90 ${n(item.x)} ${n(item.y)})"` : '';
      return `<text class="${cls}" x="${n(item.x)}" y="${n(item.y)}"${turn}>${escapeText(item.text)}</text>`;
    }
  }
}

/** The markup inside a page's <svg>. `prefix` makes its class names unique in the document. */
export function sheetPageSvg(page: SheetPage, prefix: string): string {
  const classes = new Map<string, string>();
  const classOf = (item: SheetItem) => {
    const style = styleOf(item);
    let cls = classes.get(style);
    if (!cls) classes.set(style, (cls = `${prefix}${classes.size.toString(36)}`));
    return cls;
  };
  const body: string[] = [];
  let run: LineItem[] = [];
  let runClass = '';
  const flush = () => {
    if (run.length) body.push(`<path class="${runClass}" d="${run.map((l) => `M${n(l.x1)} ${n(l.y1)}L${n(l.x2)} ${n(l.y2)}`).join('')}"/>`);
    run = [];
  };
  for (const item of page.items) {
    const cls = classOf(item);
    if (item.type === 'line' && !item.tag) {
      if (run.length && cls !== runClass) flush();
      run.push(item);
      runClass = cls;
      continue;
    }
    flush();
    if (item.type === 'line') {
      // A tagged line (a dimension) stays its own element, so tests and tools can find it.
      body.push(`<line class="${cls}" x1="${n(item.x1)}" y1="${n(item.y1)}" x2="${n(item.x2)}" y2="${n(item.y2)}" data-tag="${escapeAttr(item.tag!)}"/>`);
    } else body.push(shape(item, cls));
  }
  flush();
  const rules = [...classes].map(([style, cls]) => `.${cls}{${style}}`).join('');
  return `<style>${rules}</style>${body.join('')}`;
}
