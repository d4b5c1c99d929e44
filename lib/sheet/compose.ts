/**
 * Lays out the whole plan sheet through its one layout model (sheet-layout.ts): the three
 * arrangement plans, the side section, the four wall elevations and the roof plan at the chosen scale, side by side in rows where they fit
 * the drawing area, else further rows or pages; then the module schedule, the mass table, the
 * revisions, build plan, check summary and safety cautions fill the space the drawings leave
 * (beside and below them) in columns, flowing onto further pages as needed; the title block on
 * every page. When the bay does not fit the paper at that scale it says so, with the sizes, and
 * suggests a scale (or paper) that fits.
 * Pure: a document and its details in, a SheetDocument out; must never render or read the clock.
 */
import { ARRANGEMENTS } from '../layout/vocabulary';
import type { LayoutDoc, LengthUnit } from '../layout';
import type { CheckReport } from '../checks/types';
import { flowCautions } from './cautions';
import { flowBuildPlan } from './build-plan';
import { flowChecks } from './checks-summary';
import { flowMassBalance } from './mass-balance';
import { ColumnFlow } from './flow';
import { LINE } from './drafting';
import { PAPER_MM, SCALES, sheetFrame, type DrawingScale, type Paper, PAPERS, type SheetFrame } from './paper';
import { drawPlan, planSize, PLAN_MARGIN } from './plan-figure';
import { resolveSettings } from '../checks/settings';
import { BLOCK_GAP, SheetSpace, type Balance, type Drawing, type PlacedBlock } from './sheet-layout';
import { MASS_TABLE_MIN_WIDTH } from './mass-balance';
import { cloudAreas, drawRevisionClouds, flowRevisionTable, type RevisionChanges, type RevisionRow } from './revision-block';
import { onPaper } from './paper';
import type { SheetDocument, SheetItem, SheetPage } from './primitives';
import { flowSchedule, SCHEDULE_MIN_WIDTH } from './schedule';
import { drawSection, sectionSize } from './section-figure';
import { drawElevation, elevationSize, ELEVATION_WALLS } from './elevation-figure';
import { drawRoof, roofSize } from './roof-figure';
import { drawTitleBlock, type TitleDetails } from './title-block';

export interface SheetRequest {
  doc: LayoutDoc;
  report: CheckReport | null;
  /** Why there is no report, when there is none. */
  checksUnavailable?: string;
  paper: Paper;
  scale: DrawingScale;
  units: LengthUnit;
  details: Omit<TitleDetails, 'units'>;
  /** The revision table: issued revisions up to the one printed, oldest first. */
  revisions?: RevisionRow[];
  /** Clouds on the plans: what the printed revision changed since the one before. */
  changes?: RevisionChanges | null;
  /**
   * The load floor's height above the road, mm (the under-floor envelope of the section); when
   * absent, the document's own setting (the Bay panel's), else the built-in default.
   */
  floorAboveRoad?: number;
}

export interface Suggestion {
  paper: Paper;
  scale: DrawingScale;
}

export type SheetResult =
  | { ok: true; sheet: SheetDocument; figurePages: number; blocks: PlacedBlock[] }
  | { ok: false; message: string; suggestion: Suggestion | null; needed: { width: number; height: number }; available: { width: number; height: number } };

/** Text columns are at least this wide (common practice, no source: a readable measure at the label size). */
export const TEXT_COLUMN_MIN = 78;
/** The revision table's narrowest width: its fixed columns (59 mm) and 61 mm of description, mm. */
const REVISION_TABLE_MIN_WIDTH = 120;
/** Balanced columns are capped this much over the even share, mm (two or three rows of text). */
const BALANCE_SLACK = 10;

/** The load floor's height above the road this sheet draws: the request's, else the document's setting. */
export function floorHeightOf(req: Pick<SheetRequest, 'doc' | 'floorAboveRoad'>): number {
  return req.floorAboveRoad ?? resolveSettings(req.doc).floorAboveRoad;
}

