import { sql } from 'drizzle-orm';
import { afterAll, describe, expect, it } from 'vitest';
import { openTestDatabase, testDatabaseUrl } from '../testing/test-app';
import { findMigrationsFolder, migrate } from './migrate';

const handle = await openTestDatabase();
afterAll(() => handle.close());

describe('migrate', () => {
  it('runs concurrently and repeatedly without error, applying each migration once', async () => {
    await Promise.all([
      migrate(testDatabaseUrl()),
      migrate(testDatabaseUrl()),
      migrate(testDatabaseUrl()),
    ]);
    const rows = await handle.db.execute<{ n: number }>(
      sql`SELECT count(*)::int AS n FROM drizzle.__drizzle_migrations`,
    );
    const journal = await import(`${findMigrationsFolder()}/meta/_journal.json`, {
      with: { type: 'json' },
    });
    expect(rows.rows[0]!.n).toBe((journal.default as { entries: unknown[] }).entries.length);
  });

  it('creates the one-membership-per-user-and-workspace constraint', async () => {
    const rows = await handle.db.execute<{ conname: string }>(
      sql`SELECT conname FROM pg_constraint WHERE conname = 'memberships_workspace_user_unique'`,
    );
    expect(rows.rows).toHaveLength(1);
  });
});
