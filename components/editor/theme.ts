/**
 * The look for Konva, which cannot read Tailwind classes: the palette and faces of lib/look.ts
 * (the Tailwind theme is built from the same module). Never define a colour here.
 */
import { palette, typefaces } from '@/lib/look';

export const theme = palette;

/** Canvas font stacks: the same faces the page loads through next/font. */
export const canvasFonts: { text: string; mono: string } = {
  text: [typefaces.text.family, ...typefaces.text.fallback].join(', '),
  mono: [typefaces.mono.family, ...typefaces.mono.fallback].join(', '),
};
