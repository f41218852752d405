import { eq, inArray, sql } from 'drizzle-orm';
import { afterAll, describe, expect, it } from 'vitest';
import { hashPassword, verifyPassword } from '../api/src/auth/password-hasher';
import { openTestDatabase } from '../api/src/testing/test-app';
import { auditEvents, memberships, users, workspaces } from '../schema/src/index';
import { demoPassword, demoPeople, demoWorkspace } from './demo-workspace';
import { loadDemo } from './load-demo';

const handle = await openTestDatabase();
afterAll(() => handle.close());
const emails = demoPeople.map((p) => p.email);

async function state() {
  const db = handle.db;
  const u = await db
    .select({ id: users.id, email: users.email, hash: users.passwordHash })
    .from(users)
    .where(inArray(users.email, emails))
    .orderBy(users.email);
  const w = await db.select().from(workspaces).where(eq(workspaces.id, demoWorkspace.id));
  const m = await db
    .select({ userId: memberships.userId, role: memberships.role })
    .from(memberships)
    .where(eq(memberships.workspaceId, demoWorkspace.id))
    .orderBy(memberships.userId);
  const a = await db
    .select({ n: sql<number>`count(*)::int` })
    .from(auditEvents)
    .where(eq(auditEvents.workspaceId, demoWorkspace.id));
  return { users: u, workspaces: w, memberships: m, audit: a[0]!.n };
}

describe('loadDemo', () => {
  it('loads four people, one per role, at .example, and reloads to the same state', async () => {
    const first = await loadDemo(handle.db);
    expect(first.map((s) => s.role).sort()).toEqual(['editor', 'owner', 'reviewer', 'viewer']);
    expect(first.every((s) => s.email.endsWith('.example'))).toBe(true);
    const after1 = await state();
    expect(after1.users).toHaveLength(4);
    expect(after1.workspaces).toHaveLength(1);
    expect(after1.memberships).toHaveLength(4);
    await loadDemo(handle.db);
    expect(await state()).toEqual(after1);
  });

  it('never overwrites a password someone changed, and says so', async () => {
    await loadDemo(handle.db);
    const viewer = demoPeople.find((p) => p.role === 'viewer')!;
    const changed = await hashPassword('changed by the viewer');
    await handle.db
      .update(users)
      .set({ passwordHash: changed })
      .where(eq(users.email, viewer.email));
    try {
      const signIns = await loadDemo(handle.db);
      const [row] = await handle.db.select().from(users).where(eq(users.email, viewer.email));
      expect(row!.passwordHash).toBe(changed);
      expect(signIns.find((s) => s.email === viewer.email)?.passwordChanged).toBe(true);
      expect(signIns.filter((s) => s.passwordChanged)).toHaveLength(1);
    } finally {
      // Put the demo password back so a rerun of this file against the same database passes.
      await handle.db
        .update(users)
        .set({ passwordHash: await hashPassword(demoPassword) })
        .where(eq(users.email, viewer.email));
    }
    const [restored] = await handle.db.select().from(users).where(eq(users.email, viewer.email));
    expect(await verifyPassword(restored!.passwordHash, demoPassword)).toBe(true);
  });
});
