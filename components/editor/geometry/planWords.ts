/**
 * What the bay's own drawing writes on the plan, and where: the door words and the cab word
 * (bayDrawing.ts draws them from here) and the overall dimensions' values (dimensionDrawing.ts
 * places them with `dimensionTextPlace`). As boxes in the plan's px (mm × scale, as
 * `placePlanLabels` takes them), with the openings' words and the overall dimension lines
 * (`planLineBoxes`), they are what the module labels keep clear of. Pure math in mm (`px` is mm
 * per screen pixel); never draws, never reads the store.
 */
import type { Bay, LayoutDoc } from '@/lib/layout/schema';
import { formatLength, type LengthUnit } from '@/lib/layout/units';
import type { MeasureText, TextBox } from './labels';
import { overallDimensions, type DimensionString } from './dimensions';
import { markTextBoxes, type OpeningMark } from './openingMarks';

/** The bay's words in screen px: their size, and how far the overall dimensions stand off the bay. */
export const BAY_WORD_PX = 10;
export const DIMENSION_TEXT_PX = 10.5;
export const OVERALL_OFFSET_PX = 34;

/** The cab arrow's centre ahead of the bulkhead and its word above it, screen px. */
export const CAB_ARROW_PX = { x: -22, wordDy: -12 } as const;

export interface PlanWord {
  text: string;
  /** Its centre, mm. */
  x: number;
  y: number;
  /** Read from below (turned −90°) along the rear wall. */
  turned: boolean;
}

/** The door words outside their walls and the cab word over the arrow ahead of the bay. */
export function bayWords(bay: Pick<Bay, 'length' | 'width' | 'doors' | 'bulkhead'>, px: number): PlanWord[] {
  const { length: L, width: W } = bay;
  const out: PlanWord[] = bay.doors.map((d) =>
    d.wall === 'rear'
      ? { text: 'rear doors', x: L + 14 * px, y: d.offset + d.width / 2, turned: true }
      : { text: 'door', x: d.offset + d.width / 2, y: d.wall === 'left' ? -16 * px : W + 18 * px, turned: false },
  );
  out.push({ text: bay.bulkhead ? 'cab' : 'cab (open)', x: CAB_ARROW_PX.x * px, y: W / 2 + CAB_ARROW_PX.wordDy * px, turned: false });
  return out;
}

/**
 * Where a dimension string's value goes, for a value `textPx` wide on screen: on the line where
 * there is room, else 9 px beside it (`beside`, mm). The centre is in mm; `turned` for a value read from below.
 */
export function dimensionTextPlace(d: DimensionString, scale: number, textPx: number, offsetPx = 0): { x: number; y: number; beside: number; turned: boolean } {
  const px = 1 / scale;
  const at = d.at + offsetPx * px;
  const mid = (d.from + d.to) / 2;
  const fits = Math.abs(d.to - d.from) * scale > textPx + 12;
  const beside = fits ? 0 : -9 * px;
  // Turned −90° for a string along y, the offset beside the line runs along −x.
  return d.axis === 'x' ? { x: mid, y: at + beside, beside, turned: false } : { x: at + beside, y: mid, beside, turned: true };
}

const boxOf = (text: string, x: number, y: number, turned: boolean, scale: number, widthPx: number, heightPx: number): TextBox => ({
  text, cx: x * scale, cy: y * scale, width: turned ? heightPx : widthPx, height: turned ? widthPx : heightPx, rotation: 0,
});

/** Every word the plan writes besides the module labels, as boxes in plan px. */
export function planTextBoxes(doc: Pick<LayoutDoc, 'bay'>, marks: readonly OpeningMark[], scale: number, units: LengthUnit, measure: MeasureText): TextBox[] {
  const px = 1 / scale;
  const words = bayWords(doc.bay, px).map((w) => boxOf(w.text, w.x, w.y, w.turned, scale, measure(w.text, 'text', BAY_WORD_PX) + 4, BAY_WORD_PX * 1.3));
  const dims = overallDimensions(doc, OVERALL_OFFSET_PX * px).map((d) => {
    const text = formatLength(d.value, units);
    const w = measure(text, 'mono', DIMENSION_TEXT_PX);
    const at = dimensionTextPlace(d, scale, w);
    return boxOf(text, at.x, at.y, at.turned, scale, w + 4, 13);
  });
  return [...words, ...dims, ...markTextBoxes(marks, scale, measure)];
}

/** The overall dimension lines' half thickness on screen, px: their 45° ticks reach this far either side. */
const DIMENSION_LINE_HALF_PX = 4;

/**
 * The overall dimension lines as thin boxes in plan px, ticks and overrun included: a module's
 * size set outside its module (on a phone's small scale, beside a module at the rear wall) must
 * not be written across them.
 */
export function planLineBoxes(doc: { bay: Pick<Bay, 'length' | 'width'> }, scale: number): TextBox[] {
  const px = 1 / scale;
  return overallDimensions(doc, OVERALL_OFFSET_PX * px).map((d) => {
    const along = (Math.abs(d.to - d.from) + 8 * px) * scale;
    const across = 2 * DIMENSION_LINE_HALF_PX;
    const mid = ((d.from + d.to) / 2) * scale;
    return d.axis === 'x'
      ? { text: '', cx: mid, cy: d.at * scale, width: along, height: across, rotation: 0 }
      : { text: '', cx: d.at * scale, cy: mid, width: across, height: along, rotation: 0 };
  });
}
