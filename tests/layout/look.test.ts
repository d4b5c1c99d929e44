// The look is defined once (lib/look.ts): the Tailwind theme, the canvas, the sheet and mail read
// it, and no product file writes one of its colours out again. Design tokens, no outside source.
import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import config from '../../tailwind.config';
import { colours, palette, typefaces, withAlpha } from '@/lib/look';
import { theme } from '@/components/editor/theme';
import { INK_HEX } from '@/lib/sheet/primitives';

const ROOT = path.resolve(__dirname, '../..');

function productFiles(dir: string): string[] {
  return fs.readdirSync(path.join(ROOT, dir), { withFileTypes: true }).flatMap((e) => {
    const rel = path.join(dir, e.name);
    if (e.isDirectory()) return rel === path.join('lib', 'fakes') ? [] : productFiles(rel);
    return /\.(ts|tsx|css)$/.test(e.name) ? [rel] : [];
  });
}

describe('the look', () => {
  it('is the Tailwind theme’s colours and faces', () => {
    expect(config.theme?.extend?.colors).toBe(colours);
    expect(config.theme?.extend?.fontFamily).toEqual({
      sans: ['var(--font-text)', 'system-ui', 'sans-serif'],
      mono: ['var(--font-mono)', 'ui-monospace', 'monospace'],
    });
    expect(typefaces.text.family).toBe('IBM Plex Sans');
  });

  it('is what the canvas and the sheet draw with', () => {
    expect(theme).toBe(palette);
    expect(INK_HEX.ink).toBe(colours.ink.DEFAULT);
    expect(INK_HEX.copper).toBe(colours.copper.DEFAULT);
  });

  it('writes an ink with opacity for the canvas', () => {
    // #1E2A2F = (30, 42, 47).
    expect(withAlpha('#1E2A2F', 0.5)).toBe('rgba(30, 42, 47, 0.5)');
  });

  it('has no second copy: no product file writes a colour of the palette out', () => {
    const hexes = Object.values(palette).map((h) => h.toLowerCase());
    const copies: string[] = [];
    for (const file of [...productFiles('app'), ...productFiles('components'), ...productFiles('lib')]) {
      if (file === path.join('lib', 'look.ts')) continue;
      const text = fs.readFileSync(path.join(ROOT, file), 'utf8').toLowerCase();
      for (const hex of hexes) if (text.includes(hex)) copies.push(`${file}: ${hex}`);
    }
    expect(copies).toEqual([]);
  });
});
