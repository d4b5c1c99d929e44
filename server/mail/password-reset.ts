/**
 * Mailing a password reset link. The request route answers before any of this runs, so the
 * answer and its timing are the same for known and unknown addresses; the work (look-up, a
 * per-address budget of 3 links an hour, the mail) happens after. Failures are logged without
 * the address or the token. Must never run inside the answer's time.
 */
import 'server-only';
import { log } from '@/lib/log';
import { issuePasswordReset, RESET_MINUTES } from '@/db/password-resets';
import { normaliseEmail } from '@/db/accounts';
import { reserve, throttleKey, type ThrottleRule } from '@/db/throttle';
import { passwordResetMail } from './messages';
import { publicUrl } from './public-url';
import { sendMail } from './transport';

/** Three reset mails an hour to one address, whoever asks (common practice, no source). */
export const RESET_MAIL_RULE: ThrottleRule = { free: 3, baseMs: 3_600_000, capMs: 3_600_000, quietMs: 3_600_000, windowMs: 3_600_000 };

const pending = new Set<Promise<void>>();

async function mailReset(req: Request, email: string): Promise<void> {
  const budget = await reserve(throttleKey('mail-reset', normaliseEmail(email)), RESET_MAIL_RULE);
  if (!budget.ok) return;
  const issued = await issuePasswordReset(email);
  if (!issued) return;
  const url = publicUrl(req, `/reset-password/${issued.token}`);
  await sendMail({ ...passwordResetMail({ name: issued.name, url, minutes: RESET_MINUTES }), to: { email: issued.email, name: issued.name }, studioId: issued.studioId ?? '' });
}

/** Starts the work and returns at once. */
export function startPasswordResetMail(req: Request, email: string): void {
  const job = mailReset(req, email)
    .catch((err) => log.error('reset mail not sent', { errorClass: err instanceof Error ? err.name : 'unknown error' }))
    .finally(() => pending.delete(job));
  pending.add(job);
}

/** For tests: waits for every reset mail started so far. */
export async function settledResetMail(): Promise<void> {
  await Promise.all([...pending]);
}
