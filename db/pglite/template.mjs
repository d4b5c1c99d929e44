// Database templates kept beside the installed packages (node_modules/.cache/baywright/), so a
// new PGlite database starts from a copy instead of initdb (3–5 s on a 2-core machine):
//  - the empty cluster: a freshly initialised cluster with no schema, for new data folders
//    (`npm install` makes it, postinstall); migrations still run on it;
//  - the migrated template for tests: that cluster with every migration in drizzle/ applied,
//    made by the first test run and reused while PGlite's version and the migrations' contents
//    stay the same (both are in its name).
// A cluster only opens in the PostgreSQL build that made it, hence PGlite's version in the names.
import crypto from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');
const cacheDir = () => path.join(root, 'node_modules/.cache/baywright');

function pgliteVersion() {
  return JSON.parse(fs.readFileSync(path.join(root, 'node_modules/@electric-sql/pglite/package.json'), 'utf8')).version;
}

export function templatePath() {
  return path.join(cacheDir(), `pglite-${pgliteVersion()}-empty.tar.gz`);
}

/** The template's bytes when the folder is new and a template exists; otherwise undefined. */
export function templateFor(dataDir) {
  if (fs.existsSync(path.join(dataDir, 'PG_VERSION'))) return undefined;
  return emptyCluster();
}

/** The empty cluster's bytes for `PGlite.create({ loadDataDir })`, or undefined without one (then initdb runs). */
export function emptyCluster() {
  try {
    return new Blob([fs.readFileSync(templatePath())]);
  } catch {
    return undefined;
  }
}

/** Writes `bytes` to `target` whole or not at all (two processes may race to make the same file). */
function writeAtomically(target, bytes) {
  fs.mkdirSync(path.dirname(target), { recursive: true });
  const partial = `${target}.${process.pid}.part`;
  fs.writeFileSync(partial, bytes);
  fs.renameSync(partial, target);
}

/** A digest of every file in the migrations folder: names and contents. */
function migrationsDigest(migrationsFolder) {
  const hash = crypto.createHash('sha256');
  const walk = (dir) => {
    for (const entry of fs.readdirSync(dir, { withFileTypes: true }).sort((a, b) => a.name.localeCompare(b.name))) {
      const full = path.join(dir, entry.name);
      if (entry.isDirectory()) walk(full);
      else hash.update(path.relative(migrationsFolder, full)).update('\0').update(fs.readFileSync(full)).update('\0');
    }
  };
  walk(migrationsFolder);
  return hash.digest('hex').slice(0, 16);
}

export function migratedTemplatePath(migrationsFolder = path.join(root, 'drizzle')) {
  return path.join(cacheDir(), `pglite-${pgliteVersion()}-migrated-${migrationsDigest(migrationsFolder)}.tar`);
}

/**
 * The path of an uncompressed tarball of a migrated, empty database, made now if there is none
 * for these migrations. Tests clone it (`loadDataDir`) instead of migrating their own.
 */
export async function migratedTemplate(migrationsFolder = path.join(root, 'drizzle')) {
  const target = migratedTemplatePath(migrationsFolder);
  if (fs.existsSync(target)) return { file: target, made: false };
  const { PGlite } = await import('@electric-sql/pglite');
  const { drizzle } = await import('drizzle-orm/pglite');
  const { migrate } = await import('drizzle-orm/pglite/migrator');
  const db = await PGlite.create({ loadDataDir: emptyCluster() });
  try {
    await migrate(drizzle(db), { migrationsFolder });
    const dump = await db.dumpDataDir('none');
    writeAtomically(target, Buffer.from(await dump.arrayBuffer()));
  } finally {
    await db.close();
  }
  // Templates of older migrations are not used again; leave a day for a run still reading one.
  for (const name of fs.readdirSync(cacheDir())) {
    const file = path.join(cacheDir(), name);
    if (/-migrated-[0-9a-f]+\.tar$/.test(name) && file !== target && Date.now() - fs.statSync(file).mtimeMs > 86_400_000) fs.rmSync(file, { force: true });
  }
  return { file: target, made: true };
}

async function makeEmptyCluster() {
  const target = templatePath();
  if (fs.existsSync(target)) return console.log(`PGlite template is there: ${path.relative(root, target)}`);
  const { PGlite } = await import('@electric-sql/pglite');
  const scratch = fs.mkdtempSync(path.join(os.tmpdir(), 'baywright-template-'));
  try {
    const db = await PGlite.create({ dataDir: path.join(scratch, 'db') });
    const dump = await db.dumpDataDir('gzip');
    await db.close();
    writeAtomically(target, Buffer.from(await dump.arrayBuffer()));
    console.log(`Made the PGlite template: ${path.relative(root, target)}`);
  } finally {
    fs.rmSync(scratch, { recursive: true, force: true });
  }
}

if (process.argv[1] && path.resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  makeEmptyCluster().catch((err) => {
    // Never fail an install over it: new folders are then initialised without it.
    console.warn(`Could not make the PGlite template (${err.message}); new data folders will take longer to create.`);
  });
}
