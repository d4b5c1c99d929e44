/**
 * Viewer links: a read-only address for someone without an account. A live link follows one
 * layout: its saves while nothing has been issued, then its latest issued revision (issued means
 * frozen: the approved revision stays on show until the next one is issued); a revision link
 * shows one frozen revision. The token is handed out once at
 * creation and stored only as its SHA-256 hash; links may expire and may be revoked, and the list
 * says when each was created and last opened.
 *
 * Resolving a token yields exactly what the link names — one document, its layout's name, the
 * studio's name and check defaults — never member addresses, never another layout.
 * Must never accept a token for anything but reading.
 */
import 'server-only';
import { readStoredDoc } from '../stored-doc';
import { and, asc, desc, eq, sql } from 'drizzle-orm';
import { getDb } from '../client';
import { layouts, revisionDecisions, revisions, studios, users, viewerLinks } from '../schema';
import { BadRequestError, NotFoundError } from '../errors';
import type { Actor } from '../actor';
import { settingsSchema, type LayoutDoc, type LayoutSettings } from '../../lib/layout/schema';
import type { LengthUnit } from '../../lib/layout/units';
import { loadLayoutFor } from '../access';
import { isId } from '../ids';
import { hashToken, isTokenShaped, newToken } from './tokens';
import { revisionState, type RevisionState } from './revisions';

export type LinkStatus = 'active' | 'expired' | 'revoked';

export interface ViewerLinkDto {
  id: string;
  kind: 'live' | 'revision';
  revision: { id: string; letter: string } | null;
  label: string;
  createdAt: string;
  createdBy: string | null;
  expiresAt: string | null;
  revokedAt: string | null;
  lastOpenedAt: string | null;
  openCount: number;
  status: LinkStatus;
}

/** The longest expiry a designer may set; a link with no expiry lives until revoked. */
export const MAX_LINK_DAYS = 365;
export const LABEL_MAX = 80;

export function linkStatus(row: { revokedAt: Date | null; expiresAt: Date | null }, now = new Date()): LinkStatus {
  if (row.revokedAt) return 'revoked';
  if (row.expiresAt && row.expiresAt.getTime() <= now.getTime()) return 'expired';
  return 'active';
}

export function viewerPath(token: string): string {
  return `/v/${token}`;
}

async function linkRows(layoutId: string, linkId?: string) {
  const db = await getDb();
  const where = linkId ? and(eq(viewerLinks.layoutId, layoutId), eq(viewerLinks.id, linkId)) : eq(viewerLinks.layoutId, layoutId);
  return db
    .select({ link: viewerLinks, letter: revisions.letter, createdByName: users.name })
    .from(viewerLinks)
    .leftJoin(revisions, eq(revisions.id, viewerLinks.revisionId))
    .leftJoin(users, eq(users.id, viewerLinks.createdBy))
    .where(where)
    .orderBy(desc(viewerLinks.createdAt));
}

function toDto(r: Awaited<ReturnType<typeof linkRows>>[number]): ViewerLinkDto {
  const l = r.link;
  return {
    id: l.id,
    kind: l.revisionId ? 'revision' : 'live',
    revision: l.revisionId && r.letter ? { id: l.revisionId, letter: r.letter } : null,
    label: l.label,
    createdAt: l.createdAt.toISOString(),
    createdBy: r.createdByName,
    expiresAt: l.expiresAt?.toISOString() ?? null,
    revokedAt: l.revokedAt?.toISOString() ?? null,
    lastOpenedAt: l.lastOpenedAt?.toISOString() ?? null,
    openCount: l.openCount,
    status: linkStatus(l),
  };
}

export async function listViewerLinks(actor: Actor, layoutId: string): Promise<ViewerLinkDto[]> {
  await loadLayoutFor(actor, layoutId, { forEdit: 'see viewer links' });
  return (await linkRows(layoutId)).map(toDto);
}

export interface CreateLinkInput {
  revisionId?: string | null;
  expiresAt?: Date | null;
  label?: string;
}

