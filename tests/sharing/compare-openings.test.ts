// Revision compare understands openings like modules: a window moved and a roof vent added since
// revision A are listed in words and marked on the later plan (a cloud round each, the window's
// earlier place in phantom lines). Interface behaviour; no outside source is involved.
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import * as list from '@/app/api/layouts/[id]/revisions/route';
import * as compare from '@/app/api/layouts/[id]/revisions/compare/route';
import * as layoutRoute from '@/app/api/layouts/[id]/route';
import { ComparisonDetails } from '@/components/sharing/ComparisonDetails';
import { RevisionPlanSvg } from '@/components/sharing/RevisionPlanSvg';
import type { ComparisonDto } from '@/db/sharing/compare';
import { useFreshDb } from '../helpers/db';
import { call } from '../helpers/http';
import { buildWorld, type World } from '../helpers/world';
import type { FakeSmtp } from '@/dev/fakes/smtp/server';
import { startMailSink } from './helpers';

let w: World;
let smtp: FakeSmtp;

beforeAll(async () => {
  w = await buildWorld(await useFreshDb());
  smtp = await startMailSink(); // issuing a revision mails the client
});
afterAll(() => smtp.close());

async function saveOpenings(openings: unknown[]) {
  const cur = await call(layoutRoute.GET, { params: { id: w.clientLayoutId }, as: w.designer });
  const doc = { ...cur.body.doc, bay: { ...cur.body.doc.bay, openings } };
  const res = await call(layoutRoute.PUT, { method: 'PUT', params: { id: w.clientLayoutId }, as: w.designer, json: { doc }, headers: { 'if-match': String(cur.body.version) } });
  expect(res.status, JSON.stringify(res.body)).toBe(200);
}

const WINDOW = { id: 'kitchen-win', type: 'window', wall: 'left', position: 500, sillHeight: 900, width: 600, height: 400, opens: true };

describe('comparing revisions with openings', () => {
  it('lists a window moved and a roof vent added, and marks both on the later plan', async () => {
    await saveOpenings([WINDOW]);
    const a = await call(list.POST, { method: 'POST', params: { id: w.clientLayoutId }, as: w.designer, json: { note: 'With the kitchen window' } });
    expect(a.status).toBe(201);
    // Since A: the window 200 mm further back (500 → 700), and a roof vent.
    await saveOpenings([{ ...WINDOW, position: 700 }, { id: 'vent-1', type: 'roof-opening', kind: 'vent', x: 1000, y: 500, length: 400, width: 400, frameHeight: 40 }]);

    const res = await call(compare.GET, { params: { id: w.clientLayoutId }, path: `/x?from=${a.body.revision.letter}&to=current`, as: w.client });
    expect(res.status).toBe(200);
    const data = res.body as ComparisonDto;
    expect(data.diff.openings.added.map((o) => o.id)).toEqual(['vent-1']);
    expect(data.diff.openings.changed).toMatchObject([{ id: 'kitchen-win', moved: { dAlong: 200, dAcross: 0, dUp: 0 }, resized: null }]);

    const words = renderToStaticMarkup(createElement(ComparisonDetails, { data, markLetter: 'B', units: 'mm' })).replace(/<[^>]+>/g, ' ').replace(/\s+/g, ' ');
    expect(words).toContain('Openings');
    expect(words).toContain('Added Roof vent, 400 mm × 400 mm');
    expect(words).toContain('Moved Window in the left wall 200 mm rearwards');

    const later = renderToStaticMarkup(createElement(RevisionPlanSvg, { doc: data.to.doc, diff: data.diff, side: 'to', arrangement: 'travel', title: 'Preliminary', letter: 'B' }));
    expect(later).toContain('data-cloud="opening:vent-1" data-mark="added"');
    expect(later).toContain('data-cloud="opening:kitchen-win" data-mark="changed"');
    // The window's earlier place in phantom lines: along the left wall line (y = 0) from x 500, 600 mm long.
    expect(later).toMatch(/data-phantom="opening:kitchen-win" x="500" y="0" width="600"/);
    // Both openings are drawn: the roof vent dashed.
    expect(later).toMatch(/<rect data-opening-id="vent-1" x="1000" y="500" width="400" height="400"[^>]*stroke-dasharray/);
    expect(later).toContain('data-opening-id="kitchen-win"');
    // The earlier side is drawn unmarked.
    const earlier = renderToStaticMarkup(createElement(RevisionPlanSvg, { doc: data.from.doc, diff: data.diff, side: 'from', arrangement: 'travel', title: 'A', letter: 'B' }));
    expect(earlier).not.toContain('data-cloud');
    expect(earlier).toContain('data-opening-id="kitchen-win"');
  });
});
