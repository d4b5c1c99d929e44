// Server-side prepared statements for the embedded database. PGlite's `query` parses and plans
// the SQL on every call (five protocol steps into WebAssembly); for the small joined reads on
// the hot path, planning is most of the cost. Here a read whose text has been seen before is
// parsed once as a named statement, and later calls only bind and execute it — in one buffer,
// with PGlite's own parameter serialisers and result parser.
//
// Only PGlite's public interface is used (see PGLITE_CONTRACT below; tests/adapters/pglite.test.ts
// runs it against the pinned version): `runExclusive` holds the query lock while the protocol
// messages run, and `isInTransaction` tells when a transaction is open between its statements —
// then the read goes to `query`, which waits for the transaction instead of reading inside it.
// Only reads take this path; writes and transactions use `query` as before.
// Plain ESM, shared by the database thread and the tests.
import { parse as pgParse, protocol } from '@electric-sql/pglite';

const NO_SYNC = { syncToFs: false };
const READ = /^\s*select\b/i;
const IN_TRANSACTION = Symbol('in transaction');
// Names are unique across every cache in this module instance (tests open several per database).
let nextName = 1;

/**
 * What this adapter needs of PGlite, by name and kind. All of it is public API of
 * @electric-sql/pglite 0.5.17; a later version that renames or drops a piece makes
 * `pgliteContractProblems` name it, the contract test fail, and the cache step aside.
 */
export const PGLITE_CONTRACT = {
  instance: {
    runExclusive: 'function',
    isInTransaction: 'function',
    execProtocolStream: 'function',
    query: 'function',
    serializers: 'object',
    parsers: 'object',
  },
  protocol: { parse: 'function', describe: 'function', bind: 'function', execute: 'function', sync: 'function', close: 'function' },
  parse: { parseResults: 'function', parseDescribeStatementResults: 'function' },
};

/** Every piece of PGLITE_CONTRACT that `db` (and the package's exports) lack, as readable lines. */
export function pgliteContractProblems(db, exports = { protocol, parse: pgParse }) {
  const problems = [];
  const check = (owner, where, wanted) => {
    for (const [name, kind] of Object.entries(wanted)) {
      const actual = owner == null ? 'undefined' : typeof owner[name];
      if (actual !== kind) problems.push(`${where}.${name} should be a ${kind}, is ${actual === 'undefined' ? 'missing' : `a ${actual}`}`);
    }
  };
  check(db, 'PGlite instance', PGLITE_CONTRACT.instance);
  check(exports.protocol?.serialize, "'@electric-sql/pglite' protocol.serialize", PGLITE_CONTRACT.protocol);
  check(exports.parse, "'@electric-sql/pglite' parse", PGLITE_CONTRACT.parse);
  return problems;
}

/** Throws one error naming every missing piece; the message says what to do about it. */
export function assertPgliteContract(db, exports) {
  const problems = pgliteContractProblems(db, exports);
  if (problems.length) {
    throw new Error(
      `The installed PGlite no longer offers what db/pglite/statements.mjs relies on:\n  - ${problems.join('\n  - ')}\n` +
        'Pin @electric-sql/pglite back to the version in package.json, or adapt db/pglite/statements.mjs to the new interface.',
    );
  }
}

function concat(parts) {
  const out = new Uint8Array(parts.reduce((n, p) => n + p.length, 0));
  let at = 0;
  for (const part of parts) {
    out.set(part, at);
    at += part.length;
  }
  return out;
}

let warned = false;

export class StatementCache {
  #db;
  #max;
  #prepareAfter;
  #seen = new Map(); // sql → times asked, until it is prepared
  #statements = new Map(); // sql → { name, paramTypes }, least recently used first
  #usable;

