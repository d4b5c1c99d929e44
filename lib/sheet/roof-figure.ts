/**
 * The roof plan, to scale, seen from above and turned as the plans are (front to the left, x
 * rearwards to the right, the left side at the top): the roof's outline, its openings (vents,
 * fans, skylights: the frame with crossed diagonals, the way an opening is drawn in plan), the
 * modules mounted on the roof (roof boxes and the like as their outline; a solar panel — kind
 * `solar-panel` — with its cell grid; a kind whose name says rail hatched along its length), and
 * ordinate dimensions of every one of them from the front (above) and from the left side (left).
 * Pure: a document in, sheet items in paper mm out; must never render.
 */
import { formatLength } from '../layout/units';
import type { LayoutDoc, LengthUnit, Module } from '../layout';
import { mountOf } from '../layout/bay';
import { roofOpenings, ROOF_OPENING_WORDS } from '../layout/openings';
import { hatch, LINE, TYPE } from './drafting';
import { HORIZONTAL_ORDINATE_BAND, horizontalOrdinate, VERTICAL_ORDINATE_BAND, verticalOrdinate } from './ordinates';
import { onPaper } from './paper';
import { moduleNames, scheduleNumbers } from './plan-figure';
import type { SheetItem } from './primitives';
import { firstThatFits, notesThatFit } from './typography';

export const ROOF_TITLE = 'Roof plan';

/** Paper space around the roof: ordinates from the front (top) and the left side (left), the caption (bottom). */
export const ROOF_MARGIN = { left: Math.ceil(VERTICAL_ORDINATE_BAND) + 1, top: Math.ceil(HORIZONTAL_ORDINATE_BAND) + 1, right: 7, bottom: 8 } as const;

/**
 * A solar panel's cell pitch for its drawn grid, mm (common practice, no source: crystalline cells
 * are commonly 156–166 mm square; the grid shows it is a panel, not its exact cells).
 */
export const SOLAR_CELL_MM = 160;

export function roofSize(doc: Pick<LayoutDoc, 'bay'>, scale: number): { width: number; height: number } {
  return {
    width: ROOF_MARGIN.left + onPaper(doc.bay.length, scale) + ROOF_MARGIN.right,
    height: ROOF_MARGIN.top + onPaper(doc.bay.width, scale) + ROOF_MARGIN.bottom,
  };
}

/**
 * At most this many roof-mounted modules are drawn on the roof plan, each with its cell grid and
 * ordinates (a real roof carries a dozen or so things); the caption says how many are left out.
 * Our own drawing choice, as the elevations' ELEVATION_MODULE_LIMIT: it keeps the sheet bounded.
 */
export const ROOF_MODULE_LIMIT = 100;

/** Every module mounted on the roof, in schedule order. */
export function allRoofModules(doc: Pick<LayoutDoc, 'modules'>): Module[] {
  return doc.modules.filter((m) => mountOf(m) === 'roof');
}

/** The modules the roof plan draws: the first ROOF_MODULE_LIMIT mounted on the roof. */
export function roofModules(doc: Pick<LayoutDoc, 'modules'>): Module[] {
  return allRoofModules(doc).slice(0, ROOF_MODULE_LIMIT);
}

/** Kinds compared by name, so kinds added later (a solar panel, a roof rail) draw their own way without a change here. */
const isSolar = (m: Pick<Module, 'kind'>) => (m.kind as string) === 'solar-panel';
const isRail = (m: Pick<Module, 'kind'>) => /rail/.test(m.kind as string);

