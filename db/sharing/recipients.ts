/**
 * Who hears about what, for the notification mail: the layout's client hears of new revisions
 * and of the workshop's comments; the workshop (whoever issued the revision or made the layout,
 * else the studio's owners) hears of decisions and of the client's comments. Returns addresses
 * for server/mail only. Must never be used to build an API answer.
 */
import 'server-only';
import { and, eq, inArray } from 'drizzle-orm';
import { getDb } from '../client';
import { layouts, memberships, revisions, users } from '../schema';

export interface Recipient {
  email: string;
  name: string;
}

export async function layoutClient(layoutId: string): Promise<Recipient | null> {
  const db = await getDb();
  const [row] = await db
    .select({ email: users.email, name: users.name, studioId: layouts.studioId, userId: users.id })
    .from(layouts)
    .innerJoin(users, eq(users.id, layouts.clientId))
    .where(eq(layouts.id, layoutId))
    .limit(1);
  if (!row) return null;
  const [m] = await db.select({ role: memberships.role }).from(memberships)
    .where(and(eq(memberships.userId, row.userId), eq(memberships.studioId, row.studioId))).limit(1);
  return m?.role === 'client' ? { email: row.email, name: row.name } : null;
}

/**
 * The workshop people for a layout: the given people (revision issuer, layout author) while they
 * are still owners or designers of the studio; the owners when none of them is.
 */
export async function workshopFor(layoutId: string, preferred: (string | null | undefined)[]): Promise<Recipient[]> {
  const db = await getDb();
  const [layout] = await db.select({ studioId: layouts.studioId, createdBy: layouts.createdBy }).from(layouts).where(eq(layouts.id, layoutId)).limit(1);
  if (!layout) return [];
  const staff = await db
    .select({ id: users.id, email: users.email, name: users.name, role: memberships.role })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.studioId, layout.studioId), inArray(memberships.role, ['owner', 'designer'])));
  const wanted = new Set([...preferred, layout.createdBy].filter((v): v is string => !!v));
  const chosen = staff.filter((s) => wanted.has(s.id));
  const list = chosen.length ? chosen : staff.filter((s) => s.role === 'owner');
  const seen = new Set<string>();
  return list.filter((s) => !seen.has(s.email) && seen.add(s.email)).map(({ email, name }) => ({ email, name }));
}

/** Who issued a revision (for telling them about the client's decision). */
export async function revisionIssuerId(revisionId: string): Promise<string | null> {
  const db = await getDb();
  const [row] = await db.select({ issuedBy: revisions.issuedBy }).from(revisions).where(eq(revisions.id, revisionId)).limit(1);
  return row?.issuedBy ?? null;
}
