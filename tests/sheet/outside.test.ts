// Modules mounted outside the body on the plan sheet: the side section hangs them where they are
// (under the floor below the floor line, on the roof above the roof line, behind the rear past it),
// with the road line at the load floor's height and the lowest point the fit.outside rule allows;
// the plans draw them chain-lined on top of the interior; the schedule says where each is mounted.
// Every expected place is worked by hand at 1:20: paper mm = real mm / 20, and in a PDF
// 1 mm = 72 / 25.4 pt (ISO 32000-1 §8.3.2.3).
import { describe, expect, it } from 'vitest';
import { composeSheet, PT_PER_MM, type SheetItem, type SheetRequest } from '@/lib/sheet';
import type { LayoutDoc } from '@/lib/layout';
import { boxDoc, mod } from '../checks/helpers';

const details = { studio: 'Saltmarsh Van Works', client: 'Priya Nair', layout: 'Outside test', revision: 'A', date: '2025-12-02' };

// A 3000 × 1800 × 2000 mm box without build-up (bare floor = finished floor), the load floor
// 600 mm above the road (the Bay panel's setting), and one module in each place.
const withOutside: LayoutDoc = boxDoc({
  settings: { floorAboveRoad: 600 },
  modules: [
    mod({ id: 'bench', kind: 'bench-seat', x: 0, y: 0, length: 1200, width: 500, height: 450 }),
    mod({ id: 'tank', kind: 'grey-water-tank', x: 1000, y: 600, length: 600, width: 400, height: 250, mount: 'under-floor' }),
    mod({ id: 'box', kind: 'roof-box', x: 500, y: 500, length: 1400, width: 800, height: 400, mount: 'roof' }),
    mod({ id: 'carrier', kind: 'rear-carrier', x: 3000, y: 300, length: 600, width: 1200, elevation: 400, height: 1000, mount: 'rear' }),
  ],
});
const interiorOnly: LayoutDoc = boxDoc({ modules: [mod({ id: 'bench', kind: 'bench-seat', x: 0, y: 0, length: 1200, width: 500, height: 450 })] });

function compose(over: Partial<SheetRequest>) {
  const r = composeSheet({ doc: withOutside, report: { ok: true, findings: [] }, paper: 'a3', scale: 20, units: 'mm', details, ...over });
  if (!r.ok) throw new Error(r.message);
  return r;
}

const all = (r: ReturnType<typeof compose>): SheetItem[] => r.sheet.pages.flatMap((p) => p.items);
const tagged = (r: ReturnType<typeof compose>, tag: string) => all(r).filter((i) => 'tag' in i && i.tag === tag);
const line = (r: ReturnType<typeof compose>, tag: string) => tagged(r, tag)[0] as Extract<SheetItem, { type: 'line' }>;
const rect = (r: ReturnType<typeof compose>, tag: string) => tagged(r, tag)[0] as Extract<SheetItem, { type: 'rect' }>;

describe('the side section with modules outside the body', () => {
  const r = compose({});
  const section = r.blocks.find((b) => b.what === 'section')!;
  const floor = line(r, 'section:floor');
  const roof = line(r, 'section:roof');

  it('reserves room for them: 13 + (3000 + 600)/20 + 16 = 209 mm wide, 6 + (400 + 2000 + 600)/20 + 10 = 166 mm high', () => {
    // Behind: the carrier reaches 600 mm past the rear; above: the roof box 400 mm; below: the road 600 mm down.
    expect(section.width).toBeCloseTo(209, 6);
    expect(section.height).toBeCloseTo(166, 6);
    // The floor line: 6 mm margin + (400 + 2000)/20 = 126 mm below the figure's top; the roof line 100 mm above it.
    expect(floor.y1).toBeCloseTo(section.y + 126, 6);
    expect(roof.y1).toBeCloseTo(floor.y1 - 100, 6);
  });

  it('hangs the underslung tank below the floor line by its depth: 250 mm / 20 = 12.5 mm = 35.43 pt', () => {
    const tank = rect(r, 'section:mounted:under-floor:tank');
    expect(tank.y).toBeCloseTo(floor.y1, 6); // its top at the floor
    expect(tank.h).toBeCloseTo(12.5, 6);
    expect(tank.h * PT_PER_MM).toBeCloseTo((250 / 20) * (72 / 25.4), 6); // 35.433 pt
    expect(tank.h * PT_PER_MM).toBeCloseTo(35.43, 2);
    // 13 mm margin + 1000/20 = 63 mm from the figure's left; 600/20 = 30 mm long.
    expect(tank.x).toBeCloseTo(section.x + 63, 6);
    expect(tank.w).toBeCloseTo(30, 6);
    expect(tank.dash).toEqual([2.4, 0.5, 0.4, 0.5]);
  });

  it('draws the road at the load floor height (600/20 = 30 mm below the floor) and the lowest point allowed 200 mm above it ((600 − 200)/20 = 20 mm)', () => {
    expect(line(r, 'section:road').y1).toBeCloseTo(floor.y1 + 30, 6);
    expect(line(r, 'section:lowest-allowed').y1).toBeCloseTo(floor.y1 + 20, 6);
    const texts = all(r).filter((i): i is Extract<SheetItem, { type: 'text' }> => i.type === 'text').map((t) => t.text);
    expect(texts).toContain('lowest point allowed · 200 mm above the road');
    expect(texts).toContain('road · load floor 600 mm above it');
  });

  it('takes the load floor height from the request when it gives one: 700/20 = 35 mm', () => {
    const other = compose({ floorAboveRoad: 700 });
    expect(line(other, 'section:road').y1 - line(other, 'section:floor').y1).toBeCloseTo(35, 6);
  });

  it('stands the roof box on the roof line: 400/20 = 20 mm = 56.69 pt above it', () => {
    const box = rect(r, 'section:mounted:roof:box');
    expect(box.y + box.h).toBeCloseTo(roof.y1, 6);
    expect(box.h).toBeCloseTo(20, 6);
    expect(box.h * PT_PER_MM).toBeCloseTo(56.69, 2);
  });

  it('puts the rear carrier past the rear: from 13 + 3000/20 = 163 mm, bottom 400/20 = 20 mm above the floor', () => {
    const carrier = rect(r, 'section:mounted:rear:carrier');
    expect(carrier.x).toBeCloseTo(section.x + 163, 6);
    expect(carrier.y + carrier.h).toBeCloseTo(floor.y1 - 20, 6);
  });
});

