/**
 * Server start (Node runtime only, never during `next build`): installs the connection policy
 * (server/auth/address.ts: client addresses, HTTPS, HSTS), opens the database at once, so a
 * second process on the same embedded-database folder stops with a clear message instead of
 * failing on its first request; then starts the local fakes of hosted services (mail, payments)
 * where this environment wants them.
 */
import { installConnectionPolicy } from './server/auth/address';
import { DatabaseLockedError, dataDir, getHandle } from './db/client';
import { startLocalStandIns } from './server/local-mode';
import { log } from './lib/log';
import { authSecret, MissingAuthSecret } from './server/auth/secret';

export async function startServer(): Promise<void> {
  // First: every request's client address and scheme come from its connection (or a trusted proxy).
  installConnectionPolicy();
  // Fail closed: production without AUTH_SECRET does not start (server/auth/secret).
  try {
    authSecret();
  } catch (err) {
    if (err instanceof MissingAuthSecret) {
      log.error('cannot start', { message: err.message });
      process.exit(1);
    }
    throw err;
  }
  try {
    await getHandle();
  } catch (err) {
    if (err instanceof DatabaseLockedError) {
      log.error('database locked', { message: err.message });
      process.exit(1);
    }
    throw err;
  }
  await startBackupSocket();
  await startLocalStandIns();
  // Upload files whose layout was deleted (the rows go by cascade) are swept in the background.
  void import('./db/uploads')
    .then((m) => m.sweepOrphanUploads())
    .then((r) => r.removed && log.info('removed stored upload files no layout uses any more', { removed: r.removed }))
    .catch((err) => log.error('the upload sweep failed', { error: err }));
}

/** The embedded database answers `npm run db:backup` on a socket beside its folder (lib/backup/archive.ts). */
async function startBackupSocket(): Promise<void> {
  const handle = await getHandle();
  if (handle.kind !== 'pglite' || !handle.dump) return;
  const { serveBackups } = await import('./lib/backup/archive');
  await serveBackups(dataDir(), handle.dump).catch((err) => log.error('backups cannot be taken while the app runs', { error: err }));
}
