// A second process on the same embedded-database folder must fail loudly, not lose rows.
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { spawnSync } from 'node:child_process';
import { afterAll, describe, expect, it } from 'vitest';
import { acquireLock, DatabaseLockedError } from '@/db/client';

const root = fs.mkdtempSync(path.join(os.tmpdir(), 'baywright-lock-'));
afterAll(() => fs.rmSync(root, { recursive: true, force: true }));

describe('the pid lock beside the data folder', () => {
  it('refuses a folder held by another live process, with a clear message', () => {
    const dir = path.join(root, 'held');
    // The vitest runner itself is a live process other than this worker.
    fs.writeFileSync(`${dir}.pid`, String(process.ppid));
    let error: unknown;
    try {
      acquireLock(dir);
    } catch (err) {
      error = err;
    }
    expect(error).toBeInstanceOf(DatabaseLockedError);
    expect((error as Error).message).toMatch(/already open in process \d+/);
  });

  it('takes over a lock left by a process that died', () => {
    const dir = path.join(root, 'stale');
    fs.writeFileSync(`${dir}.pid`, '999999');
    const release = acquireLock(dir);
    expect(fs.readFileSync(`${dir}.pid`, 'utf8')).toBe(String(process.pid));
    release();
    expect(fs.existsSync(`${dir}.pid`)).toBe(false);
  });

  it('makes a second real process fail fast when it opens a folder in use', () => {
    const dir = path.join(root, 'live');
    const release = acquireLock(dir);
    const script = `import('./db/client.ts').then((m) => (m.openPglite ?? m.default.openPglite)(${JSON.stringify(dir)}))
      .then(() => { console.log('opened'); process.exit(0); })
      .catch((e) => { console.log(e.message); process.exit(3); });`;
    const started = Date.now();
    const second = spawnSync('npx', ['tsx', '--conditions=react-server', '-e', script], { encoding: 'utf8' });
    release();
    expect(second.stdout).toMatch(/already open in process \d+/);
    expect(second.status).toBe(3);
    expect(Date.now() - started).toBeLessThan(15_000);
  });
});