function drawings(req: Pick<SheetRequest, 'doc' | 'scale' | 'units' | 'changes' | 'report'>, floorAboveRoad: number): Drawing[] {
  const plan = planSize(req.doc, req.scale);
  const clouds = (a: (typeof ARRANGEMENTS)[number], x: number, y: number): SheetItem[] => {
    if (!req.changes) return [];
    const toPaper = (mx: number, my: number): [number, number] => [x + PLAN_MARGIN.left + onPaper(mx, req.scale), y + PLAN_MARGIN.top + onPaper(my, req.scale)];
    return drawRevisionClouds(cloudAreas(req.changes.diff, a), req.changes.letter, toPaper);
  };
  const out: Drawing[] = ARRANGEMENTS.map((a) => ({ what: `plan:${a}`, ...plan, draw: (x: number, y: number) => [...drawPlan(req.doc, a, x, y, req.scale, req.units, req.report), ...clouds(a, x, y)] }));
  out.push({ what: 'section', ...sectionSize(req.doc, req.scale, floorAboveRoad), draw: (x, y) => drawSection(req.doc, x, y, req.scale, req.units, floorAboveRoad) });
  // The walls unrolled, seen from the room, and the roof from above: at the same scale, after the section.
  for (const wall of ELEVATION_WALLS) out.push({ what: `elevation:${wall}`, ...elevationSize(req.doc, wall, req.scale), draw: (x, y) => drawElevation(req.doc, wall, x, y, req.scale, req.units) });
  out.push({ what: 'roof-plan', ...roofSize(req.doc, req.scale), draw: (x, y) => drawRoof(req.doc, x, y, req.scale, req.units) });
  return out;
}

/** Paper space the largest figure needs at a scale, against the drawing area of a paper. */
export function fitOf(doc: LayoutDoc, paper: Paper, scale: number, floorAboveRoad = floorHeightOf({ doc })): { fits: boolean; needed: { width: number; height: number }; available: { width: number; height: number } } {
  const plan = planSize(doc, scale);
  const section = sectionSize(doc, scale, floorAboveRoad);
  const others = [...ELEVATION_WALLS.map((wall) => elevationSize(doc, wall, scale)), roofSize(doc, scale)];
  const needed = { width: Math.max(plan.width, section.width, ...others.map((o) => o.width)), height: Math.max(plan.height, section.height, ...others.map((o) => o.height)) };
  const { area } = sheetFrame(paper);
  const available = { width: area.width, height: area.height };
  return { fits: needed.width <= available.width && needed.height <= available.height, needed, available };
}

/** The most detailed scale that fits on this paper; else the most detailed on a larger paper. */
export function suggestFit(doc: LayoutDoc, paper: Paper, floorAboveRoad = floorHeightOf({ doc })): Suggestion | null {
  const papers = [paper, ...PAPERS.filter((p) => PAPER_MM[p].width > PAPER_MM[paper].width)];
  for (const p of papers) {
    for (const scale of SCALES) if (fitOf(doc, p, scale, floorAboveRoad).fits) return { paper: p, scale };
  }
  return null;
}

const round = (n: number) => Math.round(n);

export function composeSheet(req: SheetRequest): SheetResult {
  const { doc, paper, scale } = req;
  const floorAboveRoad = floorHeightOf(req);
  const fit = fitOf(doc, paper, scale, floorAboveRoad);
  const label = PAPER_MM[paper].label;
  if (!fit.fits) {
    const suggestion = suggestFit(doc, paper, floorAboveRoad);
    const what = `The bay (${doc.bay.length} × ${doc.bay.width} mm, ${doc.bay.height} mm high) does not fit on ${label} landscape at 1:${scale}: its largest drawing needs ${round(fit.needed.width)} × ${round(fit.needed.height)} mm and the drawing area is ${round(fit.available.width)} × ${round(fit.available.height)} mm.`;
    const advice = suggestion
      ? suggestion.paper === paper
        ? ` Choose 1:${suggestion.scale} on ${label}, which fits.`
        : ` No scale fits on ${label}; choose 1:${suggestion.scale} on ${PAPER_MM[suggestion.paper].label}, which fits.`
      : ' None of 1:10, 1:20 or 1:25 fits on A4 or A3; check the bay dimensions.';
    return { ok: false, message: what + advice, suggestion, needed: fit.needed, available: fit.available };
  }

  const frame = sheetFrame(paper);
  let laid = layOut(req, frame, floorAboveRoad);
  // Text alone on the last page, in one column while others stand empty: lay out again with the
  // columns of that page balanced (the first ones capped, the last one full height, so the page
  // count cannot grow). Pure, so twice is only twice the work.
  const cap = balancedHeight(laid.blocks, laid.pages.length - 1, frame.area.width);
  if (cap !== null) laid = layOut(req, frame, floorAboveRoad, { fromPage: laid.pages.length - 1, height: cap });
  const { pages, figurePages, blocks } = laid;

  pages.forEach((page, i) => {
    page.items.push(...drawTitleBlock(frame.titleBlock, { ...req.details, units: unitWords(req.units) }, { paper, scale, page: i + 1, pages: pages.length }));
  });
  return { ok: true, sheet: { title: `${req.details.layout} — plan sheet`, pages }, figurePages, blocks };
}

