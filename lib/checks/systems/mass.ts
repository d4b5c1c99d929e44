/**
 * Weight rules (`mass.*`): laden total against the maximum authorised mass, each axle against its
 * limit, the steering axle's share of the maximum authorised mass, the payload left for users
 * (EN 1646-2 / Reg. (EU) No 1230/2012), the category B licence caution on the maximum authorised
 * mass, and travel-seat anchorage. Numbers come from `computeAxleLoads` in lib/planning; this file
 * only judges them and words the findings.
 *
 * Must never import React, Konva, Next or the database; never throws on a valid LayoutDoc.
 */
import type { LayoutDoc } from '../../layout';
import { kindFacts } from '../../layout/kinds';
import {
  beltedTravelSeats,
  computeAxleLoads,
  INPUTS,
  moduleRef,
  OCCUPANT_KG,
  PAYLOAD_SOURCE,
  personalEffectsAllowance,
  userPayloadRequired,
  type InputNeed,
  type MassReport,
} from '../../planning';
import type { Finding } from '../types';
import { caution, missingInputs, num, round } from './wording';

/**
 * Directive 2006/126/EC Art. 4(4)(b): category B covers motor vehicles with a maximum authorised
 * mass of up to 3500 kg (from memory). Depends on the maximum authorised mass only: a van laden
 * above its plate is overloaded (`mass.total` fails), not a licence matter.
 */
export const CATEGORY_B_LIMIT_KG = 3500;
export const LICENCE_SOURCE = 'Directive 2006/126/EC Art. 4(4)(b): category B up to 3500 kg maximum authorised mass (from memory)';
/**
 * Laden to its maximum, the mass on the front steering axle must be at least 20 % of the
 * technically permissible maximum laden mass: Reg. (EU) No 1230/2012 Annex I Part A point 2.4
 * (secondary: the sentence as reproduced in published translations of the regulation; point
 * number from its contents).
 */
export const MIN_FRONT_SHARE = 0.2;
export const FRONT_SHARE_SOURCE = 'Reg. (EU) No 1230/2012 Annex I Part A point 2.4: the front steering axle carries at least 20 % of the technically permissible maximum laden mass (secondary: text as reproduced in published translations)';

const WEIGHT_SOURCE = 'Maximum masses from the vehicle plate or certificate of conformity (Reg. (EU) No 1230/2012)';
const LEVER_SOURCE = `${WEIGHT_SOURCE}; lever rule — moments about the front axle (statics)`;

/** kg with a decimal only where there is one: 80 kg, 89.9 kg. */
function kgNum(n: number): string {
  return num(n, Math.abs(n - Math.round(n)) < 0.05 ? 0 : 1);
}

function cap(s: string): string {
  return s.charAt(0).toUpperCase() + s.slice(1);
}

function passengers(n: number): string {
  return `${n} ${n === 1 ? 'passenger' : 'passengers'}`;
}

function breakdown(r: MassReport): string {
  const groups: [string, string][] = [
    ['vehicle', 'vehicle in running order'],
    ['module', 'modules'],
    ['water', 'water'],
    ['gas', 'gas cylinders'],
    ['occupant', 'passengers'],
    ['effects', 'personal effects'],
    ['payload', 'other payload'],
  ];
  return groups
    .map(([g, label]) => [label, r.items.filter((i) => i.group === g).reduce((a, i) => a + i.massKg, 0)] as const)
    .filter(([, kg]) => kg > 0)
    .map(([label, kg]) => `${label} ${num(kg)} kg`)
    .join(', ');
}

/** Items behind the rear axle or ahead of the front one, heaviest lever first, for a tipping message. */
function farthestItems(r: MassReport, frontAxleX: number, wheelbase: number): string {
  const out = r.items
    .map((i) => ({ i, beyond: Math.max(i.x - (frontAxleX + wheelbase), frontAxleX - i.x) }))
    .filter((e) => e.beyond > 0)
    .sort((a, b) => b.i.massKg * b.beyond - a.i.massKg * a.beyond)
    .slice(0, 3)
    .map((e) => `${e.i.label.toLowerCase()} (${num(e.i.massKg)} kg, ${num(e.beyond)} mm beyond the axle)`);
  return out.length ? out.join(', ') : 'the positions entered';
}

