/**
 * The build-plan page's tabs, as plain data so the server page can read `?tab=` against them
 * (a 'use client' module's constants are not readable on the server). Must hold no behaviour.
 */
export const BUILD_TABS = ['weight', 'power', 'water', 'gas', 'heat', 'parts', 'cut', 'quote'] as const;
export type BuildTab = (typeof BUILD_TABS)[number];

export function buildTabFrom(value: unknown): BuildTab | undefined {
  return typeof value === 'string' && (BUILD_TABS as readonly string[]).includes(value) ? (value as BuildTab) : undefined;
}
