// Mark-ups on the plan (stored in the comments table): the workshop and the layout's client place
// them, reply, settle them and open them again, and change or remove their own; strangers get 404; bad input 400 with nothing stored;
// the other side hears by mail.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { count } from 'drizzle-orm';
import * as threads from '@/app/api/layouts/[id]/comments/route';
import * as oneThread from '@/app/api/layouts/[id]/comments/[commentId]/route';
import * as layoutList from '@/app/api/layouts/route';
import { comments } from '@/db/schema';
import { openThreadCounts } from '@/db/sharing/comments';
import type { Db } from '@/db/client';
import type { FakeSmtp } from '@/dev/fakes/smtp/server';
import { useFreshDb } from '../helpers/db';
import { call } from '../helpers/http';
import { buildWorld, type World } from '../helpers/world';
import { as, linkIn, mailFor, startMailSink, STRANGERS } from './helpers';

let db: Db;
let w: World;
let smtp: FakeSmtp;

beforeAll(async () => {
  db = await useFreshDb();
  w = await buildWorld(db);
  smtp = await startMailSink();
});
afterAll(() => smtp.close());

const commentCount = async () => (await db.select({ n: count() }).from(comments))[0].n;
const pin = { arrangement: 'sleep', x: 1800, y: 600, body: 'Can the bed be 50 mm longer here?' };

describe('placing mark-ups', () => {
  it('refuses anonymous (401) and strangers (404) for reading and writing; stores nothing', async () => {
    const params = { id: w.clientLayoutId };
    expect((await call(threads.GET, { params, as: null })).status).toBe(401);
    expect((await call(threads.POST, { method: 'POST', params, as: null, json: pin })).status).toBe(401);
    for (const who of STRANGERS) {
      expect((await call(threads.GET, { params, as: as(w, who) })).status, who).toBe(404);
      expect((await call(threads.POST, { method: 'POST', params, as: as(w, who), json: pin })).status, who).toBe(404);
    }
    expect(await commentCount()).toBe(0);
  });

  it('refuses bad pins and bodies with 400 and stores nothing', async () => {
    const params = { id: w.clientLayoutId };
    for (const json of [
      { ...pin, body: '' }, { ...pin, body: '   ' }, { ...pin, body: 'x'.repeat(2001) }, { ...pin, arrangement: 'party' },
      { ...pin, x: 10.5 }, { ...pin, x: 99_000 }, { ...pin, y: -5000 }, { body: 'no pin' }, { ...pin, extra: 1 },
      { parentId: 'not-a-uuid', body: 'reply' }, { parentId: '00000000-0000-4000-8000-000000000000', body: 'reply' },
    ]) {
      const res = await call(threads.POST, { method: 'POST', params, as: w.client, json });
      expect(res.status, JSON.stringify(json)).toBe(400);
      expect(typeof res.body.error).toBe('string');
    }
    expect(await commentCount()).toBe(0);
  });

  it('lets the client place a mark-up in millimetres, and mails the workshop a link to it', async () => {
    const res = await call(threads.POST, { method: 'POST', params: { id: w.clientLayoutId }, as: w.client, json: pin });
    expect(res.status).toBe(201);
    expect(res.body.thread).toMatchObject({ arrangement: 'sleep', x: 1800, y: 600, body: pin.body, author: { name: 'Priya Nair', role: 'client', isYou: true }, settled: null, replies: [] });
    expect(JSON.stringify(res.body)).not.toContain('@');
    // The layout was made by the designer: the designer hears of it.
    const [mail] = await mailFor(db, 'ivo@saltmarsh.test');
    expect(mail.parsed.subject).toBe('Priya Nair left a mark-up on Nair — L2H2 weekender');
    expect(linkIn(mail.parsed, '/layouts/').searchParams.get('markup')).toBe(res.body.thread.id);
  });

  it('lets the designer reply and the client hear of it; replies to replies join the thread', async () => {
    const [thread] = (await call(threads.GET, { params: { id: w.clientLayoutId }, as: w.designer })).body.threads;
    const reply = await call(threads.POST, { method: 'POST', params: { id: w.clientLayoutId }, as: w.designer, json: { parentId: thread.id, body: 'Yes, if the kitchen moves forward 50 mm.' } });
    expect(reply.status).toBe(201);
    expect(reply.body.thread.replies).toHaveLength(1);
    expect(reply.body.thread.replies[0].author).toEqual({ name: 'Ivo Brandt', role: 'designer', isYou: true });
    const nested = await call(threads.POST, { method: 'POST', params: { id: w.clientLayoutId }, as: w.client, json: { parentId: reply.body.thread.replies[0].id, body: 'Fine by me.' } });
    expect(nested.body.thread.id).toBe(thread.id);
    expect(nested.body.thread.replies.map((r: { body: string }) => r.body)).toEqual(['Yes, if the kitchen moves forward 50 mm.', 'Fine by me.']);
    const [mail] = await mailFor(db, 'priya@client.test');
    expect(mail.parsed.subject).toBe('Ivo Brandt replied to a mark-up on Nair — L2H2 weekender');
  });

  it('does not let a mark-up of one layout take replies through another', async () => {
    const [thread] = (await call(threads.GET, { params: { id: w.clientLayoutId }, as: w.designer })).body.threads;
    const res = await call(threads.POST, { method: 'POST', params: { id: w.otherLayoutId }, as: w.designer, json: { parentId: thread.id, body: 'sneaky' } });
    expect(res.status).toBe(400);
  });
});