/** One pass of the layout model: drawings, then the text flows, on as many pages as they take. */
function layOut(req: SheetRequest, frame: SheetFrame, floorAboveRoad: number, balance?: Balance): { pages: SheetPage[]; figurePages: number; blocks: PlacedBlock[] } {
  const { doc } = req;
  const pages: SheetPage[] = [];
  const space = new SheetSpace(frame.area, balance, () => {
    const page: SheetPage = { width: frame.page.width, height: frame.page.height, items: [{ type: 'rect', x: frame.frame.x, y: frame.frame.y, w: frame.frame.width, h: frame.frame.height, stroke: 'ink', width: LINE.medium }] };
    pages.push(page);
    return page.items;
  });

  // Drawings: travel, lounge, sleep, section, the elevations, the roof plan, side by side in rows where they fit.
  space.placeDrawings(drawings(req, floorAboveRoad));
  const figurePages = pages.length;

  // Text in the space left: the schedule and the mass table where they have their width, then
  // the revisions, build plan, checks and cautions in columns.
  const schedule = new ColumnFlow(space.columns('text:schedule', SCHEDULE_MIN_WIDTH), SCHEDULE_MIN_WIDTH);
  flowSchedule(schedule, doc, req.units);
  schedule.finish();
  const mass = new ColumnFlow(space.columns('text:mass', MASS_TABLE_MIN_WIDTH), MASS_TABLE_MIN_WIDTH);
  flowMassBalance(mass, doc);
  mass.finish();
  if (req.revisions?.length) {
    const revisions = new ColumnFlow(space.columns('text:revisions', REVISION_TABLE_MIN_WIDTH), REVISION_TABLE_MIN_WIDTH);
    flowRevisionTable(revisions, req.revisions);
    revisions.finish();
  }
  const text = new ColumnFlow(space.columns('text:notes', TEXT_COLUMN_MIN, TEXT_COLUMN_MIN), TEXT_COLUMN_MIN);
  flowBuildPlan(text, doc);
  text.gap(6);
  flowChecks(text, req.report, req.checksUnavailable);
  text.gap(6);
  flowCautions(text);
  text.finish();

  return { pages, figurePages, blocks: space.blocks };
}

/**
 * The column height that balances the notes on the last page, or null when there is nothing to
 * balance (other blocks on that page, fewer than two columns' room, or already several columns).
 */
function balancedHeight(blocks: PlacedBlock[], lastPage: number, areaWidth: number): number | null {
  const onLast = blocks.filter((b) => b.page === lastPage);
  if (!onLast.length || onLast.some((b) => b.what !== 'text:notes')) return null;
  const columns = Math.floor((areaWidth + BLOCK_GAP) / (TEXT_COLUMN_MIN + BLOCK_GAP));
  if (columns < 2 || onLast.length > 1) return null;
  const total = onLast.reduce((sum, b) => sum + b.height, 0);
  // A little over the even share: rows do not break exactly at the cap.
  return total / columns + BALANCE_SLACK;
}

function unitWords(units: LengthUnit): string {
  return units === 'mm' ? 'millimetres (mm)' : units === 'cm' ? 'centimetres (cm)' : 'inches (in)';
}
