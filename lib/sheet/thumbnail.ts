/**
 * A layout's plan thumbnail: a small SVG drawn from the document alone (never a stored picture) —
 * the bare-metal outline, the lined interior, the wheel arches, the cab arrow, and the modules of
 * one arrangement filled by material family. No text, so nothing from the document reaches the
 * markup but numbers. Bounded like the print view: at most `THUMBNAIL_MODULE_LIMIT` modules, one
 * path per family. Pure: must never read the database, React or the DOM.
 */
import type { Arrangement, LayoutDoc } from '../layout/schema';
import { archBoxes, linedInterior, modulesIn } from '../layout/bay';
import { kindSpec, type MaterialFamily } from '../layout/kinds';
import { palette } from '../look';

/** A thumbnail draws at most this many modules (a plan sheet figure draws 1,000). */
export const THUMBNAIL_MODULE_LIMIT = 400;

const FAMILY_FILL: Record<MaterialFamily, string> = {
  timber: palette.paperDeep,
  upholstery: palette.copperLight,
  water: palette.mossLight,
  electrics: palette.ochreLight,
  gas: palette.brickLight,
  appliance: palette.paperEdge,
  sanitary: palette.mossLight,
};

/** Whole millimetres: the document holds integers, but a hostile one may not. */
const n = (v: number) => (Number.isFinite(v) ? Math.round(v) : 0);

const rectPath = (x: number, y: number, w: number, h: number) => `M${n(x)} ${n(y)}h${n(w)}v${n(h)}h${n(-w)}z`;

export interface ThumbnailOptions {
  arrangement?: Arrangement;
  /** Drawn width in CSS pixels; the height follows the bay's proportions. */
  widthPx?: number;
}

/** The thumbnail's SVG markup, standalone (with its namespace), for an `<img>` or inline use. */
export function planThumbnailSvg(doc: LayoutDoc, options: ThumbnailOptions = {}): string {
  const arrangement = options.arrangement ?? 'travel';
  const widthPx = options.widthPx ?? 120;
  const length = Math.max(1, n(doc.bay.length));
  const width = Math.max(1, n(doc.bay.width));
  const pad = Math.round(Math.max(length, width) * 0.06);
  const stroke = Math.max(length, width) / 150;
  const heightPx = Math.max(1, Math.round((widthPx * (width + 2 * pad)) / (length + 2 * pad)));
  const lined = linedInterior(doc);
  const modules = modulesIn(doc, arrangement).slice(0, THUMBNAIL_MODULE_LIMIT);

  const byFamily = new Map<MaterialFamily, string[]>();
  for (const m of modules) {
    const family = kindSpec(m.kind).family;
    const list = byFamily.get(family) ?? [];
    list.push(rectPath(m.x, m.y, m.length, m.width));
    byFamily.set(family, list);
  }
  const arches = archBoxes(doc).map(({ rect: r }) => rectPath(r.x0, r.y0, r.x1 - r.x0, r.y1 - r.y0)).join('');
  const parts = [
    `<svg xmlns="http://www.w3.org/2000/svg" viewBox="${-pad} ${-pad} ${length + 2 * pad} ${width + 2 * pad}" width="${widthPx}" height="${heightPx}">`,
    `<rect x="${-pad}" y="${-pad}" width="${length + 2 * pad}" height="${width + 2 * pad}" fill="${palette.paper}"/>`,
    lined.y0 > 0 ? `<path d="${rectPath(lined.x0, lined.y0, lined.x1 - lined.x0, Math.max(0, lined.y1 - lined.y0))}" fill="none" stroke="${palette.inkFaint}" stroke-width="${n(stroke / 2)}"/>` : '',
    arches ? `<path d="${arches}" fill="${palette.paperEdge}" stroke="${palette.inkFaint}" stroke-width="${n(stroke / 2)}"/>` : '',
    ...[...byFamily].map(([family, paths]) => `<path d="${paths.join('')}" fill="${FAMILY_FILL[family]}" stroke="${palette.ink}" stroke-width="${n(stroke / 2)}"/>`),
    `<rect x="0" y="0" width="${length}" height="${width}" fill="none" stroke="${palette.ink}" stroke-width="${n(stroke * 1.5)}"/>`,
    // The cab is at x = 0.
    `<path d="M${n(-pad * 0.15)} ${n(width / 2 - pad * 0.4)}L${n(-pad * 0.8)} ${n(width / 2)}L${n(-pad * 0.15)} ${n(width / 2 + pad * 0.4)}z" fill="${palette.ink}"/>`,
    '</svg>',
  ];
  return parts.join('');
}

/** Drawn width of the editor's placeholder plan, CSS pixels: about the plan's width on a laptop. */
export const EDITOR_PREVIEW_WIDTH_PX = 960;

/**
 * The plan the editor and the viewer link show while their drawing loads: the thumbnail of the
 * arrangement the editor opens in (lounge), at about the size the editor will draw it.
 */
export function editorPreviewSvg(doc: LayoutDoc): string {
  return planThumbnailSvg(doc, { arrangement: 'lounge', widthPx: EDITOR_PREVIEW_WIDTH_PX });
}
