import { z } from 'zod';
import { handle, json, parseWith, readJson, requireActor } from '@/server/api/respond';
import { decideRevision, getRevision, MESSAGE_MAX } from '@/db/sharing/revisions';
import { loadLayoutFor } from '@/db/access';
import { ForbiddenError } from '@/db/errors';
import { notifyDecision } from '@/server/mail/notify';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ id: string; revisionId: string }> };

const decisionBody = z.discriminatedUnion('decision', [
  z.strictObject({ decision: z.literal('approve'), message: z.string().max(MESSAGE_MAX).optional() }),
  z.strictObject({ decision: z.literal('changes'), message: z.string().trim().min(1, 'say what you would like changed').max(MESSAGE_MAX) }),
], { error: 'decision must be "approve" or "changes"' });

/** The layout's client approves the latest revision (final) or asks for changes. */
export const POST = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  const { id, revisionId } = await params;
  // Rights before body: 404 for strangers, 403 for the workshop, then the body's rules.
  const layout = await loadLayoutFor(actor, id);
  await getRevision(actor, id, revisionId);
  if (!layout.isClient) throw new ForbiddenError('Only the client this layout is shared with can approve it or ask for changes.');
  const body = parseWith(decisionBody, await readJson(req, 16 * 1024));
  const revision = await decideRevision(actor, id, revisionId, body);
  const mail = await notifyDecision(req, actor, layout, revision);
  return json({ revision, mail }, { status: 201 });
});
