// Viewer links: created by the workshop only, token stored only as a hash, live links follow
// saves, revision links stay frozen, expiry and revocation show clearly; a link reaches nothing
// but what it names and can write nothing.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { count, eq } from 'drizzle-orm';
import * as links from '@/app/api/layouts/[id]/links/route';
import * as oneLink from '@/app/api/layouts/[id]/links/[linkId]/route';
import * as revs from '@/app/api/layouts/[id]/revisions/route';
import * as layoutRoute from '@/app/api/layouts/[id]/route';
import * as layoutList from '@/app/api/layouts/route';
import * as comments from '@/app/api/layouts/[id]/comments/route';
import * as viewer from '@/app/api/v/[token]/route';
import * as viewerChecks from '@/app/api/v/[token]/checks/route';
import * as viewerVersion from '@/app/api/v/[token]/version/route';
import { viewerLinks } from '@/db/schema';
import { resolveViewerLink } from '@/db/sharing/viewer-links';
import type { Db } from '@/db/client';
import type { LayoutDoc } from '@/lib/layout/schema';
import type { FakeSmtp } from '@/dev/fakes/smtp/server';
import { useFreshDb } from '../helpers/db';
import { call } from '../helpers/http';
import { buildWorld, type World } from '../helpers/world';
import { as, startMailSink, STRANGERS } from './helpers';

let db: Db;
let w: World;
let smtp: FakeSmtp;

beforeAll(async () => {
  db = await useFreshDb();
  w = await buildWorld(db);
  smtp = await startMailSink();
});
afterAll(() => smtp.close());

