'use client';
/**
 * The font families the page actually loaded (next/font gives them generated names through the
 * CSS variables --font-text and --font-mono), for canvas text. Falls back to the plain names.
 */
import { useEffect, useState } from 'react';
import { canvasFonts } from '../theme';

export type CanvasFonts = { text: string; mono: string };

export function readCanvasFonts(): CanvasFonts {
  if (typeof document === 'undefined') return canvasFonts;
  const css = getComputedStyle(document.body ?? document.documentElement);
  const text = css.getPropertyValue('--font-text').trim();
  const mono = css.getPropertyValue('--font-mono').trim();
  return {
    text: text ? `${text}, ${canvasFonts.text}` : canvasFonts.text,
    mono: mono ? `${mono}, ${canvasFonts.mono}` : canvasFonts.mono,
  };
}

export function useCanvasFonts(): { fonts: CanvasFonts; ready: number } {
  const [state, setState] = useState<{ fonts: CanvasFonts; ready: number }>(() => ({ fonts: canvasFonts, ready: 0 }));
  useEffect(() => {
    let live = true;
    const update = () => live && setState((s) => ({ fonts: readCanvasFonts(), ready: s.ready + 1 }));
    update();
    document.fonts?.ready.then(update).catch(() => undefined);
    return () => {
      live = false;
    };
  }, []);
  return state;
}
