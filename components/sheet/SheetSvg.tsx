/**
 * One page of the plan sheet as SVG in real millimetres (width="297mm", viewBox in mm), from the
 * same drawing model as the PDF, so the HTML print view prints true to scale at 100 %. Text uses
 * the product's faces, the same ones embedded in the PDF, without kerning or ligatures so each
 * line measures as the sheet's layout measured it. The drawing inside is `sheetPageSvg`'s compact,
 * escaped markup (lib/sheet/render-svg.ts): a dense page of React elements was several megabytes.
 * Renders on the server; holds no state and must never measure or re-lay anything out.
 */
import { sheetPageSvg, type SheetPage } from '@/lib/sheet';

/** `number` (1, 2, …) keeps each page's style classes apart from the other pages' in the document. */
export function SheetSvg({ page, number, label }: { page: SheetPage; number: number; label: string }) {
  return (
    <svg xmlns="http://www.w3.org/2000/svg" width={`${page.width}mm`} height={`${page.height}mm`} viewBox={`0 0 ${page.width} ${page.height}`}
      role="img" aria-label={label} className="sheet-page block h-auto max-w-full bg-white shadow-md" strokeLinecap="butt"
      style={{ fontFamily: 'var(--font-text), sans-serif', fontKerning: 'none', fontVariantLigatures: 'none' }}
      dangerouslySetInnerHTML={{ __html: sheetPageSvg(page, `s${number}-`) }} />
  );
}
