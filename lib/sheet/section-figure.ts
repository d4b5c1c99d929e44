/**
 * The side section along the van's length, to scale: bare floor and roof as heavy lines, the
 * floor and roof build-up hatched, every module as its height band (day modules solid, those that
 * exist only at night dashed), the clear standing height as a dashed line with its dimension, and
 * a standing figure of the chosen stature where the floor is free. Cab on the left.
 * Modules mounted outside the body hang where they are (lib/layout/bay.ts sectionBand): under the
 * floor below the floor line — with the road line at the load floor's height above the road and
 * the lowest point the fit.outside rule allows (its ground clearance, RULE_CONSTANTS) — on the
 * roof above the roof line, behind the rear doors past the rear; each chain-lined, drawn on top
 * of the interior. The figure's size reaches out to take them in (sectionSize).
 * Pure: a document in, sheet items out; must never render.
 */
import { formatLength } from '../layout/units';
import type { LayoutDoc, LengthUnit, Module } from '../layout';
import { dimension, hatch, LINE, TYPE } from './drafting';
import { onPaper } from './paper';
import { drawnModules, HATCH_MODULE_LIMIT, leftOutNote, OUTSIDE_DASH, scheduleNumbers } from './plan-figure';
import type { SheetItem } from './primitives';
import { buildUpThickness, inArrangement, mountedInside, sectionBand, sectionReach } from '../layout/bay';
import { RULE_CONSTANTS } from '../checks/settings';

export const SECTION_MARGIN = { left: 13, top: 6, right: 16, bottom: 10 } as const;

/**
 * How far the section reaches past the bare bay (real mm): below the bare floor (the deepest
 * under-floor module, and the road line at `floorAboveRoad` when anything hangs there), above the
 * roof (the tallest roof module) and behind the rear (the furthest module behind the doors).
 * All zero for a layout with nothing outside, so such a section is drawn exactly as before.
 */
export function sectionExtent(doc: LayoutDoc, floorAboveRoad: number): { below: number; above: number; behind: number; road: boolean } {
  const reach = sectionReach(doc, buildUpThickness(doc).floorT);
  const road = doc.modules.some((m) => m.mount === 'under-floor');
  return { below: road ? Math.max(reach.below, floorAboveRoad) : reach.below, above: reach.above, behind: Math.max(0, reach.behind), road };
}

export function sectionSize(doc: LayoutDoc, scale: number, floorAboveRoad: number): { width: number; height: number } {
  const e = sectionExtent(doc, floorAboveRoad);
  return {
    width: SECTION_MARGIN.left + onPaper(doc.bay.length + e.behind, scale) + SECTION_MARGIN.right,
    height: SECTION_MARGIN.top + onPaper(doc.bay.height + e.above + e.below, scale) + SECTION_MARGIN.bottom,
  };
}

/** The widest stretch along x where nothing stands on the floor in the lounge (for the figure). */
export function freeStretch(doc: LayoutDoc): { from: number; to: number } | null {
  const blocked = doc.modules
    .filter((m) => mountedInside(m) && inArrangement(m, 'lounge') && m.elevation < 1000)
    .map((m) => [Math.max(0, m.x), Math.min(doc.bay.length, m.x + m.length)] as [number, number])
    .filter(([a, b]) => b > a)
    .sort((p, q) => p[0] - q[0]);
  let best: { from: number; to: number } | null = null;
  let at = 0;
  const consider = (a: number, b: number) => {
    if (b - a > 0 && (!best || b - a > best.to - best.from)) best = { from: a, to: b };
  };
  for (const [a, b] of blocked) {
    consider(at, a);
    at = Math.max(at, b);
  }
  consider(at, doc.bay.length);
  return best;
}

