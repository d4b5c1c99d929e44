import { z } from 'zod';
import { handle, json, parseWith, readJson, requireActor } from '@/lib/api/respond';
import { setResolved } from '@/db/sharing/comments';
import { layoutFor } from '@/db/sharing/access';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ id: string; commentId: string }> };

const patchBody = z.strictObject({ resolved: z.boolean({ error: 'resolved must be true or false' }) });

/** Resolves (or reopens) a thread; the workshop and the layout's client may both do it. */
export const PATCH = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  const { id, commentId } = await params;
  await layoutFor(actor, id);
  const body = parseWith(patchBody, await readJson(req, 4 * 1024));
  return json({ thread: await setResolved(actor, id, commentId, body.resolved) });
});
