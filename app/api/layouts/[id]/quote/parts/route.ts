import { handle, HttpError, json, parseWith, requireActor } from '@/server/api/respond';
import { cutOptionsQuery } from '@/lib/api/planning-bodies';
import { previewPartsList } from '@/db/quotes';
import { partsListCsv } from '@/lib/planning/parts-csv';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ id: string }> };

/** A file name from the layout name: letters, digits and dashes only (no quotes, no paths). */
function csvFileName(layoutName: string, version: number, revision: string | null): string {
  const stem = layoutName.normalize('NFKD').replace(/[^\w\s-]/g, '').trim().replace(/[\s_]+/g, '-').toLowerCase().slice(0, 60) || 'layout';
  return `${stem}-${revision ? `rev-${revision}` : `preliminary-v${version}`}-parts.csv`;
}

/**
 * The parts list of an issued revision (`?revision=B`; default the latest approved, else the latest
 * issued; `?revision=preliminary` for the layout as last saved), priced from the studio's list
 * (workshop only): JSON by default, `?format=csv` as a download. Cut options: `kerf`, `trim` (mm), `grain=0|1`.
 */
export const GET = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  const { id } = await params;
  const query = parseWith(cutOptionsQuery, Object.fromEntries(new URL(req.url).searchParams));
  const preview = await previewPartsList(actor, id, query.cut, query.revision);
  if (query.format === 'json') return json(preview);
  if (!preview.parts) throw new HttpError(409, 'Set up the studio price list (Settings → Price list) before exporting the parts list.');
  return new Response(partsListCsv(preview.parts), {
    headers: {
      'Content-Type': 'text/csv; charset=utf-8',
      'Content-Disposition': `attachment; filename="${csvFileName(preview.layoutName, preview.version, preview.revision?.letter ?? null)}"`,
      'Cache-Control': 'no-store',
      'X-Content-Type-Options': 'nosniff',
    },
  });
});
