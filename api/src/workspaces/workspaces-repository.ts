import { and, asc, count, eq, sql } from 'drizzle-orm';
import { memberships, users, workspaces } from '../../../schema/src/index';
import type { Executor } from '../db/database';
import type { Role } from './workspaces-dto';

// The only place where workspaces and memberships meet Drizzle.

export async function insertWorkspace(ex: Executor, name: string, createdBy: string) {
  const rows = await ex.insert(workspaces).values({ name, createdBy }).returning();
  return rows[0]!;
}

export async function insertMembership(
  ex: Executor,
  values: { workspaceId: string; userId: string; role: Role },
): Promise<boolean> {
  const rows = await ex
    .insert(memberships)
    .values(values)
    .onConflictDoNothing()
    .returning({ id: memberships.id });
  return rows.length === 1;
}

export async function findWorkspace(ex: Executor, id: string) {
  const rows = await ex.select().from(workspaces).where(eq(workspaces.id, id)).limit(1);
  return rows[0];
}

/** Locks the workspace row so concurrent membership changes are applied one after another. */
export async function lockWorkspace(ex: Executor, id: string): Promise<boolean> {
  const rows = await ex.execute(sql`SELECT id FROM ${workspaces} WHERE id = ${id} FOR UPDATE`);
  return rows.rows.length === 1;
}

export async function renameWorkspace(ex: Executor, id: string, name: string) {
  const rows = await ex
    .update(workspaces)
    .set({ name, updatedAt: new Date() })
    .where(eq(workspaces.id, id))
    .returning();
  return rows[0];
}

export async function listWorkspacesOfUser(ex: Executor, userId: string) {
  return ex
    .select({
      id: workspaces.id,
      name: workspaces.name,
      role: memberships.role,
      createdAt: workspaces.createdAt,
    })
    .from(memberships)
    .innerJoin(workspaces, eq(workspaces.id, memberships.workspaceId))
    .where(eq(memberships.userId, userId))
    .orderBy(asc(workspaces.name), asc(workspaces.id));
}

/** What a member row shows: the membership and the person behind it. */
const memberColumns = {
  userId: memberships.userId,
  role: memberships.role,
  joinedAt: memberships.createdAt,
  email: users.email,
  displayName: users.displayName,
};

export async function findMembership(ex: Executor, workspaceId: string, userId: string) {
  const rows = await ex
    .select(memberColumns)
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.workspaceId, workspaceId), eq(memberships.userId, userId)))
    .limit(1);
  return rows[0];
}

export async function listMembers(ex: Executor, workspaceId: string) {
  return ex
    .select(memberColumns)
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.workspaceId, workspaceId))
    .orderBy(asc(memberships.createdAt), asc(users.email));
}

export async function countOwners(ex: Executor, workspaceId: string): Promise<number> {
  const rows = await ex
    .select({ n: count() })
    .from(memberships)
    .where(and(eq(memberships.workspaceId, workspaceId), eq(memberships.role, 'owner')));
  return rows[0]?.n ?? 0;
}

export async function updateMemberRole(
  ex: Executor,
  workspaceId: string,
  userId: string,
  role: Role,
) {
  await ex
    .update(memberships)
    .set({ role, updatedAt: new Date() })
    .where(and(eq(memberships.workspaceId, workspaceId), eq(memberships.userId, userId)));
}

export async function deleteMembership(ex: Executor, workspaceId: string, userId: string) {
  await ex
    .delete(memberships)
    .where(and(eq(memberships.workspaceId, workspaceId), eq(memberships.userId, userId)));
}
