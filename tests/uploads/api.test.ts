// The upload routes, each as owner, designer, the layout's client, another client, another
// studio and anonymous; size (413) and type (415) limits; file-name tricks; nothing changed on refusal.
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import * as layoutUploads from '@/app/api/layouts/[id]/uploads/route';
import * as oneUpload from '@/app/api/uploads/[uploadId]/route';
import * as tracing from '@/app/api/uploads/[uploadId]/tracing/route';
import { uploads } from '@/db/schema';
import type { Db } from '@/db/client';
import { MAX_UPLOADS_PER_LAYOUT } from '@/db/uploads';
import { MAX_UPLOAD_BYTES } from '@/lib/uploads/store';
import { useFreshDb } from '../helpers/db';
import { sessionCookie, type SessionUser } from '../helpers/http';
import { buildWorld, type World } from '../helpers/world';
import { callRoute, jpegBytes, pdfBytes, pngBytes, streamOf, uploadRequest, webpBytes, type UploadRequest } from './fixtures';

let db: Db;
let w: World;
let root: string;

beforeAll(async () => {
  root = fs.mkdtempSync(path.join(os.tmpdir(), 'baywright-uploads-'));
  process.env.BAYWRIGHT_DATA_ROOT = root;
  process.env.BAYWRIGHT_DB = 'uploads-test';
  db = await useFreshDb();
  w = await buildWorld(db);
});
afterAll(() => fs.rmSync(root, { recursive: true, force: true }));

/** Every file under the data root, relative to it. */
function filesOnDisk(): string[] {
  if (!fs.existsSync(root)) return [];
  return (fs.readdirSync(root, { recursive: true }) as string[]).filter((f) => fs.statSync(path.join(root, f)).isFile() && !f.endsWith('.auth-secret'));
}
async function rowCount() {
  return (await db.select().from(uploads)).length;
}
async function post(layoutId: string, r: UploadRequest) {
  const res = await layoutUploads.POST(await uploadRequest(layoutId, r), { params: Promise.resolve({ id: layoutId }) });
  return { status: res.status, body: await res.json().catch(() => null) };
}
async function expectNothingChanged(fn: () => Promise<unknown>) {
  const rows = await rowCount();
  const files = filesOnDisk();
  await fn();
  expect(await rowCount()).toBe(rows);
  expect(filesOnDisk()).toEqual(files);
}
async function upload(as: SessionUser, name = 'side-door.png', bytes = pngBytes(), layoutId = w.clientLayoutId) {
  const res = await post(layoutId, { as, name, type: 'image/png', bytes });
  expect(res.status).toBe(201);
  return res.body;
}

