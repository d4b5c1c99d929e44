/**
 * Each sleeping place on its own (lib/checks/beds.ts finds them per level):
 *   sleep.place     what the place is: its pieces by label, its level, its clear size and mattress
 *   sleep.headroom  sitting headroom: from its mattress top up to the lowest thing above it — the
 *                   lined roof, a locker, another bed — against the 95th-percentile sitting height
 *                   (965 mm, Bodyspace Table 10.1, from memory; SOURCES.sittingHeight): warn below
 *                   it, fail when something sits on the mattress itself
 * The way out of each place, with a ladder or step above 800 mm, is egress.sleep (egress.ts).
 * Each place asks an R-tree of the modules present in sleep for what lies over it, so the work is
 * n log n in the module count. Pure: must never import UI, framework or database code.
 */
import { RectIndex, type Rect } from '../geometry';
import { inArrangement, moduleRect } from '../layout/bay';
import type { Module } from '../layout/schema';
import { placeName, type Bed } from './beds';
import type { CheckContext } from './context';
import { formatMattress } from './mattress';
import { mm, moduleName } from './naming';
import { RULE_CONSTANTS } from './settings';
import { SOURCES } from './sources';
import type { Finding } from './types';

export interface Overhead {
  /** Clear height above the mattress top, mm. */
  clear: number;
  /** What limits it: a module, or undefined for the lined roof. */
  over?: Module;
}

/** Where a place's headroom is measured: its clear rectangle, or its pieces' outline when it has none. */
function placeArea(bed: Bed): Rect {
  if (bed.rect) return bed.rect;
  const rs = bed.pieces.map(moduleRect);
  return { x0: Math.min(...rs.map((r) => r.x0)), y0: Math.min(...rs.map((r) => r.y0)), x1: Math.max(...rs.map((r) => r.x1)), y1: Math.max(...rs.map((r) => r.y1)) };
}

/** The clear height over each place (same order as `beds`): the lowest underside over it, else the lined roof. */
export function overheads(ctx: CheckContext, beds: Bed[]): Overhead[] {
  const present = ctx.doc.modules.filter((m) => inArrangement(m, 'sleep'));
  const index = new RectIndex(present.map(moduleRect));
  const roof = ctx.doc.bay.height - ctx.t.floorT - ctx.t.roofT;
  return beds.map((bed) => {
    const own = new Set(bed.pieces);
    let best: Overhead = { clear: roof - bed.top };
    for (const j of index.near(placeArea(bed), 0, ctx.budget)) {
      const m = present[j];
      if (own.has(m) || m.elevation < bed.top) continue;
      if (m.elevation - bed.top < best.clear) best = { clear: m.elevation - bed.top, over: m };
    }
    return best;
  });
}

export function sleepPlaces(ctx: CheckContext): Finding[] {
  const beds = ctx.beds();
  if (beds.length === 0) return [];
  const sitting = RULE_CONSTANTS.sittingHeight;
  const above = overheads(ctx, beds);
  const out: Finding[] = [];
  beds.forEach((bed, k) => {
    const name = placeName(bed, beds.length);
    const moduleIds = bed.pieces.map((m) => m.id);
    const size = bed.rect ? `clear ${mm(bed.long)} × ${mm(bed.short)}` : `not measurable (${bed.problem ?? 'no area'})`;
    out.push({
      id: 'sleep.place',
      status: bed.rect ? 'pass' : 'warn',
      arrangement: 'sleep',
      moduleIds,
      measured: bed.top,
      required: 0,
      unit: 'mm',
      message: `${name} is a sleeping place of its own: mattress top ${mm(bed.top)} above the floor, ${size}${bed.mattress ? `, takes a ${formatMattress(bed.mattress)}` : ''}. Pieces whose tops step by more than ${mm(RULE_CONSTANTS.placeStep)} are separate places. ${SOURCES.placeStep.brief}.`,
      source: SOURCES.placeStep.cite,
    });
    const { clear, over } = above[k];
    const what = over ? `the underside of ${moduleName(over)}` : 'the lined roof';
    const status = clear <= 0 ? 'fail' : clear >= sitting ? 'pass' : 'warn';
    const verdict =
      status === 'pass' ? `enough to sit up (${mm(sitting)} needed)`
        : status === 'warn' ? `${mm(sitting - clear)} short of sitting up (${mm(sitting)} needed); lying down only`
          : `${what} sits on the mattress itself`;
    out.push({
      id: 'sleep.headroom',
      status,
      arrangement: 'sleep',
      moduleIds: over ? [...moduleIds, over.id] : moduleIds,
      measured: Math.max(0, clear),
      required: sitting,
      unit: 'mm',
      message: `${name}: ${mm(Math.max(0, clear))} from the mattress top up to ${what}; ${verdict}. Sitting height of a 95th-percentile man, ${SOURCES.sittingHeight.brief}.`,
      source: SOURCES.sittingHeight.cite,
    });
  });
  return out;
}
