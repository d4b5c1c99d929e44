/**
 * Fresh and grey water: tank capacities from the tank modules (typed, else from the drawn size;
 * each figure says which), their mass, and how many days the
 * fresh water lasts at the chosen use per person per day.
 *
 * Two bases, never mixed:
 * - The self-containment rule, NZS 5465 (self-contained motor caravans and caravans; secondary,
 *   as quoted in New Zealand self-containment guidance, standard text not consulted): fresh water
 *   of at least 4 L per person per day for 3 days (12 L per person), and a grey tank no smaller
 *   than the fresh tank. Always worked at 4 L, whatever use is entered.
 * - The comfort estimate: how many days the fresh water lasts at the use entered on the water tab,
 *   or 10 L per person per day when nothing is entered (common practice, no source: drinking,
 *   cooking, washing up and a wash, no shower), against 3 days between fills (common practice,
 *   no source).
 *
 * `waterPlan(doc)` → `WaterPlan` DTO. Pure; never throws on a valid LayoutDoc. Must never import
 * UI, framework or database code.
 */
import type { LayoutDoc } from '../layout';
import { WATER_KG_PER_L } from './axle-loads';
import { TANK_WALL_MM } from '../layout/tank';
import { moduleFacts, tankLitres, waterTanks } from './module-facts';

/** NZS 5465 (secondary): 4 L per person per day, for 3 days. */
export const NZS5465_L_PER_PERSON_DAY = 4;
export const NZS5465_DAYS = 3;
export const NZS5465_SOURCE = 'NZS 5465 (self-contained vehicles): 4 L per person per day for 3 days, grey tank at least the fresh tank (secondary: as quoted in New Zealand self-containment guidance; standard text not consulted)';
/** Use per person per day when none is entered, L — common practice, no source. */
export const DEFAULT_L_PER_PERSON_DAY = 10;
/** Days between fills the comfort estimate aims for — common practice, no source. */
export const COMFORT_DAYS_BETWEEN_FILLS = 3;

/** One tank's litres and where they come from. */
export interface TankLitres {
  id: string;
  use: 'fresh' | 'grey';
  litres: number;
  basis: 'typed' | 'drawn';
  /** What the drawn inside holds (after the wall allowance and fill fraction). */
  drawnLitres: number;
}

export interface WaterPlan {
  tanks: TankLitres[];
  /** How the fresh and grey totals were found: every tank's typed capacity, every tank's drawn size, or some of each. */
  freshBasis: 'typed' | 'drawn' | 'mixed' | 'none';
  greyBasis: 'typed' | 'drawn' | 'mixed' | 'none';
  freshL: number;
  greyL: number;
  freshTankIds: string[];
  greyTankIds: string[];
  persons: number;
  /** Use per person per day for the comfort estimate: entered, or the default. */
  litresPerPersonPerDay: number;
  /** True when the use was entered on the water tab (false: the 10 L default). */
  useEntered: boolean;
  /** Days the fresh water lasts (null when nobody uses it). */
  days: number | null;
  /** Mass of the fresh water when full, kg. */
  freshFullKg: number;
  /** NZS 5465 minimum fresh capacity for these persons, L. */
  nzsMinimumL: number;
}

export function waterPlan(doc: LayoutDoc): WaterPlan {
  const fresh = waterTanks(doc, 'fresh');
  const grey = waterTanks(doc, 'grey');
  const tanks: TankLitres[] = [...fresh, ...grey].map((m) => {
    const w = moduleFacts(m).water!;
    return { id: m.id, use: w.use, litres: w.litres, basis: w.basis, drawnLitres: w.drawnLitres };
  });
  const freshL = fresh.reduce((a, m) => a + tankLitres(m), 0);
  const greyL = grey.reduce((a, m) => a + tankLitres(m), 0);
  const persons = doc.systems?.water?.persons ?? Math.max(1, doc.occupants.sleepers.length);
  const lppd = doc.systems?.water?.litresPerPersonPerDay ?? DEFAULT_L_PER_PERSON_DAY;
  const daily = persons * lppd;
  return {
    tanks,
    freshBasis: basisOf(tanks.filter((t) => t.use === 'fresh')),
    greyBasis: basisOf(tanks.filter((t) => t.use === 'grey')),
    freshL,
    greyL,
    freshTankIds: fresh.map((m) => m.id),
    greyTankIds: grey.map((m) => m.id),
    persons,
    litresPerPersonPerDay: lppd,
    useEntered: doc.systems?.water?.litresPerPersonPerDay !== undefined,
    days: daily > 0 ? freshL / daily : null,
    freshFullKg: freshL * WATER_KG_PER_L,
    nzsMinimumL: persons * NZS5465_L_PER_PERSON_DAY * NZS5465_DAYS,
  };
}

function basisOf(tanks: TankLitres[]): WaterPlan['freshBasis'] {
  if (tanks.length === 0) return 'none';
  if (tanks.every((t) => t.basis === 'typed')) return 'typed';
  if (tanks.every((t) => t.basis === 'drawn')) return 'drawn';
  return 'mixed';
}

/** How a total was found, in words: "from the tanks’ drawn size" and the like. */
export function waterBasisWords(basis: WaterPlan['freshBasis']): string {
  return basis === 'typed' ? 'capacity as typed on the tank' : basis === 'drawn' ? `from the drawn tank size, less a ${TANK_WALL_MM} mm wall` : basis === 'mixed' ? 'typed capacities and drawn sizes' : 'no tank';
}
