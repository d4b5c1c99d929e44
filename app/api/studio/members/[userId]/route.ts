import { z } from 'zod';
import { handle, json, parseWith, readJson, requireActor } from '@/server/api/respond';
import { changeRole, removeMember } from '@/db/studios';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ userId: string }> };
const roleBody = z.strictObject({ role: z.enum(['owner', 'designer', 'client']) });
/** The id is checked in db/studios (db/ids.ts, the one place that says what an id is). */
async function memberId(params: Ctx['params']): Promise<string> {
  return (await params).userId;
}

export const PATCH = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  const userId = await memberId(params);
  const body = parseWith(roleBody, await readJson(req, 4 * 1024));
  await changeRole(actor, userId, body.role);
  return json({ userId, role: body.role });
});

export const DELETE = handle<Ctx>(async (req, { params }) => {
  const actor = await requireActor(req);
  await removeMember(actor, await memberId(params));
  return new Response(null, { status: 204 });
});
