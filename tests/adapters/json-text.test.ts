// The contract of the one JSON-splicing helper (lib/cache/json-text.ts): what it writes is
// character for character what JSON.stringify writes for the same object. The layout read
// route's answer rests on it (db/layouts.ts, getLayoutJson; tests/api/layouts.test.ts checks
// the route's text against JSON.stringify of the data layer's DTO).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { jsonText, withJsonField } from '@/lib/cache/json-text';
import { starterLayout } from '@/lib/layout/templates';

// JSON values as they come back from JSON.parse (no undefined, no -0, finite numbers).
const jsonValue = fc.jsonValue().map((v) => JSON.parse(JSON.stringify(v)) as unknown);
const head = fc.dictionary(fc.string(), jsonValue, { maxKeys: 8 });

describe('withJsonField', () => {
  it('writes exactly JSON.stringify({ ...head, [key]: value }) for any head and value', () => {
    fc.assert(
      fc.property(head, fc.string(), jsonValue, (h, key, value) => {
        fc.pre(!Object.hasOwn(h, key) && !/^\d+$/.test(key));
        expect(withJsonField(h, key, jsonText(value))).toBe(JSON.stringify({ ...h, [key]: value }));
      }),
      { numRuns: 500 },
    );
  });

  it('does so for a layout summary and its document, with awkward text', () => {
    const doc = { ...starterLayout('starter-rear-bed')!, name: 'Quote " back\\slash \u2028 line — ünïcödé 🚐' };
    const summary = { id: 'a', name: 'Nair "van"', client: null, bay: { length: 3400, width: 1700, height: 1850 }, version: 3, updatedBy: null, canEdit: true };
    expect(withJsonField(summary, 'doc', jsonText(doc))).toBe(JSON.stringify({ ...summary, doc }));
    expect(JSON.parse(withJsonField(summary, 'doc', jsonText(doc))).doc).toEqual(doc);
  });

  it('handles an empty head and keys that need escaping', () => {
    expect(withJsonField({}, 'doc', jsonText([1]))).toBe('{"doc":[1]}');
    expect(withJsonField({ a: 1 }, 'd"o\nc', jsonText(null))).toBe(JSON.stringify({ a: 1, 'd"o\nc': null }));
  });

  it('refuses a head that already has the field, and a value with no JSON form', () => {
    expect(() => withJsonField({ doc: 1 }, 'doc', jsonText(2))).toThrow(/already has "doc"/);
    expect(() => withJsonField({ a: 1 }, '7', jsonText(2))).toThrow(/would not come last/);
    expect(() => jsonText(undefined)).toThrow(/no JSON form/);
  });
});
