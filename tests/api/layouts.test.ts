// The layout routes, each as owner, designer, client, another studio's members and anonymous.
import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import * as list from '@/app/api/layouts/route';
import * as one from '@/app/api/layouts/[id]/route';
import { layouts, users } from '@/db/schema';
import { clearDocCache, getLayout, getLayoutJson } from '@/db/layouts';
import { loadActor } from '@/db/actor';
import { starterLayout } from '@/lib/layout/templates';
import type { Db } from '@/db/client';
import { useFreshDb } from '../helpers/db';
import { call } from '../helpers/http';
import { buildWorld, type World } from '../helpers/world';

let db: Db;
let w: World;

beforeAll(async () => {
  db = await useFreshDb();
  w = await buildWorld(db);
});

async function stored(id: string) {
  const [row] = await db.select().from(layouts).where(eq(layouts.id, id));
  return row;
}

describe('GET /api/layouts', () => {
  it('refuses anonymous callers with 401', async () => {
    const res = await call(list.GET, { as: null });
    expect(res.status).toBe(401);
    expect(res.body.error).toMatch(/sign in/i);
  });

  it.each(['owner', 'designer'] as const)('lists every layout of the studio for the %s', async (who) => {
    const res = await call(list.GET, { as: w[who] });
    expect(res.status).toBe(200);
    const names = res.body.layouts.map((l: { name: string }) => l.name);
    expect(names).toEqual(expect.arrayContaining(['Nair — L2H2 weekender', 'Adeyemi — L3H2 touring', 'Workshop stock — L4H3 empty bay']));
    expect(JSON.stringify(res.body)).not.toContain('Harbour secret plan');
  });

  it('lists only the layouts shared with a client', async () => {
    const res = await call(list.GET, { as: w.client });
    expect(res.status).toBe(200);
    expect(res.body.layouts.map((l: { id: string }) => l.id)).toEqual([w.clientLayoutId]);
  });

  it('shows another studio nothing of ours', async () => {
    const res = await call(list.GET, { as: w.foreignOwner });
    expect(res.body.layouts.map((l: { name: string }) => l.name)).toEqual(['Harbour secret plan']);
  });

  it('returns DTOs with the bay class, not raw rows', async () => {
    const res = await call(list.GET, { as: w.owner });
    const row = res.body.layouts.find((l: { name: string }) => l.name === 'Nair — L2H2 weekender');
    expect(row.sizeClass).toBe('L2H2');
    expect(row.client.name).toBe('Priya Nair');
    expect(row).not.toHaveProperty('studioId');
    expect(row).not.toHaveProperty('doc');
    expect(JSON.stringify(res.body)).not.toMatch(/password|\$2b\$/);
  });
});