/** Creates a link; the token is in the answer once and nowhere else, ever. */
export async function createViewerLink(actor: Actor, layoutId: string, input: CreateLinkInput, now = new Date()): Promise<{ link: ViewerLinkDto; token: string }> {
  await loadLayoutFor(actor, layoutId, { forEdit: 'share viewer links' });
  const db = await getDb();
  if (input.revisionId) {
    if (!isId(input.revisionId)) throw new BadRequestError('That revision is not one of this layout’s.');
    const [rev] = await db.select({ id: revisions.id }).from(revisions)
      .where(and(eq(revisions.id, input.revisionId), eq(revisions.layoutId, layoutId))).limit(1);
    if (!rev) throw new BadRequestError('That revision is not one of this layout’s.');
  }
  if (input.expiresAt) {
    if (input.expiresAt.getTime() <= now.getTime()) throw new BadRequestError('The expiry must be in the future.');
    if (input.expiresAt.getTime() > now.getTime() + MAX_LINK_DAYS * 86_400_000) throw new BadRequestError(`A link may last at most ${MAX_LINK_DAYS} days; leave the expiry empty for a link that lasts until you revoke it.`);
  }
  const label = (input.label ?? '').trim();
  if (label.length > LABEL_MAX) throw new BadRequestError(`Keep the label under ${LABEL_MAX} characters.`);
  const token = newToken();
  const [row] = await db
    .insert(viewerLinks)
    .values({ layoutId, revisionId: input.revisionId ?? null, tokenHash: hashToken(token), label, createdBy: actor.userId, expiresAt: input.expiresAt ?? null })
    .returning({ id: viewerLinks.id });
  const [created] = await linkRows(layoutId, row.id);
  return { link: toDto(created), token };
}

/** Revoking is final; revoking twice is harmless. */
export async function revokeViewerLink(actor: Actor, layoutId: string, linkId: string): Promise<ViewerLinkDto> {
  await loadLayoutFor(actor, layoutId, { forEdit: 'withdraw viewer links' });
  if (!isId(linkId)) throw new NotFoundError('No such viewer link.');
  const db = await getDb();
  const res = await db
    .update(viewerLinks)
    .set({ revokedAt: sql`coalesce(${viewerLinks.revokedAt}, now())` })
    .where(and(eq(viewerLinks.id, linkId), eq(viewerLinks.layoutId, layoutId)))
    .returning({ id: viewerLinks.id });
  if (!res.length) throw new NotFoundError('No such viewer link.');
  const [row] = await linkRows(layoutId, linkId);
  return toDto(row);
}

export interface ViewerContent {
  kind: 'live' | 'revision';
  layoutName: string;
  studioName: string;
  units: LengthUnit;
  doc: LayoutDoc;
  /** Live: the layout version (moves on each save). Revision: fixed. */
  version: number;
  updatedAt: string;
  revision: { letter: string; note: string; issuedAt: string; state: RevisionState } | null;
  checkDefaults: LayoutSettings;
  expiresAt: string | null;
}

export type ResolvedLink =
  | { status: 'active'; linkId: string; layoutId: string; content: ViewerContent }
  | { status: 'unknown' }
  | { status: 'revoked'; revokedAt: string }
  | { status: 'expired'; expiresAt: string };

/**
 * What a token opens. `touch` records the visit (the page and the document fetch do; the
 * light "has it changed?" poll does not, so "last opened" means a person opened it).
 */
