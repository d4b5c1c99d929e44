// Wall elevations and the roof plan (lib/sheet/elevation-figure.ts, roof-figure.ts), worked by hand
// at 1:20 (1 mm on paper = 20 mm of van; 1 mm = 72 / 25.4 = 2.8346 pt), in the drawing model and
// in the PDF read back as the existing sheet tests read it.
import { beforeAll, describe, expect, it } from 'vitest';
import { composeSheet, mmToPt, renderPdf } from '@/lib/sheet';
import { drawElevation, ELEVATION_MARGIN, elevationSize, modulesOnWall, WALL_DEPTH } from '@/lib/sheet/elevation-figure';
import { drawRoof, ROOF_MARGIN } from '@/lib/sheet/roof-figure';
import { drawPlan } from '@/lib/sheet/plan-figure';
import { emptyLayout, starterLayout, type LayoutDoc, type Module } from '@/lib/layout';
import type { LineItem, RectItem, SheetItem } from '@/lib/sheet/primitives';
import { horizontalOfLength, readPdf, type PdfPageRead } from './read-pdf';
import { fontsReady } from './sheet-fonts';

const SCALE = 20;

function mod(over: Partial<Module> & Pick<Module, 'id' | 'x' | 'y' | 'length' | 'width'>): Module {
  return { kind: 'sink-unit', elevation: 0, height: 900, facing: 'right', arrangements: ['travel', 'lounge', 'sleep'], ...over } as Module;
}

/** A 3100 × 1800 × 2000 mm bay with a 40 mm floor, 30 mm roof and 36 mm wall build-up. */
function testDoc(): LayoutDoc {
  const doc = emptyLayout('Elevations', {
    length: 3100, width: 1800, height: 2000, wheelArches: [], bulkhead: true, cabSeats: 2,
    doors: [{ id: 'slide', wall: 'right', offset: 150, width: 1200 }],
    openings: [
      { id: 'w-left', type: 'window', wall: 'left', position: 1400, sillHeight: 900, width: 800, height: 450, opens: true },
      { id: 'vent', type: 'roof-opening', kind: 'vent', x: 400, y: 450, length: 400, width: 400, frameHeight: 40 },
      { id: 'filler', type: 'body-point', kind: 'fuel-filler', wall: 'left', position: 2800, height: 600 },
    ],
  });
  return {
    ...doc,
    buildUp: { floor: [{ material: 'Ply on battens', thickness: 40 }], roof: [{ material: 'Lining', thickness: 30 }], walls: [{ material: 'Lining', thickness: 36 }] },
    modules: [
      // Against the left wall's lining (y = 36 = the wall build-up), at the front.
      mod({ id: 'sink', x: 0, y: 36, length: 500, width: 500, height: 900 }),
      // Against the right wall's lining: 1800 − 36 − (1164 + 600) = 0 mm off it.
      mod({ id: 'bench', kind: 'bench-seat', x: 2000, y: 1164, length: 1100, width: 600, elevation: 300, height: 160, facing: 'left' } as Partial<Module> & Module),
      // 150 mm off the left lining (186 − 36): past WALL_DEPTH (100 mm), so on no wall.
      mod({ id: 'island', x: 1200, y: 186, length: 400, width: 400, height: 800 }),
      // On the roof: a roof box.
      mod({ id: 'box', kind: 'roof-box', x: 1500, y: 300, length: 1400, width: 800, height: 400, mount: 'roof' } as Partial<Module> & Module),
    ],
  };
}

const lines = (items: SheetItem[]) => items.filter((i): i is LineItem => i.type === 'line');
const rects = (items: SheetItem[]) => items.filter((i): i is RectItem => i.type === 'rect');
const tagged = <T extends LineItem | RectItem>(list: T[], tag: string) => list.filter((i) => i.tag === tag);

