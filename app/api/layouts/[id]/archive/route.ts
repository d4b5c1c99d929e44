/**
 * Archiving a layout: POST archives it (it leaves the studio's list, keeps everything and stays
 * readable), DELETE restores it. Staff of the layout's studio only; the layout's client gets 403,
 * anyone else 404.
 */
import { handle, json, requireActor } from '@/server/api/respond';
import { setLayoutArchived } from '@/db/layouts';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ id: string }> };

export const POST = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  return json(await setLayoutArchived(actor, (await params).id, true));
});

export const DELETE = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  return json(await setLayoutArchived(actor, (await params).id, false));
});
