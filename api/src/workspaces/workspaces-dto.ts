import { z } from 'zod';

// Request and response shapes of the workspace routes (contract of issue 3). The web imports the
// inferred types with `import type`, so this file depends on zod only.

export const roles = ['owner', 'editor', 'reviewer', 'viewer'] as const;
export const roleSchema = z.enum(roles, {
  message: 'must be one of owner, editor, reviewer, viewer',
});
export type Role = z.infer<typeof roleSchema>;

const isoTime = z.iso.datetime({ offset: true });
const uuid = z.uuid({ message: 'must be a UUID' });
const workspaceName = z
  .string({ message: 'must be a text' })
  .trim()
  .min(1, { message: 'must not be empty' })
  .max(80, { message: 'must be at most 80 characters' });
const email = z
  .email({ message: 'must be a valid e-mail address' })
  .max(254, { message: 'must be at most 254 characters' });

export const workspaceParams = z.object({ workspaceId: uuid }).strict();
export const memberParams = z.object({ workspaceId: uuid, userId: uuid }).strict();
export const invitationParams = z.object({ workspaceId: uuid, invitationId: uuid }).strict();
export const invitationTokenParams = z
  .object({ token: z.string().min(1).max(200, { message: 'must be at most 200 characters' }) })
  .strict();

export const createWorkspaceRequest = z.object({ name: workspaceName }).strict();
export type CreateWorkspaceRequest = z.infer<typeof createWorkspaceRequest>;

export const updateWorkspaceRequest = z.object({ name: workspaceName }).strict();
export type UpdateWorkspaceRequest = z.infer<typeof updateWorkspaceRequest>;

export const workspaceResponse = z.object({
  id: uuid,
  name: z.string(),
  /** The caller's role in this workspace. */
  role: roleSchema,
  createdAt: isoTime,
});
export type WorkspaceResponse = z.infer<typeof workspaceResponse>;

export const listWorkspacesResponse = z.object({ items: z.array(workspaceResponse) });
export type ListWorkspacesResponse = z.infer<typeof listWorkspacesResponse>;

export const memberResponse = z.object({
  userId: uuid,
  email: z.string(),
  displayName: z.string(),
  role: roleSchema,
  joinedAt: isoTime,
});
export type MemberResponse = z.infer<typeof memberResponse>;

export const listMembersResponse = z.object({ items: z.array(memberResponse) });
export type ListMembersResponse = z.infer<typeof listMembersResponse>;

export const updateMemberRequest = z.object({ role: roleSchema }).strict();
export type UpdateMemberRequest = z.infer<typeof updateMemberRequest>;

export const createInvitationRequest = z.object({ email, role: roleSchema }).strict();
export type CreateInvitationRequest = z.infer<typeof createInvitationRequest>;

export const invitationResponse = z.object({
  id: uuid,
  email: z.string(),
  role: roleSchema,
  invitedBy: z.object({ userId: uuid, displayName: z.string() }),
  createdAt: isoTime,
  expiresAt: isoTime,
  acceptedAt: isoTime.nullable(),
  revokedAt: isoTime.nullable(),
});
export type InvitationResponse = z.infer<typeof invitationResponse>;

export const listInvitationsResponse = z.object({ items: z.array(invitationResponse) });
export type ListInvitationsResponse = z.infer<typeof listInvitationsResponse>;

export const invitationStatuses = ['pending', 'accepted', 'expired', 'revoked'] as const;
export type InvitationStatus = (typeof invitationStatuses)[number];

export const invitationPreviewResponse = z.object({
  workspaceName: z.string(),
  email: z.string(),
  role: roleSchema,
  invitedByName: z.string(),
  expiresAt: isoTime,
  status: z.enum(invitationStatuses),
});
export type InvitationPreviewResponse = z.infer<typeof invitationPreviewResponse>;

export const acceptInvitationResponse = z.object({ workspace: workspaceResponse });
export type AcceptInvitationResponse = z.infer<typeof acceptInvitationResponse>;

export const auditEventResponse = z.object({
  id: uuid,
  /** Dotted verb, e.g. `invitation.sent`, `member.role_changed`. */
  action: z.string(),
  actor: z.object({ userId: uuid, displayName: z.string() }).nullable(),
  /** What was acted upon, in words a reader recognises (an e-mail, a workspace name). */
  subject: z.string(),
  createdAt: isoTime,
  details: z.record(z.string(), z.unknown()),
});
export type AuditEventResponse = z.infer<typeof auditEventResponse>;

export const listAuditEventsResponse = z.object({ items: z.array(auditEventResponse) });
export type ListAuditEventsResponse = z.infer<typeof listAuditEventsResponse>;
