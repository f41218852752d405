import { listWorkspaceAudit, recordAudit } from '../audit/audit-repository';
import type { Database } from '../db/database';
import { ForbiddenError, LastOwnerError, NotFoundError } from '../errors/app-errors';
import * as repo from './workspaces-repository';
import type { AuditEventResponse, MemberResponse, Role, WorkspaceResponse } from './workspaces-dto';

type MemberRow = NonNullable<Awaited<ReturnType<typeof repo.findMembership>>>;

function toMember(row: MemberRow): MemberResponse {
  return {
    userId: row.userId,
    email: row.email,
    displayName: row.displayName,
    role: row.role,
    joinedAt: row.joinedAt.toISOString(),
  };
}

export class WorkspacesService {
  constructor(private readonly db: Database) {}

  /** The caller's role in a workspace, read from the database on every request. */
  async roleOf(workspaceId: string, userId: string): Promise<Role | undefined> {
    return (await repo.findMembership(this.db, workspaceId, userId))?.role;
  }

  async listForUser(userId: string): Promise<WorkspaceResponse[]> {
    const rows = await repo.listWorkspacesOfUser(this.db, userId);
    return rows.map((r) => ({ ...r, createdAt: r.createdAt.toISOString() }));
  }

  async create(userId: string, name: string): Promise<WorkspaceResponse> {
    return this.db.transaction(async (tx) => {
      const ws = await repo.insertWorkspace(tx, name, userId);
      await repo.insertMembership(tx, { workspaceId: ws.id, userId, role: 'owner' });
      await recordAudit(tx, {
        workspaceId: ws.id,
        actorId: userId,
        action: 'workspace.created',
        subject: name,
      });
      return { id: ws.id, name: ws.name, role: 'owner', createdAt: ws.createdAt.toISOString() };
    });
  }

  async get(workspaceId: string, role: Role): Promise<WorkspaceResponse> {
    const ws = await repo.findWorkspace(this.db, workspaceId);
    if (!ws) throw new NotFoundError('No such workspace');
    return { id: ws.id, name: ws.name, role, createdAt: ws.createdAt.toISOString() };
  }

  async rename(workspaceId: string, actorId: string, name: string): Promise<WorkspaceResponse> {
    return this.db.transaction(async (tx) => {
      const before = await repo.findWorkspace(tx, workspaceId);
      const ws = await repo.renameWorkspace(tx, workspaceId, name);
      if (!before || !ws) throw new NotFoundError('No such workspace');
      await recordAudit(tx, {
        workspaceId,
        actorId,
        action: 'workspace.renamed',
        subject: name,
        details: { from: before.name, to: name },
      });
      return { id: ws.id, name: ws.name, role: 'owner', createdAt: ws.createdAt.toISOString() };
    });
  }

  async listMembers(workspaceId: string): Promise<MemberResponse[]> {
    return (await repo.listMembers(this.db, workspaceId)).map(toMember);
  }

  /** Owner only; refuses to leave the workspace without an owner. */
  async changeRole(
    workspaceId: string,
    actorId: string,
    targetId: string,
    role: Role,
  ): Promise<MemberResponse> {
    return this.db.transaction(async (tx) => {
      await this.lockAsOwnerOrSelf(tx, workspaceId, actorId, null);
      const target = await repo.findMembership(tx, workspaceId, targetId);
      if (!target) throw new NotFoundError('No such member in this workspace');
      if (target.role === role) return toMember(target);
      if (target.role === 'owner' && (await repo.countOwners(tx, workspaceId)) <= 1) {
        throw new LastOwnerError();
      }
      await repo.updateMemberRole(tx, workspaceId, targetId, role);
      await recordAudit(tx, {
        workspaceId,
        actorId,
        action: 'member.role_changed',
        subject: target.email,
        details: { userId: targetId, from: target.role, to: role },
      });
      return toMember({ ...target, role });
    });
  }

  /** Owners may remove anyone; any member may leave. The last owner can do neither. */
  async removeMember(workspaceId: string, actorId: string, targetId: string): Promise<void> {
    await this.db.transaction(async (tx) => {
      await this.lockAsOwnerOrSelf(tx, workspaceId, actorId, targetId);
      const target = await repo.findMembership(tx, workspaceId, targetId);
      if (!target) throw new NotFoundError('No such member in this workspace');
      if (target.role === 'owner' && (await repo.countOwners(tx, workspaceId)) <= 1) {
        throw new LastOwnerError();
      }
      await repo.deleteMembership(tx, workspaceId, targetId);
      await recordAudit(tx, {
        workspaceId,
        actorId,
        action: 'member.removed',
        subject: target.email,
        details: { userId: targetId, role: target.role, left: actorId === targetId },
      });
    });
  }

  async listAudit(workspaceId: string): Promise<AuditEventResponse[]> {
    const rows = await listWorkspaceAudit(this.db, workspaceId);
    return rows.map((r) => ({
      id: r.id,
      action: r.action,
      actor: r.actorId ? { userId: r.actorId, displayName: r.actorName ?? '' } : null,
      subject: r.subject,
      createdAt: r.createdAt.toISOString(),
      details: r.details,
    }));
  }

  /**
   * Serialises membership changes of one workspace and re-reads the actor's role under the lock,
   * so two owners demoting each other at the same moment cannot both succeed.
   */
  private async lockAsOwnerOrSelf(
    tx: Parameters<typeof repo.lockWorkspace>[0],
    workspaceId: string,
    actorId: string,
    selfTargetId: string | null,
  ): Promise<void> {
    if (!(await repo.lockWorkspace(tx, workspaceId))) throw new NotFoundError('No such workspace');
    const actor = await repo.findMembership(tx, workspaceId, actorId);
    if (!actor) throw new NotFoundError('No such workspace');
    if (actor.role !== 'owner' && selfTargetId !== actorId) {
      throw new ForbiddenError('Only an owner can change other members');
    }
  }
}
