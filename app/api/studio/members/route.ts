import { z } from 'zod';
import { handle, json, parseWith, readJson, requireActor } from '@/lib/api/respond';
import { addMember, listMembers } from '@/db/studios';
import { PASSWORD_MIN } from '@/lib/auth/password';

export const dynamic = 'force-dynamic';

const memberBody = z.strictObject({
  email: z.email('enter a valid e-mail address').max(254),
  name: z.string().trim().min(1, 'give their name').max(80),
  role: z.enum(['designer', 'client']),
  password: z.string().min(PASSWORD_MIN, `use at least ${PASSWORD_MIN} characters`).max(72).optional(),
});

export const GET = handle(async (req) => {
  const actor = await requireActor(req);
  return json({ members: await listMembers(actor) });
});

/** Owners add a designer or a client to their studio. */
export const POST = handle(async (req) => {
  const actor = await requireActor(req);
  const body = parseWith(memberBody, await readJson(req, 16 * 1024));
  return json(await addMember(actor, body), { status: 201 });
});
