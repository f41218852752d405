import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { drizzle } from 'drizzle-orm/node-postgres';
import { migrate as drizzleMigrate } from 'drizzle-orm/node-postgres/migrator';
import pg from 'pg';

// Any fixed 64-bit number works; every Couplet process must use the same one so that two
// start-ups (or two test files) never run the migrations at the same time.
const migrationLockKey = 4_300_730_001;

/**
 * schema/migrations of the checkout this file runs from. Found by walking up, because the file
 * runs both from api/src (tsx, tests) and bundled into dist/api (npm start).
 */
export function findMigrationsFolder(start = path.dirname(fileURLToPath(import.meta.url))): string {
  for (let dir = start; ; dir = path.dirname(dir)) {
    const candidate = path.join(dir, 'schema', 'migrations');
    if (fs.existsSync(path.join(candidate, 'meta', '_journal.json'))) return candidate;
    if (path.dirname(dir) === dir) {
      throw new Error(`schema/migrations not found above ${start}; set MIGRATIONS_DIR`);
    }
  }
}

/** Applies the committed SQL migrations; safe to call from many processes at once. */
export async function migrate(
  databaseUrl: string,
  migrationsFolder = process.env.MIGRATIONS_DIR ?? findMigrationsFolder(),
): Promise<void> {
  const client = new pg.Client({ connectionString: databaseUrl });
  await client.connect();
  try {
    await client.query('SELECT pg_advisory_lock($1)', [migrationLockKey]);
    try {
      await drizzleMigrate(drizzle(client), { migrationsFolder });
    } finally {
      await client.query('SELECT pg_advisory_unlock($1)', [migrationLockKey]);
    }
  } finally {
    await client.end();
  }
}
