import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { cutListFromDoc, nestCutList, planCutList, splitToSheet, STANDARD_SHEET, type NestPart, type NestResult } from '@/lib/planning';
import { starterLayout } from '@/lib/layout';
import { baseDoc, withModules } from './fixtures';

/** Every placement lies on its sheet inside the trim, and no two on a sheet overlap (kerf apart). */
function assertValidNesting(r: NestResult, parts: NestPart[], respectGrain = true): void {
  const byId = new Map(parts.map((p) => [p.id, p]));
  const seen = new Set<string>();
  for (const s of r.sheets) {
    for (const p of s.placements) {
      expect(seen.has(p.partId)).toBe(false);
      seen.add(p.partId);
      const part = byId.get(p.partId)!;
      const dims = p.rotated ? [part.width, part.length] : [part.length, part.width];
      expect([p.length, p.width]).toEqual(dims);
      if (part.grain && respectGrain) expect(p.rotated).toBe(false);
      expect(p.x).toBeGreaterThanOrEqual(r.trimMm);
      expect(p.y).toBeGreaterThanOrEqual(r.trimMm);
      expect(p.x + p.length).toBeLessThanOrEqual(r.sheet.length - r.trimMm);
      expect(p.y + p.width).toBeLessThanOrEqual(r.sheet.width - r.trimMm);
    }
    for (let i = 0; i < s.placements.length; i++) {
      for (let j = i + 1; j < s.placements.length; j++) {
        const a = s.placements[i];
        const b = s.placements[j];
        const apart = a.x + a.length + r.kerfMm <= b.x || b.x + b.length + r.kerfMm <= a.x || a.y + a.width + r.kerfMm <= b.y || b.y + b.width + r.kerfMm <= a.y;
        expect(apart).toBe(true);
      }
    }
  }
  // Every part is either placed or reported unplaced, once.
  expect(seen.size + r.unplaced.length).toBe(parts.length);
}

describe('nestCutList (guillotine)', () => {
  it('fits four 1220 × 610 quarters on one sheet with no kerf', () => {
    const parts = [1, 2, 3, 4].map((i) => ({ id: `q${i}`, label: 'quarter', length: 1220, width: 610, grain: false }));
    const r = nestCutList(parts, STANDARD_SHEET, { kerfMm: 0 });
    expect(r.sheetsNeeded).toBe(1);
    expect(r.lowerBound).toBe(1);
    expect(r.wastePct).toBeCloseTo(0, 9);
    assertValidNesting(r, parts);
  });

  it('the kerf pushes the fifth strip onto a second sheet', () => {
    // Five 488 mm strips span exactly 2440 mm: with a 3 mm kerf the last no longer fits.
    const parts = [1, 2, 3, 4, 5].map((i) => ({ id: `s${i}`, label: 'strip', length: 1220, width: 488, grain: false }));
    expect(nestCutList(parts, STANDARD_SHEET, { kerfMm: 0 }).sheetsNeeded).toBe(1);
    const withKerf = nestCutList(parts, STANDARD_SHEET, { kerfMm: 3 });
    expect(withKerf.sheetsNeeded).toBe(2);
    assertValidNesting(withKerf, parts);
  });

  it('keeps grain-marked parts along the sheet length, and reports parts that cannot fit', () => {
    const parts = [
      { id: 'tall', label: 'tall side', length: 1300, width: 500, grain: true },
      { id: 'huge', label: 'too big', length: 3000, width: 500, grain: true },
      { id: 'cross', label: 'cross-grain', length: 500, width: 1300, grain: true },
      { id: 'bad', label: 'zero', length: 0, width: 500, grain: false },
    ];
    const r = nestCutList(parts, STANDARD_SHEET);
    expect(r.unplaced.map((u) => u.partId).sort()).toEqual(['bad', 'cross', 'huge']);
    expect(r.unplaced.find((u) => u.partId === 'cross')!.reason).toMatch(/grain/);
    assertValidNesting(r, parts);
    // Without grain the cross-grain part turns and fits.
    expect(nestCutList(parts, STANDARD_SHEET, { respectGrain: false }).unplaced.map((u) => u.partId).sort()).toEqual(['bad', 'huge']);
  });

  it('rejects an impossible sheet or trim with a clear error', () => {
    expect(() => nestCutList([], { length: 0, width: 1220 })).toThrow(/sheet/);
    expect(() => nestCutList([], STANDARD_SHEET, { trimMm: 700 })).toThrow(/trim/);
    expect(() => nestCutList([], STANDARD_SHEET, { kerfMm: -1 })).toThrow(/kerf/);
  });

  it('property: no two nested parts overlap, every part lies on its sheet, and sheets ≥ the area lower bound', () => {
    const part = fc.record({
      length: fc.integer({ min: 20, max: 2440 }),
      width: fc.integer({ min: 20, max: 1220 }),
      grain: fc.boolean(),
    });
    fc.assert(fc.property(
      fc.array(part, { minLength: 1, maxLength: 40 }),
      fc.integer({ min: 0, max: 5 }),
      fc.integer({ min: 0, max: 15 }),
      fc.boolean(),
      (raw, kerfMm, trimMm, respectGrain) => {
        const parts = raw.map((p, i) => ({ ...p, id: `p${i}`, label: `part ${i}` }));
        const r = nestCutList(parts, STANDARD_SHEET, { kerfMm, trimMm, respectGrain });
        assertValidNesting(r, parts, respectGrain);
        expect(r.sheetsNeeded).toBeGreaterThanOrEqual(r.lowerBound);
        expect(r.wastePct).toBeGreaterThanOrEqual(-1e-9);
      },
    ), { numRuns: 150 });
  });
});

