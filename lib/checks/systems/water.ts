/**
 * Water rules (`water.*`), on two bases that are never mixed:
 * - `water.fresh` and `water.grey`: the NZS 5465 self-containment rules, always worked at their
 *   own 4 L per person per day for 3 days, and a grey tank no smaller than the fresh tank
 *   (secondary). A self-containment certificate is a New Zealand matter; elsewhere these are good
 *   practice, hence `warn` rather than `fail`.
 * - `water.days`: a comfort estimate at the use entered on the water tab (or 10 L per person per
 *   day), against 3 days between fills — common practice, no source, and it says so.
 * - `water.capacity`: a tank's typed capacity larger than its drawn inside volume (outside size less
 *   a 5 mm wall on every face, common practice, no source; times its fill fraction) cannot be
 *   right: fail, naming the tank. One finding per tank with a typed capacity.
 * Every total says whether it came from typed capacities or drawn sizes. No tank modules → no water findings.
 *
 * Must never import React, Konva, Next or the database; never throws on a valid LayoutDoc.
 */
import type { LayoutDoc } from '../../layout';
import { COMFORT_DAYS_BETWEEN_FILLS, DEFAULT_L_PER_PERSON_DAY, moduleRef, NZS5465_DAYS, NZS5465_L_PER_PERSON_DAY, NZS5465_SOURCE, waterBasisWords, waterPlan } from '../../planning';
import { TANK_WALL_MM } from '../../layout/tank';
import type { Finding } from '../types';
import { num, round } from './wording';

export function waterChecks(doc: LayoutDoc): Finding[] {
  const w = waterPlan(doc);
  if (w.freshTankIds.length === 0 && w.greyTankIds.length === 0) return [];
  const out: Finding[] = [];
  const people = `${w.persons} ${w.persons === 1 ? 'person' : 'people'}`;
  out.push({
    id: 'water.fresh',
    status: w.freshL >= w.nzsMinimumL ? 'pass' : 'warn',
    measured: w.freshL,
    required: w.nzsMinimumL,
    unit: 'L',
    moduleIds: w.freshTankIds,
    message: `Fresh water ${num(w.freshL, 1)} L (${waterBasisWords(w.freshBasis)}; ${num(w.freshFullKg, 1)} kg when full) for ${people}. The self-containment rule counts ${NZS5465_L_PER_PERSON_DAY} L per person per day for ${NZS5465_DAYS} days, whatever the use entered: ${num(w.nzsMinimumL)} L${w.freshL >= w.nzsMinimumL ? ', met.' : `, ${num(w.nzsMinimumL - w.freshL)} L short.`}`,
    source: NZS5465_SOURCE,
  });
  if (w.days !== null) {
    const basis = w.useEntered ? `the ${num(w.litresPerPersonPerDay, 1)} L per person per day entered on the water tab` : `${num(DEFAULT_L_PER_PERSON_DAY)} L per person per day (no use entered; common practice, no source)`;
    out.push({
      id: 'water.days',
      status: w.days >= COMFORT_DAYS_BETWEEN_FILLS ? 'pass' : 'warn',
      measured: round(w.days, 2),
      required: COMFORT_DAYS_BETWEEN_FILLS,
      unit: 'days',
      moduleIds: w.freshTankIds,
      message: `Comfort estimate, not the self-containment rule: at ${basis}, ${num(w.freshL)} L lasts ${people} ${num(w.days, 1)} days; ${COMFORT_DAYS_BETWEEN_FILLS} days between fills is the aim.`,
      source: `Days between fills: common practice, no source; use per person: ${w.useEntered ? 'as entered' : 'common practice, no source'}`,
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
      : `Grey tank ${num(w.greyL, 1)} L (${waterBasisWords(w.greyBasis)}) against ${num(w.freshL, 1)} L fresh: ${w.greyL >= w.freshL ? 'large enough to hold all the fresh water used.' : 'smaller than the fresh tank, so it fills before the fresh water runs out.'}`,
    source: NZS5465_SOURCE,
  });
  const byId = new Map(doc.modules.map((m) => [m.id, m]));
  for (const t of w.tanks) {
    if (t.basis !== 'typed') continue;
    const m = byId.get(t.id)!;
    // Compared to the tenth of a litre the figures are shown in.
    const over = round(t.litres, 1) > round(t.drawnLitres, 1);
    out.push({
      id: 'water.capacity',
      status: over ? 'fail' : 'pass',
      measured: round(t.litres, 1),
      required: round(t.drawnLitres, 1),
      unit: 'L',
      moduleIds: [t.id],
      message: `${cap(moduleRef(m))} is typed as ${num(t.litres, 1)} L; drawn ${m.length} × ${m.width} × ${m.height} mm, its inside holds ${num(t.drawnLitres, 1)} L after a ${TANK_WALL_MM} mm wall on every face. ${over ? 'A tank cannot hold more than its inside: draw it at its real size or correct the capacity.' : 'The typed capacity fits inside it.'}`,
      source: `Tank inside volume: outside size less a ${TANK_WALL_MM} mm wall on every face — common practice, no source (moulded tanks have walls of about 4–6 mm)`,
    });
  }
  return out;
}

function cap(s: string): string {
  return s.charAt(0).toUpperCase() + s.slice(1);
}
