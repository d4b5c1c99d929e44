/**
 * Revisions: the workshop freezes the layout's current document as revision A, B, C… with a
 * note and issues it for approval; the layout's client approves the latest one or returns it for changes. Decisions are
 * append-only, and an approval is final — recorded with who and when, never changed afterwards
 * (the database also holds at most one approval per revision).
 * Must never let anyone but the layout's own client decide, nor return rows.
 */
import 'server-only';
import { readStoredDoc } from '../stored-doc';
import { and, asc, desc, eq, inArray, max } from 'drizzle-orm';
import { getDb } from '../client';
import { revisionDecisions, revisions, users } from '../schema';
import { BadRequestError, ConflictError, ForbiddenError, NotFoundError } from '../errors';
import type { Actor } from '../actor';
import type { LayoutDoc } from '../../lib/layout/schema';
import { loadLayoutFor } from '../access';
import { isId } from '../ids';
import { formatDate } from '../../lib/format';
import { isUniqueViolation } from './pg-errors';

import type { LayoutState, RevisionState } from '../../lib/layout/drawing-issue';
export type { LayoutState, RevisionState } from '../../lib/layout/drawing-issue';

export interface DecisionDto {
  decision: 'approved' | 'changes-asked';
  message: string;
  by: string;
  at: string;
}

export interface RevisionDto {
  id: string;
  letter: string;
  note: string;
  layoutVersion: number;
  issuedAt: string;
  issuedBy: string | null;
  state: RevisionState;
  /** Oldest first. */
  decisions: DecisionDto[];
  approval: { by: string; at: string } | null;
  /** Only the latest revision can be decided on; older ones are superseded. */
  isLatest: boolean;
}

export interface RevisionWithDocDto extends RevisionDto {
  doc: LayoutDoc;
}

/** 1 → A, 26 → Z, 27 → AA, 28 → AB … (the drawing-register habit of lettered revisions). */
export function revisionLetter(seq: number): string {
  if (!Number.isInteger(seq) || seq < 1) throw new RangeError(`a revision number starts at 1, got ${seq}`);
  let n = seq;
  let out = '';
  while (n > 0) {
    const r = (n - 1) % 26;
    out = String.fromCharCode(65 + r) + out;
    n = Math.floor((n - 1) / 26);
  }
  return out;
}

export const NOTE_MAX = 2000;
export const MESSAGE_MAX = 4000;

type RevRow = typeof revisions.$inferSelect & { issuedByName: string | null };
type DecisionRow = typeof revisionDecisions.$inferSelect;

function decisionDto(d: DecisionRow): DecisionDto {
  return {
    decision: d.decision === 'approved' ? 'approved' : 'changes-asked',
    message: d.message,
    by: d.decidedByName,
    at: d.decidedAt.toISOString(),
  };
}

/** The state a revision is in, from its decisions (oldest first). */
export function revisionState(decisions: { decision: 'approved' | 'changes_asked' }[]): RevisionState {
  if (decisions.some((d) => d.decision === 'approved')) return 'approved';
  const last = decisions[decisions.length - 1];
  return last?.decision === 'changes_asked' ? 'changes-asked' : 'sent';
}

function toDto(row: RevRow, decisions: DecisionRow[], latestSeq: number): RevisionDto {
  const approval = decisions.find((d) => d.decision === 'approved');
  return {
    id: row.id,
    letter: row.letter,
    note: row.note,
    layoutVersion: row.layoutVersion,
    issuedAt: row.issuedAt.toISOString(),
    issuedBy: row.issuedByName,
    state: revisionState(decisions),
    decisions: decisions.map(decisionDto),
    approval: approval ? { by: approval.decidedByName, at: approval.decidedAt.toISOString() } : null,
    isLatest: row.seq === latestSeq,
  };
}

