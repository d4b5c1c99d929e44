/**
 * Hostile input: for every state-changing route in the access matrix, 1000 fast-check runs of
 * mutated valid bodies and arbitrary JSON, wrong content types, huge and deeply nested bodies,
 * `__proto__` keys, numbers out of range and strings with control characters. No response may
 * be a 5xx or carry a stack trace, nothing may reject unhandled, and after every refused request
 * the database must be exactly as it was.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { sql } from 'drizzle-orm';
import type { Db } from '@/db/client';
import { useFreshDb } from '../helpers/db';
import { call, type CallOptions } from '../helpers/http';
import { buildWorld } from '../helpers/world';
import { PEER_HEADER } from '@/server/auth/address';
import { ROWS, type Fixture } from './access-rows';
import { captureLog, KNOWN_TEST_PASSWORDS, leakedSecrets, storedHashes, type LogCapture } from '../helpers/log-capture';
import { DUMMY_HASH } from '@/lib/auth/password';

const RUNS = Number(process.env.FUZZ_RUNS ?? 1000);
let db: Db;
let fx: Fixture;
const unhandled: unknown[] = [];
const onUnhandled = (reason: unknown) => unhandled.push(reason);
let captured: LogCapture;

beforeAll(async () => {
  captured = captureLog();
  // Uploaded files of these tests go to a folder of their own.
  process.env.BAYWRIGHT_DATA_ROOT = fs.mkdtempSync(path.join(os.tmpdir(), 'baywright-matrix-'));
  db = await useFreshDb();
  fx = { world: await buildWorld(db), db };
  process.on('unhandledRejection', onUnhandled);
});
afterAll(() => {
  process.off('unhandledRejection', onUnhandled);
  captured.stop();
});

let seq = 0;
let digestSql: ReturnType<typeof sql.raw> | undefined;
let lastDigest: { position: string; digest: string } | undefined;

/**
 * A digest of every table's content. Computing it scans every row, so it is taken again only
 * when the database has written something since the last one: every change to a row goes
 * through the write-ahead log, and an unchanged log insert position means no row changed.
 * (A write that was rolled back moves the position on too; then the full digest decides.)
 */
async function digest(): Promise<string> {
  const [{ position }] = rowsOf<{ position: string }>(await db.execute(sql`select pg_current_wal_insert_lsn()::text as position`));
  if (lastDigest?.position === position) return lastDigest.digest;
  const full = await fullDigest();
  // Read the position again: the digest itself must not have written anything.
  const [{ position: after }] = rowsOf<{ position: string }>(await db.execute(sql`select pg_current_wal_insert_lsn()::text as position`));
  lastDigest = after === position ? { position, digest: full } : undefined;
  return full;
}

/** Every table's content in one statement: any change to any row changes it. */
async function fullDigest(): Promise<string> {
  if (!digestSql) {
    const tables = await db.execute(sql`select tablename from pg_tables where schemaname = 'public' order by tablename`);
    // Throttle counters change on refused requests by design: a refused guess still counts.
    const names = rowsOf<{ tablename: string }>(tables).map((t) => t.tablename).filter((n) => n !== 'throttle_counters');
    digestSql = sql.raw(names.map((n) => `select '${n}' as t, md5(coalesce(string_agg(x::text, '|' order by x::text), '')) as h from "${n}" x`).join(' union all '));
  }
  return rowsOf<{ t: string; h: string }>(await db.execute(digestSql)).map((r) => `${r.t}:${r.h}`).join(',');
}

function rowsOf<T>(res: unknown): T[] {
  return ((res as { rows?: T[] }).rows ?? (res as T[]));
}

const nasty = fc.oneof(
  fc.string({ unit: 'binary' }),
  fc.constantFrom('\u0000', '\u0007bell', '\u202eevil', '${7*7}', '<script>x</script>', "'; drop table layouts; --", '../../etc/passwd'),
  fc.constantFrom(1e308, -1e308, Number.MAX_SAFE_INTEGER + 2, -0, 0.5, 2 ** 53, -1),
  fc.constantFrom(null, true, [], {}),
);

// Built once: making a string arbitrary maps its whole alphabet, which costs more than the runs.
const replacement = fc.oneof(nasty, fc.jsonValue({ maxDepth: 3 }));
const anyJson = fc.jsonValue({ maxDepth: 4 });
const anyText = fc.string();

