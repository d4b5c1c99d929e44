/**
 * Clearance rules, measured on the drawn openings (bay.openings):
 *   clearance.window        per window: the share of its glass a module standing within
 *                           CLEARANCE.nearWall of the wall hides in elevation (by day: travel or
 *                           lounge); warn above CLEARANCE.windowCoverShare, and for any overhead
 *                           locker crossing the glass whatever the share
 *   clearance.roof-opening  per roof opening: the space between the highest module under it and
 *                           its inside frame, warn under CLEARANCE.roofOpeningReach; and, when the
 *                           frame hangs below the tallest person's stature, fail if anyone can
 *                           stand under it (travel or lounge floor not wholly covered by modules
 *                           standing on the floor or the wheel arches), pass when only modules are under it
 *   clearance.exhaust       per heater exhaust and each opening window, door, roof opening and
 *                           fuel filler: the straight-line distance to its nearest edge
 *   clearance.gas-vent      per gas locker drop-out vent and each of the same and every heater exhaust
 *   clearance.intake        per heater intake and each heater exhaust
 * A distance finding fails when the whole millimetres measured (rounded down, so it errs short)
 * are under the figure. Every figure is common practice with no source (SOURCES.windowCover,
 * roofOpening, exhaust, gasVent, intake): the heater's installation manual, EN 1949 and the
 * installer decide, and the outlet findings say so. Nothing is drawn, nothing is reported: the
 * heater caution's declared ticks stand in for outlets not drawn (systems/heat.ts).
 *
 * Bounded: at most 64 openings (the schema), so each rule is linear in the modules; the pair rules
 * are at most 64 × 76 pairs. Pure: must never import UI, framework or database code.
 */
import type { Rect } from '../geometry/rect';
import { archBoxes, buildUpThickness, inArrangement, linedInterior, moduleRect } from '../layout/bay';
import { OUTLET_CAUTION } from '../layout/cautions';
import {
  bodyPoints, distanceToBox, doorBox, doorName, openingBox, openingName, roofOpeningRect, roofOpenings, windowOnWall, windows,
  bodyPointAt, type Box3,
} from '../layout/openings';
import type { BodyPoint, Door, LayoutDoc, Module, Opening, RoofOpening, WindowOpening } from '../layout/schema';
import type { CheckContext } from './context';
import { blocksFloor } from './moduleRoles';
import { listNames, mm, moduleName } from './naming';
import { SOURCES } from './sources';
import type { Finding } from './types';

/** The figures the clearance rules compare against: each common practice, no source (see SOURCES). */
export const CLEARANCE = Object.freeze({
  /** A module this close to a wall's lining (mm) stands in front of its windows (SOURCES.windowCover). */
  nearWall: 300,
  /** More than this share of a window's glass hidden → warn (SOURCES.windowCover). */
  windowCoverShare: 0.25,
  /** Space kept under a roof opening's inside frame, mm (SOURCES.roofOpening). */
  roofOpeningReach: 300,
  /** Heater exhaust to an opening window, door or roof opening, mm (SOURCES.exhaust). */
  exhaustFromOpening: 300,
  /** Heater exhaust to the fuel filler, mm (SOURCES.exhaust). */
  exhaustFromFuelFiller: 500,
  /** Gas locker drop vent to any opening, the fuel filler or a heater exhaust, mm (SOURCES.gasVent). */
  gasVentFrom: 500,
  /** Heater intake to the heater exhaust, mm (SOURCES.intake). */
  intakeFromExhaust: 300,
});

/** At most this many pieces under one roof opening are sorted out for standing floor; more count as standing floor (errs towards a head strike). */
const COVER_LIMIT = 64;

const DAY = ['travel', 'lounge'] as const;

export function clearanceChecks(ctx: CheckContext): Finding[] {
  if (ctx.doc.bay.openings.length === 0) return [];
  return [...windowClearance(ctx), ...roofOpeningClearance(ctx), ...outletClearance(ctx.doc)];
}

const pct = (share: number) => Math.round(share * 1000) / 10;

// ---- windows ------------------------------------------------------------------------------------

/** How far the module stands from the wall's lining (mm; negative inside the build-up band). */
function gapToWall(m: Module, wall: 'left' | 'right' | 'rear', lined: Rect): number {
  if (wall === 'left') return m.y - lined.y0;
  if (wall === 'right') return lined.y1 - (m.y + m.width);
  return lined.x1 - (m.x + m.length);
}

