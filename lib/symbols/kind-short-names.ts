/**
 * The shorter names a module's plan label falls back to when its kind's title does not fit the
 * module as drawn: a short name (one trade word) and a drafting abbreviation (capitals, as a
 * drawing's key would carry). One entry per kind of the kind registry (lib/layout/kinds.ts); the
 * type makes a new kind without its entry a compile error. Pure data; never measures or draws.
 */
import type { ModuleKind } from '../layout/kinds';

export interface KindShortName {
  /** One word, at most SHORT_NAME_MAX characters: "Counter" for "Kitchen counter". */
  short: string;
  /** Capitals, at most ABBREVIATION_MAX characters: "CTR". */
  abbreviation: string;
}

export const SHORT_NAME_MAX = 9;
export const ABBREVIATION_MAX = 3;

export const KIND_SHORT_NAMES: { readonly [K in ModuleKind]: KindShortName } = {
  'bed-platform': { short: 'Bed', abbreviation: 'BED' },
  'bed-infill': { short: 'Infill', abbreviation: 'INF' },
  'bench-seat': { short: 'Bench', abbreviation: 'BN' },
  seat: { short: 'Seat', abbreviation: 'ST' },
  table: { short: 'Table', abbreviation: 'TBL' },
  'kitchen-counter': { short: 'Counter', abbreviation: 'CTR' },
  'sink-unit': { short: 'Sink', abbreviation: 'SK' },
  hob: { short: 'Hob', abbreviation: 'HOB' },
  fridge: { short: 'Fridge', abbreviation: 'FR' },
  wardrobe: { short: 'Wardrobe', abbreviation: 'WR' },
  'drawer-unit': { short: 'Drawers', abbreviation: 'DR' },
  'overhead-locker': { short: 'Locker', abbreviation: 'OL' },
  'fresh-water-tank': { short: 'Fresh', abbreviation: 'FW' },
  'grey-water-tank': { short: 'Grey', abbreviation: 'GW' },
  'gas-locker': { short: 'Gas', abbreviation: 'GL' },
  'electrics-bay': { short: 'Electrics', abbreviation: 'EL' },
  heater: { short: 'Heater', abbreviation: 'HTR' },
  'toilet-cabinet': { short: 'Toilet', abbreviation: 'WC' },
  'shower-tray': { short: 'Shower', abbreviation: 'SH' },
  'spare-wheel': { short: 'Spare', abbreviation: 'SW' },
  'roof-box': { short: 'Roof box', abbreviation: 'RB' },
  'solar-panel': { short: 'Solar', abbreviation: 'PV' },
  'roof-rail': { short: 'Rail', abbreviation: 'RR' },
  'rear-carrier': { short: 'Carrier', abbreviation: 'RC' },
  step: { short: 'Step', abbreviation: 'STP' },
};
