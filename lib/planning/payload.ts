/**
 * Payload allowances a motor caravan must leave for its users.
 *
 * - EN 1646-2:2008 cl. 5.3.2 (motor caravans, user payload — personal effects): the allowance is
 *   10 kg × N + 10 kg × L, N the number of persons including the driver, L the overall length in
 *   metres. Strength: secondary (the formula as makers publish it in their EN 1646-2 glossaries;
 *   the clause number from the standard's published table of contents; the standard text was not
 *   consulted). The "+ 30 kg" with N = berths is the touring-caravan allowance of EN 1645-2, not
 *   this one.
 * - Reg. (EU) No 1230/2012 Annex I Part A point 2.6.2.1: each passenger counts 75 kg (point number
 *   from the regulation's published contents; value from memory); point 2.6.4.1.2: the minimum
 *   pay-mass of a motor caravan, 10 × (n + L) kg (from memory), read here as standing on top of the
 *   passengers. It gives the same figure as EN 1646-2 — one number, two sources.
 *
 * Plain numbers in, plain numbers out. Must never import UI, framework or database code.
 */

/** Mass of one person, kg: Reg. (EU) No 1230/2012 Annex I Part A 2.6.2.1 (from memory); EN 1646-2 uses the same. */
export const OCCUPANT_KG = 75;
/** kg per person in the EN 1646-2 personal-effects allowance (secondary, see header). */
export const EFFECTS_KG_PER_PERSON = 10;
/** kg per metre of overall length in the EN 1646-2 personal-effects allowance (secondary, see header). */
export const EFFECTS_KG_PER_M = 10;

export const PAYLOAD_SOURCE =
  'EN 1646-2:2008 cl. 5.3.2, personal effects 10 kg × persons + 10 kg × length in m (secondary: the formula as makers publish it; standard text not consulted); Reg. (EU) No 1230/2012 Annex I Part A 2.6.2.1 (75 kg a passenger) and 2.6.4.1.2 (minimum pay-mass of a motor caravan, 10 × (persons + length)) (from memory)';

function requireCount(persons: number, lengthM: number): void {
  if (!Number.isInteger(persons) || persons < 1) throw new RangeError('persons must be a whole number of at least 1');
  if (!Number.isFinite(lengthM) || lengthM <= 0) throw new RangeError('overall length must be a positive number of metres');
}

/** EN 1646-2 personal effects allowance, kg: 10 × persons (driver included) + 10 × overall length (m). */
export function personalEffectsAllowance(persons: number, lengthM: number): number {
  requireCount(persons, lengthM);
  return EFFECTS_KG_PER_PERSON * persons + EFFECTS_KG_PER_M * lengthM;
}

/**
 * User payload needed on top of the mass in running order, kg: the passengers (the driver is
 * already in the mass in running order) at 75 kg each, plus the personal effects allowance.
 * Worked: 4 persons, 5.0 m → 3 × 75 + 10 × 4 + 10 × 5 = 225 + 90 = 315 kg.
 */
export function userPayloadRequired(persons: number, lengthM: number): number {
  return OCCUPANT_KG * (persons - 1) + personalEffectsAllowance(persons, lengthM);
}

/** Reg. (EU) No 1230/2012 minimum pay-mass of a motor caravan, kg: 10 × (persons + length in m) (from memory). */
export function minimumPayload1230(persons: number, lengthM: number): number {
  requireCount(persons, lengthM);
  return 10 * (persons + lengthM);
}
