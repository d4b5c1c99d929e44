/**
 * Wall elevations, to scale: the left wall, the right wall, the rear and the bulkhead unrolled,
 * each SEEN FROM THE ROOM (standing inside, facing that wall). So, on paper left to right:
 *
 *   left wall   rear … front   (x runs right to left: facing the left wall, the front is on your right)
 *   right wall  front … rear   (x runs left to right)
 *   rear        right … left   (y runs right to left: facing the rear, the van's left is on your right)
 *   bulkhead    left … right   (y runs left to right)
 *
 * and the ends are labelled ("← rear", "front →", …). Up is z above the BARE load floor. Each shows
 * the wall's outline (bare floor to roof, heavy), the floor and roof build-up hatched with the
 * finished floor and the roof lining as lines, the wheel arch against it, its doors as outlines,
 * its windows (door windows in their door) with an opening window's hinge mark, the body points on
 * it as small marks, the modules standing against it at their elevation and height with their
 * schedule numbers, the levels above the FINISHED floor (window sills and heads, module undersides
 * and tops, the clear height) as an ordinate dimension on the left, the bay height on the right
 * and the wall's length below.
 *
 * Which modules a wall shows is our own drafting choice (common practice, no source): those inside
 * the body whose face toward that wall is within WALL_DEPTH of its lining — what stands against
 * the wall or nearly so, and so what a cabinet maker fits to it. Drawn nearest the wall first, so
 * what stands further into the room is drawn over it (it is nearer the viewer). A window a module
 * hides is drawn again dashed on top (a hidden edge).
 *
 * Pure: a document in, sheet items in paper mm out; must never render.
 */
import { formatLength } from '../layout/units';
import type { Arrangement, LayoutDoc, LengthUnit, Module } from '../layout';
import { archBoxes, buildUpThickness, inArrangement, modulesIn, mountedInside } from '../layout/bay';
import { bodyPoints, windowOnWall, windows, type BayWall } from '../layout/openings';
import { dimension, hatch, LINE, TYPE } from './drafting';
import { onPaper } from './paper';
import { moduleNames, scheduleNumbers } from './plan-figure';
import type { SheetItem } from './primitives';
import { firstThatFits, notesThatFit } from './typography';
import { VERTICAL_ORDINATE_BAND, verticalOrdinate } from './ordinates';

export const ELEVATION_WALLS = ['left', 'right', 'rear', 'bulkhead'] as const;
export type ElevationWall = (typeof ELEVATION_WALLS)[number];

/** The figure titles, as the sheet and the screen name them. */
export const ELEVATION_TITLE: Record<ElevationWall, string> = {
  left: 'Left wall elevation',
  right: 'Right wall elevation',
  rear: 'Rear wall elevation',
  bulkhead: 'Bulkhead elevation',
};

/** What stands at each end of a wall seen from the room: [paper left, paper right]. */
export const ELEVATION_ENDS: Record<ElevationWall, [string, string]> = {
  left: ['rear', 'front'],
  right: ['front', 'rear'],
  rear: ['right', 'left'],
  bulkhead: ['left', 'right'],
};

/**
 * A module shows on a wall when its face toward the wall is within this of the wall's lining, mm
 * (our own drafting choice, common practice, no source: what stands against a wall or a hand's
 * width off it belongs on that wall's elevation).
 */
export const WALL_DEPTH = 100;

/**
 * Paper space around the wall: the level ordinates (left), the bay height (right), the end labels
 * (top), the wall's length and the caption (bottom). Top and bottom add up to the section's
 * (6 + 10 mm) and left and right stay under its 29 mm, so an elevation never needs more paper than
 * the side section of the same bay.
 */
export const ELEVATION_MARGIN = { left: Math.ceil(VERTICAL_ORDINATE_BAND) + 1, top: 4, right: 7, bottom: 12 } as const;

