/**
 * The module kinds, each declared once: its shelf entry (title, search words, material family),
 * default footprint, mass, surfaces per arrangement and arrangements, whether it is worked from its front, its own
 * typed values (the module's `props`: names, types, limits, defaults and the Details panel's labels),
 * the planning facts those values give, and its plan symbol (plain shapes in the module's own mm
 * frame, drawn by both the editor canvas and the plan sheet). The document schema builds its
 * per-kind module schema from `values`; planning reads `facts`, never a prop by name.
 *
 * To add a kind: add one entry here, and its case in tests/layout/kinds.test.ts runs by itself.
 * Sizes and masses are typical starting points (common practice, no source); the designer edits
 * them per module. Pure: must never import React, Konva, Next or the database.
 */
import * as z from 'zod/mini';
import { bandRect, clamp01, clampInt, cubic, ellipse, oppositeSide, path, roundRect, type SymbolShape } from '../geometry/shapes';
import { tankCapacity, type TankSize } from './tank';
import type { ARRANGEMENTS, FACINGS, MOUNTS, SURFACES } from './vocabulary';

type Arrangement = (typeof ARRANGEMENTS)[number];
type Facing = (typeof FACINGS)[number];
type Surface = (typeof SURFACES)[number];

/** How a kind is drawn: each family has its own hatching on the plan. */
export type MaterialFamily = 'timber' | 'upholstery' | 'water' | 'electrics' | 'gas' | 'appliance' | 'sanitary';

// ---- a kind's own values ------------------------------------------------------------------------

/** One typed value of a kind: its schema, its label in the Details panel, and how it is typed in. */
export interface ValueField<T> {
  schema: z.ZodMiniType<T>;
  label: string;
  input: 'number' | 'boolean' | 'text';
}
type Fields = Record<string, ValueField<number> | ValueField<boolean> | ValueField<string>>;
/** The values a module of a kind may carry: every field optional (the kind's default stands in). */
export type ValuesOf<F extends Fields> = { [K in keyof F]?: F[K] extends ValueField<infer T> ? T : never };

const amount = (label: string, min: number, max: number, whole = false): ValueField<number> => ({
  label,
  input: 'number',
  schema: z.number().check(
    z.refine((v) => Number.isFinite(v), 'must be a number'),
    z.refine((v) => !whole || Number.isInteger(v), 'must be a whole number'),
    z.refine((v) => v >= min && v <= max, `must be from ${min} to ${max}`),
  ),
});
const flag = (label: string): ValueField<boolean> => ({ label, input: 'boolean', schema: z.boolean() });
const words = (label: string, max = 40): ValueField<string> => ({
  label,
  input: 'text',
  schema: z.string().check(z.maxLength(max, `at most ${max} characters`), z.refine((s) => !/[\u0000-\u001F\u007F]/.test(s), 'control characters are not allowed')),
});

/**
 * An electrical load on the leisure battery: any kind may carry one (a pump in a sink unit, lights
 * in a locker); the power budget counts it all day unless hours or a duty cycle are given.
 */
const LOAD = {
  watts: amount('Power (W)', 0, 100_000),
  hoursPerDay: amount('Hours a day', 0, 24),
  dutyCycle: amount('Duty cycle (0–1)', 0, 1),
};
const SHELVES = { shelves: amount('Shelves', 0, 20, true) };

// ---- what planning reads --------------------------------------------------------------------------

