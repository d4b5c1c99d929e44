// The small plans the proposals are shown as: their module names are placed as the editor places
// them (a whole word form or nothing, never a word cut with an ellipsis) and never cover each other
// at the size the card draws them. Interface behaviour; no outside source is involved.
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it, vi } from 'vitest';
import { PlanThumbnail } from '@/components/proposals/PlanThumbnail';
import { briefSchema, generateProposals, TYPICAL_BRIEF } from '@/lib/proposals';

vi.setConfig({ testTimeout: 60_000 });

interface Label { text: string; x: number; y: number; size: number }

function labelsOf(markup: string): { labels: Label[]; viewWidth: number } {
  const viewWidth = Number(/viewBox="[^ ]+ [^ ]+ ([^ ]+) /.exec(markup)![1]);
  const labels = [...markup.matchAll(/<text x="([^"]+)" y="([^"]+)" font-size="([^"]+)"[^>]*>([^<]*)<\/text>/g)].map((t) => ({ x: Number(t[1]), y: Number(t[2]), size: Number(t[3]), text: t[4] }));
  return { labels, viewWidth };
}

describe('proposal plans', () => {
  it.each(['l3h2', 'l4h2'])('on %s name their modules in whole words, clear of each other', (template) => {
    const result = generateProposals(briefSchema.parse({ ...TYPICAL_BRIEF, bay: { source: 'template', template } }));
    expect(result.proposals.length).toBeGreaterThan(0);
    for (const p of result.proposals) {
      const { labels, viewWidth } = labelsOf(renderToStaticMarkup(createElement(PlanThumbnail, { doc: p.doc, title: p.title })));
      expect(labels.length).toBeGreaterThan(0);
      for (const l of labels) expect(l.text).not.toMatch(/…|\.\.\./);
      // At the card's size (about 360 px across the drawing) a name is 11 px high; a character of the
      // sans face is at most about 0.6 em wide, so these boxes hold the text.
      const px = 360 / viewWidth;
      const box = (l: Label) => ({ w: l.text.length * l.size * 0.6 * px, h: l.size * 1.3 * px, x: l.x * px, y: l.y * px });
      for (let i = 0; i < labels.length; i++) {
        for (let j = i + 1; j < labels.length; j++) {
          const a = box(labels[i]), b = box(labels[j]);
          const overlap = Math.abs(a.x - b.x) * 2 < a.w + b.w && Math.abs(a.y - b.y) * 2 < a.h + b.h;
          expect(overlap, `"${labels[i].text}" and "${labels[j].text}" cover each other`).toBe(false);
        }
      }
    }
  });
});
