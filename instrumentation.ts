/**
 * Runs once when a Next server process starts (never in the browser, never during `next build`):
 * opens the database at once, so a second process on the same embedded-database folder stops
 * with a clear message instead of failing on its first request; then starts the local fakes of
 * hosted services (mail, payments) where this environment wants them.
 */
export async function register() {
  if (process.env.NEXT_RUNTIME !== 'nodejs') return;
  if (process.env.NEXT_PHASE === 'phase-production-build') return;
  const { getHandle, DatabaseLockedError } = await import('./db/client');
  try {
    await getHandle();
  } catch (err) {
    if (err instanceof DatabaseLockedError) {
      console.error(`[baywright] ${err.message}`);
      process.exit(1);
    }
    throw err;
  }
  const { startLocalServices } = await import('./lib/fakes/local-services');
  await startLocalServices();
}
