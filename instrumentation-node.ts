/**
 * Server start (Node runtime only, never during `next build`): installs the connection policy
 * (server/auth/address.ts: client addresses, HTTPS, HSTS), starts opening the database, then
 * starts the local fakes of hosted services (mail, payments) where this environment wants them,
 * and the work pool's threads once the database is open.
 *
 * The embedded database takes about a second to open (PGlite starting on its own thread), so it
 * opens in the background: pages that read no data (sign-in, the start page) answer meanwhile,
 * and every query waits for that same opening (db/client.ts `getHandle`). A folder a second
 * process holds, or any other failure to open, still stops the server with a clear message.
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
  const opening = getHandle();
  const opened = opening.then(() => true, stopOnDatabaseError);
  void opened.then(startBackupSocket).catch((err) => log.error('backups cannot be taken while the app runs', { error: err }));
  // The work pool's threads start once the database is open (not competing with it for the cores),
  // and each runs the checks once, so the first layout opened gets its findings with the page.
  void opened
    .then(() => Promise.all([import('./lib/workers/pool'), import('./server/api/checks-on-open')]))
    .then(([pool, checks]) => {
      pool.workPool().warm();
      return checks.primeChecks();
    })
    .catch((err) => log.error('the work pool did not start', { error: err }));
  await startLocalStandIns();
  // Upload files whose layout was deleted (the rows go by cascade) are swept in the background.
  void opened
    .then(() => import('./db/uploads'))
    .then((m) => m.sweepOrphanUploads())
    .then((r) => r.removed && log.info('removed stored upload files no layout uses any more', { removed: r.removed }))
    .catch((err) => log.error('the upload sweep failed', { error: err }));
}

/** The database did not open: say why and stop the server (fail closed). */
function stopOnDatabaseError(err: unknown): never {
  if (err instanceof DatabaseLockedError) log.error('database locked', { message: err.message });
  else log.error('cannot open the database', { error: err });
  process.exit(1);
}

/** The embedded database answers `npm run db:backup` on a socket beside its folder (lib/backup/archive.ts). */
async function startBackupSocket(): Promise<void> {
  const handle = await getHandle();
  if (handle.kind !== 'pglite' || !handle.dump) return;
  const { serveBackups } = await import('./lib/backup/archive');
  await serveBackups(dataDir(), handle.dump).catch((err) => log.error('backups cannot be taken while the app runs', { error: err }));
}
