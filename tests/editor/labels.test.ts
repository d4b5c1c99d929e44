// Module labels on the plan: the longest form of the name that fits (full, short, abbreviation,
// none — never a word cut with an ellipsis), and the size written where it never covers the name.
// Text is measured with the product's own face metrics (lib/sheet/font-metrics, generated from
// fonts/*.woff), the faces the canvas draws with.
import { describe, expect, it } from 'vitest';
import { boxesOverlap, LABEL_LOOK, labelNames, placeModuleLabel, placePlanLabels, rememberedWidths, type PlanLabelItem, type MeasureText, type TextBox } from '@/components/editor/geometry/labels';
import { ABBREVIATION_MAX, KIND_SHORT_NAMES, SHORT_NAME_MAX } from '@/lib/symbols/kind-short-names';
import { MODULE_KINDS } from '@/lib/layout/kinds';
import { textWidth } from '@/lib/sheet/typography';
import { markTextBoxes, openingMarks, POINT_RADIUS_PX, type OpeningMark } from '@/components/editor/geometry/openingMarks';
import { bayWords, dimensionTextPlace, planLineBoxes, planTextBoxes } from '@/components/editor/geometry/planWords';
import { labelRequestOf } from '@/components/editor/canvas/moduleSymbols';
import { starterLayout } from '@/lib/layout/templates';
import { inArrangement } from '@/lib/layout/bay';

// textWidth answers mm for a size in pt; the same em widths at a size in px give px: × 72 / 25.4.
const measure: MeasureText = (text, face, size) => (textWidth(text, size, face === 'mono' ? 'mono' : 'sans') * 72) / 25.4;

// The fitted zoom worked by hand: a 3400 × 1780 mm bay in a 900 × 620 px plan box with the 72 px
// fit margin on each side: min((900 − 144) / 3400, (620 − 144) / 1780) = min(0.2224, 0.2674) px/mm.
const FITTED = 756 / 3400;

const counter = { full: 'Kitchen counter', short: KIND_SHORT_NAMES['kitchen-counter'].short, abbreviation: KIND_SHORT_NAMES['kitchen-counter'].abbreviation };
const bed = { full: 'Bed platform', short: KIND_SHORT_NAMES['bed-platform'].short, abbreviation: KIND_SHORT_NAMES['bed-platform'].abbreviation };

function inside(b: TextBox, w: number, h: number) {
  return b.cx - b.width / 2 >= 0 && b.cx + b.width / 2 <= w && b.cy - b.height / 2 >= 0 && b.cy + b.height / 2 <= h;
}

