/**
 * The arrangement patterns a workshop builds, and how one candidate is laid out from a pattern
 * and a variant. A pattern decides the rear zone (the bed or the lounge that makes up into one);
 * the front zone is the same for all: wall runs (kitchen, wet room, travel seats or a bench,
 * wardrobe) packed along the walls around the door entry and the arches, and the services
 * (electrics, heater, tanks) packed under the bed or the benches. A candidate that cannot be laid
 * out comes back with the reason in numbers; one that can is a list of parts for the checks.
 *
 * Two-level patterns (for three or four sleepers) put a second bed over the rear zone's bed: a
 * drop-down bed over the lounge (made up in sleep only, raised to the roof by day) or a fixed bunk
 * over a bed across, each with a ladder in front of it at night, and check first that the roof
 * leaves room to sit up on both levels.
 *
 * To add a pattern: add its id to PATTERNS with its words, and a `rear*` function returning the
 * rear zone's parts, where the front zone ends and the slots under it. Sizes are common practice,
 * no source, unless named. Pure: must never import React, Next, the database or the services.
 */
import { DEFAULT_L_PER_PERSON_DAY } from '../planning/water-plan';
import { FRIDGE_UNITS, mattressOfClass, type BedPreference, type Brief } from './brief';
import { betweenArches, wallSpans, type Frame } from './frame';
import { ALL, ceil10, inDoorEntry, type Part } from './parts';

/**
 * `levels`: beds one over the other. A two-level pattern is tried only for three sleepers or more
 * (`minSleepers`), who would not fit side by side in one bed across a van's width.
 */
export const PATTERNS = {
  'rear-across': { words: 'Fixed bed across the rear', bed: 'across', levels: 1, minSleepers: 1 },
  'rear-lengthways': { words: 'Fixed bed lengthways at the rear', bed: 'lengthways', levels: 1, minSleepers: 1 },
  'rear-twin': { words: 'Two single beds lengthways at the rear', bed: 'lengthways', levels: 1, minSleepers: 1 },
  'rear-lounge': { words: 'Rear lounge that makes up into the bed', bed: 'lounge', levels: 1, minSleepers: 1 },
  'lounge-drop-down': { words: 'Rear lounge with a drop-down bed over it', bed: 'lounge', levels: 2, minSleepers: 3 },
  'across-bunk': { words: 'Fixed bed across with a bunk over it', bed: 'across', levels: 2, minSleepers: 3 },
} as const satisfies Record<string, { words: string; bed: Exclude<BedPreference, 'any'>; levels: 1 | 2; minSleepers: number }>;
export type PatternId = keyof typeof PATTERNS;

export function patternsFor(pref: BedPreference, sleepers = 1): PatternId[] {
  const all = (Object.keys(PATTERNS) as PatternId[]).filter((p) => sleepers >= PATTERNS[p].minSleepers);
  return pref === 'any' ? all : all.filter((p) => PATTERNS[p].bed === pref);
}

/** The rear zone makes up from the lounge benches (with or without a bed over it). */
export const isLounge = (p: PatternId): boolean => PATTERNS[p].bed === 'lounge';

/** Sleepers on the lower bed of a two-level pattern: the larger half; the rest sleep above. */
export function lowerSleepers(brief: Brief, p: PatternId): number {
  return PATTERNS[p].levels === 2 ? Math.ceil(brief.sleepers.length / 2) : brief.sleepers.length;
}

export interface Variant {
  pattern: PatternId;
  /** 0–2: the bed (or bench run) this many 100 mm steps past the least the brief needs. */
  bedStep: number;
  /** Bed raised to clear a garage (600 mm) rather than just the arches; ignored when the brief sets a garage. */
  raised: boolean;
  kitchenWall: 'left' | 'right';
  wetWall: 'left' | 'right';
  /** On a shared wall, the wet room before the kitchen (from the front). */
  wetFirst: boolean;
  /** 0–2: counter this many 200 mm steps past the brief's minimum. */
  counterStep: number;
  wardrobe: boolean;
  /**
   * Where the fridge and the gas locker stand: in the kitchen run beside the counter, under its
   * worktop, or apart from it on the other wall.
   */
  appliances: 'beside' | 'under' | 'apart';
  /** Wall runs packed from the bed end towards the cab, rather than from the cab. */
  fromRear: boolean;
}