export async function resolveViewerLink(token: string, options: { touch?: boolean } = {}, now = new Date()): Promise<ResolvedLink> {
  if (!isTokenShaped(token)) return { status: 'unknown' };
  const db = await getDb();
  const [row] = await db
    .select({
      link: viewerLinks,
      layoutName: layouts.name, layoutDoc: layouts.doc, layoutVersion: layouts.version, layoutUpdatedAt: layouts.updatedAt,
      studioName: studios.name, units: studios.units, checkDefaults: studios.checkDefaults,
    })
    .from(viewerLinks)
    .innerJoin(layouts, eq(layouts.id, viewerLinks.layoutId))
    .innerJoin(studios, eq(studios.id, layouts.studioId))
    .where(eq(viewerLinks.tokenHash, hashToken(token)))
    .limit(1);
  if (!row) return { status: 'unknown' };
  const status = linkStatus(row.link, now);
  if (status === 'revoked') return { status, revokedAt: row.link.revokedAt!.toISOString() };
  if (status === 'expired') return { status, expiresAt: row.link.expiresAt!.toISOString() };

  let content: ViewerContent = {
    kind: 'live',
    layoutName: row.layoutName,
    studioName: row.studioName,
    units: row.units,
    doc: readStoredDoc(row.layoutDoc),
    version: row.layoutVersion,
    updatedAt: row.layoutUpdatedAt.toISOString(),
    revision: null,
    checkDefaults: settingsSchema.safeParse(row.checkDefaults).data ?? {},
    expiresAt: row.link.expiresAt?.toISOString() ?? null,
  };
  // A live link shows the latest issued revision once there is one (the client's default).
  const revisionId = row.link.revisionId ?? (await latestRevisionOf(row.link.layoutId))?.id ?? null;
  if (revisionId) {
    const [rev] = await db.select().from(revisions).where(eq(revisions.id, revisionId)).limit(1);
    if (!rev) return { status: 'unknown' };
    const decisions = await db.select({ decision: revisionDecisions.decision }).from(revisionDecisions)
      .where(eq(revisionDecisions.revisionId, rev.id)).orderBy(asc(revisionDecisions.decidedAt));
    content = {
      ...content,
      kind: row.link.revisionId ? 'revision' : 'live',
      doc: readStoredDoc(rev.doc),
      version: rev.layoutVersion,
      updatedAt: rev.issuedAt.toISOString(),
      revision: { letter: rev.letter, note: rev.note, issuedAt: rev.issuedAt.toISOString(), state: revisionState(decisions) },
    };
  }
  if (options.touch) {
    await db.update(viewerLinks).set({ lastOpenedAt: now, openCount: sql`${viewerLinks.openCount} + 1` }).where(eq(viewerLinks.id, row.link.id));
  }
  return { status: 'active', linkId: row.link.id, layoutId: row.link.layoutId, content };
}

export type LinkVersion =
  | { status: 'active'; version: number; updatedAt: string }
  | Exclude<ResolvedLink, { status: 'active' }>;

/** The light question a live viewer polls: which version does the link show now? No document. */
export async function viewerLinkVersion(token: string, now = new Date()): Promise<LinkVersion> {
  if (!isTokenShaped(token)) return { status: 'unknown' };
  const db = await getDb();
  const [row] = await db
    .select({
      revokedAt: viewerLinks.revokedAt, expiresAt: viewerLinks.expiresAt, revisionId: viewerLinks.revisionId, layoutId: viewerLinks.layoutId,
      version: layouts.version, updatedAt: layouts.updatedAt, revVersion: revisions.layoutVersion, issuedAt: revisions.issuedAt,
    })
    .from(viewerLinks)
    .innerJoin(layouts, eq(layouts.id, viewerLinks.layoutId))
    .leftJoin(revisions, eq(revisions.id, viewerLinks.revisionId))
    .where(eq(viewerLinks.tokenHash, hashToken(token)))
    .limit(1);
  if (!row) return { status: 'unknown' };
  const status = linkStatus(row, now);
  if (status === 'revoked') return { status, revokedAt: row.revokedAt!.toISOString() };
  if (status === 'expired') return { status, expiresAt: row.expiresAt!.toISOString() };
  if (row.revisionId) {
    if (row.revVersion === null || !row.issuedAt) return { status: 'unknown' };
    return { status: 'active', version: row.revVersion, updatedAt: row.issuedAt.toISOString() };
  }
  const latest = await latestRevisionOf(row.layoutId);
  if (latest) return { status: 'active', version: latest.layoutVersion, updatedAt: latest.issuedAt.toISOString() };
  return { status: 'active', version: row.version, updatedAt: row.updatedAt.toISOString() };
}

/** The layout's latest issued revision (what a live link shows once one exists), without its document. */
async function latestRevisionOf(layoutId: string): Promise<{ id: string; layoutVersion: number; issuedAt: Date } | null> {
  const db = await getDb();
  const [rev] = await db
    .select({ id: revisions.id, layoutVersion: revisions.layoutVersion, issuedAt: revisions.issuedAt })
    .from(revisions)
    .where(eq(revisions.layoutId, layoutId))
    .orderBy(desc(revisions.seq))
    .limit(1);
  return rev ?? null;
}