export function drawSection(doc: LayoutDoc, ox: number, oy: number, scale: number, units: LengthUnit, floorAboveRoad: number): SheetItem[] {
  const { bay } = doc;
  const s = (mm: number) => onPaper(mm, scale);
  const { floorT, roofT } = buildUpThickness(doc);
  const extent = sectionExtent(doc, floorAboveRoad);
  const bx = ox + SECTION_MARGIN.left;
  const floorY = oy + SECTION_MARGIN.top + s(extent.above + bay.height); // paper y of the bare floor (z = 0)
  const zy = (z: number) => floorY - s(z);
  const L = s(bay.length);
  const items: SheetItem[] = [];

  // Build-up bands.
  if (floorT > 0) items.push(...hatch(bx, zy(floorT), L, s(floorT), 0.8, 45, 'faint'), { type: 'rect', x: bx, y: zy(floorT), w: L, h: s(floorT), stroke: 'soft', width: LINE.hair });
  if (roofT > 0) items.push(...hatch(bx, zy(bay.height), L, s(roofT), 0.8, 45, 'faint'), { type: 'rect', x: bx, y: zy(bay.height), w: L, h: s(roofT), stroke: 'soft', width: LINE.hair });

  // Modules as height bands; sleep-only ones dashed.
  const numbers = scheduleNumbers(doc);
  const { drawn, leftOut } = drawnModules(doc.modules);
  const hatched = doc.modules.length <= HATCH_MODULE_LIMIT;
  // Day modules first, then night-only ones; those outside the body last, on top.
  const ordered = drawn.sort((a, b) => Number(!mountedInside(a)) - Number(!mountedInside(b)) || Number(dayModule(b)) - Number(dayModule(a)));
  for (const m of ordered) {
    const x = bx + s(m.x);
    const { z1 } = sectionBand(m, bay.height, floorT);
    const y = zy(z1);
    const w = s(m.length);
    const h = s(m.height);
    if (!mountedInside(m)) {
      items.push({ type: 'rect', x, y, w, h, fill: 'white', stroke: 'ink', width: LINE.medium, dash: OUTSIDE_DASH, tag: `section:mounted:${m.mount}:${m.id}` });
    } else if (dayModule(m)) {
      items.push({ type: 'rect', x, y, w, h, fill: 'white', stroke: 'ink', width: LINE.medium });
      // The outline again over the hatching (without hatching the first one is already on top).
      if (hatched) items.push(...hatch(x, y, w, h, 1.6, 45, 'faint'), { type: 'rect', x, y, w, h, stroke: 'ink', width: LINE.medium });
    } else {
      items.push({ type: 'rect', x, y, w, h, stroke: 'soft', width: LINE.thin, dash: [1, 0.7] });
    }
    if (w >= 4 && h >= 3) items.push({ type: 'text', x: x + w / 2, y: y + Math.min(h - 0.8, 3), text: String(numbers.get(m.id)), size: TYPE.small, font: 'sans-bold', align: 'center' });
  }

  // Bare metal floor and roof, front and rear.
  items.push(
    { type: 'line', x1: bx, y1: zy(0), x2: bx + L, y2: zy(0), width: LINE.heavy, ink: 'ink', tag: 'section:floor' },
    { type: 'line', x1: bx, y1: zy(bay.height), x2: bx + L, y2: zy(bay.height), width: LINE.heavy, ink: 'ink', tag: 'section:roof' },
    { type: 'line', x1: bx, y1: zy(0), x2: bx, y2: zy(bay.height), width: bay.bulkhead ? LINE.heavy : LINE.thin, ink: 'ink', dash: bay.bulkhead ? undefined : [1.5, 1] },
    { type: 'line', x1: bx + L, y1: zy(0), x2: bx + L, y2: zy(bay.height), width: LINE.thin, ink: 'ink' },
  );

  // Clear standing height: finished floor to lined roof.
  const clear = bay.height - floorT - roofT;
  items.push({ type: 'line', x1: bx, y1: zy(bay.height - roofT), x2: bx + L, y2: zy(bay.height - roofT), width: LINE.thin, ink: 'copper', dash: [2, 1] });
  // Beyond anything mounted behind the rear doors.
  const rearX = bx + s(bay.length + extent.behind);
  items.push(...dimension({ from: [rearX, zy(floorT)], to: [rearX, zy(bay.height - roofT)], offset: -8, text: `clear ${formatLength(clear, units)}`, tag: 'dimension:clear-height' }));
  items.push(...dimension({ from: [bx, zy(0)], to: [bx, zy(bay.height)], offset: 9, text: formatLength(bay.height, units), tag: 'dimension:bay-height' }));

  // A standing figure of the chosen stature on the finished floor.
  const stature = doc.occupants.standingHeight;
  const free = freeStretch(doc);
  const at = free ? (free.from + free.to) / 2 : bay.length / 2;
  items.push(...standingFigure(bx + s(at), zy(floorT), s(stature)));
  items.push({ type: 'text', x: bx + s(at) + s(stature) * 0.16, y: zy(floorT + stature) + 2.5, text: formatLength(stature, units), size: TYPE.small, font: 'mono', ink: 'copper' });

  // Under the floor: the road at the load floor's height, and the lowest point the fit.outside rule allows.
  if (extent.road) {
    const roadY = zy(-floorAboveRoad);
    const right = rearX;
    items.push({ type: 'line', x1: bx, y1: roadY, x2: right, y2: roadY, width: LINE.medium, ink: 'ink', tag: 'section:road' });
    for (let gx = bx + 1.5; gx < right; gx += 3) items.push({ type: 'line', x1: gx, y1: roadY, x2: gx - 1.2, y2: roadY + 1.2, width: LINE.hair, ink: 'soft' });
    items.push({ type: 'text', x: right, y: roadY - 0.8, text: `road · load floor ${formatLength(floorAboveRoad, units)} above it`, size: TYPE.small, align: 'right', ink: 'soft' });
    const lowest = floorAboveRoad - RULE_CONSTANTS.groundClearance;
    if (lowest > 0) {
      const lowY = zy(-lowest);
      items.push({ type: 'line', x1: bx, y1: lowY, x2: right, y2: lowY, width: LINE.thin, ink: 'copper', dash: [2, 1], tag: 'section:lowest-allowed' });
      items.push({ type: 'text', x: right, y: lowY - 0.8, text: `lowest point allowed · ${formatLength(RULE_CONSTANTS.groundClearance, units)} above the road`, size: TYPE.small, align: 'right', ink: 'copper' });
    }
  }

  const captionY = zy(-extent.below) + 6.5;
  items.push({ type: 'text', x: bx, y: captionY, text: 'Side section along the length', size: TYPE.caption, font: 'sans-bold' });
  const outsideNote = extent.road || extent.above > 0 || extent.behind > 0 ? ', outside the body in chain line' : '';
  items.push({ type: 'text', x: rearX, y: captionY, text: `lounge solid, sleep-only dashed${outsideNote} · 1:${scale}`, size: TYPE.small, align: 'right', ink: 'soft' });
  if (leftOut > 0) items.push({ type: 'text', x: bx, y: captionY + 2.8, text: leftOutNote(doc.modules.length, leftOut, 'section'), size: TYPE.small, ink: 'soft' });
  return items;
}