describe('POST /api/layouts/:id/uploads', () => {
  it.each(['designer', 'owner'] as const)('stores a photo for the %s, outside public/, under a random name', async (who) => {
    const res = await post(w.clientLayoutId, { as: w[who], name: 'bay from rear doors.png', type: 'image/png', bytes: pngBytes(40, 30) });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ fileName: 'bay from rear doors.png', contentType: 'image/png', kind: 'photo', sizeBytes: pngBytes(40, 30).length, tracing: null });
    expect(res.body).not.toHaveProperty('storedName');
    const [row] = await db.select().from(uploads).where(eq(uploads.id, res.body.id));
    expect(row.storedName).toMatch(/^[0-9a-f]{32}$/);
    const onDisk = path.join(root, 'uploads', 'uploads-test', row.storedName.slice(0, 2), row.storedName);
    expect(fs.readFileSync(onDisk)).toEqual(pngBytes(40, 30));
    expect(onDisk.startsWith(path.join(process.cwd(), 'public'))).toBe(false);
  });

  it.each([
    ['a JPEG', 'van.jpg', 'image/jpeg', jpegBytes(), 'image/jpeg', 'photo'],
    ['a WebP', 'roof.webp', 'image/webp', webpBytes(), 'image/webp', 'photo'],
    ['a PDF drawing', 'chassis drawing.pdf', 'application/pdf', pdfBytes(), 'application/pdf', 'drawing'],
    ['a photo the browser could not type', 'IMG_2041', 'application/octet-stream', jpegBytes(), 'image/jpeg', 'photo'],
  ])('accepts %s, typed by its content', async (_what, name, type, bytes, found, kind) => {
    const res = await post(w.clientLayoutId, { as: w.designer, name, type, bytes });
    expect(res.status).toBe(201);
    expect(res.body.contentType).toBe(found);
    expect(res.body.kind).toBe(kind);
    if (name === 'IMG_2041') expect(res.body.fileName).toBe('IMG_2041.jpg');
  });

  it('answers 413 above 15 MB, by the declared length, before reading anything', async () => {
    await expectNothingChanged(async () => {
      const res = await post(w.clientLayoutId, { as: w.designer, name: 'huge.png', type: 'image/png', bytes: pngBytes(), declaredLength: MAX_UPLOAD_BYTES + 1 });
      expect(res.status).toBe(413);
      expect(res.body.error).toMatch(/larger than 15 MB/);
    });
  });

  it('answers 413 when a body with no declared length streams past 15 MB, and keeps no partial file', async () => {
    await expectNothingChanged(async () => {
      const res = await post(w.clientLayoutId, { as: w.designer, name: 'huge.png', type: 'image/png', bytes: streamOf(MAX_UPLOAD_BYTES + 1, pngBytes()) });
      expect(res.status).toBe(413);
    });
  });

  it('accepts a file of exactly 15 MB', async () => {
    const res = await post(w.otherLayoutId, { as: w.designer, name: 'limit.png', type: 'image/png', bytes: streamOf(MAX_UPLOAD_BYTES, pngBytes()) });
    expect(res.status).toBe(201);
    expect(res.body.sizeBytes).toBe(MAX_UPLOAD_BYTES);
    await callRoute(oneUpload.DELETE, { method: 'DELETE', as: w.designer, params: { uploadId: res.body.id } });
  });

  it.each([
    ['PNG bytes claimed as JPEG', 'a.jpg', 'image/jpeg', pngBytes(), /sent as image\/jpeg but its content is image\/png/],
    ['HTML dressed as a PNG', 'a.png', 'image/png', Buffer.from('<html><script>alert(1)</script></html>'), /not a JPEG, PNG, WebP or PDF/],
    ['an SVG (can carry script)', 'plan.svg', 'image/svg+xml', Buffer.from('<svg xmlns="http://www.w3.org/2000/svg"/>'), /not a JPEG/],
    ['a GIF', 'a.gif', 'image/gif', Buffer.from('GIF89a\x01\x00\x01\x00\x00\x00\x00;'), /not a JPEG/],
    ['a PDF named .jpg', 'photo.jpg', 'application/octet-stream', pdfBytes(), /named \.jpg but its content is application\/pdf/],
    ['a PNG named .html', 'page.html', 'image/png', pngBytes(), /named \.html/],
    ['a text file with no claim', 'notes', '', Buffer.from('just some notes about the van'), /not a JPEG/],
    ['three bytes of nothing', 'x.png', 'image/png', Buffer.from([1, 2, 3]), /not a JPEG/],
  ])('answers 415 for %s and stores nothing', async (_what, name, type, bytes, message) => {
    await expectNothingChanged(async () => {
      const res = await post(w.clientLayoutId, { as: w.designer, name, type, bytes });
      expect(res.status).toBe(415);
      expect(res.body.error).toMatch(message);
    });
  });

  it('answers 400 for an empty body', async () => {
    await expectNothingChanged(async () => {
      const res = await post(w.clientLayoutId, { as: w.designer, name: 'a.png', type: 'image/png', bytes: Buffer.alloc(0) });
      expect(res.status).toBe(400);
      expect(res.body.error).toMatch(/empty/);
    });
  });

  it.each([
    ['../../../../etc/passwd.png', 'passwd.png'],
    ['..\\..\\windows\\win.ini.png', 'win.ini.png'],
    ['/absolute/path/van.png', 'van.png'],
    ['C:\\Users\\ivo\\Desktop\\van.png', 'van.png'],
    ['..', 'upload.png'],
    ['.hidden.png', 'hidden.png'],
    ['bay<>:"|?*.png', 'bay_______.png'],
    ['ok\u0000.png', 'ok.png'],
    [`${'a'.repeat(300)}.png`, `${'a'.repeat(116)}.png`],
  ])('cleans the name %j to %j and writes only inside the uploads folder', async (raw, shown) => {
    const res = await post(w.clientLayoutId, { as: w.designer, name: raw, type: 'image/png', bytes: pngBytes() });
    expect(res.status).toBe(201);
    expect(res.body.fileName).toBe(shown);
    for (const f of filesOnDisk()) expect(f).toMatch(/^uploads[/\\]uploads-test[/\\][0-9a-f]{2}[/\\][0-9a-f]{32}$/);
    expect(fs.existsSync(path.join(root, '..', 'etc'))).toBe(false);
    await callRoute(oneUpload.DELETE, { method: 'DELETE', as: w.designer, params: { uploadId: res.body.id } });
  });

  it.each([
    ['a name hiding .exe behind a right-to-left override', 'photo\u202Egnp.exe', 'image/png'],
    ['a name with a NUL before .html', 'a.png\u0000.html', 'image/png'],
  ])('refuses %s (415) once the hidden characters are gone', async (_what, name, type) => {
    await expectNothingChanged(async () => {
      const res = await post(w.clientLayoutId, { as: w.designer, name, type, bytes: pngBytes() });
      expect(res.status).toBe(415);
    });
  });

  it.each([
    ['the layout’s own client', () => w.client, () => w.clientLayoutId, 403],
    ['a client of another layout', () => w.otherClient, () => w.clientLayoutId, 404],
    ['another studio’s owner', () => w.foreignOwner, () => w.clientLayoutId, 404],
    ['anyone, on another studio’s layout', () => w.owner, () => w.foreignLayoutId, 404],
    ['anonymous', () => null, () => w.clientLayoutId, 401],
    ['a nonsense layout id', () => w.designer, () => '../../etc', 404],
  ])('refuses %s and stores nothing', async (_what, who, layout, status) => {
    await expectNothingChanged(async () => {
      const res = await post(layout(), { as: who(), name: 'a.png', type: 'image/png', bytes: pngBytes() });
      expect(res.status).toBe(status);
    });
  });

  it('refuses an upload from another site (Origin check)', async () => {
    await expectNothingChanged(async () => {
      const res = await post(w.clientLayoutId, { as: w.designer, name: 'a.png', type: 'image/png', bytes: pngBytes(), headers: { origin: 'https://evil.example' } });
      expect(res.status).toBe(403);
    });
  });

  it(`keeps at most ${MAX_UPLOADS_PER_LAYOUT} files per layout (409)`, async () => {
    const created: string[] = [];
    const existing = (await callRoute(layoutUploads.GET, { as: w.owner, params: { id: w.otherLayoutId } })).body.uploads.length;
    for (let i = existing; i < MAX_UPLOADS_PER_LAYOUT; i++) created.push((await upload(w.owner, `p${i}.png`, pngBytes(), w.otherLayoutId)).id);
    await expectNothingChanged(async () => {
      const res = await post(w.otherLayoutId, { as: w.owner, name: 'one-too-many.png', type: 'image/png', bytes: pngBytes() });
      expect(res.status).toBe(409);
      expect(res.body.error).toMatch(/delete one first/);
    });
    for (const id of created) await callRoute(oneUpload.DELETE, { method: 'DELETE', as: w.owner, params: { uploadId: id } });
  });
});

