/**
 * Standard mattress sizes per region, and which of them fits a bed's clear rectangle. UK and EU
 * sizes are published in centimetres; US sizes in inches, converted here with the convert-units
 * library (not by hand) and kept to 0.1 mm. Sources beside each table (SOURCES.mattress*).
 * Pure: must never import UI, framework or database code.
 */
import convert from 'convert-units';
import type { MattressRegion } from '../layout/schema';
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
/** Inches to millimetres through convert-units, rounded to 0.1 mm (the library's own factor chain adds float noise). */
export function inchesToMm(inches: number): number {
  return Math.round(convert(inches).from('in').to('mm') * 10) / 10;
}

// UK — SOURCES.mattressUk (published UK bed size charts)
const UK: Mattress[] = [
  { region: 'uk', name: 'UK single', width: cm(90), length: cm(190) },
  { region: 'uk', name: 'UK small double', width: cm(120), length: cm(190) },
  { region: 'uk', name: 'UK double', width: cm(135), length: cm(190) },
  { region: 'uk', name: 'UK king', width: cm(150), length: cm(200) },
  { region: 'uk', name: 'UK super king', width: cm(180), length: cm(200) },
];
// EU — SOURCES.mattressEu (published continental size charts)
const EU: Mattress[] = [
  { region: 'eu', name: 'EU single', width: cm(90), length: cm(200) },
  { region: 'eu', name: 'EU double', width: cm(140), length: cm(200) },
  { region: 'eu', name: 'EU king', width: cm(160), length: cm(200) },
  { region: 'eu', name: 'EU super king', width: cm(180), length: cm(200) },
];
// US — SOURCES.mattressUs (Better Sleep Council chart), inches converted with convert-units
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
