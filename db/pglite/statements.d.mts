import type { PGlite, QueryOptions, Results } from '@electric-sql/pglite';

export const PGLITE_CONTRACT: {
  instance: Record<string, 'function' | 'object'>;
  protocol: Record<string, 'function'>;
  parse: Record<string, 'function'>;
};

export function pgliteContractProblems(db: unknown, exports?: { protocol?: unknown; parse?: unknown }): string[];
export function assertPgliteContract(db: unknown, exports?: { protocol?: unknown; parse?: unknown }): void;

export class StatementCache {
  constructor(db: PGlite, options?: { max?: number; prepareAfter?: number });
  query<T = Record<string, unknown>>(sql: string, params?: unknown[], options?: QueryOptions): Promise<Results<T>>;
  readonly size: number;
  readonly active: boolean;
}

export function withStatementCache(
  db: PGlite,
  options?: { max?: number; prepareAfter?: number },
): Pick<PGlite, 'query' | 'transaction'> & { statements: StatementCache };
