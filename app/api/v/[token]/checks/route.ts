import { handle, json } from '@/server/api/respond';
import { resolveViewerLink } from '@/db/sharing/viewer-links';
import { runJob } from '@/lib/workers/pool';
import { refuseUnusable, takeViewerToken, withViewerHeaders } from '../../viewer-guard';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ token: string }> };

/** The check report of exactly the document the link shows, with the studio's defaults. */
const get = handle<Ctx>(async (req, { params }) => {
  takeViewerToken(req);
  const resolved = await resolveViewerLink((await params).token);
  if (resolved.status !== 'active') refuseUnusable(resolved);
  const { doc, checkDefaults, version } = resolved.content;
  return json(await runJob('checks', { doc, studioDefaults: checkDefaults }), { headers: { ETag: `"${version}"` } });
});

export const GET = async (req: Request, ctx: Ctx) => withViewerHeaders(await get(req, ctx));
