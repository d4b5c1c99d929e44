// Test documents for build planning: an invented L2H2 van with round numbers, so hand-worked
// values stay easy to follow. Not a test file (no .test.ts): imported by the tests here.
import { bayTemplate, emptyLayout, layoutDocSchema, type LayoutDoc, type LayoutDocInput, type Module } from '@/lib/layout';

/** The L2H2 template's bay without its drawn openings (tests that want openings add their own, `withOpenings`). */
export function baseDoc(): LayoutDoc {
  return emptyLayout('Test van', { ...bayTemplate('l2h2')!.bay, openings: [] });
}

export function withOpenings(doc: LayoutDoc, openings: NonNullable<LayoutDocInput['bay']['openings']>): LayoutDoc {
  return layoutDocSchema.parse({ ...doc, bay: { ...doc.bay, openings } });
}

type ModuleInput = Partial<Module> & Pick<Module, 'id' | 'kind'>;

export function withModules(doc: LayoutDoc, modules: ModuleInput[]): LayoutDoc {
  const full = modules.map((m) => ({
    x: 0, y: 36, length: 500, width: 500, elevation: 0, height: 800, facing: 'front' as const, arrangements: ['travel', 'lounge', 'sleep'] as const,
    ...m,
  }));
  return layoutDocSchema.parse({ ...doc, modules: [...doc.modules, ...full] });
}

export function withSystems(doc: LayoutDoc, systems: NonNullable<LayoutDocInput['systems']>): LayoutDoc {
  return layoutDocSchema.parse({ ...doc, systems });
}

/** Invented vehicle data in round class-typical figures: 2200 kg running order (1250 kg front), 3500 kg max, 3700 mm wheelbase, 6.0 m overall. */
export const VAN = {
  massInRunningOrderKg: 2200,
  frontAxleRunningOrderKg: 1250,
  maxAuthorisedMassKg: 3500,
  maxFrontAxleKg: 1850,
  maxRearAxleKg: 2000,
  wheelbaseMm: 3700,
  frontAxleX: -800,
  overallLengthMm: 6000,
  cabSeatX: -300,
};
