/**
 * The studio: its members and roles, preferred units and check defaults. Only an owner changes
 * them; every member may read the member list of their own studio (clients see names only).
 */
import 'server-only';
import { and, eq, sql } from 'drizzle-orm';
import { getDb } from './client';
import { memberships, studios, users } from './schema';
import { BadRequestError, ConflictError, ForbiddenError, NotFoundError } from './errors';
import type { Actor, StudioRole } from './actor';
import { normaliseEmail } from './accounts';
import { hashPassword } from '../lib/auth/password';
import { settingsSchema, type LayoutDoc, type LayoutSettings } from '../lib/layout/schema';
import type { LengthUnit } from '../lib/layout/units';

export interface MemberDto {
  userId: string;
  name: string;
  /** Only owners and designers see members' addresses. */
  email?: string;
  role: StudioRole;
  joinedAt: string;
}

export interface StudioDto {
  id: string;
  name: string;
  units: LengthUnit;
  checkDefaults: LayoutSettings;
  role: StudioRole;
}

export async function getStudio(actor: Actor): Promise<StudioDto> {
  const db = await getDb();
  const [s] = await db.select().from(studios).where(eq(studios.id, actor.studioId)).limit(1);
  if (!s) throw new NotFoundError('No such studio.');
  const defaults = settingsSchema.safeParse(s.checkDefaults);
  return { id: s.id, name: s.name, units: s.units, checkDefaults: defaults.success ? defaults.data : {}, role: actor.role };
}

export async function listMembers(actor: Actor): Promise<MemberDto[]> {
  const db = await getDb();
  const rows = await db
    .select({ userId: users.id, name: users.name, email: users.email, role: memberships.role, joinedAt: memberships.createdAt })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.studioId, actor.studioId))
    .orderBy(memberships.createdAt);
  const seesAddresses = actor.role !== 'client';
  return rows.map((r) => ({
    userId: r.userId,
    name: r.name,
    ...(seesAddresses ? { email: r.email } : {}),
    role: r.role,
    joinedAt: r.joinedAt.toISOString(),
  }));
}

function requireOwner(actor: Actor) {
  if (actor.role !== 'owner') throw new ForbiddenError('Only the studio owner can change members and settings.');
}

/**
 * Adds a designer or client. An existing account joins as it is; a new address gets an account
 * with the starting password the owner hands over.
 */
export async function addMember(
  actor: Actor,
  input: { email: string; name: string; role: 'designer' | 'client'; password?: string },
): Promise<MemberDto> {
  requireOwner(actor);
  const db = await getDb();
  const email = normaliseEmail(input.email);
  const [existing] = await db.select().from(users).where(eq(sql`lower(${users.email})`, email)).limit(1);
  let userId = existing?.id;
  if (!existing) {
    if (!input.password) throw new BadRequestError('This address has no account yet: set a starting password for it.');
    const [created] = await db
      .insert(users)
      .values({ email, name: input.name.trim(), passwordHash: await hashPassword(input.password) })
      .returning({ id: users.id });
    userId = created.id;
  }
  const [already] = await db
    .select()
    .from(memberships)
    .where(and(eq(memberships.studioId, actor.studioId), eq(memberships.userId, userId!)))
    .limit(1);
  if (already) throw new ConflictError('That person is already a member of this studio.');
  await db.insert(memberships).values({ userId: userId!, studioId: actor.studioId, role: input.role });
  const members = await listMembers(actor);
  return members.find((m) => m.userId === userId)!;
}

export async function changeRole(actor: Actor, userId: string, role: StudioRole): Promise<void> {
  requireOwner(actor);
  if (userId === actor.userId) throw new BadRequestError('You cannot change your own role.');
  const db = await getDb();
  const res = await db
    .update(memberships)
    .set({ role })
    .where(and(eq(memberships.studioId, actor.studioId), eq(memberships.userId, userId)))
    .returning({ userId: memberships.userId });
  if (!res.length) throw new NotFoundError('No such member.');
}

export async function removeMember(actor: Actor, userId: string): Promise<void> {
  requireOwner(actor);
  if (userId === actor.userId) throw new BadRequestError('You cannot remove yourself.');
  const db = await getDb();
  const res = await db
    .delete(memberships)
    .where(and(eq(memberships.studioId, actor.studioId), eq(memberships.userId, userId)))
    .returning({ userId: memberships.userId });
  if (!res.length) throw new NotFoundError('No such member.');
}

export async function updateStudio(actor: Actor, input: { name?: string; units?: LengthUnit; checkDefaults?: LayoutSettings }): Promise<StudioDto> {
  requireOwner(actor);
  const db = await getDb();
  await db
    .update(studios)
    .set({
      ...(input.name !== undefined ? { name: input.name.trim() } : {}),
      ...(input.units !== undefined ? { units: input.units } : {}),
      ...(input.checkDefaults !== undefined ? { checkDefaults: input.checkDefaults } : {}),
    })
    .where(eq(studios.id, actor.studioId));
  return getStudio(actor);
}

export async function studioCheckDefaults(actor: Actor): Promise<LayoutSettings> {
  return (await getStudio(actor)).checkDefaults;
}

/** The studio's defaults under the layout's own settings (the layout wins). */
export function withStudioDefaults(doc: LayoutDoc, defaults: LayoutSettings): LayoutDoc {
  if (!Object.keys(defaults).length) return doc;
  return { ...doc, settings: { ...defaults, ...doc.settings } };
}
