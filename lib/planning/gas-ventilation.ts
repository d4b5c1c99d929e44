/**
 * Gas and safety ventilation: which modules burn gas, the gas locker's drop-out vent, and the
 * fixed ventilation the living space needs.
 *
 * - Gas locker vent: a low drop-out vent to outside of at least 2 % of the locker floor area and
 *   at least 100 cm² (DVGW G 607 / EN 1949; secondary: as quoted in German motor-caravan gas
 *   guidance, clause not checked).
 * - Fixed safety ventilation, EN 721, as quoted in a German vehicle-inspection guidance note for
 *   motor-caravan approval (secondary; clause not checked): with appliances that are not room-sealed (a gas hob), floor
 *   area up to 5 m²: 75 cm² high (roof extract) and 10 cm² low; 5–10 m²: 100 cm² high and 15 cm²
 *   low. Without combustion appliances, or with room-sealed ones only, up to 10 m²: 15 cm² as a
 *   roof extract or 30 cm² as another high vent, and 5 cm² low. Low vents at most 100 mm above the
 *   floor. Above 10 m² the note gives no figure: read EN 721 itself.
 *
 * Pure. Must never import UI, framework or database code.
 */
import type { LayoutDoc, Module } from '../layout';
import { moduleFacts, moduleName } from './module-facts';

export const LOCKER_VENT_MIN_CM2 = 100;
export const LOCKER_VENT_FLOOR_FRACTION = 0.02;
export const LOCKER_SOURCE = 'DVGW G 607 / EN 1949, cylinder compartments: drop-out vent of at least 2 % of the locker floor and at least 100 cm² (secondary, clause not checked)';
export const EN721_SOURCE = 'EN 721 (safety ventilation of leisure accommodation vehicles), as quoted in a German vehicle-inspection guidance note (secondary, clause not checked)';
/** Low vents count only within this height of the floor, mm (EN 721 as quoted, secondary). */
export const LOW_VENT_MAX_HEIGHT_MM = 100;
/** The floor area the quoted EN 721 figures cover, m². */
export const EN721_MAX_FLOOR_M2 = 10;

export interface GasAppliance {
  moduleId: string;
  name: string;
  /** Burns room air and vents into the living space (a hob); room-sealed heaters do not. */
  flueless: boolean;
}

export interface GasInventory {
  present: boolean;
  appliances: GasAppliance[];
  lockers: Module[];
  cylinders: number;
  gasKg: number;
}

/** A hob burns gas unless its fuel says otherwise; a heater only when its fuel (else the heating fuel) is gas. */
export function gasInventory(doc: LayoutDoc): GasInventory {
  const appliances: GasAppliance[] = [];
  for (const m of doc.modules) {
    const facts = moduleFacts(m);
    if (!facts.gasAppliance) continue;
    const fuel = facts.fuel?.toLowerCase() ?? (facts.gasAppliance.untypedFuel === 'gas' ? 'gas' : doc.systems?.heating?.fuel);
    if (fuel === 'gas' || fuel === 'lpg') appliances.push({ moduleId: m.id, name: moduleName(m), flueless: facts.gasAppliance.flueless });
  }
  const lockers = doc.modules.filter((m) => m.kind === 'gas-locker');
  let cylinders = 0;
  let gasKg = 0;
  for (const l of lockers) {
    const held = moduleFacts(l).gasCylinders ?? { count: 0, kgEach: 0 };
    cylinders += held.count;
    gasKg += held.count * held.kgEach;
  }
  return { present: appliances.length > 0 || lockers.length > 0, appliances, lockers, cylinders, gasKg };
}

/** Drop-out vent a locker needs, cm²: max(100, 2 % of its floor area). */
export function lockerVentRequiredCm2(floorAreaCm2: number): number {
  if (!Number.isFinite(floorAreaCm2) || floorAreaCm2 < 0) throw new RangeError('locker floor area must be zero or more');
  return Math.max(LOCKER_VENT_MIN_CM2, LOCKER_VENT_FLOOR_FRACTION * floorAreaCm2);
}

export interface VentilationNeed {
  /** High-level free area, cm²; depends on whether the vent is in the roof. */
  highCm2: number;
  lowCm2: number;
  band: string;
}

/** EN 721 fixed ventilation (as cited, see header); null above 10 m², where the source gives no figure. */
export function en721Ventilation(floorAreaM2: number, flueless: boolean, highVentInRoof: boolean): VentilationNeed | null {
  if (!Number.isFinite(floorAreaM2) || floorAreaM2 <= 0) throw new RangeError('floor area must be positive');
  if (floorAreaM2 > EN721_MAX_FLOOR_M2) return null;
  if (flueless) {
    return floorAreaM2 <= 5
      ? { highCm2: 75, lowCm2: 10, band: 'floor up to 5 m², with a flueless appliance' }
      : { highCm2: 100, lowCm2: 15, band: 'floor 5–10 m², with a flueless appliance' };
  }
  return { highCm2: highVentInRoof ? 15 : 30, lowCm2: 5, band: 'floor up to 10 m², no flueless appliance' };
}
