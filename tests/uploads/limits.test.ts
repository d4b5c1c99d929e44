// Upload limits beyond the file size: images that decode larger than 12,000 px on a side or
// 40 megapixels are refused with 415 (the header is read, nothing is decoded), and a studio's
// files may not pass its storage allowance (BAYWRIGHT_STUDIO_STORAGE_MB, default 2 GB) — 413.
// Nothing is stored on refusal.
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import { sum, eq } from 'drizzle-orm';
import * as layoutUploads from '@/app/api/layouts/[id]/uploads/route';
import { uploads } from '@/db/schema';
import type { Db } from '@/db/client';
import { studioQuotaBytes } from '@/lib/uploads/limits';
import { useFreshDb } from '../helpers/db';
import { buildWorld, type World } from '../helpers/world';
import { pngBytes, uploadRequest, type UploadRequest } from './fixtures';

let db: Db;
let w: World;
let root: string;

beforeAll(async () => {
  root = fs.mkdtempSync(path.join(os.tmpdir(), 'baywright-limits-'));
  process.env.BAYWRIGHT_DATA_ROOT = root;
  process.env.BAYWRIGHT_DB = 'limits-test';
  db = await useFreshDb();
  w = await buildWorld(db);
});
afterAll(() => fs.rmSync(root, { recursive: true, force: true }));
afterEach(() => vi.unstubAllEnvs());

/** A small PNG whose header declares `width` × `height` pixels (what a hostile file does). */
function declaredPng(width: number, height: number): Buffer {
  const png = Buffer.from(pngBytes(8, 6));
  png.writeUInt32BE(width, 16);
  png.writeUInt32BE(height, 20);
  return png;
}

async function post(r: UploadRequest) {
  const res = await layoutUploads.POST(await uploadRequest(w.clientLayoutId, r), { params: Promise.resolve({ id: w.clientLayoutId }) });
  return { status: res.status, body: await res.json().catch(() => null) };
}
const rowCount = async () => (await db.select().from(uploads)).length;

describe('decoded image size', () => {
  it.each([
    ['30,000 × 30,000 px', 30_000, 30_000],
    ['one side over 12,000 px', 12_001, 10],
    ['48 megapixels in sides under the limit', 8_000, 6_000],
  ])('refuses %s with 415 and a message, storing nothing', async (_what, width, height) => {
    const before = await rowCount();
    const res = await post({ as: w.designer, name: 'huge.png', type: 'image/png', bytes: declaredPng(width, height) });
    expect(res.status).toBe(415);
    expect(res.body.error).toContain(`${width} × ${height} px`);
    expect(res.body.error).toMatch(/at most 12,000 px on a side and 40 megapixels/);
    expect(await rowCount()).toBe(before);
  });

  it('accepts a 35-megapixel photo', async () => {
    const res = await post({ as: w.designer, name: 'camera.png', type: 'image/png', bytes: declaredPng(7_000, 5_000) });
    expect(res.status).toBe(201);
  });
});

describe('studio storage allowance', () => {
  it('is 2 GB unless the environment says otherwise', () => {
    expect(studioQuotaBytes({})).toBe(2 * 1024 ** 3);
    expect(studioQuotaBytes({ BAYWRIGHT_STUDIO_STORAGE_MB: '10' })).toBe(10 * 1024 ** 2);
    expect(() => studioQuotaBytes({ BAYWRIGHT_STUDIO_STORAGE_MB: 'lots' })).toThrow(/positive number/);
  });

  it('refuses a file that would pass it with 413 and a clear message, storing nothing', async () => {
    const [{ used }] = await db.select({ used: sum(uploads.sizeBytes) }).from(uploads).where(eq(uploads.studioId, w.owner.studioId));
    const file = pngBytes(40, 30);
    // Room for less than this file.
    vi.stubEnv('BAYWRIGHT_STUDIO_STORAGE_MB', String((Number(used ?? 0) + file.length - 1) / (1024 * 1024)));
    const before = await rowCount();
    const res = await post({ as: w.designer, name: 'one-too-many.png', type: 'image/png', bytes: file });
    expect(res.status).toBe(413);
    expect(res.body.error).toMatch(/storage allowance/);
    expect(await rowCount()).toBe(before);
    // With room for it, the same file goes in.
    vi.stubEnv('BAYWRIGHT_STUDIO_STORAGE_MB', String((Number(used ?? 0) + file.length) / (1024 * 1024)));
    expect((await post({ as: w.designer, name: 'fits.png', type: 'image/png', bytes: file })).status).toBe(201);
  });
});
