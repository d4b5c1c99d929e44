// The contract between db/pglite/ and the pinned PGlite. The prepared reads (statements.mjs)
// speak PostgreSQL's extended protocol through PGlite's public `execProtocolStream`, under its
// public `runExclusive`, and ask `isInTransaction` before reading. If an upgrade renames, drops
// or changes the behaviour of any of it, this file fails and says which piece, instead of the
// server slowing down or reading inside someone else's transaction.
import fs from 'node:fs';
import path from 'node:path';
import { PGlite, parse, protocol } from '@electric-sql/pglite';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { emptyCluster } from '@/db/pglite/template.mjs';
import { PGLITE_CONTRACT, StatementCache, assertPgliteContract, pgliteContractProblems } from '@/db/pglite/statements.mjs';

let db: PGlite;

beforeAll(async () => {
  db = await PGlite.create({ loadDataDir: emptyCluster() }); // an initialised cluster, no initdb
  await db.exec(`create table notes (id int primary key, body text not null)`);
  await db.exec(`insert into notes values (1, 'one'), (2, 'two')`);
});
afterAll(() => db.close());

describe('the PGlite this project pins', () => {
  it('is the version package.json names', () => {
    const pinned = JSON.parse(fs.readFileSync(path.join(process.cwd(), 'package.json'), 'utf8')).dependencies['@electric-sql/pglite'];
    const installed = JSON.parse(fs.readFileSync(path.join(process.cwd(), 'node_modules/@electric-sql/pglite/package.json'), 'utf8')).version;
    expect(installed, 'the installed PGlite differs from the pin: run npm ci').toBe(pinned);
  });

  it('offers every method and export the adapter uses', () => {
    // assertPgliteContract throws one error listing every missing piece.
    expect(() => assertPgliteContract(db)).not.toThrow();
    expect(pgliteContractProblems(db)).toEqual([]);
    expect(new StatementCache(db).active).toBe(true);
  });

  it('runExclusive keeps queries out until it is done', async () => {
    const order: string[] = [];
    let release!: () => void;
    const held = db.runExclusive(async () => {
      order.push('exclusive start');
      await new Promise<void>((r) => (release = r));
      order.push('exclusive end');
    });
    await new Promise((r) => setTimeout(r, 10));
    const query = db.query('select 1 as one').then(() => order.push('query'));
    await new Promise((r) => setTimeout(r, 30));
    expect(order).toEqual(['exclusive start']);
    release();
    await Promise.all([held, query]);
    expect(order).toEqual(['exclusive start', 'exclusive end', 'query']);
  });

  it('isInTransaction is true between the statements of an open transaction, false otherwise', async () => {
    expect(db.isInTransaction()).toBe(false);
    let release!: () => void;
    let begun!: () => void;
    const didBegin = new Promise<void>((r) => (begun = r));
    const tx = db.transaction(async (t) => {
      await t.query('select 1');
      begun();
      await new Promise<void>((r) => (release = r));
    });
    await didBegin;
    // Between two statements of the transaction, as a read arriving then would see it.
    const inside = await db.runExclusive(async () => db.isInTransaction());
    release();
    await tx;
    expect(inside).toBe(true);
    expect(db.isInTransaction()).toBe(false);
  });

  it('speaks the extended protocol: parse, describe, bind, execute, sync, close', async () => {
    const { serialize } = protocol;
    const join = (parts: Uint8Array[]) => Uint8Array.from(parts.flatMap((p) => [...p]));
    const described = await db.execProtocolStream(
      join([serialize.parse({ name: 'contract_1', text: 'select body from notes where id = $1' }), serialize.describe({ type: 'S', name: 'contract_1' }), serialize.sync()]),
      { syncToFs: false },
    );
    expect(parse.parseDescribeStatementResults(described)).toEqual([23]); // int4
    const messages = await db.execProtocolStream(
      join([serialize.bind({ statement: 'contract_1', values: ['2'] }), serialize.describe({ type: 'P' }), serialize.execute({}), serialize.sync()]),
      { syncToFs: false },
    );
    const [result] = parse.parseResults(messages, db.parsers, {});
    expect(result.rows).toEqual([{ body: 'two' }]);
    expect(result.fields).toEqual([{ name: 'body', dataTypeID: 25 }]);
    await db.execProtocolStream(join([serialize.close({ type: 'S', name: 'contract_1' }), serialize.sync()]), { syncToFs: false });
    const { rows } = await db.query(`select count(*)::int as n from pg_prepared_statements where name = 'contract_1'`);
    expect(rows).toEqual([{ n: 0 }]);
  });

  it('keeps its serialisers and parsers by type oid', () => {
    expect(typeof db.serializers[3802]).toBe('function'); // jsonb
    expect(typeof db.parsers[3802]).toBe('function');
  });
});

describe('when PGlite changes', () => {
  it('names each missing or reshaped piece in one loud error', () => {
    const renamed = { ...Object.fromEntries(Object.keys(PGLITE_CONTRACT.instance).map((k) => [k, () => undefined])), serializers: {}, parsers: {} } as Record<string, unknown>;
    delete renamed.runExclusive;
    renamed.isInTransaction = true;
    const exports = { protocol: { serialize: { ...protocol.serialize, bind: undefined } }, parse };
    expect(() => assertPgliteContract(renamed, exports)).toThrow(
      /no longer offers what db\/pglite\/statements\.mjs relies on:\n {2}- PGlite instance\.runExclusive should be a function, is missing\n {2}- PGlite instance\.isInTransaction should be a function, is a boolean\n {2}- '@electric-sql\/pglite' protocol\.serialize\.bind should be a function, is missing\nPin @electric-sql\/pglite back/,
    );
  });

  it('still answers every read, through query, when the contract is broken', async () => {
    const partial = new Proxy(db, {
      get: (target, key) => {
        if (key === 'runExclusive') return undefined;
        const value = Reflect.get(target, key, target);
        return typeof value === 'function' ? value.bind(target) : value;
      },
    });
    const cache = new StatementCache(partial as PGlite, { prepareAfter: 1 });
    expect(cache.active).toBe(false);
    expect((await cache.query('select body from notes where id = $1', [1])).rows).toEqual([{ body: 'one' }]);
    expect(cache.size).toBe(0);
  });
});