const linkCount = async () => (await db.select({ n: count() }).from(viewerLinks))[0].n;
const tokenOf = (path: string) => path.replace(/^\/v\//, '');

async function newLink(json: Record<string, unknown> = {}, layoutId = w.clientLayoutId) {
  const res = await call(links.POST, { method: 'POST', params: { id: layoutId }, as: w.designer, json });
  expect(res.status).toBe(201);
  return { token: tokenOf(res.body.path), link: res.body.link };
}

async function open(token: string) {
  return call(viewer.GET, { params: { token } });
}

async function save(layoutId: string, change: (doc: LayoutDoc) => void) {
  const cur = await call(layoutRoute.GET, { params: { id: layoutId }, as: w.designer });
  const doc = structuredClone(cur.body.doc);
  change(doc);
  const res = await call(layoutRoute.PUT, { method: 'PUT', params: { id: layoutId }, as: w.designer, json: { doc }, headers: { 'if-match': String(cur.body.version) } });
  expect(res.status).toBe(200);
  return res.body.version as number;
}

describe('creating viewer links', () => {
  it('is for the workshop only: 401 anonymous, 403 the client, 404 strangers; nothing stored', async () => {
    const params = { id: w.clientLayoutId };
    expect((await call(links.POST, { method: 'POST', params, as: null, json: {} })).status).toBe(401);
    expect((await call(links.POST, { method: 'POST', params, as: w.client, json: {} })).status).toBe(403);
    for (const who of STRANGERS) expect((await call(links.POST, { method: 'POST', params, as: as(w, who), json: {} })).status, who).toBe(404);
    expect((await call(links.GET, { params, as: w.client })).status).toBe(403);
    for (const who of STRANGERS) expect((await call(links.GET, { params, as: as(w, who) })).status, who).toBe(404);
    expect(await linkCount()).toBe(0);
  });

  it('refuses bad input with 400 and stores nothing', async () => {
    const foreignRev = await call(revs.POST, { method: 'POST', params: { id: w.otherLayoutId }, as: w.designer, json: { note: 'other' } });
    expect(foreignRev.status).toBe(201);
    for (const json of [
      { expiresInDays: 0 }, { expiresInDays: 400 }, { expiresInDays: 1.5 }, { label: 'x'.repeat(81) }, { revisionId: 'nope' },
      { revisionId: foreignRev.body.revision.id }, { token: 'mine' },
    ]) {
      const res = await call(links.POST, { method: 'POST', params: { id: w.clientLayoutId }, as: w.designer, json });
      expect(res.status, JSON.stringify(json)).toBe(400);
    }
    expect(await linkCount()).toBe(0);
  });

  it('hands out the token once and stores only its SHA-256 hash', async () => {
    const { token, link } = await newLink({ label: 'For the call on Friday' });
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    expect(link).toMatchObject({ kind: 'live', label: 'For the call on Friday', status: 'active', openCount: 0, lastOpenedAt: null, createdBy: 'Ivo Brandt' });
    const rows = await db.select().from(viewerLinks);
    expect(JSON.stringify(rows)).not.toContain(token);
    expect(rows[0].tokenHash).toMatch(/^[0-9a-f]{64}$/);
    const listed = await call(links.GET, { params: { id: w.clientLayoutId }, as: w.owner });
    expect(JSON.stringify(listed.body)).not.toContain(token);
    expect(listed.body.links[0]).not.toHaveProperty('tokenHash');
  });
});

describe('opening a viewer link', () => {
  it('shows exactly the layout it names, with no addresses, not indexed, no referrer', async () => {
    const { token } = await newLink();
    const res = await open(token);
    expect(res.status).toBe(200);
    const [stored] = await db.select().from(viewerLinks).where(eq(viewerLinks.tokenHash, (await import('@/db/sharing/tokens')).hashToken(token)));
    expect(stored.layoutId).toBe(w.clientLayoutId);
    expect(res.body).toMatchObject({ kind: 'live', layoutName: 'Nair — L2H2 weekender', studioName: 'Saltmarsh Van Works', revision: null });
    expect(res.body.doc.name).toBe('Nair — L2H2 weekender');
    expect(JSON.stringify(res.body)).not.toMatch(/@|studioId|clientId|userId|checkDefaults/);
    expect(res.headers.get('x-robots-tag')).toBe('noindex, nofollow');
    expect(res.headers.get('referrer-policy')).toBe('no-referrer');
    expect(res.headers.get('cache-control')).toMatch(/no-store/);
  });

  it('records when a person opened the page, but not the document refetches nor the poll', async () => {
    const { token, link } = await newLink();
    // The page (app/v/[token]) resolves with touch; the API routes never do.
    expect((await resolveViewerLink(token, { touch: true })).status).toBe('active');
    expect((await resolveViewerLink(token, { touch: true })).status).toBe('active');
    await open(token);
    for (let i = 0; i < 3; i++) expect((await call(viewerVersion.GET, { params: { token } })).status).toBe(200);
    const listed = await call(links.GET, { params: { id: w.clientLayoutId }, as: w.designer });
    const row = listed.body.links.find((l: { id: string }) => l.id === link.id);
    expect(row.openCount).toBe(2);
    expect(new Date(row.lastOpenedAt).getTime()).toBeGreaterThanOrEqual(new Date(row.createdAt).getTime());
  });

  it('follows saves when live: the polled version moves and the document is the new one', async () => {
    const { token } = await newLink();
    const v1 = (await call(viewerVersion.GET, { params: { token } })).body.version;
    const version = await save(w.clientLayoutId, (doc) => { doc.modules[0].x += 25; });
    const v2 = await call(viewerVersion.GET, { params: { token } });
    expect(v2.body.version).toBe(version);
    expect(v2.body.version).toBeGreaterThan(v1);
    const cur = await call(layoutRoute.GET, { params: { id: w.clientLayoutId }, as: w.designer });
    expect((await open(token)).body.doc).toEqual(cur.body.doc);
  });

  it('stays frozen when it names a revision', async () => {
    const issued = await call(revs.POST, { method: 'POST', params: { id: w.clientLayoutId }, as: w.designer, json: { note: 'For approval' } });
    const { token, link } = await newLink({ revisionId: issued.body.revision.id });
    expect(link).toMatchObject({ kind: 'revision', revision: { letter: issued.body.revision.letter } });
    const before = await open(token);
    await save(w.clientLayoutId, (doc) => { doc.modules[0].x += 40; });
    const after = await open(token);
    expect(after.body.doc).toEqual(before.body.doc);
    expect(after.body).toMatchObject({ kind: 'revision', revision: { letter: issued.body.revision.letter, note: 'For approval' } });
    expect((await call(viewerVersion.GET, { params: { token } })).body.version).toBe(before.body.version);
  });

  it('runs the checks on exactly the shown document', async () => {
    const { token } = await newLink();
    const res = await call(viewerChecks.GET, { params: { token } });
    expect(res.status).toBe(200);
    expect(typeof res.body.ok).toBe('boolean');
    expect(res.body.findings.length).toBeGreaterThan(0);
    expect(res.headers.get('x-robots-tag')).toBe('noindex, nofollow');
  });

  it('answers 404 for unknown and malformed tokens, with the viewer headers', async () => {
    for (const token of ['A'.repeat(43), 'short', '../../api/layouts', '']) {
      for (const route of [viewer, viewerChecks, viewerVersion]) {
        const res = await call(route.GET, { params: { token } });
        expect(res.status, token).toBe(404);
        expect(res.body.error).toMatch(/no viewer link/i);
        expect(res.headers.get('referrer-policy')).toBe('no-referrer');
      }
    }
  });
});

describe('expiry and revocation', () => {
  it('shows an expired link as expired (410) on its next request', async () => {
    const { token, link } = await newLink({ expiresInDays: 7 });
    expect((await open(token)).status).toBe(200);
    const in8days = new Date(Date.now() + 8 * 86_400_000);
    expect(await resolveViewerLink(token, {}, in8days)).toEqual({ status: 'expired', expiresAt: link.expiresAt });
    await db.update(viewerLinks).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(viewerLinks.id, link.id));
    for (const route of [viewer, viewerChecks, viewerVersion]) {
      const res = await call(route.GET, { params: { token } });
      expect(res.status).toBe(410);
      expect(res.body).toMatchObject({ status: 'expired', error: expect.stringMatching(/expired on \d{4}-\d\d-\d\d/) });
    }
    const listed = await call(links.GET, { params: { id: w.clientLayoutId }, as: w.designer });
    expect(listed.body.links.find((l: { id: string }) => l.id === link.id).status).toBe('expired');
  });

  it('lets the workshop revoke a link; its next request says it was withdrawn', async () => {
    const { token, link } = await newLink();
    const params = { id: w.clientLayoutId, linkId: link.id };
    expect((await call(oneLink.DELETE, { method: 'DELETE', params, as: null })).status).toBe(401);
    expect((await call(oneLink.DELETE, { method: 'DELETE', params, as: w.client })).status).toBe(403);
    for (const who of STRANGERS) expect((await call(oneLink.DELETE, { method: 'DELETE', params, as: as(w, who) })).status, who).toBe(404);
    // Through another layout's address the link does not exist.
    expect((await call(oneLink.DELETE, { method: 'DELETE', params: { id: w.otherLayoutId, linkId: link.id }, as: w.designer })).status).toBe(404);
    expect((await open(token)).status).toBe(200);
    const res = await call(oneLink.DELETE, { method: 'DELETE', params, as: w.designer });
    expect(res.status).toBe(200);
    expect(res.body.link.status).toBe('revoked');
    const gone = await open(token);
    expect(gone.status).toBe(410);
    expect(gone.body).toMatchObject({ status: 'revoked', error: 'This viewer link was withdrawn by the workshop.' });
    const again = await call(oneLink.DELETE, { method: 'DELETE', params, as: w.owner });
    expect(again.body.link.revokedAt).toBe(res.body.link.revokedAt);
  });
});

