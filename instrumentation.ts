/**
 * Runs once when a Next server process starts. The work is Node-only, so it lives in
 * instrumentation-node.ts and is loaded only in the Node runtime.
 */
export async function register() {
  if (process.env.NEXT_RUNTIME !== 'nodejs') return;
  if (process.env.NEXT_PHASE === 'phase-production-build') return;
  const { startServer } = await import('./instrumentation-node');
  await startServer();
}
