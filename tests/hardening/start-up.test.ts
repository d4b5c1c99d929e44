// Server start-up (instrumentation-node.ts): the embedded database opens in the background, so
// start-up — and with it the first page that reads no data — does not wait the second PGlite
// takes; a database that cannot be opened still stops the server, saying why (fail closed).
import { afterEach, describe, expect, it, vi } from 'vitest';

type Exit = ReturnType<typeof vi.spyOn>;

afterEach(() => {
  vi.doUnmock('@/db/client');
  vi.doUnmock('@/server/local-mode');
  vi.doUnmock('@/db/uploads');
  vi.doUnmock('@/lib/workers/pool');
  vi.restoreAllMocks();
  vi.unstubAllEnvs();
  vi.resetModules();
});

/** startServer with the database handle, the local fakes and the upload sweep stood in for. */
async function startServerWith(getHandle: (client: typeof import('@/db/client')) => Promise<unknown>) {
  vi.resetModules();
  vi.stubEnv('AUTH_SECRET', 'start-up-test-secret-of-more-than-32-characters');
  vi.doMock('@/db/client', async (actual) => {
    const client = await actual<typeof import('@/db/client')>();
    return { ...client, getHandle: () => getHandle(client) };
  });
  vi.doMock('@/server/local-mode', () => ({ startLocalStandIns: async () => {} }));
  const sweep = vi.fn(async () => ({ removed: 0 }));
  vi.doMock('@/db/uploads', () => ({ sweepOrphanUploads: sweep }));
  const warm = vi.fn();
  vi.doMock('@/lib/workers/pool', () => ({ workPool: () => ({ warm }) }));
  const prime = vi.fn(async () => {});
  vi.doMock('@/server/api/checks-on-open', () => ({ primeChecks: prime }));
  const { setLogSink } = await import('@/lib/log');
  const lines: string[] = [];
  setLogSink((l) => lines.push(l));
  const exit: Exit = vi.spyOn(process, 'exit').mockImplementation((() => undefined) as never);
  const { startServer } = await import('@/instrumentation-node');
  return { startServer, lines, exit, sweep, warm, prime };
}

describe('server start-up', () => {
  it('does not wait for the database to open; the upload sweep and the work pool start once it has', async () => {
    let open!: (h: unknown) => void;
    const opening = new Promise((resolve) => (open = resolve));
    const { startServer, exit, sweep, warm, prime } = await startServerWith(() => opening);
    await startServer(); // resolves while the database is still opening
    expect(sweep).not.toHaveBeenCalled();
    expect(warm).not.toHaveBeenCalled();
    expect(prime).not.toHaveBeenCalled();
    open({ kind: 'postgres', db: {}, close: async () => {} });
    await vi.waitFor(() => expect(sweep).toHaveBeenCalledTimes(1));
    await vi.waitFor(() => expect(warm).toHaveBeenCalledTimes(1));
    // Each thread then runs the checks once, so the first layout opened gets its findings with the page.
    await vi.waitFor(() => expect(prime).toHaveBeenCalledTimes(1));
    expect(exit).not.toHaveBeenCalled();
  });

  it('stops with "database locked" and the holder when another process has the folder', async () => {
    const { startServer, lines, exit, sweep, warm } = await startServerWith((client) => Promise.reject(new client.DatabaseLockedError('data/dev', 4242)));
    await startServer();
    await vi.waitFor(() => expect(exit).toHaveBeenCalledWith(1));
    const entry = JSON.parse(lines.find((l) => l.includes('database locked'))!);
    expect(entry).toMatchObject({ level: 'error', event: 'database locked' });
    expect(entry.message).toMatch(/already open in process 4242/);
    expect(sweep).not.toHaveBeenCalled();
    expect(warm).not.toHaveBeenCalled();
  });

  it('stops, saying it cannot open the database, on any other failure to open', async () => {
    const { startServer, lines, exit } = await startServerWith(() => Promise.reject(new Error('the data folder is damaged')));
    await startServer();
    await vi.waitFor(() => expect(exit).toHaveBeenCalledWith(1));
    expect(lines.some((l) => JSON.parse(l).event === 'cannot open the database')).toBe(true);
  });
});
