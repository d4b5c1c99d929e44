// The embedded database on a thread of its own (see db/pglite/thread-client.ts). Plain ESM, not
// bundled: the server starts it with `new Worker(path)`. It opens the folder, migrates it, then
// answers { id, op } messages with { id, ok, result } or { id, ok: false, error }.
import { parentPort, workerData } from 'node:worker_threads';
import { PGlite, types } from '@electric-sql/pglite';
import { drizzle } from 'drizzle-orm/pglite';
import { migrate } from 'drizzle-orm/pglite/migrator';
import { templateFor } from './template.mjs';
import { StatementCache } from './statements.mjs';

// Dates, times and intervals stay text, as drizzle asks of PGlite when it runs in-thread.
const keepText = (value) => value;
const PARSERS = {
  [types.TIMESTAMP]: keepText,
  [types.TIMESTAMPTZ]: keepText,
  [types.INTERVAL]: keepText,
  [types.DATE]: keepText,
  1231: keepText, // numeric[]
  1115: keepText, // timestamp[]
  1185: keepText, // timestamptz[]
  1187: keepText, // interval[]
  1182: keepText, // date[]
};

/** What a caller may need of a database error: SQLSTATE, constraint, detail; never a stack. */
function errorFields(err) {
  const e = err ?? {};
  return {
    name: e.name ?? 'Error',
    message: String(e.message ?? err),
    code: e.code,
    constraint: e.constraint,
    detail: e.detail,
    table: e.table,
    column: e.column,
    severity: e.severity,
  };
}

let db;
let statements;
const transactions = new Map();
let nextTx = 1;

async function run(msg) {
  switch (msg.op) {
    case 'query': {
      const target = msg.tx ? transactions.get(msg.tx)?.tx : statements;
      if (!target) throw new Error(`transaction ${msg.tx} is not open`);
      const result = await target.query(msg.sql, msg.params ?? [], { rowMode: msg.rowMode ?? 'object', parsers: PARSERS });
      return { rows: result.rows, fields: result.fields, affectedRows: result.affectedRows };
    }
    case 'exec': {
      const target = msg.tx ? transactions.get(msg.tx)?.tx : db;
      if (!target) throw new Error(`transaction ${msg.tx} is not open`);
      return (await target.exec(msg.sql)).map((r) => ({ rows: r.rows, fields: r.fields, affectedRows: r.affectedRows }));
    }
    case 'begin': {
      const id = nextTx++;
      // PGlite's transaction holds the database until its callback settles; 'end' settles it.
      return new Promise((opened, failed) => {
        const done = db
          .transaction(
            (tx) =>
              new Promise((commit, rollback) => {
                transactions.set(id, { tx, commit, rollback, done });
                opened(id);
              }),
          )
          .finally(() => transactions.delete(id));
        done.catch((err) => failed(err)); // a BEGIN that never opened
      });
    }
    case 'end': {
      const open = transactions.get(msg.tx);
      if (!open?.commit) throw new Error(`transaction ${msg.tx} is not open`);
      if (msg.commit) open.commit();
      else open.rollback(new Error('rolled back'));
      try {
        await open.done;
      } catch (err) {
        if (msg.commit) throw err;
      }
      return null;
    }
    case 'dump': {
      // A consistent copy of the whole cluster, taken between queries (PGlite runs one at a time).
      const blob = await db.dumpDataDir('gzip');
      return new Uint8Array(await blob.arrayBuffer());
    }
    case 'close':
      await db.close();
      return null;
    default:
      throw new Error(`unknown operation ${msg.op}`);
  }
}

try {
  // A new folder starts from the install-time template when there is one (template.mjs).
  db = await PGlite.create({ dataDir: workerData.dir, loadDataDir: templateFor(workerData.dir) });
  if (workerData.migrationsFolder) await migrate(drizzle(db), { migrationsFolder: workerData.migrationsFolder });
  statements = new StatementCache(db); // after migrating: no statement outlives a schema change
  parentPort.on('message', (msg) => {
    run(msg).then(
      (result) => parentPort.postMessage({ id: msg.id, ok: true, result }),
      (err) => parentPort.postMessage({ id: msg.id, ok: false, error: errorFields(err) }),
    );
  });
  parentPort.postMessage({ ready: true });
} catch (err) {
  parentPort.postMessage({ ready: false, error: errorFields(err) });
}
