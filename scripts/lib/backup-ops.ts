/**
 * `npm run db:backup` and `npm run db:restore` for the embedded database of BAYWRIGHT_DB (see
 * lib/backup/archive.ts for the format and how a running app is asked for its copy). Used by the
 * scripts and the backup test.
 */
import fs from 'node:fs';
import path from 'node:path';
import { acquireLock, dataDir, DatabaseLockedError, lockHolder, openPglite } from '../../db/client';
import { dataRoot } from '../../lib/data-root';
import { dumpFromRunningApp, readBackup, replaceFolder, stamp, writeBackup, type Manifest } from '../../lib/backup/archive';

function uploadsDirOf(db: string): string {
  return path.join(dataRoot(), 'uploads', db);
}

export async function backupDatabase(options: { db: string; outDir?: string }): Promise<{ file: string; manifest: Manifest }> {
  const dir = dataDir(options.db);
  if (!fs.existsSync(dir)) throw new Error(`There is no embedded database at ${dir}.`);
  return writeBackup({
    dir,
    db: options.db,
    uploadsDir: uploadsDirOf(options.db),
    outDir: options.outDir ?? path.join(dataRoot(), 'backups'),
    dump: async () => {
      const live = await dumpFromRunningApp(dir);
      if (live) return { bytes: live, source: 'running-app' };
      // No app answers: open the folder ourselves. The pid lock stops this if an app holds it without answering.
      const handle = await openPglite(dir, { migrate: false });
      try {
        return { bytes: await handle.dump!(), source: 'closed-folder' };
      } finally {
        await handle.close();
      }
    },
  });
}

export async function restoreDatabase(options: { db: string; archive: string }): Promise<{ manifest: Manifest; movedAside: string[] }> {
  const dir = dataDir(options.db);
  // Refuses (DatabaseLockedError) while an app, or anything else (this process too), holds the folder.
  const holder = lockHolder(dir);
  if (holder) throw new DatabaseLockedError(dir, holder);
  const release = acquireLock(dir);
  try {
    const { staging, manifest } = readBackup(options.archive);
    try {
      const suffix = stamp();
      const movedAside: string[] = [];
      const movedDb = replaceFolder(dir, null, suffix);
      if (movedDb) movedAside.push(movedDb);
      const { PGlite } = await import('@electric-sql/pglite');
      const pg = await PGlite.create({ dataDir: dir, loadDataDir: new Blob([fs.readFileSync(path.join(staging, 'database.tar.gz'))]) });
      await pg.close();
      const movedUploads = replaceFolder(uploadsDirOf(options.db), path.join(staging, 'uploads'), suffix);
      if (movedUploads) movedAside.push(movedUploads);
      return { manifest, movedAside };
    } finally {
      fs.rmSync(staging, { recursive: true, force: true });
    }
  } finally {
    release();
  }
}
