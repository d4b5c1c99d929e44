// Money is never deleted: a layout whose quote has a payment (open, paid) refuses deletion with
// 409 and is archived instead; archiving keeps the quote, payment, revision and approval, the
// layout stays readable, and it leaves (and with Restore returns to) the default list.
import { beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import * as list from '@/app/api/layouts/route';
import * as one from '@/app/api/layouts/[id]/route';
import * as archive from '@/app/api/layouts/[id]/archive/route';
import * as quote from '@/app/api/layouts/[id]/quote/route';
import * as revisionsRoute from '@/app/api/layouts/[id]/revisions/route';
import { layouts, payments, quotes, revisionDecisions, revisions } from '@/db/schema';
import { starterLayout } from '@/lib/layout/templates';
import type { Db } from '@/db/client';
import { useFreshDb } from '../helpers/db';
import { call, type SessionUser } from '../helpers/http';
import { buildWorld, type World } from '../helpers/world';

let db: Db;
let w: World;

beforeAll(async () => {
  db = await useFreshDb();
  w = await buildWorld(db);
});

let nextQuoteNumber = 1;

/** A layout of the demo studio shared with `client`, with a quote and (optionally) a payment in a given state. */
async function layoutWithQuote(name: string, money: 'none' | 'open' | 'paid' | 'paid-quote-only'): Promise<string> {
  const doc = { ...starterLayout('starter-l-lounge')!, name };
  const [layout] = await db.insert(layouts).values({ studioId: w.owner.studioId, clientId: w.client.id, name, doc }).returning({ id: layouts.id });
  const [q] = await db.insert(quotes).values({
    layoutId: layout.id, studioId: w.owner.studioId, number: nextQuoteNumber++, clientId: w.client.id, layoutVersion: 1,
    status: money === 'paid' || money === 'paid-quote-only' ? 'paid' : 'sent',
    currency: 'GBP', parts: { lines: [] } as never, grossMinor: 1_200_000, depositPct: 20, depositMinor: 240_000,
    sentByName: 'Maren', paidAt: money.startsWith('paid') ? new Date() : null,
  }).returning({ id: quotes.id });
  if (money === 'open' || money === 'paid') {
    await db.insert(payments).values({
      quoteId: q.id, studioId: w.owner.studioId, checkoutSessionId: `cs_test_${name.replace(/\W/g, '')}`, amountMinor: 240_000, currency: 'GBP',
      status: money === 'paid' ? 'paid' : 'open', paidAt: money === 'paid' ? new Date() : null,
    });
  }
  const [rev] = await db.insert(revisions).values({ layoutId: layout.id, seq: 1, letter: 'A', doc, layoutVersion: 1 }).returning({ id: revisions.id });
  await db.insert(revisionDecisions).values({ revisionId: rev.id, decision: 'approved', decidedByName: 'Priya Nair', decidedBy: w.client.id });
  return layout.id;
}

async function counts(layoutId: string) {
  const qs = await db.select({ id: quotes.id }).from(quotes).where(eq(quotes.layoutId, layoutId));
  const ps = qs.length ? await db.select({ id: payments.id }).from(payments).where(eq(payments.quoteId, qs[0].id)) : [];
  const rs = await db.select({ id: revisions.id }).from(revisions).where(eq(revisions.layoutId, layoutId));
  const ds = rs.length ? await db.select({ id: revisionDecisions.id }).from(revisionDecisions).where(eq(revisionDecisions.revisionId, rs[0].id)) : [];
  const ls = await db.select({ id: layouts.id }).from(layouts).where(eq(layouts.id, layoutId));
  return { layouts: ls.length, quotes: qs.length, payments: ps.length, revisions: rs.length, decisions: ds.length };
}

const names = (res: { body: { layouts: { id: string }[] } }) => res.body.layouts.map((l) => l.id);

describe('deleting a layout that holds money', () => {
  it.each([
    ['a paid deposit', 'paid'],
    ['a deposit checkout still open (pending)', 'open'],
    ['a quote marked paid', 'paid-quote-only'],
  ] as const)('refuses with 409 and a clear message when its quote has %s, and changes nothing', async (_what, money) => {
    const id = await layoutWithQuote(`Money ${money}`, money);
    const before = await counts(id);
    const res = await call(one.DELETE, { method: 'DELETE', params: { id }, as: w.designer });
    expect(res.status).toBe(409);
    expect(res.body.error).toMatch(/payment/i);
    expect(res.body.error).toMatch(/archive/i);
    expect(await counts(id)).toEqual(before);
  });

  it('still deletes a layout whose quote has no payment', async () => {
    const id = await layoutWithQuote('Unpaid quote', 'none');
    const res = await call(one.DELETE, { method: 'DELETE', params: { id }, as: w.owner });
    expect(res.status).toBe(204);
    expect((await counts(id)).layouts).toBe(0);
  });

  it('is refused by the database too: a payment row stops a direct delete of its quote', async () => {
    const id = await layoutWithQuote('Direct delete', 'paid');
    await expect(db.delete(layouts).where(eq(layouts.id, id))).rejects.toThrow();
    expect((await counts(id)).payments).toBe(1);
  });
});

describe('archiving', () => {
  let id: string;
  beforeAll(async () => {
    id = await layoutWithQuote('Archived with deposit', 'paid');
  });

  it('takes the layout out of the default list, into the archived list, and keeps every record', async () => {
    const before = await counts(id);
    const res = await call(archive.POST, { method: 'POST', params: { id }, as: w.designer });
    expect(res.status).toBe(200);
    expect(res.body.archivedAt).toEqual(expect.any(String));
    expect(names(await call(list.GET, { as: w.owner }))).not.toContain(id);
    expect(names(await call(list.GET, { as: w.owner, path: '/api/layouts?archived=1' }))).toContain(id);
    expect(await counts(id)).toEqual(before);
  });

  it('leaves the archived layout readable: document, quote and revisions, for staff and its client', async () => {
    for (const as of [w.owner, w.client] as SessionUser[]) {
      const got = await call(one.GET, { params: { id }, as });
      expect(got.status).toBe(200);
      expect(got.body.archivedAt).toEqual(expect.any(String));
      expect(got.body.doc.name).toBe('Archived with deposit');
      const q = await call(quote.GET, { params: { id }, as });
      expect(q.status).toBe(200);
      expect(q.body.quote.status).toBe('paid');
      const r = await call(revisionsRoute.GET, { params: { id }, as });
      expect(r.status).toBe(200);
      expect(JSON.stringify(r.body)).toContain('"A"');
    }
  });

  it('hides it from the client\'s own default list too', async () => {
    expect(names(await call(list.GET, { as: w.client }))).not.toContain(id);
    expect(names(await call(list.GET, { as: w.client, path: '/api/layouts?archived=1' }))).toContain(id);
  });

  it('restores it to the default list', async () => {
    const res = await call(archive.DELETE, { method: 'DELETE', params: { id }, as: w.owner });
    expect(res.status).toBe(200);
    expect(res.body.archivedAt).toBeNull();
    expect(names(await call(list.GET, { as: w.owner }))).toContain(id);
    expect(names(await call(list.GET, { as: w.owner, path: '/api/layouts?archived=1' }))).not.toContain(id);
  });

  it('is for the studio\'s staff: the client gets 403, another studio and anonymous learn nothing', async () => {
    expect((await call(archive.POST, { method: 'POST', params: { id }, as: w.client })).status).toBe(403);
    expect((await call(archive.POST, { method: 'POST', params: { id }, as: w.otherClient })).status).toBe(404);
    expect((await call(archive.POST, { method: 'POST', params: { id }, as: w.foreignOwner })).status).toBe(404);
    expect((await call(archive.POST, { method: 'POST', params: { id }, as: null })).status).toBe(401);
    expect((await call(archive.DELETE, { method: 'DELETE', params: { id: 'not-a-uuid' }, as: w.owner })).status).toBe(404);
    const [row] = await db.select({ archivedAt: layouts.archivedAt }).from(layouts).where(eq(layouts.id, id));
    expect(row.archivedAt).toBeNull();
  });

  it('refuses an unknown list filter with 400', async () => {
    const res = await call(list.GET, { as: w.owner, path: '/api/layouts?archived=yes' });
    expect(res.status).toBe(400);
  });
});