  /**
   * @param {import('@electric-sql/pglite').PGlite} db
   * @param {{ max?: number, prepareAfter?: number }} [options] at most `max` statements are kept
   *   (the oldest is closed); a text is prepared the `prepareAfter`-th time it is asked.
   */
  constructor(db, { max = 200, prepareAfter = 2 } = {}) {
    this.#db = db;
    this.#max = max;
    this.#prepareAfter = prepareAfter;
    const problems = pgliteContractProblems(db);
    this.#usable = problems.length === 0;
    if (!this.#usable && !warned) {
      // Still correct (every read goes to `query`), only slower: say so once.
      warned = true;
      console.warn(`[baywright] prepared reads are off: ${problems.join('; ')}`);
    }
  }

  /** Like `db.query(sql, params, options)`, with the same results and errors. */
  async query(sql, params = [], options = {}) {
    if (!this.#usable || !READ.test(sql) || !this.#worthPreparing(sql)) return this.#db.query(sql, params, options);
    const result = await this.#db.runExclusive(() => (this.#db.isInTransaction() ? IN_TRANSACTION : this.#run(sql, params, options)));
    // A transaction is open (between its statements): `query` waits for it to end.
    return result === IN_TRANSACTION ? this.#db.query(sql, params, options) : result;
  }

  /** How many statements are prepared now (for tests). */
  get size() {
    return this.#statements.size;
  }

  /** Whether reads go through prepared statements (false when PGlite's interface changed). */
  get active() {
    return this.#usable;
  }

  #worthPreparing(sql) {
    if (this.#statements.has(sql)) return true;
    const times = (this.#seen.get(sql) ?? 0) + 1;
    if (times >= this.#prepareAfter) {
      this.#seen.delete(sql);
      return true;
    }
    if (this.#seen.size >= 10 * this.#max) this.#seen.clear(); // one-off texts (e.g. IN lists) must not pile up
    this.#seen.set(sql, times);
    return false;
  }

  async #run(sql, params, options) {
    const { serialize } = protocol;
    const statement = await this.#statement(sql);
    const values = params.map((param, i) => {
      if (param === null || param === undefined) return null;
      const oid = statement.paramTypes[i];
      const serializer = options.serializers?.[oid] ?? this.#db.serializers[oid];
      return serializer ? serializer(param) : param.toString();
    });
    const messages = await this.#db.execProtocolStream(
      concat([serialize.bind({ statement: statement.name, values }), serialize.describe({ type: 'P' }), serialize.execute({}), serialize.sync()]),
      NO_SYNC,
    );
    return pgParse.parseResults(messages, this.#db.parsers, options)[0];
  }

  async #statement(sql) {
    const { serialize } = protocol;
    const known = this.#statements.get(sql);
    if (known) {
      this.#statements.delete(sql);
      this.#statements.set(sql, known);
      return known;
    }
    const name = `bw_stmt_${nextName++}`;
    // Sync is in the same buffer, so a statement that fails to parse leaves no error state behind.
    const described = await this.#db.execProtocolStream(
      concat([serialize.parse({ name, text: sql }), serialize.describe({ type: 'S', name }), serialize.sync()]),
      NO_SYNC,
    );
    const statement = { name, paramTypes: pgParse.parseDescribeStatementResults(described) };
    this.#statements.set(sql, statement);
    if (this.#statements.size > this.#max) {
      const [oldSql, old] = this.#statements.entries().next().value;
      this.#statements.delete(oldSql);
      await this.#db.execProtocolStream(concat([serialize.close({ type: 'S', name: old.name }), serialize.sync()]), NO_SYNC);
    }
    return statement;
  }
}

/**
 * What drizzle uses of a PGlite — `query` and `transaction` — with reads through a statement
 * cache, for `drizzle({ client })` in this thread (scripts and tests; the server's database
 * thread does the same inside).
 */
export function withStatementCache(db, options) {
  const statements = new StatementCache(db, options);
  return {
    query: (sql, params, queryOptions) => statements.query(sql, params, queryOptions),
    transaction: (fn) => db.transaction(fn),
    statements,
  };
}
