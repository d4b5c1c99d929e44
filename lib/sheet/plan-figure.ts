/**
 * The dimensioned plan of one arrangement, drawn to scale for the sheet: bare metal as a heavy
 * line with door openings as gaps, the wall build-up band lightly hatched, wheel arches
 * cross-hatched, each module in its material family's hatching with its schedule number, the
 * overall length and width as dimension strings, running dimensions from the front along both
 * walls (lib/sheet/running-dimensions.ts), the key clearances as the checks measured them
 * (lib/sheet/clearances.ts), the bay's openings (lib/sheet/plan-openings.ts), and the cab marked at the front. Cab on the
 * left, x rearwards to the right, the left wall at the top (as in the editor).
 * Pure: a document in, sheet items out; must never render or measure the page.
 */
import { KINDS, kindSpec } from '../layout/kinds';
import { formatLength } from '../layout/units';
import type { Arrangement, LayoutDoc, LengthUnit, Module } from '../layout';
import { dimension, hatch, LINE, stipple, TYPE } from './drafting';
import { onPaper } from './paper';
import type { SheetItem } from './primitives';
import { firstThatFits } from './typography';
import { KIND_SHORT_NAMES } from '../symbols/kind-short-names';
import { symbolItems } from './module-symbol';
import { archBoxes, buildUpThickness, modulesIn, mountedInside, sectionReach } from '../layout/bay';
import type { CheckReport } from '../checks/types';
import { runningDimension, RUN_BAND } from './running-dimensions';
import { clearanceItems } from './clearances';
import { planOpeningItems } from './plan-openings';

/**
 * Paper space around the bay: the width dimension (left), the left wall's running dimension and
 * the overall length (top), the right wall's running dimension, the caption and the clearances
 * line (bottom).
 */

/**
 * A module's names for a drawing's label, longest first: its label, its kind's title, the kind's
 * short name and abbreviation (lib/symbols/kind-short-names.ts); a kind this build does not know is
 * named by its id. The label shown is the first that fits (`firstThatFits`), never one cut short.
 */
export function moduleNames(m: Pick<Module, 'kind' | 'label'>): string[] {
  const known = (KIND_SHORT_NAMES as Record<string, { short: string; abbreviation: string } | undefined>)[m.kind];
  const title = (KINDS as Record<string, { title: string } | undefined>)[m.kind]?.title ?? String(m.kind);
  return [m.label, title, known?.short, known?.abbreviation].filter((n): n is string => Boolean(n && n.trim()));
}
export const PLAN_MARGIN = { left: 13, top: RUN_BAND + 5, right: 7, bottom: RUN_BAND + 8.1 } as const;

/**
 * Above this many modules the material hatching is left out: the drawing would be a grey mass,
 * and the PDF slow to make (measured: ~75 strokes per hatched module). Outlines and numbers stay.
 */
export const HATCH_MODULE_LIMIT = 300;

/** The dash of an outside module's outline (long dashes), mm on paper: the section draws it alike. */
/** Outside the body: a chain line (long dash, short dash), as the editor draws it. */
export const OUTSIDE_DASH: readonly number[] = [2.4, 0.5, 0.4, 0.5];

/**
 * Modules one figure (a plan or the section) draws, the first by schedule number (common practice,
 * no source: a van holds tens of modules, and 150 already fill a plan edge to edge). Beyond it a
 * note under the figure says how many more are left out, so a layout of thousands of modules cannot
 * make a sheet that takes seconds to draw or megabytes to send. The print view page carries its
 * markup twice (the HTML and the server components' payload that hydrates it), so the markup of
 * the worst layouts in tests/hardening/hostile-work.test.ts must stay under half of the 2 MB an
 * answer may be: 150 (down from 800, and 1,000 before the sheet drew elevations and the roof plan).
 */
export const FIGURE_MODULE_LIMIT = 150;

/** The modules a figure draws (in schedule order) and how many it leaves out. */
export function drawnModules<M>(modules: M[]): { drawn: M[]; leftOut: number } {
  return { drawn: modules.slice(0, FIGURE_MODULE_LIMIT), leftOut: Math.max(0, modules.length - FIGURE_MODULE_LIMIT) };
}

/** The note under a figure that leaves modules out. */
export function leftOutNote(count: number, leftOut: number, figure: 'plan' | 'section'): string {
  return `Only the first ${count - leftOut} of ${count} modules are drawn; ${leftOut} more are left out of this ${figure}.`;
}

