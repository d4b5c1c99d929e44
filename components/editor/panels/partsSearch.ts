/**
 * Searching the Parts shelf: every word typed must appear in the kind's title, id, trade
 * keywords or material family. Pure; never reorders the catalogue.
 */
import { KIND_LIST, type KindSpec } from '@/lib/layout/kinds';

export function matchKinds(query: string, kinds: KindSpec[] = KIND_LIST): KindSpec[] {
  const q = query.trim().toLowerCase();
  if (!q) return kinds;
  const words = q.split(/\s+/);
  return kinds.filter((k) => {
    const hay = [k.title, k.kind, ...k.keywords, k.family].join(' ').toLowerCase();
    return words.every((w) => hay.includes(w));
  });
}
