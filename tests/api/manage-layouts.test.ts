// Managing layouts: rename, duplicate as a variant, archive and restore, saved versions with
// restore as the newest save, and two variants compared — each as the workshop does it, as the
// client (who may only look) and as a stranger, with bad input refused and nothing changed.
import { beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import * as list from '@/app/api/layouts/route';
import * as one from '@/app/api/layouts/[id]/route';
import * as archive from '@/app/api/layouts/[id]/archive/route';
import * as variants from '@/app/api/layouts/[id]/variants/route';
import * as versions from '@/app/api/layouts/[id]/versions/route';
import * as restore from '@/app/api/layouts/[id]/versions/[version]/restore/route';
import * as compare from '@/app/api/layouts/[id]/compare/route';
import { layouts, revisions, savedVersions } from '@/db/schema';
import { starterLayout } from '@/lib/layout/templates';
import { briefFromLayout, generateProposals } from '@/lib/proposals';
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

async function newLayout(name: string): Promise<{ id: string; version: number }> {
  const res = await call(list.POST, { method: 'POST', as: w.designer, json: { name, starterId: 'starter-l-lounge', clientId: w.client.id } });
  expect(res.status).toBe(201);
  return { id: res.body.id, version: res.body.version };
}

async function read(id: string) {
  const res = await call(one.GET, { params: { id }, as: w.designer });
  expect(res.status).toBe(200);
  return res.body;
}

async function save(id: string, version: number, doc: unknown) {
  const res = await call(one.PUT, { method: 'PUT', params: { id }, as: w.designer, headers: { 'if-match': String(version) }, json: { doc } });
  expect(res.status).toBe(200);
  return res.body.version as number;
}

describe('renaming a layout', () => {
  it('renames it as a new save: the table, the document and the saved versions carry the name', async () => {
    const { id, version } = await newLayout('Okafor — L2H2 first sketch');
    const res = await call(one.PATCH, { method: 'PATCH', params: { id }, as: w.designer, json: { name: '  Okafor — L2H2 weekender  ' } });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ id, name: 'Okafor — L2H2 weekender', version: version + 1 });
    const after = await read(id);
    expect(after.name).toBe('Okafor — L2H2 weekender');
    expect(after.doc.name).toBe('Okafor — L2H2 weekender');
    const history = await call(versions.GET, { params: { id }, as: w.designer });
    expect(history.body.versions.map((v: { name: string }) => v.name)).toEqual(['Okafor — L2H2 weekender', 'Okafor — L2H2 first sketch']);
  });

  it.each([
    ['an empty name', { name: '   ' }, /name/],
    ['a name over 120 characters', { name: 'x'.repeat(121) }, /120|long/],
    ['another field', { name: 'Fine', clientId: null }, /./],
    ['no name', {}, /./],
  ])('refuses %s with 400 and changes nothing', async (_what, body, message) => {
    const { id, version } = await newLayout('Rename refusals');
    const res = await call(one.PATCH, { method: 'PATCH', params: { id }, as: w.designer, json: body });
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body)).toMatch(message);
    const after = await read(id);
    expect(after).toMatchObject({ name: 'Rename refusals', version });
  });

  it('refuses a stale If-Match with 412, the client with 403 and a stranger with 404', async () => {
    const { id, version } = await newLayout('Rename rights');
    await save(id, version, { ...starterLayout('starter-l-lounge'), name: 'Rename rights' });
    expect((await call(one.PATCH, { method: 'PATCH', params: { id }, as: w.designer, headers: { 'if-match': String(version) }, json: { name: 'Late' } })).status).toBe(412);
    expect((await call(one.PATCH, { method: 'PATCH', params: { id }, as: w.client, json: { name: 'Mine now' } })).status).toBe(403);
    expect((await call(one.PATCH, { method: 'PATCH', params: { id }, as: w.foreignOwner, json: { name: 'Ours now' } })).status).toBe(404);
    expect((await read(id)).name).toBe('Rename rights');
  });
});

