/**
 * Inviting someone into a studio and mailing them the link, for the two routes that do it
 * (`POST /api/invitations` for clients, `POST /api/studio/members` for any role). The answer is
 * the same whether the address has an account or not; the mail budget is taken before anything
 * is stored. Must never put the token in the answer.
 */
import 'server-only';
import type { Actor } from '@/db/actor';
import { createInvitation, type InvitationDto, type NewInvitation } from '@/db/sharing/invitations';
import { normaliseEmail } from '@/db/accounts';
import { requireMailBudget } from './budget';
import { requireMail, sendInvitation, type MailOutcome } from './notify';

export async function inviteAndMail(req: Request, actor: Actor, input: NewInvitation): Promise<{ invitation: InvitationDto; mail: MailOutcome }> {
  // An invitation is a mail: on a server without mail, nothing is stored and the answer (503) says why.
  requireMail();
  const giveBack = await requireMailBudget(actor, normaliseEmail(input.email));
  let issued;
  try {
    issued = await createInvitation(actor, input);
  } catch (err) {
    await giveBack(); // refused (already a member, someone else's layout…): no mail went out
    throw err;
  }
  const mail = await sendInvitation(req, actor, issued);
  return { invitation: issued.invitation, mail };
}
