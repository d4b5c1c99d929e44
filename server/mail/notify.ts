/**
 * Sends the mail that goes with working with a client, after the change it reports has been
 * stored: the invitation, a new revision (to the client), a decision (to the workshop), a new
 * mark-up (to the other side). A mail that cannot be sent never undoes the change: the answer
 * says `mail: 'not-sent'` and the server log says why.
 * Must never include another studio's people, and never send a token to anyone but its invitee.
 */
import 'server-only';
import { log } from '@/lib/log';
import type { Actor } from '@/db/actor';
import type { IssuedInvitation } from '@/db/sharing/invitations';
import { invitationPath, markInvitationSent } from '@/db/sharing/invitations';
import type { RevisionDto } from '@/db/sharing/revisions';
import type { ThreadDto } from '@/db/sharing/comments';
import { layoutClient, revisionIssuerId, workshopFor, type Recipient } from '@/db/sharing/recipients';
import { studioName } from '@/db/studios';
import { markupMail, decisionMail, invitationMail, revisionIssuedMail } from './messages';
import { publicUrl } from './public-url';
import { MAIL_NOT_CONFIGURED, mailConfigured, sendMail } from './transport';
import { HttpError } from '@/server/api/respond';
import type { ComposedMail } from './compose';

export type MailOutcome = 'sent' | 'not-sent' | 'no-recipient' | 'not-configured';

/** For features that are nothing but a mail (invitations): refuse up front, 503, when there is no mail. */
export function requireMail(): void {
  if (!mailConfigured()) throw new HttpError(503, MAIL_NOT_CONFIGURED);
}

/**
 * Sends one mail per recipient. `sender` is counted against the mail budget (server/mail/budget.ts);
 * invitations took theirs before anything changed, so they pass none here.
 */
async function deliver(studioId: string, to: Recipient[], build: (r: Recipient) => ComposedMail, sender?: Actor): Promise<MailOutcome> {
  if (!to.length) return 'no-recipient';
  if (!mailConfigured()) return 'not-configured';
  let ok = true;
  for (const r of to) {
    try {
      await sendMail({ ...build(r), to: r, studioId, ...(sender ? { sender: { userId: sender.userId, studioId: sender.studioId } } : {}) });
    } catch (err) {
      ok = false;
      log.error('mail not sent', { error: err });
    }
  }
  return ok ? 'sent' : 'not-sent';
}

export async function sendInvitation(req: Request, actor: Actor, issued: IssuedInvitation): Promise<MailOutcome> {
  let url: string;
  try {
    url = publicUrl(req, invitationPath(issued.token));
  } catch (err) {
    log.error('mail not sent', { error: err });
    return 'not-sent';
  }
  const inv = issued.invitation;
  const outcome = await deliver(actor.studioId, [{ email: inv.email, name: inv.name }], () =>
    invitationMail({
      clientName: inv.name, studioName: issued.studioName, inviterName: issued.inviterName, url,
      expiresAt: new Date(inv.expiresAt), layoutName: inv.layout?.name ?? null, role: inv.role,
    }),
  );
  if (outcome === 'sent') await markInvitationSent(inv.id);
  return outcome;
}

function linkOrNull(req: Request, path: string): string | null {
  try {
    return publicUrl(req, path);
  } catch (err) {
    log.error('mail not sent', { error: err });
    return null;
  }
}

export async function notifyRevisionIssued(req: Request, actor: Actor, layout: { id: string; name: string }, rev: RevisionDto): Promise<MailOutcome> {
  const client = await layoutClient(layout.id);
  if (!client) return 'no-recipient';
  const url = linkOrNull(req, `/layouts/${layout.id}/revisions`);
  if (!url) return mailConfigured() ? 'not-sent' : 'not-configured';
  const studio = await studioName(actor.studioId);
  return deliver(actor.studioId, [client], (r) =>
    revisionIssuedMail({ clientName: r.name, studioName: studio, layoutName: layout.name, letter: rev.letter, note: rev.note, url }),
  actor);
}

export async function notifyDecision(req: Request, actor: Actor, layout: { id: string; name: string }, rev: RevisionDto): Promise<MailOutcome> {
  const last = rev.decisions[rev.decisions.length - 1];
  if (!last) return 'no-recipient';
  const url = linkOrNull(req, `/layouts/${layout.id}/revisions`);
  if (!url) return mailConfigured() ? 'not-sent' : 'not-configured';
  const to = await workshopFor(layout.id, [await revisionIssuerId(rev.id)]);
  return deliver(actor.studioId, to, (r) =>
    decisionMail({ recipientName: r.name, clientName: actor.name, layoutName: layout.name, letter: rev.letter, decision: last.decision, message: last.message, url }),
  actor);
}

export async function notifyMarkup(
  req: Request,
  actor: Actor,
  layout: { id: string; name: string; createdBy: string | null },
  thread: ThreadDto,
  reply: boolean,
  threadAuthorId: string | null,
): Promise<MailOutcome> {
  const url = linkOrNull(req, `/layouts/${layout.id}?markup=${thread.id}`);
  if (!url) return mailConfigured() ? 'not-sent' : 'not-configured';
  let to: Recipient[];
  if (actor.role === 'client') {
    to = await workshopFor(layout.id, [layout.createdBy, threadAuthorId !== actor.userId ? threadAuthorId : null]);
  } else {
    const client = await layoutClient(layout.id);
    to = client ? [client] : [];
  }
  to = to.filter((r) => r.email.toLowerCase() !== actor.email.toLowerCase());
  const body = reply ? thread.replies[thread.replies.length - 1]?.body ?? '' : thread.body;
  return deliver(actor.studioId, to, (r) => markupMail({ recipientName: r.name, authorName: actor.name, layoutName: layout.name, body, reply, url }), actor);
}