describe('duplicating a layout as a variant', () => {
  it('names it "… variant 2", then 3, keeps the client, links it to its original and shows both in the table', async () => {
    const { id } = await newLayout('Hale — L3H2 touring');
    const first = await call(variants.POST, { method: 'POST', params: { id }, as: w.designer, json: {} });
    expect(first.status).toBe(201);
    expect(first.body).toMatchObject({ name: 'Hale — L3H2 touring variant 2', client: { id: w.client.id }, variantOf: { id, name: 'Hale — L3H2 touring' }, version: 1 });
    const original = await read(id);
    expect(first.body.doc.modules).toEqual(original.doc.modules);
    const second = await call(variants.POST, { method: 'POST', params: { id }, as: w.owner, json: {} });
    expect(second.body.name).toBe('Hale — L3H2 touring variant 3');
    // A variant of a variant takes the next number and links to the same original.
    const third = await call(variants.POST, { method: 'POST', params: { id: first.body.id }, as: w.designer, json: {} });
    expect(third.body).toMatchObject({ name: 'Hale — L3H2 touring variant 4', variantOf: { id } });

    const table = await call(list.GET, { as: w.designer });
    const rows = table.body.layouts.filter((l: { name: string }) => l.name.startsWith('Hale — L3H2 touring'));
    expect(rows).toHaveLength(4);
    expect(rows.filter((l: { variantOf: unknown }) => l.variantOf).map((l: { variantOf: { id: string } }) => l.variantOf.id)).toEqual([id, id, id]);
    // The client sees the variants of their own layout, with the link.
    const theirs = await call(list.GET, { as: w.client });
    expect(theirs.body.layouts.find((l: { id: string }) => l.id === first.body.id)?.variantOf).toEqual({ id, name: 'Hale — L3H2 touring' });

    const family = await call(variants.GET, { params: { id: third.body.id }, as: w.client });
    expect(family.status).toBe(200);
    expect(family.body.layouts.map((l: { name: string }) => l.name)).toEqual([
      'Hale — L3H2 touring', 'Hale — L3H2 touring variant 2', 'Hale — L3H2 touring variant 3', 'Hale — L3H2 touring variant 4',
    ]);
  });

  it('takes a name of its own, and refuses anything but an optional name (400)', async () => {
    const { id } = await newLayout('Named variant source');
    const named = await call(variants.POST, { method: 'POST', params: { id }, as: w.designer, json: { name: 'Rear-kitchen option' } });
    expect(named.status).toBe(201);
    expect(named.body).toMatchObject({ name: 'Rear-kitchen option', variantOf: { id } });
    const before = (await db.select({ id: layouts.id }).from(layouts)).length;
    for (const bad of [{ json: { name: '' } }, { json: { clientId: null } }, { json: [] }, { body: 'plain', headers: { 'content-type': 'text/plain' } }]) {
      const res = await call(variants.POST, { method: 'POST', params: { id }, as: w.designer, ...bad });
      expect(res.status, JSON.stringify(bad)).toBeGreaterThanOrEqual(400);
      expect(res.status).toBeLessThan(500);
      expect(res.body.error).toMatch(/^[A-Z][^\n]{9,}$/); // a sentence a person can act on, not a code
    }
    expect((await db.select({ id: layouts.id }).from(layouts)).length).toBe(before);
  });

  it('takes a document of its own (a proposal for this layout): same client, linked, the document validated', async () => {
    // The rear-bed starter (an L3H2 bay) reads back as a brief its bay can meet.
    const res = await call(list.POST, { method: 'POST', as: w.designer, json: { name: 'Proposal variant source', starterId: 'starter-rear-bed', clientId: w.client.id } });
    const id = res.body.id as string;
    const source = await read(id);
    const proposal = generateProposals(briefFromLayout(source.doc)).proposals[0];
    expect(proposal).toBeDefined();
    const made = await call(variants.POST, { method: 'POST', params: { id }, as: w.designer, json: { doc: proposal.doc } });
    expect(made.status).toBe(201);
    expect(made.body).toMatchObject({ name: 'Proposal variant source variant 2', client: { id: w.client.id }, variantOf: { id, name: 'Proposal variant source' } });
    expect(made.body.doc.modules.map((m: { id: string }) => m.id)).toEqual(proposal.doc.modules.map((m) => m.id));
    expect(made.body.doc.name).toBe('Proposal variant source variant 2');

    const before = (await db.select({ id: layouts.id }).from(layouts)).length;
    const bad = await call(variants.POST, { method: 'POST', params: { id }, as: w.designer, json: { doc: { ...proposal.doc, bay: { ...proposal.doc.bay, length: -5 } } } });
    expect(bad.status).toBe(400);
    expect(bad.body.issues.some((i: { path: string }) => i.path.startsWith('doc.bay'))).toBe(true);
    // 2 MB is the cap: 2 × 1024 × 1024 bytes; a body over it is refused before it is parsed.
    const huge = await call(variants.POST, { method: 'POST', params: { id }, as: w.designer, json: { doc: { ...proposal.doc, name: 'x'.repeat(2 * 1024 * 1024 + 1) } } });
    expect(huge.status).toBe(413);
    // The client may not make one, with or without a document.
    expect((await call(variants.POST, { method: 'POST', params: { id }, as: w.client, json: { doc: proposal.doc } })).status).toBe(403);
    expect((await db.select({ id: layouts.id }).from(layouts)).length).toBe(before);
  }, 60_000);

  it('refuses the client (403) and a stranger (404), and a malformed id is 404; nothing is made', async () => {
    const { id } = await newLayout('Variant rights');
    const before = (await db.select({ id: layouts.id }).from(layouts)).length;
    expect((await call(variants.POST, { method: 'POST', params: { id }, as: w.client, json: {} })).status).toBe(403);
    expect((await call(variants.POST, { method: 'POST', params: { id }, as: w.foreignOwner, json: {} })).status).toBe(404);
    expect((await call(variants.POST, { method: 'POST', params: { id: 'not-an-id' }, as: w.designer, json: {} })).status).toBe(404);
    expect((await db.select({ id: layouts.id }).from(layouts)).length).toBe(before);
  });
});

