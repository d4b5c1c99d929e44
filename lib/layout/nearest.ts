/**
 * What a point of the plan is about: the bay's openings and modules in plan, and the nearest of
 * them to a point — how a mark-up (a free point on the plan) is named in its list ("near the galley
 * window"), and where a mark-up placed at an opening goes. An opening in plan is a window's pane on
 * its wall line (`paneDepth` into the room), a roof opening's outline, a small square round a body
 * point. Pure: plain numbers in, names out; must never import UI, framework or database code.
 */
import { distanceToRect, nearestRectFinder } from '../geometry/spatialIndex';
import { inArrangement, moduleRect } from './bay';
import { moduleLabel } from './kinds';
import { openingPlanRect, openingTitle } from './openings';
// Where an opening lies in plan lives with the openings (no spatial index, no kinds), so a page
// that only places mark-ups at openings does not load them; re-exported for the server's callers.
export { BODY_POINT_HALF, openingPlanPoint, openingPlanRect, PANE_DEPTH_MIN } from './openings';
import type { Arrangement, Bay, Module } from './schema';

/** A mark-up further than this from every module and opening is named by its point only (common practice, no source). */
export const NEAR_LIMIT_MM = 600;

export interface NearestThing {
  kind: 'module' | 'opening';
  id: string;
  /** Its name in words: a module's label or kind, an opening's label or kind (never an id). */
  name: string;
  /** Plan distance from the point to its outline, mm (0 inside). */
  distance: number;
}

type NearestDoc = { bay: Pick<Bay, 'length' | 'width' | 'doors' | 'openings'>; modules: Pick<Module, 'id' | 'kind' | 'label' | 'x' | 'y' | 'length' | 'width' | 'arrangements'>[] };

/**
 * The module (of the arrangement) or opening nearest a point of the plan, within `limit` mm; null
 * when nothing is that close. At the same distance an opening wins (a roof vent over a bed is what
 * a point on the vent is about); among modules at the same distance, whichever the index finds first.
 * Made once for many points: the openings (at most OPENING_LIMITS.count) are scanned, the modules
 * are held in the spatial index (lib/geometry/spatialIndex), so n points over m modules cost
 * about (n + m) log m, not n × m.
 */
export function nearestFinder(doc: NearestDoc, arrangement: Arrangement): (x: number, y: number, limit?: number) => NearestThing | null {
  const openings = (doc.bay.openings ?? []).flatMap((o) => {
    const r = openingPlanRect(doc.bay, o);
    return r ? [{ o, r }] : [];
  });
  const modules = doc.modules.filter((m) => inArrangement(m, arrangement));
  const nearestModule = nearestRectFinder(modules.map(moduleRect));
  return (x, y, limit = NEAR_LIMIT_MM) => {
    let best: NearestThing | null = null;
    for (const { o, r } of openings) {
      const d = distanceToRect(x, y, r);
      if (d <= limit && (!best || d < best.distance)) best = { kind: 'opening', id: o.id, name: openingTitle(doc.bay, o), distance: d };
    }
    const near = nearestModule(x, y, limit);
    if (near && (!best || near.distance < best.distance)) {
      const m = modules[near.index];
      best = { kind: 'module', id: m.id, name: moduleLabel(m), distance: near.distance };
    }
    return best;
  };
}
