// Plan thumbnails: every demo layout draws one through the route, from its document alone (no
// text, only numbers), to the bay's proportions; a saved version draws its own; bad queries 400.
import { beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import * as thumbnail from '@/app/api/layouts/[id]/thumbnail/route';
import * as one from '@/app/api/layouts/[id]/route';
import { layouts } from '@/db/schema';
import { DEMO_STUDIO } from '@/lib/demo-accounts';
import { studios } from '@/db/schema';
import type { LayoutDoc } from '@/lib/layout/schema';
import type { Db } from '@/db/client';
import { useFreshDb } from '../helpers/db';
import { call } from '../helpers/http';
import { buildWorld, type World } from '../helpers/world';

let db: Db;
let w: World;

beforeAll(async () => {
  db = await useFreshDb();
  w = await buildWorld(db);
});

/** The number of rectangles drawn as module outlines: one `M…z` per module in the family paths. */
function moduleRects(svg: string): number {
  const paths = [...svg.matchAll(/<path d="([^"]*)" fill="(#[0-9A-Fa-f]{6})" stroke="#1E2A2F"/g)];
  return paths.reduce((n, p) => n + (p[1].match(/M/g)?.length ?? 0), 0);
}

describe('plan thumbnails', () => {
  it('draws every demo layout: SVG, the bay to scale, one outline per module of the travel arrangement', async () => {
    const [studio] = await db.select({ id: studios.id }).from(studios).where(eq(studios.name, DEMO_STUDIO));
    const demo = await db.select({ id: layouts.id, doc: layouts.doc }).from(layouts).where(eq(layouts.studioId, studio.id));
    expect(demo.length).toBeGreaterThanOrEqual(3);
    for (const layout of demo) {
      const res = await call(thumbnail.GET, { params: { id: layout.id }, as: w.designer });
      expect(res.status).toBe(200);
      expect(res.headers.get('content-type')).toMatch(/^image\/svg\+xml/);
      const svg = res.body as string;
      expect(svg.startsWith('<svg xmlns="http://www.w3.org/2000/svg"')).toBe(true);
      const doc = layout.doc as LayoutDoc;
      // The bare-metal outline is the bay's own length and width in millimetres.
      expect(svg).toContain(`<rect x="0" y="0" width="${doc.bay.length}" height="${doc.bay.width}"`);
      const travel = doc.modules.filter((m) => m.arrangements.includes('travel')).length;
      expect(moduleRects(svg)).toBe(travel);
      // 120 px wide; the height keeps the bay's proportions (padding is the same on all sides, so within a pixel).
      const height = Number(/height="(\d+)"/.exec(svg)![1]);
      expect(Math.abs(height - (120 * doc.bay.width) / doc.bay.length)).toBeLessThan(120 * 0.13);
      // Nothing of the document but numbers reaches the markup.
      expect(svg).not.toContain(doc.name);
    }
  });

  it('draws a saved version as it was, and the sleep arrangement when asked', async () => {
    const id = w.clientLayoutId;
    const current = (await call(one.GET, { params: { id }, as: w.designer })).body;
    const fewer = { ...current.doc, modules: current.doc.modules.slice(0, 1) };
    const saved = await call(one.PUT, { method: 'PUT', params: { id }, as: w.designer, headers: { 'if-match': String(current.version) }, json: { doc: fewer } });
    expect(saved.status).toBe(200);
    const earlier = await call(thumbnail.GET, { params: { id }, path: `/x?version=${current.version}`, as: w.client });
    const now = await call(thumbnail.GET, { params: { id }, path: `/x?version=${saved.body.version}`, as: w.client });
    expect(moduleRects(earlier.body)).toBe(current.doc.modules.filter((m: { arrangements: string[] }) => m.arrangements.includes('travel')).length);
    expect(moduleRects(now.body)).toBe(fewer.modules.filter((m: { arrangements: string[] }) => m.arrangements.includes('travel')).length);
    const sleep = await call(thumbnail.GET, { params: { id }, path: `/x?version=${current.version}&arrangement=sleep`, as: w.designer });
    expect(moduleRects(sleep.body)).toBe(current.doc.modules.filter((m: { arrangements: string[] }) => m.arrangements.includes('sleep')).length);
  });

  it.each([
    ['?version=abc', 400], ['?version=0', 400], ['?arrangement=dinner', 400], ['?size=9', 400], ['?version=987654', 404],
  ])('answers %s with %i', async (query, status) => {
    const res = await call(thumbnail.GET, { params: { id: w.clientLayoutId }, path: `/x${query}`, as: w.designer });
    expect(res.status).toBe(status);
    expect(res.body.error).toMatch(/^[A-Z][^\n]{9,}$/); // a sentence a person can act on, not a code
  });
});