/** Common practice, no source: a platform with its mattress; sitting up in bed; a seat's legroom. */
export const SIZES = {
  bedThickness: 200,
  sitUpHeadroom: 850,
  garageRaise: 600,
  benchDepth: 550,
  benchBoard: 160,
  kitchenDepth: 500,
  sinkLength: 450,
  hobLength: 500,
  gasLocker: { length: 350, width: 350, height: 650 },
  seat: { length: 600, width: 500, height: 1150, legroom: 650 },
  bench: { length: 1000, height: 450 },
  wardrobe: { length: 500, width: 500, height: 1750 },
  locker: { width: 350, height: 350, minUnderside: 1300 },
  shower: 700,
  toilet: { length: 450, width: 500, height: 500 },
  electrics: { along: 600, depth: 350, height: 400 },
  heater: { along: 400, depth: 200, height: 200 },
  /** A rigid tank holds about nine tenths of its outside volume. */
  tankFill: 0.9,
  tankHeight: 300,
  perSleeperWidth: 600,
  bedAllowance: 100,
  /** A drop-down bed or bunk: a thin platform and mattress. */
  upperBedThickness: 150,
  /**
   * Clear room over each level of a two-level bed: sitting up with the head bowed, as bunks are
   * built (common practice, no source). The check engine warns below the 965 mm sitting height
   * (sleep.headroom, Bodyspace Table 10.1, from memory), so these proposals say "lying down only".
   */
  levelHeadroom: 750,
  /** A hook-on ladder in front of the upper bed, at night. */
  ladder: { along: 300, across: 400 },
} as const;

/** Why a candidate could not be laid out: the rule in words and both numbers. */
export interface LayoutMiss {
  rule: string;
  measured: number;
  required: number;
  unit: string;
  message: string;
}

export type Laid = { ok: true; parts: Part[]; bedAcross: boolean } | { ok: false; miss: LayoutMiss };

interface Slot {
  x0: number; x1: number; y0: number; y1: number;
  /** Tallest thing that fits under it, mm. */
  height: number;
  /** The face people reach it from. */
  front: 'front' | 'left' | 'right';
}

interface Rear {
  parts: Part[];
  /** Where the front zone ends along each wall. */
  frontEnd: number;
  slots: Slot[];
  bedAcross: boolean;
}

const miss = (rule: string, measured: number, required: number, unit: string, message: string): Laid => ({ ok: false, miss: { rule, measured, required, unit, message } });

function bedElevation(f: Frame, brief: Brief, v: Variant): number {
  if (brief.garageHeight !== null) return Math.max(f.archClearElevation, brief.garageHeight);
  return v.raised ? Math.max(f.archClearElevation, SIZES.garageRaise) : Math.max(f.archClearElevation, 300);
}

function rearAcross(f: Frame, brief: Brief, v: Variant, E: number): Rear {
  const mattress = mattressOfClass(brief.mattress);
  const depth = ceil10(Math.max(SIZES.perSleeperWidth * lowerSleepers(brief, v.pattern), mattress?.width ?? 0, 700)) + v.bedStep * 100;
  const x0 = f.L - depth;
  const bed: Part = { role: 'bed', kind: 'bed-platform', label: 'Bed across', x: x0, y: f.Y0, length: depth, width: f.Y1 - f.Y0, elevation: E, height: SIZES.bedThickness, facing: 'front', arrangements: ALL };
  const [y0, y1] = betweenArches(f, x0, f.L);
  return { parts: [bed], frontEnd: x0, slots: [{ x0, x1: f.L, y0, y1, height: E - 20, front: 'front' }], bedAcross: true };
}

function rearLengthways(f: Frame, brief: Brief, v: Variant, E: number): Rear {
  const mattress = mattressOfClass(brief.mattress);
  const tallest = Math.max(...brief.sleepers);
  const length = ceil10(Math.max(tallest + SIZES.bedAllowance, mattress?.length ?? 0)) + v.bedStep * 100;
  const lined = f.Y1 - f.Y0;
  let width = ceil10(Math.max(SIZES.perSleeperWidth * brief.sleepers.length, mattress?.width ?? 0));
  // A strip too narrow to walk or stand in beside the bed is given to the bed.
  if (lined - width < 600) width = lined;
  const x0 = f.L - length;
  const bed: Part = { role: 'bed', kind: 'bed-platform', label: 'Bed lengthways', x: x0, y: f.Y0, length, width, elevation: E, height: SIZES.bedThickness, facing: 'front', arrangements: ALL };
  const [a0, a1] = betweenArches(f, x0, f.L);
  return { parts: [bed], frontEnd: x0, slots: [{ x0, x1: f.L, y0: a0, y1: Math.min(a1, f.Y0 + width), height: E - 20, front: 'front' }], bedAcross: false };
}

