/**
 * The free floor of one arrangement as the walkway person sees it: obstacles (wheel arches and
 * every module present that blocks the floor), the door openings, and the working zone in front
 * of each module used from its front. Shared by walkway.* and headroom.overhead so both read the
 * same corridor. Pure: must never import UI, framework or database code.
 *
 * Door entry (decided here, documented for the editor): the person is a disk of diameter
 * walkwayMin; it comes in at a door with its centre just inside the lining — on the line half a
 * walkway in from the lined wall (side doors) or from the rear edge of the floor (rear door,
 * which has no lining) — and wholly within the door's span, so a door narrower than the walkway
 * admits nobody.
 */
import { FreeFloorModel, type FreeFloor, type Rect, type WorkBudget } from '../geometry';
import type { Arrangement, LayoutDoc, Module } from '../layout/schema';
import { archBoxes, doorOpenings, inArrangement, linedInterior, moduleRect, workingZone, type BuildUpThickness } from '../layout/bay';
import { blocksFloor, usedFromFront } from './moduleRoles';
import { RULE_CONSTANTS } from './settings';

export interface WorkTarget {
  module: Module;
  zone: Rect;
  reached: boolean;
}

export interface FloorAnalysis {
  arrangement: Arrangement;
  /** The model the sweeps run on; sweep it again at other radii. */
  model: FreeFloorModel;
  /** The sweep at the walkway radius (walkwayMin / 2). */
  floor: FreeFloor;
  radius: number;
  hasDoors: boolean;
  targets: WorkTarget[];
}

export interface FloorAnalysisOptions {
  /** Disk radius for the main sweep. */
  radius: number;
  /** Extra rectangles whose neighbourhood will be queried (edges ± `nearBy` become exact columns). */
  queried?: Rect[];
  nearBy?: number;
  budget?: WorkBudget;
}

export function floorObstacles(doc: LayoutDoc, arrangement: Arrangement): Rect[] {
  const obstacles: Rect[] = archBoxes(doc).map((a) => a.rect);
  for (const m of doc.modules) if (inArrangement(m, arrangement) && blocksFloor(m)) obstacles.push(moduleRect(m));
  return obstacles;
}

export function analyseFloor(doc: LayoutDoc, t: BuildUpThickness, arrangement: Arrangement, options: FloorAnalysisOptions): FloorAnalysis {
  const reach = RULE_CONSTANTS.armReach;
  const candidates = doc.modules.filter((m) => inArrangement(m, arrangement) && usedFromFront(m));
  const zones = candidates.map((m) => workingZone(m, reach));
  const marks: number[] = [];
  for (const z of zones) marks.push(z.x0, z.x1);
  const near = options.nearBy ?? options.radius;
  for (const q of options.queried ?? []) marks.push(q.x0, q.x1, q.x0 - near, q.x1 + near);
  const openings = doorOpenings(doc).map((d) => d.opening);
  const model = new FreeFloorModel({ interior: linedInterior(doc), obstacles: floorObstacles(doc, arrangement), openings, marks, budget: options.budget });
  const floor = model.sweep(options.radius);
  return {
    arrangement,
    model,
    floor,
    radius: options.radius,
    hasDoors: openings.length > 0,
    targets: candidates.map((m, i) => ({ module: m, zone: zones[i], reached: floor.reachesZone(zones[i]) })),
  };
}
