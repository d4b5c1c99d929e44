import type { DefaultSession } from 'next-auth';

export type StudioRole = 'owner' | 'designer' | 'client';

declare module 'next-auth' {
  interface User {
    role?: StudioRole;
    studioId?: string;
    sessionVersion?: number;
  }
  interface Session {
    user: {
      id: string;
      /** A snapshot from sign-in; writes re-read the membership from the database. */
      role?: StudioRole;
      studioId?: string;
    } & DefaultSession['user'];
  }
}

declare module '@auth/core/jwt' {
  interface JWT {
    uid?: string;
    role?: StudioRole;
    studioId?: string;
    sv?: number;
    /** When the person signed in (seconds since 1970): the session ends 7 days after it. */
    sat?: number;
  }
}
