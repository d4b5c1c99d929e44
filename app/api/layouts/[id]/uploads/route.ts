import { handle, json, requireActor } from '@/server/api/respond';
import { addUpload, listUploads } from '@/db/uploads';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ id: string }> };

/** The layout's reference files: for its studio's owners and designers and for its client. */
export const GET = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  return json({ uploads: await listUploads(actor, (await params).id) });
});

/**
 * Adds one file. The body is the file's bytes (not a form), its Content-Type the type the
 * browser claims, `?name=` the file's name. Size (413) and type (415) are checked while the
 * body streams to disk.
 */
export const POST = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  const { id } = await params;
  const declared = req.headers.get('content-length');
  const upload = await addUpload(actor, id, {
    body: req.body,
    fileName: new URL(req.url).searchParams.get('name'),
    contentType: req.headers.get('content-type') ?? '',
    declaredLength: declared !== null && /^\d+$/.test(declared) ? Number(declared) : undefined,
  });
  return json(upload, { status: 201 });
});
