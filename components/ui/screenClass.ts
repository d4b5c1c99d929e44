'use client';
/**
 * Which arrangement of the screens fits this device: `desktop` (a wide screen and a fine pointer:
 * panels side by side), `tablet` (up to 1279 px wide, or a touch screen up to 1366 px: the plan
 * fills the screen and the panels slide over it as drawers) or `phone` (under 640 px: read-only
 * editor, one column everywhere). Read from CSS media queries, so it follows rotation and resizing.
 * Must never be used during server rendering to decide markup (it answers `desktop` there); markup
 * the server renders uses the `desktop:` variant of app/globals.css, which keeps these queries.
 */
import { useSyncExternalStore } from 'react';

export type ScreenClass = 'desktop' | 'tablet' | 'phone';

/** The same limits as the Tailwind breakpoints used beside it: `sm` 640 px, `xl` 1280 px; 1366 px is the widest common tablet. */
export const SCREEN_QUERIES = {
  phone: '(max-width: 639.98px)',
  tablet: '(max-width: 1279.98px), (pointer: coarse) and (max-width: 1366px)',
} as const;

function current(): ScreenClass {
  if (typeof window === 'undefined' || !window.matchMedia) return 'desktop';
  if (window.matchMedia(SCREEN_QUERIES.phone).matches) return 'phone';
  if (window.matchMedia(SCREEN_QUERIES.tablet).matches) return 'tablet';
  return 'desktop';
}

function subscribe(onChange: () => void): () => void {
  const lists = Object.values(SCREEN_QUERIES).map((q) => window.matchMedia(q));
  lists.forEach((l) => l.addEventListener('change', onChange));
  return () => lists.forEach((l) => l.removeEventListener('change', onChange));
}

export function useScreenClass(): ScreenClass {
  return useSyncExternalStore(subscribe, current, () => 'desktop');
}
