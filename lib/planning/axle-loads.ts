/**
 * Masses and axle loads of the converted van in its laden travel case.
 *
 * `computeAxleLoads(doc)` gathers every mass with a position — the base vehicle in running order
 * (placed from its front-axle share), each module (its `massKg`, else its kind's default) wherever
 * it is mounted — inside, under the floor, on the roof or behind the rear doors, each at its own
 * plan position, so a rack behind the rear axle lightens the front — water at the chosen fill of
 * each tank's typed capacity or drawn inside volume (the label says which) (1 kg per litre; fresh water at 20 °C is 0.998 kg/L, handbook value from
 * memory, so the round figure errs heavy), gas cylinders (content plus tare), passengers at 75 kg
 * (the driver is already in the mass in running order) — every declared person, on a drawn seat
 * where there is one, else at the cab row, said so in `assumptions` — personal effects and free payload items —
 * and splits each between the axles by the lever rule. It reports the total, the axle loads,
 * the centre of mass for the plan, and what is missing or assumed.
 *
 * DTO for the Weight panel and the plan sheet: `MassReport`. Pure: never import UI, framework or
 * database code; never throws on a valid LayoutDoc (missing data comes back in `missing`).
 */
import type { LayoutDoc } from '../layout';
import { leverSplit } from './lever';
import { INPUTS, type InputNeed } from './inputs';
import { beltedTravelSeats, moduleCentre, moduleFacts, moduleMassKg, moduleName, moduleRef, tankBasisWords } from './module-facts';
import { OCCUPANT_KG, personalEffectsAllowance } from './payload';

/** kg per litre used for tank contents (round figure, errs heavy; see header). */
export const WATER_KG_PER_L = 1;

export type MassGroup = 'vehicle' | 'module' | 'water' | 'gas' | 'occupant' | 'effects' | 'payload';

export interface MassItem {
  id: string;
  label: string;
  group: MassGroup;
  massKg: number;
  /** Plan position in bay coordinates, mm. */
  x: number;
  y: number;
  moduleId?: string;
  /** Share on each axle, when the axle geometry is known. */
  frontKg?: number;
  rearKg?: number;
}

export interface MassReport {
  items: MassItem[];
  /** Everything aboard in the laden travel case. */
  totalKg: number;
  /** The van as built, ready to go but without passengers, personal effects or free payload. */
  builtKg: number;
  axles: { frontKg: number; rearKg: number } | null;
  /** Centre of mass in bay coordinates (null when the base vehicle cannot be placed). */
  centreOfMass: { x: number; y: number } | null;
  /** Seats used for allowances: driver included. */
  seats: number;
  travellers: number;
  /** Overall length used for the allowances, m (null when not entered). */
  lengthM: number | null;
  /** Inputs to enter before a rule can be evaluated, by their on-screen label. */
  missing: InputNeed[];
  /** Inputs that contradict each other, in words (e.g. more on the front axle than in all). */
  conflicts: string[];
  /** Stand-in values used, in words. */
  assumptions: string[];
}

function seatCount(doc: LayoutDoc): number {
  return doc.systems?.vehicle?.seats ?? Math.max(1, doc.bay.cabSeats + beltedTravelSeats(doc).length);
}

