/**
 * Client invitations: an owner or designer invites a client by e-mail; the mail carries a link
 * with a one-time token (256 bits, stored hashed) that lets the client set a password and join
 * the studio as `client`, optionally with one layout shared with them. Invitations expire, can be
 * revoked, and can be sent again (which replaces the token, so an older mail stops working).
 *
 * Accepting needs no session: the token is the proof. Must never reveal a token after creation,
 * never let an invitation be used twice, and never attach a layout of another studio.
 */
import 'server-only';
import { and, desc, eq, isNull, sql } from 'drizzle-orm';
import { getDb } from '../client';
import { invitations, layouts, memberships, studios, users } from '../schema';
import { BadRequestError, ConflictError, NotFoundError } from '../errors';
import type { Actor } from '../actor';
import { normaliseEmail } from '../accounts';
import { hashPassword } from '../../lib/auth/password';
import { requireEditor, UUID } from './access';
import { hashToken, isTokenShaped, newToken } from './tokens';
import { isUniqueViolation } from './pg-errors';

/** A week to accept (common practice for account invitations, no source). */
export const INVITATION_DAYS = 7;

export type InvitationStatus = 'pending' | 'accepted' | 'expired' | 'revoked';

export interface InvitationDto {
  id: string;
  email: string;
  name: string;
  layout: { id: string; name: string } | null;
  invitedBy: string | null;
  createdAt: string;
  expiresAt: string;
  lastSentAt: string | null;
  acceptedAt: string | null;
  status: InvitationStatus;
}

type Row = typeof invitations.$inferSelect;

export function invitationStatus(row: Pick<Row, 'acceptedAt' | 'revokedAt' | 'expiresAt'>, now = new Date()): InvitationStatus {
  if (row.acceptedAt) return 'accepted';
  if (row.revokedAt) return 'revoked';
  if (row.expiresAt.getTime() <= now.getTime()) return 'expired';
  return 'pending';
}

export function invitationPath(token: string): string {
  return `/invite/${token}`;
}

async function rows(studioId: string, id?: string) {
  const db = await getDb();
  return db
    .select({ inv: invitations, layoutName: layouts.name, invitedByName: users.name })
    .from(invitations)
    .leftJoin(layouts, eq(layouts.id, invitations.layoutId))
    .leftJoin(users, eq(users.id, invitations.invitedBy))
    .where(id ? and(eq(invitations.studioId, studioId), eq(invitations.id, id)) : eq(invitations.studioId, studioId))
    .orderBy(desc(invitations.createdAt));
}

function toDto(r: Awaited<ReturnType<typeof rows>>[number]): InvitationDto {
  const i = r.inv;
  return {
    id: i.id,
    email: i.email,
    name: i.name,
    layout: i.layoutId && r.layoutName ? { id: i.layoutId, name: r.layoutName } : null,
    invitedBy: r.invitedByName,
    createdAt: i.createdAt.toISOString(),
    expiresAt: i.expiresAt.toISOString(),
    lastSentAt: i.lastSentAt?.toISOString() ?? null,
    acceptedAt: i.acceptedAt?.toISOString() ?? null,
    status: invitationStatus(i),
  };
}

export async function listInvitations(actor: Actor): Promise<InvitationDto[]> {
  requireEditor(actor, 'see invitations');
  return (await rows(actor.studioId)).map(toDto);
}

export interface NewInvitation {
  email: string;
  name: string;
  layoutId?: string | null;
}

/** What a caller needs to send the mail: the one-time token and the words for it. */
export interface IssuedInvitation {
  invitation: InvitationDto;
  token: string;
  studioName: string;
  inviterName: string;
}

