/**
 * Backups of the embedded database and the uploads folder, as one dated archive
 * (`baywright-<db>-<UTC time>.tar.gz`: `database.tar.gz` — PGlite's own dump of its folder —,
 * `uploads/`, `manifest.json`).
 *
 * A consistent copy needs the process that holds the folder: PGlite has no lock and no second
 * reader. A running app therefore answers dump requests on a Unix socket beside its data folder
 * (`<folder>.backup.sock`, mode 0600: only the account that runs the app, which can read the
 * folder anyway, can connect; nothing listens on the network). The dump is taken between queries,
 * so it is the state of a moment, as after a clean crash. With no app running, the backup opens
 * the folder itself (taking the pid lock).
 *
 * Restore refuses while any process holds the folder (the pid lock), and moves what it replaces
 * aside rather than deleting it. Must never write outside the data root and the archive path.
 */
import fs from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';
import crypto from 'node:crypto';
import { spawnSync } from 'node:child_process';

export interface Manifest {
  format: 'baywright-backup/1';
  db: string;
  takenAt: string;
  /** How the database copy was made: by the running app, or by this script on a closed folder. */
  source: 'running-app' | 'closed-folder';
  files: { path: string; sha256: string; bytes: number }[];
}

export function backupSocketPath(dir: string): string {
  return `${dir}.backup.sock`;
}

/** Started by the server next to its open embedded database; returns a function that stops it. */
export function serveBackups(dir: string, dump: () => Promise<Uint8Array>): Promise<() => Promise<void>> {
  const socket = backupSocketPath(dir);
  fs.rmSync(socket, { force: true });
  const server = net.createServer((conn) => {
    conn.on('error', () => undefined);
    dump().then(
      (bytes) => conn.end(Buffer.concat([Buffer.from('OK\n'), Buffer.from(bytes)])),
      (err) => conn.end(`ERR ${err instanceof Error ? err.name : 'Error'}\n`),
    );
  });
  return new Promise((resolve, reject) => {
    const oldMask = process.umask(0o177);
    server.once('error', (err) => {
      process.umask(oldMask);
      reject(err);
    });
    server.listen(socket, () => {
      process.umask(oldMask);
      fs.chmodSync(socket, 0o600);
      resolve(() => new Promise<void>((done) => server.close(() => {
        fs.rmSync(socket, { force: true });
        done();
      })));
    });
  });
}

/** Asks the app that holds `dir` for a dump; null when no app answers on its socket. */
export function dumpFromRunningApp(dir: string): Promise<Uint8Array | null> {
  const socket = backupSocketPath(dir);
  if (!fs.existsSync(socket)) return Promise.resolve(null);
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    const conn = net.createConnection(socket);
    conn.on('data', (c) => chunks.push(c));
    conn.on('error', (err) => ((err as NodeJS.ErrnoException).code === 'ECONNREFUSED' || (err as NodeJS.ErrnoException).code === 'ENOENT' ? resolve(null) : reject(err)));
    conn.on('end', () => {
      const all = Buffer.concat(chunks);
      if (all.subarray(0, 3).toString() !== 'OK\n') return reject(new Error(`the running app could not make a copy: ${all.toString('utf8', 0, 200).trim()}`));
      resolve(new Uint8Array(all.subarray(3)));
    });
  });
}

function sha256(file: string): string {
  return crypto.createHash('sha256').update(fs.readFileSync(file)).digest('hex');
}

function listFiles(root: string): string[] {
  if (!fs.existsSync(root)) return [];
  const out: string[] = [];
  const walk = (d: string) => {
    for (const e of fs.readdirSync(d, { withFileTypes: true })) {
      const p = path.join(d, e.name);
      if (e.isDirectory()) walk(p);
      else if (e.isFile()) out.push(path.relative(root, p));
    }
  };
  walk(root);
  return out.sort();
}

