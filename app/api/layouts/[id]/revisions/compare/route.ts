import { handle, HttpError, json, requireActor } from '@/server/api/respond';
import { compareRevisions } from '@/db/sharing/compare';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ id: string }> };

/**
 * Two revisions side by side: `?from=A&to=B` (letters or revision ids; `to=current` is the
 * layout as last saved). Answers both documents, the module diff and the findings that changed.
 */
export const GET = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  const { id } = await params;
  const url = new URL(req.url);
  const from = url.searchParams.get('from');
  const to = url.searchParams.get('to');
  if (!from || !to) throw new HttpError(400, 'Say which two revisions to compare: ?from=A&to=B.');
  return json(await compareRevisions(actor, id, from, to));
});
