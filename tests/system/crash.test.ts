/**
 * Crash safety of the embedded database: the production server is killed with SIGKILL at random
 * moments while saves stream in, 20 times; after every restart the database opens and every
 * acknowledged save is there. A second server on the same folder stops at once with a clear
 * message.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { spawn } from 'node:child_process';
import { startTestServer, stopProcessGroup, type TestServer } from '../../scripts/lib/test-server';
import { DEMO_PASSWORD } from '../../lib/demo-accounts';
import { signInOverHttp } from './http-session';

const PORT = Number(process.env.SYSTEM_TEST_PORT ?? 3291);
const DB = 'system-crash';
let server: TestServer | undefined;

async function start(fresh = false) {
  server = await startTestServer({ port: PORT, db: DB, seed: fresh, fresh, quiet: true });
  return server;
}

afterAll(async () => {
  if (server) await stopProcessGroup(server.process);
});

describe('SIGKILL while saving', () => {
  let layoutId = '';
  let lastAcked = { version: 0, marker: 0 };

  beforeAll(async () => {
    const s = await start(true);
    const session = await signInOverHttp(s.url, 'ivo@saltmarsh.test', DEMO_PASSWORD);
    const list = await (await session.fetch('/api/layouts')).json();
    layoutId = list.layouts.find((l: { name: string }) => l.name.startsWith('Nair')).id;
  }, 120_000);

  it('keeps every acknowledged save across 20 kills', async () => {
    let rng = 20261202; // a fixed seed so a failure can be replayed
    const random = () => ((rng = (rng * 1103515245 + 12345) % 2 ** 31) / 2 ** 31);

    for (let round = 0; round < 20; round++) {
      const s = server!;
      const session = await signInOverHttp(s.url, 'ivo@saltmarsh.test', DEMO_PASSWORD);
      const current = await (await session.fetch(`/api/layouts/${layoutId}`)).json();
      // Everything acknowledged before the last kill is still there.
      expect(current.version).toBeGreaterThanOrEqual(lastAcked.version);
      if (lastAcked.version) {
        expect(current.doc.occupants.standingHeight).toBeGreaterThanOrEqual(1500);
        if (current.version === lastAcked.version) expect(current.doc.occupants.standingHeight).toBe(lastAcked.marker);
      }
      let version = current.version;
      let doc = current.doc;
      const killAt = Date.now() + 150 + random() * 900;
      let stopped = false;
      const saving = (async () => {
        while (!stopped) {
          const marker = 1500 + ((version * 7) % 900);
          const body = JSON.stringify({ doc: { ...doc, occupants: { ...doc.occupants, standingHeight: marker } } });
          try {
            const res = await session.fetch(`/api/layouts/${layoutId}`, { method: 'PUT', headers: { 'content-type': 'application/json', 'if-match': String(version) }, body });
            if (res.status !== 200) break;
            const saved = await res.json();
            version = saved.version;
            lastAcked = { version, marker };
            doc = { ...doc, occupants: { ...doc.occupants, standingHeight: marker } };
          } catch {
            break; // the server died mid-request: that save was never acknowledged
          }
        }
      })();
      await new Promise((r) => setTimeout(r, Math.max(0, killAt - Date.now())));
      process.kill(-s.process.pid!, 'SIGKILL');
      stopped = true;
      await saving;
      await new Promise<void>((r) => (s.process.exitCode !== null || s.process.signalCode ? r() : s.process.once('exit', () => r())));
      await start(false);
    }
    const final = await signInOverHttp(server!.url, 'ivo@saltmarsh.test', DEMO_PASSWORD);
    const stored = await (await final.fetch(`/api/layouts/${layoutId}`)).json();
    expect(lastAcked.version).toBeGreaterThan(20);
    expect(stored.version).toBeGreaterThanOrEqual(lastAcked.version);
    if (stored.version === lastAcked.version) expect(stored.doc.occupants.standingHeight).toBe(lastAcked.marker);
  }, 240_000);

  it('stops a second server on the same folder with a clear message', async () => {
    const second = spawn('npx', ['next', 'start', '-p', String(PORT + 1), '-H', '127.0.0.1'], {
      env: { ...process.env, BAYWRIGHT_DB: DB, NODE_ENV: 'production', BAYWRIGHT_LOCAL_FAKES: '1' },
      detached: true,
    });
    let output = '';
    second.stdout.on('data', (d) => (output += d));
    second.stderr.on('data', (d) => (output += d));
    const started = Date.now();
    const code = await new Promise<number | null>((resolve) => second.once('exit', (c) => resolve(c)));
    expect(code).not.toBe(0);
    expect(output).toMatch(/already open in process \d+/);
    expect(Date.now() - started).toBeLessThan(20_000);
  }, 30_000);
});