describe('cut list from modules', () => {
  it('a kitchen counter facing the aisle: two sides, bottom, back, one shelf and a worktop', () => {
    const doc = withModules(baseDoc(), [{ id: 'k', kind: 'kitchen-counter', length: 1200, width: 500, height: 900, facing: 'right' }]);
    const { parts } = cutListFromDoc(doc);
    const byName = (s: string) => parts.filter((p) => p.label.includes(`— ${s}`));
    expect(byName('side')).toHaveLength(2);
    expect(byName('side')[0]).toMatchObject({ length: 900, width: 500, material: 'ply-15' });
    expect(byName('bottom')[0]).toMatchObject({ length: 1200 - 30, width: 500 });
    expect(byName('back')[0]).toMatchObject({ length: 1200, width: 900, material: 'ply-6' });
    expect(byName('shelf')[0]).toMatchObject({ length: 1170, width: 494 });
    expect(byName('worktop')[0]).toMatchObject({ length: 1200, width: 500, material: 'ply-18' });
  });

  it('splits a bed top larger than a sheet into pieces that fit', () => {
    const doc = withModules(baseDoc(), [{ id: 'bed', kind: 'bed-platform', length: 2000, width: 1400, height: 300 }]);
    const tops = cutListFromDoc(doc).parts.filter((p) => p.label.includes('bed top'));
    expect(tops).toHaveLength(2);
    expect(tops[0]).toMatchObject({ length: 2000, width: 700 });
    expect(splitToSheet(5000, 500, true, STANDARD_SHEET)).toHaveLength(3);
  });

  it('bought-in kinds and the gas locker give no sheet parts, with the reason', () => {
    const doc = withModules(baseDoc(), [{ id: 'gas', kind: 'gas-locker' }, { id: 'fr', kind: 'fridge' }]);
    const c = cutListFromDoc(doc);
    expect(c.parts.filter((p) => p.moduleId !== null)).toHaveLength(0);
    expect(c.skipped.find((s) => s.moduleId === 'gas')!.reason).toMatch(/sealed/);
  });

  it('the rear-bed starter nests validly and close to the area lower bound', () => {
    const plan = planCutList(starterLayout('starter-rear-bed')!);
    expect(plan.parts.length).toBeGreaterThan(15);
    for (const g of plan.byMaterial) {
      assertValidNesting(g.nest, plan.parts.filter((p) => p.material === g.material.id));
      expect(g.nest.unplaced).toEqual([]);
      expect(g.nest.sheetsNeeded).toBeGreaterThanOrEqual(g.nest.lowerBound);
      expect(g.nest.sheetsNeeded).toBeLessThanOrEqual(g.nest.lowerBound + 1);
    }
  });
});
