// Quote and parts-list routes, as each role, and bad input → 4xx with nothing changed.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { and, eq, isNull } from 'drizzle-orm';
import * as quoteRoute from '@/app/api/layouts/[id]/quote/route';
import * as partsRoute from '@/app/api/layouts/[id]/quote/parts/route';
import * as prices from '@/app/api/studio/prices/route';
import { layouts, quotes } from '@/db/schema';
import type { Db } from '@/db/client';
import type { FakeSmtp } from '@/dev/fakes/smtp/server';
import { useFreshDb } from '../helpers/db';
import { call } from '../helpers/http';
import { buildWorld, type World } from '../helpers/world';
import { as, mailFor, startMailSink, STRANGERS, type Who } from '../sharing/helpers';
import { demoPriceList } from '../../scripts/lib/demo-prices';

let db: Db;
let w: World;
let mail: FakeSmtp;
let stockLayoutId: string;

beforeAll(async () => {
  db = await useFreshDb();
  w = await buildWorld(db);
  mail = await startMailSink();
  const [stock] = await db.select({ id: layouts.id }).from(layouts).where(and(eq(layouts.studioId, w.owner.studioId), isNull(layouts.clientId)));
  stockLayoutId = stock.id;
});

afterAll(async () => {
  await mail?.close();
});

async function versionOf(id: string): Promise<number> {
  const [row] = await db.select({ version: layouts.version }).from(layouts).where(eq(layouts.id, id));
  return row.version;
}

async function quoteRows(layoutId: string) {
  return db.select().from(quotes).where(eq(quotes.layoutId, layoutId));
}

const send = async (who: Who, layoutId: string, body: Record<string, unknown> = {}) =>
  call(quoteRoute.POST, { method: 'POST', as: as(w, who), params: { id: layoutId }, json: { layoutVersion: await versionOf(layoutId), depositPct: 25, confirmUnapproved: true, ...body } });

describe('GET /api/layouts/:id/quote before any quote', () => {
  it('refuses anonymous callers with 401', async () => {
    expect((await call(quoteRoute.GET, { as: null, params: { id: w.clientLayoutId } })).status).toBe(401);
  });

  it.each(['client', 'designer', 'owner'] as Who[])('answers the %s with no quote yet', async (who) => {
    const res = await call(quoteRoute.GET, { as: as(w, who), params: { id: w.clientLayoutId } });
    expect(res.status).toBe(200);
    expect(res.body.quote).toBeNull();
  });

  it.each(STRANGERS)('hides the layout from the %s (404)', async (who) => {
    const res = await call(quoteRoute.GET, { as: as(w, who), params: { id: w.clientLayoutId } });
    expect(res.status).toBe(404);
  });

  it('answers 404 for an id that is not a layout id', async () => {
    expect((await call(quoteRoute.GET, { as: w.owner, params: { id: 'nope' } })).status).toBe(404);
  });
});

