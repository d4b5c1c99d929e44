import { handle, HttpError, requireActor } from '@/server/api/respond';
import { getOutboxRaw } from '@/db/sharing/outbox';
import { outboxEnabled } from '@/server/mail/outbox-mode';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ id: string }> };

/** One received message as it arrived (message/rfc822), for the studio's owner; tests parse it. */
export const GET = handle<Ctx>(async (req, { params }) => {
  if (!outboxEnabled()) throw new HttpError(404, 'Not found');
  const actor = await requireActor(req);
  const raw = await getOutboxRaw(actor, (await params).id);
  return new Response(raw, {
    headers: { 'Content-Type': 'message/rfc822', 'Content-Disposition': 'attachment; filename="message.eml"', 'Cache-Control': 'no-store' },
  });
});
