import { handle, json, parseWith, readJson, requireActor } from '@/server/api/respond';
import { createLayoutBody, docForNewLayout } from '@/server/api/layout-bodies';
import { z } from 'zod';
import { createLayout, listLayouts } from '@/db/layouts';

export const dynamic = 'force-dynamic';

const listQuery = z.object({ archived: z.enum(['0', '1']).optional() });

/** The layouts the caller may see in their studio: those in use, or with `?archived=1` the archived ones. */
export const GET = handle(async (req) => {
  const actor = await requireActor(req);
  const query = parseWith(listQuery, Object.fromEntries(new URL(req.url).searchParams));
  return json({ layouts: await listLayouts(actor, { archived: query.archived === '1' }) });
});

/** A new layout from a document, a bay template, a starter layout or a custom bay. */
export const POST = handle(async (req) => {
  const actor = await requireActor(req);
  const body = parseWith(createLayoutBody, await readJson(req));
  const layout = await createLayout(actor, { name: body.name, clientId: body.clientId, doc: docForNewLayout(body) });
  return json(layout, { status: 201, headers: { ETag: `"${layout.version}"` } });
});