/** `noScale`: leave the scale out of the caption (on screen the drawing is scaled to its panel). */
export function drawRoof(doc: LayoutDoc, ox: number, oy: number, scale: number, units: LengthUnit, noScale = false): SheetItem[] {
  const { bay } = doc;
  const s = (mm: number) => onPaper(mm, scale);
  const bx = ox + ROOF_MARGIN.left;
  const by = oy + ROOF_MARGIN.top;
  const L = s(bay.length);
  const W = s(bay.width);
  const items: SheetItem[] = [];
  const xs: number[] = [];
  const ys: number[] = [];

  // Openings: the frame, crossed, and the kind in words where it fits.
  for (const o of roofOpenings(bay)) {
    const x = bx + s(o.x), y = by + s(o.y), w = s(o.length), h = s(o.width);
    items.push(
      { type: 'rect', x, y, w, h, fill: 'white', stroke: 'ink', width: LINE.medium, tag: `roof:opening:${o.id}` },
      { type: 'line', x1: x, y1: y, x2: x + w, y2: y + h, width: LINE.hair, ink: 'soft' },
      { type: 'line', x1: x + w, y1: y, x2: x, y2: y + h, width: LINE.hair, ink: 'soft' },
    );
    const word = firstThatFits([o.label, ROOF_OPENING_WORDS[o.kind], o.kind], TYPE.small, w - 1);
    if (word && h >= 4) items.push({ type: 'text', x: x + w / 2, y: y + h - 1, text: word, size: TYPE.small, align: 'center', ink: 'soft' });
    xs.push(o.x, o.x + o.length);
    ys.push(o.y, o.y + o.width);
  }

  // Modules on the roof.
  const numbers = scheduleNumbers(doc);
  for (const m of roofModules(doc)) {
    const x = bx + s(m.x), y = by + s(m.y), w = s(m.length), h = s(m.width);
    items.push({ type: 'rect', x, y, w, h, fill: 'white', stroke: 'ink', width: LINE.medium, tag: `roof:module:${m.id}` });
    if (isSolar(m)) {
      // The cell grid, at most 60 lines each way however large the panel.
      const along = Math.min(60, Math.max(1, Math.round(m.length / SOLAR_CELL_MM)));
      const across = Math.min(60, Math.max(1, Math.round(m.width / SOLAR_CELL_MM)));
      for (let i = 1; i < along; i++) items.push({ type: 'line', x1: x + (w * i) / along, y1: y, x2: x + (w * i) / along, y2: y + h, width: LINE.hair, ink: 'soft' });
      for (let j = 1; j < across; j++) items.push({ type: 'line', x1: x, y1: y + (h * j) / across, x2: x + w, y2: y + (h * j) / across, width: LINE.hair, ink: 'soft' });
    } else if (isRail(m)) {
      items.push(...hatch(x, y, w, h, 0.8, 0, 'soft'));
    }
    items.push({ type: 'rect', x, y, w, h, stroke: 'ink', width: LINE.medium });
    if (w >= 4 && h >= 3.5) {
      items.push({ type: 'rect', x: x + w / 2 - 2.4, y: y + h / 2 - 2.2, w: 4.8, h: 3.2, fill: 'white', stroke: 'ink', width: LINE.hair });
      items.push({ type: 'text', x: x + w / 2, y: y + h / 2 + 0.2, text: String(numbers.get(m.id)), size: TYPE.small, font: 'sans-bold', align: 'center' });
      const label = h >= 9 ? firstThatFits(moduleNames(m), TYPE.small, w - 1.5) : '';
      if (label) items.push({ type: 'text', x: x + w / 2, y: y + h / 2 + 3.8, text: label, size: TYPE.small, align: 'center', ink: 'soft' });
    } else {
      items.push({ type: 'text', x: x + w + 0.6, y: y + 2, text: String(numbers.get(m.id)), size: TYPE.small, font: 'sans-bold' });
    }
    xs.push(m.x, m.x + m.length);
    ys.push(m.y, m.y + m.width);
  }

  // The roof's outline (the bare-metal skin), heavy; the front edge is the datum of the ordinates along.
  items.push(
    { type: 'line', x1: bx, y1: by, x2: bx + L, y2: by, width: LINE.heavy, ink: 'ink', tag: 'roof:left-edge' },
    { type: 'line', x1: bx, y1: by + W, x2: bx + L, y2: by + W, width: LINE.heavy, ink: 'ink', tag: 'roof:right-edge' },
    { type: 'line', x1: bx, y1: by, x2: bx, y2: by + W, width: LINE.heavy, ink: 'ink', tag: 'roof:front-edge' },
    { type: 'line', x1: bx + L, y1: by, x2: bx + L, y2: by + W, width: LINE.heavy, ink: 'ink', tag: 'roof:rear-edge' },
  );

  // From the front edge (above) and from the left edge (left), to every opening's and mount's edges.
  const along = horizontalOrdinate({ stations: [...xs, bay.length], datum: bx, direction: 1, edge: by, side: -1, toPaper: s, units, tag: 'roof:from-front' });
  const acrossRun = verticalOrdinate({ stations: [...ys, bay.width], datum: by, direction: 1, edge: bx, side: -1, toPaper: s, units, tag: 'roof:from-left' });
  items.push(...along.items, ...acrossRun.items);

  const cy = by + W + 4.5;
  items.push({ type: 'text', x: bx, y: cy, text: ROOF_TITLE, size: TYPE.caption, font: 'sans-bold' });
  const onRoof = allRoofModules(doc).length;
  const drawn = roofModules(doc).length;
  const counts = `${roofOpenings(bay).length} roof opening${roofOpenings(bay).length === 1 ? '' : 's'}, ${onRoof} on the roof`;
  const leftOut = onRoof > drawn ? `only the first ${drawn} of ${onRoof} on the roof drawn` : '';
  const leftOff = along.leftOff + acrossRun.leftOff;
  const notes = notesThatFit([
    { text: 'from above, front to the left', need: 1 },
    { text: counts, need: 2 },
    { text: leftOff ? `${leftOff} figure${leftOff === 1 ? '' : 's'} left off for room` : '', need: Infinity },
    { text: leftOut, need: Infinity },
    { text: `${formatLength(bay.length, units)} × ${formatLength(bay.width, units)}`, need: 3 },
    { text: noScale ? '' : `1:${scale}`, need: Infinity },
  ], TYPE.small, bx + L - ox);
  items.push({ type: 'text', x: bx + L, y: cy + 2.6, text: notes, size: TYPE.small, align: 'right', ink: 'soft' });
  return items;
}
