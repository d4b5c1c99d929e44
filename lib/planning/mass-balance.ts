/**
 * The mass-and-balance table a workshop checks against the weighbridge: per axle, the vehicle in
 * running order, each module group (by kind), the people, the water and gas at their chosen fill,
 * personal effects and each free payload item, then the laden total, the limits and what is left.
 * Rows are sums of `computeAxleLoads` items, so the table's totals are the rules' totals.
 *
 * `massBalance(doc)` → `MassBalance` (the weight tab and the plan sheet draw it). Pure; never
 * throws on a valid LayoutDoc. Must never import UI, framework or database code.
 */
import { kindSpec, type LayoutDoc, type ModuleKind } from '../layout';
import { computeAxleLoads, type MassItem, type MassReport } from './axle-loads';
import { OCCUPANT_KG } from './payload';

export interface MassBalanceRow {
  label: string;
  kg: number;
  /** Per axle; null when the axle geometry is not known. */
  frontKg: number | null;
  rearKg: number | null;
}

export interface MassBalance {
  rows: MassBalanceRow[];
  total: MassBalanceRow;
  /** The plate's limits (null where not entered). */
  limits: { kg: number | null; frontKg: number | null; rearKg: number | null };
  /** Limit less load, per column (null where either is unknown); negative = over. */
  left: { kg: number | null; frontKg: number | null; rearKg: number | null };
  /** Laden centre of mass in bay coordinates, mm (null without the axle geometry). */
  centreOfMass: { x: number; y: number } | null;
  /** True when every row is split between the axles. */
  split: boolean;
  report: MassReport;
}

function row(label: string, items: MassItem[], split: boolean): MassBalanceRow {
  const add = (f: (i: MassItem) => number) => items.reduce((a, i) => a + f(i), 0);
  return { label, kg: add((i) => i.massKg), frontKg: split ? add((i) => i.frontKg ?? 0) : null, rearKg: split ? add((i) => i.rearKg ?? 0) : null };
}

export function massBalance(doc: LayoutDoc): MassBalance {
  const report = computeAxleLoads(doc);
  const split = report.axles !== null;
  const load = doc.systems?.load ?? {};
  const v = doc.systems?.vehicle ?? {};
  const byGroup = (g: MassItem['group']) => report.items.filter((i) => i.group === g);
  const rows: MassBalanceRow[] = [];

  const vehicle = byGroup('vehicle');
  if (vehicle.length) rows.push(row('Vehicle in running order (driver included)', vehicle, split));

  const kindOf = new Map(doc.modules.map((m) => [m.id, m.kind] as const));
  const byKind = new Map<ModuleKind, MassItem[]>();
  for (const i of byGroup('module')) {
    const kind = kindOf.get(i.moduleId!)!;
    byKind.set(kind, [...(byKind.get(kind) ?? []), i]);
  }
  for (const [kind, items] of byKind) rows.push(row(`${kindSpec(kind).title}${items.length > 1 ? ` × ${items.length}` : ''}`, items, split));

  const people = byGroup('occupant');
  if (people.length) rows.push(row(`Passengers, ${people.length} × ${OCCUPANT_KG} kg`, people, split));
  const water = byGroup('water');
  if (water.length) rows.push(row(`Water (fresh ${load.freshFillPct ?? 100} % full, grey ${load.greyFillPct ?? 0} %)`, water, split));
  const gas = byGroup('gas');
  if (gas.length) rows.push(row('Gas cylinders, full', gas, split));
  const effects = byGroup('effects');
  if (effects.length) rows.push(row('Personal effects', effects, split));
  for (const p of byGroup('payload')) rows.push(row(p.label, [p], split));

  const total = row('Laden', report.items, split);
  const limits = { kg: v.maxAuthorisedMassKg ?? null, frontKg: v.maxFrontAxleKg ?? null, rearKg: v.maxRearAxleKg ?? null };
  const less = (limit: number | null, load: number | null) => (limit === null || load === null ? null : limit - load);
  const laden = v.massInRunningOrderKg !== undefined ? total.kg : null;
  return {
    rows,
    total,
    limits,
    left: { kg: less(limits.kg, laden), frontKg: less(limits.frontKg, total.frontKg), rearKg: less(limits.rearKg, total.rearKg) },
    centreOfMass: report.centreOfMass,
    split,
    report,
  };
}
