/**
 * Facts about placed modules that build planning reads: mass (the module's own `massKg`
 * overrides its kind's default), plan centre, the kind's facts from its typed values (declared
 * with the kind in lib/layout/kinds.ts), and which modules are travel seats.
 *
 * Pure: reads a LayoutDoc, returns plain data. Must never import UI, framework or database code.
 */
import { kindFacts, kindSpec, type KindFacts } from '../layout/kinds';
import { inArrangement } from '../layout/bay';
import { TANK_WALL_MM } from '../layout/tank';
import type { LayoutDoc, Module } from '../layout';

export function moduleMassKg(m: Module): number {
  return m.massKg ?? kindSpec(m.kind).massKg;
}

export function moduleCentre(m: Module): { x: number; y: number } {
  return { x: m.x + m.length / 2, y: m.y + m.width / 2 };
}

/** What the module's kind and values mean to planning (its own values, else its kind's defaults). */
export function moduleFacts(m: Module): KindFacts {
  return kindFacts(m);
}

/** The water tanks of one use (fresh or grey), in document order. */
export function waterTanks(doc: LayoutDoc, use: 'fresh' | 'grey'): Module[] {
  return doc.modules.filter((m) => moduleFacts(m).water?.use === use);
}

/** Travel seats with a belt (kind `seat`, present in the travel arrangement, `belted` not false). */
export function beltedTravelSeats(doc: LayoutDoc): Module[] {
  return doc.modules.filter((m) => m.kind === 'seat' && inArrangement(m, 'travel') && moduleFacts(m).seat?.belted !== false);
}

/** Name for messages and tables: the module's label, else its kind's name — never its id. */
export function moduleName(m: Pick<Module, 'kind' | 'label'>): string {
  return m.label?.trim() || kindSpec(m.kind).title;
}

/** A module mid-sentence: “its label” in quotes, else "the" and its kind's name in lower case. */
export function moduleRef(m: Pick<Module, 'kind' | 'label'>): string {
  const label = m.label?.trim();
  return label ? `“${label}”` : `the ${kindSpec(m.kind).title.toLowerCase()}`;
}

/** Litres a tank module holds: its typed capacity, else its drawn inside volume (lib/layout/tank.ts). */
export function tankLitres(m: Module): number {
  return moduleFacts(m).water?.litres ?? 0;
}

/** Where a tank's litres come from, in words for figures and tables. */
export function tankBasisWords(basis: 'typed' | 'drawn'): string {
  return basis === 'typed' ? 'capacity as typed' : `from its drawn size, less a ${TANK_WALL_MM} mm wall`;
}