describe('archiving and restoring', () => {
  it('an archived variant leaves the default list for the archived one and comes back on restore', async () => {
    const { id } = await newLayout('Archive me');
    const variant = (await call(variants.POST, { method: 'POST', params: { id }, as: w.designer, json: {} })).body;
    const ids = async (archived: boolean) =>
      (await call(list.GET, { as: w.designer, path: archived ? '/api/layouts?archived=1' : '/api/layouts' })).body.layouts.map((l: { id: string }) => l.id);
    expect((await call(archive.POST, { method: 'POST', params: { id: variant.id }, as: w.designer })).body.archivedAt).not.toBeNull();
    expect(await ids(false)).not.toContain(variant.id);
    expect(await ids(true)).toContain(variant.id);
    const back = await call(archive.DELETE, { method: 'DELETE', params: { id: variant.id }, as: w.designer });
    expect(back.body).toMatchObject({ archivedAt: null, variantOf: { id } });
    expect(await ids(false)).toContain(variant.id);
    expect((await call(archive.DELETE, { method: 'DELETE', params: { id: variant.id }, as: w.client })).status).toBe(403);
  });
});

describe('saved versions', () => {
  it('lists every save newest first and restores an earlier one as the newest save, keeping the rest', async () => {
    const { id, version: v1 } = await newLayout('Versions van');
    const original = (await read(id)).doc;
    const v2 = await save(id, v1, { ...original, modules: original.modules.slice(1) });
    const v3 = await save(id, v2, { ...original, modules: original.modules.slice(2) });
    const history = await call(versions.GET, { params: { id }, as: w.client });
    expect(history.status).toBe(200);
    expect(history.body.versions.map((v: { version: number; moduleCount: number; current: boolean }) => [v.version, v.moduleCount, v.current])).toEqual([
      [v3, original.modules.length - 2, true],
      [v2, original.modules.length - 1, false],
      [v1, original.modules.length, false],
    ]);
    expect(history.body.versions[0].savedBy).toBe('Ivo Brandt');

    const res = await call(restore.POST, { method: 'POST', params: { id, version: String(v1) }, as: w.designer, headers: { 'if-match': String(v3) } });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ version: v3 + 1, restoredFrom: v1 });
    const after = await read(id);
    expect(after.doc.modules).toEqual(original.modules);
    const again = await call(versions.GET, { params: { id }, as: w.designer });
    expect(again.body.versions).toHaveLength(4);
    expect(again.body.versions[0]).toMatchObject({ version: v3 + 1, restoredFrom: v1, current: true });
  });

  it('refuses a stale base (412), an unknown version (404), a malformed one (400), the client (403); nothing changes', async () => {
    const { id, version } = await newLayout('Restore refusals');
    const v2 = await save(id, version, { ...starterLayout('starter-l-lounge'), name: 'Restore refusals', modules: [] });
    const attempts = [
      [{ version: '1', headers: { 'if-match': '1' } }, w.designer, 412],
      [{ version: '99', headers: {} }, w.designer, 404],
      [{ version: 'two', headers: {} }, w.designer, 400],
      [{ version: '0', headers: {} }, w.designer, 400],
      [{ version: '1', headers: { 'if-match': 'soon' } }, w.designer, 400],
      [{ version: '1', headers: {} }, w.client, 403],
      [{ version: '1', headers: {} }, w.foreignOwner, 404],
    ] as const;
    for (const [a, who, status] of attempts) {
      const res = await call(restore.POST, { method: 'POST', params: { id, version: a.version }, as: who, headers: { ...a.headers } });
      expect(res.status, `version ${a.version}`).toBe(status);
      expect(res.body.error).toMatch(/^[A-Z][^\n]{9,}$/); // a sentence a person can act on, not a code
    }
    const after = await read(id);
    expect(after.version).toBe(v2);
    expect(after.doc.modules).toEqual([]);
  });

  it('keeps the last 50 saves and every save a revision was issued from, no more', async () => {
    const { id, version } = await newLayout('Many saves');
    const doc = (await read(id)).doc;
    let v = await save(id, version, { ...doc, modules: doc.modules.slice(1) });
    await db.insert(revisions).values({ layoutId: id, seq: 1, letter: 'A', doc, layoutVersion: v });
    const issuedAt = v;
    for (let i = 0; i < 55; i++) v = await save(id, v, { ...doc, modules: doc.modules.slice(i % 2) });
    const kept = await db.select({ version: savedVersions.version }).from(savedVersions).where(eq(savedVersions.layoutId, id));
    const numbers = kept.map((k) => k.version).sort((a, b) => a - b);
    // 57 saves in all (the first, the one revision A was issued from, 55 more): the last 50 and A's.
    expect(numbers).toHaveLength(51);
    expect(numbers[0]).toBe(issuedAt);
    expect(numbers.slice(1)).toEqual(Array.from({ length: 50 }, (_, i) => v - 49 + i));
    const listed = await call(versions.GET, { params: { id }, as: w.designer });
    expect(listed.body.versions.at(-1)).toMatchObject({ version: issuedAt, revisions: ['A'] });
  });
});

