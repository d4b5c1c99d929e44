import { z } from 'zod';
import { handle, json, parseWith, readJson, requireActor } from '@/server/api/respond';
import { listInvitations } from '@/db/sharing/invitations';
import { requireWorkshop } from '@/db/access';
import { inviteAndMail } from '@/server/mail/invite';
import { idField } from '@/db/ids';

export const dynamic = 'force-dynamic';

const inviteBody = z.strictObject({
  email: z.email('enter a valid e-mail address').max(254),
  name: z.string().trim().min(1, 'give the client’s name').max(80),
  layoutId: idField('choose one of this studio’s layouts').nullable().optional(),
});

/** The studio's invitations and their state (owners and designers). */
export const GET = handle(async (req) => {
  const actor = await requireActor(req);
  return json({ invitations: await listInvitations(actor) });
});

/**
 * Invites a client by mail: the link lets them set a password, or join with the account they
 * already have. Answers the same either way.
 */
export const POST = handle(async (req) => {
  const actor = await requireActor(req);
  requireWorkshop(actor, 'invite clients');
  const body = parseWith(inviteBody, await readJson(req, 16 * 1024));
  return json(await inviteAndMail(req, actor, { ...body, role: 'client' }), { status: 201 });
});
