/**
 * Gas and ventilation rules (`gas.*`): the gas caution when gas is aboard, the gas locker (sealed
 * from the living space, low drop-out vent of max(2 % of floor, 100 cm²), cylinders secured), and
 * fixed safety ventilation of the living space (EN 721). Numbers from lib/planning
 * `gasInventory`, `lockerVentRequiredCm2`, `en721Ventilation`, which name their sources.
 *
 * Must never import React, Konva, Next or the database; never throws on a valid LayoutDoc.
 */
import type { LayoutDoc } from '../../layout';
import { en721Ventilation, gasInventory, lockerVentRequiredCm2, moduleName } from '../../planning';
import type { Finding } from '../types';
import { caution, missingInputs, num, round } from './wording';

const LOCKER_SOURCE = 'DVGW G 607 / EN 1949 (cylinder compartments; as cited in the brief, secondary)';
const EN721 = 'EN 721 (safety ventilation) as cited in a TÜV motor-caravan guidance note (secondary, clause not checked)';

export function gasChecks(doc: LayoutDoc): Finding[] {
  const gas = doc.systems?.gas ?? {};
  const inv = gasInventory(doc);
  const out: Finding[] = [];

  if (inv.present) {
    out.push(caution(
      'gas.caution',
      [
        { done: gas.installerCertified, text: 'installed and tightness-tested by a qualified gas engineer, with a certificate', field: 'systems.gas.installerCertified' },
        { done: doc.systems?.alarms?.co, text: 'carbon-monoxide alarm in the living space', field: 'systems.alarms.co' },
        { done: doc.systems?.alarms?.lpg, text: 'LPG alarm near the floor', field: 'systems.alarms.lpg' },
      ],
      `Gas is aboard (${[...inv.appliances.map((a) => a.name), ...inv.lockers.map((l) => moduleName(l))].join(', ')}): the installation must be installed and tested by a qualified gas engineer under local codes (EN 1949 in Europe), with a carbon-monoxide alarm and an LPG alarm. Never sleep with a flueless appliance burning.`,
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
        message: `Gas appliances are drawn (${inv.appliances.map((a) => a.name).join(', ')}) but no gas locker: cylinders belong in a locker sealed from the living space with a drop-out vent. Add a gas-locker module (or an underslung tank outside the body).`,
        source: LOCKER_SOURCE,
      });
    }
  }

  for (const l of inv.lockers) {
    const lk = gas.locker ?? {};
    const ids = [l.id];
    if (lk.sealed === undefined) out.push({ ...missingInputs('gas.locker-sealed', `Gas locker ${moduleName(l)} sealing`, ['systems.gas.locker.sealed'], 1, LOCKER_SOURCE), moduleIds: ids });
    else out.push({
      id: 'gas.locker-sealed',
      status: lk.sealed ? 'pass' : 'fail',
      measured: lk.sealed ? 1 : 0,
      required: 1,
      unit: 'sealed (1 = yes)',
      moduleIds: ids,
      message: lk.sealed
        ? `${moduleName(l)} is sealed from the living space, opening to the outside.`
        : `${moduleName(l)} is not sealed from the living space: leaking gas, heavier than air, would pool inside. Seal every seam and pipe entry so it opens only to the outside.`,
      source: LOCKER_SOURCE,
    });

    const floorCm2 = (l.length * l.width) / 100;
    const needCm2 = lockerVentRequiredCm2(floorCm2);
    if (lk.ventAreaCm2 === undefined || lk.ventAtFloor === undefined) {
      const paths = [lk.ventAreaCm2 === undefined ? 'systems.gas.locker.ventAreaCm2' : '', lk.ventAtFloor === undefined ? 'systems.gas.locker.ventAtFloor' : ''].filter(Boolean);
      out.push({ ...missingInputs('gas.locker-vent', `Gas locker ${moduleName(l)} drop-out vent (needs ${num(needCm2)} cm² at the floor)`, paths, 2, LOCKER_SOURCE), moduleIds: ids });
    } else {
      const ok = lk.ventAreaCm2 >= needCm2 && lk.ventAtFloor;
      out.push({
        id: 'gas.locker-vent',
        status: ok ? 'pass' : 'fail',
        measured: lk.ventAreaCm2,
        required: round(needCm2, 1),
        unit: 'cm²',
        moduleIds: ids,
        message: `${moduleName(l)}: drop-out vent ${num(lk.ventAreaCm2)} cm²${lk.ventAtFloor ? ' at the floor' : ' NOT at the floor'}; needed at least 2 % of the ${num(floorCm2)} cm² locker floor and at least 100 cm², so ${num(needCm2)} cm², at the lowest point, to outside.`,
        source: LOCKER_SOURCE,
      });
    }

    if (inv.cylinders > 0) {
      if (lk.cylindersSecured === undefined) out.push({ ...missingInputs('gas.cylinders-secured', `Cylinder restraint in ${moduleName(l)}`, ['systems.gas.locker.cylindersSecured'], 1, LOCKER_SOURCE), moduleIds: ids });
      else out.push({
        id: 'gas.cylinders-secured',
        status: lk.cylindersSecured ? 'pass' : 'fail',
        measured: lk.cylindersSecured ? 1 : 0,
        required: 1,
        unit: 'secured (1 = yes)',
        moduleIds: ids,
        message: lk.cylindersSecured
          ? `Cylinders in ${moduleName(l)} are secured upright, valve uppermost.`
          : `Cylinders in ${moduleName(l)} are not secured: strap them upright, valve uppermost, at high and low level, so they cannot move under braking.`,
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
    out.push({ id: 'gas.ventilation', status: 'warn', measured: round(floorM2, 2), required: 10, unit: 'm² floor', message: `The living floor is ${num(floorM2, 1)} m², beyond the 10 m² the cited EN 721 figures cover: size the fixed vents from EN 721 itself.`, source: EN721 });
  } else if (vent.highVentCm2 === undefined || vent.lowVentCm2 === undefined) {
    const paths = [vent.highVentCm2 === undefined ? 'systems.gas.ventilation.highVentCm2' : '', vent.lowVentCm2 === undefined ? 'systems.gas.ventilation.lowVentCm2' : ''].filter(Boolean);
    out.push(missingInputs('gas.ventilation', `Fixed ventilation (${need.band}: ${need.highCm2} cm² high, ${need.lowCm2} cm² low)`, paths, 2, EN721));
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
      message: `Fixed low-level ventilation ${num(vent.lowVentCm2)} cm² free area, within 100 mm of the floor; EN 721 asks ${need.lowCm2} cm² (${need.band}).`,
      source: EN721,
    });
  }
  return out;
}
