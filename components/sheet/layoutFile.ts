/**
 * JSON export and import of a layout document: the file is the LayoutDoc itself (our own
 * schema, `schemaVersion` first), pretty-printed. Reading one back migrates and validates it
 * with `parseLayoutDoc` and lists every problem with its field path, so a person can fix the
 * file. Pure (text in, result out); must never touch the DOM or the network.
 */
import { parseLayoutDoc, type FieldIssue } from '@/lib/layout/parse';
import type { LayoutDoc } from '@/lib/layout/schema';
import { fieldName } from '@/lib/layout/field-names';

/** Larger than any sane layout (5000 modules ≈ 1.5 MB): refuse before parsing. */
export const MAX_LAYOUT_FILE_BYTES = 2 * 1024 * 1024;

export function layoutFileText(doc: LayoutDoc): string {
  return `${JSON.stringify(doc, null, 2)}\n`;
}

/** "Nair — L2H2 weekender" → "Nair - L2H2 weekender.layout.json" (safe on every file system). */
export function layoutFileName(name: string, ext = 'layout.json'): string {
  const safe = name.normalize('NFC').replace(/[\u0000-\u001F\u007F/\\:*?"<>|]+/g, ' ').replace(/[—–]/g, '-').replace(/\s+/g, ' ').trim().slice(0, 100);
  return `${safe || 'layout'}.${ext}`;
}

export type ReadLayoutResult = { ok: true; doc: LayoutDoc; name: string } | { ok: false; issues: FieldIssue[] };

export function readLayoutFile(text: string, bytes = text.length): ReadLayoutResult {
  if (bytes > MAX_LAYOUT_FILE_BYTES) return { ok: false, issues: [{ path: '', message: `the file is larger than ${MAX_LAYOUT_FILE_BYTES / (1024 * 1024)} MB; a layout file is much smaller` }] };
  let value: unknown;
  try {
    value = JSON.parse(text.replace(/^\uFEFF/, ''));
  } catch (err) {
    return { ok: false, issues: [{ path: '', message: `the file is not valid JSON (${err instanceof Error ? err.message : 'parse error'})` }] };
  }
  const parsed = parseLayoutDoc(value);
  if (!parsed.ok) return { ok: false, issues: parsed.issues };
  return { ok: true, doc: parsed.value, name: parsed.value.name };
}

/** Issues as lines a person reads: "modules.3.width: must be a whole number of millimetres". */
/** "Module 4, " for a path inside the fourth module; empty elsewhere. */
function where(path: string): string {
  const m = /^(modules|doors|wheelArches)\.(\d+)\./.exec(path);
  if (!m) return '';
  const what = m[1] === 'modules' ? 'Module' : m[1] === 'doors' ? 'Door' : 'Wheel arch';
  return `${what} ${Number(m[2]) + 1}, `;
}

export function issueLines(issues: FieldIssue[], max = 12): string[] {
  const lines = issues.slice(0, max).map((i) => (i.path ? `${where(i.path)}${fieldName(i.path)}: ${i.message}` : i.message));
  if (issues.length > max) lines.push(`…and ${issues.length - max} more`);
  return lines;
}
