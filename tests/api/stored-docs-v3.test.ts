// A layout stored in schema version 3, before the bay held its windows, roof openings and body
// points, read back through the API: the document answers in the current version with an empty
// list of openings and everything else exactly as stored, its checks measure the same, and reads
// do not rewrite the stored row.
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

/** Written by hand as version 3 stored it (invented figures): per-arrangement surfaces, a mount, doors, no openings. */
const versionThree = {
  schemaVersion: 3,
  name: 'Stored panel van',
  bay: {
    length: 3000, width: 1800, height: 1900,
    wheelArches: [{ side: 'left', x: 1600, length: 900, width: 200, height: 300 }],
    doors: [{ id: 'slide', wall: 'right', offset: 150, width: 1100 }, { id: 'rear', wall: 'rear', offset: 0, width: 1800 }],
    bulkhead: true,
    cabSeats: 2,
  },
  buildUp: { floor: [{ material: 'Plywood', thickness: 12 }], roof: [], walls: [] },
  occupants: { standingHeight: 1800, sleepers: [1800] },
  modules: [
    { id: 'bench', kind: 'bench-seat', x: 1000, y: 0, length: 1900, width: 600, elevation: 0, height: 460, facing: 'right', arrangements: ['lounge', 'sleep'], surfaces: { lounge: 'seat', sleep: 'sleep' } },
    { id: 'spare', kind: 'spare-wheel', x: 2200, y: 600, length: 700, width: 700, elevation: 0, height: 250, facing: 'front', arrangements: ['travel', 'lounge', 'sleep'], mount: 'under-floor' },
  ],
};

beforeAll(async () => {
  db = await useFreshDb();
  w = await buildWorld(db);
  const [row] = await db.insert(layouts).values({ studioId: w.owner.studioId, name: versionThree.name, doc: structuredClone(versionThree) as never }).returning({ id: layouts.id });
  layoutId = row.id;
  clearDocCache();
});

describe('a version-3 document, before openings, read back', () => {
  it('answers the current version with no openings and everything else as stored', async () => {
    const res = await call(one.GET, { params: { id: layoutId }, as: w.designer });
    expect(res.status).toBe(200);
    const doc = res.body.doc;
    expect(doc.schemaVersion).toBe(4);
    expect(doc.bay.openings).toEqual([]);
    const { openings: _none, ...bay } = doc.bay;
    expect(bay).toEqual(versionThree.bay);
    expect(doc.modules).toEqual(versionThree.modules);
    expect({ ...doc, schemaVersion: 3, bay: versionThree.bay }).toEqual(versionThree);
  });

  it('its checks measure the same bed: the 1900 × 600 bench', async () => {
    const res = await call(checks.GET, { params: { id: layoutId }, as: w.designer });
    expect(res.status).toBe(200);
    const length = res.body.findings.find((f: { id: string }) => f.id === 'sleep.length');
    expect(length.moduleIds).toEqual(['bench']);
    expect(length.measured).toBe(1900);
    // Nothing is drawn, so no measured clearance finding appears.
    expect(res.body.findings.filter((f: { id: string }) => f.id.startsWith('clearance.'))).toEqual([]);
  });

  it('reads do not rewrite the stored row', async () => {
    const [stored] = await db.select({ doc: layouts.doc }).from(layouts).where(eq(layouts.id, layoutId));
    expect(stored.doc).toEqual(versionThree);
  });
});