describe('module labels on the plan', () => {
  it('a 300 mm worktop at the fitted zoom reads its short name, its size clear of it', () => {
    // 300 × 600 mm → 66.7 × 133.4 px: "Kitchen counter" at 11 px is wider than 66.7 − 2 × 4 px.
    const w = 300 * FITTED, h = 600 * FITTED;
    const p = placeModuleLabel({ width: w, height: h, names: counter, dimension: '300 × 600 mm' }, measure);
    expect(p.nameForm).toBe('short');
    expect(p.name?.text).toBe('Counter');
    expect(p.name && inside(p.name, w, h)).toBe(true);
    expect(p.dimension).not.toBeNull();
    expect(boxesOverlap(p.name!, p.dimension!)).toBe(false);
    expect(p.name!.text).not.toContain('…');
  });

  it('a worktop labelled by the designer shortens to the label’s first word, never to a cut word', () => {
    const names = labelNames('Worktop over fridge', 'Kitchen counter', KIND_SHORT_NAMES['kitchen-counter']);
    expect(names).toEqual({ full: 'Worktop over fridge', short: 'Worktop', abbreviation: 'CTR' });
    // 300 × 500 mm at the fitted zoom: 66.7 × 111.2 px; the full label is far wider than 58.7 px.
    const p = placeModuleLabel({ width: 300 * FITTED, height: 500 * FITTED, names, dimension: '300 × 500 mm' }, measure);
    expect(p.name?.text).toBe('Worktop');
    expect(boxesOverlap(p.name!, p.dimension!)).toBe(false);
    expect(labelNames('  ', 'Kitchen counter', KIND_SHORT_NAMES['kitchen-counter']).full).toBe('Kitchen counter');
  });

  it('a 2000 mm bed at the fitted zoom reads its full name with its size below', () => {
    // 2000 × 1400 mm → 444.7 × 311.3 px: room for everything.
    const w = 2000 * FITTED, h = 1400 * FITTED;
    const p = placeModuleLabel({ width: w, height: h, names: bed, dimension: '2000 × 1400 mm' }, measure);
    expect(p.nameForm).toBe('full');
    expect(p.name?.text).toBe('Bed platform');
    expect(p.dimensionPlace).toBe('below');
    expect(p.dimension!.cy).toBeGreaterThan(p.name!.cy);
  });

  it('turns the size along a tall narrow module, and puts it outside on a leader when even that fails', () => {
    // 40 px wide, 200 px tall: the 10 px size (13 px line) fits turned, not across.
    const tall = placeModuleLabel({ width: 40, height: 200, names: counter, dimension: '300 × 1500 mm' }, measure);
    expect(tall.dimensionPlace).toBe('along');
    expect(tall.dimension!.rotation).toBe(-90);
    // 30 × 30 px: nothing but perhaps the abbreviation inside; the size hangs off the right edge.
    const small = placeModuleLabel({ width: 30, height: 30, names: counter, dimension: '300 × 300 mm' }, measure);
    expect(small.dimensionPlace).toBe('outside');
    expect(small.dimension!.cx - small.dimension!.width / 2).toBeGreaterThan(30);
    expect(small.leader).toEqual({ x0: 30, y0: 15, x1: 30 + LABEL_LOOK.leader, y1: 15 });
  });

  it('never lets the name and the size overlap, nor the name leave the module, across a grid of sizes', () => {
    let checked = 0;
    for (let w = 4; w <= 420; w += 7) {
      for (let h = 4; h <= 420; h += 11) {
        for (const names of [counter, bed, { full: 'Fresh water tank', short: 'Fresh', abbreviation: 'FW' }]) {
          const p = placeModuleLabel({ width: w, height: h, names, dimension: `${Math.round(w / FITTED)} × ${Math.round(h / FITTED)} mm` }, measure);
          if (p.name) {
            expect(inside(p.name, w, h), `name inside at ${w}×${h}`).toBe(true);
            expect([names.full, names.short, names.abbreviation]).toContain(p.name.text);
          }
          if (p.name && p.dimension) expect(boxesOverlap(p.name, p.dimension), `overlap at ${w}×${h}`).toBe(false);
          if (p.dimension && p.dimensionPlace !== 'outside') expect(inside(p.dimension, w, h)).toBe(true);
          checked++;
        }
      }
    }
    // Widths 4, 11, …, 417 (60 of them) × heights 4, 15, …, 411 (38) × 3 names.
    expect(checked).toBe(60 * 38 * 3);
  });

  it('gives every kind a short name and an abbreviation within their lengths', () => {
    for (const kind of MODULE_KINDS) {
      const s = KIND_SHORT_NAMES[kind];
      expect(s.short.length, kind).toBeGreaterThan(0);
      expect(s.short.length, kind).toBeLessThanOrEqual(SHORT_NAME_MAX);
      expect(s.abbreviation.length, kind).toBeGreaterThan(0);
      expect(s.abbreviation.length, kind).toBeLessThanOrEqual(ABBREVIATION_MAX);
    }
    expect(Object.keys(KIND_SHORT_NAMES).sort()).toEqual([...MODULE_KINDS].sort());
  });

  it('across the plan, a module’s label never covers another’s: the one on top keeps its label, the one below gives way', () => {
    // A 1200 × 600 mm counter with a 500 × 350 mm hob on it and a 1100 × 350 mm locker above
    // both, at 0.3 px/mm: 360 × 180 px, 150 × 105 px, 330 × 105 px. Draw order: counter, hob, locker.
    const k = 0.3;
    const item = (id: string, kind: 'kitchen-counter' | 'hob' | 'overhead-locker', title: string, x: number, y: number, l: number, w: number): PlanLabelItem =>
      ({ id, x: x * k, y: y * k, width: l * k, height: w * k, names: labelNames(undefined, title, KIND_SHORT_NAMES[kind]), dimension: `${l} × ${w} mm` });
    const items = [item('counter', 'kitchen-counter', 'Kitchen counter', 0, 0, 1200, 600), item('hob', 'hob', 'Hob', 100, 50, 500, 350), item('locker', 'overhead-locker', 'Overhead locker', 50, 0, 1100, 350)];
    const placed = placePlanLabels(items, measure);
    // The locker is drawn last (on top): it keeps its full name and its size.
    expect(placed.get('locker')!.nameForm).toBe('full');
    expect(placed.get('locker')!.dimensionPlace).not.toBe('none');
    const boxes = items.flatMap((it) => {
      const p = placed.get(it.id)!;
      return [p.name, p.dimension].filter((b) => b !== null).map((b) => ({ ...b, cx: b.cx + it.x, cy: b.cy + it.y }));
    });
    for (let i = 0; i < boxes.length; i++) for (let j = i + 1; j < boxes.length; j++) expect(boxesOverlap(boxes[i], boxes[j]), `${boxes[i].text} / ${boxes[j].text}`).toBe(false);
  });

  it('a crowded plan of random modules has no two labels overlapping', () => {
    // A fixed pseudo-random sequence (a linear congruential generator), so a failure repeats.
    let seed = 12345;
    const next = () => ((seed = (seed * 1103515245 + 12345) % 2 ** 31) / 2 ** 31);
    const items: PlanLabelItem[] = Array.from({ length: 200 }, (_, i) => {
      const kind = MODULE_KINDS[i % MODULE_KINDS.length];
      return { id: `m${i}`, x: next() * 900, y: next() * 500, width: 10 + next() * 300, height: 10 + next() * 200, names: labelNames(undefined, kind, KIND_SHORT_NAMES[kind]), dimension: '600 × 300 mm' };
    });
    const placed = placePlanLabels(items, measure);
    expect(placed.size).toBe(200);
    const boxes = items.flatMap((it) => {
      const p = placed.get(it.id)!;
      return [p.name, p.dimension].filter((b) => b !== null).map((b) => ({ ...b, cx: b.cx + it.x, cy: b.cy + it.y }));
    });
    expect(boxes.length).toBeGreaterThan(20);
    for (let i = 0; i < boxes.length; i++) for (let j = i + 1; j < boxes.length; j++) expect(boxesOverlap(boxes[i], boxes[j])).toBe(false);
  });
});