function copyFiles(from: string, to: string, skip: Set<string> = new Set()): string[] {
  const copied: string[] = [];
  for (const rel of listFiles(from)) {
    if (skip.has(rel)) continue;
    fs.mkdirSync(path.dirname(path.join(to, rel)), { recursive: true });
    try {
      fs.copyFileSync(path.join(from, rel), path.join(to, rel));
      copied.push(rel);
    } catch (err) {
      if ((err as NodeJS.ErrnoException).code !== 'ENOENT') throw err; // removed meanwhile: its row went first
    }
  }
  return copied;
}

function tar(args: string[]): void {
  const r = spawnSync('tar', args, { encoding: 'utf8' });
  if (r.status !== 0) throw new Error(`tar ${args[0]} failed: ${r.stderr || r.error?.message}`);
}

export function stamp(date = new Date()): string {
  return date.toISOString().replace(/[-:]/g, '').replace(/\.\d+Z$/, 'Z');
}

/**
 * Writes the archive. Uploaded files are immutable and named at random; a row is deleted before
 * its file. So: copy the files, take the database copy, copy the files that appeared meanwhile —
 * every file a row of the copy names is then in the archive.
 */
export async function writeBackup(options: { dir: string; db: string; uploadsDir: string; outDir: string; dump: () => Promise<{ bytes: Uint8Array; source: Manifest['source'] }> }): Promise<{ file: string; manifest: Manifest }> {
  const staging = fs.mkdtempSync(path.join(os.tmpdir(), 'baywright-backup-'));
  try {
    const uploadsCopy = path.join(staging, 'uploads');
    fs.mkdirSync(uploadsCopy);
    const first = copyFiles(options.uploadsDir, uploadsCopy);
    const { bytes, source } = await options.dump();
    copyFiles(options.uploadsDir, uploadsCopy, new Set(first));
    fs.writeFileSync(path.join(staging, 'database.tar.gz'), bytes);
    const files = listFiles(staging).map((rel) => ({ path: rel, sha256: sha256(path.join(staging, rel)), bytes: fs.statSync(path.join(staging, rel)).size }));
    const takenAt = new Date();
    const manifest: Manifest = { format: 'baywright-backup/1', db: options.db, takenAt: takenAt.toISOString(), source, files };
    fs.writeFileSync(path.join(staging, 'manifest.json'), JSON.stringify(manifest, null, 2));
    fs.mkdirSync(options.outDir, { recursive: true });
    const file = path.join(options.outDir, `baywright-${options.db}-${stamp(takenAt)}.tar.gz`);
    tar(['-czf', file, '-C', staging, '.']);
    fs.chmodSync(file, 0o600);
    return { file, manifest };
  } finally {
    fs.rmSync(staging, { recursive: true, force: true });
  }
}

/** Unpacks and checks an archive against its manifest; the caller removes `staging`. */
export function readBackup(archive: string): { staging: string; manifest: Manifest } {
  const staging = fs.mkdtempSync(path.join(os.tmpdir(), 'baywright-restore-'));
  tar(['-xzf', archive, '-C', staging, '--no-same-owner', '--no-same-permissions']);
  const manifest = JSON.parse(fs.readFileSync(path.join(staging, 'manifest.json'), 'utf8')) as Manifest;
  if (manifest.format !== 'baywright-backup/1') throw new Error(`${archive} is not a Baywright backup`);
  for (const f of manifest.files) {
    const p = path.resolve(staging, f.path);
    if (!p.startsWith(staging + path.sep)) throw new Error(`the archive names a file outside itself: ${f.path}`);
    if (!fs.existsSync(p) || sha256(p) !== f.sha256) throw new Error(`the archive is damaged: ${f.path} does not match its checksum`);
  }
  return { staging, manifest };
}

/** Moves `target` aside (never deletes it) and puts `source` in its place. */
export function replaceFolder(target: string, source: string | null, suffix: string): string | null {
  let moved: string | null = null;
  if (fs.existsSync(target)) {
    moved = `${target}.replaced-${suffix}`;
    fs.renameSync(target, moved);
  }
  if (source) {
    fs.mkdirSync(path.dirname(target), { recursive: true });
    fs.cpSync(source, target, { recursive: true });
  }
  return moved;
}
