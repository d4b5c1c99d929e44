/**
 * Weight rules (`mass.*`): laden total against the maximum authorised mass, each axle against its
 * limit, the payload left for users against EN 1646-2 and Reg. (EU) 1230/2012, the category B
 * licence caution above 3500 kg, and travel-seat anchorage. Numbers come from
 * `computeAxleLoads` in lib/planning; this file only judges them and words the findings.
 *
 * Must never import React, Konva, Next or the database; never throws on a valid LayoutDoc.
 */
import type { LayoutDoc } from '../../layout';
import {
  computeAxleLoads,
  en1646UserPayload,
  moduleName,
  reg1230UserPayload,
  beltedTravelSeats,
  type MassReport,
} from '../../planning';
import type { Finding } from '../types';
import { caution, missingInputs, num, round } from './wording';

/** Directive 2006/126/EC Art. 4(4)(b): category B covers vehicles up to 3500 kg maximum authorised mass (from memory). */
export const CATEGORY_B_LIMIT_KG = 3500;
/**
 * A steering axle carrying less than 20 % of the laden mass steers and brakes poorly; the figure
 * is from memory of the type-approval rules (Reg. (EU) 1230/2012 Annex I, as recalled; clause not
 * checked) — treat as common practice.
 */
export const MIN_FRONT_SHARE = 0.2;

const WEIGHT_SOURCE = 'Maximum masses from the vehicle plate / certificate of conformity (Reg. (EU) 1230/2012)';

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

