/**
 * fit.solar — the solar panels on the roof (modules of a kind with a rated power, mounted on the
 * roof), measured in plan on the bay's roof (0…bay.length × 0…bay.width, the plan the roof
 * modules are placed in):
 *   edge      per panel: its distance to the nearest roof edge, at least SOLAR_FIT.edgeMargin
 *             (50 mm) so it stays on the flat usable area and its frame can be fixed; closer
 *             needs attention, past the edge does not meet
 *   openings  per panel, when roof openings are drawn: its distance to the nearest edge of every
 *             roof vent, fan or skylight, at least SOLAR_FIT.openingClearance (100 mm) so the
 *             opening can open and is not shaded by it, nor shades it; closer needs attention,
 *             covering the opening does not meet
 *   overlap   per pair of a panel and another roof-mounted module (another panel, a roof box, a rail)
 *             that share area in plan: does not meet (touching edges are fine)
 * Both figures are common practice, no source (SOURCES.solarEdge, solarOpening). Distances are
 * straight lines in plan, whole millimetres rounded down (so they err short). Arrangements do not
 * matter on the roof: what is fixed there is there in all of them.
 *
 * Bounded: openings are at most 64 (the schema), so the opening part is 64 steps a panel; the
 * overlap part sorts the roof modules by their front edge and sweeps, comparing a module only with
 * those still open along x, charging SOLAR_FIT work steps per comparison against a budget of
 * n log n — a pile of panels on one spot stops with a finding saying so, never runs quadratic.
 * Pure: must never import UI, framework or database code.
 */
import { intervalOverlap, rectGap, rectsOverlap, WorkBudget, WorkLimitError, type Rect } from '../geometry';
import { kindFacts } from '../layout/kinds';
import { moduleRect, outsideModules } from '../layout/bay';
import { openingName, roofOpeningRect, roofOpenings } from '../layout/openings';
import type { LayoutDoc, Module } from '../layout/schema';
import { listNames, mm, moduleName } from './naming';
import { SOURCES } from './sources';
import type { Finding } from './types';

/** The figures fit.solar compares against (see SOURCES.solarEdge, solarOpening). */
export const SOLAR_FIT = Object.freeze({
  /** Distance kept from every roof edge, mm: common practice, no source. */
  edgeMargin: 50,
  /** Distance kept around every roof vent, fan and skylight, mm: common practice, no source. */
  openingClearance: 100,
  /** Work for the overlap sweep: steps per roof module (× log2 n) and a base (common practice, no source). */
  workPerModule: 64,
  workBase: 20_000,
  /** Overlapping pairs worded one by one; more are counted in one finding (the report lists 40 a rule anyway). */
  overlapsListed: 40,
});

/** A module counts as a solar panel when its kind gives a rated power. */
export function isSolarPanel(m: Module): boolean {
  return kindFacts(m).solarPanel !== undefined;
}

/** A panel in words: its label, else "the solar panel at 800 mm from the front, 60 mm from the left" (two panels are never both just "Solar panel"). */
function panelName(m: Module): string {
  if (m.label?.trim()) return m.label.trim();
  return `the ${moduleName(m).toLowerCase()} at ${mm(m.x)} from the front, ${mm(m.y)} from the left`;
}
const capital = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

export function fitSolar(doc: LayoutDoc): Finding[] {
  const onRoof = outsideModules(doc).filter((m) => m.mount === 'roof');
  const panels = onRoof.filter(isSolarPanel);
  if (panels.length === 0) return [];
  return [...panels.map((p) => edgeFinding(doc, p)), ...openingFindings(doc, panels), ...overlapFindings(onRoof)];
}

function edgeFinding(doc: LayoutDoc, p: Module): Finding {
  const r = moduleRect(p);
  const sides = [
    { d: r.x0, where: 'the front edge' },
    { d: doc.bay.length - r.x1, where: 'the rear edge' },
    { d: r.y0, where: 'the left edge' },
    { d: doc.bay.width - r.y1, where: 'the right edge' },
  ];
  const nearest = sides.reduce((a, b) => (b.d < a.d ? b : a));
  const measured = Math.floor(nearest.d);
  const need = SOLAR_FIT.edgeMargin;
  const status = measured < 0 ? 'fail' : measured < need ? 'warn' : 'pass';
  const said = status === 'fail'
    ? `reaches ${mm(-measured)} past ${nearest.where} of the roof: move it onto the roof, at least ${mm(need)} in from every edge`
    : status === 'warn'
      ? `is ${mm(measured)} from ${nearest.where} of the roof, ${mm(need - measured)} closer than the ${mm(need)} kept clear at every roof edge: move it in`
      : `is ${mm(measured)} from the nearest roof edge (${nearest.where}), within the usable roof after the ${mm(need)} kept at every edge`;
  return {
    id: 'fit.solar',
    status,
    moduleIds: [p.id],
    measured,
    required: need,
    unit: 'mm',
    message: `${capital(panelName(p))} ${said}. ${SOURCES.solarEdge.brief}.`,
    source: SOURCES.solarEdge.cite,
  };
}

