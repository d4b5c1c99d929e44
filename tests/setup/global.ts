/**
 * Builds one migrated PGlite database per test run and dumps it to a file; each test file
 * clones it (loadDataDir, ~0.4 s) instead of migrating its own (STACK.md).
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

export default async function setup() {
  const { PGlite } = await import('@electric-sql/pglite');
  const { drizzle } = await import('drizzle-orm/pglite');
  const { migrate } = await import('drizzle-orm/pglite/migrator');
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'baywright-template-'));
  const client = await PGlite.create();
  await migrate(drizzle(client), { migrationsFolder: path.join(process.cwd(), 'drizzle') });
  const dump = await client.dumpDataDir('none');
  const file = path.join(dir, 'template.tar');
  fs.writeFileSync(file, Buffer.from(await dump.arrayBuffer()));
  await client.close();
  process.env.BAYWRIGHT_TEST_TEMPLATE = file;
  return () => fs.rmSync(dir, { recursive: true, force: true });
}
