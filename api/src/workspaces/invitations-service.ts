import { recordAudit } from '../audit/audit-repository';
import { normaliseEmail } from '../auth/auth-service';
import { hashSecretToken, newSecretToken } from '../auth/secret-token';
import type { Database } from '../db/database';
import { ConflictError, NotFoundError } from '../errors/app-errors';
import { invitationMail } from '../mail/mail-templates';
import { insertOutboxMessage } from '../mail/outbox-repository';
import * as invites from './invitations-repository';
import * as repo from './workspaces-repository';
import type {
  AcceptInvitationResponse,
  InvitationPreviewResponse,
  InvitationResponse,
  InvitationStatus,
  Role,
} from './workspaces-dto';

// A week covers a colleague on holiday; longer leaves live links lying in mailboxes.
const invitationLifetimeMs = 7 * 24 * 3600_000;

function toInvitation(row: invites.InvitationWithInviter): InvitationResponse {
  return {
    id: row.id,
    email: row.email,
    role: row.role,
    invitedBy: { userId: row.invitedBy, displayName: row.inviterName },
    createdAt: row.createdAt.toISOString(),
    expiresAt: row.expiresAt.toISOString(),
    acceptedAt: row.acceptedAt?.toISOString() ?? null,
    revokedAt: row.revokedAt?.toISOString() ?? null,
  };
}

function statusOf(row: invites.InvitationWithInviter, now = new Date()): InvitationStatus {
  if (row.acceptedAt) return 'accepted';
  if (row.revokedAt) return 'revoked';
  if (row.expiresAt <= now) return 'expired';
  return 'pending';
}

export class InvitationsService {
  constructor(
    private readonly db: Database,
    private readonly appUrl: string,
  ) {}

  async list(workspaceId: string): Promise<InvitationResponse[]> {
    return (await invites.listInvitations(this.db, workspaceId)).map(toInvitation);
  }

  /** Creates the invitation and queues its mail in one transaction; replaces open ones. */
  async invite(
    workspaceId: string,
    inviterId: string,
    emailInput: string,
    role: Role,
  ): Promise<InvitationResponse> {
    const email = normaliseEmail(emailInput);
    const { token, hash } = newSecretToken();
    return this.db.transaction(async (tx) => {
      const ws = await repo.findWorkspace(tx, workspaceId);
      const inviter = await repo.findMembership(tx, workspaceId, inviterId);
      if (!ws || !inviter) throw new NotFoundError('No such workspace');
      const members = await repo.listMembers(tx, workspaceId);
      if (members.some((m) => m.email.toLowerCase() === email)) {
        throw new ConflictError('This person is a member already', 'email');
      }
      const replaced = await invites.revokePendingFor(tx, workspaceId, email, inviterId);
      const row = await invites.insertInvitation(tx, {
        workspaceId,
        email,
        role,
        tokenHash: hash,
        invitedBy: inviterId,
        expiresAt: new Date(Date.now() + invitationLifetimeMs),
      });
      await insertOutboxMessage(
        tx,
        invitationMail({
          invitationId: row.id,
          to: email,
          appUrl: this.appUrl,
          token,
          workspaceName: ws.name,
          inviterName: inviter.displayName,
          role,
          expiresAt: row.expiresAt,
        }),
      );
      await recordAudit(tx, {
        workspaceId,
        actorId: inviterId,
        action: 'invitation.sent',
        subject: email,
        details: { invitationId: row.id, role, replaced },
      });
      return toInvitation({ ...row, inviterName: inviter.displayName });
    });
  }

  async revoke(workspaceId: string, actorId: string, invitationId: string): Promise<void> {
    await this.db.transaction(async (tx) => {
      const row = await invites.findInvitationInWorkspace(tx, workspaceId, invitationId);
      if (!row) throw new NotFoundError('No such invitation in this workspace');
      if (row.acceptedAt) throw new ConflictError('The invitation was accepted already');
      if (row.revokedAt) return;
      await invites.revokeInvitation(tx, invitationId, actorId);
      await recordAudit(tx, {
        workspaceId,
        actorId,
        action: 'invitation.revoked',
        subject: row.email,
        details: { invitationId },
      });
    });
  }

  async preview(token: string): Promise<InvitationPreviewResponse> {
    const row = await invites.findInvitationByTokenHash(this.db, hashSecretToken(token));
    if (!row) throw new NotFoundError('No such invitation');
    return {
      workspaceName: row.workspaceName,
      email: row.email,
      role: row.role,
      invitedByName: row.inviterName,
      expiresAt: row.expiresAt.toISOString(),
      status: statusOf(row),
    };
  }

  /** The token is the proof; whoever is signed in joins with the invited role, once. */
  async accept(token: string, userId: string): Promise<AcceptInvitationResponse> {
    return this.db.transaction(async (tx) => {
      const row = await invites.findInvitationByTokenHash(tx, hashSecretToken(token), true);
      if (!row) throw new NotFoundError('No such invitation');
      const status = statusOf(row);
      if (status !== 'pending') throw new ConflictError(`The invitation is ${status}`);
      if (
        !(await repo.insertMembership(tx, { workspaceId: row.workspaceId, userId, role: row.role }))
      ) {
        throw new ConflictError('You are a member of this workspace already');
      }
      await invites.markAccepted(tx, row.id, userId);
      await recordAudit(tx, {
        workspaceId: row.workspaceId,
        actorId: userId,
        action: 'invitation.accepted',
        subject: row.email,
        details: { invitationId: row.id, role: row.role, acceptedBy: userId },
      });
      return {
        workspace: {
          id: row.workspaceId,
          name: row.workspaceName,
          role: row.role,
          createdAt: row.workspaceCreatedAt.toISOString(),
        },
      };
    });
  }
}
