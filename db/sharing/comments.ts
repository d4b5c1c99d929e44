/**
 * Mark-ups on a layout (stored in the `comments` table): a thread starts with a keyed note at a
 * point of the plan (whole millimetres, in one arrangement), others reply, and either side marks
 * it settled (or open again); `resolved_at` / `resolved_by` record the settling. Authors may change
 * or remove their own comments (an edit is marked as such); the studio's owner may remove any. The workshop's
 * owners and designers and the layout's client take part; nobody else even learns the layout
 * exists. Authors' names are kept with the note; their addresses are never returned. A mark-up may be
 * placed at one of the bay's openings (by its id, which must be on the layout): its point goes to
 * the opening's middle in plan. Each thread is listed with what its point is near — the nearest
 * module of its arrangement or opening (lib/layout/nearest) — in the layout as it is now.
 * Must never let a viewer link (no account) read or write mark-ups.
 */
import 'server-only';
import { and, asc, count, eq, inArray, isNull } from 'drizzle-orm';
import { getDb } from '../client';
import { comments } from '../schema';
import { BadRequestError, ForbiddenError, NotFoundError } from '../errors';
import type { Actor, StudioRole } from '../actor';
import { ARRANGEMENTS, type Arrangement, type LayoutDoc } from '../../lib/layout/schema';
import { nearestFinder, openingPlanPoint } from '../../lib/layout/nearest';
import { loadLayoutFor, type LayoutAccessWithDoc } from '../access';
import { isId } from '../ids';

export const COMMENT_MAX = 2000;
/** How far outside the bare-metal outline a mark-up's point may sit (a note about the cab or the rear door). */
export const PIN_MARGIN_MM = 500;

export interface CommentDto {
  id: string;
  body: string;
  author: { name: string; role: StudioRole; isYou: boolean };
  createdAt: string;
  /** When the author last changed the text; null if never. */
  editedAt: string | null;
  /** Whether the caller may change the text (the author) and remove it (the author, the owner). */
  canEdit: boolean;
  canDelete: boolean;
}

export interface ThreadDto extends CommentDto {
  arrangement: Arrangement;
  x: number;
  y: number;
  /** When the thread was marked settled; null while it is open. */
  settled: { at: string } | null;
  /** The module or opening its point is nearest (by name), or null when nothing is near. */
  near: string | null;
  replies: CommentDto[];
}

type Row = typeof comments.$inferSelect;

function asRole(r: string): StudioRole {
  return r === 'owner' || r === 'designer' ? r : 'client';
}

function commentDto(r: Row, actor: Actor): CommentDto {
  return {
    id: r.id,
    body: r.body,
    author: { name: r.authorName, role: asRole(r.authorRole), isYou: r.authorId === actor.userId },
    createdAt: r.createdAt.toISOString(),
    editedAt: r.editedAt ? r.editedAt.toISOString() : null,
    canEdit: r.authorId === actor.userId,
    canDelete: r.authorId === actor.userId || actor.role === 'owner',
  };
}

function threads(rows: Row[], actor: Actor, doc: LayoutDoc): ThreadDto[] {
  const roots = rows.filter((r) => !r.parentId);
  // Replies by thread, and one nearest-thing finder per arrangement: linear in the rows, not rows × threads.
  const replies = new Map<string, Row[]>();
  for (const r of rows) {
    if (!r.parentId) continue;
    const list = replies.get(r.parentId);
    if (list) list.push(r);
    else replies.set(r.parentId, [r]);
  }
  const finders = new Map<Arrangement, ReturnType<typeof nearestFinder>>();
  const finder = (a: Arrangement) => finders.get(a) ?? finders.set(a, nearestFinder(doc, a)).get(a)!;
  return roots.map((root) => {
    const arrangement = (ARRANGEMENTS as readonly string[]).includes(root.arrangement ?? '') ? (root.arrangement as Arrangement) : 'travel';
    const x = root.x ?? 0;
    const y = root.y ?? 0;
    return {
      ...commentDto(root, actor),
      arrangement,
      x,
      y,
      settled: root.resolvedAt ? { at: root.resolvedAt.toISOString() } : null,
      near: finder(arrangement)(x, y)?.name ?? null,
      replies: (replies.get(root.id) ?? []).map((r) => commentDto(r, actor)),
    };
  });
}

