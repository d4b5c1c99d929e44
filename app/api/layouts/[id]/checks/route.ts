import { handle, json, requireActor } from '@/server/api/respond';
import { getLayout } from '@/db/layouts';
import { runJob } from '@/lib/workers/pool';
import { studioCheckDefaults } from '@/db/studios';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ id: string }> };

/** The check report of the stored layout: anyone who may read the layout may read its checks. */
export const GET = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  const layout = await getLayout(actor, (await params).id);
  return json(await runJob('checks', { doc: layout.doc, studioDefaults: await studioCheckDefaults(actor) }), { headers: { ETag: `"${layout.version}"` } });
});