describe('what a link holder cannot do', () => {
  it('has only GET routes under /api/v', () => {
    for (const route of [viewer, viewerChecks, viewerVersion]) {
      expect(Object.keys(route).filter((k) => /^(POST|PUT|PATCH|DELETE)$/.test(k))).toEqual([]);
    }
  });

  it('cannot use the token as a session for any layout route, read or write', async () => {
    const { token } = await newLink();
    const headers = { authorization: `Bearer ${token}`, cookie: `authjs.session-token=${token}; token=${token}` };
    expect((await call(layoutList.GET, { headers })).status).toBe(401);
    expect((await call(layoutRoute.GET, { params: { id: w.clientLayoutId }, headers })).status).toBe(401);
    expect((await call(layoutRoute.GET, { params: { id: w.otherLayoutId }, headers })).status).toBe(401);
    const cur = await call(layoutRoute.GET, { params: { id: w.clientLayoutId }, as: w.designer });
    const put = await call(layoutRoute.PUT, { method: 'PUT', params: { id: w.clientLayoutId }, headers: { ...headers, 'if-match': String(cur.body.version) }, json: { doc: cur.body.doc } });
    expect(put.status).toBe(401);
    expect((await call(comments.POST, { method: 'POST', params: { id: w.clientLayoutId }, headers, json: { arrangement: 'travel', x: 100, y: 100, body: 'hi' } })).status).toBe(401);
    expect((await call(links.POST, { method: 'POST', params: { id: w.clientLayoutId }, headers, json: {} })).status).toBe(401);
    const after = await call(layoutRoute.GET, { params: { id: w.clientLayoutId }, as: w.designer });
    expect(after.body.version).toBe(cur.body.version);
  });

  it('never reaches another layout: each token opens its own layout only', async () => {
    const mine = await newLink({}, w.clientLayoutId);
    const theirs = await newLink({}, w.otherLayoutId);
    expect((await open(mine.token)).body.layoutName).toBe('Nair — L2H2 weekender');
    expect((await open(theirs.token)).body.layoutName).toBe('Adeyemi — L3H2 touring');
    expect(JSON.stringify((await open(mine.token)).body)).not.toContain('Adeyemi');
  });

  it('is gone with its layout', async () => {
    const created = await call(layoutList.POST, { method: 'POST', as: w.designer, json: { name: 'Short-lived', bayTemplateId: 'l2h2' } });
    const { token } = await newLink({}, created.body.id);
    expect((await open(token)).status).toBe(200);
    expect((await call(layoutRoute.DELETE, { method: 'DELETE', params: { id: created.body.id }, as: w.designer })).status).toBe(204);
    expect((await open(token)).status).toBe(404);
  });
});