export const ARRANGEMENT_CAPTION: Record<Arrangement, string> = {
  travel: 'Travel: driving, belted seats in use',
  lounge: 'Lounge: parked, daytime',
  sleep: 'Sleep: beds made up',
};

/** How far modules behind the rear doors reach past the bay's rear, mm (0 when none). */
export function rearReach(doc: LayoutDoc): number {
  return Math.max(0, sectionReach(doc, 0).behind);
}

export function planSize(doc: LayoutDoc, scale: number): { width: number; height: number } {
  return {
    width: PLAN_MARGIN.left + onPaper(doc.bay.length + rearReach(doc), scale) + PLAN_MARGIN.right,
    height: PLAN_MARGIN.top + onPaper(doc.bay.width, scale) + PLAN_MARGIN.bottom,
  };
}

/** Schedule numbers: the module's position in the document, from 1, so plan and table agree. */
export function scheduleNumbers(doc: LayoutDoc): Map<string, number> {
  return new Map(doc.modules.map((m, i) => [m.id, i + 1]));
}

export function drawPlan(doc: LayoutDoc, arrangement: Arrangement, ox: number, oy: number, scale: number, units: LengthUnit, report: CheckReport | null = null): SheetItem[] {
  const { bay } = doc;
  const s = (mm: number) => onPaper(mm, scale);
  const bx = ox + PLAN_MARGIN.left;
  const by = oy + PLAN_MARGIN.top;
  const L = s(bay.length);
  const W = s(bay.width);
  const wallT = s(buildUpThickness(doc).wallT);
  const items: SheetItem[] = [];

  // Build-up band along both side walls (the lined interior runs from wallT to width − wallT).
  if (wallT > 0) {
    for (const y of [by, by + W - wallT]) {
      items.push(...hatch(bx, y, L, wallT, 0.9, 45, 'faint'));
      items.push({ type: 'rect', x: bx, y, w: L, h: wallT, stroke: 'soft', width: LINE.hair });
    }
  }

  // Wheel arches, cross-hatched.
  for (const { rect: r } of archBoxes(doc)) {
    const x = bx + s(r.x0);
    const y = by + s(r.y0);
    const w = s(r.x1 - r.x0);
    const h = s(r.y1 - r.y0);
    items.push(...hatch(x, y, w, h, 1.2, 45, 'soft'), ...hatch(x, y, w, h, 1.2, -45, 'soft'));
    items.push({ type: 'rect', x, y, w, h, stroke: 'ink', width: LINE.thin });
  }

  // Modules present in this arrangement.
  const numbers = scheduleNumbers(doc);
  // Floor-standing modules first, highest last: what hangs overhead is drawn dashed on top; those
  // outside the body (chain-lined) over all of them.
  const inArrangement = modulesIn(doc, arrangement);
  const { drawn, leftOut } = drawnModules(inArrangement);
  const present = drawn.sort((a, b) => Number(!mountedInside(a)) - Number(!mountedInside(b)) || a.elevation - b.elevation);
  for (const m of present) {
    items.push(...drawModule(m, bx + s(m.x), by + s(m.y), s(m.length), s(m.width), numbers.get(m.id) ?? 0, doc.modules.length <= HATCH_MODULE_LIMIT));
  }

  // Bare metal: heavy outline with the door openings left as gaps.
  items.push(...bareMetal(doc, bx, by, L, W, s));
  // Windows on the wall lines, roof openings dashed overhead, body points as marks.
  items.push(...planOpeningItems(doc, bx, by, s));

  // Cab arrow at the front.
  items.push(
    { type: 'polygon', points: [[bx - 7.5, by + W / 2], [bx - 4.5, by + W / 2 - 1.6], [bx - 4.5, by + W / 2 + 1.6]], fill: 'ink' },
    { type: 'text', x: bx - 6, y: by + W / 2 + 4.5, text: 'cab', size: TYPE.small, align: 'center', ink: 'soft' },
  );

  // Running dimensions from the front along each wall: the left wall above the plan, the right below.
  const geometry = { bx, bayLength: bay.length, bayWidth: bay.width, toPaper: s, units };
  const left = runningDimension(present, 'left', { ...geometry, wallY: by, tag: `dimension:running-left:${arrangement}` });
  const right = runningDimension(present, 'right', { ...geometry, wallY: by + W, tag: `dimension:running-right:${arrangement}` });
  items.push(...left.items, ...right.items);

  // Key clearances, as the checks measured them.
  const clearances = clearanceItems(doc, arrangement, report, { bx, by, toPaper: s, units });
  items.push(...clearances.items);

  // Overall dimensions: length above (beyond the running dimension), width at the left.
  items.push(...dimension({ from: [bx, by], to: [bx + L, by], offset: RUN_BAND + 1.6, text: formatLength(bay.length, units), tag: `dimension:bay-length:${arrangement}` }));
  items.push(...dimension({ from: [bx, by], to: [bx, by + W], offset: 9, text: formatLength(bay.width, units), tag: `dimension:bay-width:${arrangement}` }));

  // Caption, under the right wall's running dimension.
  const count = inArrangement.length;
  const cy = by + W + RUN_BAND + 3.2;
  items.push({ type: 'text', x: bx, y: cy, text: `${ARRANGEMENT_CAPTION[arrangement]}`, size: TYPE.caption, font: 'sans-bold' });
  const note = doc.modules.length > HATCH_MODULE_LIMIT ? ' · hatching left out (many modules)' : '';
  items.push({ type: 'text', x: bx + L, y: cy, text: `${count} module${count === 1 ? '' : 's'}${note} · plan 1:${scale}`, size: TYPE.small, align: 'right', ink: 'soft' });
  const notes = [clearances.line, left.leftOff + right.leftOff > 0 ? `${left.leftOff + right.leftOff} running figures left off for room: positions are in the schedule` : '']
    .filter(Boolean).join(' · ');
  if (notes) items.push({ type: 'text', x: bx, y: cy + 2.8, text: notes, size: TYPE.small, ink: 'soft' });
  if (leftOut > 0) items.push({ type: 'text', x: bx, y: cy + 5.6, text: leftOutNote(count, leftOut, 'plan'), size: TYPE.small, ink: 'soft' });
  return items;
}

