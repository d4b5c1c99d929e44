// Migrates and seeds the demo workshop into the database BAYWRIGHT_DB (or DATABASE_URL) names.
import { closeDb, getDb } from '../db/client';
import { seedDemo } from './lib/seed-demo';
import { DEMO_ACCOUNTS } from '../lib/demo-accounts';

async function main() {
  const { created } = await seedDemo(await getDb());
  console.log(created ? 'Seeded the demo workshop.' : 'The demo workshop is already there; left as it is.');
  for (const a of DEMO_ACCOUNTS) console.log(`  ${a.what.padEnd(28)} ${a.email}  /  ${a.password}`);
  await closeDb();
}

main().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