/** Two single beds along the side walls with the walkway between them to the rear doors. */
function rearTwin(f: Frame, brief: Brief, v: Variant, E: number): Rear | null {
  const lined = f.Y1 - f.Y0;
  const tallest = Math.max(...brief.sleepers);
  const length = ceil10(Math.max(tallest + SIZES.bedAllowance, mattressOfClass(brief.mattress)?.length ?? 0)) + v.bedStep * 100;
  const width = SIZES.perSleeperWidth + (v.bedStep > 0 ? 50 : 0);
  if (brief.sleepers.length !== 2 || lined - 2 * width < 450) return null;
  const x0 = f.L - length;
  const bed = (side: 'left' | 'right'): Part => ({ role: 'bed', kind: 'bed-platform', label: side === 'left' ? 'Single bed, left' : 'Single bed, right', x: x0, y: side === 'left' ? f.Y0 : f.Y1 - width, length, width, elevation: E, height: SIZES.bedThickness, facing: 'front', arrangements: ALL });
  const [a0, a1] = betweenArches(f, x0, f.L);
  return {
    parts: [bed('left'), bed('right')],
    frontEnd: x0,
    slots: [
      { x0, x1: f.L, y0: a0, y1: f.Y0 + width, height: E - 20, front: 'right' },
      { x0, x1: f.L, y0: f.Y1 - width, y1: a1, height: E - 20, front: 'left' },
    ],
    bedAcross: false,
  };
}

function rearLounge(f: Frame, brief: Brief, v: Variant): Rear {
  const lined = f.Y1 - f.Y0;
  const tallest = Math.max(...brief.sleepers);
  const mattress = mattressOfClass(brief.mattress);
  // Benches long enough to sleep along when the lined width is too short to sleep across.
  const across = tallest + SIZES.bedAllowance <= lined && (mattress ? mattress.length <= lined : true);
  const base = across
    ? Math.max(1200, SIZES.perSleeperWidth * lowerSleepers(brief, v.pattern), mattress?.width ?? 0)
    : Math.max(tallest + SIZES.bedAllowance, mattress?.length ?? 0);
  const length = ceil10(base) + v.bedStep * 100;
  const x0 = f.L - length;
  const E = loungeElevation(f);
  const d = SIZES.benchDepth;
  const bench = (side: 'left' | 'right'): Part => ({
    role: 'bench-bed', kind: 'bench-seat', label: side === 'left' ? 'Lounge bench, left' : 'Lounge bench, right',
    x: x0, y: side === 'left' ? f.Y0 : f.Y1 - d, length, width: d, elevation: E, height: SIZES.benchBoard,
    facing: side === 'left' ? 'right' : 'left', arrangements: ALL,
  });
  const infill: Part = { role: 'infill', kind: 'bed-infill', label: 'Bed infill', x: x0, y: f.Y0 + d, length, width: lined - 2 * d, elevation: E, height: SIZES.benchBoard, facing: 'front', arrangements: ['sleep'] };
  const tableLength = Math.min(600, length - 200);
  const table: Part = { role: 'table', kind: 'table', label: 'Lounge table', x: f.L - tableLength, y: f.Y0 + d + 100, length: tableLength, width: Math.max(200, lined - 2 * d - 200), elevation: 700, height: 30, facing: 'front', arrangements: ['lounge'] };
  const [a0, a1] = betweenArches(f, x0, f.L);
  return {
    parts: [bench('left'), bench('right'), infill, table],
    frontEnd: x0,
    slots: [
      { x0, x1: f.L, y0: a0, y1: f.Y0 + d, height: E - 20, front: 'right' },
      { x0, x1: f.L, y0: f.Y1 - d, y1: a1, height: E - 20, front: 'left' },
    ],
    bedAcross: lined >= length,
  };
}

/**
 * The second level over a rear zone: the upper bed over the lower one's outline, its underside
 * levelHeadroom above the lower mattress, and a ladder in front of it at night (its top is above
 * the 800 mm climb height, egress.sleep), centred across the van so the walkway passes beside it;
 * the wall runs stop short of the ladder.
 */
