/**
 * A short build-planning summary of a layout for the plan sheet (and anything else that prints):
 * laden mass against the maximum authorised mass, axle loads against their limits, the payload
 * left, the 12 V balance by season with days of autonomy, and fresh/grey water days — as numbers
 * and as ready-worded lines with units. Missing inputs are named, never guessed.
 *
 * `buildPlanSummary(doc)` → `BuildPlanSummary`. Pure; never throws on a valid LayoutDoc. Must
 * never import UI, framework or database code.
 */
import type { LayoutDoc } from '../layout';
import { computeAxleLoads } from './axle-loads';
import { userPayloadRequired } from './payload';
import { powerBudget, type Season } from './power-budget';
import { COMFORT_DAYS_BETWEEN_FILLS, waterBasisWords, waterPlan } from './water-plan';
import { formatFixed, formatWhole } from '../format';

export interface BuildPlanSummary {
  mass: {
    totalKg: number;
    maxAuthorisedMassKg: number | null;
    frontKg: number | null;
    rearKg: number | null;
    maxFrontAxleKg: number | null;
    maxRearAxleKg: number | null;
    /** Maximum authorised mass less the van as built (null without both). */
    payloadLeftKg: number | null;
    /** EN 1646-2 user payload wanted (null without seats and length). */
    en1646PayloadKg: number | null;
    centreOfMass: { x: number; y: number } | null;
  };
  power: {
    dailyUseWh: number;
    seasons: { season: Season; netWh: number }[] | null;
    autonomyDays: number | null;
    batteryAh: number | null;
  };
  water: { freshL: number; greyL: number; days: number | null };
  /** What a reader should know is missing, by the inputs' on-screen labels. */
  missing: string[];
  /** The same, worded for a printed sheet: one line per topic, every number with its unit. */
  lines: { topic: 'Mass' | 'Axles' | 'Payload' | 'Power' | 'Water'; text: string; status: 'ok' | 'attention' | 'unknown' }[];
}

const SEASON_WORDS: Record<Season, string> = { summer: 'summer', shoulder: 'spring/autumn', winter: 'winter' };

function kg(n: number): string {
  return `${formatWhole(n)} kg`;
}

function signedWh(n: number): string {
  const r = Math.round(n);
  return `${r > 0 ? '+' : r < 0 ? '−' : ''}${formatWhole(Math.abs(r))} Wh`;
}

