/**
 * The plan sheet as plain drawing instructions: pages of lines, rectangles, polygons and text in
 * millimetres from each page's top-left corner (y down). One model, two renderers: pdf-lib for
 * the PDF export and SVG for the HTML print view, so both show exactly the same sheet.
 * Types only; must never depend on a renderer.
 */
import { palette } from '../look';

export type Ink = 'ink' | 'soft' | 'faint' | 'copper' | 'paper' | 'moss' | 'ochre' | 'brick' | 'white';
export type FontFace = 'sans' | 'sans-bold' | 'mono';

export interface LineItem {
  type: 'line';
  x1: number;
  y1: number;
  x2: number;
  y2: number;
  /** Stroke width in mm. */
  width: number;
  ink?: Ink;
  /** Dash and gap lengths in mm, repeating (two for a dashed line, four for a chain line). */
  dash?: readonly number[];
  /** A marker for tests and tooling: e.g. `dimension:bay-length:travel`. */
  tag?: string;
}

export interface RectItem {
  type: 'rect';
  x: number;
  y: number;
  w: number;
  h: number;
  stroke?: Ink;
  fill?: Ink;
  width?: number;
  dash?: readonly number[];
  /** A marker for tests and tooling: e.g. `section:mounted:under-floor:<module id>`. */
  tag?: string;
}

export interface PolygonItem {
  type: 'polygon';
  points: [number, number][];
  stroke?: Ink;
  fill?: Ink;
  width?: number;
}

export interface TextItem {
  type: 'text';
  x: number;
  /** Baseline. */
  y: number;
  text: string;
  /** Point size (1/72 in), as type is specified in print. */
  size: number;
  font?: FontFace;
  ink?: Ink;
  align?: 'left' | 'center' | 'right';
  /** Degrees anticlockwise (90 reads bottom to top). */
  rotate?: 0 | 90;
}

export type SheetItem = LineItem | RectItem | PolygonItem | TextItem;

export interface SheetPage {
  width: number;
  height: number;
  items: SheetItem[];
}

export interface SheetDocument {
  title: string;
  pages: SheetPage[];
}

/** Hex values of the inks, from the one palette (lib/look.ts). */
export const INK_HEX: Record<Ink, string> = {
  ink: palette.ink,
  soft: palette.inkSoft,
  faint: palette.inkFaint,
  copper: palette.copper,
  paper: palette.paper,
  moss: palette.moss,
  ochre: palette.ochre,
  brick: palette.brick,
  white: palette.white,
};
