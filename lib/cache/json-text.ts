/**
 * JSON text put together from a part that was serialised before. The layout read keeps each
 * document's JSON text in a cache and answers `{ ...summary, doc }` without parsing and
 * serialising the document again (db/layouts.ts, `getLayoutJson`). This is the one place that
 * splices JSON strings; its contract (tests/adapters/json-text.test.ts) is that the answer is
 * character for character what `JSON.stringify` gives for the same object.
 */
declare const serialised: unique symbol;

/** A value's JSON text, as `JSON.stringify` wrote it; only `jsonText` makes one. */
export type JsonText = string & { readonly [serialised]: true };

export function jsonText(value: unknown): JsonText {
  const text = JSON.stringify(value);
  if (text === undefined) throw new TypeError('jsonText: the value has no JSON form');
  return text as JsonText;
}

/**
 * `JSON.stringify({ ...head, [key]: value })` where `text` is `jsonText(value)`: the field comes
 * last, as in the object literal. `head` must be a plain object without `key` of its own, and
 * `key` must not look like an array index (JavaScript orders those first in any object).
 */
export function withJsonField(head: object, key: string, text: JsonText): string {
  if (Object.hasOwn(head, key)) throw new Error(`withJsonField: the head already has "${key}"`);
  if (/^\d+$/.test(key)) throw new Error(`withJsonField: "${key}" would not come last (index-like keys sort first)`);
  const headText = JSON.stringify(head);
  if (headText[0] !== '{') throw new Error('withJsonField: the head must serialise to an object');
  const field = `${JSON.stringify(key)}:${text}`;
  return headText === '{}' ? `{${field}}` : `${headText.slice(0, -1)},${field}}`;
}
