import { drizzle, type NodePgDatabase } from 'drizzle-orm/node-postgres';
import pg from 'pg';
import * as schema from '../../../schema/src/index';

export type Database = NodePgDatabase<typeof schema>;
/** A transaction handle; repositories accept either it or the database. */
export type Transaction = Parameters<Parameters<Database['transaction']>[0]>[0];
export type Executor = Database | Transaction;

export interface DatabaseHandle {
  pool: pg.Pool;
  db: Database;
  close(): Promise<void>;
}

export function createDatabase(
  databaseUrl: string,
  max = 10,
  onIdleError: (err: Error) => void = () => {},
): DatabaseHandle {
  const pool = new pg.Pool({ connectionString: databaseUrl, max });
  // An idle connection dropped by the server (restart, admin command) emits 'error' on the pool;
  // unhandled, that would crash the process. The pool replaces the connection on next use.
  pool.on('error', onIdleError);
  const db = drizzle(pool, { schema });
  return { pool, db, close: () => pool.end() };
}
