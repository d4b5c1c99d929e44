/**
 * Restore a saved version as the layout's newest save: its document and name become version
 * N + 1; nothing is overwritten. If-Match (optional) names the version the caller saw: 412 with
 * the current copy when someone saved since. Workshop only; the client gets 403, others 404.
 */
import { handle, HttpError, json, parseWith, requireActor } from '@/server/api/respond';
import { baseVersionFrom, savedVersionParam } from '@/server/api/layout-bodies';
import { loadLayoutFor } from '@/db/access';
import { restoreSavedVersion } from '@/db/saved-versions';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ id: string; version: string }> };

export const POST = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  const { id, version } = await params;
  await loadLayoutFor(actor, id, { forEdit: 'restore saved versions' });
  const base = baseVersionFrom(req);
  if (Number.isNaN(base)) throw new HttpError(400, 'If-Match must be the layout version, a whole number.');
  const saved = await restoreSavedVersion(actor, id, parseWith(savedVersionParam, version), base);
  return json({ id: saved.id, version: saved.version, updatedAt: saved.updatedAt, name: saved.name, restoredFrom: Number(version) }, { headers: { ETag: `"${saved.version}"` } });
});
