import { z } from 'zod';
import { handle, HttpError, json, parseWith, readJson } from '@/server/api/respond';
import { signUp } from '@/db/accounts';
import { newPasswordSchema } from '@/server/auth/password-policy';
import { RateLimiter } from '@/server/api/rate-limit';
import { clientAddress } from '@/server/auth/address';

export const dynamic = 'force-dynamic';

export const signUpBody = z.strictObject({
  name: z.string().trim().min(1, 'tell us your name').max(80),
  email: z.email('enter a valid e-mail address').max(254),
  password: newPasswordSchema,
  studioName: z.string().trim().max(80).optional(),
});

/** Ten sign-ups an hour from one address. */
const limiter = new RateLimiter(10, 10 / 3600);

/** Anyone may sign up: a new user with a studio of their own, as its owner. */
export const POST = handle(async (req) => {
  if (!limiter.take(clientAddress(req))) throw new HttpError(429, 'Too many sign-ups from this address; try again later.');
  const body = parseWith(signUpBody, await readJson(req, 16 * 1024));
  const user = await signUp(body);
  return json({ id: user.id, email: user.email, name: user.name }, { status: 201 });
});
