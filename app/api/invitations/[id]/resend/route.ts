import { handle, json, requireActor } from '@/lib/api/respond';
import { renewInvitation } from '@/db/sharing/invitations';
import { requireMail, sendInvitation } from '@/lib/mail/notify';
import { requireEditor } from '@/db/sharing/access';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ id: string }> };

/** Sends the invitation again with a fresh link and a fresh week; the older link stops working. */
export const POST = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  requireEditor(actor, 'send invitations');
  requireMail();
  const issued = await renewInvitation(actor, (await params).id);
  const mail = await sendInvitation(req, actor, issued);
  return json({ invitation: issued.invitation, mail });
});