describe('POST /api/layouts/:id/quote', () => {
  it.each([['anonymous', 401], ['client', 403], ['otherClient', 404], ['foreignOwner', 404], ['foreignClient', 404]] as [Who, number][])(
    'refuses the %s with %i and stores nothing', async (who, status) => {
      const res = await send(who, w.clientLayoutId);
      expect(res.status).toBe(status);
      expect(await quoteRows(w.clientLayoutId)).toHaveLength(0);
    },
  );

  it.each([
    ['not JSON', { body: '{', headers: { 'content-type': 'application/json' } }, 400, /not valid JSON/],
    ['a deposit of 0 %', { json: { depositPct: 0 } }, 400, /not valid/],
    ['a deposit above 100 %', { json: { depositPct: 150 } }, 400, /not valid/],
    ['a deposit with three decimals', { json: { depositPct: 12.345 } }, 400, /not valid/],
    ['no layout version', { json: { depositPct: 25, layoutVersion: undefined } }, 400, /not valid/],
    ['an unknown field', { json: { depositPct: 25, discountPct: 5 } }, 400, /not valid/],
    ['a kerf of 50 mm', { json: { depositPct: 25, cut: { kerfMm: 50 } } }, 400, /not valid/],
  ] as [string, { json?: Record<string, unknown>; body?: string; headers?: Record<string, string> }, number, RegExp][])(
    'answers %s with a clear 4xx and stores nothing', async (_what, req, status, message) => {
      const json = req.json ? { layoutVersion: await versionOf(w.clientLayoutId), ...req.json } : undefined;
      const res = await call(quoteRoute.POST, { method: 'POST', as: w.designer, params: { id: w.clientLayoutId }, ...req, json });
      expect(res.status).toBe(status);
      expect(res.body.error).toMatch(message);
      expect(await quoteRows(w.clientLayoutId)).toHaveLength(0);
    },
  );

  it('refuses a quote priced from an older layout version with 412', async () => {
    const res = await send('designer', w.clientLayoutId, { layoutVersion: (await versionOf(w.clientLayoutId)) + 5 });
    expect(res.status).toBe(412);
    expect(res.body.current.version).toBe(await versionOf(w.clientLayoutId));
    expect(await quoteRows(w.clientLayoutId)).toHaveLength(0);
  });

  it('refuses a layout that is not shared with a client', async () => {
    const res = await send('designer', stockLayoutId);
    expect(res.status).toBe(400);
    expect(res.body.error).toMatch(/client/);
    expect(await quoteRows(stockLayoutId)).toHaveLength(0);
  });

  it('refuses to quote while an item is unpriced, naming it', async () => {
    const list = demoPriceList();
    delete list.items['module:fridge'];
    expect((await call(prices.PUT, { method: 'PUT', as: w.owner, json: list })).status).toBe(200);
    const res = await send('designer', w.clientLayoutId);
    expect(res.status).toBe(400);
    expect(res.body.error).toMatch(/12 V fridge/);
    expect(res.body.error).not.toMatch(/module:/);
    expect(await quoteRows(w.clientLayoutId)).toHaveLength(0);
    expect((await call(prices.PUT, { method: 'PUT', as: w.owner, json: demoPriceList() })).status).toBe(200);
  });

  it('refuses another studio’s owner on their own layout while they have no price list', async () => {
    const res = await send('foreignOwner', w.foreignLayoutId);
    expect(res.status).toBe(400);
    expect(res.body.error).toMatch(/price list/i);
  });

  it('lets the designer send a quote: totals from the parts list, the deposit, and a mail to the client', async () => {
    const res = await send('designer', w.clientLayoutId, { depositPct: 25, note: 'Fitting from March.' });
    expect(res.status).toBe(201);
    const q = res.body.quote;
    expect(q.status).toBe('sent');
    expect(q.grossMinor).toBe(q.parts.grossMinor);
    expect(q.parts.unpriced).toEqual([]);
    expect(q.grossMinor).toBe(q.parts.netMinor + q.parts.vatMinor);
    expect(q.depositMinor).toBe(Math.round(q.grossMinor * 0.25));
    expect(q.balanceMinor).toBe(q.grossMinor - q.depositMinor);
    expect(q.sentByName).toBe('Ivo Brandt');
    expect(q.note).toBe('Fitting from March.');
    expect(q.canPay).toBe(false);
    // People name a quote by the studio's running number, never by its id: the studio's first quote.
    expect(q.reference).toBe('Q-0001');
    expect(res.body.mail).toBe('sent');
    const mails = await mailFor(db, 'priya@client.test');
    expect(mails.some((m) => (m.parsed.text ?? '').includes('quote Q-0001 for'))).toBe(true);
    expect(mails.some((m) => (m.parsed.text ?? '').includes(q.id.slice(0, 8).toUpperCase()))).toBe(false);
    expect(mails.some((m) => /Your quote for .* is ready/.test(m.parsed.subject ?? '') && (m.parsed.text ?? '').includes('Fitting from March.'))).toBe(true);
    // …and the caution that licensed fitters certify the gas, 230 V, heater and belt work.
    expect(mails.some((m) => /Your quote for .* is ready/.test(m.parsed.subject ?? '') && /qualified, licensed fitters to local codes/.test(m.parsed.text ?? ''))).toBe(true);
    expect(await quoteRows(w.clientLayoutId)).toHaveLength(1);
  });

  it('shows the client the quote they may pay, and the workshop the same quote', async () => {
    const client = await call(quoteRoute.GET, { as: w.client, params: { id: w.clientLayoutId } });
    expect(client.status).toBe(200);
    expect(client.body.quote.canPay).toBe(true);
    expect(client.body.quote.clientName).toBe('Priya Nair');
    const owner = await call(quoteRoute.GET, { as: w.owner, params: { id: w.clientLayoutId } });
    expect(owner.body.quote.id).toBe(client.body.quote.id);
    expect(owner.body.quote.canPay).toBe(false);
  });

  it('supersedes an unpaid quote when a new one is sent', async () => {
    const first = (await quoteRows(w.clientLayoutId))[0];
    const res = await send('owner', w.clientLayoutId, { depositPct: 40 });
    expect(res.status).toBe(201);
    const rows = await quoteRows(w.clientLayoutId);
    expect(rows).toHaveLength(2);
    expect(rows.find((r) => r.id === first.id)?.status).toBe('superseded');
    expect(rows.filter((r) => r.status === 'sent')).toHaveLength(1);
    const current = await call(quoteRoute.GET, { as: w.client, params: { id: w.clientLayoutId } });
    expect(current.body.quote.depositPct).toBe(40);
    expect(current.body.quote.reference).toBe('Q-0002');
  });

  it('lets only one of two simultaneous quotes for a layout be open', async () => {
    const [a, b] = await Promise.all([send('designer', w.clientLayoutId), send('owner', w.clientLayoutId)]);
    expect([a.status, b.status]).toContain(201);
    for (const r of [a, b]) expect([201, 409]).toContain(r.status);
    expect((await quoteRows(w.clientLayoutId)).filter((r) => r.status === 'sent')).toHaveLength(1);
    // Q-0001 and Q-0002 came before; the two sends here are numbered one after the other (or, when one is
    // refused, it takes no number): no number is skipped or repeated.
    const stored = (await quoteRows(w.clientLayoutId)).map((r) => r.number).sort((x, y) => x - y);
    const sent = [a, b].filter((r) => r.status === 201).length;
    expect(stored).toEqual(sent === 2 ? [1, 2, 3, 4] : [1, 2, 3]);
  });
});