function secondLevel(f: Frame, rear: Rear, lowerTop: number, dropDown: boolean): Rear {
  const lower = rear.parts.filter((p) => p.role === 'bed' || p.role === 'bench-bed' || p.role === 'infill');
  const x0 = Math.min(...lower.map((p) => p.x)), x1 = Math.max(...lower.map((p) => p.x + p.length));
  const y0 = Math.min(...lower.map((p) => p.y)), y1 = Math.max(...lower.map((p) => p.y + p.width));
  const U = lowerTop + SIZES.levelHeadroom;
  const upper: Part = {
    role: 'bed', kind: 'bed-platform', label: dropDown ? 'Drop-down bed' : 'Upper bunk', x: x0, y: y0, length: x1 - x0, width: y1 - y0,
    elevation: U, height: SIZES.upperBedThickness, facing: 'front', arrangements: dropDown ? ['sleep'] : ALL,
  };
  const { along, across } = SIZES.ladder;
  const ladder: Part = {
    role: 'ladder', kind: 'step', label: 'Ladder', x: x0 - along, y: (f.Y0 + f.Y1) / 2 - across / 2, length: along, width: across,
    elevation: 0, height: U + SIZES.upperBedThickness, facing: 'front', arrangements: ['sleep'],
  };
  return { ...rear, parts: [...rear.parts, upper, ladder], frontEnd: x0 - along };
}

/** The top of the lower mattress of a pattern's rear zone, mm above the finished floor. */
function lowerTopOf(f: Frame, brief: Brief, v: Variant): number {
  return isLounge(v.pattern) ? loungeElevation(f) + SIZES.benchBoard : bedElevation(f, brief, v) + SIZES.bedThickness;
}

const loungeElevation = (f: Frame) => Math.max(f.archClearElevation, 300);

interface RunItem {
  what: string;
  length: number;
  depth: number;
  minX?: number;
  parts: (x: number, wall: 'left' | 'right') => Part[];
}

function kitchenRun(f: Frame, brief: Brief, v: Variant): RunItem[] {
  const k = brief.kitchen;
  const gas = brief.fuel === 'gas';
  const sink = k.sink ? SIZES.sinkLength : 0;
  const wanted = k.sink || k.hob || k.counterMin > 0;
  const counterTotal = wanted ? Math.max(k.counterMin, sink + (k.hob ? SIZES.hobLength : 0), sink + 300) + v.counterStep * 200 : 0;
  const worktop = counterTotal - sink;
  const fridge = k.fridge === 'none' ? null : FRIDGE_UNITS[k.fridge];
  const side = (wall: 'left' | 'right') => ({ y: (depth: number) => (wall === 'left' ? f.Y0 : f.Y1 - depth), facing: (wall === 'left' ? 'right' : 'left') as Part['facing'] });
  const gasItem: RunItem | null = gas ? {
    what: 'the gas locker', length: SIZES.gasLocker.length, depth: SIZES.gasLocker.width,
    parts: (x, wall) => [{ role: 'gas', kind: 'gas-locker', label: 'Gas locker', x, y: side(wall).y(SIZES.gasLocker.width), length: SIZES.gasLocker.length, width: SIZES.gasLocker.width, elevation: 0, height: SIZES.gasLocker.height, facing: side(wall).facing, arrangements: ALL, props: { cylinders: 1, cylinderKg: 6 } }],
  } : null;
  const fridgeItem: RunItem | null = fridge ? {
    what: 'the fridge', length: fridge.length, depth: fridge.width,
    parts: (x, wall) => [{ role: 'fridge', kind: 'fridge', label: 'Fridge', x, y: side(wall).y(fridge.width), length: fridge.length, width: fridge.width, elevation: 0, height: fridge.height, facing: side(wall).facing, arrangements: ALL, props: { litres: fridge.litres, watts: 45, dutyCycle: 0.33 } }],
  } : null;
  // Under the worktop: the appliances that fit beneath it, each with the worktop raised over it.
  const under = v.appliances === 'under' ? [fridgeItem, gasItem].filter((i): i is RunItem => i !== null && i.parts(0, 'left')[0].height <= 800) : [];
  let room = worktop;
  const underHere = under.filter((i) => (room -= i.length) >= 0);
  const counterItem: RunItem | null = counterTotal > 0 ? {
    what: `the kitchen counter (${counterTotal} mm)`, length: counterTotal, depth: SIZES.kitchenDepth,
    parts: (x, wall) => {
      const { y, facing } = side(wall);
      const out: Part[] = [];
      let at = x;
      if (sink) {
        out.push({ role: 'sink', kind: 'sink-unit', label: 'Sink', x: at, y: y(SIZES.kitchenDepth), length: sink, width: SIZES.kitchenDepth, elevation: 0, height: 900, facing, arrangements: ALL });
        at += sink;
      }
      let top = at;
      for (const item of underHere) {
        const [app] = item.parts(top, wall);
        const lift = app.height + 10;
        out.push(app, { role: 'counter', kind: 'kitchen-counter', label: 'Kitchen counter', x: top, y: y(SIZES.kitchenDepth), length: item.length, width: SIZES.kitchenDepth, elevation: lift, height: 900 - lift, facing, arrangements: ALL });
        top += item.length;
      }
      if (at + worktop > top) out.push({ role: 'counter', kind: 'kitchen-counter', label: 'Kitchen counter', x: top, y: y(SIZES.kitchenDepth), length: at + worktop - top, width: SIZES.kitchenDepth, elevation: 0, height: 900, facing, arrangements: ALL });
      if (k.hob) {
        out.push({ role: 'hob', kind: 'hob', label: 'Hob', x: at + Math.max(0, (worktop - SIZES.hobLength) / 2), y: wall === 'left' ? f.Y0 + 75 : f.Y1 - 75 - 350, length: SIZES.hobLength, width: 350, elevation: 900, height: 60, facing, arrangements: ALL, props: { burners: 2, fuel: gas ? 'LPG' : 'induction (electric)', ...(gas ? {} : { watts: 1800, hoursPerDay: 0.5 }) } });
      }
      return out;
    },
  } : null;
  return [underHere.includes(gasItem!) ? null : gasItem, counterItem, underHere.includes(fridgeItem!) ? null : fridgeItem].filter((x): x is RunItem => x !== null);
}

