/**
 * How findings are named where people read them: the one status vocabulary (a requirement is met,
 * needs attention, or is not met), the plain name of each rule keyed by its id, and the fold of
 * findings that wait for missing inputs into one "not yet checked" line. Every screen, the sheet,
 * the mail and the compare view read their words from here. `pass`/`warn`/`fail` and the dotted
 * rule ids stay data; this module must never be bypassed to print either. Pure.
 */
import type { Finding, FindingNeed, FindingStatus } from './types';

/** The word beside each status icon, and the phrase for a count ("3 do not meet"). */
export const STATUS_WORDS: Record<FindingStatus, { word: string; one: string; many: string }> = {
  pass: { word: 'Meets', one: 'meets', many: 'meet' },
  warn: { word: 'Needs attention', one: 'needs attention', many: 'need attention' },
  fail: { word: 'Does not meet', one: 'does not meet', many: 'do not meet' },
};

/** The line for findings that could not be judged yet because inputs are missing. */
export const NOT_YET_CHECKED = 'Not yet checked';

/** Status order on every list: what does not meet first. */
export const STATUS_ORDER: FindingStatus[] = ['fail', 'warn', 'pass'];

export function statusWord(s: FindingStatus): string {
  return STATUS_WORDS[s].word;
}

/** "2 do not meet, 1 needs attention, 14 meet" (zero counts left out unless all are zero). */
export function statusCounts(counts: Record<FindingStatus, number>, waiting = 0): string {
  const parts = STATUS_ORDER.filter((s) => counts[s] > 0).map((s) => `${counts[s]} ${counts[s] === 1 ? STATUS_WORDS[s].one : STATUS_WORDS[s].many}`);
  if (waiting > 0) parts.push(`${waiting} not yet checked`);
  return parts.length ? parts.join(', ') : 'nothing to report';
}

/** Plain names of the rules, by finding id. One place; a new rule adds its line here. */
export const RULE_NAMES: Record<string, string> = {
  'fit.inside': 'Fits inside the lined bay',
  'fit.wheel-arch': 'Clear of the wheel arches',
  'fit.overlap': 'Modules do not overlap',
  'fit.outside': 'Outside-mounted module',
  'fit.solar': 'Solar panels on the roof',
  'walkway.width': 'Walkway width',
  'walkway.reach': 'Reach from the walkway',
  'headroom.standing': 'Standing headroom',
  'headroom.overhead': 'Headroom under lockers',
  'sleep.length': 'Bed length',
  'sleep.width': 'Bed width',
  'sleep.level': 'Bed surface level',
  'sleep.headroom': 'Sitting headroom over the bed',
  'sleep.place': 'Sleeping place',
  'travel.seats': 'Travel seats',
  'egress.sleep': 'Way out from the beds',
  'clearance.window': 'Clear of the windows',
  'clearance.roof-opening': 'Clear of the roof openings',
  'clearance.exhaust': 'Clear of the heater exhaust',
  'clearance.gas-vent': 'Clear of the gas vent',
  'clearance.intake': 'Heater intake apart from the exhaust',
  'mass.input': 'Vehicle masses',
  'mass.total': 'Maximum authorised mass',
  'mass.front-axle': 'Front axle load',
  'mass.rear-axle': 'Rear axle load',
  'mass.payload': 'User payload',
  'mass.licence': 'Driving licence category',
  'mass.seat-anchorage': 'Seat anchorages',
  'power.input': 'Energy budget',
  'power.balance': 'Daily energy balance',
  'power.autonomy': 'Days on the battery alone',
  'power.battery-min': 'Battery size',
  'power.cable': 'Cable size',
  'power.mains': '230 V installation',
  'water.fresh': 'Fresh water tank',
  'water.grey': 'Grey water tank',
  'water.days': 'Days of water',
  'water.capacity': 'Tank capacity',
  'gas.caution': 'Gas safety',
  'gas.locker': 'Gas locker',
  'gas.locker-sealed': 'Gas locker sealed from the living space',
  'gas.locker-vent': 'Gas locker drop-out vent',
  'gas.cylinders-secured': 'Gas cylinders secured',
  'gas.ventilation': 'Fixed ventilation',
  'heat.loss': 'Heat loss',
  'heat.u-value': 'Insulation (U-value)',
  'heat.heater-size': 'Heater size',
  'heat.heater-caution': 'Heater installation',
};

const FAMILY_NAMES: Record<string, string> = {
  fit: 'Fit', walkway: 'Walkway', headroom: 'Headroom', sleep: 'Beds', travel: 'Travel seats', egress: 'Way out',
  clearance: 'Clearances', mass: 'Weight', power: 'Power', water: 'Water', gas: 'Gas', heat: 'Heating',
};

/** The rule's plain name; an id missing from the table falls back to its family, never to the id. */
export function ruleName(id: string): string {
  return RULE_NAMES[id] ?? FAMILY_NAMES[id.split('.')[0]] ?? 'Check';
}

/** Findings split into those that were judged and the inputs the rest are waiting for. */
export interface FoldedFindings {
  judged: Finding[];
  /** Each missing input once, in the order first asked for. */
  needs: FindingNeed[];
  /** How many findings wait for inputs. */
  waiting: number;
}

export function foldWaiting(findings: Finding[]): FoldedFindings {
  const judged: Finding[] = [];
  const needs: FindingNeed[] = [];
  const seen = new Set<string>();
  let waiting = 0;
  for (const f of findings) {
    if (!f.needs?.length) {
      judged.push(f);
      continue;
    }
    waiting += 1;
    for (const n of f.needs) {
      const key = `${n.where}\u0000${n.label.toLowerCase()}`;
      if (seen.has(key)) continue;
      seen.add(key);
      needs.push(n);
    }
  }
  return { judged, needs, waiting };
}

/** "Not yet checked — needs: mass in running order, wheelbase" (labels lower-cased after the first word). */
export function needsLine(needs: FindingNeed[]): string {
  return `${NOT_YET_CHECKED} — needs: ${needs.map((n) => lowerFirst(n.label)).join(', ')}`;
}

function lowerFirst(s: string): string {
  // Keep abbreviations and units as written ("LPG alarm", "230 V").
  return /^[A-Z][a-z]/.test(s) ? s[0].toLowerCase() + s.slice(1) : s;
}

/** Where each need is entered, as the tab's name on screen. */
export const NEED_PLACES: Record<FindingNeed['where'], string> = {
  weight: 'Weight', power: 'Power', water: 'Water', gas: 'Gas & ventilation', heat: 'Heating & insulation', editor: 'the drawing',
};
