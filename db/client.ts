import { drizzle } from 'drizzle-orm/postgres-js';
import postgres from 'postgres';
import * as schema from './schema/index';

export type Database = ReturnType<typeof createDatabase>['db'];

export interface DatabaseOptions {
  /** Pool size, per process. */
  max?: number;
  /** Called with each statement sent to the server (benchmarks and tests count them). */
  onQuery?: (query: string) => void;
}

/** One postgres.js pool and its Drizzle handle. */
export function createDatabase(url: string, options: DatabaseOptions = {}) {
  const { onQuery } = options;
  const sql = postgres(url, {
    max: options.max ?? 10,
    connect_timeout: 5,
    idle_timeout: 30,
    onnotice: () => {},
    ...(onQuery ? { debug: (_connection: number, query: string) => onQuery(query) } : {}),
  });
  const db = drizzle(sql, { schema, casing: 'snake_case' });
  return { sql, db };
}
