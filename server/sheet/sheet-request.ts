/**
 * Gathers what a plan sheet of a stored layout needs — the document, the studio, the client, the
 * studio's units and check defaults — for the PDF route and the HTML print view alike (the checks
 * and the drawing itself run in the work pool, lib/workers: job `sheet` / `sheetPdf`), after the rights checks of `getLayout` (404 for anyone who may not see it).
 * Issued means frozen: the sheet is made from an issued revision — the one chosen (`?revision=B`),
 * by default the latest approved, else the latest issued (db/sharing/issued) — and carries its
 * revision table and clouds round what changed since the revision before. The layout as last saved
 * is printed only when chosen (`?revision=preliminary`) or while nothing has been issued, and its
 * title block then says "Preliminary". Server only; never trusts a query string beyond its schema.
 */
import 'server-only';
import { z } from 'zod';
import type { Actor } from '@/db/actor';
import { getLayout } from '@/db/layouts';
import { getStudio } from '@/db/studios';
import { getRevision, listRevisions, type RevisionDto } from '@/db/sharing/revisions';
import { diffRevisions } from '@/lib/layout/revision-diff';
import type { LayoutDoc } from '@/lib/layout';
import { REVISION_LETTER } from '@/lib/sheet';
import { formatDate } from '@/lib/format';
import type { SheetInput } from '@/lib/workers/jobs';
import { revisionChoiceSchema } from '@/lib/api/planning-bodies';
import { documentSource, type IssuedRevisionDto } from '@/db/sharing/issued';

/** `?paper=a4|a3&scale=10|20|25`; both optional (A4 at 1:20). */
export const sheetQuerySchema = z.strictObject({
  paper: z.enum(['a4', 'a3'], 'paper is a4 or a3').default('a4'),
  scale: z.enum(['10', '20', '25'], 'scale is 10, 20 or 25 (for 1:10, 1:20, 1:25)').default('20').transform((s) => Number(s) as 10 | 20 | 25),
  /** An issued revision's letter, or `preliminary` for the layout as last saved; left out, the default revision. */
  revision: revisionChoiceSchema.optional(),
});
export type SheetQuery = z.infer<typeof sheetQuerySchema>;

export function queryOf(url: string | URLSearchParams): Record<string, string> {
  const params = typeof url === 'string' ? new URL(url).searchParams : url;
  return Object.fromEntries(params.entries());
}

export interface FrozenRevision {
  letter: string;
  doc: LayoutDoc;
  state?: RevisionDto['state'];
}

export interface SheetContext {
  /** Everything but the paper and scale, which the caller chooses. */
  request: Omit<SheetInput, 'paper' | 'scale'>;
  layoutId: string;
  layoutName: string;
  /** The revision printed (null: the preliminary layout), the layout's issued revisions and the default. */
  printed: IssuedRevisionDto | null;
  revisions: IssuedRevisionDto[];
  defaultRevision: string | null;
}

export function today(now = new Date()): string {
  return formatDate(now);
}

/**
 * The sheet of one copy of the layout: `choice` is a revision letter, `preliminary`, or left out
 * for the default (the latest approved revision, else the latest issued, else the preliminary).
 */
export async function sheetRequestFor(actor: Actor, layoutId: string, choice?: string): Promise<SheetContext> {
  const layout = await getLayout(actor, layoutId);
  const source = await documentSource(actor, layoutId, choice);
  const revision: FrozenRevision | null = source.revision ? { letter: source.revision.letter, doc: source.doc, state: source.revision.state } : null;
  if (revision && !REVISION_LETTER.test(revision.letter)) throw new Error(`not a revision letter: ${revision.letter}`);
  const studio = await getStudio(actor);
  const doc = source.doc;
  const { rows, changes } = await revisionMarks(actor, layoutId, revision);
  return {
    layoutId: layout.id,
    layoutName: layout.name,
    printed: source.revision,
    revisions: source.revisions,
    defaultRevision: source.defaultRevision,
    request: {
      doc,
      studioDefaults: studio.checkDefaults,
      units: studio.units,
      details: { studio: studio.name, client: layout.client?.name ?? null, layout: layout.name, revision: revision?.letter ?? null, issueState: revision?.state ?? null, date: today() },
      revisions: rows,
      changes,
    },
  };
}

/** The revision table up to the printed revision (all of them for the layout as it stands), and its changes since the one before. */
async function revisionMarks(actor: Actor, layoutId: string, printed: FrozenRevision | null) {
  const newestFirst = await listRevisions(actor, layoutId);
  const oldestFirst = [...newestFirst].reverse();
  const upTo = printed ? oldestFirst.findIndex((r) => r.letter === printed.letter) : oldestFirst.length - 1;
  const rows = oldestFirst.slice(0, upTo + 1).map((r) => ({ letter: r.letter, date: formatDate(r.issuedAt), description: r.note, by: r.issuedBy }));
  const before = printed && upTo > 0 ? oldestFirst[upTo - 1] : null;
  const changes = printed && before ? { letter: printed.letter, diff: diffRevisions((await getRevision(actor, layoutId, before.id)).doc, printed.doc) } : null;
  return { rows, changes };
}

/** A download name like "Nair — L2H2 weekender, plan sheet A4 1-20.pdf". */
export function sheetFileName(layoutName: string, query: SheetQuery, revision?: string | null): string {
  return `${layoutName}, plan sheet${revision ? ` rev ${revision}` : ''} ${query.paper.toUpperCase()} 1-${query.scale}.pdf`;
}
