// Applies the drizzle migrations to the database BAYWRIGHT_DB (or DATABASE_URL) names.
import { closeDb, getHandle, dataDir } from '../db/client';

async function main() {
  const handle = await getHandle(); // opening migrates
  console.log(`Migrated ${handle.kind === 'postgres' ? 'the PostgreSQL server at DATABASE_URL' : dataDir()}.`);
  await closeDb();
}

main().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
