import { handle, HttpError, invalid, json, parseWith, readJson, requireActor } from '@/server/api/respond';
import { baseVersionFrom, renameLayoutBody, saveLayoutBody } from '@/server/api/layout-bodies';
import { parseLayoutDoc } from '@/lib/layout/parse';
import { deleteLayout, getLayoutJson, renameLayout, saveLayout } from '@/db/layouts';
import { loadLayoutFor } from '@/db/access';
import { noneMatchHits } from '@/server/api/etag';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ id: string }> };

/**
 * Read. The ETag is the layout version; If-None-Match with the current one answers 304 with no
 * body (screens revalidate the saved version cheaply: useLatestSaved). The 304 speaks for the
 * document and its version, which only a save moves; the session and the caller's rights are
 * checked first, so strangers get 401/404 whatever tag they send. Browsers revalidate every time.
 */
export const GET = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  const { id } = await params;
  const cache = { 'cache-control': 'private, no-cache' };
  if (req.headers.has('if-none-match')) {
    const { version } = await loadLayoutFor(actor, id);
    if (noneMatchHits(req, `"${version}"`)) return new Response(null, { status: 304, headers: { ...cache, ETag: `"${version}"` } });
  }
  // The text as the data layer made it (a LayoutDto): parsing it only to serialise it again
  // would be most of the work of a read.
  const layout = await getLayoutJson(actor, id);
  return new Response(layout.json, { headers: { ...cache, 'content-type': 'application/json', ETag: `"${layout.version}"` } });
});

/** Save: the body carries the document, If-Match the version it was based on. */
export const PUT = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  const { id } = await params;
  const base = baseVersionFrom(req);
  // Rights first, so a stranger learns nothing from the version rules.
  const layout = await loadLayoutFor(actor, id, { forEdit: true });
  if (base === null) throw new HttpError(428, 'Say which version you edited: send If-Match with the layout version.');
  if (Number.isNaN(base)) throw new HttpError(400, 'If-Match must be the layout version, a whole number.');
  const body = parseWith(saveLayoutBody, await readJson(req));
  const parsed = parseLayoutDoc(body.doc);
  if (!parsed.ok) throw invalid(parsed.issues.map((i) => ({ path: i.path ? `doc.${i.path}` : 'doc', message: i.message })));
  const saved = await saveLayout(actor, layout, base, { doc: parsed.value, name: body.name, clientId: body.clientId });
  return json({ id: saved.id, version: saved.version, updatedAt: saved.updatedAt, name: saved.name }, { headers: { ETag: `"${saved.version}"` } });
});

/**
 * Rename: `{ name }`. A save of the current document under the new name (a new version);
 * If-Match is optional here: without it the rename applies to whatever was saved last.
 */
export const PATCH = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  const { id } = await params;
  await loadLayoutFor(actor, id, { forEdit: 'rename layouts' });
  const base = baseVersionFrom(req);
  if (Number.isNaN(base)) throw new HttpError(400, 'If-Match must be the layout version, a whole number.');
  const body = parseWith(renameLayoutBody, await readJson(req, 4096));
  const saved = await renameLayout(actor, id, body.name, base);
  return json({ id: saved.id, version: saved.version, updatedAt: saved.updatedAt, name: saved.name }, { headers: { ETag: `"${saved.version}"` } });
});

export const DELETE = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  await deleteLayout(actor, (await params).id);
  return new Response(null, { status: 204 });
});
