import { handle, requireActor } from '@/server/api/respond';
import { deleteUpload, openUpload } from '@/db/uploads';
import { contentDisposition } from '@/lib/uploads/file-name';
import { isImage } from '@/lib/uploads/file-type';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ uploadId: string }> };

/**
 * The file's bytes, for whoever may see its layout. Photos are shown inline (for thumbnails and
 * the tracing layer) unless `?download=1`; PDFs always download. `nosniff` and a sandboxing CSP
 * keep a browser from treating the bytes as anything but what we found them to be.
 */
export const GET = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  const { upload, body } = await openUpload(actor, (await params).uploadId);
  const download = new URL(req.url).searchParams.get('download') === '1' || !isImage(upload.contentType);
  return new Response(body, {
    status: 200,
    headers: {
      'Content-Type': upload.contentType,
      'Content-Length': String(upload.sizeBytes),
      'Content-Disposition': contentDisposition(upload.fileName, download ? 'attachment' : 'inline'),
      'X-Content-Type-Options': 'nosniff',
      'Content-Security-Policy': "default-src 'none'; img-src 'self'; sandbox",
      'Cache-Control': 'private, no-cache',
    },
  });
});

export const DELETE = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  await deleteUpload(actor, (await params).uploadId);
  return new Response(null, { status: 204 });
});
