/**
 * The words of every mail Baywright sends about working with a client: the invitation, a new
 * revision, the client’s decision, a new mark-up. Pure functions of their inputs (names, links,
 * letters); the caller supplies absolute links. Must never look anything up or send anything.
 */
import { compose, oneLine, type ComposedMail } from './compose';

import { SIGN_OFF_CAUTION } from '../../lib/layout/cautions';
import { formatDate } from '../../lib/format';

/** Said wherever a plan is issued or approved (its words live in lib/layout/cautions). */
export { SIGN_OFF_CAUTION };

export function invitationMail(p: { clientName: string; studioName: string; inviterName: string; url: string; expiresAt: Date; layoutName?: string | null; role?: 'designer' | 'client' }): ComposedMail {
  const until = formatDate(p.expiresAt);
  const designer = p.role === 'designer';
  return compose(designer ? `${oneLine(p.studioName, 80)} invites you to draw layouts with them` : `${oneLine(p.studioName, 80)} invites you to follow your van's design`, {
    greeting: `Hello ${oneLine(p.clientName, 80)},`,
    paragraphs: [
      designer
        ? `${p.inviterName} at ${p.studioName} has invited you to join their drawing office on Baywright as a designer: you will draw and check the studio's van layouts.`
        : `${p.inviterName} at ${p.studioName} has invited you to Baywright, where you can follow the plan of your van conversion, leave mark-ups on the drawing and approve revisions.`,
      ...(p.layoutName ? [`The layout waiting for you: ${p.layoutName}.`] : []),
      `Open the link to join. New to Baywright? You choose your own password there. Already have an account? Sign in with it and you join with the account you have. The link works once and until ${until}.`,
    ],
    action: { label: 'Join the studio', url: p.url },
    footer: 'If you were not expecting this, ignore the mail: nothing happens unless the link is used. Nobody at the workshop sees or sets your password.',
  });
}

export function passwordResetMail(p: { name: string; url: string; minutes: number }): ComposedMail {
  return compose('Set a new Baywright password', {
    greeting: `Hello ${oneLine(p.name, 80)},`,
    paragraphs: [
      'Someone, hopefully you, asked to set a new password for your Baywright account.',
      `Use the link within ${p.minutes} minutes; it works once. Setting a new password signs you out everywhere else.`,
    ],
    action: { label: 'Set a new password', url: p.url },
    footer: 'If you did not ask for this, ignore the mail: your password stays as it is.',
  });
}

export function revisionIssuedMail(p: { clientName: string; studioName: string; layoutName: string; letter: string; note: string; url: string }): ComposedMail {
  return compose(`Revision ${p.letter} of ${oneLine(p.layoutName, 80)} is issued for your approval`, {
    greeting: `Hello ${oneLine(p.clientName, 80)},`,
    paragraphs: [
      `${p.studioName} has issued revision ${p.letter} of ${p.layoutName} for your approval. Look it over, then approve it or return it for changes.`,
    ],
    quote: p.note || undefined,
    action: { label: `Open revision ${p.letter}`, url: p.url },
    footer: SIGN_OFF_CAUTION,
  });
}

export function decisionMail(p: { recipientName: string; clientName: string; layoutName: string; letter: string; decision: 'approved' | 'changes-asked'; message: string; url: string }): ComposedMail {
  const approved = p.decision === 'approved';
  return compose(
    approved ? `${oneLine(p.clientName, 80)} approved revision ${p.letter} of ${oneLine(p.layoutName, 80)}`
      : `${oneLine(p.clientName, 80)} returned revision ${p.letter} of ${oneLine(p.layoutName, 80)} for changes`,
    {
      greeting: `Hello ${oneLine(p.recipientName, 80)},`,
      paragraphs: [
        approved
          ? `${p.clientName} approved revision ${p.letter} of ${p.layoutName}. The approval is recorded and cannot be changed.`
          : `${p.clientName} returned revision ${p.letter} of ${p.layoutName} for changes, with these words:`,
      ],
      quote: p.message || undefined,
      action: { label: 'See the revisions', url: p.url },
      ...(approved ? { footer: SIGN_OFF_CAUTION } : {}),
    },
  );
}

export function markupMail(p: { recipientName: string; authorName: string; layoutName: string; body: string; reply: boolean; url: string }): ComposedMail {
  return compose(
    p.reply ? `${oneLine(p.authorName, 80)} replied to a mark-up on ${oneLine(p.layoutName, 80)}` : `${oneLine(p.authorName, 80)} left a mark-up on ${oneLine(p.layoutName, 80)}`,
    {
      greeting: `Hello ${oneLine(p.recipientName, 80)},`,
      paragraphs: [p.reply ? `${p.authorName} replied to a mark-up on ${p.layoutName}:` : `${p.authorName} left a mark-up on ${p.layoutName}:`],
      quote: p.body,
      action: { label: 'Open the layout', url: p.url },
    },
  );
}
