/**
 * Every safety caution Baywright shows, in one place: short, specific, and always deferring to
 * local codes and to qualified, licensed people. Screens, mail, the plan sheet and exported
 * pictures take their words from here; none writes its own.
 *
 * The standards named are the usual European ones, cited from memory (check the edition in force
 * where the van is registered): EN 1949 (LPG systems in habitation vehicles), IEC 60364-7-721 /
 * BS 7671 Section 721 (electrical installations in caravans and motor caravans), UN ECE R122
 * (vehicle heating systems), UN ECE R14, R16 and R17 (belt anchorages, belts, seats and their
 * anchorages). Pure text; must never import React, Next or the database.
 */
import type { Module } from './schema';

/** What can hurt someone, in the trade's own topics. */
export type HazardTopic = 'gas' | 'power' | 'heating' | 'seats' | 'weight';

/** The one line that goes wherever a plan leaves the studio (start page, viewer, exported picture). */
export const ONE_LINE_CAUTION =
  'A planning drawing, not a certificate: gas, 230 V, heating, seats and belts, and weight limits follow local codes and are fitted and signed off by qualified, licensed people.';

/** Said wherever a plan is issued or approved: the plan does not replace licensed sign-off. */
export const SIGN_OFF_CAUTION =
  'Gas, 230 V, heating, seat belts and anchorages, and the van’s weight limits are installed, tested and signed off by qualified fitters to local rules; an approved plan does not replace that.';

/** Under the Checks list. */
export const CHECKS_CAUTION =
  'Checks are planning aids, not certification. Gas, 230 V, heating, seat belts and weight limits must follow your local codes and be fitted and signed off by a qualified, licensed person.';

/** The build plan's header: figures for planning, and who signs off what. */
export const BUILD_PLAN_CAUTION =
  'Figures here help plan the build; they do not replace the vehicle’s plate, a weighbridge, the makers’ instructions or local codes. Gas, 230 V and heater installations need qualified installers; travel seats, their belts and anchorages must be type-approved and fitted to the vehicle rules, and anchorage strength is tested, not drawn.';

/** On the quote page and in the quote and receipt mail: the price buys planning and parts, not sign-off. */
export const QUOTE_CAUTION =
  'This quote covers the work and parts listed. Gas, 230 V, heater and seat-belt work is done and certified by qualified, licensed fitters to local codes; their tests and certificates are part of the build, and the finished van is weighed before handover.';

/** One short caution per topic, for the Details panel, the Parts shelf and revision compare. */
export const TOPIC_CAUTION: Record<HazardTopic, { title: string; brief: string; text: string }> = {
  gas: {
    title: 'Gas',
    brief: 'Fitted, tested and certified by a qualified gas engineer.',
    text: 'LPG is fitted, tightness-tested and certified by a qualified gas engineer to local codes (EN 1949 in Europe, from memory). Cylinders go in a sealed locker vented through the floor; fit a gas alarm and a carbon-monoxide alarm.',
  },
  power: {
    title: '230 V',
    brief: 'Installed and tested by a qualified electrician.',
    text: '230 V can kill. Hook-up, inverter and mains circuits are installed and tested by a qualified electrician to local wiring rules (IEC 60364-7-721, from memory); fuse every 12 V circuit at its source.',
  },
  heating: {
    title: 'Heating',
    brief: 'Fitted to its maker’s manual and local codes, with a CO alarm.',
    text: 'A fuel-burning heater makes carbon monoxide. Fit it to the maker’s manual and local codes (UN ECE R122, from memory), with the exhaust led outside away from doors and vents, and a carbon-monoxide alarm.',
  },
  seats: {
    title: 'Seats and belts',
    brief: 'Type-approved, with belts and anchorages fitted and tested.',
    text: 'A seat used while driving must be type-approved, with belts and anchorages fitted and tested to the vehicle rules (UN ECE R14, R16, R17, from memory) and signed off where the van is registered. Nobody travels on a bed or an unbelted bench.',
  },
  weight: {
    title: 'Weight limits',
    brief: 'Weigh the finished van, full, on a weighbridge.',
    text: 'The masses here are planning figures. Weigh the finished van, full, on a weighbridge: it must stay within its plated gross vehicle weight and both axle loads.',
  },
};