describe('GET /api/layouts/:id/quote/parts', () => {
  it.each([['anonymous', 401], ['client', 403], ['otherClient', 404], ['foreignOwner', 404], ['foreignClient', 404]] as [Who, number][])(
    'refuses the %s with %i', async (who, status) => {
      const res = await call(partsRoute.GET, { as: as(w, who), params: { id: w.clientLayoutId } });
      expect(res.status).toBe(status);
      expect(JSON.stringify(res.body)).not.toContain('priceMinor');
    },
  );

  it.each(['designer', 'owner'] as Who[])('gives the %s the priced parts list of the saved version', async (who) => {
    const res = await call(partsRoute.GET, { as: as(w, who), params: { id: w.clientLayoutId } });
    expect(res.status).toBe(200);
    expect(res.body.version).toBe(await versionOf(w.clientLayoutId));
    expect(res.body.parts.lines.map((l: { key: string }) => l.key)).toEqual(expect.arrayContaining(['module:fridge', 'sheet:ply-15', 'battery:agm', 'alarm:co']));
    expect(res.body.parts.grossMinor).toBe(res.body.parts.netMinor + res.body.parts.vatMinor);
  });

  it('exports CSV as a download, with the totals', async () => {
    const res = await call(partsRoute.GET, { as: w.designer, params: { id: w.clientLayoutId }, path: '/?format=csv' });
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toMatch(/^text\/csv/);
    expect(res.headers.get('content-disposition')).toMatch(/^attachment; filename="nair-l2h2-weekender-preliminary-v\d+-parts\.csv"$/);
    const text = res.body as string;
    expect(text.split('\r\n')[0]).toBe('Item,Category,Quantity,Unit,"Unit price (GBP, net)",Net (GBP),Labour hours');
    expect(text).toMatch(/\r\nTotal,,,,,\d+\.\d\d,\r\n$/);
  });

  it('uses the cut options: no kerf and turned grain never need more sheets', async () => {
    const tight = await call(partsRoute.GET, { as: w.designer, params: { id: w.otherLayoutId }, path: '/?kerf=0&grain=0' });
    const loose = await call(partsRoute.GET, { as: w.designer, params: { id: w.otherLayoutId }, path: '/?kerf=8&grain=1' });
    const sheets = (r: typeof tight) => r.body.parts.lines.filter((l: { category: string }) => l.category === 'sheet').reduce((a: number, l: { qty: number }) => a + l.qty, 0);
    expect(sheets(tight)).toBeLessThanOrEqual(sheets(loose));
  });

  it.each([['?kerf=abc'], ['?grain=yes'], ['?format=pdf'], ['?colour=red'], ['?kerf=20']])('answers the bad query %s with 400', async (q) => {
    const res = await call(partsRoute.GET, { as: w.designer, params: { id: w.clientLayoutId }, path: `/${q}` });
    expect(res.status).toBe(400);
    expect(res.body.error).toMatch(/not valid/);
  });

  it('tells a studio without a price list to set one up', async () => {
    const json = await call(partsRoute.GET, { as: w.foreignOwner, params: { id: w.foreignLayoutId } });
    expect(json.status).toBe(200);
    expect(json.body.priceListExists).toBe(false);
    expect(json.body.parts).toBeNull();
    const csv = await call(partsRoute.GET, { as: w.foreignOwner, params: { id: w.foreignLayoutId }, path: '/?format=csv' });
    expect(csv.status).toBe(409);
    expect(csv.body.error).toMatch(/price list/i);
  });
});
