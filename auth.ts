/**
 * Auth.js with e-mail + password. The Credentials provider checks the password against the
 * database and applies the failed-sign-in limit; the rest of the configuration is DB-free and
 * lives in auth.config.ts.
 */
import NextAuth, { CredentialsSignin } from 'next-auth';
import Credentials from 'next-auth/providers/credentials';
import { z } from 'zod';
import { authConfig } from './auth.config';
import { authenticate, endSessions } from './db/accounts';
import { loadActor } from './db/actor';
import { clientAddress } from './server/auth/address';
import { describeError, log } from './lib/log';

class RateLimited extends CredentialsSignin {
  code = 'rate_limited';
}
class InvalidCredentials extends CredentialsSignin {
  code = 'invalid_credentials';
}

const credentialsSchema = z.object({
  email: z.string().trim().email().max(254),
  password: z.string().min(1).max(200),
});

const studioSwitch = z.object({ studioId: z.uuid() });

export const { handlers, auth, signIn, signOut } = NextAuth({
  ...authConfig,
  // Auth.js's own messages go through the redacting logger (its errors may carry tokens or form fields).
  logger: {
    error: (error) => log.error('sign-in service error', describeError(error)),
    warn: (code) => log.warn('sign-in service warning', { code }),
    debug: () => undefined,
  },
  callbacks: {
    ...authConfig.callbacks,
    /**
     * Beyond the DB-free checks: a token whose user signed out since, or lost the membership it
     * names, gets nothing (not even a fresh cookie). `update({ studioId })` moves the session to
     * another studio the person belongs to (after accepting an invitation).
     */
    async jwt(params) {
      const token = await authConfig.callbacks.jwt(params);
      if (!token || params.user) return token;
      if (typeof token.uid !== 'string') return null;
      const wanted = params.trigger === 'update' ? studioSwitch.safeParse(params.session) : null;
      let actor = wanted?.success ? await loadActor(token.uid, wanted.data.studioId, token.sv) : null;
      actor ??= await loadActor(token.uid, token.studioId, token.sv);
      if (!actor) return null;
      return { ...token, studioId: actor.studioId, role: actor.role };
    },
  },
  events: {
    // Sign-out ends every session of the user, not only this cookie.
    async signOut(message) {
      const uid = 'token' in message ? message.token?.uid : undefined;
      if (uid) await endSessions(uid);
    },
  },
  providers: [
    Credentials({
      credentials: { email: { label: 'E-mail' }, password: { label: 'Password', type: 'password' } },
      async authorize(raw, request) {
        const parsed = credentialsSchema.safeParse(raw);
        if (!parsed.success) throw new InvalidCredentials();
        const result = await authenticate(parsed.data.email, parsed.data.password, clientAddress(request));
        if (!result.ok) throw result.reason === 'rate_limited' ? new RateLimited() : new InvalidCredentials();
        const { id, email, name, role, studioId, sessionVersion } = result.user;
        return { id, email, name, role, studioId, sessionVersion };
      },
    }),
  ],
});