export interface ElevationOptions {
  /** Only the modules of this arrangement, all drawn solid (the editor's view); absent: all, sleep-only dashed (the sheet). */
  arrangement?: Arrangement;
  /** Leave the scale out of the caption (on screen the drawing is scaled to its panel, not to a paper scale). */
  noScale?: boolean;
}

/** The wall's length seen from the room (mm): the side walls the bay's length, the ends its width. */
export function elevationSpan(doc: Pick<LayoutDoc, 'bay'>, wall: ElevationWall): number {
  return wall === 'left' || wall === 'right' ? doc.bay.length : doc.bay.width;
}

/** Paper across of a point `along` the wall's own measure (x for side walls, y for the ends), from the paper-left end (mm). */
export function acrossOf(doc: Pick<LayoutDoc, 'bay'>, wall: ElevationWall, along: number): number {
  return wall === 'left' ? doc.bay.length - along : wall === 'rear' ? doc.bay.width - along : along;
}

/** How far below the bare floor the wall's body points reach (mm, 0 when none do). */
function reachBelow(doc: LayoutDoc, wall: ElevationWall): number {
  if (wall === 'bulkhead') return 0;
  return Math.max(0, ...bodyPoints(doc.bay).filter((p) => p.wall === wall).map((p) => -p.height));
}

export function elevationSize(doc: LayoutDoc, wall: ElevationWall, scale: number): { width: number; height: number } {
  return {
    width: ELEVATION_MARGIN.left + onPaper(elevationSpan(doc, wall), scale) + ELEVATION_MARGIN.right,
    height: ELEVATION_MARGIN.top + onPaper(doc.bay.height + reachBelow(doc, wall), scale) + ELEVATION_MARGIN.bottom,
  };
}

/** How far the module's face toward the wall stands off the wall's lining (mm; ≤ 0 against it). */
export function offWall(doc: LayoutDoc, wall: ElevationWall, m: Pick<Module, 'x' | 'y' | 'length' | 'width'>): number {
  const { wallT } = buildUpThickness(doc);
  switch (wall) {
    case 'left':
      return m.y - wallT;
    case 'right':
      return doc.bay.width - wallT - (m.y + m.width);
    case 'rear':
      return doc.bay.length - (m.x + m.length);
    case 'bulkhead':
      return m.x;
  }
}

/** The modules against a wall (see WALL_DEPTH), in schedule order. */
export function modulesAgainst(doc: LayoutDoc, wall: ElevationWall, arrangement?: Arrangement): Module[] {
  const pool = arrangement ? modulesIn(doc, arrangement) : doc.modules;
  return pool.filter((m) => mountedInside(m) && offWall(doc, wall, m) <= WALL_DEPTH);
}

/**
 * Modules one elevation draws at most, the first by schedule number (common practice, no source: a
 * van's wall holds a few tens of modules; a hundred is far past any real one). Beyond it the
 * caption says how many are left out, so four elevations of a layout of thousands of modules stay
 * a small part of the sheet (the print view of an 800-module sheet stays under 2 MB).
 */
export const ELEVATION_MODULE_LIMIT = 100;

/** The modules a wall's elevation draws (the first ELEVATION_MODULE_LIMIT against it), nearest the wall first. */
export function modulesOnWall(doc: LayoutDoc, wall: ElevationWall, arrangement?: Arrangement): Module[] {
  return modulesAgainst(doc, wall, arrangement).slice(0, ELEVATION_MODULE_LIMIT)
    .map((m) => ({ m, off: offWall(doc, wall, m) }))
    .sort((a, b) => a.off - b.off)
    .map((e) => e.m);
}

/** Short words for body points on an elevation (sentence case, as the glossary's). */
const POINT_WORDS = { 'fuel-filler': 'filler', 'heater-exhaust': 'exhaust', 'heater-intake': 'intake', 'gas-drop-vent': 'gas vent' } as const;