describe('settling mark-ups', () => {
  it('lets either side settle and open again; strangers 404; replies cannot be settled', async () => {
    const [thread] = (await call(threads.GET, { params: { id: w.clientLayoutId }, as: w.client })).body.threads;
    const params = { id: w.clientLayoutId, commentId: thread.id };
    expect(await openThreadCounts([w.clientLayoutId])).toEqual(new Map([[w.clientLayoutId, 1]]));
    for (const who of STRANGERS) expect((await call(oneThread.PATCH, { method: 'PATCH', params, as: as(w, who), json: { settled: true } })).status, who).toBe(404);
    expect((await call(oneThread.PATCH, { method: 'PATCH', params, as: null, json: { settled: true } })).status).toBe(401);
    expect((await call(oneThread.PATCH, { method: 'PATCH', params, as: w.client, json: { settled: 'yes' } })).status).toBe(400);
    const reply = thread.replies[0];
    expect((await call(oneThread.PATCH, { method: 'PATCH', params: { ...params, commentId: reply.id }, as: w.client, json: { settled: true } })).status).toBe(400);
    const settled = await call(oneThread.PATCH, { method: 'PATCH', params, as: w.client, json: { settled: true } });
    expect(settled.status).toBe(200);
    expect(settled.body.thread.settled).toEqual({ at: expect.any(String) });
    expect(await openThreadCounts([w.clientLayoutId])).toEqual(new Map([[w.clientLayoutId, 0]]));
    const reopened = await call(oneThread.PATCH, { method: 'PATCH', params, as: w.designer, json: { settled: false } });
    expect(reopened.body.thread.settled).toBeNull();
    expect((await call(oneThread.PATCH, { method: 'PATCH', params: { ...params, id: w.otherLayoutId }, as: w.designer, json: { settled: true } })).status).toBe(404);
  });

  it('lets the designer place a mark-up in any arrangement, and the other client never sees it', async () => {
    const res = await call(threads.POST, { method: 'POST', params: { id: w.clientLayoutId }, as: w.owner, json: { arrangement: 'travel', x: 400, y: 300, body: 'Seat belt anchorage to be confirmed by the workshop (licensed fitter).' } });
    expect(res.status).toBe(201);
    const other = await call(threads.GET, { params: { id: w.otherLayoutId }, as: w.otherClient });
    expect(other.body.threads).toEqual([]);
    const mine = await call(threads.GET, { params: { id: w.clientLayoutId }, as: w.client });
    expect(mine.body.threads.map((t: { arrangement: string }) => t.arrangement)).toEqual(['sleep', 'travel']);
  });

  it('counts open threads per layout in the layouts list', async () => {
    const res = await call(layoutList.GET, { as: w.owner });
    const count = (id: string) => res.body.layouts.find((l: { id: string }) => l.id === id).sharing.openComments;
    expect(count(w.clientLayoutId)).toBe(2);
    expect(count(w.otherLayoutId)).toBe(0);
  });
});

