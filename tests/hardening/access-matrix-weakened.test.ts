/**
 * The matrix must catch a weakened client rule. Here the one rule of who may read a layout
 * (`mayReadLayout` in db/access-rule.ts) is replaced by "any member of the studio", and the matrix's
 * own rows are run for its "another client of the same studio" caller: rows must now fail, the
 * layout read among them. Without that caller, this weakening passed the whole matrix.
 */
import os from 'node:os';
import fs from 'node:fs';
import path from 'node:path';
import { beforeAll, describe, expect, it, vi } from 'vitest';
import { useFreshDb } from '../helpers/db';
import { call } from '../helpers/http';
import { buildWorld } from '../helpers/world';
import { ROWS, type Fixture } from './access-rows';
import { discoverRoutes } from './discover-routes';

vi.mock('@/db/access-rule', async (importOriginal) => {
  const original = await importOriginal<typeof import('@/db/access-rule')>();
  return {
    ...original,
    // The weakening under test: a client of the studio reads every layout of the studio.
    mayReadLayout: (actor: { studioId: string }, layout: { studioId: string }) => layout.studioId === actor.studioId,
  };
});

let fx: Fixture;

beforeAll(async () => {
  process.env.BAYWRIGHT_DATA_ROOT = fs.mkdtempSync(path.join(os.tmpdir(), 'baywright-weakened-'));
  const db = await useFreshDb();
  fx = { world: await buildWorld(db), db };
});

describe('the access matrix with the client rule weakened', () => {
  it('fails for another client of the same studio, on the layout read and beyond', async () => {
    const failing: string[] = [];
    const routes = discoverRoutes();
    for (const row of ROWS) {
      const file = routes.find((r) => r.route === row.route)!.file;
      const mod = await import(/* @vite-ignore */ file);
      const res = await call(mod[row.method], { method: row.method, ...(await row.request(fx, 'otherClient')), as: fx.world.otherClient });
      const expected = row.expect.otherClient;
      if (!(Array.isArray(expected) ? expected : [expected]).includes(res.status)) failing.push(`${row.method} ${row.route}`);
    }
    expect(failing).toContain('GET /api/layouts/[id]');
    expect(failing).toContain('GET /api/layouts/[id]/revisions');
    expect(failing).toContain('GET /api/uploads/[uploadId]');
    expect(failing.length).toBeGreaterThan(5);
  }, 180_000); // every row of the matrix, one after another
});
