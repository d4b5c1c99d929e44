/**
 * Fresh and grey water: tank capacities from the tank modules, their mass, and how many days the
 * fresh water lasts at the chosen use per person per day.
 *
 * NZS 5465 (self-contained motor caravans and caravans), as cited in the brief (secondary): a
 * minimum of 4 L per person per day for 3 days of fresh water (12 L per person), and a grey tank
 * no smaller than the fresh tank. Default use: 10 L per person per day when nothing is entered
 * (common practice, no source: drinking, cooking, washing up and a wash, no shower).
 *
 * `waterPlan(doc)` → `WaterPlan` DTO. Pure; never throws on a valid LayoutDoc. Must never import
 * UI, framework or database code.
 */
import type { LayoutDoc } from '../layout';
import { WATER_KG_PER_L } from './axle-loads';
import { modulesOfKind, tankLitres } from './module-facts';

/** NZS 5465 (as cited): 4 L per person per day, for 3 days. */
export const NZS5465_L_PER_PERSON_DAY = 4;
export const NZS5465_DAYS = 3;
export const DEFAULT_L_PER_PERSON_DAY = 10; // common practice, no source

export interface WaterPlan {
  freshL: number;
  greyL: number;
  freshTankIds: string[];
  greyTankIds: string[];
  persons: number;
  litresPerPersonPerDay: number;
  /** Days the fresh water lasts (null when nobody uses it). */
  days: number | null;
  /** Mass of the fresh water when full, kg. */
  freshFullKg: number;
  /** NZS 5465 minimum fresh capacity for these persons, L. */
  nzsMinimumL: number;
}

export function waterPlan(doc: LayoutDoc): WaterPlan {
  const fresh = modulesOfKind(doc, 'fresh-water-tank');
  const grey = modulesOfKind(doc, 'grey-water-tank');
  const freshL = fresh.reduce((a, m) => a + tankLitres(m), 0);
  const greyL = grey.reduce((a, m) => a + tankLitres(m), 0);
  const persons = doc.systems?.water?.persons ?? Math.max(1, doc.occupants.sleepers.length);
  const lppd = doc.systems?.water?.litresPerPersonPerDay ?? DEFAULT_L_PER_PERSON_DAY;
  const daily = persons * lppd;
  return {
    freshL,
    greyL,
    freshTankIds: fresh.map((m) => m.id),
    greyTankIds: grey.map((m) => m.id),
    persons,
    litresPerPersonPerDay: lppd,
    days: daily > 0 ? freshL / daily : null,
    freshFullKg: freshL * WATER_KG_PER_L,
    nzsMinimumL: persons * NZS5465_L_PER_PERSON_DAY * NZS5465_DAYS,
  };
}
