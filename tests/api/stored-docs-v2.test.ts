// A layout stored in schema version 2, when a module had one `surface` for every arrangement, read
// back through the API: the document answers in the current version with that surface set in every
// arrangement the module is present in, its checks measure the same bed as before, and reads do not
// rewrite the stored row.
import { beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import * as one from '@/app/api/layouts/[id]/route';
import * as checks from '@/app/api/layouts/[id]/checks/route';
import { layouts } from '@/db/schema';
import { clearDocCache } from '@/db/layouts';
import type { Db } from '@/db/client';
import { useFreshDb } from '../helpers/db';
import { call } from '../helpers/http';
import { buildWorld, type World } from '../helpers/world';

let db: Db;
let w: World;
let layoutId: string;

/** Written by hand as version 2 stored it (invented figures). */
const versionTwo = {
  schemaVersion: 2,
  name: 'Stored bench van',
  bay: { length: 3000, width: 1800, height: 1900, wheelArches: [], doors: [{ id: 'rear', wall: 'rear', offset: 0, width: 1800 }], bulkhead: true, cabSeats: 2 },
  buildUp: { floor: [], roof: [], walls: [] },
  occupants: { standingHeight: 1800, sleepers: [1800] },
  modules: [
    { id: 'bench', kind: 'bench-seat', x: 1000, y: 0, length: 1900, width: 600, elevation: 0, height: 460, facing: 'right', arrangements: ['lounge', 'sleep'], surface: 'sleep' },
    { id: 'table', kind: 'table', x: 1200, y: 700, length: 600, width: 400, elevation: 700, height: 30, facing: 'left', arrangements: ['lounge'], surface: 'counter' },
  ],
};

beforeAll(async () => {
  db = await useFreshDb();
  w = await buildWorld(db);
  const [row] = await db.insert(layouts).values({ studioId: w.owner.studioId, name: versionTwo.name, doc: structuredClone(versionTwo) as never }).returning({ id: layouts.id });
  layoutId = row.id;
  clearDocCache();
});

describe('a version-2 document with one surface per module, read back', () => {
  it('answers the current version with the surface in every arrangement the module is in', async () => {
    const res = await call(one.GET, { params: { id: layoutId }, as: w.designer });
    expect(res.status).toBe(200);
    expect(res.body.doc.schemaVersion).toBe(4);
    const [bench, table] = res.body.doc.modules;
    expect(bench.surfaces).toEqual({ lounge: 'sleep', sleep: 'sleep' });
    expect(bench.surface).toBeUndefined();
    expect(table.surfaces).toEqual({ lounge: 'counter' });
    expect({ ...bench, surfaces: undefined }).toEqual({ ...versionTwo.modules[0], surface: undefined, surfaces: undefined });
  });

  it('its checks measure the same bed: the 1900 × 600 bench', async () => {
    const res = await call(checks.GET, { params: { id: layoutId }, as: w.designer });
    expect(res.status).toBe(200);
    const length = res.body.findings.find((f: { id: string }) => f.id === 'sleep.length');
    expect(length.moduleIds).toEqual(['bench']);
    expect(length.measured).toBe(1900);
  });

  it('reads do not rewrite the stored row', async () => {
    const [stored] = await db.select({ doc: layouts.doc }).from(layouts).where(eq(layouts.id, layoutId));
    expect(stored.doc).toEqual(versionTwo);
  });
});