describe('changing and removing mark-ups', () => {
  const params = (commentId: string) => ({ id: w.clientLayoutId, commentId });
  const newThread = async (who: 'client' | 'designer', body: string) => {
    const res = await call(threads.POST, { method: 'POST', params: { id: w.clientLayoutId }, as: as(w, who), json: { ...pin, body } });
    expect(res.status).toBe(201);
    return res.body.thread as { id: string; body: string };
  };

  it('lets the author change their words, marks the note edited, and refuses everyone else', async () => {
    const thread = await newThread('client', 'Is the tank 70 l?');
    const edited = await call(oneThread.PATCH, { method: 'PATCH', params: params(thread.id), as: as(w, 'client'), json: { body: 'Is the fresh tank 70 l or 100 l?' } });
    expect(edited.status).toBe(200);
    expect(edited.body.thread.body).toBe('Is the fresh tank 70 l or 100 l?');
    expect(edited.body.thread.editedAt).toEqual(expect.any(String));
    expect(edited.body.thread.canEdit).toBe(true);
    // Not the author: the workshop sees it and may settle it, but not put words in the client's mouth.
    const byDesigner = await call(oneThread.PATCH, { method: 'PATCH', params: params(thread.id), as: as(w, 'designer'), json: { body: 'rewritten' } });
    expect(byDesigner.status).toBe(403);
    for (const who of STRANGERS) {
      expect((await call(oneThread.PATCH, { method: 'PATCH', params: params(thread.id), as: as(w, who), json: { body: 'x' } })).status, who).toBe(404);
    }
    const seenBy = async (who: 'designer' | 'owner') =>
      (await call(threads.GET, { params: { id: w.clientLayoutId }, as: as(w, who) })).body.threads.find((t: { id: string }) => t.id === thread.id);
    expect(await seenBy('designer')).toMatchObject({ body: 'Is the fresh tank 70 l or 100 l?', canEdit: false, canDelete: false });
    expect(await seenBy('owner')).toMatchObject({ canEdit: false, canDelete: true }); // the owner may tidy a thread away
  });

  it('refuses an empty or oversized edit with 400 and keeps the old text', async () => {
    const thread = await newThread('designer', 'Gas locker drains through the floor.');
    for (const body of ['   ', 'x'.repeat(2001)]) {
      const res = await call(oneThread.PATCH, { method: 'PATCH', params: params(thread.id), as: as(w, 'designer'), json: { body } });
      expect(res.status).toBe(400);
    }
    expect((await call(oneThread.PATCH, { method: 'PATCH', params: params(thread.id), as: as(w, 'designer'), json: { body: 'x', settled: true } })).status).toBe(400);
    const list = await call(threads.GET, { params: { id: w.clientLayoutId }, as: as(w, 'designer') });
    expect(list.body.threads.find((t: { id: string }) => t.id === thread.id)).toMatchObject({ body: 'Gas locker drains through the floor.', editedAt: null });
  });

  it('lets the author or the owner remove a note; a first note takes its thread and replies with it', async () => {
    const before = await commentCount();
    const thread = await newThread('designer', 'Move the heater outlet 100 mm aft.');
    const reply = await call(threads.POST, { method: 'POST', params: { id: w.clientLayoutId }, as: as(w, 'client'), json: { parentId: thread.id, body: 'Fine by me.' } });
    const replyId = reply.body.thread.replies[0].id as string;
    // The client may remove their own reply but not the designer's thread.
    expect((await call(oneThread.DELETE, { method: 'DELETE', params: params(thread.id), as: as(w, 'client') })).status).toBe(403);
    for (const who of STRANGERS) {
      expect((await call(oneThread.DELETE, { method: 'DELETE', params: params(thread.id), as: as(w, who) })).status, who).toBe(404);
    }
    expect((await call(oneThread.DELETE, { method: 'DELETE', params: params(replyId), as: as(w, 'client') })).body).toEqual({ removedThread: false });
    expect(await commentCount()).toBe(before + 1);
    // The owner tidies up the designer's thread.
    expect((await call(oneThread.DELETE, { method: 'DELETE', params: params(thread.id), as: as(w, 'owner') })).body).toEqual({ removedThread: true });
    expect(await commentCount()).toBe(before);
    expect((await call(oneThread.DELETE, { method: 'DELETE', params: params(thread.id), as: as(w, 'owner') })).status).toBe(404);
  });
});