export function computeAxleLoads(doc: LayoutDoc): MassReport {
  const vehicle = doc.systems?.vehicle ?? {};
  const load = doc.systems?.load ?? {};
  const missing: InputNeed[] = [];
  const conflicts: string[] = [];
  const assumptions: string[] = [];
  const items: MassItem[] = [];
  const midY = doc.bay.width / 2;

  const canPlace = vehicle.wheelbaseMm !== undefined && vehicle.frontAxleX !== undefined;
  if (vehicle.massInRunningOrderKg === undefined) missing.push(INPUTS.massInRunningOrder);
  if (vehicle.frontAxleRunningOrderKg === undefined) missing.push(INPUTS.frontAxleRunningOrder);
  if (vehicle.wheelbaseMm === undefined) missing.push(INPUTS.wheelbase);
  if (vehicle.frontAxleX === undefined) missing.push(INPUTS.frontAxlePosition);

  // The base vehicle, placed where its own front/rear split puts it.
  let vehiclePlaced = false;
  if (vehicle.massInRunningOrderKg !== undefined) {
    const miro = vehicle.massInRunningOrderKg;
    let x = 0;
    if (canPlace && vehicle.frontAxleRunningOrderKg !== undefined && miro > 0) {
      if (vehicle.frontAxleRunningOrderKg > miro) conflicts.push(`the mass in running order on the front axle (${Math.round(vehicle.frontAxleRunningOrderKg)} kg) is more than the whole mass in running order (${Math.round(miro)} kg)`);
      else {
        x = vehicle.frontAxleX! + ((miro - vehicle.frontAxleRunningOrderKg) / miro) * vehicle.wheelbaseMm!;
        vehiclePlaced = true;
      }
    }
    items.push({ id: 'vehicle', label: 'Base vehicle in running order (driver included)', group: 'vehicle', massKg: miro, x, y: midY });
  }

  for (const m of doc.modules) {
    const c = moduleCentre(m);
    items.push({ id: `module:${m.id}`, label: moduleName(m), group: 'module', massKg: moduleMassKg(m), x: c.x, y: c.y, moduleId: m.id });
    const water = moduleFacts(m).water;
    if (water) {
      const fill = (water.use === 'fresh' ? load.freshFillPct ?? 100 : load.greyFillPct ?? 0) / 100;
      const kg = water.litres * fill * WATER_KG_PER_L;
      if (kg > 0) items.push({ id: `water:${m.id}`, label: `Water in ${moduleRef(m)} at ${Math.round(fill * 100)} % of ${round1(water.litres)} L (${tankBasisWords(water.basis)})`, group: 'water', massKg: kg, x: c.x, y: c.y, moduleId: m.id });
    }
    const held = moduleFacts(m).gasCylinders;
    if (held) {
      const cylinders = held.count;
      const contentKg = held.kgEach;
      const tareKg = doc.systems?.gas?.cylinderTareKg ?? contentKg;
      if (doc.systems?.gas?.cylinderTareKg === undefined && cylinders > 0) assumptions.push(`each cylinder's tare taken as its gas content (${contentKg} kg); enter the stamped cylinder tare on the gas tab`);
      const kg = cylinders * (contentKg + tareKg);
      if (kg > 0) items.push({ id: `gas:${m.id}`, label: `${cylinders} × ${contentKg} kg gas cylinder${cylinders === 1 ? '' : 's'}, full`, group: 'gas', massKg: kg, x: c.x, y: c.y, moduleId: m.id });
    }
  }

  // People: every declared traveller counts. The driver is in the mass in running order; the
  // passengers take the cab passenger seats, then the belted travel seats, and anyone left over is
  // placed at the cab row (said so) rather than left out.
  const seats = seatCount(doc);
  const travellers = load.travellers ?? seats;
  if (travellers > seats) conflicts.push(`${travellers} travellers but ${seats} seats: every traveller needs a belted seat`);
  const cabX = vehicle.cabSeatX ?? vehicle.frontAxleX ?? 0;
  const cabWhere = vehicle.cabSeatX !== undefined ? 'at the cab seat position' : vehicle.frontAxleX !== undefined ? 'over the front axle (cab seat position not entered)' : 'at the front of the bay (cab seat position not entered)';
  const spots: { label: string; x: number; y: number; moduleId?: string }[] = [];
  for (let i = 1; i < doc.bay.cabSeats; i++) spots.push({ label: `Cab passenger ${i}`, x: cabX, y: midY });
  for (const s of beltedTravelSeats(doc)) {
    const c = moduleCentre(s);
    spots.push({ label: `Passenger on ${moduleRef(s)}`, x: c.x, y: c.y, moduleId: s.id });
  }
  const passengers = Math.max(0, travellers - 1);
  const cabSeated = Math.min(passengers, Math.max(0, doc.bay.cabSeats - 1));
  let unseated = 0;
  for (let i = 0; i < passengers; i++) {
    const spot = spots[i] ?? { label: `Passenger ${i + 1} (no seat drawn)`, x: cabX, y: midY };
    if (!spots[i]) unseated++;
    items.push({ id: `occupant:${i + 1}`, label: spot.label, group: 'occupant', massKg: OCCUPANT_KG, x: spot.x, y: spot.y, moduleId: spot.moduleId });
  }
  if (cabSeated > 0 && vehicle.cabSeatX === undefined) assumptions.push(`cab passengers placed ${cabWhere}`);
  if (unseated > 0) assumptions.push(`${unseated} ${unseated === 1 ? 'passenger has' : 'passengers have'} no seat drawn and ${unseated === 1 ? 'is' : 'are'} placed at the cab row, ${cabWhere}`);

  const lengthM = vehicle.overallLengthMm !== undefined ? vehicle.overallLengthMm / 1000 : null;
  let effectsKg = load.personalEffectsKg;
  if (effectsKg === undefined) {
    if (lengthM !== null) {
      effectsKg = personalEffectsAllowance(seats, lengthM);
      assumptions.push(`personal effects taken as the EN 1646-2 allowance, ${round1(effectsKg)} kg`);
    } else {
      missing.push(INPUTS.overallLength);
      effectsKg = 0;
    }
  }
  if (effectsKg > 0) {
    if (load.personalEffectsX === undefined) assumptions.push('personal effects stowed at the middle of the bay');
    items.push({ id: 'effects', label: 'Personal effects', group: 'effects', massKg: effectsKg, x: load.personalEffectsX ?? doc.bay.length / 2, y: midY });
  }
  for (const p of load.items ?? []) {
    items.push({ id: `payload:${p.id}`, label: p.label, group: 'payload', massKg: p.massKg, x: p.x, y: p.y ?? midY });
  }

  const totalKg = sum(items.map((i) => i.massKg));
  const builtKg = sum(items.filter((i) => i.group !== 'occupant' && i.group !== 'effects' && i.group !== 'payload').map((i) => i.massKg));
  let axles: MassReport['axles'] = null;
  let centreOfMass: MassReport['centreOfMass'] = null;
  if (canPlace && vehiclePlaced) {
    for (const item of items) Object.assign(item, leverSplit(item.massKg, item.x - vehicle.frontAxleX!, vehicle.wheelbaseMm!));
    axles = { frontKg: sum(items.map((i) => i.frontKg!)), rearKg: sum(items.map((i) => i.rearKg!)) };
    if (totalKg > 0) {
      centreOfMass = { x: sum(items.map((i) => i.massKg * i.x)) / totalKg, y: sum(items.map((i) => i.massKg * i.y)) / totalKg };
    }
  }
  return { items, totalKg, builtKg, axles, centreOfMass, seats, travellers, lengthM, missing, conflicts, assumptions };
}

function sum(values: number[]): number {
  return values.reduce((a, b) => a + b, 0);
}

function round1(n: number): number {
  return Math.round(n * 10) / 10;
}