async function rowsFor(layoutId: string, revisionId?: string) {
  const db = await getDb();
  const where = revisionId ? and(eq(revisions.layoutId, layoutId), eq(revisions.id, revisionId)) : eq(revisions.layoutId, layoutId);
  const revs = await db
    .select({ rev: revisions, issuedByName: users.name })
    .from(revisions)
    .leftJoin(users, eq(users.id, revisions.issuedBy))
    .where(where)
    .orderBy(desc(revisions.seq));
  const ids = revs.map((r) => r.rev.id);
  const decisions = ids.length
    ? await db.select().from(revisionDecisions).where(inArray(revisionDecisions.revisionId, ids)).orderBy(asc(revisionDecisions.decidedAt))
    : [];
  const [{ latest }] = await db.select({ latest: max(revisions.seq) }).from(revisions).where(eq(revisions.layoutId, layoutId));
  return { revs: revs.map((r) => ({ ...r.rev, issuedByName: r.issuedByName })), decisions, latestSeq: latest ?? 0 };
}

/** Newest first. Anyone who may see the layout may see its revisions. */
export async function listRevisions(actor: Actor, layoutId: string): Promise<RevisionDto[]> {
  await loadLayoutFor(actor, layoutId);
  const { revs, decisions, latestSeq } = await rowsFor(layoutId);
  return revs.map((r) => toDto(r, decisions.filter((d) => d.revisionId === r.id), latestSeq));
}

export async function getRevision(actor: Actor, layoutId: string, revisionId: string): Promise<RevisionWithDocDto> {
  await loadLayoutFor(actor, layoutId);
  if (!isId(revisionId)) throw new NotFoundError('No such revision.');
  const { revs, decisions, latestSeq } = await rowsFor(layoutId, revisionId);
  const row = revs[0];
  if (!row) throw new NotFoundError('No such revision.');
  return { ...toDto(row, decisions, latestSeq), doc: readStoredDoc(row.doc) };
}

/** Looks a revision up by its letter (for addresses such as ?from=A&to=B). */
export async function revisionIdByLetter(actor: Actor, layoutId: string, letter: string): Promise<string> {
  await loadLayoutFor(actor, layoutId);
  if (!/^[A-Z]{1,3}$/.test(letter)) throw new NotFoundError(`No revision ${letter.slice(0, 8)}.`);
  const db = await getDb();
  const [row] = await db.select({ id: revisions.id }).from(revisions).where(and(eq(revisions.layoutId, layoutId), eq(revisions.letter, letter))).limit(1);
  if (!row) throw new NotFoundError(`No revision ${letter}.`);
  return row.id;
}

/**
 * Freezes the layout's stored document (what was last saved) as the next revision. Refused
 * when the latest revision already froze this very version: there would be nothing new to send.
 */
export async function issueRevision(actor: Actor, layoutId: string, input: { note: string }): Promise<RevisionWithDocDto> {
  const layout = await loadLayoutFor(actor, layoutId, { withDoc: true, forEdit: 'issue revisions' });
  const note = input.note.trim();
  if (note.length > NOTE_MAX) throw new BadRequestError(`Keep the note under ${NOTE_MAX} characters.`);
  const db = await getDb();
  const id = await db.transaction(async (tx) => {
    const [last] = await tx
      .select({ seq: revisions.seq, letter: revisions.letter, layoutVersion: revisions.layoutVersion })
      .from(revisions)
      .where(eq(revisions.layoutId, layoutId))
      .orderBy(desc(revisions.seq))
      .limit(1);
    if (last && last.layoutVersion === layout.version) {
      throw new ConflictError(`Revision ${last.letter} already freezes this version of the layout; save a change first.`);
    }
    const seq = (last?.seq ?? 0) + 1;
    const [row] = await tx
      .insert(revisions)
      .values({ layoutId, seq, letter: revisionLetter(seq), note, doc: layout.doc, layoutVersion: layout.version, issuedBy: actor.userId })
      .returning({ id: revisions.id });
    return row.id;
  }).catch((err) => {
    // Two issues racing for the same letter: the unique index lets only one through.
    if (isUniqueViolation(err, 'revisions_layout_seq')) {
      throw new ConflictError('Another revision was issued at the same moment; reload and try again.');
    }
    throw err;
  });
  return getRevision(actor, layoutId, id);
}

export interface DecisionInput {
  decision: 'approve' | 'changes';
  message?: string;
}

