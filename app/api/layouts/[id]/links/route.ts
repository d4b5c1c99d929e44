import { z } from 'zod';
import { handle, json, parseWith, readJson, requireActor } from '@/server/api/respond';
import { createViewerLink, LABEL_MAX, listViewerLinks, MAX_LINK_DAYS, viewerPath } from '@/db/sharing/viewer-links';
import { loadLayoutFor } from '@/db/access';
import { idField } from '@/db/ids';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ id: string }> };

const createBody = z.strictObject({
  /** Omit (or null) for a live link; a revision id for a frozen one. */
  revisionId: idField('choose one of this layout’s revisions').nullable().optional(),
  /** Days until the link stops working; omit (or null) for a link that lasts until revoked. */
  expiresInDays: z.number().int('whole days').min(1, 'at least one day').max(MAX_LINK_DAYS, `at most ${MAX_LINK_DAYS} days`).nullable().optional(),
  label: z.string().trim().max(LABEL_MAX, `keep the label under ${LABEL_MAX} characters`).optional(),
});

/** The layout's viewer links with their state, created and last-opened times (workshop only). */
export const GET = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  return json({ links: await listViewerLinks(actor, (await params).id) });
});

/** A new viewer link. The token is in this answer once; only its hash is kept. */
export const POST = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  const { id } = await params;
  await loadLayoutFor(actor, id, { forEdit: 'share viewer links' });
  const body = parseWith(createBody, await readJson(req, 16 * 1024));
  const expiresAt = body.expiresInDays ? new Date(Date.now() + body.expiresInDays * 86_400_000) : null;
  const { link, token } = await createViewerLink(actor, id, { revisionId: body.revisionId ?? null, expiresAt, label: body.label });
  return json({ link, path: viewerPath(token) }, { status: 201, headers: { 'Cache-Control': 'no-store' } });
});
