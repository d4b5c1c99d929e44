/**
 * Payload allowances a motor caravan must leave for its users.
 *
 * - EN 1646-2 (user payload of motor caravans): personal effects allowance
 *   10 kg × seats + 10 kg × overall length in metres + 30 kg, with 75 kg per passenger on top
 *   (values as cited in the build-planning brief; secondary, clause not checked).
 * - Reg. (EU) 1230/2012 (masses and dimensions; motor caravans): the mass left for people and
 *   effects must be at least 10 × (persons + overall length in m) kg (as cited in the brief;
 *   secondary, annex and point not checked).
 *
 * Plain numbers in, plain numbers out. Must never import UI, framework or database code.
 */

/** Standard occupant mass, kg (EN 1646-2 and Reg. (EU) 1230/2012 both use 75 kg; as cited). */
export const OCCUPANT_KG = 75;

function requireCount(seats: number, lengthM: number): void {
  if (!Number.isInteger(seats) || seats < 1) throw new RangeError('seats must be a whole number of at least 1');
  if (!Number.isFinite(lengthM) || lengthM <= 0) throw new RangeError('overall length must be a positive number of metres');
}

/** EN 1646-2 personal effects allowance, kg: 10 × seats + 10 × length (m) + 30. */
export function personalEffectsAllowance(seats: number, lengthM: number): number {
  requireCount(seats, lengthM);
  return 10 * seats + 10 * lengthM + 30;
}

/**
 * EN 1646-2 user payload needed on top of the mass in running order, kg: passengers (the driver
 * is already in the mass in running order) at 75 kg each, plus the personal effects allowance.
 */
export function en1646UserPayload(seats: number, lengthM: number): number {
  return OCCUPANT_KG * (seats - 1) + personalEffectsAllowance(seats, lengthM);
}

/** Reg. (EU) 1230/2012 minimum payload for motor caravans, kg: 10 × (persons + length in m). */
export function minimumPayload1230(persons: number, lengthM: number): number {
  requireCount(persons, lengthM);
  return 10 * (persons + lengthM);
}

/**
 * Reg. (EU) 1230/2012 payload needed on top of the mass in running order, kg: passengers at 75 kg
 * (the driver is in the mass in running order) plus 10 × (persons + length). Read here as
 * standing on top of the passengers, like the EN 1646-2 allowance (from memory; not checked
 * against the annex).
 */
export function reg1230UserPayload(persons: number, lengthM: number): number {
  return OCCUPANT_KG * (persons - 1) + minimumPayload1230(persons, lengthM);
}
