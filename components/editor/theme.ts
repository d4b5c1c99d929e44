/**
 * Raw colour values for Konva, which cannot read Tailwind classes. Same values as
 * tailwind.config.ts (DESIGN.md "Look"); change both together. Never add a colour here that the
 * Tailwind theme does not have.
 */
export const theme = {
  paper: '#F5F2EA',
  paperDeep: '#ECE7DA',
  paperEdge: '#DDD6C4',
  ink: '#1E2A2F',
  inkSoft: '#4A5A61',
  inkFaint: '#8A969B',
  copper: '#A4522A',
  copperDark: '#833F1E',
  copperLight: '#F1DED3',
  moss: '#55703F',
  mossLight: '#E3EAD9',
  ochre: '#A87C1E',
  ochreLight: '#F3E8CC',
  brick: '#9E3B2F',
  brickLight: '#F2DCD7',
} as const;

/** Canvas font stacks: the same faces the page loads through next/font (CSS variables). */
export const canvasFonts: { text: string; mono: string } = {
  text: 'IBM Plex Sans, system-ui, sans-serif',
  mono: 'IBM Plex Mono, ui-monospace, monospace',
};
