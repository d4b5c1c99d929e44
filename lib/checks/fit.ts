/**
 * Fit rules — does every module physically fit where it is drawn?
 *   fit.inside     footprint inside the lined interior, top under the lined roof
 *   fit.wheel-arch a module over a wheel arch clears the arch box
 *   fit.overlap    no two solid modules share space in an arrangement they both exist in
 * All three are plain geometry of the layout (SOURCES.geometry / wheelArch / overlap); a value
 * exactly at its limit passes. Pure: must never import UI, framework or database code.
 */
import { intervalOverlap, overlapGroups, rectsOverlap } from '../geometry';
import { ARRANGEMENTS } from '../layout/vocabulary';
import type { Arrangement, LayoutDoc, Module } from '../layout/schema';
import { archBoxes, moduleRect, topAboveBare, undersideAboveBare, type BuildUpThickness } from '../layout/bay';
import { listNames, mm, moduleName, plural } from './naming';
import { SOURCES } from './sources';
import type { Finding } from './types';
import { inArrangement } from '../layout/bay';
import { formatWhole } from '../format';

export function fitInside(doc: LayoutDoc, t: BuildUpThickness): Finding[] {
  const { length: L, width: W, height: H } = doc.bay;
  const ceiling = H - t.roofT;
  const findings: Finding[] = [];
  let tightest: { m: Module; margin: number } | undefined;
  for (const m of doc.modules) {
    const sides: Array<[string, number]> = [
      ['into the left wall lining', m.y - t.wallT],
      ['into the right wall lining', W - t.wallT - (m.y + m.width)],
      ['past the front of the bay', m.x],
      ['past the rear of the bay', L - (m.x + m.length)],
      [`through the lined roof (top ${mm(topAboveBare(m, t.floorT))} above the bare floor, lined roof at ${mm(ceiling)})`, ceiling - topAboveBare(m, t.floorT)],
    ];
    const margin = Math.min(...sides.map(([, v]) => v));
    if (margin < 0) {
      const where = sides.filter(([, v]) => v < 0).map(([s, v]) => `${mm(-v)} ${s}`);
      findings.push({
        id: 'fit.inside',
        status: 'fail',
        moduleIds: [m.id],
        measured: margin,
        required: 0,
        unit: 'mm',
        message: `${moduleName(m)} sticks out ${listNames(where)}; it must stay inside the lined interior (${mm(t.wallT)} wall and ${mm(t.roofT)} roof build-up). ${SOURCES.geometry.brief}.`,
        source: SOURCES.geometry.cite,
      });
    } else if (!tightest || margin < tightest.margin) {
      tightest = { m, margin };
    }
  }
  if (findings.length === 0) {
    findings.push({
      id: 'fit.inside',
      status: 'pass',
      measured: tightest?.margin ?? 0,
      required: 0,
      unit: 'mm',
      message: tightest
        ? `All ${plural(doc.modules.length, 'module')} sit inside the lined interior; the tightest, ${moduleName(tightest.m)}, has ${mm(tightest.margin)} to spare (needs 0 mm or more). ${SOURCES.geometry.brief}.`
        : `No modules placed yet, so nothing can stick out of the lined interior. ${SOURCES.geometry.brief}.`,
      source: SOURCES.geometry.cite,
    });
  }
  return findings;
}

