import { handle, json } from '@/server/api/respond';
import { resolveViewerLink } from '@/db/sharing/viewer-links';
import { refuseUnusable, takeViewerToken, withViewerHeaders } from '../viewer-guard';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ token: string }> };

/**
 * What a viewer link shows: one document (the live layout or the frozen revision), its name and
 * the studio's name. No session is read; nothing here can write. Opening the page (app/v) counts
 * as a visit; this fetch, which a live page repeats after each save, does not.
 */
const get = handle<Ctx>(async (req, { params }) => {
  takeViewerToken(req);
  const resolved = await resolveViewerLink((await params).token);
  if (resolved.status !== 'active') refuseUnusable(resolved);
  const { checkDefaults: _defaults, ...content } = resolved.content;
  return json(content, { headers: { ETag: `"${content.version}"` } });
});

export const GET = async (req: Request, ctx: Ctx) => withViewerHeaders(await get(req, ctx));
