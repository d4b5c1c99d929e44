// Server-side prepared statements for the embedded database. PGlite's `query` parses and plans
// the SQL on every call (five protocol steps into WebAssembly); for the small joined reads on
// the hot path, planning is most of the cost. Here a read whose text has been seen before is
// parsed once as a named statement, and later calls only bind and execute it — in one buffer,
// under the same locks `query` takes, with PGlite's own parameter serialisers and result parser.
// Only reads outside a transaction take this path; writes and transactions use `query` as before.
// Plain ESM, shared by the database thread and the tests.
import { parse as pgParse, protocol } from '@electric-sql/pglite';

const { serialize } = protocol;
const NO_SYNC = { syncToFs: false };
const READ = /^\s*select\b/i;
// Names are unique across every cache in this module instance (tests open several per database).
let nextName = 1;

function concat(parts) {
  const out = new Uint8Array(parts.reduce((n, p) => n + p.length, 0));
  let at = 0;
  for (const part of parts) {
    out.set(part, at);
    at += part.length;
  }
  return out;
}

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
    // The locks are PGlite's own; without them (another PGlite version) every query goes to `query`.
    this.#usable = typeof db._runExclusiveTransaction === 'function' && typeof db._runExclusiveQuery === 'function';
  }

  /** Like `db.query(sql, params, options)`, with the same results and errors. */
  query(sql, params = [], options = {}) {
    if (!this.#usable || !READ.test(sql) || !this.#worthPreparing(sql)) return this.#db.query(sql, params, options);
    return this.#db._runExclusiveTransaction(() => this.#db._runExclusiveQuery(() => this.#run(sql, params, options)));
  }

  /** How many statements are prepared now (for tests). */
  get size() {
    return this.#statements.size;
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
