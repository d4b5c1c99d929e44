/**
 * A small plan of the layout as SVG (`?version=N` for a saved version, `?arrangement=sleep`),
 * drawn from the document on each request (lib/sheet/thumbnail.ts: no text, at most 400 modules);
 * no picture is stored. Anyone who may read the layout may see it.
 */
import { handle, parseWith, requireActor } from '@/server/api/respond';
import { thumbnailQuery } from '@/server/api/layout-bodies';
import { loadLayoutFor } from '@/db/access';
import { savedVersionDoc } from '@/db/saved-versions';
import { planThumbnailSvg } from '@/lib/sheet/thumbnail';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ id: string }> };

export const GET = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  const { id } = await params;
  const layout = await loadLayoutFor(actor, id);
  const query = parseWith(thumbnailQuery, Object.fromEntries(new URL(req.url).searchParams));
  const version = query.version ?? layout.version;
  const doc = version === layout.version ? (await loadLayoutFor(actor, id, { withDoc: true })).doc : (await savedVersionDoc(actor, id, version)).doc;
  const svg = planThumbnailSvg(doc, { arrangement: query.arrangement });
  return new Response(svg, {
    headers: {
      'content-type': 'image/svg+xml; charset=utf-8',
      // The URL names the version, so a saved version's picture never changes; the current one is asked for by version too.
      'cache-control': query.version ? 'private, max-age=86400, immutable' : 'private, no-cache',
      'content-security-policy': "default-src 'none'; style-src 'unsafe-inline'",
      'x-content-type-options': 'nosniff',
    },
  });
});