describe('module labels keep clear of the openings\u2019 words', () => {
  const onPlan = (placed: ReturnType<typeof placePlanLabels>, items: readonly PlanLabelItem[]) =>
    items.flatMap((it) => {
      const p = placed.get(it.id)!;
      return [p.name, p.dimension].filter((b) => b !== null).map((b) => ({ ...b, cx: b.cx + it.x, cy: b.cy + it.y }));
    });

  it('a word where the name would go moves the name off it, or drops it', () => {
    // A 2000 × 550 mm bench at the fitted zoom (444.7 × 122.3 px); its name is centred, its size below.
    const item: PlanLabelItem = { id: 'bench', x: 0, y: 0, width: 2000 * FITTED, height: 550 * FITTED, names: labelNames(undefined, 'Bench seat', KIND_SHORT_NAMES['bench-seat']), dimension: '2000 × 550 mm' };
    const alone = placePlanLabels([item], measure).get('bench')!;
    expect(alone.name).not.toBeNull();
    // A word written right over where the name went.
    const word: TextBox = { text: 'exhaust', cx: alone.name!.cx, cy: alone.name!.cy, width: 40, height: 12, rotation: 0 };
    const placed = placePlanLabels([item], measure, [word]);
    for (const b of onPlan(placed, [item])) expect(boxesOverlap(b, word), b.text).toBe(false);
    expect(placed.get('bench')).not.toEqual(alone);
  });

  it('a body point under the floor writes its word 10 px below its circle; both are boxes to keep clear of', () => {
    // An intake at 1000, 700 mm under the floor, at 0.25 px/mm: the circle at 250, 175 px, the word at 175 + 10 px.
    const intake: OpeningMark = { id: 'i', type: 'body-point', underside: true, at: { x: 1000, y: 700 }, foot: { x: 1000, y: 700 }, word: 'intake' };
    const [word, circle] = markTextBoxes([intake], 0.25, measure);
    expect(word).toMatchObject({ text: 'intake', cx: 250, cy: 185 });
    expect(word.width).toBeCloseTo(measure('intake', 'text', 9) + 4, 6);
    expect(circle).toMatchObject({ cx: 250, cy: 175, width: 2 * POINT_RADIUS_PX + 2, height: 2 * POINT_RADIUS_PX + 2 });
  });

  it('the bay writes its door words outside their walls and the cab word over the arrow; dimension values sit on the line, or beside it when short', () => {
    // A 3100 × 1800 mm bay with a right sliding door 150–1350 mm and rear doors 150–1650 mm, at 0.2 px/mm (5 mm a px).
    const bay = { length: 3100, width: 1800, bulkhead: true, doors: [{ id: 's', wall: 'right' as const, offset: 150, width: 1200 }, { id: 'r', wall: 'rear' as const, offset: 150, width: 1500 }] };
    expect(bayWords(bay, 5)).toEqual([
      { text: 'door', x: 750, y: 1800 + 18 * 5, turned: false },
      { text: 'rear doors', x: 3100 + 14 * 5, y: 900, turned: true },
      { text: 'cab', x: -22 * 5, y: 900 - 12 * 5, turned: false },
    ]);
    // 3100 mm at 0.2 px/mm is 620 px, room for a 50 px value and 12 px of line: on the line.
    expect(dimensionTextPlace({ role: 'overall', axis: 'x', from: 0, to: 3100, at: -170, value: 3100 }, 0.2, 50)).toEqual({ x: 1550, y: -170, beside: 0, turned: false });
    // 100 mm is 20 px: the value goes 9 px (45 mm) beside it; along y it reads turned, beside along −x.
    expect(dimensionTextPlace({ role: 'gap-lining', axis: 'y', from: 0, to: 100, at: 500, value: 100 }, 0.2, 50)).toEqual({ x: 455, y: 50, beside: -45, turned: true });
    // The overall dimension lines stand 34 px (170 mm) off the bay, with 4 px of overrun and tick
    // either side: the length's line along y = −170 mm, the width's along x = 3100 + 170 mm.
    expect(planLineBoxes({ bay }, 0.2)).toEqual([
      { text: '', cx: 310, cy: -34, width: (3100 + 40) * 0.2, height: 8, rotation: 0 },
      { text: '', cx: 654, cy: 180, width: 8, height: (1800 + 40) * 0.2, rotation: 0 },
    ]);
  });

  it('on both starter layouts, at every zoom from a phone\u2019s to a close look, no module label covers an opening\u2019s word or point, or crosses an overall dimension line', () => {
    // 0.10–0.40 px/mm: a 3100 mm bay across 310 px (a phone) to 1240 px. Without the plan's other
    // words as obstacles, the lounge starter's bench and heater labels and the touring starter's bed
    // size and roof panel label run over "exhaust", "intake", "vent" and "drop vent" in this range,
    // and on a phone the lounge starter's grey tank size over "rear doors" and the "1800 mm" width.
    // Without the overall dimension lines as obstacles, the electrics bay's "400 × 300 mm", set
    // outside it at the rear wall, runs across the width's line on a phone (0.10 px/mm).
    for (const name of ['starter-l-lounge', 'starter-rear-bed']) {
      const doc = starterLayout(name)!;
      for (let step = 0; step <= 15; step++) {
        const scale = 0.1 + step * 0.02;
        const words = planTextBoxes(doc, openingMarks(doc, 1 / scale), scale, 'mm', measure);
        expect(words.length).toBeGreaterThan(5);
        for (const arrangement of ['travel', 'lounge', 'sleep'] as const) {
          const items = doc.modules.filter((m) => inArrangement(m, arrangement)).map((m) => ({ id: m.id, x: m.x * scale, y: m.y * scale, ...labelRequestOf(m, { scale, units: 'mm' }) }));
          const lines = planLineBoxes(doc, scale);
          const boxes = onPlan(placePlanLabels(items, measure, [...words, ...lines]), items);
          expect(boxes.length).toBeGreaterThan(3);
          for (const b of boxes) for (const w of words) expect(boxesOverlap(b, w), `${name} at ${scale.toFixed(2)} px/mm, ${arrangement}: ${b.text} / ${w.text || 'a point'}`).toBe(false);
          for (const b of boxes) for (const l of lines) expect(boxesOverlap(b, l), `${name} at ${scale.toFixed(2)} px/mm, ${arrangement}: ${b.text} across an overall dimension line`).toBe(false);
        }
      }
    }
  });
});