describe('comparing two variants', () => {
  it('answers both plans as last saved, what differs and the findings whose status differs', async () => {
    const { id } = await newLayout('Compare original');
    const variant = (await call(variants.POST, { method: 'POST', params: { id }, as: w.designer, json: {} })).body;
    const removed = variant.doc.modules[0];
    await save(variant.id, variant.version, { ...variant.doc, modules: variant.doc.modules.slice(1) });
    const res = await call(compare.GET, { params: { id }, path: `/api/layouts/${id}/compare?with=${variant.id}`, as: w.client });
    expect(res.status).toBe(200);
    expect(res.body.from.label).toBe('Compare original');
    expect(res.body.to.label).toBe('Compare original variant 2');
    expect(res.body.diff.removed.map((m: { id: string }) => m.id)).toEqual([removed.id]);
    expect(res.body.diff.added).toEqual([]);
    expect(typeof res.body.from.ok).toBe('boolean');
    expect(Array.isArray(res.body.findings)).toBe(true);
  });

  it('refuses a missing or malformed other layout (400) and one the caller may not see (404)', async () => {
    const { id } = await newLayout('Compare refusals');
    expect((await call(compare.GET, { params: { id }, path: `/api/layouts/${id}/compare`, as: w.designer })).status).toBe(400);
    expect((await call(compare.GET, { params: { id }, path: `/api/layouts/${id}/compare?with=nope`, as: w.designer })).status).toBe(400);
    expect((await call(compare.GET, { params: { id }, path: `/api/layouts/${id}/compare?with=${w.foreignLayoutId}`, as: w.designer })).status).toBe(404);
    // The client may not compare their layout with another client's.
    expect((await call(compare.GET, { params: { id }, path: `/api/layouts/${id}/compare?with=${w.otherLayoutId}`, as: w.client })).status).toBe(404);
  });
});