describe('the left wall elevation, worked at 1:20', () => {
  const doc = testDoc();
  const items = drawElevation(doc, 'left', 0, 0, SCALE, 'mm');
  const [floor] = tagged(lines(items), 'elevation:left:floor');
  const [finished] = tagged(lines(items), 'elevation:left:finished-floor');

  it('draws the bare floor 3100 mm long: 3100 / 20 = 155 mm, from the left margin', () => {
    expect(floor.x1).toBeCloseTo(ELEVATION_MARGIN.left, 6);
    expect(floor.x2 - floor.x1).toBeCloseTo(155, 6);
    // The finished floor 40 mm over it: 40 / 20 = 2 mm above on paper (y grows downwards).
    expect(floor.y1 - finished.y1).toBeCloseTo(2, 6);
  });

  it('sets the window’s sill 900 mm above the finished floor over a 40 mm floor build-up: 940 mm above the bare floor = 47 mm = 133.2 pt', () => {
    const [pane] = tagged(rects(items), 'elevation:left:window:w-left');
    const sillY = pane.y + pane.h;
    expect(floor.y1 - sillY).toBeCloseTo(47, 6); // (900 + 40) / 20
    expect(mmToPt(floor.y1 - sillY)).toBeCloseTo(133.23, 2); // 47 × 72 / 25.4
    // 450 mm of glass: 22.5 mm; 800 mm wide: 40 mm.
    expect(pane.h).toBeCloseTo(22.5, 6);
    expect(pane.w).toBeCloseTo(40, 6);
    // Seen from the room the front is on the right: the window runs 1400–2200 mm from the front, so its
    // left edge is 3100 − 2200 = 900 mm from the paper-left (rear) end: 45 mm.
    expect(pane.x - floor.x1).toBeCloseTo(45, 6);
  });

  it('shows the sink standing against the left wall at the front, at the right-hand end, 900 mm high on the finished floor', () => {
    const [sink] = tagged(rects(items), 'elevation:left:module:sink');
    // x 0–500 mm from the front → 2600–3100 mm from the rear end: 130–155 mm on paper.
    expect(sink.x - floor.x1).toBeCloseTo(130, 6);
    expect(sink.w).toBeCloseTo(25, 6);
    // Its top 40 + 900 = 940 mm above the bare floor: 47 mm.
    expect(floor.y1 - sink.y).toBeCloseTo(47, 6);
    expect(items.some((i) => i.type === 'text' && i.text === 'front →')).toBe(true);
    expect(items.some((i) => i.type === 'text' && i.text === '← rear')).toBe(true);
  });

  it('dimensions the levels to the finished floor: the sill at 900, the window head and the sink top, and the clear height', () => {
    const levels = lines(items).filter((l) => l.tag?.startsWith('elevation:left:level:')).map((l) => Number(l.tag!.split(':').pop()));
    // Window head 900 + 450 = 1350; sink top 0 + 900 = 900; clear 2000 − 40 − 30 = 1930.
    expect(levels.sort((a, b) => a - b)).toEqual([900, 1350, 1930]);
    // The run ending at the sill goes from the finished floor up 900 / 20 = 45 mm.
    const [toSill] = tagged(lines(items), 'elevation:left:level:900');
    expect(Math.abs(toSill.y2 - toSill.y1)).toBeCloseTo(45, 6);
    expect(toSill.y1).toBeCloseTo(finished.y1, 6);
  });

  it('marks the fuel filler 600 mm above the bare floor, 2800 mm from the front: 30 mm up, (3100 − 2800)/20 = 15 mm from the rear end', () => {
    const [mark] = tagged(lines(items), 'elevation:left:point:filler');
    expect(floor.y1 - mark.y1).toBeCloseTo(30, 6);
    expect((mark.x1 + mark.x2) / 2 - floor.x1).toBeCloseTo(15, 6);
  });
});

describe('which modules a wall shows (within 100 mm of its lining)', () => {
  const doc = testDoc();
  const ids = (wall: 'left' | 'right' | 'rear' | 'bulkhead') => modulesOnWall(doc, wall).map((m) => m.id).sort();

  it('puts the sink on the left wall and not the right; the bench on the right and not the left', () => {
    expect(WALL_DEPTH).toBe(100);
    expect(ids('left')).toEqual(['sink']);
    expect(ids('right')).toEqual(['bench']);
    const right = drawElevation(doc, 'right', 0, 0, SCALE, 'mm');
    expect(tagged(rects(right), 'elevation:right:module:sink')).toHaveLength(0);
    expect(tagged(rects(right), 'elevation:right:module:bench')).toHaveLength(1);
  });

  it('leaves out a module 150 mm off the wall, and anything on the roof', () => {
    expect(ids('left')).not.toContain('island');
    expect(ids('rear')).toEqual(['bench']); // 3100 − (2000 + 1100) = 0 mm off the rear
    expect(ids('bulkhead')).toEqual(['sink']); // x = 0
  });

  it('draws only the modules of one arrangement when asked (the editor’s view)', () => {
    const sleepOnly = { ...doc, modules: doc.modules.map((m) => (m.id === 'sink' ? { ...m, arrangements: ['sleep' as const] } : m)) };
    expect(modulesOnWall(sleepOnly, 'left', 'lounge')).toHaveLength(0);
    expect(modulesOnWall(sleepOnly, 'left', 'sleep')).toHaveLength(1);
  });

  it('is as large as the wall at the scale and its margins: 17 + 155 + 7 = 179 mm by 4 + 100 + 12 = 116 mm', () => {
    expect(elevationSize(doc, 'left', SCALE)).toEqual({ width: 179, height: 116 });
    expect(elevationSize(doc, 'rear', SCALE)).toEqual({ width: 17 + 90 + 7, height: 116 });
  });
});