async function assertInvitable(actor: Actor, email: string, layoutId: string | null | undefined): Promise<void> {
  const db = await getDb();
  const [existing] = await db.select({ id: users.id }).from(users).where(eq(sql`lower(${users.email})`, email)).limit(1);
  if (existing) {
    const [member] = await db.select({ role: memberships.role }).from(memberships)
      .where(and(eq(memberships.userId, existing.id), eq(memberships.studioId, actor.studioId))).limit(1);
    if (member) throw new ConflictError(`That address already belongs to a ${member.role} of this studio.`);
    throw new ConflictError('That address already has a Baywright account; the studio owner can add it under Settings → Members.');
  }
  if (layoutId) {
    if (!UUID.test(layoutId)) throw new BadRequestError('Choose one of this studio’s layouts.');
    const [layout] = await db.select({ studioId: layouts.studioId, clientId: layouts.clientId }).from(layouts).where(eq(layouts.id, layoutId)).limit(1);
    if (!layout || layout.studioId !== actor.studioId) throw new BadRequestError('Choose one of this studio’s layouts.');
    if (layout.clientId) throw new ConflictError('That layout is already shared with another client.');
  }
}

async function studioAndInviter(actor: Actor) {
  const db = await getDb();
  const [s] = await db.select({ name: studios.name }).from(studios).where(eq(studios.id, actor.studioId)).limit(1);
  return { studioName: s?.name ?? 'Your workshop', inviterName: actor.name };
}

/**
 * Creates an invitation. A still-pending invitation to the same address in this studio is
 * revoked first, so only the newest mail works.
 */
export async function createInvitation(actor: Actor, input: NewInvitation, now = new Date()): Promise<IssuedInvitation> {
  requireEditor(actor, 'invite clients');
  const email = normaliseEmail(input.email);
  const name = input.name.trim();
  if (!name) throw new BadRequestError('Give the client’s name.');
  await assertInvitable(actor, email, input.layoutId);
  const db = await getDb();
  const token = newToken();
  const id = await db.transaction(async (tx) => {
    await tx
      .update(invitations)
      .set({ revokedAt: now })
      .where(and(eq(invitations.studioId, actor.studioId), eq(invitations.email, email), isNull(invitations.acceptedAt), isNull(invitations.revokedAt)));
    const [row] = await tx
      .insert(invitations)
      .values({
        studioId: actor.studioId, email, name, layoutId: input.layoutId ?? null, tokenHash: hashToken(token),
        invitedBy: actor.userId, createdAt: now, expiresAt: new Date(now.getTime() + INVITATION_DAYS * 86_400_000),
      })
      .returning({ id: invitations.id });
    return row.id;
  });
  const [created] = await rows(actor.studioId, id);
  return { invitation: toDto(created), token, ...(await studioAndInviter(actor)) };
}

async function ownRow(actor: Actor, id: string): Promise<Row> {
  requireEditor(actor, 'manage invitations');
  if (!UUID.test(id)) throw new NotFoundError('No such invitation.');
  const db = await getDb();
  const [row] = await db.select().from(invitations).where(and(eq(invitations.id, id), eq(invitations.studioId, actor.studioId))).limit(1);
  if (!row) throw new NotFoundError('No such invitation.');
  return row;
}

export async function revokeInvitation(actor: Actor, id: string): Promise<InvitationDto> {
  const row = await ownRow(actor, id);
  if (row.acceptedAt) throw new ConflictError('That invitation was already accepted; remove the client under Settings → Members instead.');
  const db = await getDb();
  if (!row.revokedAt) await db.update(invitations).set({ revokedAt: new Date() }).where(eq(invitations.id, id));
  return toDto((await rows(actor.studioId, id))[0]);
}

/** A new token and a new week; the earlier mail's link stops working. */
export async function renewInvitation(actor: Actor, id: string, now = new Date()): Promise<IssuedInvitation> {
  const row = await ownRow(actor, id);
  if (row.acceptedAt) throw new ConflictError('That invitation was already accepted.');
  if (row.revokedAt) throw new ConflictError('That invitation was withdrawn; invite the client again.');
  const token = newToken();
  const db = await getDb();
  await db
    .update(invitations)
    .set({ tokenHash: hashToken(token), expiresAt: new Date(now.getTime() + INVITATION_DAYS * 86_400_000) })
    .where(eq(invitations.id, id));
  return { invitation: toDto((await rows(actor.studioId, id))[0]), token, ...(await studioAndInviter(actor)) };
}

