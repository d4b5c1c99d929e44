/**
 * Water rules (`water.*`): fresh capacity and days of use, and a grey tank no smaller than the
 * fresh tank — the NZS 5465 self-containment rules (4 L per person per day for 3 days; as cited in
 * the brief, secondary). A self-containment certificate is a New Zealand matter; elsewhere these
 * are good practice, hence `warn` rather than `fail`. No tank modules → no water findings.
 *
 * Must never import React, Konva, Next or the database; never throws on a valid LayoutDoc.
 */
import type { LayoutDoc } from '../../layout';
import { NZS5465_DAYS, NZS5465_L_PER_PERSON_DAY, waterPlan } from '../../planning';
import type { Finding } from '../types';
import { num, round } from './wording';

const NZS = 'NZS 5465 (self-contained vehicles; as cited in the brief, secondary)';

export function waterChecks(doc: LayoutDoc): Finding[] {
  const w = waterPlan(doc);
  if (w.freshTankIds.length === 0 && w.greyTankIds.length === 0) return [];
  const out: Finding[] = [];
  out.push({
    id: 'water.fresh',
    status: w.freshL >= w.nzsMinimumL ? 'pass' : 'warn',
    measured: w.freshL,
    required: w.nzsMinimumL,
    unit: 'L',
    moduleIds: w.freshTankIds,
    message: `Fresh water ${num(w.freshL)} L (${num(w.freshFullKg)} kg when full) for ${w.persons} ${w.persons === 1 ? 'person' : 'people'}; the self-containment minimum is ${NZS5465_L_PER_PERSON_DAY} L per person per day for ${NZS5465_DAYS} days = ${num(w.nzsMinimumL)} L.`,
    source: NZS,
  });
  if (w.days !== null) {
    out.push({
      id: 'water.days',
      status: w.days >= NZS5465_DAYS ? 'pass' : 'warn',
      measured: round(w.days, 2),
      required: NZS5465_DAYS,
      unit: 'days',
      moduleIds: w.freshTankIds,
      message: `At ${num(w.litresPerPersonPerDay, 1)} L per person per day (systems.water.litresPerPersonPerDay) the fresh water lasts ${num(w.days, 1)} days for ${w.persons}; ${NZS5465_DAYS} days wanted between fills.`,
      source: `${NZS}; use per person: entered, or 10 L common practice, no source`,
    });
  }
  out.push({
    id: 'water.grey',
    status: w.greyL >= w.freshL && w.greyL > 0 ? 'pass' : 'warn',
    measured: w.greyL,
    required: w.freshL,
    unit: 'L',
    moduleIds: [...w.greyTankIds, ...w.freshTankIds],
    message: w.greyL === 0
      ? `No grey water tank: ${num(w.freshL)} L of fresh water has nowhere to go but the ground. A self-contained van holds its grey water in a tank at least as large as the fresh tank.`
      : `Grey tank ${num(w.greyL)} L against ${num(w.freshL)} L fresh: ${w.greyL >= w.freshL ? 'large enough to hold all the fresh water used.' : 'smaller than the fresh tank, so it fills before the fresh water runs out.'}`,
    source: NZS,
  });
  return out;
}
