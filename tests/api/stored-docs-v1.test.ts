// A layout stored in schema version 1, when a module's `props` was a free bag of names, read back
// through the API: the document answers in the current version with each module's values typed by its kind —
// numbers typed as text read as numbers, yes/no typed as text as yes/no, names the kind does not
// declare and values outside their limits left out — and the stored row is not rewritten by reads.
import { beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import * as one from '@/app/api/layouts/[id]/route';
import * as checks from '@/app/api/layouts/[id]/checks/route';
import { layouts } from '@/db/schema';
import { clearDocCache } from '@/db/layouts';
import { starterLayout } from '@/lib/layout/templates';
import type { Db } from '@/db/client';
import { useFreshDb } from '../helpers/db';
import { call } from '../helpers/http';
import { buildWorld, type World } from '../helpers/world';

let db: Db;
let w: World;
let layoutId: string;

/** The starter rear-bed layout as version 1 stored it, with props a version-1 editor or file could hold. */
function versionOneDoc(): Record<string, unknown> {
  const doc = structuredClone(starterLayout('starter-rear-bed')!) as unknown as Record<string, any>;
  doc.schemaVersion = 1;
  doc.name = 'Free-bag van';
  const props: Record<string, Record<string, unknown>> = {
    fridge: { litres: '55', watts: 40, dutyCycle: 0.33, colour: 'white' },
    hob: { burners: 3, fuel: 'induction', notes: 'two-zone' },
    fresh: { litres: 70, fillLevel: 2 },
    gas: { cylinders: '2', cylinderKg: 6 },
    wardrobe: { shelves: 3, belted: 'true' },
    sink: { pumpWatts: 12 },
  };
  for (const m of doc.modules) if (props[m.id]) m.props = props[m.id];
  doc.modules.push({ id: 'seat-1', kind: 'seat', x: 1500, y: 100, length: 600, width: 550, elevation: 0, height: 1150, facing: 'front', arrangements: ['travel', 'lounge'], props: { belted: 'false', approved: true, headrest: 'yes' } });
  return doc;
}

beforeAll(async () => {
  db = await useFreshDb();
  w = await buildWorld(db);
  const [row] = await db.insert(layouts).values({ studioId: w.owner.studioId, name: 'Free-bag van', doc: versionOneDoc() as never }).returning({ id: layouts.id });
  layoutId = row.id;
  clearDocCache();
});

describe('a version-1 document with free-bag props, read back', () => {
  it('answers the current version with each module’s values typed by its kind', async () => {
    const res = await call(one.GET, { params: { id: layoutId }, as: w.designer });
    expect(res.status).toBe(200);
    const doc = res.body.doc;
    expect(doc.schemaVersion).toBe(4);
    const props = (id: string) => doc.modules.find((m: { id: string }) => m.id === id).props;
    expect(props('fridge')).toEqual({ litres: 55, watts: 40, dutyCycle: 0.33 }); // "55" read as 55; colour is no fridge value
    expect(props('hob')).toEqual({ burners: 3, fuel: 'induction' });
    expect(props('fresh')).toEqual({ litres: 70 }); // a fill level of 2 is outside 0–1
    expect(props('gas')).toEqual({ cylinders: 2, cylinderKg: 6 });
    expect(props('wardrobe')).toEqual({ shelves: 3 }); // a wardrobe has no belt
    expect(props('sink')).toBeUndefined(); // nothing the sink unit declares: no props at all
    expect(props('seat-1')).toEqual({ belted: false, approved: true });
    expect(props('counter')).toBeUndefined(); // never had any
  });

  it('its checks run on the typed values', async () => {
    const res = await call(checks.GET, { params: { id: layoutId }, as: w.designer });
    expect(res.status).toBe(200);
    expect(res.body.findings.length).toBeGreaterThan(0);
  });

  it('reads do not rewrite the stored row', async () => {
    const [stored] = await db.select({ doc: layouts.doc }).from(layouts).where(eq(layouts.id, layoutId));
    const doc = stored.doc as unknown as Record<string, any>;
    expect(doc.schemaVersion).toBe(1);
    expect(doc.modules.find((m: { id: string }) => m.id === 'fridge').props.colour).toBe('white');
  });
});
