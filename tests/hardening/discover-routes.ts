/** Every route handler under app/ (route groups left out of the path), for the access matrix. */
import fs from 'node:fs';
import path from 'node:path';

export function discoverRoutes(): { route: string; file: string }[] {
  const root = path.join(process.cwd(), 'app');
  const found: { route: string; file: string }[] = [];
  const walk = (dir: string) => {
    for (const entry of fs.readdirSync(dir, { withFileTypes: true })) {
      const p = path.join(dir, entry.name);
      if (entry.isDirectory()) walk(p);
      else if (entry.name === 'route.ts') {
        const route = '/' + path.relative(root, path.dirname(p)).split(path.sep).filter((s) => !/^\(.*\)$/.test(s)).join('/');
        found.push({ route, file: p });
      }
    }
  };
  walk(root);
  return found.sort((a, b) => a.route.localeCompare(b.route));
}
