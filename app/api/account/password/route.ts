import { z } from 'zod';
import { handle, HttpError, invalid, json, parseWith, readJson, requireActor } from '@/server/api/respond';
import { changePassword } from '@/db/accounts';
import { newPasswordSchema } from '@/server/auth/password-policy';
import { clientAddress } from '@/server/auth/address';

export const dynamic = 'force-dynamic';

const changeBody = z
  .strictObject({
    currentPassword: z.string().min(1, 'enter your current password').max(200),
    newPassword: newPasswordSchema,
  })
  .refine((b) => b.currentPassword !== b.newPassword, { path: ['newPassword'], message: 'choose a password different from the current one' });

/**
 * The signed-in person changes their own password: the current one is asked (and throttled
 * like a sign-in); every session ends, this one included — the form signs in again.
 */
export const POST = handle(async (req) => {
  const actor = await requireActor(req);
  const body = parseWith(changeBody, await readJson(req, 4 * 1024));
  const result = await changePassword(actor.userId, body, clientAddress(req));
  if (result.ok) return json({ email: actor.email, signedOut: true });
  if (result.reason === 'rate_limited') throw new HttpError(429, 'Too many wrong passwords; wait a moment and try again.', { retryAfter: result.retryAfterS });
  throw invalid([{ path: 'currentPassword', message: 'that is not your current password' }]);
});