/** Replaces one value somewhere inside `base` with something hostile. */
function mutate(base: unknown): fc.Arbitrary<unknown> {
  const paths: (string | number)[][] = [];
  const walk = (v: unknown, p: (string | number)[]) => {
    paths.push(p);
    if (p.length > 6) return;
    if (Array.isArray(v)) v.slice(0, 4).forEach((x, i) => walk(x, [...p, i]));
    else if (v && typeof v === 'object') Object.entries(v).forEach(([k, x]) => walk(x, [...p, k]));
  };
  walk(base, []);
  return fc.tuple(fc.constantFrom(...paths), replacement).map(([p, value]) => {
    if (!p.length) return value;
    const copy = structuredClone(base) as Record<string | number, unknown>;
    let at: Record<string | number, unknown> = copy;
    for (const k of p.slice(0, -1)) at = at[k] as Record<string | number, unknown>;
    at[p[p.length - 1]] = value;
    return copy;
  });
}

/** JSON nested n levels deep, written as text (JSON.stringify itself would overflow the stack). */
function deepJson(n: number, key = 'a'): string {
  return `{"${key}":[`.repeat(n) + '1' + ']}'.repeat(n);
}

type Attack = { body: string; contentType: string };

function attacks(base: unknown): fc.Arbitrary<Attack> {
  const asJson = (v: unknown) => ({ body: JSON.stringify(v) ?? 'null', contentType: 'application/json' });
  return fc.oneof(
    { weight: 5, arbitrary: mutate(base).map(asJson) },
    { weight: 2, arbitrary: anyJson.map(asJson) },
    { weight: 1, arbitrary: anyText.map((s) => ({ body: s, contentType: 'application/json' })) },
    { weight: 1, arbitrary: fc.constantFrom('text/plain', 'application/x-www-form-urlencoded', 'multipart/form-data', '').map((t) => ({ body: JSON.stringify(base), contentType: t })) },
    { weight: 1, arbitrary: fc.constant({ body: `{"__proto__": {"admin": true}, "constructor": {"prototype": {"x": 1}}, "name": "p"}`, contentType: 'application/json' }) },
    { weight: 1, arbitrary: fc.tuple(fc.integer({ min: 500, max: 20000 }), fc.constantFrom('a', 'doc', 'name', 'modules')).map(([n, k]) => ({ body: deepJson(n, k), contentType: 'application/json' })) },
    { weight: 1, arbitrary: fc.constant({ body: JSON.stringify({ name: 'x'.repeat(2_200_000) }), contentType: 'application/json' }) },
  );
}

/**
 * Fuzzes every write route of the matrix whose position in the list has the given parity: the
 * two halves run as two test files, so vitest's two workers share the load.
 */
export function fuzzWriteRoutes(half: 0 | 1): void {
  const writes = ROWS.filter((r) => r.method !== 'GET').filter((_, i) => i % 2 === half);

  describe.each(writes.map((r) => [`${r.method} ${r.route}`, r] as const))('%s', (_name, row) => {
    it(`survives ${RUNS} hostile requests with no 5xx, no stack and no change on refusal`, async () => {
      const template: CallOptions = await row.request(fx, 'designer');
      const base = template.json ?? {};
      let state: string | undefined;
      await fc.assert(
        fc.asyncProperty(attacks(base), async (attack) => {
          const before = (state ??= await digest());
          const res = await call(await routeHandler(row.route, row.method), {
            method: row.method,
            params: template.params,
            // A new address each time, so per-address limits (sign-up) do not hide the validation behind a 429.
          headers: { ...template.headers, 'content-type': attack.contentType, [PEER_HEADER]: `10.77.${(seq >> 8) & 255}.${seq++ & 255}` },
            body: attack.body,
            as: fx.world.designer,
          });
          expect(res.status).toBeLessThan(500);
          const text = typeof res.body === 'string' ? res.body : JSON.stringify(res.body);
          expect(text).not.toMatch(/\n\s+at |node_modules|SELECT |INSERT |UPDATE |ZodError/);
          const after = await digest();
          if (res.status >= 400) expect(after).toBe(before);
          state = after;
        }),
        { numRuns: RUNS, seed: 20261202 },
      );
      expect(unhandled).toEqual([]);
    }, 300_000);
  });

  it('logged no password, password hash or session token while under attack', async () => {
    const secrets = [...KNOWN_TEST_PASSWORDS, DUMMY_HASH, ...(await storedHashes(db))];
    expect(leakedSecrets(captured.lines, secrets)).toEqual([]);
  });
  }

  const handlers = new Map<string, (req: Request, ctx: unknown) => Promise<Response>>();
  async function routeHandler(route: string, method: string) {
    const key = `${method} ${route}`;
    if (!handlers.has(key)) {
      const mod = await import(/* @vite-ignore */ `@/app${route}/route.ts`);
      handlers.set(key, mod[method]);
    }
    return handlers.get(key)!;
}
