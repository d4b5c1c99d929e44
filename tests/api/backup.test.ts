// Backups a studio can trust: a studio with layouts, revisions, a paid quote and uploaded files is
// backed up while "the app" holds the embedded database (the backup asks it over its socket),
// restore is refused while the folder is held, then the folder and uploads are wiped, restored
// from the archive, and every row of every table and every file is identical.
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import crypto from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { sql } from 'drizzle-orm';
import { closeDb, dataDir, installDbHandle, openPglite, type Db } from '@/db/client';
import { layouts, payments, quotes, revisions, uploads } from '@/db/schema';
import { serveBackups } from '@/lib/backup/archive';
import { backupDatabase, restoreDatabase } from '@/scripts/lib/backup-ops';
import { buildWorld } from '../helpers/world';

const DB = 'backuptest';
let root: string;
let uploadsDir: string;

async function tableContents(db: Db): Promise<Record<string, string>> {
  const rowsOf = <T,>(r: unknown) => ((r as { rows?: T[] }).rows ?? (r as T[]));
  const names = rowsOf<{ tablename: string }>(await db.execute(sql`select tablename from pg_tables where schemaname in ('public', 'drizzle') order by tablename`)).map((t) => t.tablename);
  const out: Record<string, string> = {};
  for (const n of names) {
    const schema = n === '__drizzle_migrations' ? 'drizzle' : 'public';
    const [row] = rowsOf<{ body: string | null; n: number }>(await db.execute(sql.raw(`select string_agg(x::text, E'\\n' order by x::text) as body, count(*)::int as n from "${schema}"."${n}" x`)));
    out[n] = `${row.n}:${row.body ?? ''}`;
  }
  return out;
}

function fileHashes(dir: string): Record<string, string> {
  const out: Record<string, string> = {};
  const walk = (d: string) => {
    for (const e of fs.readdirSync(d, { withFileTypes: true })) {
      const p = path.join(d, e.name);
      if (e.isDirectory()) walk(p);
      else out[path.relative(dir, p)] = crypto.createHash('sha256').update(fs.readFileSync(p)).digest('hex');
    }
  };
  if (fs.existsSync(dir)) walk(dir);
  return out;
}

beforeAll(() => {
  root = fs.mkdtempSync(path.join(os.tmpdir(), 'baywright-backup-test-'));
  process.env.BAYWRIGHT_DATA_ROOT = root;
  uploadsDir = path.join(root, 'uploads', DB);
});
afterAll(() => {
  fs.rmSync(root, { recursive: true, force: true });
});

describe('db:backup and db:restore', () => {
  it('back up while the app runs, refuse to restore under it, then restore every row and file', async () => {
    // "The app": the embedded database open in this process, holding the pid lock, answering backups.
    const handle = await openPglite(dataDir(DB), { thread: true });
    installDbHandle(handle);
    const db = handle.db;
    const w = await buildWorld(db);
    const [rev] = await db.insert(revisions).values({ layoutId: w.clientLayoutId, seq: 1, letter: 'A', doc: (await db.select({ doc: layouts.doc }).from(layouts).limit(1))[0].doc, layoutVersion: 1 }).returning();
    const [q] = await db.insert(quotes).values({
      layoutId: w.clientLayoutId, studioId: w.owner.studioId, number: 1, clientId: w.client.id, layoutVersion: 1, status: 'paid', currency: 'GBP',
      parts: { lines: [] } as never, grossMinor: 900_000, depositPct: 25, depositMinor: 225_000, sentByName: 'Maren', paidAt: new Date(),
    }).returning();
    await db.insert(payments).values({ quoteId: q.id, studioId: w.owner.studioId, checkoutSessionId: 'cs_test_backup', amountMinor: 225_000, currency: 'GBP', status: 'paid', providerPaymentId: 'pi_test_backup', paidAt: new Date() });
    for (let i = 0; i < 3; i++) {
      const storedName = crypto.randomBytes(16).toString('hex');
      const file = path.join(uploadsDir, storedName.slice(0, 2), storedName);
      fs.mkdirSync(path.dirname(file), { recursive: true });
      fs.writeFileSync(file, crypto.randomBytes(2000 + i * 777));
      await db.insert(uploads).values({ layoutId: w.clientLayoutId, studioId: w.owner.studioId, storedName, fileName: `photo-${i}.png`, contentType: 'image/png', sizeBytes: 2000 + i * 777 });
    }
    expect(rev.letter).toBe('A');
    const stopSocket = await serveBackups(dataDir(DB), handle.dump!);

    const rowsBefore = await tableContents(db);
    const filesBefore = fileHashes(uploadsDir);
    expect(Object.keys(filesBefore)).toHaveLength(3);
    expect(rowsBefore.payments).toMatch(/^1:/);

    const { file, manifest } = await backupDatabase({ db: DB });
    expect(manifest.source).toBe('running-app');
    expect(path.basename(file)).toMatch(/^baywright-backuptest-\d{8}T\d{6}Z\.tar\.gz$/);
    expect((fs.statSync(file).mode & 0o077)).toBe(0);

    // The app still holds the folder: restoring under it is refused and changes nothing.
    await expect(restoreDatabase({ db: DB, archive: file })).rejects.toThrow(/already open in process/);
    expect(await tableContents(db)).toEqual(rowsBefore);

    // A write after the backup is not in it.
    await db.insert(layouts).values({ studioId: w.owner.studioId, name: 'Made after the backup', doc: (await db.select({ doc: layouts.doc }).from(layouts).limit(1))[0].doc });

    await stopSocket();
    await closeDb();
    fs.rmSync(dataDir(DB), { recursive: true, force: true });
    fs.rmSync(uploadsDir, { recursive: true, force: true });

    const restored = await restoreDatabase({ db: DB, archive: file });
    expect(restored.manifest.db).toBe(DB);
    const again = await openPglite(dataDir(DB), { thread: true });
    try {
      expect(await tableContents(again.db)).toEqual(rowsBefore);
      expect(fileHashes(uploadsDir)).toEqual(filesBefore);
    } finally {
      await again.close();
    }
  }, 400_000);

  it('refuses a damaged archive and leaves the database as it was', async () => {
    const archive = path.join(root, 'damaged.tar.gz');
    fs.writeFileSync(archive, crypto.randomBytes(500));
    const before = fs.readdirSync(dataDir(DB)).length;
    await expect(restoreDatabase({ db: DB, archive })).rejects.toThrow();
    expect(fs.readdirSync(dataDir(DB)).length).toBe(before);
  });
});
