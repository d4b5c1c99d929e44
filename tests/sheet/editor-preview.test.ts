// The plan the editor and a viewer link show while their drawing loads (editorPreviewSvg): the
// arrangement the editor opens in (lounge), at 960 px, and bounded like every thumbnail — a page
// carries it twice (as HTML and in the server components' payload), so even 5,000 modules on one
// spot must stay small.
import { describe, expect, it } from 'vitest';
import { editorPreviewSvg } from '@/lib/sheet/thumbnail';
import { stackedOnOneSpot } from '../hardening/fixtures/adversarial-layouts';
import { boxDoc, mod } from '../checks/helpers';

/** Module outlines: one `M…z` rectangle per module in the family paths (stroked in ink). */
const moduleRects = (svg: string) =>
  [...svg.matchAll(/<path d="([^"]*)" fill="#[0-9A-Fa-f]{6}" stroke="#1E2A2F"/g)].reduce((n, p) => n + (p[1].match(/M/g)?.length ?? 0), 0);

describe('the editor’s preview plan', () => {
  it('draws the lounge arrangement, 960 px wide, to the bay’s proportions', () => {
    const doc = boxDoc({
      length: 3000,
      width: 1800,
      modules: [
        mod({ id: 'bench', kind: 'drawer-unit', x: 0, y: 0, length: 1000, width: 500, arrangements: ['lounge'] }),
        mod({ id: 'bed', kind: 'drawer-unit', x: 1500, y: 0, length: 1200, width: 1800, arrangements: ['sleep'] }),
      ],
    });
    const svg = editorPreviewSvg(doc);
    expect(moduleRects(svg)).toBe(1);
    expect(svg).toContain('M0 0h1000v500h-1000z');
    expect(svg).not.toContain('M1500 0h1200v1800h-1200z');
    // 960 px across 3000 mm plus a margin of 6 % of 3000 (180 mm) each side: 3360 × 2160 mm, so
    // 960 × 2160 / 3360 = 617.1, drawn 617 px high.
    expect(svg).toMatch(/viewBox="-180 -180 3360 2160" width="960" height="617"/);
  });

  it('stays small for 5,000 modules on one spot: at most 400 drawn, under 32 KB', () => {
    const svg = editorPreviewSvg(stackedOnOneSpot(5000));
    expect(moduleRects(svg)).toBe(400);
    expect(encodeURIComponent(svg).length).toBeLessThan(32 * 1024);
  });
});
