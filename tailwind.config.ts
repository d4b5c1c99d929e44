/**
 * Baywright's look: a warm drafting sheet, ink lines, one copper accent, muted status colours
 * that always travel with an icon and a word (DESIGN.md, "Look").
 */
import type { Config } from 'tailwindcss';

const config: Config = {
  content: ['./app/**/*.{ts,tsx}', './components/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        paper: { DEFAULT: '#F5F2EA', deep: '#ECE7DA', edge: '#DDD6C4' },
        ink: { DEFAULT: '#1E2A2F', soft: '#4A5A61', faint: '#8A969B' },
        copper: { DEFAULT: '#A4522A', dark: '#833F1E', light: '#F1DED3' },
        moss: { DEFAULT: '#55703F', light: '#E3EAD9' },
        ochre: { DEFAULT: '#A87C1E', light: '#F3E8CC' },
        brick: { DEFAULT: '#9E3B2F', light: '#F2DCD7' },
      },
      fontFamily: {
        sans: ['var(--font-text)', 'system-ui', 'sans-serif'],
        mono: ['var(--font-mono)', 'ui-monospace', 'monospace'],
      },
    },
  },
};

export default config;