export function fitWheelArch(doc: LayoutDoc, t: BuildUpThickness): Finding[] {
  const arches = archBoxes(doc);
  const findings: Finding[] = [];
  let over = 0;
  let lowest: { m: Module; underside: number; arch: number } | undefined;
  for (const m of doc.modules) {
    const r = moduleRect(m);
    const underside = undersideAboveBare(m, t.floorT);
    const hit = arches.filter((a) => rectsOverlap(r, a.rect));
    if (hit.length === 0) continue;
    over++;
    const worst = hit.reduce((a, b) => (b.height > a.height ? b : a));
    if (underside < worst.height) {
      findings.push({
        id: 'fit.wheel-arch',
        status: 'fail',
        moduleIds: [m.id],
        measured: underside,
        required: worst.height,
        unit: 'mm',
        message: `${moduleName(m)} stands over the ${worst.side} wheel arch with its underside ${mm(underside)} above the bare floor (${mm(t.floorT)} floor build-up + ${mm(m.elevation)} elevation); the arch box is ${mm(worst.height)} high — raise it by ${mm(worst.height - underside)} or move it off the arch. ${SOURCES.wheelArch.brief}.`,
        source: SOURCES.wheelArch.cite,
      });
    } else if (!lowest || underside - worst.height < lowest.underside - lowest.arch) {
      lowest = { m, underside, arch: worst.height };
    }
  }
  if (findings.length === 0) {
    findings.push(
      lowest
        ? {
            id: 'fit.wheel-arch',
            status: 'pass',
            measured: lowest.underside,
            required: lowest.arch,
            unit: 'mm',
            message: `${plural(over, 'module')} over the wheel arches clear them; the closest, ${moduleName(lowest.m)}, has its underside ${mm(lowest.underside)} above the bare floor over a ${mm(lowest.arch)} arch. ${SOURCES.wheelArch.brief}.`,
            source: SOURCES.wheelArch.cite,
          }
        : {
            id: 'fit.wheel-arch',
            status: 'pass',
            measured: 0,
            required: 0,
            unit: 'modules',
            message: `No module stands over a wheel arch (${plural(arches.length, 'arch', 'arches')} in the bay). ${SOURCES.wheelArch.brief}.`,
            source: SOURCES.wheelArch.cite,
          },
    );
  }
  return findings;
}

function commonArrangements(a: Module, b: Module): Arrangement[] {
  return ARRANGEMENTS.filter((x) => inArrangement(a, x) && inArrangement(b, x));
}

/**
 * Bounds on the overlap rule's work and words (common practice, no source: sized so a layout of
 * the schema's 5,000 modules answers in well under a second with a report of a few hundred KB).
 * Pairs compared: a real interior has a handful of neighbours per module; a pile has n².
 */
export const OVERLAP_LIMITS = {
  /** Candidate pairs the rule may compare, per module (plus a fixed allowance). */
  pairsPerModule: 48,
  pairsAllowance: 20_000,
  /** Module ids a cluster finding carries. */
  idsPerCluster: 200,
} as const;

function heightsOverlap(a: Module, b: Module): boolean {
  return a.elevation < b.elevation + b.height && b.elevation < a.elevation + a.height;
}

/** Modules drawn identically (same box, same arrangements) overlap each other wholly; they are compared once. */
function twinKey(m: Module): string {
  return `${m.x},${m.y},${m.length},${m.width},${m.elevation},${m.height},${ARRANGEMENTS.filter((a) => inArrangement(m, a)).join('+')}`;
}

function pairFinding(a: Module, b: Module): Finding {
  const ra = moduleRect(a), rb = moduleRect(b);
  const ox = intervalOverlap(ra.x0, ra.x1, rb.x0, rb.x1);
  const oy = intervalOverlap(ra.y0, ra.y1, rb.y0, rb.y1);
  const z0 = Math.max(a.elevation, b.elevation);
  const z1 = Math.min(a.elevation + a.height, b.elevation + b.height);
  const common = commonArrangements(a, b);
  return {
    id: 'fit.overlap',
    status: 'fail',
    ...(common.length === 1 ? { arrangement: common[0] } : {}),
    moduleIds: [a.id, b.id],
    measured: Math.min(ox, oy),
    required: 0,
    unit: 'mm',
    message: `${moduleName(a)} and ${moduleName(b)} overlap by ${mm(ox)} × ${mm(oy)} in plan and share heights ${mm(z0)}–${mm(z1)} above the floor, in ${listNames(common)}; move one at least ${mm(Math.min(ox, oy))} or stack them. ${SOURCES.overlap.brief}.`,
    source: SOURCES.overlap.cite,
  };
}

/** One finding for a cluster of three or more modules chained together by overlaps. */
function clusterFinding(members: Module[], deepA: Module, deepB: Module): Finding {
  const ra = moduleRect(deepA), rb = moduleRect(deepB);
  const ox = intervalOverlap(ra.x0, ra.x1, rb.x0, rb.x1);
  const oy = intervalOverlap(ra.y0, ra.y1, rb.y0, rb.y1);
  const arrangements = ARRANGEMENTS.filter((x) => members.filter((m) => inArrangement(m, x)).length >= 2);
  const shown = members.slice(0, OVERLAP_LIMITS.idsPerCluster);
  return {
    id: 'fit.overlap',
    status: 'fail',
    ...(arrangements.length === 1 ? { arrangement: arrangements[0] } : {}),
    moduleIds: shown.map((m) => m.id),
    measured: Math.min(ox, oy),
    required: 0,
    unit: 'mm',
    message: `${plural(members.length, 'module')} form one cluster, each overlapping at least one other (${members.length > 4 ? `${members.slice(0, 4).map(moduleName).join(', ')} and ${members.length - 4} more` : listNames(members.map(moduleName))}), in ${listNames(arrangements)}; the deepest overlap, ${moduleName(deepA)} into ${moduleName(deepB)}, is ${mm(ox)} × ${mm(oy)} in plan. Pull them apart or stack them.${members.length > shown.length ? ` The first ${shown.length} are marked on the plan.` : ''} ${SOURCES.overlap.brief}.`,
    source: SOURCES.overlap.cite,
  };
}

