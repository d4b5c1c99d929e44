/**
 * Reads the payment API's request encoding: `application/x-www-form-urlencoded` with bracketed
 * keys for nesting — `metadata[quoteId]=q1`, `line_items[0][price_data][currency]=gbp` — the way
 * the official SDK encodes parameters. Numeric segments become arrays when every key at that
 * level is an index. Everything stays a string, as on the wire; the session rules convert.
 *
 * Part of the local fake payment API only (test and demo use); must never be used to talk to a
 * real payment service, and never holds real keys.
 */

export type FormValue = string | FormValue[] | { [key: string]: FormValue };

export class FormBodyError extends Error {}

const MAX_DEPTH = 8;

function keyPath(key: string): string[] {
  const m = /^([^[\]]+)((?:\[[^[\]]*\])*)$/.exec(key);
  if (!m) throw new FormBodyError(`cannot read parameter name "${key}"`);
  const rest = [...m[2].matchAll(/\[([^[\]]*)\]/g)].map((x) => x[1]);
  const path = [m[1], ...rest];
  if (path.length > MAX_DEPTH) throw new FormBodyError(`parameter "${key}" is nested too deeply`);
  return path;
}

type Tree = { [key: string]: Tree | string };

function toArrays(node: Tree | string): FormValue {
  if (typeof node === 'string') return node;
  const keys = Object.keys(node);
  const values = keys.map((k) => toArrays(node[k]));
  if (keys.length > 0 && keys.every((k) => /^\d+$/.test(k))) {
    return keys.map(Number).map((n, i) => [n, values[i]] as const).sort((a, b) => a[0] - b[0]).map(([, v]) => v);
  }
  return Object.fromEntries(keys.map((k, i) => [k, values[i]]));
}

export function parseFormBody(body: string): Record<string, FormValue> {
  const root: Tree = Object.create(null);
  for (const [rawKey, value] of new URLSearchParams(body)) {
    const path = keyPath(rawKey);
    let node = root;
    for (let i = 0; i < path.length; i++) {
      let seg = path[i];
      if (seg === '') seg = String(Object.keys(node).length); // `a[]=x` appends
      if (seg === '__proto__' || seg === 'constructor' || seg === 'prototype') throw new FormBodyError(`parameter name "${rawKey}" is not allowed`);
      if (i === path.length - 1) {
        if (typeof node[seg] === 'object') throw new FormBodyError(`parameter "${rawKey}" is given both as a value and as a group`);
        node[seg] = value;
      } else {
        const next = node[seg];
        if (typeof next === 'string') throw new FormBodyError(`parameter "${rawKey}" is given both as a value and as a group`);
        node = (next ?? (node[seg] = Object.create(null))) as Tree;
      }
    }
  }
  return toArrays(root) as Record<string, FormValue>;
}
