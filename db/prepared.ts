/**
 * Queries on the hot path (every request reads the caller, most read a layout) are built once
 * per database handle instead of on every call: drizzle then skips turning the query builder
 * into SQL, which costs about as much as a small query on the embedded database. On a
 * PostgreSQL server the name also makes it a server-side prepared statement per connection.
 */
import 'server-only';
import type { Db } from './client';

const byHandle = new WeakMap<Db, Map<string, unknown>>();

export function prepared<T>(db: Db, name: string, build: (db: Db) => T): T {
  let statements = byHandle.get(db);
  if (!statements) byHandle.set(db, (statements = new Map()));
  let statement = statements.get(name) as T | undefined;
  if (!statement) statements.set(name, (statement = build(db)));
  return statement;
}
