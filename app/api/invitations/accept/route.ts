import { z } from 'zod';
import { handle, HttpError, json, parseWith, readJson } from '@/server/api/respond';
import { acceptInvitation } from '@/db/sharing/invitations';
import { newPasswordSchema } from '@/server/auth/password-policy';
import { RateLimiter } from '@/server/api/rate-limit';
import { clientAddress } from '@/server/auth/address';
import { actorFromRequest } from '@/server/auth/session';

export const dynamic = 'force-dynamic';

const acceptBody = z.strictObject({
  token: z.string().min(1, 'the invitation link is missing its code').max(100),
  name: z.string().trim().min(1, 'tell us your name').max(80).optional(),
  /** Only for an address with no account yet; an existing account accepts with its session. */
  password: z.optional(newPasswordSchema),
});

/** Twenty attempts an hour from one address (the token itself is 256 bits; this only slows noise). */
const limiter = new RateLimiter(20, 20 / 3600);

/**
 * Accepts an invitation: the token is the proof that the mail arrived. A new address sets its
 * password here; an address that already has an account must be signed in as that account.
 * Answers the address, the studio joined and the layout shared (if any).
 */
export const POST = handle(async (req) => {
  if (!limiter.take(clientAddress(req))) throw new HttpError(429, 'Too many attempts from this address; try again later.');
  const body = parseWith(acceptBody, await readJson(req, 16 * 1024));
  const signedIn = await actorFromRequest(req);
  const accepted = await acceptInvitation(body.token, { name: body.name, password: body.password, signedInUserId: signedIn?.userId ?? null });
  return json({ email: accepted.email, layoutId: accepted.layoutId, studioId: accepted.studioId, joined: accepted.joined }, { status: 201 });
});
