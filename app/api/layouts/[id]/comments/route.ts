import { z } from 'zod';
import { handle, json, parseWith, readJson, requireActor } from '@/server/api/respond';
import { addComment, COMMENT_MAX, listThreads } from '@/db/sharing/comments';
import { loadLayoutFor } from '@/db/access';
import { arrangementSchema } from '@/lib/layout/schema';
import { notifyMarkup } from '@/server/mail/notify';
import { idField } from '@/db/ids';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ id: string }> };

const text = z.string().trim().min(1, 'write something in the mark-up').max(COMMENT_MAX, `keep a mark-up under ${COMMENT_MAX} characters`);
const mm = z.number().int('a whole number of millimetres').min(-100_000).max(100_000);
/** An opening's id as the layout document spells it (lib/layout/schema: letters, digits, - and _). */
const openingId = z.string().regex(/^[A-Za-z0-9_-]{1,64}$/, 'an opening of this layout, by its id');
const commentBody = z.union([
  z.strictObject({ arrangement: arrangementSchema, x: mm, y: mm, body: text }),
  z.strictObject({ arrangement: arrangementSchema, openingId, body: text }),
  z.strictObject({ parentId: idField('reply to a mark-up on this layout'), body: text }),
], { error: 'send a new mark-up (arrangement, x, y, body), one at an opening (arrangement, openingId, body) or a reply (parentId, body)' });

/** The layout's mark-up threads, oldest first (the path keeps its first name). */
export const GET = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  return json({ threads: await listThreads(actor, (await params).id) });
});

/** Places a new mark-up at a point of the plan or at one of the bay's openings, or replies in a thread; tells the other side. */
export const POST = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  const { id } = await params;
  await loadLayoutFor(actor, id);
  const body = parseWith(commentBody, await readJson(req, 16 * 1024));
  const input = 'parentId' in body ? { kind: 'reply' as const, ...body } : 'openingId' in body ? { kind: 'opening' as const, ...body } : { kind: 'pin' as const, ...body };
  const { thread, layout, threadAuthorId } = await addComment(actor, id, input);
  const mail = await notifyMarkup(req, actor, layout, thread, input.kind === 'reply', threadAuthorId);
  return json({ thread, mail }, { status: 201 });
});
