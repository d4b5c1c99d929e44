// A viewer link hands the browser the bay's openings with the document, so the read-only plan
// (the editor's own drawing) can show the windows and roof openings: a live link the saved ones, a
// revision link the frozen ones, and the page's first content the same as the API's. Interface
// behaviour; no outside source is involved.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import * as links from '@/app/api/layouts/[id]/links/route';
import * as revs from '@/app/api/layouts/[id]/revisions/route';
import * as layoutRoute from '@/app/api/layouts/[id]/route';
import * as viewer from '@/app/api/v/[token]/route';
import { resolveViewerLink } from '@/db/sharing/viewer-links';
import type { FakeSmtp } from '@/dev/fakes/smtp/server';
import { useFreshDb } from '../helpers/db';
import { call } from '../helpers/http';
import { buildWorld, type World } from '../helpers/world';
import { startMailSink } from './helpers';

let w: World;
let smtp: FakeSmtp;

beforeAll(async () => {
  w = await buildWorld(await useFreshDb());
  smtp = await startMailSink();
});
afterAll(() => smtp.close());

const WINDOW = { id: 'galley-win', type: 'window', label: 'Galley window', wall: 'left', position: 600, sillHeight: 950, width: 700, height: 450, opens: true };
const VENT = { id: 'roof-fan', type: 'roof-opening', kind: 'fan', x: 1200, y: 600, length: 400, width: 400, frameHeight: 60 };

async function saveOpenings(openings: unknown[]) {
  const cur = await call(layoutRoute.GET, { params: { id: w.clientLayoutId }, as: w.designer });
  const doc = { ...cur.body.doc, bay: { ...cur.body.doc.bay, openings } };
  const res = await call(layoutRoute.PUT, { method: 'PUT', params: { id: w.clientLayoutId }, as: w.designer, json: { doc }, headers: { 'if-match': String(cur.body.version) } });
  expect(res.status, JSON.stringify(res.body)).toBe(200);
}

async function newLink(json: Record<string, unknown> = {}) {
  const res = await call(links.POST, { method: 'POST', params: { id: w.clientLayoutId }, as: w.designer, json });
  expect(res.status).toBe(201);
  return (res.body.path as string).replace(/^\/v\//, '');
}

describe("a viewer link's document carries the bay's openings", () => {
  it('live: the saved window and roof fan, in the API answer and in the page content', async () => {
    await saveOpenings([WINDOW, VENT]);
    const token = await newLink();
    const res = await call(viewer.GET, { params: { token } });
    expect(res.status).toBe(200);
    expect(res.body.doc.schemaVersion).toBeGreaterThanOrEqual(4);
    expect(res.body.doc.bay.openings).toEqual([WINDOW, VENT]);
    const page = await resolveViewerLink(token);
    expect(page.status).toBe('active');
    if (page.status === 'active') expect(page.content.doc.bay.openings).toEqual([WINDOW, VENT]);
  });

  it('revision: the openings as issued, whatever is saved after', async () => {
    await saveOpenings([WINDOW]);
    const issued = await call(revs.POST, { method: 'POST', params: { id: w.clientLayoutId }, as: w.designer, json: { note: 'Window only' } });
    expect(issued.status).toBe(201);
    const token = await newLink({ revisionId: issued.body.revision.id });
    await saveOpenings([{ ...WINDOW, position: 900 }, VENT]);
    const res = await call(viewer.GET, { params: { token } });
    expect(res.body.doc.bay.openings).toEqual([WINDOW]);
  });
});
