/**
 * Facts about placed modules that build planning reads: mass (the module's own `massKg`
 * overrides its kind's default), plan centre, numeric props with kind defaults, and which
 * modules are travel seats, tanks, gas appliances.
 *
 * Pure: reads a LayoutDoc, returns plain data. Must never import UI, framework or database code.
 */
import { kindSpec } from '../layout/kinds';
import type { LayoutDoc, Module } from '../layout';
import { inArrangement } from '../layout/bay';

export function moduleMassKg(m: Module): number {
  return m.massKg ?? kindSpec(m.kind).massKg;
}

export function moduleCentre(m: Module): { x: number; y: number } {
  return { x: m.x + m.length / 2, y: m.y + m.width / 2 };
}

/** A numeric prop of the module, else its kind's default, else undefined. */
export function numericProp(m: Module, name: string): number | undefined {
  const own = m.props?.[name];
  if (typeof own === 'number' && Number.isFinite(own)) return own;
  const dflt = kindSpec(m.kind).props?.[name];
  return typeof dflt === 'number' && Number.isFinite(dflt) ? dflt : undefined;
}

export function stringProp(m: Module, name: string): string | undefined {
  const own = m.props?.[name];
  return typeof own === 'string' ? own : undefined;
}

export function booleanProp(m: Module, name: string): boolean | undefined {
  const own = m.props?.[name];
  if (typeof own === 'boolean') return own;
  const dflt = kindSpec(m.kind).props?.[name];
  return typeof dflt === 'boolean' ? dflt : undefined;
}

export function modulesOfKind(doc: LayoutDoc, kind: Module['kind']): Module[] {
  return doc.modules.filter((m) => m.kind === kind);
}

/** Travel seats with a belt (kind `seat`, present in the travel arrangement, `belted` not false). */
export function beltedTravelSeats(doc: LayoutDoc): Module[] {
  return doc.modules.filter((m) => m.kind === 'seat' && inArrangement(m, 'travel') && booleanProp(m, 'belted') !== false);
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

/** Litres a tank module holds (`props.litres`, else the kind's default). */
export function tankLitres(m: Module): number {
  return Math.max(0, numericProp(m, 'litres') ?? 0);
}