describe('POST /api/layouts', () => {
  it('creates a layout from a bay template for a designer', async () => {
    const res = await call(list.POST, { method: 'POST', as: w.designer, json: { name: 'Test van', bayTemplateId: 'l3h3', clientId: w.client.id } });
    expect(res.status).toBe(201);
    expect(res.body.version).toBe(1);
    expect(res.body.doc.bay.height).toBe(2250); // the L3H3 template's bay height
    expect(res.body.client.id).toBe(w.client.id);
    const row = await stored(res.body.id);
    expect(row.studioId).toBe(w.designer.studioId);
  });

  it('creates from a starter layout and from a posted document', async () => {
    const fromStarter = await call(list.POST, { method: 'POST', as: w.owner, json: { name: 'Copy of lounge', starterId: 'starter-l-lounge' } });
    expect(fromStarter.status).toBe(201);
    expect(fromStarter.body.doc.modules.length).toBeGreaterThan(5);
    const fromDoc = await call(list.POST, { method: 'POST', as: w.owner, json: { name: 'Imported', doc: fromStarter.body.doc } });
    expect(fromDoc.status).toBe(201);
    expect(fromDoc.body.doc.name).toBe('Imported');
  });

  it('refuses a client with 403 and stores nothing', async () => {
    const before = (await db.select().from(layouts)).length;
    const res = await call(list.POST, { method: 'POST', as: w.client, json: { name: 'Mine', bayTemplateId: 'l2h2' } });
    expect(res.status).toBe(403);
    expect((await db.select().from(layouts)).length).toBe(before);
  });

  it.each([
    ['not JSON', { body: '{nope', headers: { 'content-type': 'application/json' } }, 400, /not valid JSON/],
    ['the wrong content type', { body: 'name=x', headers: { 'content-type': 'application/x-www-form-urlencoded' } }, 415, /application\/json/],
    ['no starting point', { json: { name: 'x' } }, 400, /not valid/],
    ['two starting points', { json: { name: 'x', bayTemplateId: 'l2h2', starterId: 'starter-l-lounge' } }, 400, /not valid/],
    ['an unknown field', { json: { name: 'x', bayTemplateId: 'l2h2', colour: 'red' } }, 400, /not valid/],
    ['an unknown template', { json: { name: 'x', bayTemplateId: 'l9h9' } }, 400, /not valid/],
    ['an invalid document', { json: { name: 'x', doc: { schemaVersion: 1, name: 'x', bay: { length: 'long' } } } }, 400, /not valid/],
    ['a client of another studio', { json: { name: 'x', bayTemplateId: 'l2h2', clientId: '00000000-0000-4000-8000-000000000000' } }, 400, /client/],
    ['a body over the size limit', { body: JSON.stringify({ name: 'x'.repeat(3 * 1024 * 1024) }), headers: { 'content-type': 'application/json' } }, 413, /larger/],
  ])('answers %s with a clear 4xx and changes nothing', async (_what, req, status, message) => {
    const before = (await db.select().from(layouts)).length;
    const res = await call(list.POST, { method: 'POST', as: w.designer, ...req });
    expect(res.status).toBe(status);
    expect(res.body.error).toMatch(message as RegExp);
    expect((await db.select().from(layouts)).length).toBe(before);
  });

  it('gives field paths for a bad document', async () => {
    const res = await call(list.POST, { method: 'POST', as: w.designer, json: { name: 'x', doc: { schemaVersion: 1, name: 'x', bay: { length: 3000.5, width: 1700, height: 1800 }, buildUp: {}, occupants: {}, modules: [] } } });
    expect(res.status).toBe(400);
    expect(res.body.issues).toContainEqual(expect.objectContaining({ path: 'doc.bay.length' }));
  });

  it('refuses a state change from another site (Origin check)', async () => {
    const res = await call(list.POST, { method: 'POST', as: w.designer, json: { name: 'x', bayTemplateId: 'l2h2' }, headers: { origin: 'https://evil.example' } });
    expect(res.status).toBe(403);
  });
});

describe('GET /api/layouts/:id', () => {
  it('gives the owner, the designer and the layout’s client the document', async () => {
    for (const who of [w.owner, w.designer, w.client]) {
      const res = await call(one.GET, { as: who, params: { id: w.clientLayoutId } });
      expect(res.status).toBe(200);
      expect(res.body.doc.schemaVersion).toBe(4);
      expect(res.headers.get('etag')).toBe(`"${res.body.version}"`);
    }
  });

  it('tells the client it may not edit', async () => {
    const res = await call(one.GET, { as: w.client, params: { id: w.clientLayoutId } });
    expect(res.body.canEdit).toBe(false);
  });

  it('answers 404 to another client, another studio, and nonsense ids', async () => {
    expect((await call(one.GET, { as: w.otherClient, params: { id: w.clientLayoutId } })).status).toBe(404);
    expect((await call(one.GET, { as: w.foreignOwner, params: { id: w.clientLayoutId } })).status).toBe(404);
    expect((await call(one.GET, { as: w.owner, params: { id: w.foreignLayoutId } })).status).toBe(404);
    expect((await call(one.GET, { as: w.owner, params: { id: 'not-a-uuid' } })).status).toBe(404);
    expect((await call(one.GET, { as: null, params: { id: w.clientLayoutId } })).status).toBe(401);
  });
});

