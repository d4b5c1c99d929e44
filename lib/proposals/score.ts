/**
 * The figures a proposal is judged by — walkway width, free floor, bed size, storage volume, the
 * load's balance towards the front axle, counter length — measured from the checked document and
 * its check report, and the score of each on the brief's priorities, explained in words.
 * Pure: must never import React, Next, the database or the services.
 */
import { unionArea } from '../geometry/union';
import type { Rect } from '../geometry/rect';
import type { CheckReport } from '../checks/types';
import type { Bed } from '../checks/beds';
import { linedInterior, moduleRect } from '../layout/bay';
import type { LayoutDoc } from '../layout/schema';
import { moduleMassKg, tankLitres } from '../planning/module-facts';
import { WATER_KG_PER_L } from '../planning/axle-loads';
import type { Priority } from './brief';

export interface Figures {
  /** Narrowest walkway in travel and lounge, mm (from walkway.width). */
  walkwayMm: number;
  /** Lined floor not covered by anything standing on it in the lounge arrangement, m². */
  freeFloorM2: number;
  /** The largest bed's clear rectangle, mm. */
  bedLongMm: number;
  bedShortMm: number;
  mattress: string | null;
  /** Wardrobes, lockers, drawers and the room under the bed or benches not taken by services, litres. */
  storageL: number;
  /** How far the fitted load's centre of mass lies ahead of the rear axle (the wheel-arch centres), mm. */
  loadAheadOfRearAxleMm: number;
  /** Sink and worktop along the kitchen run, mm. */
  counterMm: number;
  freshL: number;
  greyL: number;
}

export type Metric = 'walkway' | 'floor' | 'bed' | 'storage' | 'balance' | 'counter';
export const METRIC_WORDS: Record<Metric, string> = {
  walkway: 'Walkway',
  floor: 'Free floor',
  bed: 'Bed size',
  storage: 'Storage',
  balance: 'Weight balance',
  counter: 'Counter',
};
const PRIORITY_METRIC: Record<Priority, Metric[]> = {
  floor: ['floor', 'walkway'],
  bed: ['bed'],
  storage: ['storage'],
  balance: ['balance'],
};

export interface Score {
  metric: Metric;
  /** 0–100 within this brief's passing candidates. */
  points: number;
  weight: number;
  words: string;
}

const STORAGE_KINDS = new Set(['wardrobe', 'overhead-locker', 'drawer-unit']);

export function figuresOf(doc: LayoutDoc, report: CheckReport, beds: Bed[]): Figures {
  const walkway = report.findings.filter((f) => f.id === 'walkway.width' && typeof f.measured === 'number').map((f) => f.measured as number);
  const lined = linedInterior(doc);
  const blocking: Rect[] = doc.modules.filter((m) => m.arrangements.includes('lounge') && m.elevation < 1000).map(moduleRect);
  const linedArea = (lined.x1 - lined.x0) * (lined.y1 - lined.y0);
  const freeFloor = Math.max(0, linedArea - unionArea(blocking)) / 1e6;
  const bed = beds[0];
  let storage = 0;
  for (const m of doc.modules) {
    if (STORAGE_KINDS.has(m.kind)) storage += (m.length * m.width * m.height) / 1e6;
    if (m.surface === 'sleep' && m.kind !== 'bed-infill' && m.elevation > 0) storage += (m.length * m.width * m.elevation) / 1e6;
  }
  let services = 0;
  for (const m of doc.modules) if (m.elevation === 0 && ['fresh-water-tank', 'grey-water-tank', 'electrics-bay', 'heater'].includes(m.kind)) services += (m.length * m.width * m.height) / 1e6;
  // Load centre: module masses plus fresh water carried full (the weight plan's travel case).
  let mass = 0, moment = 0;
  for (const m of doc.modules) {
    const kg = moduleMassKg(m) + (m.kind === 'fresh-water-tank' ? tankLitres(m) * WATER_KG_PER_L : 0);
    mass += kg;
    moment += kg * (m.x + m.length / 2);
  }
  const arches = doc.bay.wheelArches;
  const rearAxle = arches.length ? arches.reduce((s, a) => s + a.x + a.length / 2, 0) / arches.length : doc.bay.length;
  const centre = mass > 0 ? moment / mass : 0;
  // Along the wall the run stands against: x for a unit worked from the side, y for one worked from the front or rear.
  const counter = doc.modules.filter((m) => m.kind === 'kitchen-counter' || m.kind === 'sink-unit').reduce((s, m) => s + (m.facing === 'left' || m.facing === 'right' ? m.length : m.width), 0);
  return {
    walkwayMm: walkway.length ? Math.min(...walkway) : 0,
    freeFloorM2: Math.round(freeFloor * 100) / 100,
    bedLongMm: bed?.long ?? 0,
    bedShortMm: bed?.short ?? 0,
    mattress: bed?.mattress?.name ?? null,
    storageL: Math.round(Math.max(0, storage - services)),
    loadAheadOfRearAxleMm: Math.round(rearAxle - centre),
    counterMm: counter,
    freshL: doc.modules.filter((m) => m.kind === 'fresh-water-tank').reduce((s, m) => s + tankLitres(m), 0),
    greyL: doc.modules.filter((m) => m.kind === 'grey-water-tank').reduce((s, m) => s + tankLitres(m), 0),
  };
}

