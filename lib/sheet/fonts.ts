/**
 * The plan sheet's faces: the product's own IBM Plex Sans (text, 400 and 600) and IBM Plex Mono
 * (dimensions), the same families the screens load from `fonts/` (SIL OFL, from @fontsource 5.3.0;
 * the PDF reads the WOFF files, the browser the WOFF2 ones). The renderer is pure, so the caller
 * reads these files and passes their bytes in. Names only; never reads a file.
 */
import type { FontFace } from './primitives';

export const SHEET_FONT_FILES: Record<FontFace, string> = {
  sans: 'ibm-plex-sans-latin-400-normal.woff',
  'sans-bold': 'ibm-plex-sans-latin-600-normal.woff',
  mono: 'ibm-plex-mono-latin-400-normal.woff',
};

/** The bytes of each face, as read from `fonts/`. */
export type SheetFonts = Record<FontFace, Uint8Array>;

/**
 * OpenType features switched off when the faces are laid out for the PDF: with no ligatures or
 * contextual alternates every character draws its own glyph, so a line measures exactly as
 * `font-metrics.ts` says (pdf-lib places glyphs by advance width, without kerning).
 */
export const SHEET_FONT_FEATURES = { liga: false, clig: false, calt: false, rlig: false, dlig: false } as const;
