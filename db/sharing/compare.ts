/**
 * Comparing two states of a layout — two revisions, or a revision and the layout as last saved —
 * or a layout and its variant:
 * both documents, what changed between them (lib/layout/revision-diff) and which check findings
 * changed status (both documents checked with the studio's defaults, in the work pool). Anyone who may see the
 * layout may compare its revisions. Must never reach a revision of another layout.
 */
import 'server-only';
import { eq, inArray } from 'drizzle-orm';
import { getDb } from '../client';
import { layouts, studios } from '../schema';
import { NotFoundError } from '../errors';
import type { Actor } from '../actor';
import { settingsSchema, type LayoutDoc } from '../../lib/layout/schema';
import { diffFindings, diffRevisions, type FindingChange, type RevisionDiff } from '../../lib/layout/revision-diff';
import { runJob } from '../../lib/workers/pool';
import { AS_LAST_SAVED } from '../../lib/layout/drawing-issue';
import { loadLayoutFor } from '../access';
import { isId } from '../ids';
import { getRevision, revisionIdByLetter } from './revisions';

export interface ComparedSide {
  label: string;
  letter: string | null;
  at: string;
  doc: LayoutDoc;
  ok: boolean;
}

export interface ComparisonDto {
  from: ComparedSide;
  to: ComparedSide;
  diff: RevisionDiff;
  findings: FindingChange[];
}

async function side(actor: Actor, layoutId: string, ref: string): Promise<Omit<ComparedSide, 'ok'>> {
  if (ref === 'current') {
    const layout = await loadLayoutFor(actor, layoutId, { withDoc: true });
    return { label: AS_LAST_SAVED, letter: null, at: new Date().toISOString(), doc: layout.doc };
  }
  const id = isId(ref) ? ref : await revisionIdByLetter(actor, layoutId, ref.toUpperCase());
  const rev = await getRevision(actor, layoutId, id);
  return { label: `Revision ${rev.letter}`, letter: rev.letter, at: rev.issuedAt, doc: rev.doc };
}

async function checkedComparison(actor: Actor, from: Omit<ComparedSide, 'ok'>, to: Omit<ComparedSide, 'ok'>): Promise<ComparisonDto> {
  const db = await getDb();
  const [s] = await db.select({ checkDefaults: studios.checkDefaults }).from(studios).where(eq(studios.id, actor.studioId)).limit(1);
  const defaults = settingsSchema.safeParse(s?.checkDefaults).data ?? {};
  // Both check runs happen in the work pool (lib/workers), off the request thread, side by side
  // (one worker each when both are free); the reports are bounded, so diffing them here is cheap.
  const [before, after] = await Promise.all([
    runJob('checks', { doc: from.doc, studioDefaults: defaults }),
    runJob('checks', { doc: to.doc, studioDefaults: defaults }),
  ]);
  return {
    from: { ...from, ok: before.ok },
    to: { ...to, ok: after.ok },
    diff: diffRevisions(from.doc, to.doc),
    findings: diffFindings(before.findings, after.findings),
  };
}

/**
 * A layout and another (its variant, or the original it is a variant of) as last saved, side by
 * side: the same comparison as two revisions. Both must be readable by the actor (404 otherwise).
 * A variant keeps its original's module ids, so the module diff pairs them up.
 */
export async function compareVariants(actor: Actor, layoutId: string, otherId: string): Promise<ComparisonDto> {
  const [a, b] = await Promise.all([loadLayoutFor(actor, layoutId, { withDoc: true }), loadLayoutFor(actor, otherId, { withDoc: true })]);
  const db = await getDb();
  const when = await db.select({ id: layouts.id, updatedAt: layouts.updatedAt }).from(layouts).where(inArray(layouts.id, [a.id, b.id]));
  const at = (id: string) => (when.find((w) => w.id === id)?.updatedAt ?? new Date()).toISOString();
  return checkedComparison(actor, { label: a.name, letter: null, at: at(a.id), doc: a.doc }, { label: b.name, letter: null, at: at(b.id), doc: b.doc });
}

export async function compareRevisions(actor: Actor, layoutId: string, fromRef: string, toRef: string): Promise<ComparisonDto> {
  await loadLayoutFor(actor, layoutId);
  if (fromRef.length > 64 || toRef.length > 64) throw new NotFoundError('No such revision.');
  const [from, to] = await Promise.all([side(actor, layoutId, fromRef), side(actor, layoutId, toRef)]);
  return checkedComparison(actor, from, to);
}
