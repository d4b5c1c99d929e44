import { handle, json, parseWith, readJson, requireActor } from '@/server/api/respond';
import { checkCanPlace, setTracing } from '@/db/uploads';
import { tracingPlacementSchema } from '@/lib/tracing/calibration';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ uploadId: string }> };

/** Places a photo under the plan: body `{ x, y, mmPerPx, rotation?, opacity? }` (bay mm). */
export const PUT = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  const { uploadId } = await params;
  const body = await readJson(req, 4096);
  await checkCanPlace(actor, uploadId); // rights before the body's rules, so a stranger learns nothing
  const placement = parseWith(tracingPlacementSchema, body);
  return json(await setTracing(actor, uploadId, placement));
});

/** Takes the photo away from under the plan; the file stays. */
export const DELETE = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  return json(await setTracing(actor, (await params).uploadId, null));
});
