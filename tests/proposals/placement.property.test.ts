/**
 * Property: whatever the brief, no proposal puts anything that stands in the travel or lounge
 * arrangement into a side door's entry (the door's span, 500 mm in from the lining — common
 * practice, no source), nothing sticks out through a door's opening (outside the lined interior),
 * and nothing stands on a wheel arch unless its underside clears the arch. The zones are worked
 * out here from the bay's own numbers, not taken from the generator.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { BAY_TEMPLATES } from '@/lib/layout/templates';
import { briefSchema, generateProposals, TYPICAL_BRIEF } from '@/lib/proposals';

const WALL_T = 24 + 12; // DEFAULT_BUILD_UP walls: 24 mm foam + 12 mm ply
const FLOOR_T = 10 + 12 + 2; // floor: 10 mm XPS + 12 mm ply + 2 mm vinyl

const briefArb = fc.record({
  template: fc.constantFrom(...BAY_TEMPLATES.filter((t) => t.bay.length >= 3800).map((t) => t.id)),
  sleepers: fc.array(fc.integer({ min: 1400, max: 1850 }), { minLength: 1, maxLength: 2 }),
  bed: fc.constantFrom('across', 'lengthways', 'lounge', 'any' as const),
  toilet: fc.boolean(),
  shower: fc.boolean(),
  fridge: fc.constantFrom('none', 'small', 'medium', 'large' as const),
  counterMin: fc.integer({ min: 0, max: 1200 }),
  fuel: fc.constantFrom('gas', 'electric' as const),
  seed: fc.integer({ min: 0, max: 1000 }),
});

describe('proposals keep door entries and wheel arches clear', () => {
  it('holds for random briefs', { timeout: 180_000 }, () => {
    let proposals = 0;
    fc.assert(
      fc.property(briefArb, (a) => {
        const brief = briefSchema.parse({
          ...TYPICAL_BRIEF,
          bay: { source: 'template', template: a.template },
          sleepers: a.sleepers,
          bed: a.bed,
          toilet: a.toilet,
          shower: a.shower,
          fuel: a.fuel,
          seed: a.seed,
          kitchen: { ...TYPICAL_BRIEF.kitchen, fridge: a.fridge, counterMin: a.counterMin },
        });
        const r = generateProposals(brief, { maxCandidates: 150 });
        for (const p of r.proposals) {
          proposals++;
          const bay = p.doc.bay;
          for (const m of p.doc.modules) {
            const x0 = m.x, x1 = m.x + m.length, y0 = m.y, y1 = m.y + m.width;
            // Inside the lined interior, so never through a door's opening.
            expect(x0).toBeGreaterThanOrEqual(0);
            expect(x1).toBeLessThanOrEqual(bay.length);
            expect(y0).toBeGreaterThanOrEqual(WALL_T);
            expect(y1).toBeLessThanOrEqual(bay.width - WALL_T);
            const comesIn = m.arrangements.includes('travel') || m.arrangements.includes('lounge');
            for (const d of bay.doors) {
              if (d.wall === 'rear' || !comesIn) continue;
              const zy0 = d.wall === 'right' ? bay.width - WALL_T - 500 : WALL_T;
              const zy1 = d.wall === 'right' ? bay.width - WALL_T : WALL_T + 500;
              const overlaps = x0 < d.offset + d.width && d.offset < x1 && y0 < zy1 && zy0 < y1;
              expect(overlaps, `${m.label} in the ${d.wall}-hand door's entry`).toBe(false);
            }
            for (const arch of bay.wheelArches) {
              const ay0 = arch.side === 'left' ? 0 : bay.width - arch.width;
              const ay1 = arch.side === 'left' ? arch.width : bay.width;
              const over = x0 < arch.x + arch.length && arch.x < x1 && y0 < ay1 && ay0 < y1;
              if (over) expect(FLOOR_T + m.elevation, `${m.label} on the ${arch.side} arch`).toBeGreaterThanOrEqual(arch.height);
            }
          }
        }
      }),
      { numRuns: 12, seed: 1818 },
    );
    expect(proposals).toBeGreaterThan(0);
  });
});