describe('GET /api/layouts/:id with If-None-Match (revalidating the saved version)', () => {
  const get = (who: World['owner'] | null, tag?: string, id = w.clientLayoutId) =>
    call(one.GET, { as: who, params: { id }, headers: tag === undefined ? {} : { 'if-none-match': tag } });

  it('answers 200 with the version as a strong ETag, and tells browsers to revalidate', async () => {
    const res = await get(w.owner);
    expect(res.status).toBe(200);
    expect(res.headers.get('etag')).toBe(`"${res.body.version}"`);
    expect(res.headers.get('cache-control')).toBe('private, no-cache');
  });

  it('answers 304 with no body when the tag names the current version, for everyone who may read', async () => {
    const { version } = (await get(w.owner)).body;
    for (const who of [w.owner, w.designer, w.client]) {
      const res = await get(who, `"${version}"`);
      expect(res.status).toBe(304);
      expect(res.body).toBeNull();
      expect(res.headers.get('etag')).toBe(`"${version}"`);
    }
    // A list of tags, a weak tag and the wildcard match too (RFC 9110 §13.1.2, weak comparison).
    expect((await get(w.owner, `"1", "${version}"`)).status).toBe(304);
    expect((await get(w.owner, `W/"${version}"`)).status).toBe(304);
    expect((await get(w.owner, '*')).status).toBe(304);
  });

  it('answers 200 with the new copy when the tag is stale (after a save)', async () => {
    const before = (await get(w.owner)).body;
    const doc = { ...before.doc, occupants: { ...before.doc.occupants, standingHeight: before.doc.occupants.standingHeight + 1 } };
    expect((await call(one.PUT, { method: 'PUT', as: w.designer, params: { id: w.clientLayoutId }, headers: { 'if-match': `"${before.version}"` }, json: { doc } })).status).toBe(200);
    const res = await get(w.owner, `"${before.version}"`);
    expect(res.status).toBe(200);
    // One save later: version + 1, and the height saved (worked by hand: before + 1 mm).
    expect(res.body.version).toBe(before.version + 1);
    expect(res.body.doc.occupants.standingHeight).toBe(before.doc.occupants.standingHeight + 1);
    expect(res.headers.get('etag')).toBe(`"${before.version + 1}"`);
    expect((await get(w.owner, 'garbage')).status).toBe(200);
  });

  it('checks the session and the rights before a 304: strangers get 401 and 404 whatever tag they send', async () => {
    const { version } = (await get(w.owner)).body;
    const tag = `"${version}"`;
    expect((await get(null, tag)).status).toBe(401);
    expect((await get(w.otherClient, tag)).status).toBe(404);
    expect((await get(w.foreignOwner, tag)).status).toBe(404);
    expect((await get(w.foreignOwner, '*')).status).toBe(404);
    expect((await get(w.owner, '*', 'not-a-uuid')).status).toBe(404);
    expect((await get(w.owner, '*', w.foreignLayoutId)).status).toBe(404);
  });
});

describe('GET /api/layouts/:id from the document cache', () => {
  it('answers the same DTO as the data layer, read cold and read again', async () => {
    clearDocCache();
    for (const who of [w.owner, w.client]) {
      const actor = (await loadActor(who.id, who.studioId, 0))!;
      const expected = JSON.parse(JSON.stringify(await getLayout(actor, w.clientLayoutId)));
      const cold = await call(one.GET, { as: who, params: { id: w.clientLayoutId } });
      const warm = await call(one.GET, { as: who, params: { id: w.clientLayoutId } });
      expect(cold.body).toEqual(expected);
      expect(warm.body).toEqual(expected);
      expect(warm.headers.get('content-type')).toMatch(/^application\/json/);
    }
  });

  it('writes the very characters JSON.stringify writes for the DTO, cold and from the cache', async () => {
    clearDocCache();
    for (const who of [w.owner, w.client]) {
      const actor = (await loadActor(who.id, who.studioId, 0))!;
      const expected = JSON.stringify(await getLayout(actor, w.clientLayoutId));
      for (const round of ['cold', 'cached']) {
        const answer = await getLayoutJson(actor, w.clientLayoutId);
        expect(answer.json, round).toBe(expected);
      }
    }
  });

  it('shows a save at once, and names that change without a save', async () => {
    const before = (await call(one.GET, { as: w.owner, params: { id: w.clientLayoutId } })).body;
    const doc = { ...before.doc, occupants: { ...before.doc.occupants, standingHeight: before.doc.occupants.standingHeight + 3 } };
    const saved = await call(one.PUT, { method: 'PUT', as: w.designer, params: { id: w.clientLayoutId }, headers: { 'if-match': `"${before.version}"` }, json: { doc } });
    expect(saved.status).toBe(200);
    const after = (await call(one.GET, { as: w.owner, params: { id: w.clientLayoutId } })).body;
    expect(after.version).toBe(before.version + 1);
    expect(after.doc.occupants.standingHeight).toBe(before.doc.occupants.standingHeight + 3);

    // The client's name is not part of the cached document: a rename shows on the next read.
    await db.update(users).set({ name: 'Priya N. Renamed' }).where(eq(users.id, w.client.id));
    const renamed = (await call(one.GET, { as: w.owner, params: { id: w.clientLayoutId } })).body;
    expect(renamed.client.name).toBe('Priya N. Renamed');
    await db.update(users).set({ name: before.client.name }).where(eq(users.id, w.client.id));
  });

  it('still asks who may read on every request: a cached layout is 404 to strangers', async () => {
    await call(one.GET, { as: w.owner, params: { id: w.clientLayoutId } }); // now cached
    expect((await call(one.GET, { as: w.otherClient, params: { id: w.clientLayoutId } })).status).toBe(404);
    expect((await call(one.GET, { as: w.foreignOwner, params: { id: w.clientLayoutId } })).status).toBe(404);
    expect((await call(one.GET, { as: null, params: { id: w.clientLayoutId } })).status).toBe(401);
  });
});

