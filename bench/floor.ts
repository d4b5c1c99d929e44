/**
 * The framework floor: what Next.js and React alone ship to a page, on this machine's versions.
 * Builds two throwaway apps with this project's node_modules in `.next-floor/` (ignored by git,
 * lint and the type check) and reads their route bundle stats:
 *  - `empty`: a root layout and a page that are server components only (no 'use client' anywhere);
 *  - `link`:  the same page with one `next/link`, which every page of ours carries.
 * A budget below the `empty` figure cannot be met by any page of this stack. Never part of the app.
 */
import fs from 'node:fs';
import path from 'node:path';
import { spawnSync } from 'node:child_process';
import { gzipKb, routeChunks } from './bundle-stats';

const ROOT = process.cwd();
const DIR = path.join(ROOT, '.next-floor');

const LAYOUT = `export default function RootLayout({ children }) {
  return <html lang="en"><body>{children}</body></html>;
}
`;
const PAGES = {
  empty: `export default function Page() { return <main><h1>Empty</h1><p>No client code.</p></main>; }\n`,
  link: `import Link from 'next/link';\nexport default function Page() { return <main><h1>Link</h1><Link href="/">home</Link></main>; }\n`,
};

export interface Floor {
  empty: number;
  link: number;
  nextVersion: string;
  reactVersion: string;
}

export function measureFloor(): Floor {
  const out: Partial<Record<keyof typeof PAGES, number>> = {};
  for (const [name, page] of Object.entries(PAGES) as [keyof typeof PAGES, string][]) {
    const app = path.join(DIR, name);
    fs.rmSync(app, { recursive: true, force: true });
    fs.mkdirSync(path.join(app, 'app'), { recursive: true });
    fs.writeFileSync(path.join(app, 'app', 'layout.jsx'), LAYOUT);
    fs.writeFileSync(path.join(app, 'app', 'page.jsx'), page);
    // Resolve packages from this project (one folder up the tree), as our own build does.
    fs.writeFileSync(path.join(app, 'next.config.mjs'), `export default { turbopack: { root: ${JSON.stringify(ROOT)} }, outputFileTracingRoot: ${JSON.stringify(ROOT)} };\n`);
    const built = spawnSync(process.execPath, [path.join(ROOT, 'node_modules/next/dist/bin/next'), 'build', app], {
      cwd: ROOT,
      stdio: 'pipe',
      env: { ...process.env, NEXT_TELEMETRY_DISABLED: '1', NEXT_DIST_DIR: '' },
    });
    if (built.status !== 0) throw new Error(`building the ${name} floor app failed:\n${String(built.stderr).slice(-2000)}`);
    const chunks = routeChunks(path.join(app, '.next'))['/'];
    out[name] = gzipKb(chunks.map((c) => path.join(app, c)));
  }
  const version = (pkg: string) => JSON.parse(fs.readFileSync(path.join(ROOT, 'node_modules', pkg, 'package.json'), 'utf8')).version as string;
  return { empty: out.empty!, link: out.link!, nextVersion: version('next'), reactVersion: version('react-dom') };
}

if (process.argv[1]?.endsWith('floor.ts')) console.log(measureFloor());
