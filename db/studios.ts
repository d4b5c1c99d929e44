/**
 * The studio: its members and roles, preferred units and check defaults. Only an owner changes
 * them. Owners and designers read the whole member list; a client sees only the people of their
 * own layouts (themselves, the owners, and the designers who made or changed those layouts),
 * names only — never the studio's other clients. People join only by invitation
 * (db/sharing/invitations.ts): nothing here creates an account or attaches one.
 */
import 'server-only';
import { and, eq } from 'drizzle-orm';
import { getDb } from './client';
import { layouts, memberships, studios, users } from './schema';
import { BadRequestError, ForbiddenError, NotFoundError } from './errors';
import type { Actor, StudioRole } from './actor';
import { isId } from './ids';
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
  /** What every quote the studio sends carries: its details, its terms and how long it holds. */
  quote: QuoteTerms;
}

export interface QuoteTerms {
  /** Address, telephone, mail, company and VAT numbers: lines of plain text. */
  details: string;
  terms: string;
  validDays: number;
}

export async function getStudio(actor: Actor): Promise<StudioDto> {
  const db = await getDb();
  const [s] = await db.select().from(studios).where(eq(studios.id, actor.studioId)).limit(1);
  if (!s) throw new NotFoundError('No such studio.');
  const defaults = settingsSchema.safeParse(s.checkDefaults);
  return {
    id: s.id, name: s.name, units: s.units, checkDefaults: defaults.success ? defaults.data : {}, role: actor.role,
    quote: { details: s.quoteDetails, terms: s.quoteTerms, validDays: s.quoteValidDays },
  };
}

/** The designers who made or last changed a layout shared with this client. */
async function clientsDesigners(actor: Actor): Promise<Set<string>> {
  const db = await getDb();
  const rows = await db
    .select({ createdBy: layouts.createdBy, updatedBy: layouts.updatedBy })
    .from(layouts)
    .where(and(eq(layouts.studioId, actor.studioId), eq(layouts.clientId, actor.userId)));
  return new Set(rows.flatMap((r) => [r.createdBy, r.updatedBy]).filter((id): id is string => Boolean(id)));
}

export async function listMembers(actor: Actor): Promise<MemberDto[]> {
  const db = await getDb();
  const all = await db
    .select({ userId: users.id, name: users.name, email: users.email, role: memberships.role, joinedAt: memberships.createdAt })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.studioId, actor.studioId))
    .orderBy(memberships.createdAt);
  let rows = all;
  if (actor.role === 'client') {
    const designers = await clientsDesigners(actor);
    rows = all.filter((r) => r.userId === actor.userId || r.role === 'owner' || (r.role === 'designer' && designers.has(r.userId)));
  }
  const seesAddresses = actor.role !== 'client';
  return rows.map((r) => ({
    userId: r.userId,
    name: r.name,
    ...(seesAddresses ? { email: r.email } : {}),
    role: r.role,
    joinedAt: r.joinedAt.toISOString(),
  }));
}

export function requireOwner(actor: Actor): void {
  if (actor.role !== 'owner') throw new ForbiddenError('Only the studio owner can change members and settings.');
}

export async function changeRole(actor: Actor, userId: string, role: StudioRole): Promise<void> {
  if (!isId(userId)) throw new NotFoundError('No such member.');
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
  if (!isId(userId)) throw new NotFoundError('No such member.');
  requireOwner(actor);
  if (userId === actor.userId) throw new BadRequestError('You cannot remove yourself.');
  const db = await getDb();
  const res = await db
    .delete(memberships)
    .where(and(eq(memberships.studioId, actor.studioId), eq(memberships.userId, userId)))
    .returning({ userId: memberships.userId });
  if (!res.length) throw new NotFoundError('No such member.');
}

export async function updateStudio(actor: Actor, input: { name?: string; units?: LengthUnit; checkDefaults?: LayoutSettings; quote?: Partial<QuoteTerms> }): Promise<StudioDto> {
  requireOwner(actor);
  const db = await getDb();
  await db
    .update(studios)
    .set({
      ...(input.name !== undefined ? { name: input.name.trim() } : {}),
      ...(input.units !== undefined ? { units: input.units } : {}),
      ...(input.checkDefaults !== undefined ? { checkDefaults: input.checkDefaults } : {}),
      ...(input.quote?.details !== undefined ? { quoteDetails: input.quote.details } : {}),
      ...(input.quote?.terms !== undefined ? { quoteTerms: input.quote.terms } : {}),
      ...(input.quote?.validDays !== undefined ? { quoteValidDays: input.quote.validDays } : {}),
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

/** A studio's name for mail and quotes, or a neutral stand-in if it has gone. */
export async function studioName(studioId: string): Promise<string> {
  const db = await getDb();
  const [s] = await db.select({ name: studios.name }).from(studios).where(eq(studios.id, studioId)).limit(1);
  return s?.name ?? 'Your workshop';
}

/** The studio's quote terms for a quote being sent (system use: the caller has checked the rights). */
export async function quoteTermsOf(studioId: string): Promise<QuoteTerms> {
  const db = await getDb();
  const [s] = await db.select({ details: studios.quoteDetails, terms: studios.quoteTerms, validDays: studios.quoteValidDays })
    .from(studios).where(eq(studios.id, studioId)).limit(1);
  return s ?? { details: '', terms: '', validDays: 30 };
}
