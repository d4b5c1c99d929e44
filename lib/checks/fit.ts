/**
 * Fit rules — does every module physically fit where it is drawn?
 *   fit.inside     footprint inside the lined interior, top under the lined roof
 *   fit.wheel-arch a module over a wheel arch clears the arch box
 *   fit.overlap    no two solid modules share space in an arrangement they both exist in
 * All three are plain geometry of the layout (SOURCES.geometry / wheelArch / overlap); a value
 * exactly at its limit passes. Pure: must never import UI, framework or database code.
 */
import { intervalOverlap, overlappingPairs, rectsOverlap } from '../geometry';
import { ARRANGEMENTS } from '../layout/vocabulary';
import type { Arrangement, LayoutDoc, Module } from '../layout/schema';
import { archBoxes, moduleRect, topAboveBare, undersideAboveBare, type BuildUpThickness } from './bayModel';
import { listNames, mm, moduleName, plural } from './naming';
import { SOURCES } from './sources';
import type { Finding } from './types';

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
  return ARRANGEMENTS.filter((x) => a.arrangements.includes(x) && b.arrangements.includes(x));
}

export function fitOverlap(doc: LayoutDoc): Finding[] {
  const mods = doc.modules;
  const rects = mods.map(moduleRect);
  const pairs = overlappingPairs(rects, (i, j) => {
    const a = mods[i], b = mods[j];
    const heightsOverlap = a.elevation < b.elevation + b.height && b.elevation < a.elevation + a.height;
    return heightsOverlap && commonArrangements(a, b).length > 0;
  });
  const findings: Finding[] = pairs.map(([i, j]) => {
    const a = mods[i], b = mods[j];
    const ra = rects[i], rb = rects[j];
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
  });
  if (findings.length === 0) {
    findings.push({
      id: 'fit.overlap',
      status: 'pass',
      measured: 0,
      required: 0,
      unit: 'pairs',
      message: `No two modules share space in any arrangement (${plural(mods.length, 'module')} checked). ${SOURCES.overlap.brief}.`,
      source: SOURCES.overlap.cite,
    });
  }
  return findings;
}
