/**
 * Where a module's plan label goes: which form of its name fits the module as drawn (the full
 * name, then its short name, then its abbreviation, then none — never a cut word with an ellipsis),
 * and where its dimension text goes so that it never covers the name: below the name, turned to
 * run along a tall narrow module (still below the name), or outside the module on a leader. Works in screen pixels
 * relative to the module's drawn rectangle; text is measured by the caller's `measure`. Pure
 * math; never draws, never reads the store.
 */

export type LabelFace = 'text' | 'mono';
/** Width in px of `text` set in `face` at `sizePx`. */
export type MeasureText = (text: string, face: LabelFace, sizePx: number) => number;

/** Type sizes and spacing of a plan label, in screen px. */
export const LABEL_LOOK = { nameSize: 11, dimensionSize: 10, inset: 4, gap: 2, leader: 10, leading: 1.3, smallestWithSize: 12 } as const;

export interface TextBox {
  text: string;
  /** Centre of the text, px from the module rectangle's min corner. */
  cx: number;
  cy: number;
  /** The box the text covers (after rotation), px. */
  width: number;
  height: number;
  /** 0, or -90 for text read from below along a tall module. */
  rotation: 0 | -90;
}

export type NameForm = 'full' | 'short' | 'abbreviation' | 'none';
export type DimensionPlace = 'below' | 'along' | 'outside' | 'none';

export interface LabelPlacement {
  nameForm: NameForm;
  name: TextBox | null;
  dimensionPlace: DimensionPlace;
  dimension: TextBox | null;
  /** For a dimension outside the module: the leader from the module's edge to the text, px. */
  leader: { x0: number; y0: number; x1: number; y1: number } | null;
}

export interface LabelRequest {
  /** The module's drawn size, px. */
  width: number;
  height: number;
  names: { full: string; short: string; abbreviation: string };
  /** The size as it reads on the plan ("600 × 300 mm"); empty for none. */
  dimension: string;
}

/**
 * The three forms of a module's name: its own label (else its kind's title), then a short name —
 * the first word of its own label ("Worktop over fridge" → "Worktop"), else the kind's short name —
 * then the kind's abbreviation.
 */
export function labelNames(ownLabel: string | undefined, title: string, kindShort: { short: string; abbreviation: string }): LabelRequest['names'] {
  const own = ownLabel?.trim();
  return { full: own || title, short: own ? own.split(/\s+/)[0] : kindShort.short, abbreviation: kindShort.abbreviation };
}

interface Sized { text: string; w: number; h: number }

/** Whether two boxes share any area (touching edges do not count). */
export function boxesOverlap(a: TextBox, b: TextBox): boolean {
  return Math.abs(a.cx - b.cx) * 2 < a.width + b.width && Math.abs(a.cy - b.cy) * 2 < a.height + b.height;
}

export function placeModuleLabel(req: LabelRequest, measure: MeasureText): LabelPlacement {
  const { nameSize, dimensionSize, inset, gap, leader, leading } = LABEL_LOOK;
  const W = req.width, H = req.height;
  const innerW = W - 2 * inset, innerH = H - 2 * inset;
  const forms: [NameForm, string][] = [['full', req.names.full], ['short', req.names.short], ['abbreviation', req.names.abbreviation]];
  const sized = (text: string, face: LabelFace, size: number): Sized => ({ text, w: measure(text, face, size), h: size * leading });

  // The first form of the name that fits inside on its own.
  let nameForm: NameForm = 'none';
  let name: Sized | null = null;
  for (const [form, text] of forms) {
    if (!text) continue;
    const s = sized(text, 'text', nameSize);
    if (s.w <= innerW && s.h <= innerH) { nameForm = form; name = s; break; }
  }
  const dim = req.dimension ? sized(req.dimension, 'mono', dimensionSize) : null;
  const box = (s: Sized, cx: number, cy: number, rotation: 0 | -90 = 0): TextBox =>
    rotation === 0 ? { text: s.text, cx, cy, width: s.w, height: s.h, rotation } : { text: s.text, cx, cy, width: s.h, height: s.w, rotation };
  const result = (nameBox: TextBox | null, place: DimensionPlace, dimBox: TextBox | null, lead: LabelPlacement['leader'] = null): LabelPlacement =>
    ({ nameForm, name: nameBox, dimensionPlace: place, dimension: dimBox, leader: lead });

  if (!dim) return result(name ? box(name, W / 2, H / 2) : null, 'none', null);

  // Below the name (or alone in the middle when no name fits).
  const stackH = (name ? name.h + gap : 0) + dim.h;
  if (dim.w <= innerW && (!name || name.w <= innerW) && stackH <= innerH) {
    const top = H / 2 - stackH / 2;
    const nameBox = name ? box(name, W / 2, top + name.h / 2) : null;
    return result(nameBox, 'below', box(dim, W / 2, top + stackH - dim.h / 2));
  }
  // Turned to run along a tall narrow module, under the name.
  if (H > W && dim.h <= innerW) {
    const stack = (name ? name.h + gap : 0) + dim.w;
    if (stack <= innerH) {
      const top = H / 2 - stack / 2;
      const nameBox = name ? box(name, W / 2, top + name.h / 2) : null;
      return result(nameBox, 'along', box(dim, W / 2, top + stack - dim.w / 2, -90));
    }
  }
  // Outside, past the module's right-hand edge, on a short leader — unless the module is a sliver
  // on screen, where a string of sizes hanging off every one would only bury the plan.
  if (Math.min(W, H) < LABEL_LOOK.smallestWithSize) return result(name ? box(name, W / 2, H / 2) : null, 'none', null);
  const x0 = W, x1 = W + leader;
  return result(name ? box(name, W / 2, H / 2) : null, 'outside', box(dim, x1 + gap + dim.w / 2, H / 2), { x0, y0: H / 2, x1, y1: H / 2 });
}

