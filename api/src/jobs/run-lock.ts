import type { SqlClient } from './sweep-queue';

/**
 * First key of the two-key advisory locks that mark a run as being computed. Any fixed int4
 * works; every Couplet process must use the same one (migrations use a different, 64-bit key).
 */
const RUN_LOCK_CLASS = 43_007_302;

/**
 * Takes the session-level advisory lock of a run on this connection; false if another session
 * holds it. The lock is how a crashed worker is told from a live one: PostgreSQL releases it
 * when the worker's connection ends, whichever machine it ran on.
 */
export async function tryLockRun(client: SqlClient, runId: string): Promise<boolean> {
  const { rows } = await client.query('SELECT pg_try_advisory_lock($1, hashtext($2)) AS locked', [
    RUN_LOCK_CLASS,
    runId,
  ]);
  return (rows[0] as { locked: boolean }).locked;
}

export async function unlockRun(client: SqlClient, runId: string): Promise<void> {
  await client.query('SELECT pg_advisory_unlock($1, hashtext($2))', [RUN_LOCK_CLASS, runId]);
}