export async function markInvitationSent(id: string, at = new Date()): Promise<void> {
  const db = await getDb();
  await db.update(invitations).set({ lastSentAt: at }).where(eq(invitations.id, id));
}

/** What the invitation page shows before the client has an account. No addresses but their own. */
export type InvitationView =
  | { status: 'pending'; email: string; name: string; studioName: string; inviterName: string | null; expiresAt: string }
  | { status: 'accepted' | 'expired' | 'revoked' | 'unknown' };

export async function viewInvitation(token: string, now = new Date()): Promise<InvitationView> {
  if (!isTokenShaped(token)) return { status: 'unknown' };
  const db = await getDb();
  const [r] = await db
    .select({ inv: invitations, studioName: studios.name, inviterName: users.name })
    .from(invitations)
    .innerJoin(studios, eq(studios.id, invitations.studioId))
    .leftJoin(users, eq(users.id, invitations.invitedBy))
    .where(eq(invitations.tokenHash, hashToken(token)))
    .limit(1);
  if (!r) return { status: 'unknown' };
  const status = invitationStatus(r.inv, now);
  if (status !== 'pending') return { status };
  return { status, email: r.inv.email, name: r.inv.name, studioName: r.studioName, inviterName: r.inviterName, expiresAt: r.inv.expiresAt.toISOString() };
}

export class InvitationUnusableError extends Error {
  readonly status = 410;
  constructor(readonly reason: Exclude<InvitationStatus, 'pending'> | 'unknown') {
    super(
      reason === 'accepted' ? 'This invitation has already been used. Sign in with the password you set.'
        : reason === 'expired' ? 'This invitation has expired. Ask the workshop to send a new one.'
          : reason === 'revoked' ? 'This invitation was withdrawn. Ask the workshop to send a new one.'
            : 'This invitation link is not valid. Check that the whole address was copied from the mail.',
    );
  }
}

/**
 * The client sets a password: a new account, a `client` membership of the inviting studio, and
 * the invited layout shared with them (if it still has no client). All in one transaction, and
 * the invitation is claimed first, so two racing accepts cannot both create an account.
 */
export async function acceptInvitation(token: string, input: { name?: string; password: string }, now = new Date()): Promise<{ email: string; layoutId: string | null; studioId: string }> {
  if (!isTokenShaped(token)) throw new InvitationUnusableError('unknown');
  const db = await getDb();
  const passwordHash = await hashPassword(input.password);
  try {
    return await db.transaction(async (tx) => {
      const [inv] = await tx.select().from(invitations).where(eq(invitations.tokenHash, hashToken(token))).limit(1);
      if (!inv) throw new InvitationUnusableError('unknown');
      const status = invitationStatus(inv, now);
      if (status !== 'pending') throw new InvitationUnusableError(status);
      const claimed = await tx
        .update(invitations)
        .set({ acceptedAt: now })
        .where(and(eq(invitations.id, inv.id), isNull(invitations.acceptedAt), isNull(invitations.revokedAt)))
        .returning({ id: invitations.id });
      if (!claimed.length) throw new InvitationUnusableError('accepted');
      const name = input.name?.trim() || inv.name;
      const [user] = await tx.insert(users).values({ email: inv.email, name, passwordHash }).returning({ id: users.id });
      await tx.insert(memberships).values({ userId: user.id, studioId: inv.studioId, role: 'client' });
      let layoutId: string | null = null;
      if (inv.layoutId) {
        const shared = await tx
          .update(layouts)
          .set({ clientId: user.id })
          .where(and(eq(layouts.id, inv.layoutId), eq(layouts.studioId, inv.studioId), isNull(layouts.clientId)))
          .returning({ id: layouts.id });
        layoutId = shared[0]?.id ?? null;
      }
      await tx.update(invitations).set({ acceptedUserId: user.id }).where(eq(invitations.id, inv.id));
      return { email: inv.email, layoutId, studioId: inv.studioId };
    });
  } catch (err) {
    if (isUniqueViolation(err, 'users_email_unique')) {
      throw new ConflictError('An account with this address was created meanwhile; sign in instead.');
    }
    throw err;
  }
}
