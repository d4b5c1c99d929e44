/**
 * Who is asking, as the data layer sees it: a user, their active studio, and their role there —
 * read from the database on every request (the role in the session token is only a snapshot).
 */
import 'server-only';
import { and, eq } from 'drizzle-orm';
import { getDb } from './client';
import { memberships, users } from './schema';

export type StudioRole = 'owner' | 'designer' | 'client';

export interface Actor {
  userId: string;
  email: string;
  name: string;
  studioId: string;
  role: StudioRole;
}

/**
 * Resolves the session's user to an Actor, or null when the user is gone, signed out since
 * (session version moved on), or no longer a member of the studio.
 */
export async function loadActor(userId: string, studioId: string | undefined, sessionVersion: number | undefined): Promise<Actor | null> {
  const db = await getDb();
  const [user] = await db.select().from(users).where(eq(users.id, userId)).limit(1);
  if (!user || (sessionVersion ?? 0) !== user.sessionVersion) return null;
  const rows = await db
    .select({ studioId: memberships.studioId, role: memberships.role })
    .from(memberships)
    .where(studioId ? and(eq(memberships.userId, userId), eq(memberships.studioId, studioId)) : eq(memberships.userId, userId))
    .orderBy(memberships.createdAt)
    .limit(1);
  const m = rows[0];
  if (!m) return null;
  return { userId: user.id, email: user.email, name: user.name, studioId: m.studioId, role: m.role };
}

export function canEditLayouts(actor: Actor): boolean {
  return actor.role === 'owner' || actor.role === 'designer';
}
