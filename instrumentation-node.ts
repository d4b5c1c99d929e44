/**
 * Server start (Node runtime only, never during `next build`): installs the connection policy
 * (lib/auth/address.ts: client addresses, HTTPS, HSTS), opens the database at once, so a
 * second process on the same embedded-database folder stops with a clear message instead of
 * failing on its first request; then starts the local fakes of hosted services (mail, payments)
 * where this environment wants them.
 */
import { installConnectionPolicy } from './lib/auth/address';
import { DatabaseLockedError, getHandle } from './db/client';
import { startLocalServices } from './lib/fakes/local-services';

export async function startServer(): Promise<void> {
  // First: every request's client address and scheme come from its connection (or a trusted proxy).
  installConnectionPolicy();
  try {
    await getHandle();
  } catch (err) {
    if (err instanceof DatabaseLockedError) {
      console.error(`[baywright] ${err.message}`);
      process.exit(1);
    }
    throw err;
  }
  await startLocalServices();
  // Upload files whose layout was deleted (the rows go by cascade) are swept in the background.
  void import('./db/uploads')
    .then((m) => m.sweepOrphanUploads())
    .then((r) => r.removed && console.log(`[baywright] removed ${r.removed} stored upload file(s) no layout uses any more`))
    .catch((err) => console.error('[baywright] the upload sweep failed', err));
}