/** What a module's kind and values mean to build planning. Every field is optional. */
export interface KindFacts {
  /** Electrical load on the leisure battery (power budget). */
  load?: { watts: number; hoursPerDay?: number; dutyCycle?: number };
  /** Heat output, W (heat-loss balance). */
  heatOutputW?: number;
  /**
   * A water tank: fresh or grey, and litres held when full (water plan, axle loads): the typed
   * capacity, else the drawn inside volume (`basis` says which; `drawnLitres` is always the drawn one).
   */
  water?: { use: 'fresh' | 'grey'; litres: number; basis: 'typed' | 'drawn'; drawnLitres: number };
  /** A solar panel: its rated (nameplate) power, W, which the power budget sums over the drawn panels. */
  solarPanel?: { ratedWatts: number };
  /** Gas cylinders held (gas locker). */
  gasCylinders?: { count: number; kgEach: number };
  /** What it burns, as typed (hob, heater); undefined when not given. */
  fuel?: string;
  /**
   * An appliance that may burn gas in the living space: whether it is flueless (a hob) or room-sealed
   * (a heater), and what it burns when `fuel` is not typed: gas, or the heating fuel of the build plan.
   */
  gasAppliance?: { flueless: boolean; untypedFuel: 'gas' | 'heating' };
  /** A travel seat's belt and its fitting. */
  seat?: { belted: boolean; approvedType: boolean; anchorageTested: boolean };
  /**
   * The sheet panels its carcass is cut from (cut list; common practice, no source: a starting list
   * for the workshop, not a joinery design), with its shelves and what its top panel is called.
   * Absent: bought in, not cut — `notCut` says why when that needs saying.
   */
  carcass?: { pieces: CarcassPiece[]; shelves: number; topName?: string };
  notCut?: string;
}

export type CarcassPiece = 'sides' | 'top' | 'bottom' | 'back' | 'shelves' | 'front' | 'worktop';
const carcass = (pieces: CarcassPiece[], shelves = 0, topName?: string): KindFacts => ({ carcass: { pieces, shelves, ...(topName ? { topName } : {}) } });

function loadFacts(v: { watts?: number; hoursPerDay?: number; dutyCycle?: number }): KindFacts {
  return v.watts === undefined ? {} : { load: { watts: v.watts, hoursPerDay: v.hoursPerDay, dutyCycle: v.dutyCycle } };
}

// ---- the kind --------------------------------------------------------------------------------------

/** What a symbol is drawn from: the module's size, facing and own values (not the defaults). */
export interface SymbolBox<V = Record<string, unknown>> {
  length: number;
  width: number;
  facing: Facing;
  props?: V;
}

interface KindDef<K extends string, F extends Fields> {
  kind: K;
  /** Sentence-case name on the Parts shelf. */
  title: string;
  /** Words a search on the Parts shelf should also match. */
  keywords: string[];
  family: MaterialFamily;
  /** Default footprint: length along x, width along y; elevation above the finished floor; height. */
  length: number;
  width: number;
  elevation: number;
  height: number;
  massKg: number;
  /** What its top is used as in each arrangement (copied onto a new module). */
  surfaces?: Partial<Record<Arrangement, Surface>>;
  arrangements: Arrangement[];
  /** Where a new one is mounted when not inside the body: under the floor, on the roof or behind the rear doors. */
  mount?: Exclude<(typeof MOUNTS)[number], 'inside'>;
  /** Worked from its front face, so the walkway must reach it (DESIGN.md). */
  usedFromFront: boolean;
  /** The kind's own values: the module's `props`. */
  values: F;
  /** Defaults of those values, copied onto a new module and read when a module has none. */
  props?: ValuesOf<F>;
  /** Values the Details panel shows even without a default (their default is worked out, e.g. a tank's capacity). */
  shown?: (keyof F & string)[];
  /** What its values (and, for a tank, its drawn size) mean to planning. */
  facts: (v: ValuesOf<F>, size?: TankSize) => KindFacts;
  /** What is drawn inside the outline to say what it is (the working-face mark is added by lib/symbols). */
  symbol: (m: SymbolBox<ValuesOf<F>>) => SymbolShape[];
}

/** A kind as the rest of the code sees it, whichever kind it is. */
export interface KindSpec extends Omit<KindDef<ModuleKind, Fields>, 'props' | 'facts' | 'symbol' | 'shown'> {
  props?: Record<string, number | boolean | string>;
  shown?: string[];
  facts: (v: Record<string, unknown>, size?: TankSize) => KindFacts;
  symbol: (m: SymbolBox<Record<string, unknown>>) => SymbolShape[];
}

const defineKind = <K extends string, F extends Fields>(def: KindDef<K, F>) => def;

const ALL: Arrangement[] = ['travel', 'lounge', 'sleep'];