/**
 * The layout's client approves the latest revision or asks for changes. After an approval the
 * revision is final: any further decision on it is refused (409), and so is deciding on a
 * revision that a newer one has superseded.
 */
export async function decideRevision(actor: Actor, layoutId: string, revisionId: string, input: DecisionInput): Promise<RevisionDto> {
  const layout = await loadLayoutFor(actor, layoutId);
  if (!layout.isClient) throw new ForbiddenError('Only the client this layout is shared with can approve it or return it for changes.');
  if (!isId(revisionId)) throw new NotFoundError('No such revision.');
  const message = (input.message ?? '').trim();
  if (input.decision === 'changes' && !message) throw new BadRequestError('Say what you would like changed.');
  if (message.length > MESSAGE_MAX) throw new BadRequestError(`Keep the message under ${MESSAGE_MAX} characters.`);
  const db = await getDb();
  await db.transaction(async (tx) => {
    const [rev] = await tx.select().from(revisions).where(and(eq(revisions.id, revisionId), eq(revisions.layoutId, layoutId))).limit(1);
    if (!rev) throw new NotFoundError('No such revision.');
    const [{ latest }] = await tx.select({ latest: max(revisions.seq) }).from(revisions).where(eq(revisions.layoutId, layoutId));
    const [approved] = await tx
      .select({ by: revisionDecisions.decidedByName, at: revisionDecisions.decidedAt })
      .from(revisionDecisions)
      .where(and(eq(revisionDecisions.revisionId, revisionId), eq(revisionDecisions.decision, 'approved')))
      .limit(1);
    if (approved) {
      throw new ConflictError(`Revision ${rev.letter} was approved by ${approved.by} on ${formatDate(approved.at)}; an approval cannot be changed.`);
    }
    if (rev.seq !== latest) throw new ConflictError(`Revision ${rev.letter} has been superseded by a newer revision; look at the latest one.`);
    await tx.insert(revisionDecisions).values({
      revisionId,
      decision: input.decision === 'approve' ? 'approved' : 'changes_asked',
      message,
      decidedBy: actor.userId,
      decidedByName: actor.name,
    });
  }).catch((err) => {
    if (isUniqueViolation(err, 'revision_decisions_one_approval')) {
      throw new ConflictError('This revision has just been approved; an approval cannot be changed.');
    }
    throw err;
  });
  const { revs, decisions, latestSeq } = await rowsFor(layoutId, revisionId);
  return toDto(revs[0], decisions, latestSeq);
}

/** Each layout's state from its latest revision: draft (none yet), sent, changes asked, approved. */
export async function layoutStates(layoutIds: string[]): Promise<Map<string, { state: LayoutState; latest: string | null; latestVersion: number | null }>> {
  const out = new Map<string, { state: LayoutState; latest: string | null; latestVersion: number | null }>();
  for (const id of layoutIds) out.set(id, { state: 'draft', latest: null, latestVersion: null });
  if (!layoutIds.length) return out;
  const db = await getDb();
  const revs = await db
    .select({ id: revisions.id, layoutId: revisions.layoutId, seq: revisions.seq, letter: revisions.letter, layoutVersion: revisions.layoutVersion })
    .from(revisions)
    .where(inArray(revisions.layoutId, layoutIds))
    .orderBy(desc(revisions.seq));
  const latest = new Map<string, { id: string; letter: string; layoutVersion: number }>();
  for (const r of revs) if (!latest.has(r.layoutId)) latest.set(r.layoutId, { id: r.id, letter: r.letter, layoutVersion: r.layoutVersion });
  const latestIds = [...latest.values()].map((r) => r.id);
  const decisions = latestIds.length
    ? await db.select({ revisionId: revisionDecisions.revisionId, decision: revisionDecisions.decision })
      .from(revisionDecisions).where(inArray(revisionDecisions.revisionId, latestIds)).orderBy(asc(revisionDecisions.decidedAt))
    : [];
  for (const [layoutId, rev] of latest) {
    out.set(layoutId, { state: revisionState(decisions.filter((d) => d.revisionId === rev.id)), latest: rev.letter, latestVersion: rev.layoutVersion });
  }
  return out;
}