export function massChecks(doc: LayoutDoc): Finding[] {
  const v = doc.systems?.vehicle ?? {};
  const r = computeAxleLoads(doc);
  const out: Finding[] = [];
  const needs: InputNeed[] = [...r.missing];
  if (v.maxAuthorisedMassKg === undefined) needs.push(INPUTS.maxAuthorisedMass);
  if (v.maxFrontAxleKg === undefined) needs.push(INPUTS.maxFrontAxle);
  if (v.maxRearAxleKg === undefined) needs.push(INPUTS.maxRearAxle);
  if (v.overallLengthMm === undefined && !needs.includes(INPUTS.overallLength)) needs.push(INPUTS.overallLength);
  const ordered = Object.values(INPUTS).filter((n) => needs.includes(n));
  if (ordered.length) out.push(missingInputs('mass.input', 'Weight and axle loads', ordered, 8, 'Vehicle data from the plate, the certificate of conformity or a weighbridge ticket'));
  for (const conflict of r.conflicts) {
    out.push({ id: 'mass.input', status: 'warn', measured: 0, required: 1, unit: 'inputs in range', message: `The weight inputs contradict each other: ${conflict}. Correct them on the weight tab; until then the figures below are not to be trusted.`, source: 'Vehicle data from the plate, the certificate of conformity or a weighbridge ticket' });
  }
  if (v.overallLengthMm !== undefined && doc.bay.length > v.overallLengthMm) {
    out.push({ id: 'mass.input', status: 'warn', measured: doc.bay.length, required: v.overallLengthMm, unit: 'mm', message: `The bay is drawn ${num(doc.bay.length)} mm long, longer than the whole vehicle (${num(v.overallLengthMm)} mm overall): one of the two is out of range, so the axle loads below cannot be trusted. Correct the bay length in the editor or the overall length on the weight tab.`, source: 'Layout geometry against the vehicle data (no outside source)' });
  }
  const assumed = r.assumptions.length ? ` Assumed: ${r.assumptions.join('; ')}.` : '';

  if (v.massInRunningOrderKg !== undefined && v.maxAuthorisedMassKg !== undefined) {
    const spare = v.maxAuthorisedMassKg - r.totalKg;
    out.push({
      id: 'mass.total',
      status: spare < 0 ? 'fail' : 'pass',
      measured: round(r.totalKg, 1),
      required: v.maxAuthorisedMassKg,
      unit: 'kg',
      message: `Laden mass ${num(r.totalKg)} kg against a maximum authorised mass of ${num(v.maxAuthorisedMassKg)} kg (${spare < 0 ? `${num(-spare)} kg over: the van is overloaded` : `${num(spare)} kg to spare`}); counted: ${breakdown(r)}.${assumed}`,
      source: WEIGHT_SOURCE,
    });
  }

  if (r.axles && v.frontAxleX !== undefined && v.wheelbaseMm !== undefined) {
    const tipping = r.axles.frontKg < 0 ? 'front' : r.axles.rearKg < 0 ? 'rear' : null;
    if (tipping) {
      // A negative axle load is not a load at all: the van would tip about the other axle. Say
      // the input is out of range instead of printing an impossible figure as a result.
      out.push({
        id: tipping === 'front' ? 'mass.front-axle' : 'mass.rear-axle',
        status: 'fail',
        measured: round(tipping === 'front' ? r.axles.frontKg : r.axles.rearKg, 1),
        required: 0,
        unit: 'kg',
        message: `The inputs put ${num(Math.abs(tipping === 'front' ? r.axles.frontKg : r.axles.rearKg))} kg of lift on the ${tipping} axle, which is not physically possible: the van would tip about the ${tipping === 'front' ? 'rear' : 'front'} axle. An input is out of range — check ${farthestItems(r, v.frontAxleX, v.wheelbaseMm)}, the wheelbase and the front axle position.`,
        source: LEVER_SOURCE,
      });
    }
    const axles = [
      { id: 'mass.front-axle', name: 'Front axle', kg: r.axles.frontKg, max: v.maxFrontAxleKg },
      { id: 'mass.rear-axle', name: 'Rear axle', kg: r.axles.rearKg, max: v.maxRearAxleKg },
    ];
    for (const a of axles) {
      if (a.max === undefined || a.kg < 0) continue; // missing: named in mass.input; negative: said above
      const spare = a.max - a.kg;
      out.push({
        id: a.id,
        status: spare < 0 ? 'fail' : 'pass',
        measured: round(a.kg, 1),
        required: a.max,
        unit: 'kg',
        message: `${a.name} carries ${num(a.kg)} kg laden against its ${num(a.max)} kg limit (${spare < 0 ? `${num(-spare)} kg over` : `${num(spare)} kg to spare`}), by moments about the front axle; centre of mass ${num(r.centreOfMass?.x ?? 0)} mm from the front of the load floor.`,
        source: LEVER_SOURCE,
      });
    }
    const mam = v.maxAuthorisedMassKg;
    if (mam !== undefined && mam > 0 && !tipping) {
      const share = r.axles.frontKg / mam;
      const ok = share >= MIN_FRONT_SHARE;
      out.push({
        id: 'mass.front-axle',
        status: ok ? 'pass' : 'warn',
        measured: round(share * 100, 1),
        required: MIN_FRONT_SHARE * 100,
        unit: '% of the maximum authorised mass',
        message: `The steering axle carries ${num(r.axles.frontKg)} kg, ${num(share * 100, 1)} % of the ${num(mam)} kg maximum authorised mass; at least ${num(MIN_FRONT_SHARE * 100)} % (${num(MIN_FRONT_SHARE * mam)} kg) is needed for steering and braking${ok ? '.' : ': loads far back are lifting the front. Move heavy items forward of the rear axle.'}`,
        source: FRONT_SHARE_SOURCE,
      });
    }
  }

  if (v.massInRunningOrderKg !== undefined && v.maxAuthorisedMassKg !== undefined && r.lengthM !== null) {
    const available = v.maxAuthorisedMassKg - r.builtKg;
    const need = userPayloadRequired(r.seats, r.lengthM);
    const effects = personalEffectsAllowance(r.seats, r.lengthM);
    out.push({
      id: 'mass.payload',
      status: available < need ? 'fail' : 'pass',
      measured: round(available, 1),
      required: round(need, 1),
      unit: 'kg',
      message: `User payload left: ${num(available)} kg (maximum authorised mass less the van as built, ${num(r.builtKg)} kg). Needed for ${r.seats} ${r.seats === 1 ? 'person' : 'persons'} and ${num(r.lengthM, 2)} m overall: ${passengers(r.seats - 1)} at ${OCCUPANT_KG} kg (the driver is in the mass in running order) plus personal effects of 10 kg × ${r.seats} + 10 kg × ${num(r.lengthM, 2)} = ${kgNum(effects)} kg, so ${kgNum(need)} kg${available < need ? `: ${kgNum(need - available)} kg short` : ''}.`,
      source: PAYLOAD_SOURCE,
    });
  }

  const mam = v.maxAuthorisedMassKg;
  if (mam !== undefined && mam > CATEGORY_B_LIMIT_KG) {
    out.push({
      id: 'mass.licence',
      status: 'warn',
      measured: mam,
      required: CATEGORY_B_LIMIT_KG,
      unit: 'kg',
      message: `The maximum authorised mass is ${num(mam)} kg, above ${num(CATEGORY_B_LIMIT_KG)} kg: a category B driving licence does not cover it (category C1 is needed, or a van downplated to ${num(CATEGORY_B_LIMIT_KG)} kg). Check your own licence and local rules.`,
      source: LICENCE_SOURCE,
    });
  }

  for (const seat of beltedTravelSeats(doc)) {
    const fitting = kindFacts(seat).seat;
    const approved = fitting?.approvedType ? true : undefined;
    const anchored = fitting?.anchorageTested ? true : undefined;
    out.push(caution(
      'mass.seat-anchorage',
      [
        { done: approved, text: 'seat and belt of an approved type', field: { label: 'Seat and belt of an approved type', where: 'editor' } },
        { done: anchored, text: 'anchorages fitted to the seat maker\'s kit or tested for the van', field: { label: 'Anchorages fitted to the maker’s kit or tested', where: 'editor' } },
      ],
      `${cap(moduleRef(seat))} is a travel seat: seat, belt and anchorages must be of an approved type and anchored to the structure as tested — a home-made mounting can tear out in a crash. Have the installation inspected under local rules.`,
      'UN ECE Regulations No. 14 (belt anchorages), No. 16 (belts), No. 17 (seats) (from memory)',
      [seat.id],
    ));
  }
  return out;
}
