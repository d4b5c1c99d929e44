// Stored documents are migrated on read: a layout and a revision stored in the previous schema
// shape (version 0: no `schemaVersion`, and none of the fields the current schema fills in — the
// bay's doors, openings, wheel arches, bulkhead and cab seats, the sleepers, the wall build-up) are written
// straight into the database, then read back through every route that returns or uses a
// document. Each answers as if the document were current, and nothing rewrites the stored row.
import { beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import * as one from '@/app/api/layouts/[id]/route';
import * as checks from '@/app/api/layouts/[id]/checks/route';
import * as revisionOne from '@/app/api/layouts/[id]/revisions/[revisionId]/route';
import * as revisionList from '@/app/api/layouts/[id]/revisions/route';
import * as compare from '@/app/api/layouts/[id]/revisions/compare/route';
import * as sheet from '@/app/api/layouts/[id]/sheet/route';
import * as parts from '@/app/api/layouts/[id]/quote/parts/route';
import * as viewer from '@/app/api/v/[token]/route';
import * as viewerChecks from '@/app/api/v/[token]/checks/route';
import { layouts, revisions } from '@/db/schema';
import { createViewerLink } from '@/db/sharing/viewer-links';
import { clearDocCache } from '@/db/layouts';
import { starterLayout } from '@/lib/layout/templates';
import type { Db } from '@/db/client';
import { useFreshDb } from '../helpers/db';
import { call } from '../helpers/http';
import { buildWorld, type World } from '../helpers/world';

let db: Db;
let w: World;
let layoutId: string;
let revisionId: string;

/** A document as version 0 stored it: no version field, no defaults written out. */
function versionZeroDoc(name: string): Record<string, unknown> {
  const doc = structuredClone(starterLayout('starter-rear-bed')!) as unknown as Record<string, any>;
  delete doc.schemaVersion;
  doc.name = name;
  delete doc.bay.doors;
  delete doc.bay.openings;
  delete doc.bay.wheelArches;
  delete doc.bay.bulkhead;
  delete doc.bay.cabSeats;
  delete doc.occupants.sleepers;
  delete doc.buildUp.walls;
  return doc;
}

function expectCurrent(doc: any) {
  expect(doc.schemaVersion).toBe(4);
  expect(doc.bay.doors).toEqual([]);
  expect(doc.bay.openings).toEqual([]);
  expect(doc.bay.wheelArches).toEqual([]);
  expect(doc.bay.bulkhead).toBe(true);
  expect(doc.bay.cabSeats).toBe(2);
  expect(doc.occupants.sleepers).toEqual([]);
  expect(doc.buildUp.walls).toEqual([]);
}

const designerActor = () => ({ userId: w.designer.id, studioId: w.designer.studioId, role: 'designer' as const, email: '', name: '' });

beforeAll(async () => {
  db = await useFreshDb();
  w = await buildWorld(db);
  const old = versionZeroDoc('Old shape van');
  const [row] = await db.insert(layouts).values({ studioId: w.owner.studioId, clientId: w.client.id, name: 'Old shape van', doc: old as never }).returning({ id: layouts.id });
  layoutId = row.id;
  const [rev] = await db.insert(revisions).values({ layoutId, seq: 1, letter: 'A', doc: old as never, layoutVersion: 1 }).returning({ id: revisions.id });
  revisionId = rev.id;
  clearDocCache();
});

describe('a version-0 document read back through every route', () => {
  it('GET /api/layouts/:id answers the current schema, the first time and from the cache', async () => {
    for (let i = 0; i < 2; i++) {
      const res = await call(one.GET, { params: { id: layoutId }, as: w.designer });
      expect(res.status).toBe(200);
      expectCurrent(res.body.doc);
    }
  });

  it('GET /api/layouts/:id/checks checks it', async () => {
    const res = await call(checks.GET, { params: { id: layoutId }, as: w.client });
    expect(res.status).toBe(200);
    expect(res.body.findings.length).toBeGreaterThan(0);
  });

  it('GET a revision answers its document in the current schema', async () => {
    const res = await call(revisionOne.GET, { params: { id: layoutId, revisionId }, as: w.client });
    expect(res.status).toBe(200);
    expectCurrent(res.body.doc ?? res.body.revision?.doc);
  });

  it('compare reads both sides migrated', async () => {
    const res = await call(compare.GET, { params: { id: layoutId }, path: `/api/layouts/${layoutId}/revisions/compare?from=A&to=current`, as: w.designer });
    expect(res.status).toBe(200);
    expectCurrent(res.body.from.doc);
    expectCurrent(res.body.to.doc);
  });

  it('the plan sheet and the parts list are made from it', async () => {
    const pdf = await call(sheet.GET, { params: { id: layoutId }, path: `/api/layouts/${layoutId}/sheet?paper=a4&scale=25`, as: w.designer });
    expect(pdf.status).toBe(200);
    const revSheet = await call(sheet.GET, { params: { id: layoutId }, path: `/api/layouts/${layoutId}/sheet?paper=a4&scale=25&revision=A`, as: w.designer });
    expect(revSheet.status).toBe(200);
    const list = await call(parts.GET, { params: { id: layoutId }, as: w.designer });
    expect(list.status).toBe(200);
  });

  it('viewer links to the live layout and to the revision answer the current schema, and their checks run', async () => {
    const live = await createViewerLink(designerActor(), layoutId, {});
    const frozen = await createViewerLink(designerActor(), layoutId, { revisionId });
    for (const { token } of [live, frozen]) {
      const res = await call(viewer.GET, { params: { token }, as: null });
      expect(res.status).toBe(200);
      expectCurrent(res.body.doc);
      const found = await call(viewerChecks.GET, { params: { token }, as: null });
      expect(found.status).toBe(200);
    }
  });

  it('issuing a revision freezes the migrated document; the stored layout row is not rewritten by reads', async () => {
    // A second old layout with no revision yet (the first already has revision A waiting).
    const [second] = await db.insert(layouts).values({ studioId: w.owner.studioId, name: 'Second old van', doc: versionZeroDoc('Second old van') as never }).returning({ id: layouts.id });
    const res = await call(revisionList.POST, { method: 'POST', params: { id: second.id }, as: w.designer, json: { note: 'After migration' } });
    expect(res.status).toBe(201);
    const [newest] = await db.select({ doc: revisions.doc }).from(revisions).where(eq(revisions.id, res.body.revision.id));
    expectCurrent(newest.doc);
    const [stored] = await db.select({ doc: layouts.doc }).from(layouts).where(eq(layouts.id, second.id));
    expect((stored.doc as unknown as Record<string, unknown>).schemaVersion).toBeUndefined();
  });
});
