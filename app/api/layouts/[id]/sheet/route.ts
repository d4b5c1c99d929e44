import { handle, HttpError, parseWith, requireActor } from '@/server/api/respond';
import { RateLimiter } from '@/server/api/rate-limit';
import { sheetFonts } from '@/server/api/sheet-fonts';
import { clientAddress } from '@/server/auth/address';
import { runJob } from '@/lib/workers/pool';
import { contentDisposition, cleanFileName } from '@/lib/uploads/file-name';
import { loadLayoutFor } from '@/db/access';
import { queryOf, sheetFileName, sheetQuerySchema, sheetRequestFor } from '../../../../../server/sheet/sheet-request';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ id: string }> };

/**
 * A sheet costs up to a second or two of a pool worker's time (lib/workers/pool.ts; ten at once
 * queue or get 503): a burst of 10, then one every
 * 3 s per user (common practice, no source) — plenty for printing, not enough to tie the server up.
 */
export const sheetLimiter = new RateLimiter(10, 1 / 3);
/** Per client address too (server/auth/address): three users' worth. */
export const sheetAddressLimiter = new RateLimiter(30, 1);

/**
 * The plan sheet as a PDF: `?paper=a4|a3&scale=10|20|25[&revision=B]`. Anyone who may read the layout may
 * print it. A bay that does not fit the paper at that scale gets 422 with the reason and a
 * suggested scale (or paper) that fits.
 */
export const GET = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  if (!sheetLimiter.take(actor.userId)) {
    throw new HttpError(429, 'Too many plan sheets at once; wait a few seconds.', { retryAfter: sheetLimiter.retryAfter(actor.userId) });
  }
  const address = clientAddress(req);
  if (!sheetAddressLimiter.take(address)) {
    throw new HttpError(429, 'Too many plan sheets from this address; wait a few seconds.', { retryAfter: sheetAddressLimiter.retryAfter(address) });
  }
  const { id } = await params;
  const parsed = sheetQuerySchema.safeParse(queryOf(req.url));
  if (!parsed.success) {
    await loadLayoutFor(actor, id); // rights first, so a stranger learns nothing from the query rules
    parseWith(sheetQuerySchema, queryOf(req.url)); // throws the 400 with field paths
  }
  const q = parsed.data!;
  const ctx = await sheetRequestFor(actor, id, q.revision);
  const result = await runJob('sheetPdf', { ...ctx.request, paper: q.paper, scale: q.scale, author: ctx.request.details.studio, fonts: await sheetFonts() });
  if (!result.ok) throw new HttpError(422, result.message, { suggestion: result.suggestion, needed: result.needed, available: result.available });
  const bytes = result.pdf;
  return new Response(Buffer.from(bytes), {
    status: 200,
    headers: {
      'Content-Type': 'application/pdf',
      'Content-Length': String(bytes.byteLength),
      'Content-Disposition': contentDisposition(cleanFileName(sheetFileName(ctx.layoutName, q, ctx.request.details.revision)), 'attachment'),
      'X-Content-Type-Options': 'nosniff',
      'Cache-Control': 'private, no-store',
    },
  });
});
