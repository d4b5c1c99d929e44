/**
 * Paper sizes and drawing scales of the plan sheet. ISO 216: A4 is 210 × 297 mm, A3 297 × 420 mm;
 * the sheet is always landscape. PDF user space is 1/72 inch per unit (ISO 32000-1 §8.3.2.3) and
 * an inch is 25.4 mm exactly, so 1 mm = 72 / 25.4 pt. Pure numbers; must never draw.
 */

export const PAPERS = ['a4', 'a3'] as const;
export type Paper = (typeof PAPERS)[number];

/** Landscape sizes in mm (ISO 216). */
export const PAPER_MM: Record<Paper, { width: number; height: number; label: string }> = {
  a4: { width: 297, height: 210, label: 'A4' },
  a3: { width: 420, height: 297, label: 'A3' },
};

/** The scales a workshop drawing uses here: 1:10, 1:20, 1:25. */
export const SCALES = [10, 20, 25] as const;
export type DrawingScale = (typeof SCALES)[number];

export const PT_PER_MM = 72 / 25.4;

export function mmToPt(mm: number): number {
  return mm * PT_PER_MM;
}

/** A real length (mm of the van) as mm on paper at 1:`scale`. */
export function onPaper(realMm: number, scale: number): number {
  return realMm / scale;
}

export function isPaper(v: unknown): v is Paper {
  return typeof v === 'string' && (PAPERS as readonly string[]).includes(v);
}

export function isScale(v: unknown): v is DrawingScale {
  return typeof v === 'number' && (SCALES as readonly number[]).includes(v);
}

export function scaleLabel(scale: number): string {
  return `1:${scale}`;
}

/** The frame, title block and drawing area of a landscape sheet, in mm from the top-left corner. */
export interface SheetFrame {
  page: { width: number; height: number };
  /** Inside the border. */
  frame: { x: number; y: number; width: number; height: number };
  /** Where figures and text go. */
  area: { x: number; y: number; width: number; height: number };
  titleBlock: { x: number; y: number; width: number; height: number };
}

export const MARGIN_MM = 10;
export const TITLE_BLOCK_MM = 24;
/** Space between the drawing area and the title block. */
export const GAP_MM = 4;

export function sheetFrame(paper: Paper): SheetFrame {
  const { width, height } = PAPER_MM[paper];
  const frame = { x: MARGIN_MM, y: MARGIN_MM, width: width - 2 * MARGIN_MM, height: height - 2 * MARGIN_MM };
  const titleBlock = { x: frame.x, y: frame.y + frame.height - TITLE_BLOCK_MM, width: frame.width, height: TITLE_BLOCK_MM };
  const inset = 4;
  const area = { x: frame.x + inset, y: frame.y + inset, width: frame.width - 2 * inset, height: frame.height - TITLE_BLOCK_MM - GAP_MM - inset };
  return { page: { width, height }, frame, area, titleBlock };
}
