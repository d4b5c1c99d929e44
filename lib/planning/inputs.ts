/**
 * The on-screen names of the build-plan inputs, and the tab that holds each: what a finding or a
 * summary says when a value is missing ("needs: mass in running order, wheelbase"). One home for
 * these words, so a message never names a field by its place in the document.
 *
 * Plain data. Must never import UI, framework or database code.
 */

export type InputTab = 'weight' | 'power' | 'water' | 'gas' | 'heat' | 'editor';

/** A missing input, named as the user sees it. */
export interface InputNeed {
  label: string;
  where: InputTab;
}

const need = (label: string, where: InputTab): InputNeed => ({ label, where });

export const INPUTS = {
  massInRunningOrder: need('Mass in running order', 'weight'),
  frontAxleRunningOrder: need('Mass in running order on the front axle', 'weight'),
  maxAuthorisedMass: need('Maximum authorised mass', 'weight'),
  maxFrontAxle: need('Front axle limit', 'weight'),
  maxRearAxle: need('Rear axle limit', 'weight'),
  wheelbase: need('Wheelbase', 'weight'),
  frontAxlePosition: need('Front axle position', 'weight'),
  overallLength: need('Overall length', 'weight'),
  personalEffects: need('Personal effects', 'weight'),
  cabSeatPosition: need('Cab seat position', 'weight'),
  battery: need('Battery capacity and nominal volts', 'power'),
  charging: need('Solar panels, alternator charger or hook-up charger', 'power'),
  sunSummer: need('Sun, summer', 'power'),
  sunShoulder: need('Sun, spring/autumn', 'power'),
  sunWinter: need('Sun, winter', 'power'),
  loads: need('Loads', 'power'),
  mainsFitted: need('230 V is fitted', 'power'),
  lockerSealed: need('Sealed from the living space', 'gas'),
  lockerVentArea: need('Drop-out vent free area', 'gas'),
  lockerVentAtFloor: need('Vent at the locker floor', 'gas'),
  cylindersSecured: need('Cylinders strapped upright', 'gas'),
  cylinderTare: need('Cylinder tare (stamped)', 'gas'),
  highVent: need('High-level vent', 'gas'),
  lowVent: need('Low-level vent', 'gas'),
  conductivity: need('Declared λ of the material', 'heat'),
} as const satisfies Record<string, InputNeed>;

/** "mass in running order, wheelbase and overall length": labels in running text. */
export function needsInWords(needs: readonly InputNeed[]): string {
  const lower = (s: string) => (/^[A-Z][a-z]/.test(s) ? s.charAt(0).toLowerCase() + s.slice(1) : s);
  const words = [...new Set(needs.map((n) => lower(n.label)))];
  if (words.length <= 1) return words.join('');
  return `${words.slice(0, -1).join(', ')} and ${words[words.length - 1]}`;
}
