import { desc, eq } from 'drizzle-orm';
import { auditEvents, users } from '../../../schema/src/index';
import type { Executor } from '../db/database';

export type AuditAction =
  | 'user.signed_up'
  | 'user.password_reset'
  | 'workspace.created'
  | 'workspace.renamed'
  | 'invitation.sent'
  | 'invitation.accepted'
  | 'invitation.revoked'
  | 'member.role_changed'
  | 'member.removed'
  | 'coil.created'
  | 'coil.updated'
  | 'coil.duplicated'
  | 'coil.deleted'
  | 'study.created'
  | 'study.updated'
  | 'study.deleted'
  | 'revision.created';

export interface NewAuditEvent {
  workspaceId: string | null;
  actorId: string | null;
  action: AuditAction;
  subject: string;
  details?: Record<string, unknown>;
}

/** Written inside the transaction of the action it records, so the two never disagree. */
export async function recordAudit(ex: Executor, event: NewAuditEvent): Promise<void> {
  await ex.insert(auditEvents).values({ ...event, details: event.details ?? {} });
}

export async function listWorkspaceAudit(ex: Executor, workspaceId: string, limit = 200) {
  return ex
    .select({
      id: auditEvents.id,
      action: auditEvents.action,
      actorId: auditEvents.actorId,
      actorName: users.displayName,
      subject: auditEvents.subject,
      details: auditEvents.details,
      createdAt: auditEvents.createdAt,
    })
    .from(auditEvents)
    .leftJoin(users, eq(users.id, auditEvents.actorId))
    .where(eq(auditEvents.workspaceId, workspaceId))
    .orderBy(desc(auditEvents.createdAt), desc(auditEvents.id))
    .limit(limit);
}
