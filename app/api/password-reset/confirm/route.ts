import { z } from 'zod';
import { handle, HttpError, json, parseWith, readJson } from '@/server/api/respond';
import { resetPassword } from '@/db/password-resets';
import { newPasswordSchema } from '@/server/auth/password-policy';
import { RateLimiter } from '@/server/api/rate-limit';
import { clientAddress } from '@/server/auth/address';

export const dynamic = 'force-dynamic';

const confirmBody = z.strictObject({
  token: z.string().min(1, 'the reset link is missing its code').max(100),
  password: newPasswordSchema,
});

/** Twenty tries an hour from one address (the token carries 256 bits; this only slows noise). */
const limiter = new RateLimiter(20, 20 / 3600);

/** Sets a new password with a reset link; every session of the account ends. */
export const POST = handle(async (req) => {
  if (!limiter.take(clientAddress(req))) throw new HttpError(429, 'Too many attempts from this address; try again later.');
  const body = parseWith(confirmBody, await readJson(req, 4 * 1024));
  return json(await resetPassword(body.token, body.password));
});
