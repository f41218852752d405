import { and, desc, eq, isNull, sql } from 'drizzle-orm';
import { invitations, users, workspaces } from '../../../schema/src/index';
import type { Executor } from '../db/database';
import type { Role } from './workspaces-dto';

export async function insertInvitation(
  ex: Executor,
  values: {
    workspaceId: string;
    email: string;
    role: Role;
    tokenHash: string;
    invitedBy: string;
    expiresAt: Date;
  },
) {
  const rows = await ex.insert(invitations).values(values).returning();
  return rows[0]!;
}

const invitationWithInviter = {
  id: invitations.id,
  workspaceId: invitations.workspaceId,
  email: invitations.email,
  role: invitations.role,
  invitedBy: invitations.invitedBy,
  inviterName: users.displayName,
  createdAt: invitations.createdAt,
  expiresAt: invitations.expiresAt,
  acceptedAt: invitations.acceptedAt,
  revokedAt: invitations.revokedAt,
};

export type InvitationWithInviter = Awaited<ReturnType<typeof listInvitations>>[number];

export async function listInvitations(ex: Executor, workspaceId: string) {
  return ex
    .select(invitationWithInviter)
    .from(invitations)
    .innerJoin(users, eq(users.id, invitations.invitedBy))
    .where(eq(invitations.workspaceId, workspaceId))
    .orderBy(desc(invitations.createdAt), desc(invitations.id));
}

export async function findInvitationInWorkspace(ex: Executor, workspaceId: string, id: string) {
  const rows = await ex
    .select(invitationWithInviter)
    .from(invitations)
    .innerJoin(users, eq(users.id, invitations.invitedBy))
    .where(and(eq(invitations.workspaceId, workspaceId), eq(invitations.id, id)))
    .limit(1);
  return rows[0];
}

/** Finds an invitation by its token hash, with its workspace; `forUpdate` locks the row. */
export async function findInvitationByTokenHash(
  ex: Executor,
  tokenHash: string,
  forUpdate = false,
) {
  const query = ex
    .select({
      ...invitationWithInviter,
      workspaceName: workspaces.name,
      workspaceCreatedAt: workspaces.createdAt,
    })
    .from(invitations)
    .innerJoin(users, eq(users.id, invitations.invitedBy))
    .innerJoin(workspaces, eq(workspaces.id, invitations.workspaceId))
    .where(eq(invitations.tokenHash, tokenHash))
    .limit(1);
  const rows = forUpdate ? await query.for('update', { of: invitations }) : await query;
  return rows[0];
}

/** Revokes the still-open invitations for one e-mail; returns their ids. */
export async function revokePendingFor(
  ex: Executor,
  workspaceId: string,
  email: string,
  revokedBy: string,
): Promise<string[]> {
  const rows = await ex
    .update(invitations)
    .set({ revokedAt: new Date(), revokedBy })
    .where(
      and(
        eq(invitations.workspaceId, workspaceId),
        sql`lower(${invitations.email}) = ${email.toLowerCase()}`,
        isNull(invitations.acceptedAt),
        isNull(invitations.revokedAt),
      ),
    )
    .returning({ id: invitations.id });
  return rows.map((r) => r.id);
}

export async function revokeInvitation(ex: Executor, id: string, revokedBy: string) {
  await ex
    .update(invitations)
    .set({ revokedAt: new Date(), revokedBy })
    .where(and(eq(invitations.id, id), isNull(invitations.revokedAt)));
}

export async function markAccepted(ex: Executor, id: string, acceptedBy: string) {
  await ex
    .update(invitations)
    .set({ acceptedAt: new Date(), acceptedBy })
    .where(eq(invitations.id, id));
}
