/**
 * The on-screen names of a module's and a bay's fields, as the Details panel and the Bay panel
 * print them — one home, so a change list (revision compare, the sheet's revision table) speaks
 * of "Mass" and "Seats in the cab", never of `massKg` or `cabSeats`. Pure words; must never
 * import React, Next or the database.
 */
import { valueLabel } from './kinds';
import type { Module } from './schema';

export const MODULE_FIELD_WORDS = {
  kind: 'Kind',
  label: 'Label',
  facing: 'Facing',
  arrangements: 'Exists in',
  surfaces: 'Top used as',
  mount: 'Mounted',
  massKg: 'Mass',
} as const;

/** A module's top, in words ('none': nothing to sit, sleep or work on). */
export const SURFACE_WORDS = { sleep: 'bed', seat: 'seat', counter: 'worktop', none: 'nothing' } as const;

/** Where a module is mounted, in words. */
export const MOUNT_WORDS = { inside: 'inside the body', 'under-floor': 'under the floor', roof: 'on the roof', rear: 'behind the rear doors' } as const;

/** A module's top in each arrangement, e.g. "travel seat, lounge seat, sleep bed"; "none" when it has none anywhere. */
export function surfacesWords(m: Pick<Module, 'arrangements' | 'surfaces'>): string {
  const parts = (['travel', 'lounge', 'sleep'] as const)
    .filter((a) => m.arrangements.includes(a) && m.surfaces?.[a] !== undefined)
    .map((a) => `${a} ${SURFACE_WORDS[m.surfaces![a]!]}`);
  return parts.length ? parts.join(', ') : 'none';
}

export const FACING_WORDS: Record<Module['facing'], string> = { front: 'front (towards the cab)', rear: 'rear', left: 'left wall', right: 'right wall' };

/** The name of a kind's own value (its label in the kind registry); an unknown key is spelt out in words ("fuelType" → "Fuel type"). */
export function propWord(key: string): string {
  const known = valueLabel(key);
  if (known) return known;
  const spaced = key.replace(/([a-z0-9])([A-Z])/g, '$1 $2').replace(/[_-]+/g, ' ').toLowerCase();
  return spaced.charAt(0).toUpperCase() + spaced.slice(1);
}

export const BAY_FIELD_WORDS = {
  length: 'Bay length',
  width: 'Bay width',
  height: 'Bay height',
  bulkhead: 'Bulkhead',
  cabSeats: 'Seats in the cab',
  wheelArches: 'Wheel arches',
  doors: 'Doors',
  buildUp: 'Build-up',
  occupants: 'Occupants',
} as const;
