import { handle, HttpError, requireActor } from '@/server/api/respond';
import { RateLimiter } from '@/server/api/rate-limit';
import { sheetFonts } from '@/server/api/sheet-fonts';
import { runJob } from '@/lib/workers/pool';
import { contentDisposition, cleanFileName } from '@/lib/uploads/file-name';
import { getCurrentQuote } from '@/db/quotes';
import { NotFoundError } from '@/db/errors';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ id: string }> };

/** A quote PDF is a fraction of a sheet's work: a burst of 10, then one a second per user (common practice, no source). */
export const quotePdfLimiter = new RateLimiter(10, 1);

/**
 * The layout's current quote as a PDF: the workshop's details, the revision it was priced from,
 * the date it holds until, the priced lines, the deposit, the studio's terms and the safety
 * cautions. Anyone who may read the layout (its workshop and its client); 404 before a quote is sent.
 */
export const GET = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  if (!quotePdfLimiter.take(actor.userId)) {
    throw new HttpError(429, 'Too many quote files at once; wait a few seconds.', { retryAfter: quotePdfLimiter.retryAfter(actor.userId) });
  }
  const quote = await getCurrentQuote(actor, (await params).id);
  if (!quote) throw new NotFoundError('No quote has been sent for this layout yet.');
  const bytes = await runJob('quotePdf', { quote, author: quote.studioName, fonts: await sheetFonts() });
  return new Response(Buffer.from(bytes), {
    status: 200,
    headers: {
      'Content-Type': 'application/pdf',
      'Content-Length': String(bytes.byteLength),
      'Content-Disposition': contentDisposition(cleanFileName(`${quote.layoutName}, quote ${quote.reference}.pdf`), 'attachment'),
      'X-Content-Type-Options': 'nosniff',
      'Cache-Control': 'private, no-store',
    },
  });
});
