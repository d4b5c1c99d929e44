import { z } from 'zod';
import { handle, json, parseWith, readJson, requireActor } from '@/server/api/respond';
import { issueRevision, listRevisions, NOTE_MAX } from '@/db/sharing/revisions';
import { loadLayoutFor } from '@/db/access';
import { notifyRevisionIssued } from '@/server/mail/notify';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ id: string }> };

const issueBody = z.strictObject({
  note: z.string().max(NOTE_MAX, `keep the note under ${NOTE_MAX} characters`).default(''),
});

/** The layout's revisions, newest first: anyone who may see the layout. */
export const GET = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  return json({ revisions: await listRevisions(actor, (await params).id) });
});

/** "Issue revision": freezes the stored document as the next letter and tells the client. */
export const POST = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  const { id } = await params;
  // Rights before body: a stranger learns nothing from the validation messages.
  await loadLayoutFor(actor, id);
  const body = parseWith(issueBody, await readJson(req, 16 * 1024));
  const revision = await issueRevision(actor, id, body);
  const layout = await loadLayoutFor(actor, id);
  const { doc: _doc, ...summary } = revision;
  const mail = await notifyRevisionIssued(req, actor, layout, summary);
  return json({ revision: summary, mail }, { status: 201 });
});