function bareMetal(doc: LayoutDoc, bx: number, by: number, L: number, W: number, s: (mm: number) => number): SheetItem[] {
  const items: SheetItem[] = [];
  const gaps = (wall: 'left' | 'right' | 'rear') => doc.bay.doors.filter((d) => d.wall === wall).map((d) => [s(d.offset), s(d.offset + d.width)] as [number, number]);
  const run = (length: number, cuts: [number, number][], seg: (a: number, b: number) => void) => {
    let at = 0;
    for (const [a, b] of [...cuts].sort((p, q) => p[0] - q[0])) {
      if (a > at) seg(at, a);
      at = Math.max(at, b);
    }
    if (at < length) seg(at, length);
  };
  const heavy = (x1: number, y1: number, x2: number, y2: number) => items.push({ type: 'line', x1, y1, x2, y2, width: LINE.heavy, ink: 'ink' });
  run(L, gaps('left'), (a, b) => heavy(bx + a, by, bx + b, by));
  run(L, gaps('right'), (a, b) => heavy(bx + a, by + W, bx + b, by + W));
  run(W, gaps('rear'), (a, b) => heavy(bx + L, by + a, bx + L, by + b));
  // The front: a bulkhead is a wall; an open cab end is drawn dashed.
  items.push({ type: 'line', x1: bx, y1: by, x2: bx, y2: by + W, width: doc.bay.bulkhead ? LINE.heavy : LINE.thin, ink: 'ink', dash: doc.bay.bulkhead ? undefined : [1.5, 1] });
  // Door marks: a sliding door's track outside its wall; a rear door's two leaves swung open.
  for (const d of doc.bay.doors) {
    const a = s(d.offset);
    const b = s(d.offset + d.width);
    if (d.wall === 'left' || d.wall === 'right') {
      const y = d.wall === 'left' ? by - 1.2 : by + W + 1.2;
      items.push({ type: 'line', x1: bx + a, y1: y, x2: bx + b, y2: y, width: LINE.thin, ink: 'soft', dash: [1.2, 0.8] });
      items.push({ type: 'line', x1: bx + a, y1: d.wall === 'left' ? by : by + W, x2: bx + a, y2: y, width: LINE.thin, ink: 'soft' });
    } else {
      // Two leaves hinged at the ends of the opening, drawn ajar: a short swing mark each.
      const mid = (a + b) / 2;
      for (const [hinge, toward] of [[a, mid], [b, mid]] as [number, number][]) {
        const mark = Math.min(Math.abs(toward - hinge) * 0.4, 4.5);
        const dir = Math.sign(toward - hinge);
        items.push({ type: 'line', x1: bx + L, y1: by + hinge, x2: bx + L + mark * 0.8, y2: by + hinge + dir * mark * 0.6, width: LINE.thin, ink: 'soft' });
      }
    }
  }
  return items;
}

