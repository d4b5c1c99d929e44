import { handle, json, requireActor } from '@/server/api/respond';
import { getRevision } from '@/db/sharing/revisions';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ id: string; revisionId: string }> };

/** One revision with its frozen document. */
export const GET = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  const { id, revisionId } = await params;
  return json(await getRevision(actor, id, revisionId));
});