function openingFindings(doc: LayoutDoc, panels: Module[]): Finding[] {
  const openings = roofOpenings(doc.bay).map((o) => ({ o, r: roofOpeningRect(o) }));
  if (openings.length === 0) return [];
  const need = SOLAR_FIT.openingClearance;
  return panels.map((p): Finding => {
    const r = moduleRect(p);
    const measuredTo = openings.map(({ o, r: or }) => ({ o, covers: rectsOverlap(r, or), d: Math.floor(rectGap(r, or)) }));
    const covered = measuredTo.filter((x) => x.covers);
    const near = measuredTo.filter((x) => !x.covers && x.d < need);
    const nearest = measuredTo.reduce((a, b) => (b.d < a.d ? b : a));
    const name = capital(panelName(p));
    const base = { id: 'fit.solar', moduleIds: [p.id], required: need, unit: 'mm', source: SOURCES.solarOpening.cite };
    if (covered.length || near.length) {
      const problems = [
        ...(covered.length ? [`it covers ${listNames(covered.map((x) => openingName(doc.bay, x.o)))}, which then can neither open nor let light and air in`] : []),
        ...(near.length ? [`it is ${listNames(near.map((x) => `${mm(x.d)} from ${openingName(doc.bay, x.o)}`))}, closer than the ${mm(need)} kept clear around a roof opening so it can open and is not shaded`] : []),
      ];
      const openingIds = [...covered, ...near].map((x) => x.o.id);
      return {
        ...base,
        status: covered.length ? 'fail' : 'warn',
        openingIds,
        measured: covered.length ? 0 : Math.min(...near.map((x) => x.d)),
        message: `${name}: ${problems.join('; ')}. Move the panel or the opening. ${SOURCES.solarOpening.brief}.`,
      };
    }
    return {
      ...base,
      status: 'pass',
      openingIds: [nearest.o.id],
      measured: nearest.d,
      message: `${name} is ${mm(nearest.d)} from the nearest roof opening (${openingName(doc.bay, nearest.o)}), at least the ${mm(need)} kept clear around each. ${SOURCES.solarOpening.brief}.`,
    };
  });
}

/** Pairs of a panel and another roof module sharing area in plan, by a sweep along x. */
function overlapFindings(onRoof: Module[]): Finding[] {
  const items = onRoof.map((m) => ({ m, r: moduleRect(m), panel: isSolarPanel(m) })).sort((a, b) => a.r.x0 - b.r.x0);
  const budget = WorkBudget.forItems(items.length, SOLAR_FIT.workPerModule, SOLAR_FIT.workBase);
  const out: Finding[] = [];
  const unlisted = { pairs: 0, ids: new Set<string>() };
  let open: typeof items = [];
  try {
    for (const it of items) {
      open = open.filter((o) => o.r.x1 > it.r.x0);
      budget.spend(open.length + 1);
      for (const o of open) {
        if (!(it.panel || o.panel) || !rectsOverlap(it.r, o.r)) continue;
        if (out.length < SOLAR_FIT.overlapsListed) out.push(overlapFinding(o.m, o.r, it.m, it.r));
        else {
          unlisted.pairs++;
          if (unlisted.ids.size < 200) unlisted.ids.add(o.m.id).add(it.m.id);
        }
      }
      open.push(it);
    }
  } catch (e) {
    if (!(e instanceof WorkLimitError)) throw e;
    out.push({
      id: 'fit.solar',
      status: 'warn',
      measured: budget.used,
      required: budget.limit,
      unit: 'steps',
      message: `So many modules are piled on one spot of the roof that the check for solar panels overlapping stopped (${e.message}); the overlaps found so far are listed, others may remain. Pull the roof modules apart and check again. ${SOURCES.overlap.brief}.`,
      source: SOURCES.overlap.cite,
    });
  }
  if (unlisted.pairs > 0) {
    out.push({
      id: 'fit.solar',
      status: 'fail',
      moduleIds: [...unlisted.ids],
      measured: unlisted.pairs,
      required: 0,
      unit: 'pairs',
      message: `${unlisted.pairs} more pairs of roof modules with a solar panel among them overlap on the roof; they are marked on the plan. Pull them apart and check again. ${SOURCES.overlap.brief}.`,
      source: SOURCES.overlap.cite,
    });
  }
  return out;
}

function overlapFinding(a: Module, ar: Rect, b: Module, br: Rect): Finding {
  const ox = intervalOverlap(ar.x0, ar.x1, br.x0, br.x1);
  const oy = intervalOverlap(ar.y0, ar.y1, br.y0, br.y1);
  const nameOf = (m: Module) => (isSolarPanel(m) ? panelName(m) : moduleName(m));
  return {
    id: 'fit.solar',
    status: 'fail',
    moduleIds: [a.id, b.id],
    measured: Math.min(ox, oy),
    required: 0,
    unit: 'mm',
    message: `${capital(nameOf(a))} and ${nameOf(b)} overlap by ${mm(ox)} × ${mm(oy)} on the roof; move one at least ${mm(Math.min(ox, oy))} (edges may touch). ${SOURCES.overlap.brief}.`,
    source: SOURCES.overlap.cite,
  };
}
