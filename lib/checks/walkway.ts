/**
 * Walkway rules, in the travel and lounge arrangements:
 *   walkway.reach  a person (disk of diameter walkwayMin, EN 1646-1 450 mm — from memory)
 *                  coming in at a door can stand squarely in front of every module worked from
 *                  its front, within arm's reach (700 mm, common practice)
 *   walkway.width  the narrowest corridor on the way: the widest disk, in whole mm, that still
 *                  gets from a door to every module the walkway reaches; warns below
 *                  walkwayMin + 100 mm (common practice 500–600 mm)
 * Pure: must never import UI, framework or database code.
 */
import { widestRouteBounds, widestRouteIntoZone } from '../geometry';
import type { Arrangement } from '../layout/schema';
import { archBoxes, doorOpenings, inArrangement, moduleRect } from '../layout/bay';
import { blocksFloor, describeDoor } from './moduleRoles';
import type { CheckContext } from './context';
import type { FloorAnalysis } from './floorAnalysis';
import { listNames, mm, moduleName, plural } from './naming';
import { RULE_CONSTANTS } from './settings';
import { SOURCES } from './sources';
import type { Finding } from './types';

export const WALKWAY_ARRANGEMENTS: Arrangement[] = ['travel', 'lounge'];

const reachSource = `${SOURCES.walkwayMin.cite}; ${SOURCES.armReach.cite}`;
const reachBrief = 'Walkway width from EN 1646-1 (from memory); arm’s reach is common practice, no source';
const widthSource = `${SOURCES.walkwayComfort.cite}; ${SOURCES.walkwayMin.cite}`;
const widthBrief = 'Comfortable width is common practice, no source; minimum from EN 1646-1 (from memory)';

export function walkwayReach(ctx: CheckContext, arrangement: Arrangement): Finding {
  const { walkwayMin } = ctx.settings;
  const a = ctx.floor(arrangement);
  const total = a.targets.length;
  if (!a.hasDoors) {
    return { id: 'walkway.reach', status: 'warn', arrangement, measured: 0, required: 1, unit: 'doors', message: `No door opening is drawn in the bay, so the ${arrangement} walkway cannot be checked: add the sliding, side or rear door. ${reachBrief}.`, source: reachSource };
  }
  if (total === 0) {
    return { id: 'walkway.reach', status: 'pass', arrangement, measured: 0, required: 0, unit: 'modules', message: `Nothing in the ${arrangement} arrangement is worked from its front, so no walkway is needed to reach it. ${reachBrief}.`, source: reachSource };
  }
  const missed = a.targets.filter((t) => !t.reached);
  const reached = total - missed.length;
  if (missed.length === 0) {
    return {
      id: 'walkway.reach',
      status: 'pass',
      arrangement,
      moduleIds: a.targets.map((t) => t.module.id),
      measured: reached,
      required: total,
      unit: 'modules',
      message: `In ${arrangement}, a ${mm(walkwayMin)} walkway from a door reaches the front of all ${plural(total, 'module')} worked from the front, within ${mm(RULE_CONSTANTS.armReach)}. ${reachBrief}.`,
      source: reachSource,
    };
  }
  const entry = a.floor.anyEntry
    ? ''
    : ` No door lets a ${mm(walkwayMin)} person in at all (${listNames(doorOpenings(ctx.doc).map((d) => describeDoor(d.door)))}): each is narrower than that or blocked just inside.`;
  return {
    id: 'walkway.reach',
    status: 'fail',
    arrangement,
    moduleIds: missed.map((t) => t.module.id),
    measured: reached,
    required: total,
    unit: 'modules',
    message: `In ${arrangement}, a person ${mm(walkwayMin)} wide coming in at a door cannot stand squarely in front of ${listNames(missed.map((t) => `${moduleName(t.module)} (facing ${t.module.facing})`))} within ${mm(RULE_CONSTANTS.armReach)}; ${reached} of ${total} can be reached.${entry} ${reachBrief}.`,
    source: reachSource,
  };
}

interface Probe {
  ok: boolean;
  cutOff: string[];
}

/**
 * Largest whole-mm diameter D in [lo, hi] for which every target of `a` still connects to a door
 * (the caller knows lo works). Each probe is a sweep. The first guess is the route bound from the
 * walkway sweep (lib/geometry/widestPath: the narrowest span on the best route to each target);
 * when a sweep at that diameter gets through, it is the answer, since a wider disk cannot stand
 * in a narrower span — only where a diagonal squeeze hides between sweep columns could a wider
 * one pass, and there the engine errs on the safe side anyway. Otherwise bisection in whole mm.
 */
/** Widest passages already measured on a model (arrangements holding the same modules share one: CheckContext.floor). */
const measuredPassages = new WeakMap<FloorAnalysis['model'], Map<string, { diameter: number; cutOff: string[] }>>();

function widestPassage(a: FloorAnalysis, lo: number, hi: number): { diameter: number; cutOff: string[] } {
  let known = measuredPassages.get(a.model);
  if (!known) measuredPassages.set(a.model, (known = new Map()));
  const key = `${lo},${hi}`;
  const found = known.get(key);
  if (found) return found;
  const result = measurePassage(a, lo, hi);
  known.set(key, result);
  return result;
}

