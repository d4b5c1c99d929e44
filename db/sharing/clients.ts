/**
 * The studio's clients, for the workshop: each client with the layouts shared with them and
 * where each layout stands. Owners and designers only — clients never see other clients.
 * Must never return password hashes or another studio's people.
 */
import 'server-only';
import { and, asc, eq } from 'drizzle-orm';
import { getDb } from '../client';
import { layouts, memberships, users } from '../schema';
import type { Actor } from '../actor';
import { requireWorkshop, visibleLayouts } from '../access';
import { layoutStates, type LayoutState } from './revisions';

export interface ClientDto {
  userId: string;
  name: string;
  email: string;
  joinedAt: string;
  layouts: { id: string; name: string; state: LayoutState; latestRevision: string | null }[];
}

export async function listClients(actor: Actor): Promise<ClientDto[]> {
  requireWorkshop(actor, 'see the client list');
  const db = await getDb();
  const people = await db
    .select({ userId: users.id, name: users.name, email: users.email, joinedAt: memberships.createdAt })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.studioId, actor.studioId), eq(memberships.role, 'client')))
    .orderBy(asc(users.name));
  const shared = await db
    .select({ id: layouts.id, name: layouts.name, clientId: layouts.clientId })
    .from(layouts)
    .where(visibleLayouts(actor))
    .orderBy(asc(layouts.name));
  const states = await layoutStates(shared.map((l) => l.id));
  return people.map((p) => ({
    userId: p.userId,
    name: p.name,
    email: p.email,
    joinedAt: p.joinedAt.toISOString(),
    layouts: shared.filter((l) => l.clientId === p.userId).map((l) => ({
      id: l.id, name: l.name, state: states.get(l.id)?.state ?? 'draft', latestRevision: states.get(l.id)?.latest ?? null,
    })),
  }));
}

/** Layouts with no client yet: what an invitation may share. */
export async function unsharedLayouts(actor: Actor): Promise<{ id: string; name: string }[]> {
  requireWorkshop(actor, 'invite clients');
  const db = await getDb();
  const rows = await db.select({ id: layouts.id, name: layouts.name, clientId: layouts.clientId }).from(layouts)
    .where(visibleLayouts(actor)).orderBy(asc(layouts.name));
  return rows.filter((r) => !r.clientId).map(({ id, name }) => ({ id, name }));
}
