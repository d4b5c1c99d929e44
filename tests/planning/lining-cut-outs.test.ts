// The lining panels of the cut list and the cut-outs windows and roof openings make in them.
// Every figure is worked by hand below from an invented bay with round numbers. The rules are
// common practice, no source (lib/planning/lining-panels.ts): cut-outs are the glass size of a
// window and the size of a roof opening — our simplification; the real cut follows the frame
// maker's template.
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { CutListPanel } from '@/components/planning/cut/CutListPanel';
import { cutListFromDoc, cutOutWords, partAreaM2, planCutList, type CutPart } from '@/lib/planning';
import { emptyLayout, layoutDocSchema, type LayoutDoc, type LayoutDocInput } from '@/lib/layout';

type Openings = NonNullable<LayoutDocInput['bay']['openings']>;

/**
 * Bay 3000 long, 1800 wide, 2450 high (bare metal); a right-hand door at 150 mm, 1200 mm wide.
 * Floor build-up 20 mm, roof 30 mm: the wall lining runs from 20 up to 2450 − 30 = 2420, a rise of 2400.
 * Walls: 24 mm foam + 12 mm plywood lining (36 mm), so the roof is lined from y 36 to 1764 (1728 across).
 */
function bay(openings: Openings): LayoutDoc {
  const base = emptyLayout('Lining test', {
    length: 3000, width: 1800, height: 2450, wheelArches: [], bulkhead: true, cabSeats: 2,
    doors: [{ id: 'slide', wall: 'right', offset: 150, width: 1200 }],
    openings: [],
  });
  return layoutDocSchema.parse({
    ...base,
    bay: { ...base.bay, openings },
    buildUp: {
      floor: [{ material: 'Plywood', thickness: 20 }],
      roof: [{ material: 'Plywood lining', thickness: 30 }],
      walls: [{ material: 'Closed-cell foam', thickness: 24 }, { material: 'Plywood lining', thickness: 12 }],
    },
  });
}

/** 2440 × 1220 boards less 10 mm trim each side: usable 2420 × 1200, so wall panels are 1200 wide. */
const OPTIONS = { trimMm: 10, kerfMm: 3 };

const lining = (parts: CutPart[], surface: string) => parts.filter((p) => p.id.startsWith(`lining:${surface}-`));

