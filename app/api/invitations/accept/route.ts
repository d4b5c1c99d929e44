import { z } from 'zod';
import { handle, HttpError, json, parseWith, readJson } from '@/lib/api/respond';
import { acceptInvitation } from '@/db/sharing/invitations';
import { PASSWORD_MAX_BYTES, PASSWORD_MIN } from '@/lib/auth/password';
import { RateLimiter } from '@/lib/api/rate-limit';
import { clientAddress } from '@/lib/auth/address';

export const dynamic = 'force-dynamic';

const acceptBody = z.strictObject({
  token: z.string().min(1, 'the invitation link is missing its code').max(100),
  name: z.string().trim().min(1, 'tell us your name').max(80).optional(),
  password: z
    .string()
    .min(PASSWORD_MIN, `use at least ${PASSWORD_MIN} characters`)
    .refine((p) => new TextEncoder().encode(p).length <= PASSWORD_MAX_BYTES, `use at most ${PASSWORD_MAX_BYTES} bytes`),
});

/** Twenty attempts an hour from one address (the token itself is 256 bits; this only slows noise). */
const limiter = new RateLimiter(20, 20 / 3600);

/**
 * The invited client sets a password: no session needed, the token is the proof. Answers the
 * address to sign in with and the layout shared with them.
 */
export const POST = handle(async (req) => {
  if (!limiter.take(clientAddress(req))) throw new HttpError(429, 'Too many attempts from this address; try again later.');
  const body = parseWith(acceptBody, await readJson(req, 16 * 1024));
  const accepted = await acceptInvitation(body.token, { name: body.name, password: body.password });
  return json({ email: accepted.email, layoutId: accepted.layoutId }, { status: 201 });
});
