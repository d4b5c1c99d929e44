/**
 * A fresh database for one test file. By default the migrated PGlite template cloned into
 * memory; with TEST_DATABASE_URL set, a new database on that PostgreSQL server, migrated through
 * node-postgres — the same schema and migrations the app uses in server mode. Either way it is
 * handed to the app's db module, so route handlers and data functions use it.
 */
import fs from 'node:fs';
import path from 'node:path';
import crypto from 'node:crypto';
import { PGlite } from '@electric-sql/pglite';
import { drizzle as drizzlePglite } from 'drizzle-orm/pglite';
import * as schema from '../../db/schema';
import { withStatementCache } from '../../db/pglite/statements.mjs';
import { installDbHandle, closeDb, type Db } from '../../db/client';

export async function useFreshDb(): Promise<Db> {
  if (process.env.TEST_DATABASE_URL) return freshPostgres(process.env.TEST_DATABASE_URL);
  const file = process.env.BAYWRIGHT_TEST_TEMPLATE;
  if (!file) {
    throw new Error(
      'No database template: this test file opens a database but runs in the `pure` project. Take its folder or file out of PURE_FOLDERS / PURE_FILES in vitest.config.mts.',
    );
  }
  const client = await PGlite.create({ loadDataDir: new Blob([fs.readFileSync(file)]) });
  // Reads through the statement cache, as the app's own handles do (db/pglite/statements.mjs).
  const db = drizzlePglite({ client: withStatementCache(client) as never, schema }) as unknown as Db;
  installDbHandle({ db, kind: 'pglite', close: () => client.close() });
  return db;
}

async function freshPostgres(serverUrl: string): Promise<Db> {
  const { Pool, Client } = await import('pg');
  const { drizzle } = await import('drizzle-orm/node-postgres');
  const { migrate } = await import('drizzle-orm/node-postgres/migrator');
  const name = `bw_test_${crypto.randomBytes(6).toString('hex')}`;
  const admin = new Client({ connectionString: serverUrl });
  await admin.connect();
  await admin.query(`CREATE DATABASE ${name}`);
  await admin.end();
  const url = new URL(serverUrl);
  url.pathname = `/${name}`;
  const pool = new Pool({ connectionString: url.toString(), max: 5 });
  const db = drizzle(pool, { schema });
  await migrate(db, { migrationsFolder: path.join(process.cwd(), 'drizzle') });
  installDbHandle({
    db: db as unknown as Db,
    kind: 'postgres',
    close: async () => {
      await pool.end();
      const cleanup = new Client({ connectionString: serverUrl });
      await cleanup.connect();
      await cleanup.query(`DROP DATABASE IF EXISTS ${name}`);
      await cleanup.end();
    },
  });
  return db as unknown as Db;
}

export { closeDb };