function drawModule(m: Module, x: number, y: number, w: number, h: number, number: number, hatched: boolean): SheetItem[] {
  const family = kindSpec(m.kind).family;
  if (!mountedInside(m)) {
    // Outside the body (under the floor, on the roof, behind the rear doors): a chain-lined medium
    // outline, as in the section, whatever its elevation.
    return [{ type: 'rect', x, y, w, h, stroke: 'ink', width: LINE.medium, dash: OUTSIDE_DASH, tag: `plan:mounted:${m.mount}:${m.id}` }, ...numberTag(m, x, y, w, h, number)];
  }
  if (m.elevation >= 1000) {
    // Hangs overhead: outline only, dashed, so what stands below stays readable.
    return [
      { type: 'rect', x, y, w, h, stroke: 'ink', width: LINE.thin, dash: [1.2, 0.8] },
      { type: 'text', x: x + 0.8, y: y + 2.6, text: String(number), size: TYPE.small, font: 'sans-bold', ink: 'soft' },
    ];
  }
  const outline = family === 'electrics' ? { stroke: 'ink' as const, width: LINE.medium, dash: [0.4, 0.6] as [number, number] } : { stroke: 'ink' as const, width: LINE.medium };
  if (!hatched) {
    // Nothing goes between the white ground and the outline: one rectangle, filled then stroked.
    const items: SheetItem[] = [{ type: 'rect', x, y, w, h, fill: 'white', ...outline }];
    if (family === 'gas' && w > 1.6 && h > 1.6) items.push({ type: 'rect', x: x + 0.6, y: y + 0.6, w: w - 1.2, h: h - 1.2, stroke: 'ink', width: LINE.thin });
    items.push(...numberTag(m, x, y, w, h, number));
    return items;
  }
  const items: SheetItem[] = [{ type: 'rect', x, y, w, h, fill: 'white' }];
  switch (family) {
    case 'timber':
      items.push(...hatch(x, y, w, h, 1.4, 45, 'faint'));
      break;
    case 'upholstery':
      items.push(...stipple(x, y, w, h, 2.4));
      break;
    default:
      break;
  }
  items.push({ type: 'rect', x, y, w, h, ...outline });
  if (family === 'gas' && w > 1.6 && h > 1.6) items.push({ type: 'rect', x: x + 0.6, y: y + 0.6, w: w - 1.2, h: h - 1.2, stroke: 'ink', width: LINE.thin });
  // The kind's symbol, from the table the editor draws too.
  items.push(...symbolItems(m, x, y, w / m.length));
  items.push(...numberTag(m, x, y, w, h, number));
  return items;
}

/** Schedule number in a white tag, and a short label when there is room. */
function numberTag(m: Module, x: number, y: number, w: number, h: number, number: number): SheetItem[] {
  const items: SheetItem[] = [];
  const tag = String(number);
  const cx = x + w / 2;
  const cy = y + h / 2;
  if (w >= 4 && h >= 3.5) {
    items.push({ type: 'rect', x: cx - 2.4, y: cy - 2.2, w: 4.8, h: 3.2, fill: 'white', stroke: 'ink', width: LINE.hair });
    items.push({ type: 'text', x: cx, y: cy + 0.2, text: tag, size: TYPE.small, font: 'sans-bold', align: 'center' });
    const label = firstThatFits(moduleNames(m), TYPE.small, w - 1.5);
    if (h >= 9 && label) items.push({ type: 'text', x: cx, y: cy + 3.8, text: label, size: TYPE.small, align: 'center', ink: 'soft' });
  } else {
    items.push({ type: 'text', x: x + w + 0.6, y: y + 2, text: tag, size: TYPE.small, font: 'sans-bold' });
  }
  return items;
}