describe('GET /api/layouts/:id/uploads', () => {
  it('lists the files for the owner, the designer and the layout’s client', async () => {
    const made = await upload(w.designer, 'listed.png');
    for (const who of [w.owner, w.designer, w.client]) {
      const res = await callRoute(layoutUploads.GET, { as: who, params: { id: w.clientLayoutId } });
      expect(res.status).toBe(200);
      expect(res.body.uploads.map((u: { id: string }) => u.id)).toContain(made.id);
      expect(JSON.stringify(res.body)).not.toMatch(/storedName|stored_name/);
    }
  });

  it('answers 404 to another client and another studio, 401 to anonymous', async () => {
    expect((await callRoute(layoutUploads.GET, { as: w.otherClient, params: { id: w.clientLayoutId } })).status).toBe(404);
    expect((await callRoute(layoutUploads.GET, { as: w.foreignOwner, params: { id: w.clientLayoutId } })).status).toBe(404);
    expect((await callRoute(layoutUploads.GET, { as: w.foreignClient, params: { id: w.clientLayoutId } })).status).toBe(404);
    expect((await callRoute(layoutUploads.GET, { as: null, params: { id: w.clientLayoutId } })).status).toBe(401);
  });
});

describe('GET /api/uploads/:id', () => {
  it('serves the bytes with nosniff and a Content-Disposition, inline for photos', async () => {
    const made = await upload(w.designer, 'façade « rear ».png');
    for (const who of [w.designer, w.owner, w.client]) {
      const res = await oneUpload.GET(new Request(`http://localhost:3000/api/uploads/${made.id}`, { headers: { cookie: await sessionCookie(who) } }), { params: Promise.resolve({ uploadId: made.id }) });
      expect(res.status).toBe(200);
      expect(res.headers.get('x-content-type-options')).toBe('nosniff');
      expect(res.headers.get('content-type')).toBe('image/png');
      expect(res.headers.get('content-disposition')).toBe(`inline; filename="fa_ade _ rear _.png"; filename*=UTF-8''fa%C3%A7ade%20%C2%AB%20rear%20%C2%BB.png`);
      expect(Buffer.from(await res.arrayBuffer())).toEqual(pngBytes());
    }
  });

  it('always sends a PDF as an attachment, and a photo too with ?download=1', async () => {
    const pdf = (await post(w.clientLayoutId, { as: w.designer, name: 'drawing.pdf', type: 'application/pdf', bytes: pdfBytes() })).body;
    const res = await callRoute(oneUpload.GET, { as: w.client, params: { uploadId: pdf.id } });
    expect(res.headers.get('content-disposition')).toMatch(/^attachment; filename="drawing\.pdf"/);
    const photo = await upload(w.designer, 'p.png');
    const dl = await callRoute(oneUpload.GET, { as: w.designer, path: `/api/uploads/${photo.id}?download=1`, params: { uploadId: photo.id } });
    expect(dl.headers.get('content-disposition')).toMatch(/^attachment;/);
  });

  it('answers 404 to a client of another layout, another studio and nonsense ids; 401 to anonymous', async () => {
    const made = await upload(w.designer, 'private.png');
    expect((await callRoute(oneUpload.GET, { as: w.otherClient, params: { uploadId: made.id } })).status).toBe(404);
    expect((await callRoute(oneUpload.GET, { as: w.foreignOwner, params: { uploadId: made.id } })).status).toBe(404);
    expect((await callRoute(oneUpload.GET, { as: w.foreignClient, params: { uploadId: made.id } })).status).toBe(404);
    expect((await callRoute(oneUpload.GET, { as: w.owner, params: { uploadId: '../../../etc/passwd' } })).status).toBe(404);
    expect((await callRoute(oneUpload.GET, { as: w.owner, params: { uploadId: '00000000-0000-4000-8000-000000000000' } })).status).toBe(404);
    expect((await callRoute(oneUpload.GET, { as: null, params: { uploadId: made.id } })).status).toBe(401);
  });
});

