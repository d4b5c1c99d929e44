// Tracing photos never leave the studio: what a viewer link serves carries no upload, no
// placement and no file address, and the file route refuses anyone without a session.
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, expect, it } from 'vitest';
import * as links from '@/app/api/layouts/[id]/links/route';
import * as viewer from '@/app/api/v/[token]/route';
import * as layoutUploads from '@/app/api/layouts/[id]/uploads/route';
import * as oneUpload from '@/app/api/uploads/[uploadId]/route';
import * as tracing from '@/app/api/uploads/[uploadId]/tracing/route';
import { useFreshDb } from '../helpers/db';
import { buildWorld, type World } from '../helpers/world';
import { callRoute, pngBytes, uploadRequest } from './fixtures';

let w: World;
let root: string;

beforeAll(async () => {
  root = fs.mkdtempSync(path.join(os.tmpdir(), 'baywright-viewer-uploads-'));
  process.env.BAYWRIGHT_DATA_ROOT = root;
  process.env.BAYWRIGHT_DB = 'viewer-test';
  w = await buildWorld(await useFreshDb());
});
afterAll(() => fs.rmSync(root, { recursive: true, force: true }));

it('serves a viewer link without the placed tracing photo', async () => {
  const res = await layoutUploads.POST(await uploadRequest(w.clientLayoutId, { as: w.designer, name: 'secret-floor-photo.png', type: 'image/png', bytes: pngBytes() }), { params: Promise.resolve({ id: w.clientLayoutId }) });
  expect(res.status).toBe(201);
  const upload = await res.json();
  const placed = await callRoute(tracing.PUT, { method: 'PUT', as: w.designer, params: { uploadId: upload.id }, json: { x: 10, y: 20, mmPerPx: 3.25, opacity: 0.6 } });
  expect(placed.status).toBe(200);

  const link = await callRoute(links.POST, { method: 'POST', params: { id: w.clientLayoutId }, as: w.designer, json: {} });
  expect(link.status).toBe(201);
  const token = String(link.body.path).replace(/^\/v\//, '');
  const shown = await callRoute(viewer.GET, { params: { token } });
  expect(shown.status).toBe(200);
  expect(shown.body.doc.modules.length).toBeGreaterThan(0); // it does show the layout…
  const text = JSON.stringify(shown.body);
  for (const secret of [upload.id, 'secret-floor-photo', 'mmPerPx', '3.25', '/api/uploads', 'tracing']) expect(text).not.toContain(secret); // …and nothing of the photo

  // Someone holding only the link (no session) cannot fetch the file either.
  expect((await callRoute(oneUpload.GET, { params: { uploadId: upload.id } })).status).toBe(401);
  expect((await callRoute(layoutUploads.GET, { params: { id: w.clientLayoutId } })).status).toBe(401);
});