describe('the roof plan, worked at 1:20', () => {
  const doc = testDoc();
  const items = drawRoof(doc, 0, 0, SCALE, 'mm');
  const [front] = tagged(lines(items), 'roof:front-edge');
  const [left] = tagged(lines(items), 'roof:left-edge');

  it('places the vent at its x and y: 400 / 20 = 20 mm from the front edge, 450 / 20 = 22.5 mm from the left edge, 20 mm square', () => {
    const [vent] = tagged(rects(items), 'roof:opening:vent');
    expect(front.x1).toBeCloseTo(ROOF_MARGIN.left, 6);
    expect(vent.x - front.x1).toBeCloseTo(20, 6);
    expect(vent.y - left.y1).toBeCloseTo(22.5, 6);
    expect([vent.w, vent.h]).toEqual([20, 20]);
  });

  it('draws the roof box mounted on the roof, and its distances from the front: 400, 800, 1500, 2900 and the rear at 3100', () => {
    expect(tagged(rects(items), 'roof:module:box')).toHaveLength(1);
    const fromFront = lines(items).filter((l) => l.tag?.startsWith('roof:from-front:')).map((l) => Number(l.tag!.split(':').pop()));
    expect(fromFront).toEqual([400, 800, 1500, 2900, 3100]);
    const fromLeft = lines(items).filter((l) => l.tag?.startsWith('roof:from-left:')).map((l) => Number(l.tag!.split(':').pop()));
    expect(fromLeft).toEqual([300, 450, 850, 1100, 1800]);
  });

  it('draws a solar panel (kind compared by name) with a cell grid: 1000 / 160 ≈ 6 cells along, 700 / 160 ≈ 4 across → 5 + 3 grid lines', () => {
    const panel = { ...doc.modules[3], id: 'pv', kind: 'solar-panel', length: 1000, width: 700 } as unknown as Module;
    const withPanel = drawRoof({ ...doc, modules: [panel] }, 0, 0, SCALE, 'mm');
    const [r] = tagged(rects(withPanel), 'roof:module:pv');
    const inside = lines(withPanel).filter((l) => !l.tag && l.x1 >= r.x - 1e-9 && l.x2 <= r.x + r.w + 1e-9 && l.y1 >= r.y - 1e-9 && l.y2 <= r.y + r.h + 1e-9 && (l.x1 === l.x2 || l.y1 === l.y2));
    expect(inside).toHaveLength(5 + 3);
  });
});

describe('openings on the plans', () => {
  const doc = testDoc();
  const items = drawPlan(doc, 'lounge', 0, 0, SCALE, 'mm');

  it('draws the window on the left wall line, the vent dashed overhead and the filler as a mark', () => {
    const [pane] = tagged(rects(items), 'plan:window:w-left');
    const [vent] = tagged(rects(items), 'plan:roof-opening:vent');
    expect(pane.w).toBeCloseTo(40, 6); // 800 / 20
    expect(vent.dash).toBeDefined();
    expect(vent.w).toBeCloseTo(20, 6);
    expect(tagged(lines(items), 'plan:point:filler')).toHaveLength(1);
  });
});

