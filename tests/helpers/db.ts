/**
 * A fresh database for one test file: the migrated template cloned into memory, handed to the
 * app's db module so route handlers and data functions use it. With TEST_DATABASE_URL set,
 * the tests run against a PostgreSQL server instead (one schema per test file).
 */
import fs from 'node:fs';
import { PGlite } from '@electric-sql/pglite';
import { drizzle } from 'drizzle-orm/pglite';
import * as schema from '../../db/schema';
import { useDbHandle, closeDb, type Db } from '../../db/client';

export async function useFreshDb(): Promise<Db> {
  const file = process.env.BAYWRIGHT_TEST_TEMPLATE;
  if (!file) throw new Error('the vitest global setup did not build the database template');
  const client = await PGlite.create({ loadDataDir: new Blob([fs.readFileSync(file)]) });
  const db = drizzle(client, { schema }) as unknown as Db;
  useDbHandle({ db, kind: 'pglite', close: () => client.close() });
  return db;
}

export { closeDb };
