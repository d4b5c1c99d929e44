import { z } from 'zod';
import { handle, json, parseWith, readJson, requireActor } from '@/server/api/respond';
import { listMembers, requireOwner } from '@/db/studios';
import { inviteAndMail } from '@/server/mail/invite';

export const dynamic = 'force-dynamic';

const memberBody = z.strictObject({
  email: z.email('enter a valid e-mail address').max(254),
  name: z.string().trim().min(1, 'give their name').max(80),
  role: z.enum(['designer', 'client']),
});

export const GET = handle(async (req) => {
  const actor = await requireActor(req);
  return json({ members: await listMembers(actor) });
});

/**
 * The owner adds a designer or a client: always by invitation. The person sets their own
 * password, or joins with the account they have; the studio sees their name once they accept.
 */
export const POST = handle(async (req) => {
  const actor = await requireActor(req);
  requireOwner(actor);
  const body = parseWith(memberBody, await readJson(req, 16 * 1024));
  return json(await inviteAndMail(req, actor, body), { status: 201 });
});