function windowClearance(ctx: CheckContext): Finding[] {
  const doc = ctx.doc;
  const lined = linedInterior(doc);
  const floorT = ctx.t.floorT;
  const day = doc.modules.filter((m) => DAY.some((a) => inArrangement(m, a)));
  const out: Finding[] = [];
  for (const w of windows(doc.bay)) {
    const glass = windowOnWall(doc.bay, floorT, w);
    if (!glass) continue;
    const area = w.width * w.height;
    let worst = 0;
    const over: { m: Module; share: number }[] = [];
    const lockers: Module[] = [];
    for (const m of day) {
      if (gapToWall(m, glass.wall, lined) > CLEARANCE.nearWall) continue;
      const a0 = glass.wall === 'rear' ? m.y : m.x;
      const a1 = glass.wall === 'rear' ? m.y + m.width : m.x + m.length;
      const z0 = floorT + m.elevation;
      const z1 = z0 + m.height;
      const along = Math.min(a1, glass.along1) - Math.max(a0, glass.along0);
      const up = Math.min(z1, glass.z1) - Math.max(z0, glass.z0);
      if (along <= 0 || up <= 0) continue;
      const share = (along * up) / area;
      worst = Math.max(worst, share);
      if (share > CLEARANCE.windowCoverShare) over.push({ m, share });
      else if (m.kind === 'overhead-locker') lockers.push(m);
    }
    const name = openingName(doc.bay, w);
    const limit = pct(CLEARANCE.windowCoverShare);
    const flagged = [...over.map((o) => o.m), ...lockers];
    const parts: string[] = [];
    if (over.length) parts.push(`${listNames(over.map((o) => `${moduleName(o.m)} (${pct(o.share)} %)`))} ${over.length === 1 ? 'hides' : 'hide'} more than ${limit} % of the glass of ${name}`);
    if (lockers.length) parts.push(`${listNames(lockers.map(moduleName))} ${lockers.length === 1 ? 'crosses' : 'cross'} ${name}`);
    out.push({
      id: 'clearance.window',
      status: flagged.length ? 'warn' : 'pass',
      openingIds: [w.id],
      ...(flagged.length ? { moduleIds: flagged.map((m) => m.id) } : {}),
      measured: pct(worst),
      required: limit,
      unit: '%',
      message: flagged.length
        ? `${parts.join('; ')}: move ${flagged.length === 1 ? 'it' : 'them'} along the wall, lower ${flagged.length === 1 ? 'it' : 'them'}, or move the window${w.opens ? ' (it opens: keep its handle in reach)' : ''}. ${SOURCES.windowCover.brief}.`
        : `Nothing standing by the wall hides more than ${limit} % of the glass of ${name} by day (at most ${pct(worst)} %), and no overhead locker crosses it. ${SOURCES.windowCover.brief}.`,
      source: SOURCES.windowCover.cite,
    });
  }
  return out;
}

// ---- roof openings ------------------------------------------------------------------------------

/** Whether some floor under `r` is left uncovered by the `covers` rectangles (positive area). */
export function leavesFloor(r: Rect, covers: Rect[]): boolean {
  if (r.x1 <= r.x0 || r.y1 <= r.y0) return false;
  const clipped = covers
    .map((c) => ({ x0: Math.max(c.x0, r.x0), x1: Math.min(c.x1, r.x1), y0: Math.max(c.y0, r.y0), y1: Math.min(c.y1, r.y1) }))
    .filter((c) => c.x1 > c.x0 && c.y1 > c.y0);
  if (clipped.length > COVER_LIMIT) return true;
  const xs = [...new Set([r.x0, r.x1, ...clipped.flatMap((c) => [c.x0, c.x1])])].sort((a, b) => a - b);
  for (let i = 0; i + 1 < xs.length; i++) {
    const a = xs[i], b = xs[i + 1];
    const spans = clipped.filter((c) => c.x0 <= a && c.x1 >= b).sort((p, q) => p.y0 - q.y0);
    let reached = r.y0;
    for (const s of spans) {
      if (s.y0 > reached) return true;
      reached = Math.max(reached, s.y1);
    }
    if (reached < r.y1) return true;
  }
  return false;
}

function overlapsInPlan(a: Rect, b: Rect): boolean {
  return Math.min(a.x1, b.x1) > Math.max(a.x0, b.x0) && Math.min(a.y1, b.y1) > Math.max(a.y0, b.y0);
}

