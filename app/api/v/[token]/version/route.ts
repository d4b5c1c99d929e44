import { handle, json } from '@/server/api/respond';
import { viewerLinkVersion } from '@/db/sharing/viewer-links';
import { refuseUnusable, takeViewerToken, withViewerHeaders } from '../../viewer-guard';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ token: string }> };

/**
 * The light poll of a live viewer (about once a second): the version on show now. A revoked or
 * expired link answers 410 here too, so an open page learns of it within a second.
 */
const get = handle<Ctx>(async (req, { params }) => {
  takeViewerToken(req);
  const v = await viewerLinkVersion((await params).token);
  if (v.status !== 'active') refuseUnusable(v);
  return json({ version: v.version, updatedAt: v.updatedAt });
});

export const GET = async (req: Request, ctx: Ctx) => withViewerHeaders(await get(req, ctx));