/** Backrest band on the side opposite the face the seat is used from; a belted seat shows a sash. */
function seatSymbol(m: SymbolBox, sash: boolean): SymbolShape[] {
  const L = m.length, W = m.width;
  const band = Math.min(Math.min(L, W) * 0.22, 120);
  const out: SymbolShape[] = [{ type: 'path', points: bandRect(oppositeSide(m.facing), L, W, band), closed: true, fill: 'shade' }];
  if (sash) out.push(path([[L * 0.25, W * 0.25], [L * 0.75, W * 0.75]]));
  return out;
}

/** Fill line at the tank's level (fillLevel 0..1, three quarters if not given); grey water dashed. */
function tankSymbol(m: SymbolBox<{ fillLevel?: number }>, dashed: boolean): SymbolShape[] {
  const L = m.length, W = m.width;
  const y = W * (1 - clamp01(m.props?.fillLevel, 0.75));
  return [
    { type: 'path', points: [[0, y], [L, y], [L, W], [0, W]], closed: true, fill: 'water', stroke: 'none' },
    { ...path([[0, y], [L, y]]), dash: dashed ? 'dashed' : undefined },
  ];
}

const TANK = {
  litres: amount('Capacity (litres)', 0, 10_000),
  fillFraction: amount('Share of the inside that holds water (0–1)', 0, 1),
  fillLevel: amount('Fill level drawn (0–1)', 0, 1),
};
const SLEEP_ALL: Partial<Record<Arrangement, Surface>> = { travel: 'sleep', lounge: 'sleep', sleep: 'sleep' };
const SEAT_ALL: Partial<Record<Arrangement, Surface>> = { travel: 'seat', lounge: 'seat', sleep: 'seat' };
const COUNTER_ALL: Partial<Record<Arrangement, Surface>> = { travel: 'counter', lounge: 'counter', sleep: 'counter' };