function wetRoom(f: Frame, brief: Brief): RunItem | null {
  if (!brief.toilet && !brief.shower) return null;
  const s = SIZES.shower;
  if (brief.shower) {
    return {
      what: brief.toilet ? 'the wet room (shower and toilet)' : 'the shower',
      length: s,
      depth: s,
      parts: (x, wall) => {
        const out: Part[] = [{ role: 'shower', kind: 'shower-tray', label: 'Shower tray', x, y: wall === 'left' ? f.Y0 : f.Y1 - s, length: s, width: s, elevation: 0, height: 60, facing: wall === 'left' ? 'right' : 'left', arrangements: ALL }];
        if (brief.toilet) out.push({ role: 'toilet', kind: 'toilet-cabinet', label: 'Toilet', x: x + (s - SIZES.toilet.length) / 2, y: wall === 'left' ? f.Y0 : f.Y1 - SIZES.toilet.width, length: SIZES.toilet.length, width: SIZES.toilet.width, elevation: 60, height: SIZES.toilet.height, facing: wall === 'left' ? 'right' : 'left', arrangements: ALL });
        return out;
      },
    };
  }
  const t = SIZES.toilet;
  return {
    what: 'the toilet',
    length: t.length,
    depth: t.width,
    parts: (x, wall) => [{ role: 'toilet', kind: 'toilet-cabinet', label: 'Toilet', x, y: wall === 'left' ? f.Y0 : f.Y1 - t.width, length: t.length, width: t.width, elevation: 0, height: t.height, facing: wall === 'left' ? 'right' : 'left', arrangements: ALL }],
  };
}

function seatRow(f: Frame, brief: Brief): RunItem | null {
  const n = brief.beltedSeats;
  if (n === 0) return null;
  const s = SIZES.seat;
  return {
    what: `the row of ${n} belted seat${n === 1 ? '' : 's'}`,
    length: s.length,
    depth: n * s.width,
    minX: s.legroom,
    parts: (x, wall) => Array.from({ length: n }, (_, i): Part => ({
      role: 'seat', kind: 'seat', label: `Belted seat ${i + 1}`, x, y: wall === 'left' ? f.Y0 + i * s.width : f.Y1 - (i + 1) * s.width, length: s.length, width: s.width, elevation: 0, height: Math.min(s.height, f.clear - 10), facing: 'front', arrangements: ALL,
      props: { belted: true, approved: true, anchorageTested: true },
    })),
  };
}

function wardrobe(f: Frame): RunItem {
  const w = SIZES.wardrobe;
  return {
    what: 'the wardrobe',
    length: w.length,
    depth: w.width,
    parts: (x, wall) => [{ role: 'wardrobe', kind: 'wardrobe', label: 'Wardrobe', x, y: wall === 'left' ? f.Y0 : f.Y1 - w.width, length: w.length, width: w.width, elevation: 0, height: Math.min(w.height, f.clear - 10), facing: wall === 'left' ? 'right' : 'left', arrangements: ALL }],
  };
}

