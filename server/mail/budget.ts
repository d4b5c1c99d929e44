/**
 * How much mail one person and one studio may make the app send, so that nobody who signs up
 * can use Baywright to mail an address over and over. Counted in the database (db/throttle.ts),
 * so the budgets hold across app instances:
 *   - per person: 40 mails an hour; per studio: 150 an hour (every mail a person's action sends:
 *     invitations, resends, revisions, decisions, comments, quotes);
 *   - per studio and recipient address, for invitations and resends: 3 a day.
 * Common practice for transactional mail, no source for the exact numbers.
 * Must never be skipped by a route that sends mail on someone's behalf.
 */
import 'server-only';
import { refund, reserve, throttleKey, type ThrottleRule } from '@/db/throttle';
import { HttpError } from '@/server/api/respond';

const HOUR = 3_600_000;
const DAY = 24 * HOUR;

export const MAIL_BUDGETS = {
  person: { free: 40, baseMs: HOUR, capMs: HOUR, quietMs: HOUR, windowMs: HOUR },
  studio: { free: 150, baseMs: HOUR, capMs: HOUR, quietMs: HOUR, windowMs: HOUR },
  invitee: { free: 3, baseMs: DAY, capMs: DAY, quietMs: DAY, windowMs: DAY },
} satisfies Record<string, ThrottleRule>;

export interface MailSender {
  userId: string;
  studioId: string;
}

export class MailBudgetSpent extends Error {
  constructor(readonly retryAfterS: number, readonly scope: 'person' | 'studio' | 'invitee') {
    super(
      scope === 'invitee'
        ? 'This address has been sent three invitations from this studio today. Wait a day, or ask them to look in their spam folder.'
        : scope === 'person'
          ? 'You have sent a lot of mail in the last hour. Wait a while before sending more.'
          : 'This studio has sent a lot of mail in the last hour. Wait a while before sending more.',
    );
    this.name = 'MailBudgetSpent';
  }
}

/**
 * Counts one mail against the sender's and the studio's budgets (and the invitee's), or throws.
 * Answers a function that gives the mail back (when the action it was for was refused).
 */
export async function takeMailBudget(sender: MailSender, invitee?: string): Promise<() => Promise<void>> {
  const keys: [string, ThrottleRule, MailBudgetSpent['scope']][] = [
    [throttleKey('mail-person', sender.userId), MAIL_BUDGETS.person, 'person'],
    [throttleKey('mail-studio', sender.studioId), MAIL_BUDGETS.studio, 'studio'],
  ];
  if (invitee) keys.push([throttleKey('mail-invitee', sender.studioId, invitee.toLowerCase()), MAIL_BUDGETS.invitee, 'invitee']);
  const taken: [string, ThrottleRule][] = [];
  const giveBack = () => Promise.all(taken.map(([key, rule]) => refund(key, rule)));
  for (const [key, rule, scope] of keys) {
    const r = await reserve(key, rule);
    if (!r.ok) {
      await giveBack();
      throw new MailBudgetSpent(r.retryAfterS, scope);
    }
    taken.push([key, rule]);
  }
  return async () => {
    await giveBack();
  };
}

/** For routes whose whole point is a mail (invitations, resends): 429 before anything changes. */
export async function requireMailBudget(sender: MailSender, invitee?: string): Promise<() => Promise<void>> {
  try {
    return await takeMailBudget(sender, invitee);
  } catch (err) {
    if (err instanceof MailBudgetSpent) throw new HttpError(429, err.message, { retryAfter: err.retryAfterS });
    throw err;
  }
}
