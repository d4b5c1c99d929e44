/**
 * One check run's shared state: the document, the resolved settings, the build-up thicknesses,
 * and lazily computed analyses (the free floor per arrangement, the beds) that several rule
 * families read. Computed once per run, never stored between runs.
 * Pure: must never import UI, framework or database code.
 */
import { WorkBudget, type Rect } from '../geometry';
import type { Arrangement, LayoutDoc } from '../layout/schema';
import { buildUpThickness, inArrangement, moduleRect, type BuildUpThickness } from '../layout/bay';
import { findBeds, type Bed } from './beds';
import { analyseFloor, type FloorAnalysis } from './floorAnalysis';
import { RULE_CONSTANTS, type CheckSettings } from './settings';

/**
 * Steps of geometry work one check run may spend (lib/geometry/workBudget): n log n in the module
 * count. Measured on the generated realistic layouts (tests/checks/fixtures/generatedLayout), a
 * run uses about a tenth of it; a hostile pile runs out and the rule family it stopped is
 * reported as not checked. Common practice, no source.
 */
export const CHECK_WORK = { perModule: 500, base: 2_000_000 } as const;

export class CheckContext {
  readonly t: BuildUpThickness;
  /** Shared by every rule family of this run. */
  readonly budget: WorkBudget;
  private readonly floors = new Map<Arrangement, FloorAnalysis>();
  /** Which modules each analysed arrangement holds (document indices): equal sets give equal floors. */
  private readonly presence = new Map<string, FloorAnalysis>();
  private bedsCache?: Bed[];

  constructor(readonly doc: LayoutDoc, readonly settings: CheckSettings) {
    this.t = buildUpThickness(doc);
    this.budget = WorkBudget.forItems(doc.modules.length, CHECK_WORK.perModule, CHECK_WORK.base);
  }

  /** Modules that hang at head height in an arrangement (underside between 1000 mm and the standing height). */
  headHeightModules(arrangement: Arrangement) {
    const standing = this.doc.occupants.standingHeight;
    return this.doc.modules.filter((m) => inArrangement(m, arrangement) && m.elevation >= RULE_CONSTANTS.floorBlockBelow && m.elevation < standing);
  }

  /**
   * The walkway person's free floor in one arrangement (disk of diameter walkwayMin). The analysis
   * depends only on which modules the arrangement holds (its obstacles, the fronts to reach, what
   * hangs at head height), so two arrangements holding the same modules — travel and lounge in most
   * layouts — share one: its model, its sweeps, and what walkway.width measures on it.
   */
  floor(arrangement: Arrangement): FloorAnalysis {
    let a = this.floors.get(arrangement);
    if (!a) {
      const key = this.doc.modules.map((m, i) => (inArrangement(m, arrangement) ? i : -1)).filter((i) => i >= 0).join(',');
      const twin = this.presence.get(key);
      if (twin) a = { ...twin, arrangement };
      else {
        const queried: Rect[] = this.headHeightModules(arrangement).map(moduleRect);
        a = analyseFloor(this.doc, this.t, arrangement, { radius: this.settings.walkwayMin / 2, queried, budget: this.budget });
        this.presence.set(key, a);
      }
      this.floors.set(arrangement, a);
    }
    return a;
  }

  /** Beds made up in the sleep arrangement. */
  beds(): Bed[] {
    this.bedsCache ??= findBeds(this.doc, this.t, this.settings, this.budget);
    return this.bedsCache;
  }
}
