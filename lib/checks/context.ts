/**
 * One check run's shared state: the document, the resolved settings, the build-up thicknesses,
 * and lazily computed analyses (the free floor per arrangement, the beds) that several rule
 * families read. Computed once per run, never stored between runs.
 * Pure: must never import UI, framework or database code.
 */
import type { Rect } from '../geometry';
import type { Arrangement, LayoutDoc } from '../layout/schema';
import { buildUpThickness, inArrangement, moduleRect, type BuildUpThickness } from './bayModel';
import { findBeds, type Bed } from './beds';
import { analyseFloor, type FloorAnalysis } from './floorAnalysis';
import { RULE_CONSTANTS, type CheckSettings } from './settings';

export class CheckContext {
  readonly t: BuildUpThickness;
  private readonly floors = new Map<Arrangement, FloorAnalysis>();
  private bedsCache?: Bed[];

  constructor(readonly doc: LayoutDoc, readonly settings: CheckSettings) {
    this.t = buildUpThickness(doc);
  }

  /** Modules that hang at head height in an arrangement (underside between 1000 mm and the standing height). */
  headHeightModules(arrangement: Arrangement) {
    const standing = this.doc.occupants.standingHeight;
    return this.doc.modules.filter((m) => inArrangement(m, arrangement) && m.elevation >= RULE_CONSTANTS.floorBlockBelow && m.elevation < standing);
  }

  /** The walkway person's free floor in one arrangement (disk of diameter walkwayMin). */
  floor(arrangement: Arrangement): FloorAnalysis {
    let a = this.floors.get(arrangement);
    if (!a) {
      const queried: Rect[] = this.headHeightModules(arrangement).map(moduleRect);
      a = analyseFloor(this.doc, this.t, arrangement, { radius: this.settings.walkwayMin / 2, queried });
      this.floors.set(arrangement, a);
    }
    return a;
  }

  /** Beds made up in the sleep arrangement. */
  beds(): Bed[] {
    this.bedsCache ??= findBeds(this.doc, this.t, this.settings);
    return this.bedsCache;
  }
}
