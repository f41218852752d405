import { drizzle } from 'drizzle-orm/node-postgres';
import type pg from 'pg';
import * as schema from '../../../schema/src/index';
import type { Database } from '../db/database';

/**
 * A transaction on one pooled connection that both Drizzle and raw SQL (pg-boss's job insert)
 * use, so a run row and its queue job commit or roll back together. The database handle is a
 * Drizzle instance over a pg.Pool (createDatabase); its pool is Drizzle's `$client`.
 */
export async function clientTransaction<T>(
  db: Database,
  work: (tx: Database, client: pg.PoolClient) => Promise<T>,
): Promise<T> {
  const pool = (db as Database & { $client?: pg.Pool }).$client;
  if (!pool || typeof pool.connect !== 'function') {
    throw new Error('clientTransaction needs a Drizzle database over a pg.Pool');
  }
  const client = await pool.connect();
  let broken: Error | undefined;
  try {
    await client.query('BEGIN');
    const result = await work(drizzle(client, { schema }), client);
    await client.query('COMMIT');
    return result;
  } catch (error) {
    try {
      await client.query('ROLLBACK');
    } catch (rollbackError) {
      // A connection that cannot roll back is not handed to the next request.
      broken = rollbackError as Error;
    }
    throw error;
  } finally {
    client.release(broken);
  }
}
