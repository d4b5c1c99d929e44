/**
 * The on-screen names of the layout document's fields, for messages that would otherwise print a
 * field path ("occupants.standingHeight: must be…" becomes "Standing height must be…"). The keys are
 * the document's field names (the last named segment of a path); the names are the labels the
 * Details panel, the Bay panel and the build-plan forms show. Pure; must never return a path.
 */

const NAMES: Record<string, string> = {
  // the bay
  'bay.length': 'Bay length', 'bay.width': 'Bay width', 'bay.height': 'Bay height',
  bulkhead: 'Bulkhead', cabSeats: 'Cab seats', wheelArches: 'Wheel arches', doors: 'Doors', offset: 'Position along the wall', wall: 'Wall', side: 'Side',
  // modules
  id: 'Module reference', kind: 'Kind', label: 'Label', x: 'Position along the bay', y: 'Position across the bay',
  length: 'Length', width: 'Width', height: 'Height', elevation: 'Height above the floor', facing: 'Facing',
  arrangements: 'Arrangements', surface: 'Top used as', surfaces: 'Top used as', massKg: 'Mass', props: 'Details', mount: 'Mounted',
  // build-up and people
  floor: 'Floor build-up', roof: 'Roof build-up', walls: 'Wall build-up', material: 'Material', thickness: 'Thickness',
  standingHeight: 'Standing height', sleepers: 'Sleepers’ statures',
  // settings
  walkwayMin: 'Walkway width', bedAllowance: 'Bed length allowance', bedWidthPerSleeper: 'Bed width per sleeper',
  levelTolerance: 'Level tolerance', headMargin: 'Headroom margin', mattressRegion: 'Mattress sizes', floorAboveRoad: 'Floor height above the road',
  // build plan: weight
  massInRunningOrderKg: 'Mass in running order', frontAxleRunningOrderKg: 'Front axle share of the mass in running order',
  maxAuthorisedMassKg: 'Maximum authorised mass', maxFrontAxleKg: 'Front axle limit', maxRearAxleKg: 'Rear axle limit',
  wheelbaseMm: 'Wheelbase', frontAxleX: 'Front axle position', overallLengthMm: 'Overall length', seats: 'Seats for travel',
  cabSeatX: 'Cab seat position', travellers: 'Travellers', personalEffectsKg: 'Personal effects', personalEffectsX: 'Effects stowed at',
  freshFillPct: 'Fresh water fill', greyFillPct: 'Grey water fill',
  // build plan: power, water, gas, heat
  capacityAh: 'Battery capacity', chemistry: 'Battery type', volts: 'System voltage', usableDodPct: 'Usable depth of discharge',
  watts: 'Power', hoursPerDay: 'Hours a day', dutyCycle: 'Duty cycle', amps: 'Current', lengthM: 'Cable run length',
  fittedMm2: 'Fitted cable size', maxDropPct: 'Allowed voltage drop', peakSunHours: 'Sun hours', lossesPct: 'System losses',
  autonomyDaysTarget: 'Days on the battery alone', persons: 'People', litresPerPersonPerDay: 'Litres per person a day',
  cylinderTareKg: 'Empty cylinder mass', lowVentCm2: 'Low vent area', highVentCm2: 'High vent area', ventAreaCm2: 'Vent area',
  installerCertified: 'Installed and certified by a registered gas engineer', sealed: 'Sealed from the living space',
  cylindersSecured: 'Cylinders secured', ventAtFloor: 'Vent at the floor', co: 'Carbon-monoxide alarm', lpg: 'LPG alarm',
  rcd: 'RCD protection', installedByElectrician: 'Installed by a qualified electrician',
  uValue: 'U-value', areaM2: 'Area', deltaK: 'Temperature difference', airChangesPerHour: 'Air changes an hour',
  note: 'Note', name: 'Layout name', buildUp: 'Build-up', occupants: 'Occupants',
};

/** The on-screen name of a field given its path (`occupants.standingHeight`, `modules.3.x`, `bay.length`). */
export function fieldName(path: string | readonly (string | number)[]): string {
  const parts = (typeof path === 'string' ? path.split('.') : path.map(String)).filter((p) => p !== '' && !/^\d+$/.test(p));
  if (parts.length === 0) return 'The file';
  const last = parts[parts.length - 1];
  const pair = parts.length > 1 ? `${parts[parts.length - 2]}.${last}` : '';
  return NAMES[pair] ?? NAMES[last] ?? sayCamel(last);
}

/** `standingHeight: must be between 0 and 2800 mm` → `Standing height must be between 0 and 2800 mm`. */
export function readableProblem(problem: string): string {
  const m = /^([A-Za-z0-9_.-]*[A-Za-z][A-Za-z0-9_.-]*): (.*)$/s.exec(problem);
  if (!m) return problem;
  return `${fieldName(m[1])}: ${m[2]}`;
}

function sayCamel(key: string): string {
  const words = key.replace(/(Kg|Mm2?|Cm2|Pct|M2|Wh|Ah)$/, '').replace(/([a-z0-9])([A-Z])/g, '$1 $2').toLowerCase();
  return words.charAt(0).toUpperCase() + words.slice(1);
}
