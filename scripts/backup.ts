// `npm run db:backup [out-folder]`: one dated archive of the embedded database BAYWRIGHT_DB names
// (default dev) and its uploads, taken while the app runs (or with it stopped).
import { backupDatabase } from './lib/backup-ops';

const db = process.env.BAYWRIGHT_DB ?? 'dev';
if (process.env.DATABASE_URL) {
  console.error('DATABASE_URL points at a PostgreSQL server: back it up with pg_dump (and restore with pg_restore), and copy the uploads folder.');
  process.exit(1);
}
backupDatabase({ db, outDir: process.argv[2] })
  .then(({ file, manifest }) => {
    console.log(`Backed up "${db}" (${manifest.source === 'running-app' ? 'copy made by the running app' : 'folder was closed'}), ${manifest.files.length} files: ${file}`);
    process.exit(0);
  })
  .catch((err) => {
    console.error(`Backup failed: ${err instanceof Error ? err.message : err}`);
    process.exit(1);
  });