describe('DELETE /api/uploads/:id', () => {
  it('refuses the client (403), another client and another studio (404), and keeps the file', async () => {
    const made = await upload(w.designer, 'keep.png');
    await expectNothingChanged(async () => {
      expect((await callRoute(oneUpload.DELETE, { method: 'DELETE', as: w.client, params: { uploadId: made.id } })).status).toBe(403);
      expect((await callRoute(oneUpload.DELETE, { method: 'DELETE', as: w.otherClient, params: { uploadId: made.id } })).status).toBe(404);
      expect((await callRoute(oneUpload.DELETE, { method: 'DELETE', as: w.foreignOwner, params: { uploadId: made.id } })).status).toBe(404);
      expect((await callRoute(oneUpload.DELETE, { method: 'DELETE', as: null, params: { uploadId: made.id } })).status).toBe(401);
      expect((await callRoute(oneUpload.DELETE, { method: 'DELETE', as: w.designer, params: { uploadId: made.id }, headers: { origin: 'https://evil.example' } })).status).toBe(403);
    });
  });

  it('removes the row and the bytes for the designer', async () => {
    const made = await upload(w.designer, 'gone.png');
    const [row] = await db.select().from(uploads).where(eq(uploads.id, made.id));
    const before = filesOnDisk().length;
    const res = await callRoute(oneUpload.DELETE, { method: 'DELETE', as: w.designer, params: { uploadId: made.id } });
    expect(res.status).toBe(204);
    expect(await db.select().from(uploads).where(eq(uploads.id, made.id))).toEqual([]);
    expect(filesOnDisk().length).toBe(before - 1);
    expect(filesOnDisk().some((f) => f.endsWith(row.storedName))).toBe(false);
    expect((await callRoute(oneUpload.GET, { as: w.designer, params: { uploadId: made.id } })).status).toBe(404);
  });
});

