// The server's embedded database on its own thread: the same drizzle behaviour as in-thread —
// rows, transactions that commit or roll back, SQLSTATE codes for unique violations — and the
// data is still there after closing and opening the folder again.
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { eq, sql } from 'drizzle-orm';
import { afterAll, describe, expect, it } from 'vitest';
import { openPglite, type Db } from '@/db/client';
import { studios, users } from '@/db/schema';
import { isUniqueViolation } from '@/db/sharing/pg-errors';
import { templateFor, templatePath } from '@/db/pglite/template.mjs';

const root = fs.mkdtempSync(path.join(os.tmpdir(), 'baywright-thread-'));
const dir = path.join(root, 'db');
afterAll(() => fs.rmSync(root, { recursive: true, force: true }));

async function addUser(db: Db, email: string) {
  const [row] = await db.insert(users).values({ email, name: 'Thread Test', passwordHash: 'x' }).returning({ id: users.id, createdAt: users.createdAt });
  return row;
}

/** Opens the folder on a thread, runs `fn`, and always closes it again. */
async function onThread(fn: (db: Db) => Promise<void>): Promise<void> {
  const handle = await openPglite(dir, { thread: true });
  try {
    await fn(handle.db);
  } finally {
    await handle.close();
  }
}

describe('PGlite in a worker thread', () => {
  it('opens and migrates a new folder, and answers typed rows', async () => {
    await onThread(async (db) => {
      const row = await addUser(db, 'one@thread.test');
      expect(row.createdAt).toBeInstanceOf(Date);
      const [found] = await db.select().from(users).where(eq(users.id, row.id));
      expect(found.email).toBe('one@thread.test');
      const raw = await db.execute(sql`select count(*)::int as n from users`);
      expect((raw as unknown as { rows: unknown[] }).rows).toEqual([{ n: 1 }]);
    });
  }, 60_000);

  it('commits a transaction that returns and rolls back one that throws', async () => {
    await onThread(async (db) => {
      await db.transaction(async (tx) => {
        await tx.insert(studios).values({ name: 'Kept Studio' });
      });
      await expect(
        db.transaction(async (tx) => {
          await tx.insert(studios).values({ name: 'Dropped Studio' });
          throw new Error('changed my mind');
        }),
      ).rejects.toThrow('changed my mind');
      const names = (await db.select({ name: studios.name }).from(studios)).map((s) => s.name);
      expect(names).toContain('Kept Studio');
      expect(names).not.toContain('Dropped Studio');
    });
  }, 60_000);

  it('keeps the SQLSTATE of a unique violation, and the rows of earlier runs', async () => {
    await onThread(async (db) => {
      let error: unknown;
      try {
        await addUser(db, 'one@thread.test');
      } catch (err) {
        error = err;
      }
      expect(isUniqueViolation(error)).toBe(true);
      expect(String((error as Error).stack ?? '')).not.toContain('thread.mjs');
    });
  }, 60_000);
});

describe('the install-time template for new folders', () => {
  it('is offered for a folder without a cluster and never over an existing one', () => {
    expect(fs.existsSync(templatePath())).toBe(true); // made by npm install (postinstall)
    expect(templateFor(path.join(root, 'not-there-yet'))).toBeInstanceOf(Blob);
    expect(templateFor(dir)).toBeUndefined(); // the folder the tests above created
  });
});
