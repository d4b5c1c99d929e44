/**
 * Issued means frozen: which copy of a layout each reader and each document is made from.
 *
 * - Where a layout stands (`issueStanding`): its latest revision, whether the layout has been
 *   saved since that revision froze it ("Approved B · changed since"), which revision documents
 *   follow by default and which one the client is shown.
 * - The copy a document is made from (`documentSource`): a chosen issued revision, or by default
 *   the latest approved, else the latest issued; the preliminary layout (as last saved) only when
 *   chosen, or while nothing has been issued. Every document read is migrated on read
 *   (`readStoredDoc`).
 *
 * Rights: anyone who may see the layout (`loadLayoutFor`), 404 otherwise. Returns DTOs, never rows.
 * Must never hand a client the preliminary layout by default once a revision has been issued.
 */
import 'server-only';
import { and, asc, desc, eq, inArray } from 'drizzle-orm';
import { getDb } from '../client';
import { revisionDecisions, revisions } from '../schema';
import { NotFoundError } from '../errors';
import type { Actor } from '../actor';
import { loadLayoutFor } from '../access';
import { readStoredDoc } from '../stored-doc';
import type { LayoutDoc } from '../../lib/layout/schema';
import {
  clientRevision, documentsRevision, PRELIMINARY_CHOICE,
  type RevisionState,
} from '../../lib/layout/drawing-issue';
import { revisionState } from './revisions';

/** One issued revision, without its document. */
export interface IssuedRevisionDto {
  id: string;
  letter: string;
  state: RevisionState;
  /** The layout version it froze. */
  layoutVersion: number;
  issuedAt: string;
}

export interface IssueStandingDto {
  layoutId: string;
  /** The layout's saved version now. */
  layoutVersion: number;
  /** Newest first. */
  revisions: IssuedRevisionDto[];
  latest: IssuedRevisionDto | null;
  /** Saved since the latest revision froze it: the next revision's preliminary is under way. */
  changedSince: boolean;
  /** What the sheet, parts list, cut list and quote are made from when nobody chooses. */
  documentsRevision: string | null;
  /** What the client and a following viewer link are shown. */
  clientRevision: string | null;
}

/** The layout's issued revisions, newest first, with their states; two queries, no documents. */
export async function issuedRevisions(layoutId: string): Promise<IssuedRevisionDto[]> {
  const db = await getDb();
  const revs = await db
    .select({ id: revisions.id, letter: revisions.letter, layoutVersion: revisions.layoutVersion, issuedAt: revisions.issuedAt })
    .from(revisions)
    .where(eq(revisions.layoutId, layoutId))
    .orderBy(desc(revisions.seq));
  if (!revs.length) return [];
  const decisions = await db
    .select({ revisionId: revisionDecisions.revisionId, decision: revisionDecisions.decision })
    .from(revisionDecisions)
    .where(inArray(revisionDecisions.revisionId, revs.map((r) => r.id)))
    .orderBy(asc(revisionDecisions.decidedAt));
  const byRevision = new Map<string, { decision: 'approved' | 'changes_asked' }[]>();
  for (const d of decisions) byRevision.set(d.revisionId, [...(byRevision.get(d.revisionId) ?? []), d]);
  return revs.map((r) => ({
    id: r.id,
    letter: r.letter,
    state: revisionState(byRevision.get(r.id) ?? []),
    layoutVersion: r.layoutVersion,
    issuedAt: r.issuedAt.toISOString(),
  }));
}

export async function issueStanding(actor: Actor, layoutId: string): Promise<IssueStandingDto> {
  const layout = await loadLayoutFor(actor, layoutId);
  const revs = await issuedRevisions(layout.id);
  const latest = revs[0] ?? null;
  return {
    layoutId: layout.id,
    layoutVersion: layout.version,
    revisions: revs,
    latest,
    changedSince: latest !== null && layout.version > latest.layoutVersion,
    documentsRevision: documentsRevision(revs),
    clientRevision: clientRevision(revs),
  };
}

/** A revision's letter, `preliminary` for the layout as last saved, or nothing for the default. */
export type RevisionChoice = string | undefined;

export interface DocumentSource {
  layoutId: string;
  layoutName: string;
  /** Null: the preliminary layout as last saved. */
  revision: IssuedRevisionDto | null;
  /** The layout version the document is (the revision's frozen version, or the saved one). */
  layoutVersion: number;
  doc: LayoutDoc;
  /** The layout's issued revisions, newest first (for a chooser). */
  revisions: IssuedRevisionDto[];
  /** What the default would have been, whatever was chosen. */
  defaultRevision: string | null;
}

/**
 * The copy a document is made from. `for: 'documents'` (sheet, parts, cut list, quote) defaults to
 * the latest approved revision, else the latest issued; `for: 'client'` to the latest issued. A
 * letter the layout has not issued is 404.
 */
export async function documentSource(actor: Actor, layoutId: string, choice: RevisionChoice, options: { for?: 'documents' | 'client' } = {}): Promise<DocumentSource> {
  const layout = await loadLayoutFor(actor, layoutId);
  const revs = await issuedRevisions(layout.id);
  const defaultRevision = options.for === 'client' ? clientRevision(revs) : documentsRevision(revs);
  const letter = choice === PRELIMINARY_CHOICE ? null : choice ?? defaultRevision;
  const base = { layoutId: layout.id, layoutName: layout.name, revisions: revs, defaultRevision };
  if (letter === null) {
    const withDoc = await loadLayoutFor(actor, layoutId, { withDoc: true });
    return { ...base, revision: null, layoutVersion: withDoc.version, doc: withDoc.doc };
  }
  const revision = revs.find((r) => r.letter === letter);
  if (!revision) throw new NotFoundError(`No revision ${letter.slice(0, 8)} of this layout.`);
  const db = await getDb();
  const [row] = await db.select({ doc: revisions.doc }).from(revisions)
    .where(and(eq(revisions.id, revision.id), eq(revisions.layoutId, layout.id))).limit(1);
  if (!row) throw new NotFoundError(`No revision ${letter} of this layout.`);
  return { ...base, revision, layoutVersion: revision.layoutVersion, doc: readStoredDoc(row.doc) };
}
