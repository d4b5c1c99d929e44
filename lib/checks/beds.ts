/**
 * Sleeping places made up in the sleep arrangement: modules inside the body whose top is a bed
 * there (`surfaces.sleep`), grouped first by level — tops more than RULE_CONSTANTS.placeStep
 * (150 mm, a step no mattress bridges; common practice, SOURCES.placeStep) apart are different
 * places, so a bunk over the lounge bed is its own — then, within a level, into one place when
 * they touch or lie closer than levelTolerance in plan (common practice, SOURCES.bedLevel). A seam
 * narrower than that between two pieces side by side is bridged by the mattress. Each place gets
 * the largest axis-aligned rectangle inside its pieces (lib/geometry/largestRectangle) and the
 * tallest standard mattress that fits it. Sorting by level and clustering in an R-tree keeps the
 * work n log n in the pieces. Pure: must never import UI, framework or database code.
 */
import { clusterByGap, intervalGap, intervalOverlap, largestRectangle, WorkLimitError, type Rect, type WorkBudget } from '../geometry';
import type { LayoutDoc, Module } from '../layout/schema';
import { moduleRect, mountedInside, surfaceIn, topAboveBare, type BuildUpThickness } from '../layout/bay';
import { largestFittingMattress, type Mattress } from './mattress';
import { listNames, moduleName } from './naming';
import { RULE_CONSTANTS } from './settings';
import type { CheckSettings } from './settings';

export interface Bed {
  /** 1-based, largest clear rectangle first. */
  number: number;
  pieces: Module[];
  /** Largest clear rectangle, or null when it could not be computed (see `problem`). */
  rect: Rect | null;
  long: number;
  short: number;
  /** True when the long side runs along the van (x). */
  lengthways: boolean;
  mattress?: Mattress;
  /** Highest minus lowest top of its pieces, mm. */
  levelDifference: number;
  /** The mattress top: the highest top of its pieces above the FINISHED floor, mm. */
  top: number;
  problem?: string;
}

/** Fills the seam between two pieces that sit side by side closer than `tolerance`. */
function seamBridges(rects: Rect[], tolerance: number): Rect[] {
  const bridges: Rect[] = [];
  for (let i = 0; i < rects.length; i++) {
    for (let j = i + 1; j < rects.length; j++) {
      const a = rects[i], b = rects[j];
      const gx = intervalGap(a.x0, a.x1, b.x0, b.x1);
      const gy = intervalGap(a.y0, a.y1, b.y0, b.y1);
      if (gx > 0 && gy === 0 && gx < tolerance && intervalOverlap(a.y0, a.y1, b.y0, b.y1) > 0) {
        bridges.push({ x0: Math.min(a.x1, b.x1), x1: Math.max(a.x0, b.x0), y0: Math.max(a.y0, b.y0), y1: Math.min(a.y1, b.y1) });
      } else if (gy > 0 && gx === 0 && gy < tolerance && intervalOverlap(a.x0, a.x1, b.x0, b.x1) > 0) {
        bridges.push({ y0: Math.min(a.y1, b.y1), y1: Math.max(a.y0, b.y0), x0: Math.max(a.x0, b.x0), x1: Math.min(a.x1, b.x1) });
      }
    }
  }
  return bridges;
}

/** More pieces than this in one bed is not a bed but a data problem; reported, never computed. */
const MAX_PIECES = 400;

export function findBeds(doc: LayoutDoc, t: BuildUpThickness, settings: CheckSettings, budget?: WorkBudget): Bed[] {
  const pieces = doc.modules.filter((m) => mountedInside(m) && surfaceIn(m, 'sleep') === 'sleep');
  const beds = levelBands(pieces).flatMap((band) => {
    const rects = band.map(moduleRect);
    return clusterByGap(rects, settings.levelTolerance, budget).map((g) => measureBed(g.map((i) => band[i]), g.map((i) => rects[i]), t, settings, budget));
  });
  beds.sort((a, b) => b.long * b.short - a.long * a.short || b.long - a.long || a.top - b.top);
  return beds.map((b, i) => ({ ...b, number: i + 1 }));
}

/** Pieces split where their tops, taken in order of height, step up by more than placeStep. */
function levelBands(pieces: Module[]): Module[][] {
  const byTop = [...pieces].sort((a, b) => a.elevation + a.height - (b.elevation + b.height));
  const bands: Module[][] = [];
  let last = Number.NEGATIVE_INFINITY;
  for (const m of byTop) {
    const top = m.elevation + m.height;
    if (top - last > RULE_CONSTANTS.placeStep || bands.length === 0) bands.push([m]);
    else bands[bands.length - 1].push(m);
    last = top;
  }
  // Document order within a band, so names and ids read as the designer drew them.
  const order = new Map(pieces.map((m, i) => [m, i]));
  return bands.map((b) => b.sort((x, y) => order.get(x)! - order.get(y)!));
}

function measureBed(mods: Module[], own: Rect[], t: BuildUpThickness, settings: CheckSettings, budget?: WorkBudget): Omit<Bed, 'number'> {
  const tops = mods.map((m) => topAboveBare(m, t.floorT));
  const levelDifference = Math.max(...tops) - Math.min(...tops);
  const base = { pieces: mods, levelDifference, top: Math.max(...tops) - t.floorT };
  if (mods.length > MAX_PIECES) {
    return { ...base, rect: null, long: 0, short: 0, lengthways: true, problem: `made of ${mods.length} pieces (more than ${MAX_PIECES}), too many to measure` };
  }
  let rect: Rect | null;
  budget?.spend(own.length * own.length);
  try {
    rect = largestRectangle([...own, ...seamBridges(own, settings.levelTolerance)], { budget });
  } catch (e) {
    if (e instanceof WorkLimitError) throw e;
    return { ...base, rect: null, long: 0, short: 0, lengthways: true, problem: e instanceof Error ? e.message : String(e) };
  }
  const dx = rect ? rect.x1 - rect.x0 : 0;
  const dy = rect ? rect.y1 - rect.y0 : 0;
  const long = Math.max(dx, dy), short = Math.min(dx, dy);
  return { ...base, rect, long, short, lengthways: dx >= dy, mattress: largestFittingMattress(settings.mattressRegion, long, short) };
}

/** A sleeping place in words, by its pieces' labels: "The bed (Left bench, Infill)", "Bed 2 (Upper bunk)". */
export function placeName(bed: Bed, count: number): string {
  const pieces = listNames(bed.pieces.map(moduleName), 4);
  return count > 1 ? `Bed ${bed.number} (${pieces})` : `The bed (${pieces})`;
}
