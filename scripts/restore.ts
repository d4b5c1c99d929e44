// `npm run db:restore <archive>`: puts a backup back as the embedded database BAYWRIGHT_DB names
// (default dev) and its uploads. Refuses while an app holds the folder; what it replaces is moved
// aside (…replaced-<time>), never deleted.
import { restoreDatabase } from './lib/backup-ops';

const db = process.env.BAYWRIGHT_DB ?? 'dev';
const archive = process.argv[2];
if (!archive) {
  console.error('Usage: npm run db:restore <archive.tar.gz>   (BAYWRIGHT_DB names the database, default dev)');
  process.exit(2);
}
restoreDatabase({ db, archive })
  .then(({ manifest, movedAside }) => {
    console.log(`Restored "${db}" from the backup taken ${manifest.takenAt}.`);
    for (const m of movedAside) console.log(`The previous copy was kept at ${m}`);
    process.exit(0);
  })
  .catch((err) => {
    console.error(`Restore refused or failed: ${err instanceof Error ? err.message : err}`);
    process.exit(1);
  });
