/**
 * egress.sleep — in the sleep arrangement, every sleeping place has a way out: a door opening
 * borders the place directly, or a corridor at least 400 mm wide (common practice, SOURCES.egress)
 * leads from its edge to a door. "From its edge" means a 400 mm disk, come in at a door, can step
 * right up to (touch) one of its pieces. A place whose mattress top is more than 800 mm above the
 * floor (EN 747-1, from memory; SOURCES.climb) also needs a ladder or step (a `step` module present
 * in sleep within 400 mm of its pieces in plan); without one it fails. Steps are found through an
 * R-tree, so the work stays n log n. Pure: must never import UI, framework or database code.
 */
import { FreeFloorModel, intervalOverlap, RectIndex } from '../geometry';
import type { Module } from '../layout/schema';
import { doorOpenings, inArrangement, linedInterior, moduleRect } from '../layout/bay';
import { placeName, type Bed } from './beds';
import { describeDoor } from './moduleRoles';
import type { CheckContext } from './context';
import { floorObstacles } from './floorAnalysis';
import { listNames, mm, moduleName } from './naming';
import { RULE_CONSTANTS } from './settings';
import { SOURCES } from './sources';
import type { Finding } from './types';

/** The doors whose opening a bed piece reaches right up to along the wall. */
function borderingDoors(ctx: CheckContext, piece: Module): number[] {
  const { length: L, width: W } = ctx.doc.bay;
  const wallT = ctx.t.wallT;
  const r = moduleRect(piece);
  const out: number[] = [];
  ctx.doc.bay.doors.forEach((d, k) => {
    const span0 = d.offset, span1 = d.offset + d.width;
    const touches =
      d.wall === 'right' ? r.y1 >= W - wallT && intervalOverlap(r.x0, r.x1, span0, span1) > 0
      : d.wall === 'left' ? r.y0 <= wallT && intervalOverlap(r.x0, r.x1, span0, span1) > 0
      : r.x1 >= L && intervalOverlap(r.y0, r.y1, span0, span1) > 0;
    if (touches) out.push(k);
  });
  return out;
}

export function egressSleep(ctx: CheckContext): Finding[] {
  const beds = ctx.beds();
  if (beds.length === 0) return [];
  const corridor = RULE_CONSTANTS.egressCorridor;
  const doors = ctx.doc.bay.doors;
  const base = { id: 'egress.sleep', arrangement: 'sleep' as const, required: 1, unit: 'doors', source: SOURCES.egress.cite };
  if (doors.length === 0) {
    return [{ ...base, status: 'warn', measured: 0, moduleIds: beds.flatMap((b) => b.pieces.map((m) => m.id)), message: `No door opening is drawn in the bay, so the way out from the beds cannot be checked: add the doors. ${SOURCES.egress.brief}.` }];
  }
  const r = corridor / 2;
  const pieceRects = beds.flatMap((b) => b.pieces.map(moduleRect));
  const model = new FreeFloorModel({
    interior: linedInterior(ctx.doc),
    obstacles: floorObstacles(ctx.doc, 'sleep'),
    openings: doorOpenings(ctx.doc).map((d) => d.opening),
    marks: pieceRects.flatMap((p) => [p.x0, p.x1, p.x0 - r, p.x1 + r]),
    budget: ctx.budget,
  });
  const floor = model.sweep(r);
  const climb = climbing(ctx, beds);
  return beds.map((bed, b) => {
    const name = placeName(bed, beds.length);
    const moduleIds = bed.pieces.map((m) => m.id);
    const direct = new Set(bed.pieces.flatMap((p) => borderingDoors(ctx, p)));
    let mask = 0;
    for (const p of bed.pieces) mask |= floor.openingsNear(moduleRect(p), r, false);
    const viaCorridor = doors.map((_, k) => k).filter((k) => !direct.has(k) && (mask & (1 << k)) !== 0);
    const ways = direct.size + viaCorridor.length;
    if (ways === 0) {
      return { ...base, status: 'fail' as const, moduleIds, measured: 0, message: `${name} has no way out: no door opening borders it and no corridor ${mm(corridor)} wide leads from its edge to a door. Needs at least one. ${SOURCES.egress.brief}.` };
    }
    const said = [
      ...[...direct].map((k) => `${describeDoor(doors[k])} borders it`),
      ...viaCorridor.map((k) => `a corridor at least ${mm(corridor)} wide leads to the ${describeDoor(doors[k])}`),
    ];
    const way = `${name} has ${ways === 1 ? 'a way' : `${ways} ways`} out: ${listNames(said)}. Needs at least one. ${SOURCES.egress.brief}.`;
    const c = climb[b];
    if (!c) return { ...base, status: 'pass' as const, moduleIds, measured: ways, message: way };
    if (c.steps.length === 0) {
      return { ...base, status: 'fail' as const, moduleIds, measured: ways, message: `${way} But its mattress top is ${mm(bed.top)} above the floor, higher than ${mm(RULE_CONSTANTS.climbFrom)}, and no ladder or step stands within ${mm(corridor)} of it: add one. ${SOURCES.climb.brief}.`, source: `${SOURCES.egress.cite}; ${SOURCES.climb.cite}` };
    }
    return { ...base, status: 'pass' as const, moduleIds: [...moduleIds, ...c.steps.map((m) => m.id)], measured: ways, message: `${way} Its mattress top is ${mm(bed.top)} above the floor, so it needs a ladder or step: ${listNames(c.steps.map(moduleName))} beside it. ${SOURCES.climb.brief}.`, source: `${SOURCES.egress.cite}; ${SOURCES.climb.cite}` };
  });
}

/** For each place at or above climbFrom, the steps (or ladders) within the corridor width of its pieces; null below it. */
function climbing(ctx: CheckContext, beds: Bed[]): ({ steps: Module[] } | null)[] {
  const steps = ctx.doc.modules.filter((m) => m.kind === 'step' && inArrangement(m, 'sleep'));
  const index = new RectIndex(steps.map(moduleRect));
  return beds.map((bed) => {
    if (bed.top <= RULE_CONSTANTS.climbFrom) return null;
    const near = new Set<number>();
    for (const p of bed.pieces) for (const j of index.near(moduleRect(p), RULE_CONSTANTS.egressCorridor, ctx.budget)) near.add(j);
    return { steps: [...near].sort((a, b) => a - b).map((j) => steps[j]) };
  });
}
