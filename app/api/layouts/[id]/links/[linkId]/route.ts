import { handle, json, requireActor } from '@/server/api/respond';
import { revokeViewerLink } from '@/db/sharing/viewer-links';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ id: string; linkId: string }> };

/** Revokes a viewer link: its next request shows "withdrawn". Revoking twice is harmless. */
export const DELETE = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  const { id, linkId } = await params;
  return json({ link: await revokeViewerLink(actor, id, linkId) });
});
