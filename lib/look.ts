/**
 * Baywright's look, defined once: the colours (a warm drafting sheet, ink lines, one copper accent,
 * muted status colours that always travel with an icon and a word; DESIGN.md "Look") and the type.
 * The Tailwind theme (tailwind.config.ts) is built from these, and so are the global styles through
 * it; code that cannot use classes — the Konva canvas, the plan sheet, the SVG views, mail — reads
 * `palette` and `typefaces` here. Pure data; must never import anything.
 */

/** The Tailwind colour scales: `bg-paper`, `text-ink-soft`, `border-copper`… */
export const colours = {
  paper: { DEFAULT: '#F5F2EA', deep: '#ECE7DA', edge: '#DDD6C4', light: '#FBF9F4' },
  ink: { DEFAULT: '#1E2A2F', soft: '#4A5A61', faint: '#8A969B' },
  copper: { DEFAULT: '#A4522A', dark: '#833F1E', light: '#F1DED3' },
  moss: { DEFAULT: '#55703F', light: '#E3EAD9' },
  ochre: { DEFAULT: '#A87C1E', light: '#F3E8CC' },
  brick: { DEFAULT: '#9E3B2F', light: '#F2DCD7' },
} as const;

/** The same colours by flat name, for drawing code. */
export const palette = {
  paper: colours.paper.DEFAULT,
  paperDeep: colours.paper.deep,
  paperEdge: colours.paper.edge,
  paperLight: colours.paper.light,
  ink: colours.ink.DEFAULT,
  inkSoft: colours.ink.soft,
  inkFaint: colours.ink.faint,
  copper: colours.copper.DEFAULT,
  copperDark: colours.copper.dark,
  copperLight: colours.copper.light,
  moss: colours.moss.DEFAULT,
  mossLight: colours.moss.light,
  ochre: colours.ochre.DEFAULT,
  ochreLight: colours.ochre.light,
  brick: colours.brick.DEFAULT,
  brickLight: colours.brick.light,
  white: '#FFFFFF',
} as const;

/** `palette[name]` as `rgba(…)` with the given opacity (0–1), for canvas fills. */
export function withAlpha(hex: string, alpha: number): string {
  const n = Number.parseInt(hex.slice(1), 16);
  return `rgba(${(n >> 16) & 255}, ${(n >> 8) & 255}, ${n & 255}, ${alpha})`;
}

/** The two faces: IBM Plex Sans for text, IBM Plex Mono for every dimension (app/fonts.ts loads them). */
export const typefaces = {
  text: { family: 'IBM Plex Sans', cssVariable: '--font-text', fallback: ['system-ui', 'sans-serif'] },
  mono: { family: 'IBM Plex Mono', cssVariable: '--font-mono', fallback: ['ui-monospace', 'monospace'] },
} as const;
