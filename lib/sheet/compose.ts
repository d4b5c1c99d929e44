/**
 * Lays out the whole plan sheet: the three arrangement plans and the side section at the chosen
 * scale (side by side where they fit, else one per page), then the module schedule, the check
 * summary and the safety cautions, with the title block on every page. When the bay does not fit
 * the paper at that scale it says so, with the sizes, and suggests a scale (or paper) that fits.
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
import { PAPER_MM, SCALES, sheetFrame, type DrawingScale, type Paper, PAPERS } from './paper';
import { drawPlan, planSize, PLAN_MARGIN } from './plan-figure';
import { cloudAreas, drawRevisionClouds, flowRevisionTable, type RevisionChanges, type RevisionRow } from './revision-block';
import { onPaper } from './paper';
import type { SheetDocument, SheetItem, SheetPage } from './primitives';
import { flowSchedule } from './schedule';
import { drawSection, sectionSize } from './section-figure';
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
}

export interface Suggestion {
  paper: Paper;
  scale: DrawingScale;
}

export type SheetResult =
  | { ok: true; sheet: SheetDocument; figurePages: number }
  | { ok: false; message: string; suggestion: Suggestion | null; needed: { width: number; height: number }; available: { width: number; height: number } };

const FIGURE_GAP = 6;

interface Figure {
  width: number;
  height: number;
  draw: (x: number, y: number) => SheetItem[];
}

function figures(req: Pick<SheetRequest, 'doc' | 'scale' | 'units' | 'changes' | 'report'>): Figure[] {
  const plan = planSize(req.doc, req.scale);
  const clouds = (a: (typeof ARRANGEMENTS)[number], x: number, y: number): SheetItem[] => {
    if (!req.changes) return [];
    const toPaper = (mx: number, my: number): [number, number] => [x + PLAN_MARGIN.left + onPaper(mx, req.scale), y + PLAN_MARGIN.top + onPaper(my, req.scale)];
    return drawRevisionClouds(cloudAreas(req.changes.diff, a), req.changes.letter, toPaper);
  };
  const out: Figure[] = ARRANGEMENTS.map((a) => ({ ...plan, draw: (x: number, y: number) => [...drawPlan(req.doc, a, x, y, req.scale, req.units, req.report), ...clouds(a, x, y)] }));
  out.push({ ...sectionSize(req.doc, req.scale), draw: (x, y) => drawSection(req.doc, x, y, req.scale, req.units) });
  return out;
}

/** Paper space the largest figure needs at a scale, against the drawing area of a paper. */
export function fitOf(doc: LayoutDoc, paper: Paper, scale: number): { fits: boolean; needed: { width: number; height: number }; available: { width: number; height: number } } {
  const plan = planSize(doc, scale);
  const section = sectionSize(doc, scale);
  const needed = { width: Math.max(plan.width, section.width), height: Math.max(plan.height, section.height) };
  const { area } = sheetFrame(paper);
  const available = { width: area.width, height: area.height };
  return { fits: needed.width <= available.width && needed.height <= available.height, needed, available };
}

/** The most detailed scale that fits on this paper; else the most detailed on a larger paper. */
export function suggestFit(doc: LayoutDoc, paper: Paper): Suggestion | null {
  const papers = [paper, ...PAPERS.filter((p) => PAPER_MM[p].width > PAPER_MM[paper].width)];
  for (const p of papers) {
    for (const scale of SCALES) if (fitOf(doc, p, scale).fits) return { paper: p, scale };
  }
  return null;
}

const round = (n: number) => Math.round(n);

export function composeSheet(req: SheetRequest): SheetResult {
  const { doc, paper, scale } = req;
  const fit = fitOf(doc, paper, scale);
  const label = PAPER_MM[paper].label;
  if (!fit.fits) {
    const suggestion = suggestFit(doc, paper);
    const what = `The bay (${doc.bay.length} × ${doc.bay.width} mm, ${doc.bay.height} mm high) does not fit on ${label} landscape at 1:${scale}: its largest drawing needs ${round(fit.needed.width)} × ${round(fit.needed.height)} mm and the drawing area is ${round(fit.available.width)} × ${round(fit.available.height)} mm.`;
    const advice = suggestion
      ? suggestion.paper === paper
        ? ` Choose 1:${suggestion.scale} on ${label}, which fits.`
        : ` No scale fits on ${label}; choose 1:${suggestion.scale} on ${PAPER_MM[suggestion.paper].label}, which fits.`
      : ' None of 1:10, 1:20 or 1:25 fits on A4 or A3; check the bay dimensions.';
    return { ok: false, message: what + advice, suggestion, needed: fit.needed, available: fit.available };
  }

  const frame = sheetFrame(paper);
  const pages: SheetPage[] = [];
  const newPage = (): SheetItem[] => {
    const page: SheetPage = { width: frame.page.width, height: frame.page.height, items: [{ type: 'rect', x: frame.frame.x, y: frame.frame.y, w: frame.frame.width, h: frame.frame.height, stroke: 'ink', width: LINE.medium }] };
    pages.push(page);
    return page.items;
  };

  // Figures: shelf packing, in order travel, lounge, sleep, section; each row centred.
  const { area } = frame;
  let items = newPage();
  let row: { f: Figure; x: number }[] = [];
  let x = 0;
  let y = 0;
  let rowHeight = 0;
  const closeRow = () => {
    const used = row.length ? row[row.length - 1].x + row[row.length - 1].f.width : 0;
    const shift = (area.width - used) / 2;
    for (const r of row) items.push(...r.f.draw(area.x + shift + r.x, area.y + y));
    row = [];
  };
  for (const f of figures(req)) {
    if (x > 0 && x + f.width > area.width) {
      closeRow();
      x = 0;
      y += rowHeight + FIGURE_GAP;
      rowHeight = 0;
    }
    if (y > 0 && y + f.height > area.height) {
      items = newPage();
      x = 0;
      y = 0;
      rowHeight = 0;
    }
    row.push({ f, x });
    x += f.width + FIGURE_GAP;
    rowHeight = Math.max(rowHeight, f.height);
  }
  closeRow();
  const figurePages = pages.length;

  // Text: the schedule full width, then checks and cautions in columns.
  const fullWidth = new ColumnFlow(area, 1, newPage);
  flowSchedule(fullWidth, doc, req.units);
  fullWidth.gap(6);
  flowMassBalance(fullWidth, doc);
  const columns = paper === 'a3' ? 3 : 2;
  const text = new ColumnFlow(area, columns, newPage);
  if (req.revisions?.length) {
    flowRevisionTable(text, req.revisions);
    text.gap(6);
  }
  flowBuildPlan(text, doc);
  text.gap(6);
  flowChecks(text, req.report, req.checksUnavailable);
  text.gap(6);
  flowCautions(text);

  pages.forEach((page, i) => {
    page.items.push(...drawTitleBlock(frame.titleBlock, { ...req.details, units: unitWords(req.units) }, { paper, scale, page: i + 1, pages: pages.length }));
  });
  return { ok: true, sheet: { title: `${req.details.layout} — plan sheet`, pages }, figurePages };
}

function unitWords(units: LengthUnit): string {
  return units === 'mm' ? 'millimetres (mm)' : units === 'cm' ? 'centimetres (cm)' : 'inches (in)';
}