export const KINDS = {
  'bed-platform': defineKind({
    kind: 'bed-platform', title: 'Bed platform', keywords: ['bed', 'fixed bed', 'mattress'], family: 'upholstery',
    length: 1900, width: 1400, elevation: 0, height: 900, massKg: 45, surfaces: SLEEP_ALL, arrangements: ALL, usedFromFront: false,
    values: { ...LOAD }, facts: (v) => ({ ...loadFacts(v), ...carcass(['worktop', 'front'], 0, 'bed top') }),
    symbol: (m) => {
      // Pillow at the end nearest the cab unless the bed faces rearwards.
      const L = m.length, W = m.width, alongX = L >= W;
      const pw = alongX ? Math.min(L * 0.14, 300) : L * 0.7;
      const ph = alongX ? W * 0.7 : Math.min(W * 0.14, 300);
      const x0 = alongX ? (m.facing === 'rear' ? L - pw - L * 0.04 : L * 0.04) : (L - pw) / 2;
      const y0 = alongX ? (W - ph) / 2 : W * 0.04;
      return [{ ...roundRect(x0, y0, pw, ph, Math.min(pw, ph) * 0.2), fill: 'paper' }];
    },
  }),
  'bed-infill': defineKind({
    kind: 'bed-infill', title: 'Bed infill board', keywords: ['infill', 'slide-out', 'cushion', 'bed'], family: 'upholstery',
    length: 700, width: 600, elevation: 380, height: 80, massKg: 8, surfaces: { sleep: 'sleep' }, arrangements: ['sleep'], usedFromFront: false,
    values: { ...LOAD }, facts: (v) => ({ ...loadFacts(v), ...carcass(['top']) }), symbol: () => [],
  }),
  'bench-seat': defineKind({
    kind: 'bench-seat', title: 'Bench seat', keywords: ['lounge', 'seating', 'sofa', 'bench'], family: 'upholstery',
    length: 1100, width: 550, elevation: 0, height: 460, massKg: 22, surfaces: { travel: 'seat', lounge: 'seat', sleep: 'sleep' }, arrangements: ALL, usedFromFront: true,
    values: { ...LOAD }, facts: (v) => ({ ...loadFacts(v), ...carcass(['sides', 'top', 'front']) }), symbol: (m) => seatSymbol(m, false),
  }),
  seat: defineKind({
    kind: 'seat', title: 'Travel seat', keywords: ['belted seat', 'passenger', 'seat'], family: 'upholstery',
    length: 600, width: 550, elevation: 0, height: 1150, massKg: 30, surfaces: SEAT_ALL, arrangements: ALL, usedFromFront: true,
    values: { belted: flag('Belted seat'), approved: flag('Seat and belt of an approved type'), anchorageTested: flag('Anchorages fitted to the maker’s kit or tested'), ...LOAD },
    props: { belted: true, approved: false, anchorageTested: false },
    facts: (v) => ({ ...loadFacts(v), seat: { belted: v.belted !== false, approvedType: v.approved === true, anchorageTested: v.anchorageTested === true } }),
    symbol: (m) => seatSymbol(m, m.props?.belted === true),
  }),
  table: defineKind({
    kind: 'table', title: 'Table', keywords: ['dining', 'desk', 'table'], family: 'timber',
    length: 700, width: 500, elevation: 700, height: 30, massKg: 6, surfaces: { lounge: 'counter' }, arrangements: ['lounge'], usedFromFront: true,
    values: { ...LOAD }, facts: (v) => ({ ...loadFacts(v), ...carcass(['worktop'], 0, 'table top') }),
    symbol: (m) => [roundRect(m.length * 0.08, m.width * 0.08, m.length * 0.84, m.width * 0.84, Math.min(m.length, m.width) * 0.1)],
  }),
  'kitchen-counter': defineKind({
    kind: 'kitchen-counter', title: 'Kitchen counter', keywords: ['kitchen', 'worktop', 'galley', 'counter'], family: 'timber',
    length: 1200, width: 500, elevation: 0, height: 900, massKg: 35, surfaces: COUNTER_ALL, arrangements: ALL, usedFromFront: true,
    values: { ...SHELVES, ...LOAD }, facts: (v) => ({ ...loadFacts(v), ...carcass(['sides', 'bottom', 'back', 'shelves', 'worktop'], v.shelves ?? 1) }), symbol: () => [],
  }),
  'sink-unit': defineKind({
    kind: 'sink-unit', title: 'Sink unit', keywords: ['sink', 'basin', 'tap', 'kitchen'], family: 'water',
    length: 450, width: 450, elevation: 0, height: 900, massKg: 12, surfaces: COUNTER_ALL, arrangements: ALL, usedFromFront: true,
    values: { ...LOAD }, facts: (v) => ({ ...loadFacts(v), ...carcass(['sides', 'bottom', 'back', 'worktop']) }),
    symbol: (m) => {
      const L = m.length, W = m.width, bw = L * 0.62, bh = W * 0.55;
      return [roundRect(L / 2 - bw / 2, W / 2 - bh / 2, bw, bh, Math.min(bw, bh) * 0.2), { type: 'circle', cx: L / 2, cy: W / 2, r: Math.min(L, W) * 0.05 }];
    },
  }),
  hob: defineKind({
    kind: 'hob', title: 'Hob', keywords: ['cooker', 'burner', 'stove', 'induction'], family: 'gas',
    length: 500, width: 350, elevation: 900, height: 60, massKg: 6, arrangements: ALL, usedFromFront: true,
    values: { burners: amount('Burners', 1, 6, true), fuel: words('Fuel'), ...LOAD },
    props: { burners: 2 },
    facts: (v) => ({ ...loadFacts(v), fuel: v.fuel, gasAppliance: { flueless: true, untypedFuel: 'gas' } }),
    symbol: (m) => {
      const L = m.length, W = m.width;
      const n = clampInt(m.props?.burners, 1, 4, 2);
      const cols = n <= 2 ? n : 2;
      const rows = Math.ceil(n / cols);
      const r = Math.min(L / cols, W / rows) * 0.3;
      const out: SymbolShape[] = [];
      for (let i = 0; i < n; i++) {
        const x = (L / cols) * ((i % cols) + 0.5);
        const y = (W / rows) * (Math.floor(i / cols) + 0.5);
        out.push({ type: 'circle', cx: x, cy: y, r }, { type: 'circle', cx: x, cy: y, r: r * 0.45 });
      }
      return out;
    },
  }),
  fridge: defineKind({
    kind: 'fridge', title: '12 V fridge', keywords: ['fridge', 'cool box', 'compressor', 'refrigerator'], family: 'appliance',
    length: 450, width: 480, elevation: 0, height: 560, massKg: 18, arrangements: ALL, usedFromFront: true,
    values: { litres: amount('Capacity (litres)', 0, 10_000), ...LOAD },
    props: { litres: 49, watts: 45, dutyCycle: 0.33 },
    facts: loadFacts,
    symbol: (m) => {
      const cx = m.length / 2, cy = m.width / 2, r = Math.min(m.length, m.width) * 0.22;
      return [0, 1, 2].map((i) => {
        const a = (Math.PI / 3) * i;
        return path([[cx - Math.cos(a) * r, cy - Math.sin(a) * r], [cx + Math.cos(a) * r, cy + Math.sin(a) * r]]);
      });
    },
  }),
  wardrobe: defineKind({
    kind: 'wardrobe', title: 'Wardrobe', keywords: ['cupboard', 'hanging', 'tall unit', 'closet'], family: 'timber',
    length: 500, width: 500, elevation: 0, height: 1750, massKg: 25, arrangements: ALL, usedFromFront: true,
    values: { ...SHELVES, ...LOAD }, facts: (v) => ({ ...loadFacts(v), ...carcass(['sides', 'top', 'bottom', 'back', 'shelves'], v.shelves ?? 1) }),
    symbol: (m) => {
      const L = m.length, W = m.width;
      return [{ ...path(L >= W ? [[L * 0.1, W / 2], [L * 0.9, W / 2]] : [[L / 2, W * 0.1], [L / 2, W * 0.9]]), dash: 'dashed' }];
    },
  }),
  'drawer-unit': defineKind({
    kind: 'drawer-unit', title: 'Drawer unit', keywords: ['drawers', 'storage', 'chest'], family: 'timber',
    length: 450, width: 450, elevation: 0, height: 700, massKg: 15, arrangements: ALL, usedFromFront: true,
    values: { ...SHELVES, ...LOAD }, facts: (v) => ({ ...loadFacts(v), ...carcass(['sides', 'top', 'bottom', 'back', 'shelves'], v.shelves ?? 2) }),
    symbol: (m) => {
      const L = m.length, W = m.width, across = m.facing === 'left' || m.facing === 'right';
      return [1, 2, 3].map((i) => {
        const t = i / 4;
        return path(across ? [[L * 0.15, W * t], [L * 0.85, W * t]] : [[L * t, W * 0.15], [L * t, W * 0.85]]);
      });
    },
  }),
  'overhead-locker': defineKind({
    kind: 'overhead-locker', title: 'Overhead locker', keywords: ['locker', 'cupboard', 'high storage'], family: 'timber',
    length: 1000, width: 350, elevation: 1450, height: 350, massKg: 10, arrangements: ALL, usedFromFront: false,
    values: { ...LOAD }, facts: (v) => ({ ...loadFacts(v), ...carcass(['sides', 'top', 'bottom', 'back']) }), symbol: () => [],
  }),
  'fresh-water-tank': defineKind({
    kind: 'fresh-water-tank', title: 'Fresh water tank', keywords: ['water', 'tank', 'fresh', 'drinking'], family: 'water',
    length: 700, width: 350, elevation: 0, height: 300, massKg: 6, arrangements: ALL, usedFromFront: false,
    values: { ...TANK, ...LOAD }, shown: ['litres', 'fillFraction'],
    facts: (v, size) => ({ ...loadFacts(v), water: { use: 'fresh', ...tankCapacity(size, v) } }), symbol: (m) => tankSymbol(m, false),
  }),
  'grey-water-tank': defineKind({
    kind: 'grey-water-tank', title: 'Grey water tank', keywords: ['grey', 'waste water', 'tank'], family: 'water',
    length: 600, width: 350, elevation: 0, height: 250, massKg: 5, arrangements: ALL, usedFromFront: false,
    values: { ...TANK, ...LOAD }, shown: ['litres', 'fillFraction'],
    facts: (v, size) => ({ ...loadFacts(v), water: { use: 'grey', ...tankCapacity(size, v) } }), symbol: (m) => tankSymbol(m, true),
  }),
  'gas-locker': defineKind({
    kind: 'gas-locker', title: 'Gas locker', keywords: ['lpg', 'cylinder', 'bottle', 'gas'], family: 'gas',
    length: 400, width: 350, elevation: 0, height: 650, massKg: 8, arrangements: ALL, usedFromFront: true,
    values: { cylinders: amount('Cylinders', 0, 10, true), cylinderKg: amount('Cylinder size (kg)', 0, 100), ...LOAD },
    props: { cylinders: 1, cylinderKg: 6 },
    facts: (v) => ({ ...loadFacts(v), notCut: 'a gas locker is a sealed, purpose-made box (EN 1949); not cut from plywood here', gasCylinders: { count: Math.max(0, Math.round(v.cylinders ?? 0)), kgEach: Math.max(0, v.cylinderKg ?? 0) } }),
    symbol: (m) => {
      const n = clampInt(m.props?.cylinders, 1, 3, 1);
      const r = Math.min(m.length / n, m.width) * 0.3;
      return Array.from({ length: n }, (_, i) => ({ type: 'circle' as const, cx: (m.length / n) * (i + 0.5), cy: m.width / 2, r }));
    },
  }),
  'electrics-bay': defineKind({
    kind: 'electrics-bay', title: 'Electrics bay', keywords: ['battery', 'inverter', 'charger', 'fuse', 'electrics'], family: 'electrics',
    length: 600, width: 400, elevation: 0, height: 400, massKg: 30, arrangements: ALL, usedFromFront: true,
    values: { ...LOAD }, facts: (v) => ({ ...loadFacts(v), ...carcass(['sides', 'top', 'bottom', 'back']) }),
    symbol: (m) => {
      const cx = m.length / 2, cy = m.width / 2, h = Math.min(m.length, m.width) * 0.5;
      return [path([[cx + h * 0.15, cy - h / 2], [cx - h * 0.2, cy + h * 0.05], [cx + h * 0.15, cy + h * 0.05], [cx - h * 0.15, cy + h / 2]])];
    },
  }),
  heater: defineKind({
    kind: 'heater', title: 'Heater', keywords: ['diesel heater', 'air heater', 'warm'], family: 'appliance',
    length: 400, width: 200, elevation: 0, height: 200, massKg: 4, arrangements: ALL, usedFromFront: false,
    // `watts` is the heat output; the heater's fan draw is entered as a load on the power tab.
    values: { watts: amount('Power (W)', 0, 100_000), fuel: words('Fuel') },
    props: { watts: 2000 },
    facts: (v) => ({ heatOutputW: v.watts, fuel: v.fuel, gasAppliance: { flueless: false, untypedFuel: 'heating' } }),
    symbol: (m) => [0, 1, 2].map((k) => {
      const L = m.length, W = m.width, x0 = L * (0.3 + 0.2 * k);
      return path(cubic([x0, W * 0.2], [x0 + L * 0.08, W * 0.4], [x0 - L * 0.08, W * 0.6], [x0, W * 0.8]));
    }),
  }),
  'toilet-cabinet': defineKind({
    kind: 'toilet-cabinet', title: 'Toilet cabinet', keywords: ['toilet', 'cassette', 'loo', 'wc'], family: 'sanitary',
    length: 450, width: 450, elevation: 0, height: 500, massKg: 12, arrangements: ALL, usedFromFront: true,
    values: { ...LOAD }, facts: (v) => ({ ...loadFacts(v), ...carcass(['sides', 'top', 'back']) }),
    symbol: (m) => [{ type: 'path', points: ellipse(m.length / 2, m.width / 2, m.length * 0.28, m.width * 0.34), closed: true }],
  }),
  'shower-tray': defineKind({
    kind: 'shower-tray', title: 'Shower tray', keywords: ['shower', 'wet room', 'tray'], family: 'sanitary',
    length: 700, width: 700, elevation: 0, height: 60, massKg: 8, arrangements: ALL, usedFromFront: false,
    values: { ...LOAD }, facts: loadFacts,
    symbol: (m) => {
      const L = m.length, W = m.width;
      return [path([[0, 0], [L, W]]), path([[L, 0], [0, W]]), { type: 'circle', cx: L / 2, cy: W / 2, r: Math.min(L, W) * 0.06, fill: 'paper' }];
    },
  }),
  'spare-wheel': defineKind({
    kind: 'spare-wheel', title: 'Spare wheel', keywords: ['spare tyre', 'wheel carrier', 'underslung'], family: 'timber',
    length: 700, width: 700, elevation: 0, height: 220, massKg: 22, arrangements: ALL, mount: 'under-floor', usedFromFront: false,
    values: {}, facts: () => ({}),
    symbol: (m) => [
      { type: 'path', points: ellipse(m.length / 2, m.width / 2, m.length * 0.45, m.width * 0.45), closed: true },
      { type: 'path', points: ellipse(m.length / 2, m.width / 2, m.length * 0.2, m.width * 0.2), closed: true },
    ],
  }),
  'roof-box': defineKind({
    kind: 'roof-box', title: 'Roof box', keywords: ['roof pod', 'roof rack', 'roof storage'], family: 'timber',
    length: 1400, width: 800, elevation: 0, height: 400, massKg: 18, arrangements: ALL, mount: 'roof', usedFromFront: false,
    values: {}, facts: () => ({}),
    symbol: (m) => [roundRect(m.length * 0.08, m.width * 0.1, m.length * 0.84, m.width * 0.8, Math.min(m.length, m.width) * 0.2)],
  }),
  'solar-panel': defineKind({
    // A typical rigid 12 V panel of about 175 W: 1480 × 670 × 35 mm, 9 kg (typical, invented for
    // defaults; the maker's data sheet gives the real size, mass and rating). Bought in, not cut.
    kind: 'solar-panel', title: 'Solar panel', keywords: ['solar', 'photovoltaic', 'pv module', 'roof panel'], family: 'electrics',
    length: 1480, width: 670, elevation: 0, height: 35, massKg: 9, arrangements: ALL, mount: 'roof', usedFromFront: false,
    // `ratedWatts` is what it gives; a load it may carry as any kind may (LOAD).
    values: { ratedWatts: amount('Rated power (W)', 5, 1000), ...LOAD },
    props: { ratedWatts: 175 },
    facts: (v) => ({ ...loadFacts(v), ...(v.ratedWatts === undefined ? {} : { solarPanel: { ratedWatts: v.ratedWatts } }) }),
    symbol: (m) => {
      // The cells: a grid of two rows across the short side and six along the long one.
      const L = m.length, W = m.width, alongX = L >= W;
      const inset = Math.min(L, W) * 0.06;
      const out: SymbolShape[] = [{ type: 'path', points: [[inset, inset], [L - inset, inset], [L - inset, W - inset], [inset, W - inset]], closed: true }];
      const [long, short] = alongX ? [L, W] : [W, L];
      for (let i = 1; i < 6; i++) {
        const t = inset + ((long - 2 * inset) * i) / 6;
        out.push(path(alongX ? [[t, inset], [t, W - inset]] : [[inset, t], [L - inset, t]]));
      }
      const mid = short / 2;
      out.push(path(alongX ? [[inset, mid], [L - inset, mid]] : [[mid, inset], [mid, W - inset]]));
      return out;
    },
  }),
  'roof-rail': defineKind({
    // One rail (fit two, one along each side): 2000 × 40 mm, 60 mm high, 3 kg (typical, invented
    // for defaults). What stands on the roof must fit around it; the roof load is the vehicle maker's.
    kind: 'roof-rail', title: 'Roof rail', keywords: ['rail', 'roof bar', 'cross bar', 'roof rack rail'], family: 'timber',
    length: 2000, width: 40, elevation: 0, height: 60, massKg: 3, arrangements: ALL, mount: 'roof', usedFromFront: false,
    values: {}, facts: () => ({}),
    symbol: (m) => {
      // The bar along its long side, with a foot at each end.
      const L = m.length, W = m.width, alongX = L >= W;
      const foot = Math.min(L, W) * 0.8, inset = (Math.min(L, W) - foot) / 2;
      const end = Math.min(Math.max(L, W) * 0.04, 60);
      return alongX
        ? [path([[0, W / 2], [L, W / 2]]), { type: 'path', points: [[0, inset], [end, inset], [end, W - inset], [0, W - inset]], closed: true, fill: 'shade' }, { type: 'path', points: [[L - end, inset], [L, inset], [L, W - inset], [L - end, W - inset]], closed: true, fill: 'shade' }]
        : [path([[L / 2, 0], [L / 2, W]]), { type: 'path', points: [[inset, 0], [L - inset, 0], [L - inset, end], [inset, end]], closed: true, fill: 'shade' }, { type: 'path', points: [[inset, W - end], [L - inset, W - end], [L - inset, W], [inset, W]], closed: true, fill: 'shade' }];
    },
  }),
  'rear-carrier': defineKind({
    kind: 'rear-carrier', title: 'Rear carrier', keywords: ['bike rack', 'bikes', 'bicycle carrier', 'rear rack', 'tow bar carrier'], family: 'timber',
    length: 600, width: 1200, elevation: 400, height: 1000, massKg: 30, arrangements: ALL, mount: 'rear', usedFromFront: false,
    values: {}, facts: () => ({}),
    symbol: (m) => [0.25, 0.5, 0.75].map((t) => path([[0, m.width * t], [m.length, m.width * t]])),
  }),
  step: defineKind({
    kind: 'step', title: 'Step', keywords: ['entry step', 'stair', 'ladder', 'bunk ladder'], family: 'timber',
    length: 400, width: 300, elevation: 0, height: 200, massKg: 4, arrangements: ALL, usedFromFront: false,
    values: { ...LOAD }, facts: (v) => ({ ...loadFacts(v), ...carcass(['sides', 'top', 'front']) }),
    symbol: (m) => [0.35, 0.6].map((t) => path([[m.length * (t - 0.12), m.width * 0.25], [m.length * t, m.width / 2], [m.length * (t - 0.12), m.width * 0.75]])),
  }),
};