describe('PUT /api/uploads/:id/tracing', () => {
  const placement = { x: -120, y: 35.5, mmPerPx: 2.5, rotation: 0, opacity: 0.4 };

  it('places a photo under the plan for the designer and lists it with the placement', async () => {
    const made = await upload(w.designer, 'floor.png');
    const res = await callRoute(tracing.PUT, { method: 'PUT', as: w.designer, params: { uploadId: made.id }, json: placement });
    expect(res.status).toBe(200);
    expect(res.body.tracing).toEqual(placement);
    const list = await callRoute(layoutUploads.GET, { as: w.owner, params: { id: w.clientLayoutId } });
    expect(list.body.uploads.find((u: { id: string }) => u.id === made.id).tracing).toEqual(placement);
    const off = await callRoute(tracing.DELETE, { method: 'DELETE', as: w.owner, params: { uploadId: made.id } });
    expect(off.status).toBe(200);
    expect(off.body.tracing).toBeNull();
  });

  it('never puts the placement into the layout document (viewer links show only the document)', async () => {
    const made = await upload(w.designer, 'secret-floor.png');
    await callRoute(tracing.PUT, { method: 'PUT', as: w.designer, params: { uploadId: made.id }, json: placement });
    const { layouts } = await import('@/db/schema');
    const [layout] = await db.select().from(layouts).where(eq(layouts.id, w.clientLayoutId));
    expect(JSON.stringify(layout.doc)).not.toMatch(/mmPerPx|tracing|secret-floor/);
  });

  it.each([
    ['the client', () => w.client, 403],
    ['a client of another layout', () => w.otherClient, 404],
    ['another studio', () => w.foreignOwner, 404],
    ['anonymous', () => null, 401],
  ])('refuses %s and changes nothing', async (_what, who, status) => {
    const made = await upload(w.designer, 'floor2.png');
    const res = await callRoute(tracing.PUT, { method: 'PUT', as: who(), params: { uploadId: made.id }, json: placement });
    expect(res.status).toBe(status);
    const [row] = await db.select().from(uploads).where(eq(uploads.id, made.id));
    expect(row.tracing).toBeNull();
  });

  it.each([
    ['a zero scale', { ...placement, mmPerPx: 0 }, 'mmPerPx'],
    ['an invisible opacity', { ...placement, opacity: 0 }, 'opacity'],
    ['a position a kilometre away', { ...placement, x: 1e6 }, 'x'],
    ['a missing scale', { x: 0, y: 0 }, 'mmPerPx'],
    ['an unknown field', { ...placement, colour: 'red' }, ''],
  ])('answers 400 with the field path for %s', async (_what, body, field) => {
    const made = await upload(w.designer, 'floor3.png');
    const res = await callRoute(tracing.PUT, { method: 'PUT', as: w.designer, params: { uploadId: made.id }, json: body });
    expect(res.status).toBe(400);
    expect(res.body.issues.map((i: { path: string }) => i.path)).toContain(field);
    const [row] = await db.select().from(uploads).where(eq(uploads.id, made.id));
    expect(row.tracing).toBeNull();
  });

  it('refuses to place a PDF drawing (400)', async () => {
    const pdf = (await post(w.clientLayoutId, { as: w.designer, name: 'drawing.pdf', type: 'application/pdf', bytes: pdfBytes() })).body;
    const res = await callRoute(tracing.PUT, { method: 'PUT', as: w.designer, params: { uploadId: pdf.id }, json: placement });
    expect(res.status).toBe(400);
    expect(res.body.error).toMatch(/Only photos/);
  });
});
