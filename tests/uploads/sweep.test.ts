// Files left behind by a deleted layout (its rows go by cascade) are swept; files still named by
// a row, young files and anything not shaped like ours are kept.
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, expect, it } from 'vitest';
import * as layoutUploads from '@/app/api/layouts/[id]/uploads/route';
import * as oneLayout from '@/app/api/layouts/[id]/route';
import * as layoutsRoute from '@/app/api/layouts/route';
import { sweepOrphanUploads } from '@/db/uploads';
import { listStored } from '@/lib/uploads/store';
import { useFreshDb } from '../helpers/db';
import { buildWorld, type World } from '../helpers/world';
import { callRoute, pngBytes, uploadRequest } from './fixtures';

let w: World;
let root: string;

beforeAll(async () => {
  root = fs.mkdtempSync(path.join(os.tmpdir(), 'baywright-sweep-'));
  process.env.BAYWRIGHT_DATA_ROOT = root;
  process.env.BAYWRIGHT_DB = 'sweep-test';
  w = await buildWorld(await useFreshDb());
});
afterAll(() => fs.rmSync(root, { recursive: true, force: true }));

async function upload(layoutId: string, name: string) {
  const res = await layoutUploads.POST(await uploadRequest(layoutId, { as: w.designer, name, type: 'image/png', bytes: pngBytes() }), { params: Promise.resolve({ id: layoutId }) });
  expect(res.status).toBe(201);
  return res.json();
}

it('removes the files of a deleted layout and keeps the others', async () => {
  const made = await callRoute(layoutsRoute.POST, { method: 'POST', as: w.designer, json: { name: 'Doomed', bayTemplateId: 'l1h1' } });
  await upload(made.body.id, 'doomed.png');
  await upload(w.clientLayoutId, 'kept.png');
  expect(await listStored()).toHaveLength(2);
  expect((await callRoute(oneLayout.DELETE, { method: 'DELETE', as: w.designer, params: { id: made.body.id } })).status).toBe(204);

  // Young files are left alone: an upload elsewhere may be between disk and row.
  expect(await sweepOrphanUploads()).toEqual({ removed: 0, kept: 2 });
  // An hour later the orphan goes, the referenced file stays.
  const later = Date.now() + 2 * 60 * 60 * 1000;
  const stranger = path.join(root, 'uploads', 'sweep-test', 'notes.txt');
  fs.writeFileSync(stranger, 'not ours');
  const dead = path.join(root, 'uploads', 'sweep-test', 'ab', `ab${'0'.repeat(30)}.incoming`);
  fs.mkdirSync(path.dirname(dead), { recursive: true });
  fs.writeFileSync(dead, 'half an upload');
  expect(await sweepOrphanUploads(60 * 60 * 1000, later)).toEqual({ removed: 2, kept: 1 });
  const left = await listStored();
  expect(left).toHaveLength(1);
  expect(fs.existsSync(stranger)).toBe(true);
  const list = await callRoute(layoutUploads.GET, { as: w.designer, params: { id: w.clientLayoutId } });
  expect(list.body.uploads.map((u: { fileName: string }) => u.fileName)).toEqual(['kept.png']);
});
