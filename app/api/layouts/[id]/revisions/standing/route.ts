import { handle, json, requireActor } from '@/server/api/respond';
import { issueStanding } from '@/db/sharing/issued';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ id: string }> };

/**
 * Where the layout stands with its issued revisions: the latest one and its state, whether the
 * layout has been saved since ("Approved B · changed since"), which revision documents follow
 * by default and which one the client is shown. Anyone who may see the layout.
 */
export const GET = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  return json(await issueStanding(actor, (await params).id));
});
