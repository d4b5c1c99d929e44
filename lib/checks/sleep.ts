/**
 * Sleep rules, in the sleep arrangement:
 *   sleep.length  each bed's clear rectangle, long side ≥ tallest sleeper on it + bedAllowance
 *                 (100 mm, common practice)
 *   sleep.width   short side ≥ bedWidthPerSleeper (600 mm, common practice) × sleepers on it
 *   sleep.level   pieces of one bed sit level within levelTolerance (20 mm, common practice)
 * One bed: everybody shares it. Several: sleepers, tallest first, go to the largest beds first,
 * as many as each bed's width holds (at least one each); whoever is left over shares the largest.
 * Every length and width message names the largest standard mattress (mattressRegion) that fits.
 * Pure: must never import UI, framework or database code.
 */
import { placeName, type Bed } from './beds';
import type { CheckContext } from './context';
import { formatMattress, mattressSource, MATTRESSES } from './mattress';
import { mm, plural } from './naming';
import { SOURCES } from './sources';
import type { Finding } from './types';

interface Assignment {
  bed: Bed;
  sleepers: number[];
}

export function assignSleepers(beds: Bed[], sleepers: number[], perSleeper: number): Assignment[] {
  const tallestFirst = [...sleepers].sort((a, b) => b - a);
  const out: Assignment[] = beds.map((bed) => ({ bed, sleepers: [] }));
  if (out.length === 0) return out;
  if (out.length === 1) {
    out[0].sleepers = tallestFirst;
    return out;
  }
  let next = 0;
  for (const a of out) {
    const capacity = Math.max(1, Math.floor(a.bed.short / perSleeper));
    while (a.sleepers.length < capacity && next < tallestFirst.length) a.sleepers.push(tallestFirst[next++]);
  }
  while (next < tallestFirst.length) out[0].sleepers.push(tallestFirst[next++]);
  out[0].sleepers.sort((a, b) => b - a);
  return out;
}

const bedName = placeName;

function mattressWords(ctx: CheckContext, bed: Bed): string {
  const region = ctx.settings.mattressRegion;
  const charts = mattressSource(region).brief;
  if (bed.mattress) return `It takes a ${formatMattress(bed.mattress)} slept ${bed.lengthways ? 'lengthways (along the van)' : 'across the van'} (${charts}).`;
  const smallest = MATTRESSES[region].reduce((a, b) => (a.width * a.length <= b.width * b.length ? a : b));
  const where = region === 'uk' ? 'UK' : region === 'eu' ? 'continental European' : 'US';
  return `None of the usual ${where} mattress sizes fits; the smallest, ${formatMattress(smallest)}, needs more room (${charts}). A mattress cut to size will.`;
}

