import { handle, json, requireActor } from '@/server/api/respond';
import { getInvitation, renewInvitation } from '@/db/sharing/invitations';
import { requireMailBudget } from '@/server/mail/budget';
import { requireMail, sendInvitation } from '@/server/mail/notify';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ id: string }> };

/** Sends the invitation again with a fresh link and a fresh week; the older link stops working. */
export const POST = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  const { id } = await params;
  const invitation = await getInvitation(actor, id);
  // Without mail there is nothing to resend: 503, and the link stays as it was.
  requireMail();
  const giveBack = await requireMailBudget(actor, invitation.email);
  const issued = await renewInvitation(actor, id).catch(async (err: unknown) => {
    await giveBack(); // accepted or withdrawn meanwhile: no mail went out
    throw err;
  });
  const mail = await sendInvitation(req, actor, issued);
  return json({ invitation: issued.invitation, mail });
});