/**
 * `measure` with its answers kept: the same names and sizes are measured on every redraw of the
 * plan, and setting a canvas font and measuring costs more than the placing. Keeps at most `limit`
 * widths, then starts again. Make a new one when the faces change (a font that has loaded).
 */
export function rememberedWidths(measure: MeasureText, limit = 4096): MeasureText {
  const known = new Map<string, number>();
  return (text, face, size) => {
    const key = `${face}\u0000${size}\u0000${text}`;
    let w = known.get(key);
    if (w === undefined) {
      if (known.size >= limit) known.clear();
      w = measure(text, face, size);
      known.set(key, w);
    }
    return w;
  };
}

export interface PlanLabelItem extends LabelRequest {
  id: string;
  /** The module's min corner on the plan, px (mm × scale; the viewport's pan plays no part). */
  x: number;
  y: number;
}

const NO_LABEL: LabelPlacement = { nameForm: 'none', name: null, dimensionPlace: 'none', dimension: null, leader: null };

/** Side of the cells the placed boxes are filed under, px. */
const CELL = 64;

/**
 * Labels for a whole plan, so that no two modules' labels cover each other (a hob on a counter,
 * a locker above them): modules are taken from the top of the draw order down, each gets the first
 * of these that is clear of the labels already placed — name and size, name alone, the next
 * shorter name alone — else none. `obstacles` (plan px, like the items) are what else is written
 * on the plan — the openings' words — and are kept clear of the same way. Placed boxes are filed
 * in a grid of cells; placed boxes never overlap, so a cell holds a bounded number and each module
 * costs a bounded number of tests.
 */
export function placePlanLabels(items: readonly PlanLabelItem[], measure: MeasureText, obstacles: readonly TextBox[] = []): Map<string, LabelPlacement> {
  const grid = new Map<string, TextBox[]>();
  const cellsOf = (b: TextBox, f: (key: string) => boolean | void): boolean => {
    const i0 = Math.floor((b.cx - b.width / 2) / CELL), i1 = Math.floor((b.cx + b.width / 2) / CELL);
    const j0 = Math.floor((b.cy - b.height / 2) / CELL), j1 = Math.floor((b.cy + b.height / 2) / CELL);
    for (let i = i0; i <= i1; i++) for (let j = j0; j <= j1; j++) if (f(`${i},${j}`)) return true;
    return false;
  };
  // On the plan, with the 2 px of paper drawn either side of the text.
  const onPlan = (b: TextBox, it: PlanLabelItem): TextBox => ({ ...b, cx: b.cx + it.x, cy: b.cy + it.y, width: b.width + 4 });
  const clashes = (b: TextBox) => cellsOf(b, (key) => grid.get(key)?.some((o) => boxesOverlap(o, b)));
  const file = (b: TextBox) => void cellsOf(b, (key) => { const list = grid.get(key); if (list) list.push(b); else grid.set(key, [b]); });

  for (const b of obstacles) file(b);
  const out = new Map<string, LabelPlacement>();
  for (let k = items.length - 1; k >= 0; k--) {
    const it = items[k];
    const { names } = it;
    // Each try, and what its name forms stand for in the module's own names.
    const tries: [LabelRequest, NameForm[]][] = [
      [it, ['full', 'short', 'abbreviation']],
      [{ ...it, dimension: '' }, ['full', 'short', 'abbreviation']],
      [{ ...it, names: { full: names.short, short: names.abbreviation, abbreviation: '' }, dimension: '' }, ['short', 'abbreviation', 'none']],
      [{ ...it, names: { full: names.abbreviation, short: '', abbreviation: '' }, dimension: '' }, ['abbreviation', 'none', 'none']],
    ];
    let placed: LabelPlacement = NO_LABEL;
    for (const [req, forms] of tries) {
      const p = placeModuleLabel(req, measure);
      const boxes = [p.name, p.dimension].filter((b): b is TextBox => b !== null).map((b) => onPlan(b, it));
      if (boxes.length === 0 || boxes.some(clashes)) continue;
      boxes.forEach(file);
      const at = (['full', 'short', 'abbreviation'] as const).indexOf(p.nameForm as 'full');
      placed = { ...p, nameForm: at < 0 ? 'none' : forms[at] };
      break;
    }
    out.set(it.id, placed);
  }
  return out;
}