/** The build plan's tabs: the longer words beside the gas, power and heating figures. */
export const PLANNING_CAUTION = {
  gas: [
    'Gas must be installed and tightness-tested by a qualified gas engineer under local codes (EN 1949 in Europe), with a certificate. Fit a carbon-monoxide alarm and an LPG alarm near the floor.',
    'Never sleep with a flueless appliance (a hob) burning, and never use one to heat the van. Turn the cylinder off when travelling unless the installation is approved for use on the move.',
  ],
  power: '230 V can kill. Have the hook-up, inverter and mains circuits designed, installed and tested by a qualified electrician under local codes (IEC 60364-7-721 / BS 7671 Section 721; from memory), with 30 mA RCD protection and a certificate. Keep 230 V and 12 V wiring apart.',
  heating: 'A fuel-burning heater makes carbon monoxide. Follow the maker’s installation manual and local codes (UN ECE R122 for vehicle heaters; from memory): exhaust outlet away from doors, opening windows and the fuel filler, combustion intake apart from the exhaust, the maker’s seals and exhaust parts only. Fit a CO alarm (Gas panel).',
  gasHeater: 'A gas heater is part of the gas installation: a qualified gas engineer installs and tests it.',
} as const;

/**
 * Beside a measured clearance of an outlet (heater exhaust, heater intake, gas locker drop-out vent)
 * that does not meet or needs attention: the distance is a planning figure, the appliance's
 * instructions and the installer decide.
 */
export const OUTLET_CAUTION: Record<'heating' | 'gas', string> = {
  heating: 'Place the outlet as the heater’s installation manual says; a qualified installer fits it and checks the distances on the van itself.',
  gas: 'A qualified gas engineer places and tests the locker vent to local codes (EN 1949 in Europe, from memory); the distance here is a planning figure.',
};

/** The longer cautions every plan sheet carries, whatever the layout holds. */
export const SHEET_CAUTIONS: { topic: string; text: string }[] = [
  {
    topic: 'Gas',
    text: 'LPG installations must be designed, fitted, leak-tested and certified by a competent gas engineer to local rules (in Europe, EN 1949 for habitation vehicles — from memory). Keep cylinders in a sealed, floor-vented locker, fit low-level and high-level ventilation, and a gas alarm.',
  },
  {
    topic: '230 V',
    text: 'Mains (230 V) wiring, shore hook-up, inverters and their protection must be installed and tested by a qualified electrician to local wiring rules (IEC 60364-7-721 for caravans and motor caravans — from memory). Fuse every 12 V circuit at its source and size cables for their current and length.',
  },
  {
    topic: 'Heating',
    text: 'Fuel-burning heaters and cookers need combustion air and an exhaust led outside as their maker specifies; fit a carbon-monoxide alarm and a smoke alarm. Install heaters to the maker\'s instructions and local rules.',
  },
  {
    topic: 'Seats and belts',
    text: 'Seats used while driving must be type-approved with belts and anchorages tested as local vehicle rules require (UN ECE R14, R16 and R17 — from memory). No one may travel on a bed, a bench without approved belts, or a lounge seat.',
  },
  {
    topic: 'Weight limits',
    text: 'Weigh the finished van, full of water, gas, people and kit, on a weighbridge: it must stay within its plated gross vehicle weight and both axle loads. The masses on this sheet are planning figures, not measurements.',
  },
  {
    topic: 'This sheet',
    text: 'A planning drawing, not a certificate. Local codes and licensed practice decide; measure the van itself before cutting anything.',
  },
];

/** Kinds whose placing or fitting can hurt someone, and the topic each falls under. */
const KIND_TOPIC: Partial<Record<Module['kind'], HazardTopic>> = {
  hob: 'gas',
  'gas-locker': 'gas',
  heater: 'heating',
  'electrics-bay': 'power',
  seat: 'seats',
};

/**
 * The caution for a module kind, or null. A travel seat's caution holds whether or not it is
 * marked belted: an unbelted seat in the travel arrangement is the more dangerous case.
 */
export function kindCaution(kind: Module['kind']): { topic: HazardTopic; title: string; brief: string; text: string } | null {
  const topic = KIND_TOPIC[kind];
  return topic ? { topic, ...TOPIC_CAUTION[topic] } : null;
}

/**
 * The topic a check finding belongs to, from its id (`gas.*`, `power.*`, `heat.*`, `mass.*`,
 * `travel.seats`; insulation's `heat.loss` and `heat.u-value` are comfort, not safety), or null for findings that cannot hurt anyone by themselves (fit, walkways…).
 */
export function findingTopic(findingId: string): HazardTopic | null {
  const family = findingId.split('.')[0];
  if (family === 'gas' || findingId === 'clearance.gas-vent') return 'gas';
  if (family === 'power') return 'power';
  if (findingId === 'heat.heater-size' || findingId === 'clearance.exhaust' || findingId === 'clearance.intake') return 'heating';
  if (family === 'mass') return 'weight';
  if (findingId === 'travel.seats') return 'seats';
  return null;
}
