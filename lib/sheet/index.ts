/**
 * The plan sheet, as one import for routes and pages: compose it (pure), render it to PDF or SVG, and
 * the paper and scale vocabulary. Must never import React, Next or the database.
 */
export * from './paper';
export * from './primitives';
export { composeSheet, fitOf, suggestFit, type SheetRequest, type SheetResult, type Suggestion } from './compose';
export { renderPdf, type PdfOptions } from './render-pdf';
export { sheetPageSvg } from './render-svg';
export { SHEET_FONT_FILES, type SheetFonts } from './fonts';
export { REVISION_LETTER, revisionWords, type TitleDetails } from './title-block';
export { SAFETY_CAUTIONS } from './cautions';
