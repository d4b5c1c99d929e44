/**
 * Standard mattress sizes per region, and which of them fits a bed's clear rectangle. UK and EU
 * sizes are sold in centimetres; US sizes in inches, at 25.4 mm to the inch exactly (the one
 * conversion constant, `MM_PER_INCH` in lib/layout/units) and kept to 0.1 mm. Sources beside each
 * table (SOURCES.mattress*): trade sizes, common practice. Pure: must never import UI, framework
 * or database code.
 */
import type { MattressRegion } from '../layout/schema';
import { MM_PER_INCH } from '../layout/units';
import { SOURCES, type Source } from './sources';

export interface Mattress {
  region: MattressRegion;
  name: string;
  /** Across the sleeper, mm. */
  width: number;
  /** Head to foot, mm. */
  length: number;
}

const cm = (n: number) => n * 10;
/** Inches to millimetres (25.4 mm to the inch), rounded to 0.1 mm. */
export function inchesToMm(inches: number): number {
  return Math.round(inches * MM_PER_INCH * 10) / 10;
}

// UK — SOURCES.mattressUk (trade sizes, common practice)
const UK: Mattress[] = [
  { region: 'uk', name: 'UK single', width: cm(90), length: cm(190) },
  { region: 'uk', name: 'UK small double', width: cm(120), length: cm(190) },
  { region: 'uk', name: 'UK double', width: cm(135), length: cm(190) },
  { region: 'uk', name: 'UK king', width: cm(150), length: cm(200) },
  { region: 'uk', name: 'UK super king', width: cm(180), length: cm(200) },
];
// EU — SOURCES.mattressEu (trade sizes, common practice)
const EU: Mattress[] = [
  { region: 'eu', name: 'EU single', width: cm(90), length: cm(200) },
  { region: 'eu', name: 'EU double', width: cm(140), length: cm(200) },
  { region: 'eu', name: 'EU king', width: cm(160), length: cm(200) },
  { region: 'eu', name: 'EU super king', width: cm(180), length: cm(200) },
];
// US — SOURCES.mattressUs (trade sizes, common practice), in inches
const US: Mattress[] = (
  [
    ['US twin', 38, 75],
    ['US full', 54, 75],
    ['US queen', 60, 80],
    ['US king', 76, 80],
    ['US California king', 72, 84],
  ] as const
).map(([name, w, l]) => ({ region: 'us' as const, name, width: inchesToMm(w), length: inchesToMm(l) }));

export const MATTRESSES: Record<MattressRegion, readonly Mattress[]> = { uk: UK, eu: EU, us: US };

export function mattressSource(region: MattressRegion): Source {
  return region === 'uk' ? SOURCES.mattressUk : region === 'eu' ? SOURCES.mattressEu : SOURCES.mattressUs;
}

/** The largest (by area) standard mattress of the region that fits a `long` × `short` rectangle, or undefined. */
export function largestFittingMattress(region: MattressRegion, long: number, short: number): Mattress | undefined {
  let best: Mattress | undefined;
  for (const m of MATTRESSES[region]) {
    if (m.width <= short && m.length <= long && (!best || m.width * m.length > best.width * best.length)) best = m;
  }
  return best;
}

export function formatMattress(m: Mattress): string {
  const n = (v: number) => (Number.isInteger(v) ? String(v) : v.toFixed(1));
  return `${m.name} (${n(m.width)} × ${n(m.length)} mm)`;
}