/** Packs a wall's items front to rear into its free spans; the first that does not fit is the miss. */
function packWall(f: Frame, wall: 'left' | 'right', items: RunItem[], end: number, fromRear: boolean): { parts: Part[]; miss?: LayoutMiss } {
  const spans = wallSpans(f, wall, 0, end);
  const parts: Part[] = [];
  let at = 0;
  let back = end;
  // From the rear, items that must stay forward (a seat row's legroom) still go first from the cab.
  const ahead = fromRear ? items.filter((i) => i.minX !== undefined) : items;
  const behind = fromRear ? items.filter((i) => i.minX === undefined).reverse() : [];
  for (const item of behind) {
    let placed = false;
    for (let k = spans.length - 1; k >= 0 && !placed; k--) {
      const [s0, s1] = spans[k];
      const x = Math.min(back, s1) - item.length;
      if (x >= s0) {
        parts.push(...item.parts(x, wall));
        back = x;
        placed = true;
      }
    }
    if (!placed) {
      const free = spans.reduce((m, [s0, s1]) => Math.max(m, Math.min(back, s1) - s0), 0);
      const where = wall === 'left' ? 'the left-hand wall' : 'the door-side wall';
      return { parts, miss: { rule: 'room along the walls', measured: Math.max(0, free), required: item.length, unit: 'mm', message: `${cap(item.what)} needs ${item.length} mm along ${where}; the longest free stretch left there, clear of the door entry and the wheel arches, is ${Math.max(0, free)} mm.` } };
    }
  }
  for (const item of ahead) {
    let placed = false;
    for (const [s0, s1] of spans) {
      const x = Math.max(at, s0, item.minX ?? 0);
      if (x + item.length <= Math.min(s1, back)) {
        parts.push(...item.parts(x, wall));
        at = x + item.length;
        placed = true;
        break;
      }
    }
    if (!placed) {
      const free = spans.reduce((m, [s0, s1]) => Math.max(m, s1 - Math.max(s0, at, item.minX ?? 0)), 0);
      const where = wall === 'left' ? 'the left-hand wall' : 'the door-side wall';
      return { parts, miss: { rule: 'room along the walls', measured: Math.max(0, free), required: item.length, unit: 'mm', message: `${cap(item.what)} needs ${item.length} mm along ${where}; the longest free stretch left there, clear of the door entry and the wheel arches, is ${Math.max(0, free)} mm.` } };
    }
  }
  return { parts };
}

const cap = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

interface Service {
  what: string;
  along: number;
  depth: number;
  height: number;
  /** Worked from its face, so it must sit at the slot's front edge. */
  atFront: boolean;
  make: (x: number, y: number, length: number, width: number, facing: Part['facing']) => Part;
}

function tankFor(role: 'fresh' | 'grey', litres: number, height: number): Service {
  const depth = 350;
  const along = ceil10((litres * 1e6) / (SIZES.tankFill * depth * height));
  return {
    what: `the ${role} water tank (${litres} L)`,
    along,
    depth,
    height,
    atFront: false,
    make: (x, y, length, width, facing) => ({ role, kind: role === 'fresh' ? 'fresh-water-tank' : 'grey-water-tank', label: role === 'fresh' ? 'Fresh water tank' : 'Grey water tank', x, y, length, width, elevation: 0, height, facing, arrangements: ALL, props: { litres } }),
  };
}

/** Litres of fresh water the brief asks for: days × people × the water plan's default use per person per day. */
export function freshLitres(brief: Brief): number {
  return brief.water.days * brief.water.people * DEFAULT_L_PER_PERSON_DAY;
}

/**
 * Electrics, heater and both tanks under the bed or benches, packed in rows from the slot's front
 * edge. Grey at least as large as fresh: NZS 5465 as quoted in New Zealand self-containment
 * guidance (secondary; lib/planning/water-plan.ts NZS5465_SOURCE).
 */