function dayModule(m: Pick<Module, 'arrangements'>): boolean {
  return inArrangement(m, 'lounge') || inArrangement(m, 'travel');
}

/** A plain standing figure, feet at (x, footY), `h` mm tall on paper: head, body, arms, legs. */
function standingFigure(x: number, footY: number, h: number): SheetItem[] {
  const head = h * 0.065;
  const neckY = footY - h + head * 2;
  const hipY = footY - h * 0.48;
  const shoulderY = neckY + h * 0.04;
  const stroke = { width: LINE.thin, ink: 'copper' as const };
  const circle: [number, number][] = Array.from({ length: 16 }, (_, i) => [x + head * Math.cos((i / 16) * 2 * Math.PI), footY - h + head + head * Math.sin((i / 16) * 2 * Math.PI)]);
  return [
    { type: 'polygon', points: circle, stroke: 'copper', width: LINE.thin },
    { type: 'line', x1: x, y1: neckY, x2: x, y2: hipY, ...stroke },
    { type: 'line', x1: x - h * 0.11, y1: footY - h * 0.42, x2: x, y2: shoulderY, ...stroke },
    { type: 'line', x1: x + h * 0.11, y1: footY - h * 0.42, x2: x, y2: shoulderY, ...stroke },
    { type: 'line', x1: x, y1: hipY, x2: x - h * 0.07, y2: footY, ...stroke },
    { type: 'line', x1: x, y1: hipY, x2: x + h * 0.07, y2: footY, ...stroke },
    { type: 'line', x1: x - h * 0.09, y1: footY, x2: x + h * 0.09, y2: footY, width: LINE.hair, ink: 'copper' },
  ];
}