function roofOpeningClearance(ctx: CheckContext): Finding[] {
  const doc = ctx.doc;
  const clear = doc.bay.height - ctx.t.floorT - ctx.t.roofT;
  const standing = doc.occupants.standingHeight;
  const lined = linedInterior(doc);
  const arches = archBoxes(doc).map((a) => a.rect);
  const out: Finding[] = [];
  for (const o of roofOpenings(doc.bay)) {
    const plan = roofOpeningRect(o);
    const frameBottom = clear - o.frameHeight;
    const name = openingName(doc.bay, o);
    const under = doc.modules.filter((m) => overlapsInPlan(moduleRect(m), plan));
    const highest = under.reduce((h, m) => Math.max(h, m.elevation + m.height), 0);
    const gap = frameBottom - highest;
    const close = under.filter((m) => frameBottom - (m.elevation + m.height) < CLEARANCE.roofOpeningReach);
    out.push({
      id: 'clearance.roof-opening',
      status: close.length ? 'warn' : 'pass',
      openingIds: [o.id],
      ...(close.length ? { moduleIds: close.map((m) => m.id) } : {}),
      measured: Math.round(gap),
      required: CLEARANCE.roofOpeningReach,
      unit: 'mm',
      message: close.length
        ? `${listNames(close.map(moduleName))} ${close.length === 1 ? 'reaches' : 'reach'} within ${mm(CLEARANCE.roofOpeningReach)} of the frame of ${name} (${mm(Math.max(0, gap))} left under its ${mm(frameBottom)} frame): it cannot be opened or draw air freely; move the opening or lower what stands under it. ${SOURCES.roofOpening.brief}.`
        : `${capital(name)} has ${mm(gap)} clear under its frame (${mm(frameBottom)} above the floor${under.length ? `, over ${listNames(under.map(moduleName))}` : ''}), at least the ${mm(CLEARANCE.roofOpeningReach)} to reach and open it. ${SOURCES.roofOpening.brief}.`,
      source: SOURCES.roofOpening.cite,
    });
    if (frameBottom >= standing) continue;
    // The frame hangs lower than the tallest person: a head strike wherever someone can stand under it.
    const floorUnder = { x0: Math.max(plan.x0, lined.x0), x1: Math.min(plan.x1, lined.x1), y0: Math.max(plan.y0, lined.y0), y1: Math.min(plan.y1, lined.y1) };
    const standsUnder = DAY.some((a) => leavesFloor(floorUnder, [...arches, ...doc.modules.filter((m) => inArrangement(m, a) && blocksFloor(m)).map(moduleRect)]));
    out.push({
      id: 'clearance.roof-opening',
      status: standsUnder ? 'fail' : 'pass',
      openingIds: [o.id],
      measured: frameBottom,
      required: standing,
      unit: 'mm',
      message: standsUnder
        ? `The frame of ${name} hangs ${mm(frameBottom)} above the floor, ${mm(standing - frameBottom)} below the tallest person’s ${mm(standing)}, over floor where people stand: a head strike. Use a flatter frame, move the opening over a bed or a unit, or pad it. ${SOURCES.roofOpening.brief}.`
        : `The frame of ${name} hangs ${mm(frameBottom)} above the floor, below the tallest person’s ${mm(standing)}, but only over modules standing on the floor: nobody stands under it. ${SOURCES.roofOpening.brief}.`,
      source: SOURCES.roofOpening.cite,
    });
  }
  return out;
}

function capital(s: string): string {
  return s.charAt(0).toUpperCase() + s.slice(1);
}

// ---- outlets ------------------------------------------------------------------------------------

type OutletRule = 'clearance.exhaust' | 'clearance.gas-vent' | 'clearance.intake';

/** One measured pair: an outlet and what it must keep away from. */
export interface OutletPair {
  id: OutletRule;
  point: BodyPoint;
  /** The opening it is measured to, or the door. */
  target: { opening: Opening } | { door: Door };
  /** Straight-line distance to the target's nearest edge, in whole millimetres rounded down. */
  measured: number;
  required: number;
}

