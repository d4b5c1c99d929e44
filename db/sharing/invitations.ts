/**
 * Invitations are the only way into a studio: an owner invites designers and clients, a
 * designer invites clients. The mail carries a link with a one-time token (256 bits, stored
 * hashed). A new address sets its own password with it; an address that already has an account
 * accepts while signed in as that address. Nobody else ever sets a person's password, and the
 * studio learns nothing about the address (whether it has an account, its name) until the
 * person accepts: creating an invitation answers the same either way.
 * Invitations expire, can be revoked, and can be sent again (a new token; the older mail stops
 * working).
 *
 * Must never reveal a token after creation, never let an invitation be used twice, never attach
 * an existing account without that account's own session, and never attach a layout of another
 * studio.
 */
import 'server-only';
import { and, desc, eq, isNull, sql } from 'drizzle-orm';
import { getDb } from '../client';
import { invitations, layouts, memberships, studios, users } from '../schema';
import { BadRequestError, ConflictError, ForbiddenError, NotFoundError } from '../errors';
import type { Actor, StudioRole } from '../actor';
import { normaliseEmail } from '../accounts';
import { hashPassword } from '../../lib/auth/password';
import { requireWorkshop } from '../access';
import { isId } from '../ids';
import { hashToken, isTokenShaped, newToken } from './tokens';
import { isUniqueViolation } from './pg-errors';

/** A week to accept (common practice for account invitations, no source). */
export const INVITATION_DAYS = 7;

export type InvitationStatus = 'pending' | 'accepted' | 'expired' | 'revoked';

export type InvitedRole = Exclude<StudioRole, 'owner'>;

export interface InvitationDto {
  id: string;
  email: string;
  /** The name the inviter typed; the person's own name shows under Members once they join. */
  name: string;
  role: InvitedRole;
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
    role: i.role,
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
  requireWorkshop(actor, 'see invitations');
  return (await rows(actor.studioId)).map(toDto);
}

export interface NewInvitation {
  email: string;
  name: string;
  role?: InvitedRole;
  layoutId?: string | null;
}

/** What a caller needs to send the mail: the one-time token and the words for it. */
export interface IssuedInvitation {
  invitation: InvitationDto;
  token: string;
  studioName: string;
  inviterName: string;
}

/**
 * Refuses only what the studio already knows: an address that is one of its own members, or a
 * layout that is not its own or already has a client. Whether the address has an account
 * anywhere else is never looked at here.
 */
async function assertInvitable(actor: Actor, email: string, layoutId: string | null | undefined): Promise<void> {
  const db = await getDb();
  const [member] = await db
    .select({ role: memberships.role })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.studioId, actor.studioId), eq(sql`lower(${users.email})`, email)))
    .limit(1);
  if (member) throw new ConflictError(`That address already belongs to a ${member.role} of this studio.`);
  if (layoutId) {
    if (!isId(layoutId)) throw new BadRequestError('Choose one of this studio’s layouts.');
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
  requireWorkshop(actor, 'invite clients');
  const role = input.role ?? 'client';
  if (role !== 'client' && actor.role !== 'owner') throw new ForbiddenError('Only the studio owner can invite designers.');
  if (role !== 'client' && input.layoutId) throw new BadRequestError('Layouts are shared with clients; invite a designer without one.');
  const email = normaliseEmail(input.email);
  const name = input.name.trim();
  if (!name) throw new BadRequestError('Give the person’s name.');
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
        studioId: actor.studioId, email, name, role, layoutId: input.layoutId ?? null, tokenHash: hashToken(token),
        invitedBy: actor.userId, createdAt: now, expiresAt: new Date(now.getTime() + INVITATION_DAYS * 86_400_000),
      })
      .returning({ id: invitations.id });
    return row.id;
  });
  const [created] = await rows(actor.studioId, id);
  return { invitation: toDto(created), token, ...(await studioAndInviter(actor)) };
}

async function ownRow(actor: Actor, id: string): Promise<Row> {
  requireWorkshop(actor, 'manage invitations');
  if (!isId(id)) throw new NotFoundError('No such invitation.');
  const db = await getDb();
  const [row] = await db.select().from(invitations).where(and(eq(invitations.id, id), eq(invitations.studioId, actor.studioId))).limit(1);
  if (!row) throw new NotFoundError('No such invitation.');
  return row;
}

