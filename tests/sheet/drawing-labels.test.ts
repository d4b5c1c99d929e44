// Labels and captions on the sheet's drawings (plan, elevations, roof plan) are never cut short with
// "…": a label falls back to a shorter name or to none (the schedule number still names the thing),
// and a caption leaves out its least needed notes before it would run past its figure.
import { describe, expect, it } from 'vitest';
import { emptyLayout, starterLayout, type LayoutDoc, type Module } from '@/lib/layout';
import { drawRoof, roofSize } from '@/lib/sheet/roof-figure';
import { drawElevation, elevationSize } from '@/lib/sheet/elevation-figure';
import { drawPlan, moduleNames } from '@/lib/sheet/plan-figure';
import { firstThatFits, notesThatFit, textWidth } from '@/lib/sheet/typography';
import type { SheetItem, TextItem } from '@/lib/sheet/primitives';

const texts = (items: SheetItem[]) => items.filter((i): i is TextItem => i.type === 'text');

describe('firstThatFits', () => {
  it('takes the first name that fits whole, else a shorter one, else none', () => {
    const size = 2.2;
    const long = 'Kitchen counter';
    const w = textWidth('Counter', size) + 0.01; // room for "Counter" and not for "Kitchen counter"
    expect(textWidth(long, size)).toBeGreaterThan(w);
    expect(firstThatFits([long, 'Counter', 'CTR'], size, w)).toBe('Counter');
    expect(firstThatFits([long, 'Counter', 'CTR'], size, textWidth('CTR', size))).toBe('CTR');
    expect(firstThatFits([long, 'Counter', 'CTR'], size, 0.5)).toBe('');
    expect(firstThatFits([undefined, '  ', 'Sink'], size, 100)).toBe('Sink');
  });
});

describe('notesThatFit', () => {
  const size = 2.2;
  const notes = [{ text: 'from above', need: 1 }, { text: '2 on the roof', need: 2 }, { text: '1:20', need: Infinity }];
  it('keeps every note when the line fits', () => {
    expect(notesThatFit(notes, size, 1000)).toBe('from above · 2 on the roof · 1:20');
  });
  it('leaves out the least needed first, and never one that is always kept', () => {
    const w = textWidth('2 on the roof · 1:20', size) + 0.01;
    expect(notesThatFit(notes, size, w)).toBe('2 on the roof · 1:20');
    expect(notesThatFit(notes, size, 1)).toBe('1:20');
  });
});

describe('the drawings never cut a name short', () => {
  /** A 3100 × 1800 × 2000 mm bay (our own test figures) with a narrow roof vent and two narrow roof modules. */
  function doc(): LayoutDoc {
    const base = emptyLayout('Labels', {
      length: 3100, width: 1800, height: 2000, wheelArches: [], bulkhead: true, cabSeats: 2, doors: [],
      openings: [{ id: 'v', type: 'roof-opening', kind: 'vent', x: 400, y: 450, length: 300, width: 300, frameHeight: 0 }],
    });
    const roof = (id: string, x: number, length: number): Module => ({ id, kind: 'solar-panel', x, y: 300, length, width: 670, elevation: 0, height: 35, facing: 'right', arrangements: ['travel', 'lounge', 'sleep'], mount: 'roof' } as Module);
    const counter = { id: 'c', kind: 'kitchen-counter', x: 0, y: 0, length: 300, width: 600, elevation: 0, height: 900, facing: 'right', arrangements: ['travel', 'lounge', 'sleep'] } as Module;
    return { ...base, modules: [roof('p1', 1000, 1480), roof('p2', 2600, 300), counter] };
  }

  it('at 1:50 (the on-screen scale), no text in the roof plan, the left elevation or the plan holds "…"', () => {
    const d = doc();
    const items = [...drawRoof(d, 0, 0, 50, 'mm', true), ...drawElevation(d, 'left', 0, 0, 50, 'mm', { noScale: true }), ...drawPlan(d, 'lounge', 0, 0, 50, 'mm')];
    const cut = texts(items).filter((t) => t.text.includes('…'));
    expect(cut.map((t) => t.text)).toEqual([]);
  });

  it('names the narrow roof vent by its short word and a 300 mm panel by a name that fits', () => {
    const roof = texts(drawRoof(doc(), 0, 0, 20, 'mm'));
    // At 1:20 the 300 mm vent is 15 mm wide: "Roof vent" fits in 14 mm at the small size.
    expect(roof.some((t) => t.text === 'Roof vent')).toBe(true);
    expect(moduleNames({ kind: 'solar-panel' })[0]).toBe('Solar panel');
  });

  it('keeps the roof plan caption inside its figure', () => {
    const d = doc();
    const size = roofSize(d, 50);
    const caption = texts(drawRoof(d, 0, 0, 50, 'mm', true)).find((t) => t.text.includes('on the roof'))!;
    expect(caption.x - textWidth(caption.text, caption.size)).toBeGreaterThanOrEqual(-0.01);
    expect(caption.x).toBeLessThanOrEqual(size.width);
  });

  it('the starter layouts draw the same at 1:20 (labels that fit are unchanged)', () => {
    const s = starterLayout('starter-rear-bed')!;
    expect(texts(drawPlan(s, 'lounge', 0, 0, 20, 'mm')).filter((t) => t.text.includes('…'))).toEqual([]);
    expect(elevationSize(s, 'left', 20).width).toBeGreaterThan(0);
  });
});