export function drawElevation(doc: LayoutDoc, wall: ElevationWall, ox: number, oy: number, scale: number, units: LengthUnit, options: ElevationOptions = {}): SheetItem[] {
  const { bay } = doc;
  const s = (mm: number) => onPaper(mm, scale);
  const { floorT, roofT, wallT } = buildUpThickness(doc);
  const span = elevationSpan(doc, wall);
  const below = reachBelow(doc, wall);
  const bx = ox + ELEVATION_MARGIN.left;
  const floorY = oy + ELEVATION_MARGIN.top + s(bay.height); // paper y of the bare floor (z = 0)
  const zy = (z: number) => floorY - s(z);
  const W = s(span);
  const ux = (along: number) => bx + s(acrossOf(doc, wall, along));
  /** Paper x0 and width of a stretch along the wall's own measure. */
  const stretch = (a0: number, a1: number): [number, number] => {
    const p = ux(a0), q = ux(a1);
    return [Math.max(bx, Math.min(p, q)), Math.min(bx + W, Math.max(p, q)) - Math.max(bx, Math.min(p, q))];
  };
  const items: SheetItem[] = [];
  const tag = `elevation:${wall}`;

  // Build-up: the floor and roof bands, and the adjoining side walls' lining at the ends of the rear
  // and bulkhead; each hatched only within the wall's outline (a build-up thicker than the bay fills it).
  const floorBand = Math.min(floorT, bay.height);
  const roofBand = Math.min(roofT, bay.height - floorBand);
  if (floorBand > 0) items.push(...hatch(bx, zy(floorBand), W, s(floorBand), 0.8, 45, 'faint'), { type: 'rect', x: bx, y: zy(floorBand), w: W, h: s(floorBand), stroke: 'soft', width: LINE.hair });
  if (roofBand > 0) items.push(...hatch(bx, zy(bay.height), W, s(roofBand), 0.8, 45, 'faint'), { type: 'rect', x: bx, y: zy(bay.height), w: W, h: s(roofBand), stroke: 'soft', width: LINE.hair });
  const sideBand = Math.min(wallT, span / 2);
  const between = bay.height - roofBand - floorBand;
  if ((wall === 'rear' || wall === 'bulkhead') && sideBand > 0 && between > 0) {
    for (const x of [bx, bx + W - s(sideBand)]) items.push(...hatch(x, zy(bay.height - roofBand), s(sideBand), s(between), 0.8, 45, 'faint'));
  }

  // The wheel arch against a side wall.
  if (wall === 'left' || wall === 'right') {
    for (const a of archBoxes(doc).filter((b) => b.side === wall)) {
      const [x, w] = stretch(a.rect.x0, a.rect.x1);
      const y = zy(a.height);
      const h = s(a.height);
      items.push(...hatch(x, y, w, h, 1.2, 45, 'soft'), ...hatch(x, y, w, h, 1.2, -45, 'soft'), { type: 'rect', x, y, w, h, stroke: 'ink', width: LINE.thin });
    }
  }

  // Doors in this wall: their opening, bare floor to roof (a door carries no height of its own).
  const bayWall: BayWall | null = wall === 'bulkhead' ? null : wall;
  for (const d of bay.doors.filter((door) => door.wall === bayWall)) {
    const [x, w] = stretch(d.offset, d.offset + d.width);
    items.push({ type: 'rect', x, y: zy(bay.height), w, h: s(bay.height), stroke: 'ink', width: LINE.thin, tag: `${tag}:door:${d.id}` });
    items.push({ type: 'text', x: x + w / 2, y: zy(bay.height - roofT) + 3, text: 'door', size: TYPE.small, align: 'center', ink: 'soft' });
  }

  // Windows in this wall and in its doors.
  const panes = bayWall === null ? [] : windows(bay).map((o) => ({ o, r: windowOnWall(bay, floorT, o) })).filter((p) => p.r !== null && p.r.wall === bayWall);
  const paneRects = panes.map(({ o, r }) => {
    const [x, w] = stretch(r!.along0, r!.along1);
    return { o, x, y: zy(r!.z1), w, h: s(r!.z1 - r!.z0) };
  });
  for (const { o, x, y, w, h } of paneRects) {
    items.push({ type: 'rect', x, y, w, h, stroke: 'ink', width: LINE.medium, tag: `${tag}:window:${o.id}` });
    if (w > 1.2 && h > 1.2) items.push({ type: 'rect', x: x + 0.5, y: y + 0.5, w: w - 1, h: h - 1, stroke: 'soft', width: LINE.hair });
    // An opening window: its hinge mark, lines from the bottom corners to the middle of the top (hinged at the top, as van windows mostly are).
    if (o.opens) {
      items.push(
        { type: 'line', x1: x, y1: y + h, x2: x + w / 2, y2: y, width: LINE.hair, ink: 'soft', dash: [0.8, 0.5] },
        { type: 'line', x1: x + w, y1: y + h, x2: x + w / 2, y2: y, width: LINE.hair, ink: 'soft', dash: [0.8, 0.5] },
      );
    }
  }

  // Modules against this wall, nearest the wall first.
  const numbers = scheduleNumbers(doc);
  const shown = modulesOnWall(doc, wall, options.arrangement);
  for (const m of shown) {
    const [x, w] = wall === 'left' || wall === 'right' ? stretch(m.x, m.x + m.length) : stretch(m.y, m.y + m.width);
    if (w <= 0) continue;
    const z0 = floorT + m.elevation;
    const y = zy(z0 + m.height);
    const h = s(m.height);
    const day = options.arrangement !== undefined || inArrangement(m, 'lounge') || inArrangement(m, 'travel');
    items.push(day
      ? { type: 'rect', x, y, w, h, fill: 'white', stroke: 'ink', width: LINE.medium, tag: `${tag}:module:${m.id}` }
      : { type: 'rect', x, y, w, h, fill: 'white', stroke: 'soft', width: LINE.thin, dash: [1, 0.7], tag: `${tag}:module:${m.id}` });
    if (w >= 4 && h >= 3) {
      items.push({ type: 'text', x: x + w / 2, y: y + Math.min(h - 0.6, 2.8), text: String(numbers.get(m.id)), size: TYPE.small, font: 'sans-bold', align: 'center' });
      const label = h >= 6 ? firstThatFits(moduleNames(m), TYPE.small, w - 1.2) : '';
      if (label) items.push({ type: 'text', x: x + w / 2, y: y + 5.2, text: label, size: TYPE.small, align: 'center', ink: 'soft' });
    }
  }
  // Windows hidden behind modules: their outline again, dashed, on top.
  if (shown.length) for (const { x, y, w, h } of paneRects) items.push({ type: 'rect', x, y, w, h, stroke: 'soft', width: LINE.hair, dash: [0.8, 0.6] });

  // Body points on this wall: a small ringed cross and its word.
  if (bayWall !== null) {
    for (const p of bodyPoints(bay).filter((q) => q.wall === bayWall)) {
      const px = ux(p.position);
      const py = zy(p.height);
      const r = 0.9;
      const ring: [number, number][] = Array.from({ length: 12 }, (_, i) => [px + r * Math.cos((i / 12) * 2 * Math.PI), py + r * Math.sin((i / 12) * 2 * Math.PI)]);
      items.push(
        { type: 'polygon', points: ring, stroke: 'copper', width: LINE.thin, fill: 'white' },
        { type: 'line', x1: px - r, y1: py, x2: px + r, y2: py, width: LINE.hair, ink: 'copper', tag: `${tag}:point:${p.id}` },
        { type: 'line', x1: px, y1: py - r, x2: px, y2: py + r, width: LINE.hair, ink: 'copper' },
        { type: 'text', x: px + r + 0.5, y: py - r, text: p.label?.trim() || POINT_WORDS[p.kind], size: TYPE.small, ink: 'copper' },
      );
    }
  }

  // The wall: bare floor and roof heavy, the ends heavy (an open cab end thin and dashed); the
  // finished floor and the roof lining as thin lines.
  const openFront = wall === 'bulkhead' && !bay.bulkhead;
  items.push(
    { type: 'line', x1: bx, y1: zy(0), x2: bx + W, y2: zy(0), width: LINE.heavy, ink: 'ink', tag: `${tag}:floor` },
    { type: 'line', x1: bx, y1: zy(bay.height), x2: bx + W, y2: zy(bay.height), width: LINE.heavy, ink: 'ink', tag: `${tag}:roof` },
    { type: 'line', x1: bx, y1: zy(0), x2: bx, y2: zy(bay.height), width: LINE.heavy, ink: 'ink' },
    { type: 'line', x1: bx + W, y1: zy(0), x2: bx + W, y2: zy(bay.height), width: LINE.heavy, ink: 'ink' },
    { type: 'line', x1: bx, y1: zy(floorT), x2: bx + W, y2: zy(floorT), width: LINE.thin, ink: 'ink', tag: `${tag}:finished-floor` },
    { type: 'line', x1: bx, y1: zy(bay.height - roofT), x2: bx + W, y2: zy(bay.height - roofT), width: LINE.thin, ink: 'copper', dash: [2, 1], tag: `${tag}:roof-lining` },
  );
  if (openFront) items.push({ type: 'rect', x: bx, y: zy(bay.height), w: W, h: s(bay.height), stroke: 'soft', width: LINE.thin, dash: [1.5, 1] });

  // Levels above the finished floor: window sills and heads, module undersides and tops, the clear height.
  const levels: number[] = [bay.height - roofT - floorT];
  for (const { o } of panes) levels.push(o.sillHeight, o.sillHeight + o.height);
  for (const m of shown) levels.push(m.elevation, m.elevation + m.height);
  const ordinate = verticalOrdinate({ stations: levels, datum: zy(floorT), direction: -1, edge: bx, side: -1, toPaper: s, units, tag: `${tag}:level` });
  items.push(...ordinate.items);

  // The bay height at the right, the wall's length below.
  items.push(...dimension({ from: [bx + W, zy(0)], to: [bx + W, zy(bay.height)], offset: -4.5, text: formatLength(bay.height, units), tag: `dimension:${tag}:height` }));
  const baseY = zy(-below);
  items.push(...dimension({ from: [bx, baseY], to: [bx + W, baseY], offset: -4.5, text: formatLength(span, units), tag: `dimension:${tag}:length` }));

  // Which end is which, seen from the room.
  const [leftEnd, rightEnd] = ELEVATION_ENDS[wall];
  items.push(
    { type: 'text', x: bx, y: zy(bay.height) - 1, text: `← ${leftEnd}`, size: TYPE.small, ink: 'soft' },
    { type: 'text', x: bx + W, y: zy(bay.height) - 1, text: `${rightEnd} →`, size: TYPE.small, align: 'right', ink: 'soft' },
  );

  // Caption.
  const cy = baseY + 8.3;
  items.push({ type: 'text', x: bx, y: cy, text: ELEVATION_TITLE[wall], size: TYPE.caption, font: 'sans-bold' });
  const what = options.arrangement ? `${options.arrangement}` : 'lounge solid, sleep-only dashed';
  const against = modulesAgainst(doc, wall, options.arrangement).length;
  const leftOut = against > shown.length ? `only the first ${shown.length} of ${against} modules against it drawn` : '';
  const notes = notesThatFit([
    { text: openFront ? 'no bulkhead: open to the cab' : '', need: 3 },
    { text: 'seen from inside', need: 1 },
    { text: what, need: 2 },
    { text: ordinate.leftOff ? `${ordinate.leftOff} level${ordinate.leftOff === 1 ? '' : 's'} left off for room` : '', need: Infinity },
    { text: leftOut, need: Infinity },
    { text: options.noScale ? '' : `1:${scale}`, need: Infinity },
  ], TYPE.small, bx + W - ox);
  items.push({ type: 'text', x: bx + W, y: cy + 2.6, text: notes, size: TYPE.small, align: 'right', ink: 'soft' });
  return items;
}
