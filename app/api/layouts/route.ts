import { handle, json, parseWith, readJson, requireActor } from '@/lib/api/respond';
import { createLayoutBody, docForNewLayout } from '@/lib/api/layout-bodies';
import { createLayout, listLayouts } from '@/db/layouts';

export const dynamic = 'force-dynamic';

/** The layouts the caller may see in their studio. */
export const GET = handle(async (req) => {
  const actor = await requireActor(req);
  return json({ layouts: await listLayouts(actor) });
});

/** A new layout from a document, a bay template, a starter layout or a custom bay. */
export const POST = handle(async (req) => {
  const actor = await requireActor(req);
  const body = parseWith(createLayoutBody, await readJson(req));
  const layout = await createLayout(actor, { name: body.name, clientId: body.clientId, doc: docForNewLayout(body) });
  return json(layout, { status: 201, headers: { ETag: `"${layout.version}"` } });
});
