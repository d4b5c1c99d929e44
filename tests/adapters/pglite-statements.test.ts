// Reads as prepared statements on the embedded database: the same rows, fields and errors as
// PGlite's own `query`, prepared only once a text comes back, bounded in number, never inside
// or across an open transaction, and writes left to `query`.
import { PGlite, types } from '@electric-sql/pglite';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { StatementCache } from '@/db/pglite/statements.mjs';
import { emptyCluster } from '@/db/pglite/template.mjs';

let db: PGlite;

beforeAll(async () => {
  db = await PGlite.create({ loadDataDir: emptyCluster() }); // an initialised cluster, no initdb
  await db.exec(`
    create table things (id uuid primary key default gen_random_uuid(), name text not null, size int, doc jsonb, made timestamptz not null default now(), ok boolean);
    insert into things (name, size, doc, ok) values ('alpha', 1, '{"a": [1, 2]}', true), ('beta', 2, null, false), ('gamma', null, '{"b": "x"}', null);
  `);
});
afterAll(() => db.close());

async function preparedCount(): Promise<number> {
  const { rows } = await db.query<{ n: number }>(`select count(*)::int as n from pg_prepared_statements where name like 'bw_stmt_%'`);
  return rows[0].n;
}

describe('StatementCache', () => {
  it('answers exactly what query answers, in object and array row mode, with parsers', async () => {
    const cache = new StatementCache(db);
    const sql = 'select id, name, size, doc, made, ok from things where size >= $1 or name = $2 order by name';
    const keepText = { [types.TIMESTAMPTZ]: (v: string) => v };
    for (const options of [{}, { rowMode: 'array' as const }, { parsers: keepText }]) {
      const expected = await db.query(sql, [1, 'gamma'], options);
      for (let i = 0; i < 3; i++) {
        const got = await cache.query(sql, [1, 'gamma'], options);
        expect(got.rows).toEqual(expected.rows);
        expect(got.fields).toEqual(expected.fields);
      }
    }
    expect(cache.size).toBe(1);
  });

  it('serialises parameters by their types (jsonb, booleans, dates, nulls) as query does', async () => {
    const cache = new StatementCache(db, { prepareAfter: 1 });
    const sql = 'select name from things where doc @> $1 or ok = $2 or made > $3 or name = $4';
    const params = [{ a: [1] }, false, new Date('2100-01-01'), null];
    const expected = await db.query(sql, params);
    expect(expected.rows.map((r) => (r as { name: string }).name).sort()).toEqual(['alpha', 'beta']);
    expect((await cache.query(sql, params)).rows).toEqual(expected.rows);
    expect(cache.size).toBe(1);
  });

  it('prepares a text only the second time it is asked', async () => {
    const cache = new StatementCache(db);
    const sql = `select name from things where name = $1 and 'once' = 'once'`;
    await cache.query(sql, ['alpha']);
    expect(cache.size).toBe(0);
    await cache.query(sql, ['alpha']);
    expect(cache.size).toBe(1);
  });

  it('keeps at most `max` statements, closing the oldest in the database too', async () => {
    const before = await preparedCount();
    const cache = new StatementCache(db, { max: 3, prepareAfter: 1 });
    for (let i = 0; i < 8; i++) {
      const { rows } = await cache.query(`select $1::int + ${i} as n`, [1]);
      expect(rows).toEqual([{ n: 1 + i }]);
    }
    expect(cache.size).toBe(3);
    expect((await preparedCount()) - before).toBe(3);
    // An evicted text is prepared again and still answers.
    expect((await cache.query('select $1::int + 0 as n', [5])).rows).toEqual([{ n: 5 }]);
  });

  it('passes on the database error with its SQLSTATE and keeps working after it', async () => {
    const cache = new StatementCache(db, { prepareAfter: 1 });
    const sql = 'select name from things where id = $1';
    await expect(cache.query(sql, ['not-a-uuid'])).rejects.toMatchObject({ code: '22P02' });
    await expect(cache.query('select nonsense from nowhere where x = $1', [1])).rejects.toMatchObject({ code: '42P01' });
    const { rows } = await db.query<{ id: string }>(`select id from things where name = 'beta'`);
    expect((await cache.query(sql, [rows[0].id])).rows).toEqual([{ name: 'beta' }]);
    expect((await db.query('select 1 as one')).rows).toEqual([{ one: 1 }]);
  });

  it('leaves writes to query', async () => {
    const cache = new StatementCache(db, { prepareAfter: 1 });
    for (let i = 0; i < 3; i++) await cache.query('insert into things (name) values ($1)', [`written ${i}`]);
    expect(cache.size).toBe(0);
    expect((await db.query(`select count(*)::int as n from things where name like 'written %'`)).rows).toEqual([{ n: 3 }]);
    await db.query(`delete from things where name like 'written %'`);
  });

  it('waits for an open transaction instead of reading inside it', async () => {
    const cache = new StatementCache(db, { prepareAfter: 1 });
    const sql = 'select count(*)::int as n from things where name = $1';
    expect((await cache.query(sql, ['inside'])).rows).toEqual([{ n: 0 }]);
    let release!: () => void;
    const held = new Promise<void>((r) => (release = r));
    let inserted!: () => void;
    const didInsert = new Promise<void>((r) => (inserted = r));
    const tx = db.transaction(async (t) => {
      await t.query(`insert into things (name) values ('inside')`);
      inserted();
      await held;
      await t.query(`delete from things where name = 'inside'`);
    });
    await didInsert;
    let settled = false;
    const read = cache.query(sql, ['inside']).then((r) => {
      settled = true;
      return r;
    });
    await new Promise((r) => setTimeout(r, 50));
    expect(settled).toBe(false); // queued behind the transaction, not inside it
    release();
    await tx;
    expect((await read).rows).toEqual([{ n: 0 }]);
  });
});
