import { handle, json, requireActor } from '@/server/api/respond';
import { revokeInvitation } from '@/db/sharing/invitations';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ id: string }> };

/** Withdraws a pending invitation: its link stops working at once. */
export const DELETE = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  return json({ invitation: await revokeInvitation(actor, (await params).id) });
});