const VALUE: Record<Metric, (f: Figures) => number> = {
  walkway: (f) => f.walkwayMm,
  floor: (f) => f.freeFloorM2,
  bed: (f) => f.bedLongMm * f.bedShortMm,
  storage: (f) => f.storageL,
  balance: (f) => f.loadAheadOfRearAxleMm,
  counter: (f) => f.counterMm,
};

function words(metric: Metric, f: Figures, best: Figures): string {
  switch (metric) {
    case 'walkway':
      return `The walkway is ${f.walkwayMm} mm at its narrowest (widest among these proposals: ${best.walkwayMm} mm).`;
    case 'floor':
      return `${f.freeFloorM2.toFixed(2)} m² of floor is free in the lounge arrangement (most among these: ${best.freeFloorM2.toFixed(2)} m²).`;
    case 'bed':
      return `The bed is ${f.bedLongMm} × ${f.bedShortMm} mm clear${f.mattress ? `, taking a ${f.mattress}` : ''} (largest among these: ${best.bedLongMm} × ${best.bedShortMm} mm).`;
    case 'storage':
      return `About ${f.storageL} L of storage in wardrobes, lockers and under the bed or benches (most among these: ${best.storageL} L).`;
    case 'balance':
      return `The fitted load's centre (with the fresh tank full) is ${f.loadAheadOfRearAxleMm} mm ahead of the rear axle, taken at the wheel-arch centres — the further forward, the more rides on the front axle (furthest forward among these: ${best.loadAheadOfRearAxleMm} mm).`;
    case 'counter':
      return `${f.counterMm} mm of sink and worktop (longest among these: ${best.counterMm} mm).`;
  }
}

/**
 * Scores each candidate 0–100 per metric against the best and worst of the passing candidates;
 * the brief's priority counts three times, every other metric once.
 */
export function scoreAll(all: Figures[], priority: Priority): { scores: Score[]; total: number }[] {
  const metrics = Object.keys(VALUE) as Metric[];
  const range = Object.fromEntries(metrics.map((m) => {
    const v = all.map(VALUE[m]);
    return [m, { lo: Math.min(...v), hi: Math.max(...v), best: all[v.indexOf(Math.max(...v))] }];
  })) as Record<Metric, { lo: number; hi: number; best: Figures }>;
  return all.map((f) => {
    const scores = metrics.map((m): Score => {
      const { lo, hi, best } = range[m];
      const points = hi > lo ? Math.round(((VALUE[m](f) - lo) / (hi - lo)) * 100) : 100;
      return { metric: m, points, weight: PRIORITY_METRIC[priority].includes(m) ? 3 : 1, words: words(m, f, best) };
    });
    const weight = scores.reduce((s, x) => s + x.weight, 0);
    return { scores, total: Math.round(scores.reduce((s, x) => s + x.points * x.weight, 0) / weight) };
  });
}