describe('PUT /api/layouts/:id', () => {
  async function current(id: string) {
    return (await call(one.GET, { as: w.owner, params: { id } })).body;
  }

  it('saves with the right version and bumps it', async () => {
    const layout = await current(w.otherLayoutId);
    const doc = { ...layout.doc, occupants: { ...layout.doc.occupants, standingHeight: 1777 } };
    const res = await call(one.PUT, { method: 'PUT', as: w.designer, params: { id: w.otherLayoutId }, headers: { 'if-match': `"${layout.version}"` }, json: { doc } });
    expect(res.status).toBe(200);
    expect(res.body.version).toBe(layout.version + 1);
    expect((await stored(w.otherLayoutId)).doc.occupants.standingHeight).toBe(1777);
  });

  it('answers 412 to a stale version with the current copy, and changes nothing', async () => {
    const layout = await current(w.otherLayoutId);
    const doc = { ...layout.doc, name: 'Stale edit' };
    const res = await call(one.PUT, { method: 'PUT', as: w.designer, params: { id: w.otherLayoutId }, headers: { 'if-match': String(layout.version - 1) }, json: { doc } });
    expect(res.status).toBe(412);
    expect(res.body.current.version).toBe(layout.version);
    expect((await stored(w.otherLayoutId)).name).toBe(layout.name);
  });

  it('answers 428 when If-Match is missing', async () => {
    const layout = await current(w.otherLayoutId);
    const res = await call(one.PUT, { method: 'PUT', as: w.designer, params: { id: w.otherLayoutId }, json: { doc: layout.doc } });
    expect(res.status).toBe(428);
    expect(res.body.error).toMatch(/If-Match/);
  });

  it('of two saves based on one version, exactly one wins', async () => {
    const layout = await current(w.otherLayoutId);
    const save = (h: number) => call(one.PUT, { method: 'PUT', as: w.designer, params: { id: w.otherLayoutId }, headers: { 'if-match': String(layout.version) }, json: { doc: { ...layout.doc, occupants: { ...layout.doc.occupants, standingHeight: h } } } });
    const results = await Promise.all([save(1701), save(1702)]);
    expect(results.map((r) => r.status).sort()).toEqual([200, 412]);
    const winner = results.find((r) => r.status === 200)!;
    expect((await stored(w.otherLayoutId)).version).toBe(winner.body.version);
  });

  it('refuses a client (403) and another studio (404), changing nothing', async () => {
    const layout = await current(w.clientLayoutId);
    const put = (as: typeof w.client) => call(one.PUT, { method: 'PUT', as, params: { id: w.clientLayoutId }, headers: { 'if-match': String(layout.version) }, json: { doc: { ...layout.doc, name: 'Hijacked' } } });
    expect((await put(w.client)).status).toBe(403);
    expect((await put(w.foreignOwner)).status).toBe(404);
    expect((await stored(w.clientLayoutId)).version).toBe(layout.version);
  });

  it('rejects an invalid document with field paths and keeps the stored one', async () => {
    const layout = await current(w.clientLayoutId);
    const doc = { ...layout.doc, modules: [{ ...layout.doc.modules[0], width: -5 }] };
    const res = await call(one.PUT, { method: 'PUT', as: w.designer, params: { id: w.clientLayoutId }, headers: { 'if-match': String(layout.version) }, json: { doc } });
    expect(res.status).toBe(400);
    expect(res.body.issues[0].path).toBe('doc.modules.0.width');
    expect((await stored(w.clientLayoutId)).version).toBe(layout.version);
  });
});