export async function listThreads(actor: Actor, layoutId: string): Promise<ThreadDto[]> {
  const { doc } = await loadLayoutFor(actor, layoutId, { withDoc: true });
  const db = await getDb();
  const rows = await db.select().from(comments).where(eq(comments.layoutId, layoutId)).orderBy(asc(comments.createdAt));
  return threads(rows, actor, doc);
}

export type NewComment =
  | { kind: 'pin'; arrangement: Arrangement; x: number; y: number; body: string }
  | { kind: 'opening'; arrangement: Arrangement; openingId: string; body: string }
  | { kind: 'reply'; parentId: string; body: string };

function checkBody(body: string): string {
  const text = body.trim();
  if (!text) throw new BadRequestError('Write something in the mark-up.');
  if (text.length > COMMENT_MAX) throw new BadRequestError(`Keep a mark-up under ${COMMENT_MAX} characters.`);
  return text;
}

function checkPin(layout: LayoutAccessWithDoc, x: number, y: number): void {
  const { length, width } = layout.doc.bay;
  if (x < -PIN_MARGIN_MM || x > length + PIN_MARGIN_MM || y < -PIN_MARGIN_MM || y > width + PIN_MARGIN_MM) {
    throw new BadRequestError(`Place the mark-up on the plan: x from 0 to ${length} mm, y from 0 to ${width} mm.`);
  }
}

/** Returns the thread the new comment belongs to, and who else should hear of it. */
export async function addComment(actor: Actor, layoutId: string, input: NewComment): Promise<{ thread: ThreadDto; layout: LayoutAccessWithDoc; commentId: string; threadAuthorId: string | null }> {
  const layout = await loadLayoutFor(actor, layoutId, { withDoc: true });
  const body = checkBody(input.body);
  const db = await getDb();
  let rootId: string;
  let threadAuthorId: string | null = actor.userId;
  let commentId: string;
  const author = { authorId: actor.userId, authorName: actor.name, authorRole: actor.role };
  if (input.kind === 'pin' || input.kind === 'opening') {
    let at = input.kind === 'pin' ? { x: input.x, y: input.y } : null;
    if (input.kind === 'opening') {
      const opening = (layout.doc.bay.openings ?? []).find((o) => o.id === input.openingId);
      at = opening ? openingPlanPoint(layout.doc.bay, opening) : null;
      if (!at) throw new BadRequestError('That opening is not on this layout: choose one of its windows, roof openings or body points.');
    }
    checkPin(layout, at!.x, at!.y);
    const [row] = await db
      .insert(comments)
      .values({ layoutId, arrangement: input.arrangement, x: Math.round(at!.x), y: Math.round(at!.y), body, ...author })
      .returning({ id: comments.id });
    rootId = row.id;
    commentId = row.id;
  } else {
    if (!isId(input.parentId)) throw new BadRequestError('That mark-up is not on this layout.');
    const [parent] = await db.select().from(comments).where(and(eq(comments.id, input.parentId), eq(comments.layoutId, layoutId))).limit(1);
    if (!parent) throw new BadRequestError('That mark-up is not on this layout.');
    // Replies hang off the thread's first comment: threads are one level deep.
    rootId = parent.parentId ?? parent.id;
    const [root] = rootId === parent.id ? [parent] : await db.select().from(comments).where(eq(comments.id, rootId)).limit(1);
    threadAuthorId = root?.authorId ?? null;
    const [row] = await db.insert(comments).values({ layoutId, parentId: rootId, body, ...author }).returning({ id: comments.id });
    commentId = row.id;
  }
  const rows = await db.select().from(comments).where(and(eq(comments.layoutId, layoutId))).orderBy(asc(comments.createdAt));
  const thread = threads(rows.filter((r) => r.id === rootId || r.parentId === rootId), actor, layout.doc)[0];
  return { thread, layout, commentId, threadAuthorId };
}

