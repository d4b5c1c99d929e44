// The editor's hand-written document rules must agree with the zod schema, value for value.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { ARRANGEMENTS, FACINGS, SURFACES, MODULE_KINDS, baySchema, buildUpSchema, moduleSchema, occupantsSchema } from '@/lib/layout/schema';
import { EDITOR_ARRANGEMENTS, EDITOR_FACINGS, EDITOR_SURFACES, bayProblem, buildUpProblem, moduleProblem, occupantsProblem } from '@/components/editor/store/docRules';

// Mostly plausible values (so both "accept" and "refuse" are exercised), with edge and bad ones mixed in.
const odd = (good: fc.Arbitrary<unknown>, bad: fc.Arbitrary<unknown>): fc.Arbitrary<unknown> => fc.oneof({ arbitrary: good, weight: 12 }, { arbitrary: bad, weight: 1 });
const length = odd(fc.integer({ min: 1, max: 4000 }), fc.oneof(fc.integer({ min: -200_000, max: 200_000 }), fc.double({ min: -10, max: 6000, noNaN: true }), fc.constantFrom(0, 1, 500, 499, 1000, 1001, 2800, 2801, 5000, 5001, 100_000, 100_001, -100_000, -100_001)));
const id = odd(fc.stringMatching(/^[A-Za-z0-9_-]{1,64}$/), fc.constantFrom('', 'a b', 'é', 'x'.repeat(65)));
const textish = odd(fc.stringMatching(/^[A-Za-z ]{1,30}$/), fc.oneof(fc.string({ maxLength: 90 }), fc.constantFrom('Bench\u0007', '', 'x'.repeat(81), 'x'.repeat(201))));

const moduleArb = fc.record({
  id,
  kind: odd(fc.constantFrom(...MODULE_KINDS), fc.constantFrom('spaceship', 'bed')),
  label: fc.option(textish, { nil: undefined }),
  x: length, y: length, length, width: length, elevation: length, height: length,
  facing: odd(fc.constantFrom(...FACINGS), fc.constant('up')),
  arrangements: odd(fc.subarray([...ARRANGEMENTS], { minLength: 1 }), fc.array(fc.constantFrom('travel', 'night', 'sleep'), { maxLength: 4 })),
  surface: fc.option(odd(fc.constantFrom(...SURFACES), fc.constant('roof')), { nil: undefined }),
  massKg: fc.option(odd(fc.double({ min: 0, max: 5000, noNaN: true }), fc.constantFrom(-1, 5000.5, Number.POSITIVE_INFINITY)), { nil: undefined }),
  props: fc.option(fc.dictionary(fc.oneof({ arbitrary: fc.stringMatching(/^[A-Za-z][A-Za-z0-9]{0,8}$/), weight: 12 }, { arbitrary: fc.constantFrom('1bad', 'bad key'), weight: 1 }), fc.oneof(odd(fc.double({ noNaN: true, noDefaultInfinity: true }), fc.constant(Number.NEGATIVE_INFINITY)), fc.boolean(), textish), { maxKeys: 5 }), { nil: undefined }),
}, { requiredKeys: ['id', 'kind', 'x', 'y', 'length', 'width', 'elevation', 'height', 'facing', 'arrangements'] });

const bayArb = fc.record({
  length: odd(fc.integer({ min: 3000, max: 6000 }), length), width: odd(fc.integer({ min: 1500, max: 2500 }), length), height: length,
  wheelArches: fc.array(fc.record({ side: fc.constantFrom('left', 'right'), x: fc.integer({ min: 0, max: 3000 }), length: fc.integer({ min: 0, max: 1500 }), width: length, height: length }), { maxLength: 3 }),
  doors: fc.array(fc.record({ id, wall: fc.constantFrom('left', 'right', 'rear'), offset: fc.integer({ min: 0, max: 2000 }), width: fc.integer({ min: 0, max: 2000 }) }), { maxLength: 3 }),
  bulkhead: fc.boolean(),
  cabSeats: odd(fc.integer({ min: 0, max: 9 }), fc.constantFrom(-1, 10, 2.5)),
});

describe('editor document rules agree with the schema', () => {
  it('module: accepted exactly when moduleSchema accepts (property)', () => {
    let accepted = 0;
    fc.assert(fc.property(moduleArb, (m) => {
      const clean = Object.fromEntries(Object.entries(m).filter(([, v]) => v !== undefined));
      const zodOk = moduleSchema.safeParse(clean).success;
      if (zodOk) accepted += 1;
      expect(moduleProblem(clean as any) === null).toBe(zodOk);
    }), { numRuns: 3000 });
    // Both sides of the equivalence are exercised, not only "both refuse".
    expect(accepted).toBeGreaterThan(30);
  });

  it('bay: accepted exactly when baySchema accepts (property)', () => {
    let accepted = 0;
    fc.assert(fc.property(bayArb, (b) => {
      if (baySchema.safeParse(b).success) accepted += 1;
      expect(bayProblem(b as any) === null).toBe(baySchema.safeParse(b).success);
    }), { numRuns: 3000 });
    expect(accepted).toBeGreaterThan(30);
  });

  it('build-up and occupants: accepted exactly when their schemas accept (property)', () => {
    const layer = fc.record({ material: textish, thickness: length });
    fc.assert(fc.property(fc.record({ floor: fc.array(layer, { maxLength: 3 }), roof: fc.array(layer, { maxLength: 13 }), walls: fc.array(layer, { maxLength: 2 }) }), (b) => {
      expect(buildUpProblem(b as any) === null).toBe(buildUpSchema.safeParse(b).success);
    }), { numRuns: 1000 });
    fc.assert(fc.property(fc.record({ standingHeight: length, sleepers: fc.array(length, { maxLength: 13 }) }), (o) => {
      expect(occupantsProblem(o as any) === null).toBe(occupantsSchema.safeParse(o).success);
    }), { numRuns: 1000 });
  });

  it('uses the same word lists as the schema', () => {
    expect([...EDITOR_ARRANGEMENTS]).toEqual([...ARRANGEMENTS]);
    expect([...EDITOR_FACINGS]).toEqual([...FACINGS]);
    expect([...EDITOR_SURFACES]).toEqual([...SURFACES]);
  });

  it('names the field in its message', () => {
    expect(moduleProblem({ id: 'a', kind: 'table', x: 0, y: 0, length: 10, width: 10, elevation: 0, height: 0, facing: 'front', arrangements: ['lounge'] })).toMatch(/^height:/);
    expect(bayProblem({ length: 3000, width: 1700, height: 1900, wheelArches: [], doors: [{ id: 'r', wall: 'rear', offset: 1000, width: 1000 }], bulkhead: true, cabSeats: 2 })).toMatch(/rear wall/);
  });
});
