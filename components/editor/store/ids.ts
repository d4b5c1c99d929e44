/**
 * New module ids: short, random, and matching the document's id pattern `^[A-Za-z0-9_-]+$`.
 * Must never return an id already in the document.
 */
const ALPHABET = 'abcdefghijkmnopqrstuvwxyzABCDEFGHJKLMNPQRSTUVWXYZ23456789';

function randomIndex(): number {
  if (typeof crypto !== 'undefined' && 'getRandomValues' in crypto) {
    const a = new Uint32Array(1);
    crypto.getRandomValues(a);
    return a[0] % ALPHABET.length;
  }
  return Math.floor(Math.random() * ALPHABET.length);
}

export function newModuleId(taken: ReadonlySet<string>, length = 8): string {
  for (;;) {
    let id = 'm';
    for (let i = 1; i < length; i++) id += ALPHABET[randomIndex()];
    if (!taken.has(id)) return id;
  }
}