/**
 * fit.overlap: one finding per pair when just two modules clash, one per cluster when more are
 * chained together — so the report grows with the module count, never with the number of pairs.
 * Work is bounded too: identically drawn modules are compared once, and at most
 * OVERLAP_LIMITS pairs are compared; when that runs out one more finding says so.
 */
export function fitOverlap(doc: LayoutDoc): Finding[] {
  const all = doc.modules;
  // One representative per identically drawn group; the twins join its cluster unexamined.
  const repIndex = new Map<string, number>();
  const reps: Module[] = [];
  const twins: Module[][] = [];
  for (const m of all) {
    const key = twinKey(m);
    const r = repIndex.get(key);
    if (r === undefined) {
      repIndex.set(key, reps.length);
      reps.push(m);
      twins.push([m]);
    } else twins[r].push(m);
  }
  const rects = reps.map(moduleRect);
  const budget = OVERLAP_LIMITS.pairsAllowance + OVERLAP_LIMITS.pairsPerModule * all.length;
  const found = overlapGroups(
    rects,
    (i, j) => heightsOverlap(reps[i], reps[j]) && commonArrangements(reps[i], reps[j]).length > 0,
    (i, j) => Math.min(intervalOverlap(rects[i].x0, rects[i].x1, rects[j].x0, rects[j].x1), intervalOverlap(rects[i].y0, rects[i].y1, rects[j].y0, rects[j].y1)),
    budget,
  );
  const clustered = new Uint8Array(reps.length);
  const clusters: number[][] = [];
  for (const g of found.groups) {
    for (const i of g) clustered[i] = 1;
    clusters.push(g);
  }
  // A group of twins that overlaps nothing else is a cluster of its own.
  twins.forEach((t, i) => {
    if (t.length > 1 && !clustered[i]) clusters.push([i]);
  });
  clusters.sort((a, b) => a[0] - b[0]);

  const findings: Finding[] = clusters.map((g) => {
    const members = g.flatMap((i) => twins[i]);
    if (members.length === 2) return pairFinding(members[0], members[1]);
    // The deepest overlap in the cluster: between two representatives, or a module and its twin.
    let a = members[0], b = members[1], best = -Infinity;
    for (const i of g) {
      const j = found.deepestPartner[i];
      const r = rects[i];
      const d = j >= 0 ? Math.min(intervalOverlap(r.x0, r.x1, rects[j].x0, rects[j].x1), intervalOverlap(r.y0, r.y1, rects[j].y0, rects[j].y1)) : -Infinity;
      const self = twins[i].length > 1 ? Math.min(r.x1 - r.x0, r.y1 - r.y0) : -Infinity;
      if (self > best) {
        best = self;
        a = twins[i][0];
        b = twins[i][1];
      }
      if (d > best) {
        best = d;
        a = reps[i];
        b = reps[j];
      }
    }
    return clusterFinding(members, a, b);
  });
  if (!found.complete) {
    findings.push({
      id: 'fit.overlap',
      status: 'fail',
      measured: found.examined,
      required: budget,
      unit: 'pairs',
      message: `So many modules are piled on top of one another that the overlap check stopped after comparing ${formatWhole(found.examined)} pairs (the limit for ${plural(all.length, 'module')}); the piles found so far are listed, others may remain. Pull the piled-up modules apart and check again. ${SOURCES.overlap.brief}.`,
      source: SOURCES.overlap.cite,
    });
  }
  if (findings.length === 0) {
    findings.push({
      id: 'fit.overlap',
      status: 'pass',
      measured: 0,
      required: 0,
      unit: 'pairs',
      message: `No two modules share space in any arrangement (${plural(all.length, 'module')} checked). ${SOURCES.overlap.brief}.`,
      source: SOURCES.overlap.cite,
    });
  }
  return findings;
}
