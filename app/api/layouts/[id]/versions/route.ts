/** The layout's saved versions, newest first (the last 50 saves and every save a revision was issued from). */
import { handle, json, requireActor } from '@/server/api/respond';
import { listSavedVersions, SAVED_VERSIONS_KEPT } from '@/db/saved-versions';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ id: string }> };

export const GET = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  return json({ versions: await listSavedVersions(actor, (await params).id), kept: SAVED_VERSIONS_KEPT });
});