describe('DELETE /api/layouts/:id', () => {
  let id: string;
  beforeEach(async () => {
    id = (await call(list.POST, { method: 'POST', as: w.designer, json: { name: 'To delete', bayTemplateId: 'l1h1', clientId: w.client.id } })).body.id;
  });

  it('refuses the client and another studio, then lets the designer delete', async () => {
    expect((await call(one.DELETE, { method: 'DELETE', as: w.client, params: { id } })).status).toBe(403);
    expect((await call(one.DELETE, { method: 'DELETE', as: w.foreignOwner, params: { id } })).status).toBe(404);
    expect((await call(one.DELETE, { method: 'DELETE', as: null, params: { id } })).status).toBe(401);
    expect(await stored(id)).toBeDefined();
    expect((await call(one.DELETE, { method: 'DELETE', as: w.designer, params: { id } })).status).toBe(204);
    expect(await stored(id)).toBeUndefined();
  });
});

describe('text the database cannot hold', () => {
  it('refuses NUL and control characters in names with 400, storing nothing', async () => {
    const before = (await db.select().from(layouts)).length;
    for (const name of ['\u0000', 'bay\u0000', 'bell\u0007']) {
      const res = await call(list.POST, { method: 'POST', as: w.designer, json: { name, bayTemplateId: 'l2h2' } });
      expect(res.status).toBe(400);
    }
    const nested = await call(list.POST, { method: 'POST', as: w.designer, json: { name: 'ok', doc: { ...starterLayoutDoc(), modules: [{ ...starterLayoutDoc().modules[0], label: 'a\u0000b' }] } } });
    expect(nested.status).toBe(400);
    expect((await db.select().from(layouts)).length).toBe(before);
  });
});

describe('text that is not text: a lone UTF-16 surrogate', () => {
  it.each([
    ['a layout name', { name: 'Van \ud800', bayTemplateId: 'l2h2' }, 'name'],
    ['a low surrogate alone', { name: '\udc00 van', bayTemplateId: 'l2h2' }, 'name'],
    ['a module label deep in the document', { name: 'ok', doc: { ...starterLayoutDoc(), modules: [{ ...starterLayoutDoc().modules[0], label: 'bed \ud83d' }] } }, 'doc.modules.0.label'],
    ['a key of an object', { name: 'ok', doc: { ...starterLayoutDoc(), ['\ud800']: 1 } }, 'doc.\ud800'],
  ])('in %s answers 400 naming the field, never 500, and stores nothing', async (_what, body, path) => {
    const before = (await db.select().from(layouts)).length;
    // JSON.stringify writes a lone surrogate as a \u escape, which is how a client would send it.
    const res = await call(list.POST, { method: 'POST', as: w.designer, body: JSON.stringify(body), headers: { 'content-type': 'application/json' } });
    expect(res.status).toBe(400);
    expect(res.body.issues).toEqual([{ path, message: expect.stringMatching(/broken character/) }]);
    expect((await db.select().from(layouts)).length).toBe(before);
  });

  it('accepts a whole character sent as an escaped surrogate pair', async () => {
    const body = JSON.stringify({ name: 'Van X', bayTemplateId: 'l2h2' }).replace('X', '\\ud83d\\ude90');
    const res = await call(list.POST, { method: 'POST', as: w.designer, body, headers: { 'content-type': 'application/json' } });
    expect(res.status).toBe(201);
    expect(res.body.name).toBe('Van \u{1F690}');
  });

  it('is refused on a save too, and the stored layout keeps its name', async () => {
    const id = w.clientLayoutId;
    const before = await stored(id);
    const res = await call(one.PUT, {
      method: 'PUT', as: w.designer, params: { id }, headers: { 'if-match': String(before.version), 'content-type': 'application/json' },
      body: JSON.stringify({ name: 'Renamed \udfff', doc: starterLayoutDoc() }),
    });
    expect(res.status).toBe(400);
    expect(res.body.issues[0].path).toBe('name');
    expect((await stored(id)).name).toBe(before.name);
  });
});

function starterLayoutDoc() {
  return structuredClone(starterLayout('starter-l-lounge')!);
}