export type ModuleKind = keyof typeof KINDS;
/** The typed values (`props`) of one kind. */
export type KindValues<K extends ModuleKind> = ValuesOf<(typeof KINDS)[K]['values']>;

/** Every kind id, in shelf order. Part of the document contract (DESIGN.md). */
export const MODULE_KINDS = Object.keys(KINDS) as [ModuleKind, ...ModuleKind[]];

export const KIND_LIST: KindSpec[] = Object.values(KINDS) as KindSpec[];

export function kindSpec(kind: ModuleKind): KindSpec {
  return KINDS[kind] as KindSpec;
}

/** The zod schema of a kind's values: each optional, no other names. */
export function kindValuesSchema(kind: ModuleKind) {
  const fields = kindSpec(kind).values;
  const shape: Record<string, z.ZodMiniOptional<z.ZodMiniType<unknown>>> = {};
  for (const [key, f] of Object.entries(fields)) shape[key] = z.optional(f.schema as z.ZodMiniType<unknown>);
  return z.strictObject(shape);
}

/** A module's values with its kind's defaults filled in. */
export function valuesWithDefaults(m: { kind: ModuleKind; props?: object }): Record<string, unknown> {
  return { ...kindSpec(m.kind).props, ...m.props };
}

/** What planning reads about a module: its kind's facts from its values (defaults filled in). */
export function kindFacts(m: { kind: ModuleKind; props?: object } & Partial<TankSize>): KindFacts {
  const size = m.length !== undefined && m.width !== undefined && m.height !== undefined ? { length: m.length, width: m.width, height: m.height } : undefined;
  return kindSpec(m.kind).facts(valuesWithDefaults(m), size);
}

/**
 * The value fields the Details panel shows for a module: those its kind gives a default, and any
 * the module carries, in the kind's order.
 */
export function shownFields(m: { kind: ModuleKind; props?: object }): { key: string; field: ValueField<unknown> }[] {
  const spec = kindSpec(m.kind);
  return Object.entries(spec.values)
    .filter(([key]) => (spec.props && key in spec.props) || spec.shown?.includes(key) || (m.props && key in m.props))
    .map(([key, field]) => ({ key, field: field as ValueField<unknown> }));
}

/** The label of a value by its name, from the first kind that declares it. */
export function valueLabel(key: string): string | undefined {
  for (const k of KIND_LIST) {
    const f = (k.values as Fields)[key];
    if (f) return f.label;
  }
  return undefined;
}

/** What a module is called wherever people read about it: its label, else its kind's name. Never its id. */
export function moduleLabel(m: { label?: string; kind: ModuleKind }): string {
  return m.label?.trim() || kindSpec(m.kind).title;
}