/** Every pair the outlet rules measure, in document order. */
export function outletPairs(doc: Pick<LayoutDoc, 'bay' | 'buildUp'>): OutletPair[] {
  const bay = doc.bay;
  if (bay.openings.length === 0) return [];
  const floorT = buildUpThickness(doc).floorT;
  const exhausts = bodyPoints(bay, 'heater-exhaust');
  const fillers = bodyPoints(bay, 'fuel-filler');
  const openingWindows: Opening[] = windows(bay).filter((w: WindowOpening) => w.opens);
  const roofs: Opening[] = roofOpenings(bay) as RoofOpening[];
  const out: OutletPair[] = [];
  const measure = (id: OutletRule, point: BodyPoint, required: number, target: OutletPair['target'], box: Box3 | null) => {
    if (!box) return;
    out.push({ id, point, target, required, measured: Math.floor(distanceToBox(bodyPointAt(bay, point), box)) });
  };
  const toOpenings = (id: OutletRule, point: BodyPoint, required: number, fillerRequired: number, alsoExhausts: boolean) => {
    for (const o of [...openingWindows, ...roofs]) measure(id, point, required, { opening: o }, openingBox(bay, floorT, o));
    for (const door of bay.doors) measure(id, point, required, { door }, doorBox(bay, door));
    for (const f of fillers) measure(id, point, fillerRequired, { opening: f }, openingBox(bay, floorT, f));
    if (alsoExhausts) for (const e of exhausts) measure(id, point, required, { opening: e }, openingBox(bay, floorT, e));
  };
  for (const e of exhausts) toOpenings('clearance.exhaust', e, CLEARANCE.exhaustFromOpening, CLEARANCE.exhaustFromFuelFiller, false);
  for (const v of bodyPoints(bay, 'gas-drop-vent')) toOpenings('clearance.gas-vent', v, CLEARANCE.gasVentFrom, CLEARANCE.gasVentFrom, true);
  for (const i of bodyPoints(bay, 'heater-intake')) for (const e of exhausts) measure('clearance.intake', i, CLEARANCE.intakeFromExhaust, { opening: e }, openingBox(bay, floorT, e));
  return out;
}

const OUTLET_SOURCE = { 'clearance.exhaust': SOURCES.exhaust, 'clearance.gas-vent': SOURCES.gasVent, 'clearance.intake': SOURCES.intake } as const;

function outletClearance(doc: LayoutDoc): Finding[] {
  return outletPairs(doc).map((p) => {
    const ok = p.measured >= p.required;
    const source = OUTLET_SOURCE[p.id];
    const from = openingName(doc.bay, p.point);
    const to = 'door' in p.target ? doorName(p.target.door) : openingName(doc.bay, p.target.opening);
    const caution = p.id === 'clearance.gas-vent' ? OUTLET_CAUTION.gas : OUTLET_CAUTION.heating;
    return {
      id: p.id,
      status: ok ? 'pass' : 'fail',
      openingIds: 'opening' in p.target ? [p.point.id, p.target.opening.id] : [p.point.id],
      measured: p.measured,
      required: p.required,
      unit: 'mm',
      message: ok
        ? `${capital(from)} is ${mm(p.measured)} from ${to}: at least the ${mm(p.required)} wanted. ${source.brief}.`
        : `${capital(from)} is ${mm(p.measured)} from ${to}, ${mm(p.required - p.measured)} short of the ${mm(p.required)} wanted: move one of them. ${caution} ${source.brief}.`,
      source: source.cite,
    };
  });
}

/**
 * The measured answer to the heater caution's two placement ticks, where the outlets are drawn:
 * `exhaust` when an exhaust is drawn (and is clear of everything it is measured to), `intake` when
 * an intake and an exhaust are drawn; each with the openings it was measured against. Undefined
 * where nothing is drawn, so the declared tick stands in.
 */
export function measuredOutlets(doc: Pick<LayoutDoc, 'bay' | 'buildUp'>): { exhaust?: { ok: boolean; openingIds: string[] }; intake?: { ok: boolean; openingIds: string[] } } {
  const pairs = outletPairs(doc);
  const of = (id: OutletRule, drawn: boolean) => {
    if (!drawn) return undefined;
    const mine = pairs.filter((p) => p.id === id);
    const ids = new Set<string>();
    for (const p of mine) {
      ids.add(p.point.id);
      if ('opening' in p.target) ids.add(p.target.opening.id);
    }
    return { ok: mine.every((p) => p.measured >= p.required), openingIds: [...ids] };
  };
  const exhaustDrawn = bodyPoints(doc.bay, 'heater-exhaust').length > 0;
  return {
    exhaust: of('clearance.exhaust', exhaustDrawn),
    intake: of('clearance.intake', exhaustDrawn && bodyPoints(doc.bay, 'heater-intake').length > 0),
  };
}
