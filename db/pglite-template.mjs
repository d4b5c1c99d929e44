// A freshly initialised, empty PGlite cluster kept as a tarball beside the installed packages.
// Creating a new data folder from it takes under a second; running initdb takes 3–5 s on a
// 2-core machine. It holds no schema (migrations still run) and is keyed by PGlite's version,
// because a cluster only opens in the PostgreSQL build that made it. `npm install` makes it
// (postinstall); without it a new folder is initialised the slow way.
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');

export function templatePath() {
  const pkg = JSON.parse(fs.readFileSync(path.join(root, 'node_modules/@electric-sql/pglite/package.json'), 'utf8'));
  return path.join(root, 'node_modules/.cache/baywright', `pglite-${pkg.version}-empty.tar.gz`);
}

/** The template's bytes when the folder is new and a template exists; otherwise undefined. */
export function templateFor(dataDir) {
  if (fs.existsSync(path.join(dataDir, 'PG_VERSION'))) return undefined;
  try {
    return new Blob([fs.readFileSync(templatePath())]);
  } catch {
    return undefined;
  }
}

async function makeTemplate() {
  const target = templatePath();
  if (fs.existsSync(target)) return console.log(`PGlite template is there: ${path.relative(root, target)}`);
  const { PGlite } = await import('@electric-sql/pglite');
  const scratch = fs.mkdtempSync(path.join(os.tmpdir(), 'baywright-template-'));
  try {
    const db = await PGlite.create({ dataDir: path.join(scratch, 'db') });
    const dump = await db.dumpDataDir('gzip');
    await db.close();
    fs.mkdirSync(path.dirname(target), { recursive: true });
    const partial = `${target}.${process.pid}.part`;
    fs.writeFileSync(partial, Buffer.from(await dump.arrayBuffer()));
    fs.renameSync(partial, target); // whole or not at all
    console.log(`Made the PGlite template: ${path.relative(root, target)}`);
  } finally {
    fs.rmSync(scratch, { recursive: true, force: true });
  }
}

if (process.argv[1] && path.resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  makeTemplate().catch((err) => {
    // Never fail an install over it: new folders are then initialised without it.
    console.warn(`Could not make the PGlite template (${err.message}); new data folders will take longer to create.`);
  });
}
