// Building layout documents for the rule tests: our own L2H2 bay template (3100 × 1800 × 2000,
// invented round figures; arches 320 mm high standing in 210 mm at x 1700–2650, sliding door on
// the right at 150–1350, rear door 150–1650) with the default build-up (floor 24, roof 26, walls 36 mm), or a bare box.
import { expect } from 'vitest';
import { runChecks, type CheckReport, type Finding } from '@/lib/checks';
import { bayTemplate, DEFAULT_BUILD_UP, layoutDocSchema, type LayoutDoc, type LayoutDocInput } from '@/lib/layout';

type ModuleInput = LayoutDocInput['modules'][number];

/** The template's bay without its openings (the rule tests add their own where they need them). */
export const L2H2 = { ...bayTemplate('l2h2')!.bay, openings: [] };

/** A module with sensible defaults: on the floor, facing right, in every arrangement. */
export function mod(m: Partial<ModuleInput> & Pick<ModuleInput, 'id' | 'kind' | 'x' | 'y' | 'length' | 'width'>): ModuleInput {
  return { elevation: 0, height: 900, facing: 'right', arrangements: ['travel', 'lounge', 'sleep'], ...m };
}

export interface DocOptions {
  bay?: Partial<LayoutDocInput['bay']>;
  modules?: ModuleInput[];
  occupants?: Partial<LayoutDocInput['occupants']>;
  settings?: LayoutDocInput['settings'];
  buildUp?: LayoutDocInput['buildUp'];
}

/** A document in the L2H2 bay (override any part). */
export function l2h2Doc(o: DocOptions = {}): LayoutDoc {
  return layoutDocSchema.parse({
    schemaVersion: 4,
    name: 'Test layout',
    bay: { ...L2H2, ...o.bay },
    buildUp: o.buildUp ?? DEFAULT_BUILD_UP,
    occupants: { standingHeight: 1800, sleepers: [1800, 1650], ...o.occupants },
    modules: o.modules ?? [],
    ...(o.settings ? { settings: o.settings } : {}),
  });
}

/** A plain box: no arches, no build-up (so bare = lined), one door as given. */
export function boxDoc(o: DocOptions & { length?: number; width?: number; height?: number } = {}): LayoutDoc {
  return l2h2Doc({
    ...o,
    bay: { length: o.length ?? 3000, width: o.width ?? 1800, height: o.height ?? 2000, wheelArches: [], doors: [{ id: 'rear', wall: 'rear', offset: 0, width: o.width ?? 1800 }], ...o.bay },
    buildUp: o.buildUp ?? { floor: [], roof: [], walls: [] },
  });
}

export function findings(report: CheckReport, id: string, arrangement?: string): Finding[] {
  return report.findings.filter((f) => f.id === id && (arrangement === undefined || f.arrangement === arrangement));
}

/** The one finding of a rule (in an arrangement); fails the test if there is not exactly one. */
export function only(doc: LayoutDoc, id: string, arrangement?: string): Finding {
  const list = findings(runChecks(doc), id, arrangement);
  expect(list, `${id}${arrangement ? ` in ${arrangement}` : ''}: ${JSON.stringify(list.map((f) => f.message))}`).toHaveLength(1);
  return list[0];
}