describe('lining panels', () => {
  it('a window 800 × 400 in a 1200 × 2400 wall panel: 2.88 − 0.32 = 2.56 m², the cut-out placed from the panel edges', () => {
    // Left-wall window 300 mm from the front, sill 850 mm above the finished floor, glass 800 × 400.
    const doc = bay([{ id: 'w1', type: 'window', wall: 'left', position: 300, sillHeight: 850, width: 800, height: 400, opens: true }]);
    const left = lining(cutListFromDoc(doc, OPTIONS).parts, 'left');
    // Left wall 0…3000 in 1200 mm boards: 1200, 1200, 600 wide, each 2400 high.
    expect(left.map((p) => [p.width, p.length])).toEqual([[1200, 2400], [1200, 2400], [600, 2400]]);
    const first = left[0];
    expect(first.cutOuts).toEqual([
      // 300 from the panel's front edge; the panel's bottom is the finished floor, so 850 from its bottom edge.
      { openingId: 'w1', title: 'Window in the left wall', width: 800, height: 400, fromStart: 300, fromSecond: 850, edges: ['front edge', 'bottom edge'] },
    ]);
    // 1.2 m × 2.4 m = 2.88 m²; 0.8 m × 0.4 m = 0.32 m²; 2.88 − 0.32 = 2.56 m².
    expect(partAreaM2(first)).toBeCloseTo(2.56, 9);
    expect(left[1].cutOuts).toEqual([]);
    expect(partAreaM2(left[1])).toBeCloseTo(2.88, 9);
    expect(cutOutWords(first.cutOuts[0])).toBe('Window in the left wall: 800 × 400 mm, 300 mm from the front edge, 850 mm from the bottom edge');
  });

  it('a window straddling two panels splits its cut-out between them', () => {
    // Glass from 1000 to 1600 along the wall; the panels meet at 1200: 200 mm in the first, 400 mm in the second.
    const doc = bay([{ id: 'w2', type: 'window', label: 'Kitchen window', wall: 'left', position: 1000, sillHeight: 900, width: 600, height: 450, opens: true }]);
    const left = lining(cutListFromDoc(doc, OPTIONS).parts, 'left');
    expect(left[0].cutOuts).toMatchObject([{ width: 200, height: 450, fromStart: 1000, fromSecond: 900 }]);
    expect(left[1].cutOuts).toMatchObject([{ width: 400, height: 450, fromStart: 0, fromSecond: 900 }]);
    expect(left[2].cutOuts).toEqual([]);
    // 2.88 − 0.2 × 0.45 = 2.79 m² and 2.88 − 0.4 × 0.45 = 2.70 m².
    expect(partAreaM2(left[0])).toBeCloseTo(2.79, 9);
    expect(partAreaM2(left[1])).toBeCloseTo(2.7, 9);
    expect(cutOutWords(left[1].cutOuts[0])).toBe('Kitchen window: 400 × 450 mm, 0 mm from the front edge, 900 mm from the bottom edge');
  });

  it('the roof lining leaves out a roof opening at its own size, split where two strips meet', () => {
    // Vent at x 1100, y 500, 400 × 400. Roof strips 0…1200 and 1200…2400 along the van; lined from y 36.
    const doc = bay([{ id: 'v', type: 'roof-opening', kind: 'vent', x: 1100, y: 500, length: 400, width: 400, frameHeight: 40 }]);
    const roof = lining(cutListFromDoc(doc, OPTIONS).parts, 'roof');
    // Three strips 1200, 1200, 600 along, each 1728 across (1764 − 36).
    expect(roof.map((p) => [p.width, p.length])).toEqual([[1200, 1728], [1200, 1728], [600, 1728]]);
    // 100 mm of the vent in the first strip (1100…1200), 300 in the second; 500 − 36 = 464 from the left edge.
    expect(roof[0].cutOuts).toMatchObject([{ title: 'Roof vent', width: 100, height: 400, fromStart: 1100, fromSecond: 464, edges: ['front edge', 'left edge'] }]);
    expect(roof[1].cutOuts).toMatchObject([{ width: 300, height: 400, fromStart: 0, fromSecond: 464 }]);
    // 1.2 × 1.728 = 2.0736 m²; less 0.3 × 0.4 = 0.12 m² → 1.9536 m².
    expect(partAreaM2(roof[1])).toBeCloseTo(1.9536, 9);
  });

  it('door openings are left out of the wall lining; a window in the door cuts no wall panel', () => {
    const doc = bay([{ id: 'dw', type: 'window', wall: 'door', door: 'slide', position: 100, sillHeight: 900, width: 800, height: 500, opens: true }]);
    const right = lining(cutListFromDoc(doc, OPTIONS).parts, 'right');
    // Right wall 0…3000 less the door 150…1350: 0…150 (one 150 panel), 1350…3000 (1200 + 450).
    expect(right.map((p) => p.width)).toEqual([150, 1200, 450]);
    expect(right.flatMap((p) => p.cutOuts)).toEqual([]);
  });

  it("the material's net area drops the cut-outs; the boards needed stay the same", () => {
    const without = planCutList(bay([]), OPTIONS);
    const withWindow = planCutList(bay([{ id: 'w1', type: 'window', wall: 'left', position: 300, sillHeight: 850, width: 800, height: 400, opens: true }]), OPTIONS);
    const walls = (p: typeof without) => p.byMaterial.find((g) => g.material.id === 'lining-plywood-lining-12')!;
    expect(walls(without).material.title).toBe('Plywood lining 12 mm');
    // The window takes 0.8 × 0.4 = 0.32 m² out of the wall lining.
    expect(walls(without).netAreaM2 - walls(withWindow).netAreaM2).toBeCloseTo(0.32, 9);
    expect(walls(withWindow).nest.sheetsNeeded).toBe(walls(without).nest.sheetsNeeded);
    expect(walls(withWindow).nest.unplaced).toEqual([]);
  });

  it('no lining panels where the inner layer is not a sheet material', () => {
    const doc = layoutDocSchema.parse({ ...bay([]), buildUp: { floor: [], roof: [{ material: 'Closed-cell foam', thickness: 20 }], walls: [{ material: 'Carpet lining', thickness: 3 }] } });
    expect(cutListFromDoc(doc, OPTIONS).parts.filter((p) => p.id.startsWith('lining:'))).toEqual([]);
  });
});

describe('the Cut list tab', () => {
  it('shows a Cut-outs column with each cut-out in words, and the lining area less the cut-outs', () => {
    const doc = bay([{ id: 'w1', type: 'window', wall: 'left', position: 300, sillHeight: 850, width: 800, height: 400, opens: true }]);
    const html = renderToStaticMarkup(createElement(CutListPanel, { doc, options: { kerfMm: 3, trimMm: 10, respectGrain: true }, onOptions: () => {} }));
    const text = html.replace(/<[^>]+>/g, ' ').replace(/\s+/g, ' ');
    expect(text).toContain('Cut-outs');
    expect(text).toContain('Window in the left wall: 800 × 400 mm, 300 mm from the front edge, 850 mm from the bottom edge');
    // The panel left: 2.88 − 0.32 = 2.56 m².
    expect(text).toContain('2.56 m² left');
    expect(html).toContain('data-testid="net-area-lining-plywood-lining-12"');
    // Drawn dashed on its nested sheet: the panel's rise runs along the sheet, so the cut-out is 400 long
    // (its height) and 800 across (its width), 850 along and 300 across from the panel's corner.
    const drawn = /<rect data-cut-out="w1" x="([\d.]+)" y="([\d.]+)" width="([\d.]+)" height="([\d.]+)"/.exec(html);
    expect(drawn).not.toBeNull();
    expect([Number(drawn![3]), Number(drawn![4])]).toEqual([400, 800]);
  });
});
