/**
 * The `db` project's set-up: one migrated PGlite database, as a tarball each test file clones
 * (loadDataDir, ~0.4 s) instead of migrating its own (STACK.md). The tarball is kept under
 * node_modules/.cache/baywright/ and made again only when PGlite or a migration changes
 * (db/pglite/template.mjs), so only the first run after a change pays for migrating.
 * On a PostgreSQL server (TEST_DATABASE_URL, `npm run test:pg`) each file migrates its own
 * database there, and no template is needed.
 */
import path from 'node:path';
import { migratedTemplate } from '../../db/pglite/template.mjs';

export default async function setup() {
  if (process.env.TEST_DATABASE_URL) return;
  const started = Date.now();
  const { file, made } = await migratedTemplate(path.join(process.cwd(), 'drizzle'));
  if (made) console.log(`Made the migrated test database template in ${((Date.now() - started) / 1000).toFixed(1)} s (kept for later runs).`);
  process.env.BAYWRIGHT_TEST_TEMPLATE = file;
}
