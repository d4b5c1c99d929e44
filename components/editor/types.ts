/**
 * Shared types of the layout editor: the props the page hands it, and the branded length types
 * that keep millimetres (the document) and pixels (the screen) from being mixed up.
 * Must never hold behaviour: types and tiny constructors only.
 */
import type { LayoutDoc, LengthUnit } from '@/lib/layout';

/** What the layout page passes to `<EditorLoader />` (fixed contract with the app shell). */
export interface EditorProps {
  layoutId: string;
  initialDoc: LayoutDoc;
  initialVersion: number;
  /** False for clients and viewer links: the same drawing, read-only (no shelf, no drag, no save). */
  canEdit: boolean;
  units: LengthUnit;
}

declare const mmBrand: unique symbol;
declare const pxBrand: unique symbol;
/** A length in millimetres of the van (world space). */
export type Mm = number & { readonly [mmBrand]: true };
/** A length in CSS pixels on screen. */
export type Px = number & { readonly [pxBrand]: true };

export const mm = (n: number): Mm => n as Mm;
export const px = (n: number): Px => n as Px;