describe('the plans and the schedule', () => {
  const r = compose({});

  it('outlines outside modules chain-lined, on top of the interior modules', () => {
    const items = r.sheet.pages.flatMap((p) => p.items);
    // One per plan: travel, lounge and sleep.
    expect(items.filter((it) => it.type === 'rect' && it.tag === 'plan:mounted:under-floor:tank')).toHaveLength(3);
    const page = r.sheet.pages[0].items;
    const tankAt = page.findIndex((it) => it.type === 'rect' && it.tag === 'plan:mounted:under-floor:tank');
    // The bench's white ground in the first plan: 1200/20 = 60 × 500/20 = 25 mm.
    const benchAt = page.findIndex((it) => it.type === 'rect' && it.fill === 'white' && Math.abs(it.w - 60) < 1e-6 && Math.abs(it.h - 25) < 1e-6);
    expect(benchAt).toBeGreaterThanOrEqual(0);
    expect(tankAt).toBeGreaterThan(benchAt);
    expect((page[tankAt] as Extract<SheetItem, { type: 'rect' }>).dash).toEqual([2.4, 0.5, 0.4, 0.5]);
  });

  it('has a Mounted column: inside, under floor, on roof, behind, in schedule order', () => {
    const texts = all(r).filter((i): i is Extract<SheetItem, { type: 'text' }> => i.type === 'text').map((t) => t.text);
    expect(texts).toContain('Mounted');
    const places = new Set(['inside', 'under floor', 'on roof', 'behind']);
    expect(texts.filter((t) => places.has(t))).toEqual(['inside', 'under floor', 'on roof', 'behind']);
  });
});

describe('a layout with nothing outside the body', () => {
  const r = composeSheet({ doc: interiorOnly, report: { ok: true, findings: [] }, paper: 'a3', scale: 20, units: 'mm', details });
  if (!r.ok) throw new Error(r.message);
  const items = r.sheet.pages.flatMap((p) => p.items);
  const section = r.blocks.find((b) => b.what === 'section')!;

  it('draws the section as before: 13 + 3000/20 + 16 = 179 × 6 + 2000/20 + 10 = 116 mm, no road, the bench 450/20 = 22.5 mm tall on the floor', () => {
    expect(section.width).toBeCloseTo(179, 6);
    expect(section.height).toBeCloseTo(116, 6);
    const floor = items.find((i) => i.type === 'line' && i.tag === 'section:floor') as Extract<SheetItem, { type: 'line' }>;
    expect(floor.y1).toBeCloseTo(section.y + 106, 6);
    expect(items.some((i) => 'tag' in i && (i.tag === 'section:road' || i.tag === 'section:lowest-allowed'))).toBe(false);
    expect(items.some((i) => 'tag' in i && typeof i.tag === 'string' && i.tag.includes(':mounted:'))).toBe(false);
    // The bench in the section: 13 + 0 mm from the left, its top 22.5 mm above the floor line.
    const bench = items.find((i) => i.type === 'rect' && i.fill === 'white' && Math.abs(i.x - (section.x + 13)) < 1e-6 && Math.abs(i.h - 22.5) < 1e-6) as Extract<SheetItem, { type: 'rect' }>;
    expect(bench.y).toBeCloseTo(floor.y1 - 22.5, 6);
  });

  it('does not depend on the load floor height', () => {
    const other = composeSheet({ doc: interiorOnly, report: { ok: true, findings: [] }, paper: 'a3', scale: 20, units: 'mm', details, floorAboveRoad: 900 });
    expect(other.ok && other.sheet).toEqual(r.sheet);
  });
});
