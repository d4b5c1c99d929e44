/**
 * The module kinds: one home for each kind's default size, mass, surface, material family and
 * whether it is used from its front. The editor draws from `family`; the check engine reads
 * `usedFromFront`. Sizes and masses are typical starting points (common practice, no source);
 * the designer edits them per module.
 */
import type { Arrangement, ModuleKind, Surface } from './schema';

/** How a kind is drawn: each family has its own hatching on the plan. */
export type MaterialFamily = 'timber' | 'upholstery' | 'water' | 'electrics' | 'gas' | 'appliance' | 'sanitary';

export interface KindSpec {
  kind: ModuleKind;
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
  surface?: Surface;
  arrangements: Arrangement[];
  /** Worked from its front face, so the walkway must reach it (DESIGN.md). */
  usedFromFront: boolean;
  props?: Record<string, number | boolean | string>;
}

const ALL: Arrangement[] = ['travel', 'lounge', 'sleep'];

export const KINDS: Record<ModuleKind, KindSpec> = {
  'bed-platform': { kind: 'bed-platform', title: 'Bed platform', keywords: ['bed', 'fixed bed', 'mattress'], family: 'upholstery', length: 1900, width: 1400, elevation: 0, height: 900, massKg: 45, surface: 'sleep', arrangements: ALL, usedFromFront: false },
  'bed-infill': { kind: 'bed-infill', title: 'Bed infill board', keywords: ['infill', 'slide-out', 'cushion', 'bed'], family: 'upholstery', length: 700, width: 600, elevation: 380, height: 80, massKg: 8, surface: 'sleep', arrangements: ['sleep'], usedFromFront: false },
  'bench-seat': { kind: 'bench-seat', title: 'Bench seat', keywords: ['lounge', 'seating', 'sofa', 'bench'], family: 'upholstery', length: 1100, width: 550, elevation: 0, height: 460, massKg: 22, surface: 'seat', arrangements: ['lounge', 'sleep'], usedFromFront: true },
  seat: { kind: 'seat', title: 'Travel seat', keywords: ['belted seat', 'passenger', 'seat'], family: 'upholstery', length: 600, width: 550, elevation: 0, height: 1150, massKg: 30, surface: 'seat', arrangements: ALL, usedFromFront: true, props: { belted: true, approved: false, anchorageTested: false } },
  table: { kind: 'table', title: 'Table', keywords: ['dining', 'desk', 'table'], family: 'timber', length: 700, width: 500, elevation: 700, height: 30, massKg: 6, surface: 'counter', arrangements: ['lounge'], usedFromFront: true },
  'kitchen-counter': { kind: 'kitchen-counter', title: 'Kitchen counter', keywords: ['kitchen', 'worktop', 'galley', 'counter'], family: 'timber', length: 1200, width: 500, elevation: 0, height: 900, massKg: 35, surface: 'counter', arrangements: ALL, usedFromFront: true },
  'sink-unit': { kind: 'sink-unit', title: 'Sink unit', keywords: ['sink', 'basin', 'tap', 'kitchen'], family: 'water', length: 450, width: 450, elevation: 0, height: 900, massKg: 12, surface: 'counter', arrangements: ALL, usedFromFront: true },
  hob: { kind: 'hob', title: 'Hob', keywords: ['cooker', 'burner', 'stove', 'induction'], family: 'gas', length: 500, width: 350, elevation: 900, height: 60, massKg: 6, arrangements: ALL, usedFromFront: true, props: { burners: 2 } },
  fridge: { kind: 'fridge', title: '12 V fridge', keywords: ['fridge', 'cool box', 'compressor', 'refrigerator'], family: 'appliance', length: 450, width: 480, elevation: 0, height: 560, massKg: 18, arrangements: ALL, usedFromFront: true, props: { litres: 49, watts: 45, dutyCycle: 0.33 } },
  wardrobe: { kind: 'wardrobe', title: 'Wardrobe', keywords: ['cupboard', 'hanging', 'tall unit', 'closet'], family: 'timber', length: 500, width: 500, elevation: 0, height: 1750, massKg: 25, arrangements: ALL, usedFromFront: true },
  'drawer-unit': { kind: 'drawer-unit', title: 'Drawer unit', keywords: ['drawers', 'storage', 'chest'], family: 'timber', length: 450, width: 450, elevation: 0, height: 700, massKg: 15, arrangements: ALL, usedFromFront: true },
  'overhead-locker': { kind: 'overhead-locker', title: 'Overhead locker', keywords: ['locker', 'cupboard', 'high storage'], family: 'timber', length: 1000, width: 350, elevation: 1450, height: 350, massKg: 10, arrangements: ALL, usedFromFront: false },
  'fresh-water-tank': { kind: 'fresh-water-tank', title: 'Fresh water tank', keywords: ['water', 'tank', 'fresh', 'drinking'], family: 'water', length: 700, width: 350, elevation: 0, height: 300, massKg: 6, arrangements: ALL, usedFromFront: false, props: { litres: 70 } },
  'grey-water-tank': { kind: 'grey-water-tank', title: 'Grey water tank', keywords: ['grey', 'waste water', 'tank'], family: 'water', length: 600, width: 350, elevation: 0, height: 250, massKg: 5, arrangements: ALL, usedFromFront: false, props: { litres: 50 } },
  'gas-locker': { kind: 'gas-locker', title: 'Gas locker', keywords: ['lpg', 'cylinder', 'bottle', 'gas'], family: 'gas', length: 400, width: 350, elevation: 0, height: 650, massKg: 8, arrangements: ALL, usedFromFront: true, props: { cylinders: 1, cylinderKg: 6 } },
  'electrics-bay': { kind: 'electrics-bay', title: 'Electrics bay', keywords: ['battery', 'inverter', 'charger', 'fuse', 'electrics'], family: 'electrics', length: 600, width: 400, elevation: 0, height: 400, massKg: 30, arrangements: ALL, usedFromFront: true },
  heater: { kind: 'heater', title: 'Heater', keywords: ['diesel heater', 'air heater', 'warm'], family: 'appliance', length: 400, width: 200, elevation: 0, height: 200, massKg: 4, arrangements: ALL, usedFromFront: false, props: { watts: 2000 } },
  'toilet-cabinet': { kind: 'toilet-cabinet', title: 'Toilet cabinet', keywords: ['toilet', 'cassette', 'loo', 'wc'], family: 'sanitary', length: 450, width: 450, elevation: 0, height: 500, massKg: 12, arrangements: ALL, usedFromFront: true },
  'shower-tray': { kind: 'shower-tray', title: 'Shower tray', keywords: ['shower', 'wet room', 'tray'], family: 'sanitary', length: 700, width: 700, elevation: 0, height: 60, massKg: 8, arrangements: ALL, usedFromFront: false },
  step: { kind: 'step', title: 'Step', keywords: ['entry step', 'stair'], family: 'timber', length: 400, width: 300, elevation: 0, height: 200, massKg: 4, arrangements: ALL, usedFromFront: false },
};

export const KIND_LIST: KindSpec[] = Object.values(KINDS);

export function kindSpec(kind: ModuleKind): KindSpec {
  return KINDS[kind];
}

/** What a module is called wherever people read about it: its label, else its kind's name. Never its id. */
export function moduleLabel(m: { label?: string; kind: ModuleKind }): string {
  return m.label?.trim() || kindSpec(m.kind).title;
}