function packServices(f: Frame, brief: Brief, slots: Slot[]): { parts: Part[]; miss?: LayoutMiss } {
  const fresh = freshLitres(brief);
  const tallest = slots.reduce((m, s) => Math.max(m, s.height), 0);
  const tankH = Math.min(SIZES.tankHeight, tallest);
  if (tankH < 150) return { parts: [], miss: { rule: 'room under the bed', measured: Math.max(0, tallest), required: 150, unit: 'mm', message: `The tanks need at least 150 mm under the bed or benches; there is ${Math.max(0, tallest)} mm.` } };
  const services: Service[] = [
    { what: 'the electrics bay', along: SIZES.electrics.along, depth: SIZES.electrics.depth, height: Math.min(SIZES.electrics.height, tallest), atFront: true, make: (x, y, length, width, facing) => ({ role: 'electrics', kind: 'electrics-bay', label: 'Electrics bay', x, y, length, width, elevation: 0, height: Math.min(SIZES.electrics.height, tallest), facing, arrangements: ALL }) },
    { what: 'the heater', along: SIZES.heater.along, depth: SIZES.heater.depth, height: SIZES.heater.height, atFront: false, make: (x, y, length, width, facing) => ({ role: 'heater', kind: 'heater', label: 'Heater', x, y, length, width, elevation: 0, height: SIZES.heater.height, facing, arrangements: ALL, props: { watts: 2000, fuel: brief.fuel === 'gas' ? 'LPG' : 'diesel' } }) },
    tankFor('fresh', fresh, tankH),
    tankFor('grey', fresh, tankH),
  ];
  const parts: Part[] = [];
  const cursors = slots.map(() => ({ row: 0, along: 0, rowDepth: 0 }));
  for (const s of services) {
    let placed = false;
    for (let k = 0; k < slots.length && !placed; k++) {
      const slot = slots[k];
      if (slot.height < s.height) continue;
      const c = cursors[k];
      const alongLen = slot.front === 'front' ? slot.y1 - slot.y0 : slot.x1 - slot.x0;
      const depthLen = slot.front === 'front' ? slot.x1 - slot.x0 : slot.y1 - slot.y0;
      for (let tries = 0; tries < 2 && !placed; tries++) {
        if (s.atFront && c.row > 0) break;
        if (c.along + s.along <= alongLen && c.row + s.depth <= depthLen) {
          const a = c.along, d = c.row;
          const part = slot.front === 'front'
            ? s.make(slot.x0 + d, slot.y0 + a, s.depth, s.along, 'front')
            : slot.front === 'right'
              ? s.make(slot.x0 + a, slot.y1 - d - s.depth, s.along, s.depth, 'right')
              : s.make(slot.x0 + a, slot.y0 + d, s.along, s.depth, 'left');
          parts.push(part);
          c.along += s.along + 10;
          c.rowDepth = Math.max(c.rowDepth, s.depth);
          placed = true;
        } else if (c.along > 0) {
          c.row += c.rowDepth + 10;
          c.along = 0;
          c.rowDepth = 0;
        }
      }
    }
    if (!placed) {
      const room = slots.reduce((m, sl) => Math.max(m, (sl.x1 - sl.x0) * (sl.y1 - sl.y0)), 0);
      return { parts, miss: { rule: 'room under the bed', measured: Math.round(room / 1000), required: Math.round((s.along * s.depth) / 1000), unit: '×1000 mm²', message: `${cap(s.what)} needs ${s.along} × ${s.depth} mm of floor under the bed or benches, clear of the wheel arches, and the room left there does not hold it (the largest space under them is ${slots.map((sl) => `${sl.x1 - sl.x0} × ${sl.y1 - sl.y0} mm`).join(' and ') || 'none'}, shared with the services placed before it).` } };
    }
  }
  return { parts };
}

