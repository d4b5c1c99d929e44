// The studio price list route, as each role, and bad input → 4xx with nothing changed.
import { beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import * as prices from '@/app/api/studio/prices/route';
import { priceLists } from '@/db/schema';
import type { Db } from '@/db/client';
import { useFreshDb } from '../helpers/db';
import { call } from '../helpers/http';
import { buildWorld, type World } from '../helpers/world';
import { as, type Who } from '../sharing/helpers';
import { demoPriceList } from '../../scripts/lib/demo-prices';

let db: Db;
let w: World;

beforeAll(async () => {
  db = await useFreshDb();
  w = await buildWorld(db);
});

async function storedList(studioId: string) {
  const [row] = await db.select().from(priceLists).where(eq(priceLists.studioId, studioId));
  return row ?? null;
}

const small = { currency: 'EUR', labourRateMinor: 5500, vatPct: 19, items: { 'module:fridge': { unit: 'each', priceMinor: 61000, labourHours: 2 }, 'cable:6': { unit: 'm', priceMinor: 190 } } };

describe('GET /api/studio/prices', () => {
  it('refuses anonymous callers with 401', async () => {
    expect((await call(prices.GET, { as: null })).status).toBe(401);
  });

  it.each(['client', 'otherClient'] as Who[])('refuses a %s with 403 (prices are the workshop’s)', async (who) => {
    const res = await call(prices.GET, { as: as(w, who) });
    expect(res.status).toBe(403);
    expect(JSON.stringify(res.body)).not.toContain('priceMinor');
  });

  it.each(['owner', 'designer'] as Who[])('gives the %s the studio’s list', async (who) => {
    const res = await call(prices.GET, { as: as(w, who) });
    expect(res.status).toBe(200);
    expect(res.body.exists).toBe(true);
    expect(res.body.currency).toBe('GBP');
    expect(res.body.items['module:fridge'].priceMinor).toBe(demoPriceList().items['module:fridge'].priceMinor);
    expect(res.body).not.toHaveProperty('studioId');
  });

  it('gives another studio its own, empty list — never ours', async () => {
    const res = await call(prices.GET, { as: w.foreignOwner });
    expect(res.status).toBe(200);
    expect(res.body.exists).toBe(false);
    expect(res.body.items).toEqual({});
  });
});

describe('PUT /api/studio/prices', () => {
  it('lets the owner replace the whole list', async () => {
    const res = await call(prices.PUT, { method: 'PUT', as: w.owner, json: small });
    expect(res.status).toBe(200);
    expect(res.body.currency).toBe('EUR');
    expect(Object.keys(res.body.items).sort()).toEqual(['cable:6', 'module:fridge']);
    const row = await storedList(w.owner.studioId);
    expect(row?.vatPct).toBe(19);
    expect(row?.updatedBy).toBe(w.owner.id);
    // Put the demo list back for the other tests.
    expect((await call(prices.PUT, { method: 'PUT', as: w.owner, json: demoPriceList() })).status).toBe(200);
  });

  it.each([['anonymous', 401], ['client', 403], ['otherClient', 403], ['designer', 403]] as [Who, number][])('refuses the %s with %i and stores nothing', async (who, status) => {
    const before = await storedList(w.owner.studioId);
    const res = await call(prices.PUT, { method: 'PUT', as: as(w, who), json: small });
    expect(res.status).toBe(status);
    expect(await storedList(w.owner.studioId)).toEqual(before);
  });

  it('lets another studio’s owner change only their own list', async () => {
    const before = await storedList(w.owner.studioId);
    const res = await call(prices.PUT, { method: 'PUT', as: w.foreignOwner, json: small });
    expect(res.status).toBe(200);
    expect((await storedList(w.foreignOwner.studioId))?.currency).toBe('EUR');
    expect(await storedList(w.owner.studioId)).toEqual(before);
  });

  it.each([
    ['not JSON', { body: '{', headers: { 'content-type': 'application/json' } }, 400, /not valid JSON/],
    ['the wrong content type', { body: 'a=b', headers: { 'content-type': 'text/plain' } }, 415, /application\/json/],
    ['a lower-case currency', { json: { ...small, currency: 'eur' } }, 400, /not valid/],
    ['VAT above 100 %', { json: { ...small, vatPct: 120 } }, 400, /not valid/],
    ['a price in major units', { json: { ...small, items: { 'module:fridge': { unit: 'each', priceMinor: 610.5 } } } }, 400, /not valid/],
    ['a negative price', { json: { ...small, items: { 'module:fridge': { unit: 'each', priceMinor: -1 } } } }, 400, /not valid/],
    ['a key no parts list uses', { json: { ...small, items: { 'module:spaceship': { unit: 'each', priceMinor: 1 } } } }, 400, /not valid/],
    ['cable priced per piece', { json: { ...small, items: { 'cable:6': { unit: 'each', priceMinor: 100 } } } }, 400, /not valid/],
    ['an unknown field', { json: { ...small, discount: 10 } }, 400, /not valid/],
    ['a label with a control character', { json: { ...small, items: { 'module:fridge': { unit: 'each', priceMinor: 1, label: 'a\u0007b' } } } }, 400, /not valid/],
  ])('answers %s with a clear 4xx and changes nothing', async (_what, req, status, message) => {
    const before = await storedList(w.owner.studioId);
    const res = await call(prices.PUT, { method: 'PUT', as: w.owner, ...req });
    expect(res.status).toBe(status);
    expect(res.body.error).toMatch(message as RegExp);
    expect(await storedList(w.owner.studioId)).toEqual(before);
  });

  it('says which field is wrong', async () => {
    const res = await call(prices.PUT, { method: 'PUT', as: w.owner, json: { ...small, items: { 'cable:6': { unit: 'each', priceMinor: 100 } } } });
    expect(res.body.issues).toContainEqual(expect.objectContaining({ path: 'items.cable:6.unit', message: expect.stringMatching(/per m/) }));
  });

  it('refuses a state change from another site', async () => {
    const res = await call(prices.PUT, { method: 'PUT', as: w.owner, json: small, headers: { origin: 'https://evil.example' } });
    expect(res.status).toBe(403);
  });
});
