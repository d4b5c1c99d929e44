/**
 * Baywright's look as a Tailwind theme: colours and faces come from lib/look.ts, their one home
 * (DESIGN.md, "Look"). Add a colour there, never here.
 */
import type { Config } from 'tailwindcss';
import { colours, typefaces } from './lib/look';

const config: Config = {
  content: ['./app/**/*.{ts,tsx}', './components/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: colours,
      fontFamily: {
        sans: [`var(${typefaces.text.cssVariable})`, ...typefaces.text.fallback],
        mono: [`var(${typefaces.mono.cssVariable})`, ...typefaces.mono.fallback],
      },
    },
  },
};

export default config;
