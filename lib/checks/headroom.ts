/**
 * Headroom rules:
 *   headroom.standing  clear height = bay.height − floor build-up − roof build-up against the
 *                      tallest standing person: fail below their stature, warn below stature +
 *                      headMargin (20 mm), else pass; says the tallest stature that fits
 *   headroom.overhead  in travel and lounge, warns for each module whose underside is between
 *                      1000 mm and the standing height and that hangs over the walkway (the
 *                      person's disk passes under part of it): a head strike
 * Common practice, no source (SOURCES.headroom, SOURCES.headStrike). Pure: must never import UI,
 * framework or database code.
 */
import type { Arrangement } from '../layout/schema';
import { moduleRect } from './bayModel';
import type { CheckContext } from './context';
import { mm, moduleName } from './naming';
import { SOURCES } from './sources';
import type { Finding } from './types';

export function clearHeadroom(ctx: CheckContext): number {
  return ctx.doc.bay.height - ctx.t.floorT - ctx.t.roofT;
}

export function headroomStanding(ctx: CheckContext): Finding {
  const { headMargin } = ctx.settings;
  const standing = ctx.doc.occupants.standingHeight;
  const clear = clearHeadroom(ctx);
  const status = clear < standing ? 'fail' : clear < standing + headMargin ? 'warn' : 'pass';
  const fits = clear - headMargin;
  const verdict =
    status === 'pass' ? 'stands upright with room to spare' : status === 'warn' ? `stands, but with less than the ${mm(headMargin)} margin` : `cannot stand upright (${mm(standing - clear)} short)`;
  return {
    id: 'headroom.standing',
    status,
    measured: clear,
    required: standing,
    unit: 'mm',
    message: `Clear standing height ${mm(clear)} after ${mm(ctx.t.floorT)} floor and ${mm(ctx.t.roofT)} roof build-up; needs ${mm(standing)} for the tallest person (+${mm(headMargin)} margin), who ${verdict}. It fits people up to ${mm(Math.max(0, fits))} tall with the margin, ${mm(clear)} without. ${SOURCES.headroom.brief}.`,
    source: SOURCES.headroom.cite,
  };
}

export function headroomOverhead(ctx: CheckContext, arrangement: Arrangement): Finding[] {
  const standing = ctx.doc.occupants.standingHeight;
  const floor = ctx.floor(arrangement);
  const r = floor.radius;
  // Without doors the whole free floor counts as walkway (anyFloor): better a warning too many.
  const anyFloor = !floor.hasDoors;
  const struck = ctx.headHeightModules(arrangement).filter((m) => floor.floor.openingsNear(moduleRect(m), r, true, anyFloor) !== 0);
  if (struck.length === 0) {
    return [
      {
        id: 'headroom.overhead',
        status: 'pass',
        arrangement,
        measured: 0,
        required: 0,
        unit: 'modules',
        message: `In ${arrangement}, nothing hangs at head height (underside between 1000 mm and ${mm(standing)}) over the walkway. ${SOURCES.headStrike.brief}.`,
        source: SOURCES.headStrike.cite,
      },
    ];
  }
  return struck.map((m) => ({
    id: 'headroom.overhead',
    status: 'warn' as const,
    arrangement,
    moduleIds: [m.id],
    measured: m.elevation,
    required: standing,
    unit: 'mm',
    message: `In ${arrangement}, ${moduleName(m)} hangs over the walkway with its underside ${mm(m.elevation)} above the floor, below the ${mm(standing)} standing height: a head strike. Raise it to ${mm(standing)} or keep it clear of the walkway, and pad its edges. ${SOURCES.headStrike.brief}.`,
    source: SOURCES.headStrike.cite,
  }));
}
