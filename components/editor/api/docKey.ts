/**
 * A short key for a layout document's content (FNV-1a over its JSON), so the live-checks query
 * is keyed by what the document says, not by object identity. Never used for security.
 */
import type { LayoutDoc } from '@/lib/layout';

export function contentKey(doc: LayoutDoc): string {
  const s = JSON.stringify(doc);
  let h1 = 0x811c9dc5;
  let h2 = 0x01000193;
  for (let i = 0; i < s.length; i++) {
    const c = s.charCodeAt(i);
    h1 = Math.imul(h1 ^ c, 0x01000193);
    h2 = Math.imul(h2 ^ c, 0x5bd1e995);
  }
  return `${(h1 >>> 0).toString(36)}${(h2 >>> 0).toString(36)}-${s.length.toString(36)}`;
}
