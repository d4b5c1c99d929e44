/**
 * Headroom rules:
 *   headroom.standing  clear height = bay.height − floor build-up − roof build-up against the
 *                      tallest standing person's stature + headMargin (20 mm), the figure in
 *                      `required`: fail below the stature itself, warn below stature + margin,
 *                      else pass; says the tallest stature that fits
 *   headroom.overhead  in travel and lounge, warns for each module whose underside is between
 *                      1000 mm and the standing height and that hangs over the walkway (the
 *                      person's disk passes under part of it): a head strike
 * Common practice, no source (SOURCES.headroom, SOURCES.headStrike). Pure: must never import UI,
 * framework or database code.
 */
import type { Arrangement } from '../layout/schema';
import { moduleRect } from '../layout/bay';
import { RULE_CONSTANTS } from './settings';
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
  const wanted = standing + headMargin;
  const clear = clearHeadroom(ctx);
  if (clear <= 0) {
    // No clear height at all is not a headroom figure but an input out of range: say so.
    return {
      id: 'headroom.standing',
      status: 'fail',
      measured: Math.max(0, clear),
      required: wanted,
      unit: 'mm',
      message: `The floor and roof build-up (${mm(ctx.t.floorT)} + ${mm(ctx.t.roofT)}) is as thick as the ${mm(ctx.doc.bay.height)} bay is high or thicker, which cannot be: an input is out of range. Check the bay height and the build-up layers. ${SOURCES.headroom.brief}.`,
      source: SOURCES.headroom.cite,
    };
  }
  const status = clear < standing ? 'fail' : clear < wanted ? 'warn' : 'pass';
  const verdict =
    status === 'pass'
      ? `stands upright with ${mm(clear - wanted)} to spare beyond the margin`
      : status === 'warn'
        ? `stands, but ${mm(wanted - clear)} short of the margin`
        : `cannot stand upright: ${mm(standing - clear)} short of their stature, ${mm(wanted - clear)} short with the margin`;
  return {
    id: 'headroom.standing',
    status,
    measured: clear,
    required: wanted,
    unit: 'mm',
    message: `Clear standing height ${mm(clear)} after ${mm(ctx.t.floorT)} floor and ${mm(ctx.t.roofT)} roof build-up; needs ${mm(wanted)} (the tallest person’s ${mm(standing)} stature + ${mm(headMargin)} margin), so the tallest person ${verdict}. It fits people up to ${mm(Math.max(0, clear - headMargin))} tall with the margin, ${mm(clear)} without. ${SOURCES.headroom.brief}.`,
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
        message: `In ${arrangement}, nothing hangs at head height (underside between ${mm(RULE_CONSTANTS.floorBlockBelow)} and ${mm(standing)}) over the walkway. ${SOURCES.headStrike.brief}.`,
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