/** Lays out one candidate: the rear zone of its pattern, then the walls, then the services. */
export function layOut(f: Frame, brief: Brief, v: Variant): Laid {
  const E = bedElevation(f, brief, v);
  const twoLevels = PATTERNS[v.pattern].levels === 2;
  if (twoLevels) {
    const lowerTop = lowerTopOf(f, brief, v);
    const need = lowerTop + SIZES.levelHeadroom + SIZES.upperBedThickness + SIZES.levelHeadroom;
    if (f.clear < need) {
      const lower = isLounge(v.pattern) ? 'the lounge made up' : `the fixed bed${brief.garageHeight !== null ? ` over the ${brief.garageHeight} mm garage` : ''}`;
      return miss('sitting headroom on two levels', f.clear, need, 'mm', `Two beds one over the other need ${need} mm of clear height: ${lower} with its mattress top ${lowerTop} mm up, ${SIZES.levelHeadroom} mm over it to sit up with the head bowed, the ${SIZES.upperBedThickness} mm upper bed and ${SIZES.levelHeadroom} mm over that (common practice, no source); the clear height here is ${f.clear} mm after the floor and roof build-up.`);
    }
  } else if (!isLounge(v.pattern)) {
    const top = E + SIZES.bedThickness;
    if (f.clear - top < SIZES.sitUpHeadroom) {
      return miss('sitting headroom over the bed', f.clear - top, SIZES.sitUpHeadroom, 'mm', `A fixed bed ${E} mm up${brief.garageHeight !== null ? ` (the ${brief.garageHeight} mm garage under it)` : ''} with a ${SIZES.bedThickness} mm platform and mattress leaves ${f.clear - top} mm to sit up in under the ${f.clear} mm clear height; sitting up needs ${SIZES.sitUpHeadroom} mm (common practice, no source).`);
    }
  }
  const single = v.pattern === 'rear-across' || v.pattern === 'across-bunk' ? rearAcross(f, brief, v, E) : v.pattern === 'rear-lengthways' ? rearLengthways(f, brief, v, E) : v.pattern === 'rear-twin' ? rearTwin(f, brief, v, E) : rearLounge(f, brief, v);
  const rear = single && twoLevels ? secondLevel(f, single, lowerTopOf(f, brief, v), v.pattern === 'lounge-drop-down') : single;
  if (!rear) return miss('two single beds', brief.sleepers.length, 2, 'sleepers', 'Two single beds with a walkway between them are laid out for exactly two sleepers, each bed 600 mm wide with at least 450 mm between.');
  if (rear.frontEnd < 0) {
    return miss('bay length', f.L, f.L - rear.frontEnd, 'mm', `The ${PATTERNS[v.pattern].words.toLowerCase()} needs ${f.L - rear.frontEnd} mm of the bay's length; the bay is ${f.L} mm long.`);
  }
  const left: RunItem[] = [];
  const right: RunItem[] = [];
  const seats = seatRow(f, brief);
  if (seats) left.push(seats);
  const kitchen = kitchenRun(f, brief, v);
  const wet = wetRoom(f, brief);
  const kWall = v.kitchenWall === 'left' ? left : right;
  const otherWall = v.kitchenWall === 'left' ? right : left;
  const wWall = v.wetWall === 'left' ? left : right;
  const apart = v.appliances === 'apart' ? kitchen.filter((i) => i.what === 'the fridge' || i.what === 'the gas locker') : [];
  const run = kitchen.filter((i) => !apart.includes(i));
  if (wet && v.kitchenWall === v.wetWall && v.wetFirst) kWall.push(wet, ...run);
  else {
    kWall.push(...run);
    if (wet) wWall.push(wet);
  }
  otherWall.push(...apart);
  if (v.wardrobe) (v.kitchenWall === 'left' ? right : left).push(wardrobe(f));
  const parts: Part[] = [...rear.parts];
  for (const [wall, items] of [['left', left], ['right', right]] as const) {
    const packed = packWall(f, wall, items, rear.frontEnd, v.fromRear);
    if (packed.miss) return { ok: false, miss: packed.miss };
    parts.push(...packed.parts);
  }
  // Overhead lockers above the kitchen run, where the roof leaves working room over the worktop.
  const counterRun = parts.filter((p) => p.role === 'sink' || p.role === 'counter');
  const L = SIZES.locker;
  const lockerElevation = f.clear - L.height - 10;
  if (counterRun.length > 0 && lockerElevation >= L.minUnderside) {
    const x0 = Math.min(...counterRun.map((p) => p.x)), x1 = Math.max(...counterRun.map((p) => p.x + p.length));
    const onLeft = counterRun[0].y < (f.Y0 + f.Y1) / 2;
    parts.push({ role: 'locker', kind: 'overhead-locker', label: 'Overhead locker', x: x0, y: onLeft ? f.Y0 : f.Y1 - L.width, length: x1 - x0, width: L.width, elevation: lockerElevation, height: L.height, facing: onLeft ? 'right' : 'left', arrangements: ALL });
  }
  const services = packServices(f, brief, rear.slots);
  if (services.miss) return { ok: false, miss: services.miss };
  parts.push(...services.parts);
  const blocked = parts.map((p) => [p, inDoorEntry(p, f.entries)] as const).find(([, z]) => z);
  if (blocked) {
    const [p, z] = blocked;
    const into = Math.min(p.x + p.length, z!.rect.x1) - Math.max(p.x, z!.rect.x0);
    return miss('door entry kept clear', into, 0, 'mm', `${p.label} would stand ${into} mm into ${z!.what} (${z!.rect.x0}–${z!.rect.x1} mm from the front, ${z!.rect.y1 - z!.rect.y0} mm deep), which is kept clear to come in.`);
  }
  return { ok: true, parts, bedAcross: rear.bedAcross };
}