/** Marks a thread settled (or open again); the workshop and the layout's client may both. */
export async function setSettled(actor: Actor, layoutId: string, commentId: string, settled: boolean): Promise<ThreadDto> {
  const { doc } = await loadLayoutFor(actor, layoutId, { withDoc: true });
  const row = await commentOf(layoutId, commentId);
  if (row.parentId) throw new BadRequestError('Settle the thread from its first note.');
  const db = await getDb();
  await db
    .update(comments)
    .set(settled ? { resolvedAt: new Date(), resolvedBy: actor.userId } : { resolvedAt: null, resolvedBy: null })
    .where(eq(comments.id, commentId));
  return threadOf(actor, layoutId, commentId, doc);
}

async function commentOf(layoutId: string, commentId: string): Promise<Row> {
  if (!isId(commentId)) throw new NotFoundError('No such mark-up.');
  const db = await getDb();
  const [row] = await db.select().from(comments).where(and(eq(comments.id, commentId), eq(comments.layoutId, layoutId))).limit(1);
  if (!row) throw new NotFoundError('No such mark-up.');
  return row;
}

async function threadOf(actor: Actor, layoutId: string, rootId: string, doc: LayoutDoc): Promise<ThreadDto> {
  const db = await getDb();
  const rows = await db.select().from(comments).where(eq(comments.layoutId, layoutId)).orderBy(asc(comments.createdAt));
  return threads(rows.filter((r) => r.id === rootId || r.parentId === rootId), actor, doc)[0];
}

/** The author changes their own words; the note keeps its place, point and replies. */
export async function editComment(actor: Actor, layoutId: string, commentId: string, body: string): Promise<ThreadDto> {
  const { doc } = await loadLayoutFor(actor, layoutId, { withDoc: true });
  const row = await commentOf(layoutId, commentId);
  if (row.authorId !== actor.userId) throw new ForbiddenError('Only its author can change a mark-up.');
  const text = checkBody(body);
  const db = await getDb();
  if (text !== row.body) await db.update(comments).set({ body: text, editedAt: new Date() }).where(eq(comments.id, row.id));
  return threadOf(actor, layoutId, row.parentId ?? row.id, doc);
}

/**
 * Removes a note: its author may, and so may the studio's owner (to tidy a thread). Removing
 * a thread's first note removes the thread with its replies and its symbol.
 */
export async function deleteComment(actor: Actor, layoutId: string, commentId: string): Promise<{ removedThread: boolean }> {
  await loadLayoutFor(actor, layoutId);
  const row = await commentOf(layoutId, commentId);
  if (row.authorId !== actor.userId && actor.role !== 'owner') throw new ForbiddenError('Only its author or the studio owner can remove a mark-up.');
  const db = await getDb();
  await db.delete(comments).where(eq(comments.id, row.id)); // replies go with their thread (on delete cascade)
  return { removedThread: row.parentId === null };
}

/** Open (not settled) mark-up threads per layout, for the layouts table. */
export async function openThreadCounts(layoutIds: string[]): Promise<Map<string, number>> {
  const out = new Map<string, number>(layoutIds.map((id) => [id, 0]));
  if (!layoutIds.length) return out;
  const db = await getDb();
  const rows = await db
    .select({ layoutId: comments.layoutId, n: count() })
    .from(comments)
    .where(and(inArray(comments.layoutId, layoutIds), isNull(comments.parentId), isNull(comments.resolvedAt)))
    .groupBy(comments.layoutId);
  for (const r of rows) out.set(r.layoutId, r.n);
  return out;
}