export function massChecks(doc: LayoutDoc): Finding[] {
  const v = doc.systems?.vehicle ?? {};
  const r = computeAxleLoads(doc);
  const out: Finding[] = [];
  const needed = ['massInRunningOrderKg', 'frontAxleRunningOrderKg', 'maxAuthorisedMassKg', 'maxFrontAxleKg', 'maxRearAxleKg', 'wheelbaseMm', 'frontAxleX', 'overallLengthMm'] as const;
  const absent = needed.filter((k) => v[k] === undefined).map((k) => `systems.vehicle.${k}`);
  const extra = r.missing.filter((m) => !absent.some((a) => m.startsWith(a)) && !m.startsWith('systems.vehicle.'));
  const badSplit = r.missing.find((m) => m.includes('more than the whole'));
  if (absent.length || extra.length || badSplit) {
    out.push(missingInputs('mass.input', 'Weight and axle loads', [...absent, ...extra, ...(badSplit ? [badSplit] : [])], needed.length, 'EN 1646-2 and Reg. (EU) 1230/2012 need the vehicle data (as cited)'));
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
      message: `Laden mass ${num(r.totalKg)} kg against a maximum authorised mass of ${num(v.maxAuthorisedMassKg)} kg (${spare < 0 ? `${num(-spare)} kg over` : `${num(spare)} kg to spare`}); counted: ${breakdown(r)}.${assumed}`,
      source: WEIGHT_SOURCE,
    });
  }

  if (r.axles) {
    const axles = [
      { id: 'mass.front-axle', name: 'Front axle', kg: r.axles.frontKg, max: v.maxFrontAxleKg, field: 'maxFrontAxleKg' },
      { id: 'mass.rear-axle', name: 'Rear axle', kg: r.axles.rearKg, max: v.maxRearAxleKg, field: 'maxRearAxleKg' },
    ];
    for (const a of axles) {
      if (a.max === undefined) continue; // named in mass.input
      const spare = a.max - a.kg;
      out.push({
        id: a.id,
        status: spare < 0 ? 'fail' : 'pass',
        measured: round(a.kg, 1),
        required: a.max,
        unit: 'kg',
        message: `${a.name} carries ${num(a.kg)} kg laden against its ${num(a.max)} kg limit (${spare < 0 ? `${num(-spare)} kg over` : `${num(spare)} kg to spare`}), by moments about the front axle; centre of mass ${num(r.centreOfMass?.x ?? 0)} mm from the front of the bay.`,
        source: `${WEIGHT_SOURCE}; lever rule (statics)`,
      });
    }
    const share = r.totalKg > 0 ? r.axles.frontKg / r.totalKg : 1;
    if (share < MIN_FRONT_SHARE) {
      out.push({
        id: 'mass.front-axle',
        status: 'warn',
        measured: round(share * 100, 1),
        required: MIN_FRONT_SHARE * 100,
        unit: '% of laden mass',
        message: `The front axle carries only ${num(share * 100, 1)} % of the laden mass (at least ${MIN_FRONT_SHARE * 100} % wanted): loads behind the rear axle are lifting the steering axle. Move heavy items forward.`,
        source: 'From memory of Reg. (EU) 1230/2012 Annex I (steering axle share; clause not checked) — treat as common practice',
      });
    }
  }

  if (v.massInRunningOrderKg !== undefined && v.maxAuthorisedMassKg !== undefined && r.lengthM !== null) {
    const available = v.maxAuthorisedMassKg - r.builtKg;
    const en = en1646UserPayload(r.seats, r.lengthM);
    out.push({
      id: 'mass.payload',
      status: available < en ? 'fail' : 'pass',
      measured: round(available, 1),
      required: round(en, 1),
      unit: 'kg',
      message: `User payload left: ${num(available)} kg (maximum authorised mass less the van as built, ${num(r.builtKg)} kg). EN 1646-2 needs ${num(en)} kg for ${r.seats} seats and ${num(r.lengthM, 2)} m: ${passengers(r.seats - 1)} at 75 kg plus personal effects 10 × ${r.seats} + 10 × ${num(r.lengthM, 2)} + 30 = ${num(en - 75 * (r.seats - 1))} kg.`,
      source: 'EN 1646-2 (user payload of motor caravans; as cited, clause not checked)',
    });
    const reg = reg1230UserPayload(r.seats, r.lengthM);
    out.push({
      id: 'mass.payload',
      status: available < reg ? 'fail' : 'pass',
      measured: round(available, 1),
      required: round(reg, 1),
      unit: 'kg',
      message: `User payload left: ${num(available)} kg. Reg. (EU) 1230/2012 asks motor caravans for ${passengers(r.seats - 1)} at 75 kg plus 10 × (${r.seats} persons + ${num(r.lengthM, 2)} m) = ${num(reg - 75 * (r.seats - 1))} kg, ${num(reg)} kg in all.`,
      source: 'Reg. (EU) 1230/2012, minimum payload of motor caravans (as cited; read as on top of passengers, from memory)',
    });
  }

  const mam = v.maxAuthorisedMassKg;
  const overLicence = (mam !== undefined && mam > CATEGORY_B_LIMIT_KG) || (v.massInRunningOrderKg !== undefined && r.totalKg > CATEGORY_B_LIMIT_KG);
  if (overLicence) {
    const measured = Math.max(mam ?? 0, r.totalKg);
    out.push({
      id: 'mass.licence',
      status: 'warn',
      measured: round(measured, 1),
      required: CATEGORY_B_LIMIT_KG,
      unit: 'kg',
      message: `${mam !== undefined && mam > CATEGORY_B_LIMIT_KG ? `The maximum authorised mass is ${num(mam)} kg` : `The laden mass reaches ${num(r.totalKg)} kg`}, above 3,500 kg: a category B licence does not cover it (C1 needed, or a downplated van kept under 3,500 kg). Check your own licence and local rules.`,
      source: 'Directive 2006/126/EC Art. 4 (category B up to 3500 kg; from memory)',
    });
  }

  for (const seat of beltedTravelSeats(doc)) {
    const approved = seat.props?.approved === true ? true : undefined;
    const anchored = seat.props?.anchorageTested === true ? true : undefined;
    out.push(caution(
      'mass.seat-anchorage',
      [
        { done: approved, text: 'seat and belt of an approved type', field: `modules.${seat.id}.props.approved` },
        { done: anchored, text: 'anchorages fitted to the seat maker\'s kit or tested for the van', field: `modules.${seat.id}.props.anchorageTested` },
      ],
      `${moduleName(seat)} is a travel seat: seat, belt and anchorages must be of an approved type and anchored to the structure as tested — a home-made mounting can tear out in a crash. Have the installation inspected under local rules.`,
      'UN ECE Regulations No. 14 (belt anchorages), No. 16 (belts), No. 17 (seats) (from memory)',
      [seat.id],
    ));
  }
  return out;
}