describe('the demo lounge’s sheet PDF on A3 at 1:20', () => {
  const demo = starterLayout('starter-l-lounge')!; // bay 3100 × 1800 × 2000 mm, floor build-up 24 mm
  let page: PdfPageRead;
  let all: PdfPageRead[];
  beforeAll(async () => {
    const r = composeSheet({ doc: demo, report: { ok: true, findings: [] }, paper: 'a3', scale: 20, units: 'mm', details: { studio: 'Saltmarsh Van Works', client: 'Priya Nair', layout: 'Nair — L2H2 weekender', date: '2025-12-02' } });
    if (!r.ok) throw new Error(r.message);
    all = (await readPdf(await renderPdf(r.sheet, { created: new Date('2025-12-02T09:00:00Z'), fonts: await fontsReady }))).pages;
    page = all.find((p) => p.texts.some((t) => t.str === 'Left wall elevation'))!;
  });

  it('holds the four elevations and the roof plan', () => {
    const text = all.map((p) => p.text).join(' ');
    for (const title of ['Left wall elevation', 'Right wall elevation', 'Rear wall elevation', 'Bulkhead elevation', 'Roof plan']) expect(text).toContain(title);
  });

  it('draws the lounge window 800 mm wide as 40 mm = 113.39 pt, its sill (950 + 24) mm = 48.7 mm = 138.05 pt above the bare floor line of 3100 mm = 155 mm = 439.37 pt', () => {
    expect(page).toBeDefined();
    const floors = horizontalOfLength(page, 439.37, 0.05);
    // The window's edges: 113.39 pt lines standing over a 439.37 pt floor line, within the wall's 2000 mm = 283.46 pt.
    const spans = (f: { x1: number; x2: number }, s: { x1: number; x2: number }) => Math.min(f.x1, f.x2) <= Math.min(s.x1, s.x2) && Math.max(f.x1, f.x2) >= Math.max(s.x1, s.x2);
    const panes = horizontalOfLength(page, 113.39, 0.05).filter((s) => floors.some((f) => spans(f, s) && s.y1 - f.y1 > 0 && s.y1 - f.y1 < 283.46));
    expect(panes.length).toBeGreaterThan(0);
    // The sill is the window's lowest edge (PDF y grows upwards); the bare floor runs under it.
    const sill = panes.reduce((lo, s) => (s.y1 < lo.y1 ? s : lo));
    const under = floors.filter((f) => f.y1 < sill.y1 && Math.min(f.x1, f.x2) <= Math.min(sill.x1, sill.x2) && Math.max(f.x1, f.x2) >= Math.max(sill.x1, sill.x2));
    const gaps = under.map((f) => Math.round((sill.y1 - f.y1) * 100) / 100);
    expect(gaps).toContain(138.05); // the bare floor (heavy line)
    expect(gaps).toContain(134.65); // the finished floor: 950 / 20 = 47.5 mm = 134.65 pt
  });

  it('draws the rear wall 1800 mm across as 90 mm = 255.12 pt and its height 2000 mm as 100 mm = 283.46 pt', () => {
    const rearPage = all.find((p) => p.texts.some((t) => t.str === 'Rear wall elevation'))!;
    expect(horizontalOfLength(rearPage, 255.12, 0.05).length).toBeGreaterThanOrEqual(4);
    const tall = rearPage.segments.filter((s) => Math.abs(s.x1 - s.x2) < 0.01 && Math.abs(Math.abs(s.y2 - s.y1) - 283.46) < 0.05);
    expect(tall.length).toBeGreaterThanOrEqual(4);
  });
});

/** The dimension line under a text label (as tests/sheet/pdf.test.ts finds one): a horizontal segment a little below the text, spanning it. */
function dimensionLineUnder(page: PdfPageRead, label: string) {
  return page.texts.filter((t) => t.str === label).flatMap((t) =>
    page.segments.filter((s) => Math.abs(s.y1 - s.y2) < 0.01 && s.y1 < t.y && t.y - s.y1 < 6 && Math.min(s.x1, s.x2) < t.x && Math.max(s.x1, s.x2) > t.x),
  );
}

describe('the demo lounge’s sheet PDF on A4 at 1:20 (the editor’s default sheet)', () => {
  const demo = starterLayout('starter-l-lounge')!;
  let all: PdfPageRead[];
  beforeAll(async () => {
    const r = composeSheet({ doc: demo, report: { ok: true, findings: [] }, paper: 'a4', scale: 20, units: 'mm', details: { studio: 'Saltmarsh Van Works', client: 'Priya Nair', layout: 'Nair — L2H2 weekender', date: '2025-12-02' } });
    if (!r.ok) throw new Error(r.message);
    all = (await readPdf(await renderPdf(r.sheet, { created: new Date('2025-12-02T09:00:00Z'), fonts: await fontsReady }))).pages;
  });

  it('sets each wall’s length under its elevation: the left wall’s 3100 mm as 155 mm = 439.37 pt, the rear’s 1800 mm as 90 mm = 255.12 pt', () => {
    const left = all.findIndex((p) => p.texts.some((t) => t.str === 'Left wall elevation'));
    const rear = all.findIndex((p) => p.texts.some((t) => t.str === 'Rear wall elevation'));
    // Plans on pages 1–3, the section on 4, then the left wall on 5 and the rear with the bulkhead on 7 (tests/sheet/layout.test.ts).
    expect([left, rear]).toEqual([4, 6]);
    const [l] = dimensionLineUnder(all[left], '3100 mm');
    expect(Math.abs(l.x2 - l.x1)).toBeCloseTo(439.37, 1);
    // The reader may split a label into its figure and its unit ("1800", "mm"): either form counts.
    const r = [...dimensionLineUnder(all[rear], '1800 mm'), ...dimensionLineUnder(all[rear], '1800')];
    expect(r).toHaveLength(2); // the rear wall and the bulkhead, side by side
    for (const line of r) expect(Math.abs(line.x2 - line.x1)).toBeCloseTo(255.12, 1);
  });
});

