// JSON export and import of a layout: a round trip keeps the document, bad files list field paths.
import { describe, expect, it } from 'vitest';
import { issueLines, layoutFileName, layoutFileText, readLayoutFile } from '@/components/sheet/layoutFile';
import { starterLayout } from '@/lib/layout';

const doc = starterLayout('starter-rear-bed')!;

describe('layout files', () => {
  it('round-trips a document exactly', () => {
    const back = readLayoutFile(layoutFileText(doc));
    expect(back.ok).toBe(true);
    if (back.ok) expect(back.doc).toEqual(doc);
  });

  it('reads a file with a byte-order mark', () => {
    expect(readLayoutFile(`\uFEFF${layoutFileText(doc)}`).ok).toBe(true);
  });

  it('migrates a document written before schemaVersion existed', () => {
    const { schemaVersion: _v, ...old } = doc;
    const back = readLayoutFile(JSON.stringify(old));
    expect(back.ok && back.doc.schemaVersion).toBe(4);
  });

  it('lists field paths for a bad document', () => {
    const bad = { ...doc, bay: { ...doc.bay, length: 3000.5 }, modules: doc.modules.map((m, i) => (i === 1 ? { ...m, width: -4 } : m)) };
    const back = readLayoutFile(JSON.stringify(bad));
    expect(back.ok).toBe(false);
    if (back.ok) return;
    const paths = back.issues.map((i) => i.path);
    expect(paths).toContain('bay.length');
    expect(paths).toContain('modules.1.width');
    expect(issueLines(back.issues).some((l) => l.startsWith('Bay length: '))).toBe(true);
  });

  it.each([
    ['not JSON', '{"schemaVersion": 1,', /not valid JSON/],
    ['an array', '[1,2,3]', /must be a JSON object/],
    ['a newer schema', JSON.stringify({ ...doc, schemaVersion: 9 }), /newer than this server understands/],
  ])('refuses %s with a message', (_what, text, message) => {
    const back = readLayoutFile(text);
    expect(back.ok).toBe(false);
    if (!back.ok) expect(issueLines(back.issues).join(' ')).toMatch(message);
  });

  it('refuses a file over 2 MB before parsing it', () => {
    const back = readLayoutFile('{}', 3 * 1024 * 1024);
    expect(!back.ok && back.issues[0].message).toMatch(/larger than 2 MB/);
  });

  it('caps the list of issues and says how many more', () => {
    const lines = issueLines(Array.from({ length: 20 }, (_, i) => ({ path: `modules.${i}.x`, message: 'bad' })), 5);
    expect(lines).toHaveLength(6);
    expect(lines[5]).toBe('…and 15 more');
  });

  it('makes safe file names', () => {
    expect(layoutFileName('Nair — L2H2 weekender')).toBe('Nair - L2H2 weekender.layout.json');
    expect(layoutFileName('../../etc/passwd')).toBe('.. .. etc passwd.layout.json');
    expect(layoutFileName('  ', 'png')).toBe('layout.png');
  });
});
