import { z } from 'zod';
import { handle, json, parseWith, readJson, requireActor } from '@/server/api/respond';
import { COMMENT_MAX, deleteComment, editComment, setSettled } from '@/db/sharing/comments';
import { loadLayoutFor } from '@/db/access';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ id: string; commentId: string }> };

const patchBody = z.union(
  [
    z.strictObject({ settled: z.boolean({ error: 'settled must be true or false' }) }),
    z.strictObject({ body: z.string({ error: 'body must be the new text' }).max(COMMENT_MAX, `Keep a mark-up under ${COMMENT_MAX} characters.`) }),
  ],
  { error: 'Send { settled: true | false } or { body: "new text" }.' },
);

/**
 * Marks a mark-up thread settled (or open again) — the workshop and the layout's client may
 * both — or, with `body`, changes the text of the caller's own note.
 */
export const PATCH = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  const { id, commentId } = await params;
  await loadLayoutFor(actor, id);
  const body = parseWith(patchBody, await readJson(req, 16 * 1024));
  if ('body' in body) return json({ thread: await editComment(actor, id, commentId, body.body) });
  return json({ thread: await setSettled(actor, id, commentId, body.settled) });
});

/** Removes the caller's own note (the owner may remove any); a thread's first takes the thread. */
export const DELETE = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  const { id, commentId } = await params;
  return json(await deleteComment(actor, id, commentId));
});
