/**
 * Variants of a layout. POST `{}` (or `{ name }`) duplicates the layout as a variant ("… variant 2"
 * unless named, same client, linked to its original) and answers the new layout; `{ doc }` makes
 * the variant from that document instead (a proposal opened as a variant; body up to 2 MB, 413 above); GET lists the family (the original and its
 * variants) the caller may see. Duplicating is the workshop's; the client gets 403, others 404.
 */
import { handle, json, parseWith, readJson, requireActor } from '@/server/api/respond';
import { MAX_VARIANT_BODY_BYTES, variantBody, variantDoc } from '@/server/api/layout-bodies';
import { loadLayoutFor } from '@/db/access';
import { duplicateAsVariant, variantFamily } from '@/db/layouts';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ id: string }> };

export const GET = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  return json({ layouts: await variantFamily(actor, (await params).id) });
});

export const POST = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  const { id } = await params;
  // Rights first, so a stranger learns nothing from the body rules.
  await loadLayoutFor(actor, id, { forEdit: 'duplicate layouts' });
  const body = parseWith(variantBody, await readJson(req, MAX_VARIANT_BODY_BYTES));
  const layout = await duplicateAsVariant(actor, id, body.name, variantDoc(body));
  return json(layout, { status: 201, headers: { ETag: `"${layout.version}"` } });
});