export function sleepChecks(ctx: CheckContext): Finding[] {
  const { bedAllowance, bedWidthPerSleeper, levelTolerance, mattressRegion } = ctx.settings;
  const sleepers = ctx.doc.occupants.sleepers;
  const beds = ctx.beds();
  const arrangement = 'sleep' as const;
  const lengthSource = `${SOURCES.bedLength.cite}; ${mattressSource(mattressRegion).cite}`;
  const widthSource = `${SOURCES.bedWidth.cite}; ${mattressSource(mattressRegion).cite}`;
  const findings: Finding[] = [];

  if (beds.length === 0) {
    const need = sleepers.length === 0 ? 'no sleepers are listed either' : `${plural(sleepers.length, 'sleeper')} (${sleepers.map(mm).join(', ')}) need one`;
    for (const [id, source] of [['sleep.length', lengthSource], ['sleep.width', widthSource]] as const) {
      findings.push({ id, status: 'warn', arrangement, measured: 0, required: 1, unit: 'beds', message: `No bed is made up in the sleep arrangement (no module whose top is a bed there); ${need}. Set the bed modules’ top in sleep to “bed”. ${SOURCES.bedLength.brief}.`, source });
    }
    return findings;
  }

  const assigned = assignSleepers(beds, sleepers, bedWidthPerSleeper);
  for (const { bed, sleepers: on } of assigned) {
    const moduleIds = bed.pieces.map((m) => m.id);
    const name = bedName(bed, beds.length);
    if (bed.rect === null) {
      for (const [id, source] of [['sleep.length', lengthSource], ['sleep.width', widthSource]] as const) {
        findings.push({ id, status: 'warn', arrangement, moduleIds, measured: 0, required: 0, unit: 'mm', message: `${name} could not be measured: ${bed.problem ?? 'it has no area'}.`, source });
      }
    } else if (sleepers.length === 0) {
      const text = `${name} has a clear ${mm(bed.long)} × ${mm(bed.short)}, but no sleepers are listed in the occupants, so there is nothing to compare it with: add the sleepers’ statures. ${mattressWords(ctx, bed)}`;
      findings.push({ id: 'sleep.length', status: 'warn', arrangement, moduleIds, measured: bed.long, required: 0, unit: 'mm', message: text, source: lengthSource });
      findings.push({ id: 'sleep.width', status: 'warn', arrangement, moduleIds, measured: bed.short, required: 0, unit: 'mm', message: text, source: widthSource });
    } else if (on.length === 0) {
      const text = `${name} is a spare bed: every sleeper is placed on a larger one. Clear ${mm(bed.long)} × ${mm(bed.short)}. ${mattressWords(ctx, bed)}`;
      findings.push({ id: 'sleep.length', status: 'pass', arrangement, moduleIds, measured: bed.long, required: 0, unit: 'mm', message: text, source: lengthSource });
      findings.push({ id: 'sleep.width', status: 'pass', arrangement, moduleIds, measured: bed.short, required: 0, unit: 'mm', message: text, source: widthSource });
    } else {
      const who = `${plural(on.length, 'sleeper')} (${on.map(mm).join(', ')})`;
      const needLong = on[0] + bedAllowance;
      const longOk = bed.long >= needLong;
      findings.push({
        id: 'sleep.length',
        status: longOk ? 'pass' : 'fail',
        arrangement,
        moduleIds,
        measured: bed.long,
        required: needLong,
        unit: 'mm',
        message: `${name}, for ${who}: clear length ${mm(bed.long)} (lying ${bed.lengthways ? 'lengthways, along the van' : 'across the van'}); needs ${mm(needLong)} for the tallest (${mm(on[0])} + ${mm(bedAllowance)}). ${mattressWords(ctx, bed)} ${SOURCES.bedLength.brief}.`,
        source: lengthSource,
      });
      const needWide = bedWidthPerSleeper * on.length;
      findings.push({
        id: 'sleep.width',
        status: bed.short >= needWide ? 'pass' : 'fail',
        arrangement,
        moduleIds,
        measured: bed.short,
        required: needWide,
        unit: 'mm',
        message: `${name}, for ${who}: clear width ${mm(bed.short)}; needs ${mm(needWide)} (${mm(bedWidthPerSleeper)} per sleeper). ${mattressWords(ctx, bed)} ${SOURCES.bedWidth.brief}.`,
        source: widthSource,
      });
    }
    const levelOk = bed.levelDifference <= levelTolerance;
    findings.push({
      id: 'sleep.level',
      status: levelOk ? 'pass' : 'fail',
      arrangement,
      moduleIds,
      measured: bed.levelDifference,
      required: levelTolerance,
      unit: 'mm',
      message:
        bed.pieces.length === 1
          ? `${name} is one piece, so it is level with itself (0 mm; tolerance ${mm(levelTolerance)}). ${SOURCES.bedLevel.brief}.`
          : `${name}: the tops of its ${bed.pieces.length} pieces differ by ${mm(bed.levelDifference)}; they must be level within ${mm(levelTolerance)}${levelOk ? '' : ' — pack the low pieces up or cut the high ones down'}. ${SOURCES.bedLevel.brief}.`,
      source: SOURCES.bedLevel.cite,
    });
  }
  return findings;
}