export function buildPlanSummary(doc: LayoutDoc): BuildPlanSummary {
  const v = doc.systems?.vehicle ?? {};
  const m = computeAxleLoads(doc);
  const p = powerBudget(doc);
  const w = waterPlan(doc);
  const payloadLeftKg = v.maxAuthorisedMassKg !== undefined && v.massInRunningOrderKg !== undefined ? v.maxAuthorisedMassKg - m.builtKg : null;
  const en1646PayloadKg = m.lengthM !== null ? userPayloadRequired(m.seats, m.lengthM) : null;
  const charged = p.battery !== null && p.missing.length === 0;
  const summary: BuildPlanSummary = {
    mass: {
      totalKg: m.totalKg,
      maxAuthorisedMassKg: v.maxAuthorisedMassKg ?? null,
      frontKg: m.axles?.frontKg ?? null,
      rearKg: m.axles?.rearKg ?? null,
      maxFrontAxleKg: v.maxFrontAxleKg ?? null,
      maxRearAxleKg: v.maxRearAxleKg ?? null,
      payloadLeftKg,
      en1646PayloadKg,
      centreOfMass: m.centreOfMass,
    },
    power: {
      dailyUseWh: p.dailyUseWh,
      seasons: charged ? p.seasons.map((s) => ({ season: s.season, netWh: s.netWh })) : null,
      autonomyDays: p.autonomyDays,
      batteryAh: p.battery?.capacityAh ?? null,
    },
    water: { freshL: w.freshL, greyL: w.greyL, days: w.days },
    missing: [...new Set([...m.missing, ...p.missing].map((n) => n.label))],
    lines: [],
  };

  const lines = summary.lines;
  if (v.massInRunningOrderKg === undefined) lines.push({ topic: 'Mass', status: 'unknown', text: `Modules and load ${kg(m.totalKg)}; enter the vehicle's mass in running order for the laden total.` });
  else if (v.maxAuthorisedMassKg === undefined) lines.push({ topic: 'Mass', status: 'unknown', text: `Laden ${kg(m.totalKg)}; maximum authorised mass not entered.` });
  else {
    const spare = v.maxAuthorisedMassKg - m.totalKg;
    lines.push({ topic: 'Mass', status: spare < 0 ? 'attention' : 'ok', text: `Laden ${kg(m.totalKg)} of ${kg(v.maxAuthorisedMassKg)} maximum authorised mass (${spare < 0 ? `${kg(-spare)} over` : `${kg(spare)} spare`}).` });
  }
  if (m.axles && v.maxFrontAxleKg !== undefined && v.maxRearAxleKg !== undefined) {
    const over = m.axles.frontKg > v.maxFrontAxleKg || m.axles.rearKg > v.maxRearAxleKg;
    lines.push({ topic: 'Axles', status: over ? 'attention' : 'ok', text: `Front ${kg(m.axles.frontKg)} of ${kg(v.maxFrontAxleKg)}, rear ${kg(m.axles.rearKg)} of ${kg(v.maxRearAxleKg)} (lever rule).` });
  } else lines.push({ topic: 'Axles', status: 'unknown', text: 'Axle loads need the wheelbase, front-axle position, its share in running order and both axle limits.' });
  if (payloadLeftKg !== null && en1646PayloadKg !== null) {
    lines.push({ topic: 'Payload', status: payloadLeftKg < en1646PayloadKg ? 'attention' : 'ok', text: `User payload left ${kg(payloadLeftKg)}; EN 1646-2 wants ${kg(en1646PayloadKg)} for ${m.seats} persons (EN 1646-2 and Reg. (EU) No 1230/2012).` });
  } else lines.push({ topic: 'Payload', status: 'unknown', text: 'Payload needs the mass in running order, the maximum authorised mass and the overall length.' });
  if (summary.power.seasons && p.battery) {
    const worst = summary.power.seasons.reduce((a, s) => (s.netWh < a.netWh ? s : a));
    lines.push({
      topic: 'Power',
      status: worst.netWh < 0 ? 'attention' : 'ok',
      text: `Uses ${formatWhole(p.dailyUseWh)} Wh a day; balance ${summary.power.seasons.map((s) => `${SEASON_WORDS[s.season]} ${signedWh(s.netWh)}`).join(', ')}; ${p.autonomyDays !== null && Number.isFinite(p.autonomyDays) ? `${p.autonomyDays.toFixed(1)} days` : 'unlimited days'} on the ${p.battery.capacityAh} Ah battery alone.`,
    });
  } else lines.push({ topic: 'Power', status: 'unknown', text: `Uses ${formatWhole(p.dailyUseWh)} Wh a day; enter the battery and charging for the balance.` });
  if (w.freshTankIds.length || w.greyTankIds.length) {
    lines.push({ topic: 'Water', status: w.days !== null && w.days < COMFORT_DAYS_BETWEEN_FILLS ? 'attention' : 'ok', text: `Fresh ${formatFixed(w.freshL, 1)} L, grey ${formatFixed(w.greyL, 1)} L (${waterBasisWords(w.freshBasis === w.greyBasis ? w.freshBasis : 'mixed')}); ${w.days !== null ? `${w.days.toFixed(1)} days` : 'no use entered'} at ${w.litresPerPersonPerDay} L per person a day for ${w.persons}.` });
  } else lines.push({ topic: 'Water', status: 'unknown', text: 'No water tanks drawn.' });
  return summary;
}