/** One invitation of the actor's studio (owners and designers), or 404. */
export async function getInvitation(actor: Actor, id: string): Promise<InvitationDto> {
  await ownRow(actor, id);
  return toDto((await rows(actor.studioId, id))[0]);
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

/**
 * What the invitation page shows to whoever holds the link (the invitee): the studio, the
 * address invited, and whether that address already has an account (then they accept signed in
 * as it; otherwise they set a password). No addresses but their own.
 */
export type InvitationView =
  | { status: 'pending'; email: string; name: string; role: InvitedRole; studioName: string; inviterName: string | null; expiresAt: string; hasAccount: boolean }
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
  const [account] = await db.select({ id: users.id }).from(users).where(eq(sql`lower(${users.email})`, r.inv.email)).limit(1);
  return {
    status, email: r.inv.email, name: r.inv.name, role: r.inv.role, studioName: r.studioName, inviterName: r.inviterName,
    expiresAt: r.inv.expiresAt.toISOString(), hasAccount: Boolean(account),
  };
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

/** Someone other than the invited address tried to use the invitation of an existing account. */
export class InvitationNeedsSignInError extends Error {
  readonly status = 409;
  constructor(email: string) {
    super(`${email} already has a Baywright account. Sign in as ${email}, then open the link again to join.`);
  }
}

export interface AcceptedInvitation {
  email: string;
  layoutId: string | null;
  studioId: string;
  /** `new-account`: a password was set; `existing-account`: the signed-in person joined. */
  joined: 'new-account' | 'existing-account';
}

/**
 * Accepts an invitation, in one transaction that claims the invitation first (two racing
 * accepts cannot both succeed):
 *   - the address has no account: `password` (already checked against the password rule)
 *     creates one, with the name given;
 *   - the address has an account: `signedInUserId` must be that account — the person accepts
 *     with their own session; no password is asked or changed.
 * Either way the account becomes a member with the invitation's role, and a client gets the
 * invited layout if it still has no client.
 */
export async function acceptInvitation(
  token: string,
  input: { name?: string; password?: string; signedInUserId?: string | null },
  now = new Date(),
): Promise<AcceptedInvitation> {
  if (!isTokenShaped(token)) throw new InvitationUnusableError('unknown');
  const db = await getDb();
  const [pre] = await db.select({ email: invitations.email }).from(invitations).where(eq(invitations.tokenHash, hashToken(token))).limit(1);
  const [existingPre] = pre ? await db.select({ id: users.id }).from(users).where(eq(sql`lower(${users.email})`, pre.email)).limit(1) : [];
  // Hash outside the transaction (slow on purpose), only when a new account will need it.
  const passwordHash = !existingPre && input.password ? await hashPassword(input.password) : null;
  try {
    return await db.transaction(async (tx) => {
      // Locked for the transaction: a second accept of the same link waits here for the first to
      // commit, then reads it as accepted (410). Without the lock, on a PostgreSQL server it could
      // read the invitation as pending, then the account the first had just made, and answer
      // "sign in first" (409) instead.
      const [inv] = await tx.select().from(invitations).where(eq(invitations.tokenHash, hashToken(token))).limit(1).for('update');
      if (!inv) throw new InvitationUnusableError('unknown');
      const status = invitationStatus(inv, now);
      if (status !== 'pending') throw new InvitationUnusableError(status);
      const [existing] = await tx.select({ id: users.id }).from(users).where(eq(sql`lower(${users.email})`, inv.email)).limit(1);
      if (existing && existing.id !== input.signedInUserId) throw new InvitationNeedsSignInError(inv.email);
      if (!existing && !passwordHash) throw new BadRequestError('Choose a password to create your account.');
      const claimed = await tx
        .update(invitations)
        .set({ acceptedAt: now })
        .where(and(eq(invitations.id, inv.id), isNull(invitations.acceptedAt), isNull(invitations.revokedAt)))
        .returning({ id: invitations.id });
      if (!claimed.length) throw new InvitationUnusableError('accepted');
      let userId: string;
      if (existing) {
        userId = existing.id;
      } else {
        const name = input.name?.trim() || inv.name;
        const [user] = await tx.insert(users).values({ email: inv.email, name, passwordHash }).returning({ id: users.id });
        userId = user.id;
      }
      await tx.insert(memberships).values({ userId, studioId: inv.studioId, role: inv.role }).onConflictDoNothing();
      let layoutId: string | null = null;
      if (inv.layoutId && inv.role === 'client') {
        const shared = await tx
          .update(layouts)
          .set({ clientId: userId })
          .where(and(eq(layouts.id, inv.layoutId), eq(layouts.studioId, inv.studioId), isNull(layouts.clientId)))
          .returning({ id: layouts.id });
        layoutId = shared[0]?.id ?? null;
      }
      await tx.update(invitations).set({ acceptedUserId: userId }).where(eq(invitations.id, inv.id));
      return { email: inv.email, layoutId, studioId: inv.studioId, joined: existing ? 'existing-account' : 'new-account' };
    });
  } catch (err) {
    if (isUniqueViolation(err, 'users_email_unique')) {
      throw new ConflictError('An account with this address was created meanwhile; sign in, then open the link again.');
    }
    throw err;
  }
}
