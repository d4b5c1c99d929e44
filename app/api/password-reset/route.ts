import { z } from 'zod';
import { handle, HttpError, json, parseWith, readJson } from '@/server/api/respond';
import { reserve, throttleKey } from '@/db/throttle';
import { clientAddress } from '@/server/auth/address';
import { startPasswordResetMail } from '@/server/mail/password-reset';

export const dynamic = 'force-dynamic';

const resetRequestBody = z.strictObject({ email: z.email('enter a valid e-mail address').max(254) });

/** Ten requests an hour from one client address (common practice, no source). */
const PER_ADDRESS = { free: 10, baseMs: 3_600_000, capMs: 3_600_000, quietMs: 3_600_000, windowMs: 3_600_000 };

export const RESET_REQUESTED =
  'If an account uses that address, we have sent it a link to set a new password. It works for 30 minutes. No mail? Check the address and your spam folder.';

/**
 * Asks for a reset link. The answer is the same, and comes as quickly, whether or not the
 * address has an account: the look-up and the mail run after the answer.
 */
export const POST = handle(async (req) => {
  const body = parseWith(resetRequestBody, await readJson(req, 4 * 1024));
  const slot = await reserve(throttleKey('reset-request-address', clientAddress(req)), PER_ADDRESS);
  if (!slot.ok) throw new HttpError(429, 'Too many reset requests from this address; try again later.', { retryAfter: slot.retryAfterS });
  startPasswordResetMail(req, body.email);
  return json({ message: RESET_REQUESTED }, { status: 202 });
});
