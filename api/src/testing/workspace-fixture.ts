import type { Express } from 'express';
import request from 'supertest';
import { and, eq } from 'drizzle-orm';
import { invitations, memberships, workspaces } from '../../../schema/src/index';
import type { Database } from '../db/database';
import type { Role } from '../workspaces/workspaces-dto';
import { bearer, signUp, type TestUser } from './test-app';

export interface WorkspaceFixture {
  workspaceId: string;
  name: string;
  owner: TestUser;
  members: Record<Exclude<Role, 'owner'>, TestUser>;
}

/** Adds a user to a workspace directly, as an accepted invitation would. */
export async function addMember(db: Database, workspaceId: string, user: TestUser, role: Role) {
  await db.insert(memberships).values({ workspaceId, userId: user.id, role });
}

/** A workspace with one member of every role, built through the API where it matters. */
export async function workspaceWithAllRoles(
  app: Express,
  db: Database,
  label: string,
): Promise<WorkspaceFixture> {
  const owner = await signUp(app, `${label}-owner`);
  const name = `Workspace ${label} ${owner.id.slice(0, 6)}`;
  const res = await request(app)
    .post('/api/v1/workspaces')
    .set('Authorization', bearer(owner))
    .send({ name });
  if (res.status !== 201) throw new Error(`workspace create failed: ${res.text}`);
  const workspaceId = res.body.id as string;
  const members = {
    editor: await signUp(app, `${label}-editor`),
    reviewer: await signUp(app, `${label}-reviewer`),
    viewer: await signUp(app, `${label}-viewer`),
  };
  for (const role of ['editor', 'reviewer', 'viewer'] as const) {
    await addMember(db, workspaceId, members[role], role);
  }
  return { workspaceId, name, owner, members };
}

/** Everything a forbidden request must leave untouched, for before/after comparison. */
export async function workspaceSnapshot(db: Database, workspaceId: string) {
  const [ws] = await db.select().from(workspaces).where(eq(workspaces.id, workspaceId));
  const ms = await db
    .select({ userId: memberships.userId, role: memberships.role })
    .from(memberships)
    .where(eq(memberships.workspaceId, workspaceId))
    .orderBy(memberships.userId);
  const inv = await db
    .select({ id: invitations.id, revokedAt: invitations.revokedAt })
    .from(invitations)
    .where(and(eq(invitations.workspaceId, workspaceId)))
    .orderBy(invitations.id);
  return { name: ws?.name, updatedAt: ws?.updatedAt, memberships: ms, invitations: inv };
}
