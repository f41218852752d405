/** The parts of a PostgreSQL error the services branch on (SQLSTATE and the constraint name). */
export interface PostgresError {
  code: string;
  constraint?: string;
}

/**
 * Finds the PostgreSQL error behind a failed query. Drizzle wraps the driver's error in its own
 * (the original is `cause`), so the chain is walked a few steps.
 */
export function postgresError(err: unknown): PostgresError | undefined {
  let current: unknown = err;
  for (let depth = 0; depth < 4 && current !== null && typeof current === 'object'; depth++) {
    const candidate = current as { code?: unknown; constraint?: unknown; cause?: unknown };
    if (typeof candidate.code === 'string' && /^[0-9A-Z]{5}$/.test(candidate.code)) {
      return {
        code: candidate.code,
        constraint: typeof candidate.constraint === 'string' ? candidate.constraint : undefined,
      };
    }
    current = candidate.cause;
  }
  return undefined;
}

/** SQLSTATE 23505: a unique constraint refused the row. */
export const UNIQUE_VIOLATION = '23505';
/** SQLSTATE 23503: a foreign key refused the change (a delete of a row still referenced). */
export const FOREIGN_KEY_VIOLATION = '23503';
