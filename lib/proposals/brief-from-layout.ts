/**
 * A brief read back from an existing layout, to start proposals for it: its bay (as measured),
 * the sleepers (the occupants' statures, else one per 600 mm of each bed's width), the standing
 * stature, belted seats, the bed it has (made up from the lounge, across or lengthways), the
 * kitchen (counter and sink length, sink, hob, fridge size), water (days from the fresh tank at the
 * water plan's default use), toilet and shower, and gas or all-electric. What the layout does not
 * say is left at the typical brief's value. Always a valid brief (the brief schema decides).
 * Pure: must never import React, Next, the database or the services.
 */
import { kindFacts } from '../layout/kinds';
import { buildUpThickness, surfaceIn } from '../layout/bay';
import type { LayoutDoc } from '../layout/schema';
import { findBeds } from '../checks/beds';
import { resolveSettings } from '../checks/settings';
import { DEFAULT_L_PER_PERSON_DAY } from '../planning/water-plan';
import { gasInventory } from '../planning/gas-ventilation';
import { briefSchema, FRIDGE_UNITS, TYPICAL_BRIEF, type Brief, type FridgeSize } from './brief';
import { SIZES } from './patterns';

const clamp = (n: number, lo: number, hi: number) => Math.min(hi, Math.max(lo, Math.round(n)));

/** The smallest fridge class that holds the drawn fridge's litres (or its height when untyped). */
function fridgeClass(litres: number | undefined, height: number): Exclude<FridgeSize, 'none'> {
  const classes = Object.entries(FRIDGE_UNITS) as [Exclude<FridgeSize, 'none'>, (typeof FRIDGE_UNITS)['small']][];
  const fit = classes.find(([, u]) => (litres !== undefined ? litres <= u.litres : height <= u.height));
  return fit ? fit[0] : 'large';
}

export function briefFromLayout(doc: LayoutDoc): Brief {
  const kinds = new Set(doc.modules.map((m) => m.kind));
  const settings = resolveSettings(doc);
  const beds = findBeds(doc, buildUpThickness(doc), settings);
  const fromBeds = beds.flatMap((b) => Array.from({ length: Math.max(1, Math.floor(b.short / SIZES.perSleeperWidth)) }, () => TYPICAL_BRIEF.sleepers[0]));
  const sleepers = (doc.occupants.sleepers.length > 0 ? doc.occupants.sleepers : fromBeds.length > 0 ? fromBeds : TYPICAL_BRIEF.sleepers).slice(0, 6).map((s) => clamp(s, 900, 2300));
  const sleepPieces = doc.modules.filter((m) => surfaceIn(m, 'sleep') === 'sleep');
  const largest = beds[0];
  const bed: Brief['bed'] = sleepPieces.some((m) => m.kind === 'bench-seat') ? 'lounge' : largest ? (largest.lengthways ? 'lengthways' : 'across') : 'any';
  const counter = doc.modules.filter((m) => m.kind === 'kitchen-counter' || m.kind === 'sink-unit').reduce((s, m) => s + m.length, 0);
  const fridge = doc.modules.find((m) => m.kind === 'fridge');
  const freshLitres = doc.modules.reduce((s, m) => {
    const w = kindFacts(m).water;
    return w?.use === 'fresh' ? s + w.litres : s;
  }, 0);
  const people = clamp(doc.systems?.water?.persons ?? sleepers.length, 1, 8);
  // Gas aboard exactly when the gas checks say so (a hob burns gas unless its fuel says otherwise).
  const gas = gasInventory(doc).present;
  const seats = doc.modules.filter((m) => kindFacts(m).seat?.belted).length;
  const brief = {
    ...TYPICAL_BRIEF,
    bay: { source: 'measured' as const, bay: doc.bay },
    sleepers,
    standing: doc.occupants.standingHeight >= 900 ? clamp(doc.occupants.standingHeight, 900, 2300) : null,
    beltedSeats: clamp(seats, 0, 4),
    bed,
    kitchen: {
      counterMin: clamp(Math.floor(counter / 10) * 10, 0, 3000),
      sink: kinds.has('sink-unit'),
      hob: kinds.has('hob'),
      fridge: fridge ? fridgeClass((fridge.props as { litres?: number } | undefined)?.litres, fridge.height) : ('none' as const),
    },
    water: { days: freshLitres > 0 ? clamp(Math.floor(freshLitres / (people * DEFAULT_L_PER_PERSON_DAY)), 1, 14) : TYPICAL_BRIEF.water.days, people },
    toilet: kinds.has('toilet-cabinet'),
    shower: kinds.has('shower-tray'),
    fuel: gas ? ('gas' as const) : ('electric' as const),
  };
  return briefSchema.parse(brief);
}
