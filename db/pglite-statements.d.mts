import type { PGlite, QueryOptions, Results } from '@electric-sql/pglite';

export class StatementCache {
  constructor(db: PGlite, options?: { max?: number; prepareAfter?: number });
  query<T = Record<string, unknown>>(sql: string, params?: unknown[], options?: QueryOptions): Promise<Results<T>>;
  readonly size: number;
}

export function withStatementCache(
  db: PGlite,
  options?: { max?: number; prepareAfter?: number },
): Pick<PGlite, 'query' | 'transaction'> & { statements: StatementCache };
