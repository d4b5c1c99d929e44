/**
 * Variants of a layout. POST duplicates the layout as a variant ("… variant 2", same client,
 * linked to its original) and answers the new layout; GET lists the family (the original and its
 * variants) the caller may see. Duplicating is the workshop's; the client gets 403, others 404.
 */
import { handle, json, requireActor } from '@/server/api/respond';
import { duplicateAsVariant, variantFamily } from '@/db/layouts';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ id: string }> };

export const GET = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  return json({ layouts: await variantFamily(actor, (await params).id) });
});

export const POST = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  const layout = await duplicateAsVariant(actor, (await params).id);
  return json(layout, { status: 201, headers: { ETag: `"${layout.version}"` } });
});