describe('remembered text widths', () => {
  it('measures each text, face and size once, and answers as the measure did', () => {
    const asked: string[] = [];
    const measure: MeasureText = (text, face, size) => {
      asked.push(`${face} ${size} ${text}`);
      return text.length * size * (face === 'mono' ? 0.6 : 0.5);
    };
    const kept = rememberedWidths(measure);
    expect(kept('Galley', 'text', 11)).toBe(33);
    expect(kept('Galley', 'text', 11)).toBe(33);
    expect(kept('Galley', 'mono', 11)).toBeCloseTo(39.6);
    expect(kept('Galley', 'text', 10)).toBe(30);
    expect(asked).toEqual(['text 11 Galley', 'mono 11 Galley', 'text 10 Galley']);
  });

  it('keeps at most its limit, then starts again', () => {
    let calls = 0;
    const kept = rememberedWidths(() => ++calls, 3);
    for (const t of ['a', 'b', 'c']) kept(t, 'text', 11);
    kept('a', 'text', 11);
    expect(calls).toBe(3);
    kept('d', 'text', 11); // the fourth: forgets the three
    kept('a', 'text', 11);
    expect(calls).toBe(5);
  });

  it('places a plan the same with and without remembering', () => {
    const measure: MeasureText = (text, _face, size) => text.length * size * 0.55;
    const items: PlanLabelItem[] = Array.from({ length: 40 }, (_, i) => ({
      id: `m${i}`, x: (i % 8) * 70, y: Math.floor(i / 8) * 40, width: 60 + (i % 5) * 10, height: 30 + (i % 3) * 15,
      names: { full: `Cupboard number ${i}`, short: 'Cupboard', abbreviation: 'CB' }, dimension: `${600 + i} × 300`,
    }));
    const kept = rememberedWidths(measure);
    expect(placePlanLabels(items, kept)).toEqual(placePlanLabels(items, measure));
    expect(placePlanLabels(items, kept)).toEqual(placePlanLabels(items, measure)); // answered from what it kept
  });
});
