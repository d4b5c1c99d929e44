/**
 * Gas and ventilation rules (`gas.*`): the gas caution when gas is aboard, the gas locker (sealed
 * from the living space, low drop-out vent of max(2 % of floor, 100 cm²), cylinders secured), and
 * fixed safety ventilation of the living space (EN 721). Numbers from lib/planning
 * `gasInventory`, `lockerVentRequiredCm2`, `en721Ventilation`, which name their sources.
 *
 * Must never import React, Konva, Next or the database; never throws on a valid LayoutDoc.
 */
import type { LayoutDoc } from '../../layout';
import { EN721_MAX_FLOOR_M2, EN721_SOURCE, en721Ventilation, gasInventory, INPUTS, LOCKER_SOURCE, LOCKER_VENT_FLOOR_FRACTION, LOCKER_VENT_MIN_CM2, lockerVentRequiredCm2, LOW_VENT_MAX_HEIGHT_MM, moduleRef } from '../../planning';
import type { Finding } from '../types';
import { caution, missingInputs, num, round } from './wording';

const EN721 = EN721_SOURCE;

function cap(s: string): string {
  return s.charAt(0).toUpperCase() + s.slice(1);
}

export function gasChecks(doc: LayoutDoc): Finding[] {
  const gas = doc.systems?.gas ?? {};
  const inv = gasInventory(doc);
  const out: Finding[] = [];

  if (inv.present) {
    out.push(caution(
      'gas.caution',
      [
        { done: gas.installerCertified, text: 'installed and tightness-tested by a qualified gas engineer, with a certificate', field: { label: 'Installed and tightness-tested by a qualified gas engineer, with a certificate', where: 'gas' } },
        { done: doc.systems?.alarms?.co, text: 'carbon-monoxide alarm in the living space', field: { label: 'Carbon-monoxide alarm fitted', where: 'gas' } },
        { done: doc.systems?.alarms?.lpg, text: 'LPG alarm near the floor', field: { label: 'LPG alarm fitted near the floor', where: 'gas' } },
      ],
      `Gas is aboard (${[...inv.appliances.map((a) => doc.modules.find((m) => m.id === a.moduleId)!), ...inv.lockers].map(moduleRef).join(', ')}): the installation must be installed and tested by a qualified gas engineer under local codes (EN 1949 in Europe), with a carbon-monoxide alarm and an LPG alarm. Never sleep with a flueless appliance burning.`,
      'EN 1949 (LPG installations in leisure accommodation vehicles); local gas-safety law',
      [...inv.appliances.map((a) => a.moduleId), ...inv.lockers.map((l) => l.id)],
    ));
    if (inv.appliances.length > 0 && inv.lockers.length === 0) {
      out.push({
        id: 'gas.locker',
        status: 'warn',
        measured: 0,
        required: 1,
        unit: 'gas lockers',
        moduleIds: inv.appliances.map((a) => a.moduleId),
        message: `Gas appliances are drawn (${inv.appliances.map((a) => a.name).join(', ')}) but no gas locker: cylinders belong in a locker sealed from the living space with a drop-out vent. Add a gas locker from the Parts shelf (or fit an underslung tank outside the body).`,
        source: LOCKER_SOURCE,
      });
    }
  }

  for (const l of inv.lockers) {
    const lk = gas.locker ?? {};
    const ids = [l.id];
    const name = moduleRef(l);
    if (lk.sealed === undefined) out.push({ ...missingInputs('gas.locker-sealed', `The sealing of ${name}`, [INPUTS.lockerSealed], 1, LOCKER_SOURCE), moduleIds: ids });
    else out.push({
      id: 'gas.locker-sealed',
      status: lk.sealed ? 'pass' : 'fail',
      measured: lk.sealed ? 1 : 0,
      required: 1,
      unit: 'sealed lockers',
      moduleIds: ids,
      message: lk.sealed
        ? `${cap(name)} is sealed from the living space and opens only to the outside.`
        : `${cap(name)} is not sealed from the living space: leaking gas, heavier than air, would pool inside. Seal every seam and pipe entry so it opens only to the outside.`,
      source: LOCKER_SOURCE,
    });

    const floorCm2 = (l.length * l.width) / 100;
    const needCm2 = lockerVentRequiredCm2(floorCm2);
    if (lk.ventAreaCm2 === undefined || lk.ventAtFloor === undefined) {
      const needs = [...(lk.ventAreaCm2 === undefined ? [INPUTS.lockerVentArea] : []), ...(lk.ventAtFloor === undefined ? [INPUTS.lockerVentAtFloor] : [])];
      out.push({ ...missingInputs('gas.locker-vent', `The drop-out vent of ${name} (${num(needCm2)} cm² wanted at the floor)`, needs, 2, LOCKER_SOURCE), moduleIds: ids });
    } else {
      const ok = lk.ventAreaCm2 >= needCm2 && lk.ventAtFloor;
      out.push({
        id: 'gas.locker-vent',
        status: ok ? 'pass' : 'fail',
        measured: lk.ventAreaCm2,
        required: round(needCm2, 1),
        unit: 'cm²',
        moduleIds: ids,
        message: `${cap(name)}: drop-out vent ${num(lk.ventAreaCm2)} cm²${lk.ventAtFloor ? ', at the floor' : ', but not at the floor'}; needed at least ${num(LOCKER_VENT_FLOOR_FRACTION * 100)} % of the ${num(floorCm2)} cm² locker floor and at least ${num(LOCKER_VENT_MIN_CM2)} cm², so ${num(needCm2)} cm², at the lowest point, to outside.`,
        source: LOCKER_SOURCE,
      });
    }

    if (inv.cylinders > 0) {
      if (lk.cylindersSecured === undefined) out.push({ ...missingInputs('gas.cylinders-secured', `The cylinder restraint in ${name}`, [INPUTS.cylindersSecured], 1, LOCKER_SOURCE), moduleIds: ids });
      else out.push({
        id: 'gas.cylinders-secured',
        status: lk.cylindersSecured ? 'pass' : 'fail',
        measured: lk.cylindersSecured ? 1 : 0,
        required: 1,
        unit: 'lockers with cylinders secured',
        moduleIds: ids,
        message: lk.cylindersSecured
          ? `The cylinders in ${name} are strapped upright, valve uppermost.`
          : `The cylinders in ${name} are not secured: strap them upright, valve uppermost, at high and low level, so they cannot move under braking.`,
        source: LOCKER_SOURCE,
      });
    }
  }

  // Fixed safety ventilation applies to the living space of every leisure accommodation vehicle.
  const vent = gas.ventilation ?? {};
  const floorM2 = vent.floorAreaM2 ?? (doc.bay.length * doc.bay.width) / 1e6;
  const flueless = inv.appliances.some((a) => a.flueless);
  const need = en721Ventilation(floorM2, flueless, vent.highVentInRoof ?? false);
  if (!need) {
    out.push({ id: 'gas.ventilation', status: 'warn', measured: round(floorM2, 2), required: EN721_MAX_FLOOR_M2, unit: 'm² floor', message: `The living floor is ${num(floorM2, 1)} m², beyond the ${num(EN721_MAX_FLOOR_M2)} m² the quoted EN 721 figures cover: size the fixed vents from EN 721 itself.`, source: EN721 });
  } else if (vent.highVentCm2 === undefined || vent.lowVentCm2 === undefined) {
    const needs = [...(vent.highVentCm2 === undefined ? [INPUTS.highVent] : []), ...(vent.lowVentCm2 === undefined ? [INPUTS.lowVent] : [])];
    out.push(missingInputs('gas.ventilation', `Fixed ventilation (${need.band}: ${need.highCm2} cm² high, ${need.lowCm2} cm² low)`, needs, 2, EN721));
  } else {
    const place = vent.highVentInRoof ? 'roof extract' : 'high vent';
    out.push({
      id: 'gas.ventilation',
      status: vent.highVentCm2 >= need.highCm2 ? 'pass' : 'fail',
      measured: vent.highVentCm2,
      required: need.highCm2,
      unit: 'cm²',
      message: `Fixed high-level ventilation (${place}) ${num(vent.highVentCm2)} cm² free area; EN 721 asks ${need.highCm2} cm² for a ${num(floorM2, 1)} m² ${need.band}. Openable windows and hatches do not count.`,
      source: EN721,
    });
    out.push({
      id: 'gas.ventilation',
      status: vent.lowVentCm2 >= need.lowCm2 ? 'pass' : 'fail',
      measured: vent.lowVentCm2,
      required: need.lowCm2,
      unit: 'cm²',
      message: `Fixed low-level ventilation ${num(vent.lowVentCm2)} cm² free area, within ${num(LOW_VENT_MAX_HEIGHT_MM)} mm of the floor; EN 721 asks ${need.lowCm2} cm² (${need.band}).`,
      source: EN721,
    });
  }
  return out;
}
