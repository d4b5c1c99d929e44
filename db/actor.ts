/**
 * Who is asking, as the data layer sees it: a user, their active studio, and their role there —
 * read from the database on every request (the role in the session token is only a snapshot).
 */
import 'server-only';
import { and, eq, sql } from 'drizzle-orm';
import { getDb, type Db } from './client';
import { prepared } from './prepared';
import { memberships, users } from './schema';
import { isId } from './ids';

export type StudioRole = 'owner' | 'designer' | 'client';

export interface Actor {
  userId: string;
  email: string;
  name: string;
  studioId: string;
  role: StudioRole;
}

function actorQuery(db: Db, withStudio: boolean) {
  const membership = withStudio
    ? and(eq(memberships.userId, users.id), eq(memberships.studioId, sql.placeholder('studioId')))
    : eq(memberships.userId, users.id);
  return db
    .select({
      userId: users.id,
      email: users.email,
      name: users.name,
      sessionVersion: users.sessionVersion,
      studioId: memberships.studioId,
      role: memberships.role,
    })
    .from(users)
    .innerJoin(memberships, membership)
    .where(eq(users.id, sql.placeholder('userId')))
    .orderBy(memberships.createdAt)
    .limit(1)
    .prepare(withStudio ? 'actor_in_studio' : 'actor_first_studio');
}

/**
 * Resolves the session's user to an Actor, or null when the user is gone, signed out since
 * (session version moved on), or no longer a member of the studio. One round trip: the user
 * joined to the membership the session names (or their first).
 */
export async function loadActor(userId: string, studioId: string | undefined, sessionVersion: number | undefined): Promise<Actor | null> {
  if (!isId(userId) || (studioId !== undefined && !isId(studioId))) return null;
  const db = await getDb();
  const query = prepared(db, studioId ? 'actor_in_studio' : 'actor_first_studio', (d) => actorQuery(d, Boolean(studioId)));
  const [row] = await query.execute({ userId, studioId });
  if (!row || (sessionVersion ?? 0) !== row.sessionVersion) return null;
  return { userId: row.userId, email: row.email, name: row.name, studioId: row.studioId, role: row.role };
}
