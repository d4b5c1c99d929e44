/**
 * Beds made up in the sleep arrangement: modules with a sleep surface, grouped into one bed when
 * they touch or lie closer than levelTolerance in plan (common practice, SOURCES.bedLevel). A seam
 * narrower than that between two pieces side by side is bridged by the mattress. Each bed gets the
 * largest axis-aligned rectangle inside its pieces (lib/geometry/largestRectangle) and the tallest
 * standard mattress that fits it. Pure: must never import UI, framework or database code.
 */
import { clusterByGap, intervalGap, intervalOverlap, largestRectangle, WorkLimitError, type Rect, type WorkBudget } from '../geometry';
import type { LayoutDoc, Module } from '../layout/schema';
import { moduleRect, surfaceIn, topAboveBare, type BuildUpThickness } from '../layout/bay';
import { largestFittingMattress, type Mattress } from './mattress';
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
  const pieces = doc.modules.filter((m) => surfaceIn(m, 'sleep') === 'sleep');
  const rects = pieces.map(moduleRect);
  const groups = clusterByGap(rects, settings.levelTolerance, budget);
  const beds = groups.map((g): Omit<Bed, 'number'> => {
    const mods = g.map((i) => pieces[i]);
    const tops = mods.map((m) => topAboveBare(m, t.floorT));
    const levelDifference = Math.max(...tops) - Math.min(...tops);
    const base = { pieces: mods, levelDifference };
    if (mods.length > MAX_PIECES) {
      return { ...base, rect: null, long: 0, short: 0, lengthways: true, problem: `made of ${mods.length} pieces (more than ${MAX_PIECES}), too many to measure` };
    }
    const own = g.map((i) => rects[i]);
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
  });
  beds.sort((a, b) => b.long * b.short - a.long * a.short || b.long - a.long);
  return beds.map((b, i) => ({ ...b, number: i + 1 }));
}
