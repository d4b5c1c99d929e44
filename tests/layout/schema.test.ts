// The layout document contract: good and bad documents, migrations, and the shipped templates.
import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseLayoutDoc, layoutDocSchema, bayTemplateSchema, BAY_TEMPLATES, starterLayout, emptyLayout, sizeClassOf } from '@/lib/layout';

const dir = path.join(process.cwd(), 'public/templates');
const good = () => JSON.parse(fs.readFileSync(path.join(dir, 'starter-l-lounge.json'), 'utf8'));

describe('parseLayoutDoc', () => {
  it('accepts a starter layout and fills defaults', () => {
    const doc = good();
    delete doc.bay.cabSeats;
    const r = parseLayoutDoc(doc);
    expect(r.ok).toBe(true);
    if (r.ok) expect(r.value.bay.cabSeats).toBe(2);
  });

  it('migrates a document written before schemaVersion existed', () => {
    const doc = good();
    delete doc.schemaVersion;
    const r = parseLayoutDoc(doc);
    expect(r.ok && r.value.schemaVersion).toBe(4);
  });

  it('refuses a document from a newer version of the app', () => {
    const r = parseLayoutDoc({ ...good(), schemaVersion: 5 });
    expect(r).toEqual({ ok: false, issues: [{ path: 'schemaVersion', message: expect.stringMatching(/newer/) }] });
  });

  it.each([
    ['a fractional length', (d: any) => (d.modules[0].width = 450.5), 'modules.0.width'],
    ['a negative size', (d: any) => (d.modules[0].length = -1), 'modules.0.length'],
    ['an unknown kind', (d: any) => (d.modules[0].kind = 'hot-tub'), 'modules.0.kind'],
    ['an unknown field', (d: any) => (d.bay.colour = 'red'), 'bay'],
    ['a module in no arrangement', (d: any) => (d.modules[0].arrangements = []), 'modules.0.arrangements'],
    ['an arrangement twice', (d: any) => (d.modules[0].arrangements = ['sleep', 'sleep']), 'modules.0.arrangements'],
    ['a duplicate module id', (d: any) => (d.modules[1].id = d.modules[0].id), 'modules.1.id'],
    ['a door past the end of its wall', (d: any) => (d.bay.doors[0].offset = 3000), 'bay.doors.0.width'],
    ['a control character in a label', (d: any) => (d.modules[0].label = 'bad\u0007'), 'modules.0.label'],
    ['a string where a number belongs', (d: any) => (d.bay.length = '3100'), 'bay.length'],
    ['an empty name', (d: any) => (d.name = '  '), 'name'],
  ])('rejects %s with its field path', (_what, mutate, pathExpected) => {
    const doc = good();
    mutate(doc);
    const r = parseLayoutDoc(doc);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.issues.map((i) => i.path)).toContain(pathExpected);
  });

  it('never throws on things that are not documents', () => {
    for (const input of [null, 42, 'doc', [], { schemaVersion: 'one' }, { __proto__: { schemaVersion: 1 } }]) {
      const r = parseLayoutDoc(input);
      expect(r.ok).toBe(false);
    }
  });
});

describe('shipped templates', () => {
  const files = fs.readdirSync(dir).filter((f) => f.endsWith('.json') && f !== 'index.json');

  it('has at least six bay classes, L1–L4 and H1–H3 among them', () => {
    const classes = BAY_TEMPLATES.map((t) => t.sizeClass);
    expect(classes.length).toBeGreaterThanOrEqual(6);
    for (const l of ['L1', 'L2', 'L3', 'L4']) expect(classes.some((c) => c.startsWith(l))).toBe(true);
    for (const h of ['H1', 'H2', 'H3']) expect(classes.some((c) => c.endsWith(h))).toBe(true);
  });

  it.each(files)('%s validates against its schema and says to measure your own van', (file) => {
    const json = JSON.parse(fs.readFileSync(path.join(dir, file), 'utf8'));
    if (file.startsWith('bay-')) {
      const t = bayTemplateSchema.parse(json);
      expect(t.note).toMatch(/measure your own van/);
      expect(t.bay.wheelArches.length).toBe(2);
      expect(t.bay.doors.length).toBeGreaterThan(0);
    } else {
      expect(() => layoutDocSchema.parse(json)).not.toThrow();
    }
  });

  it('lists every file in index.json', () => {
    const index = JSON.parse(fs.readFileSync(path.join(dir, 'index.json'), 'utf8'));
    const listed = [...index.bays, ...index.starters].map((e: { file: string }) => e.file).sort();
    expect(listed).toEqual(files.sort());
  });

  it('names bays by size class only: every name is a size class and plain trade words', () => {
    const index = JSON.parse(fs.readFileSync(path.join(dir, 'index.json'), 'utf8'));
    for (const b of index.bays) expect(b.name).toMatch(/^L[1-4]H[1-3] — (Short|Medium|Long) wheelbase( with extended overhang)?, (standard|high|extra-high) roof$/);
    for (const s of index.starters) expect(s.name).toMatch(/\(L[1-4]H[1-3]\)$/);
    // No proper noun: a capitalised word only opens a sentence, a name or a label ("Short wheelbase" after the dash).
    for (const f of files) {
      const strings: string[] = [];
      JSON.parse(fs.readFileSync(path.join(dir, f), 'utf8'), (_k, v) => (typeof v === 'string' && strings.push(v), v));
      for (const text of strings) {
        for (const part of text.split(/ — |[.;(]\s*/)) {
          for (const word of part.trim().split(/[\s,:)]+/).slice(1)) expect(word, `${f}: “${text}”`).not.toMatch(/^[A-Z][a-z]/);
        }
      }
    }
  });
});

describe('helpers', () => {
  it('builds an empty layout that validates, and knows its size class', () => {
    const t = BAY_TEMPLATES.find((b) => b.id === 'l3h3')!;
    const doc = emptyLayout('Empty', t.bay);
    expect(layoutDocSchema.safeParse(doc).success).toBe(true);
    expect(sizeClassOf(doc.bay)).toBe('L3H3');
    expect(sizeClassOf({ length: 9000, height: 3000 })).toBe('custom');
    expect(starterLayout('nope')).toBeUndefined();
  });
});