function measurePassage(a: FloorAnalysis, lo: number, hi: number): { diameter: number; cutOff: string[] } {
  const wanted = a.targets.filter((t) => t.reached);
  const cache = new Map<number, Probe>();
  const probe = (d: number): Probe => {
    let p = cache.get(d);
    if (!p) {
      const floor = a.model.sweep(d / 2);
      const cutOff = wanted.length === 0 ? [] : wanted.filter((t) => !floor.reachesZone(t.zone)).map((t) => moduleName(t.module));
      p = { ok: wanted.length === 0 ? floor.anyEntry : cutOff.length === 0, cutOff };
      cache.set(d, p);
    }
    return p;
  };
  const routes = widestRouteBounds(a.floor);
  let entryBound = lo;
  for (let i = 0; i < routes.length; i++) if (a.floor.entryWidth[i] > 0) entryBound = Math.max(entryBound, Math.floor(routes[i]));
  const bounds = wanted.map((t) => Math.floor(widestRouteIntoZone(a.floor, routes, t.zone)));
  const bound = Math.max(lo, Math.min(hi, wanted.length === 0 ? entryBound : Math.min(...bounds)));

  if (probe(bound).ok) {
    const cutOff = wanted.filter((_, k) => bounds[k] <= bound).map((t) => moduleName(t.module));
    return { diameter: bound, cutOff: bound < hi ? cutOff : [] };
  }
  let good = lo;
  let bad = bound;
  while (bad - good > 1) {
    const mid = Math.floor((good + bad) / 2);
    if (probe(mid).ok) good = mid;
    else bad = mid;
  }
  return { diameter: good, cutOff: probe(bad).cutOff };
}

export function walkwayWidth(ctx: CheckContext, arrangement: Arrangement): Finding {
  const { walkwayMin } = ctx.settings;
  const comfortable = walkwayMin + RULE_CONSTANTS.walkwayComfortExtra;
  const a = ctx.floor(arrangement);
  const base = { id: 'walkway.width', arrangement, required: comfortable, unit: 'mm', source: widthSource } as const;
  if (!a.hasDoors) {
    return { ...base, status: 'warn', measured: 0, message: `No door opening is drawn in the bay, so the ${arrangement} walkway width cannot be measured: add the doors. ${widthBrief}.` };
  }
  const anyReached = a.targets.some((t) => t.reached);
  if (!a.floor.anyEntry) {
    return { ...base, status: 'warn', measured: 0, message: `In ${arrangement} nobody ${mm(walkwayMin)} wide gets in: ${blockedDoors(ctx, arrangement)}. Clear a door opening to measure the walkway; a comfortable walkway is ${mm(comfortable)}. ${widthBrief}.` };
  }
  if (a.targets.length > 0 && !anyReached) {
    const names = listNames(a.targets.map((t) => `${moduleName(t.module)} (facing ${t.module.facing})`), 4);
    return { ...base, status: 'warn', measured: 0, message: `In ${arrangement} a person gets in at a door but cannot stand in front of anything worked from its front — ${names}: each front faces a wall or is boxed in by other modules (see the reach result). Turn them to face the room, then the walkway is measured; a comfortable walkway is ${mm(comfortable)}. ${widthBrief}.` };
  }
  const doors = ctx.doc.bay.doors;
  const { t } = ctx;
  const hi = Math.floor(Math.min(ctx.doc.bay.width - 2 * t.wallT, ctx.doc.bay.length, Math.max(...doors.map((d) => d.width))));
  const { diameter, cutOff } = widestPassage(a, walkwayMin, Math.max(hi, walkwayMin));
  const what = anyReached ? 'every module the walkway reaches' : 'inside from a door';
  const squeeze = cutOff.length > 0 ? ` The squeeze is at or on the way to ${listNames(cutOff)}.` : '';
  const ok = diameter >= comfortable;
  return {
    ...base,
    status: ok ? 'pass' : 'warn',
    measured: diameter,
    message: `The narrowest part of the ${arrangement} walkway is ${mm(diameter)} (the widest person who still gets ${what}); ${ok ? 'at least' : 'below'} the comfortable ${mm(comfortable)} (minimum ${mm(walkwayMin)} + ${mm(RULE_CONSTANTS.walkwayComfortExtra)}).${squeeze} ${widthBrief}.`,
  };
}

/** Why no door admits the walkway person, door by door: too narrow, or which modules stand in its way. */
function blockedDoors(ctx: CheckContext, arrangement: Arrangement): string {
  const { walkwayMin } = ctx.settings;
  const reasons = doorOpenings(ctx.doc).map(({ door }) => {
    if (door.width < walkwayMin) return `the ${describeDoor(door)} is narrower than that`;
    // What stands on the floor within a person's width inside the opening.
    const span0 = door.offset, span1 = door.offset + door.width;
    const inside = walkwayMin + ctx.t.wallT;
    const near = (m: (typeof ctx.doc.modules)[number]) => {
      const r = moduleRect(m);
      if (door.wall === 'rear') return r.x1 > ctx.doc.bay.length - walkwayMin && r.y0 < span1 && r.y1 > span0;
      if (door.wall === 'left') return r.y0 < inside && r.x0 < span1 && r.x1 > span0;
      return r.y1 > ctx.doc.bay.width - inside && r.x0 < span1 && r.x1 > span0;
    };
    const blockers = ctx.doc.modules.filter((m) => inArrangement(m, arrangement) && blocksFloor(m) && near(m)).map(moduleName);
    const arches = archBoxes(ctx.doc).filter((x) => (door.wall === 'rear' ? x.rect.x1 > ctx.doc.bay.length - walkwayMin : x.side === door.wall && x.rect.x0 < span1 && x.rect.x1 > span0));
    const what = [...blockers, ...arches.map((x) => `the ${x.side} wheel arch`)];
    return what.length ? `${listNames(what, 4)} ${what.length === 1 ? 'stands' : 'stand'} in the ${describeDoor(door)}` : `the ${describeDoor(door)} leads to no floor ${mm(walkwayMin)} wide`;
  });
  return reasons.join('; ');
}
