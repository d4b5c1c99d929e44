/**
 * egress.sleep — in the sleep arrangement, every bed has a way out: a door opening borders the
 * bed directly, or a corridor at least 400 mm wide (common practice, SOURCES.egress) leads from a
 * bed edge to a door. "From a bed edge" means a 400 mm disk, come in at a door, can step right up
 * to (touch) one of the bed's pieces. Pure: must never import UI, framework or database code.
 */
import { FreeFloorModel, intervalOverlap } from '../geometry';
import type { Module } from '../layout/schema';
import { doorOpenings, linedInterior, moduleRect } from '../layout/bay';
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
  return beds.map((bed) => {
    const name = beds.length > 1 ? `Bed ${bed.number} (${listNames(bed.pieces.map(moduleName), 4)})` : `The bed (${listNames(bed.pieces.map(moduleName), 4)})`;
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
    return { ...base, status: 'pass' as const, moduleIds, measured: ways, message: `${name} has ${ways === 1 ? 'a way' : `${ways} ways`} out: ${listNames(said)}. Needs at least one. ${SOURCES.egress.brief}.` };
  });
}
