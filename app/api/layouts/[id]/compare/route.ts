/**
 * Two layouts side by side — a layout and one of its variants (`?with=<layout id>`): both documents
 * as last saved, what differs between them and the check findings whose status differs (both
 * checked in the work pool). Anyone who may read both may compare them; an unknown one is 404.
 */
import { handle, json, parseWith, requireActor } from '@/server/api/respond';
import { compareVariantsQuery } from '@/server/api/layout-bodies';
import { loadLayoutFor } from '@/db/access';
import { compareVariants } from '@/db/sharing/compare';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ id: string }> };

export const GET = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  const { id } = await params;
  await loadLayoutFor(actor, id);
  const query = parseWith(compareVariantsQuery, Object.fromEntries(new URL(req.url).searchParams));
  return json(await compareVariants(actor, id, query.with));
});
