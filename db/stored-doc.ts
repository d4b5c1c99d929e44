/**
 * Every layout or revision document read from the database goes through here: the same
 * migrate-then-validate step (lib/layout/parse) as a document that arrives in a request, so a
 * document stored under an older schema version reads as the current one, with every default
 * filled. Rows are never rewritten here (only `saveLayout` writes a layout's document).
 * A stored document that cannot be read is a fault: it raises, and the route answers 500 with a
 * reference while the log names the field paths.
 */
import 'server-only';
import { parseLayoutDoc, type FieldIssue } from '../lib/layout/parse';
import type { LayoutDoc } from '../lib/layout/schema';

export class StoredDocumentUnreadable extends Error {
  constructor(readonly issues: FieldIssue[]) {
    super(`A stored layout document does not read as the current schema: ${issues.slice(0, 5).map((i) => `${i.path || '(document)'}: ${i.message}`).join('; ')}`);
    this.name = 'StoredDocumentUnreadable';
  }
}

export function readStoredDoc(stored: unknown): LayoutDoc {
  const parsed = parseLayoutDoc(stored);
  if (!parsed.ok) throw new StoredDocumentUnreadable(parsed.issues);
  return parsed.value;
}
