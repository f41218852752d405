import { z } from 'zod';
import { defineRoute, type RouteDefinition } from '../http/route-definition';
import { currentMembership, currentUser } from '../http/request-context';
import type { InvitationsService } from './invitations-service';
import {
  acceptInvitationResponse,
  createInvitationRequest,
  createWorkspaceRequest,
  invitationParams,
  invitationPreviewResponse,
  invitationResponse,
  invitationTokenParams,
  listAuditEventsResponse,
  listInvitationsResponse,
  listMembersResponse,
  listWorkspacesResponse,
  memberParams,
  memberResponse,
  updateMemberRequest,
  updateWorkspaceRequest,
  workspaceParams,
  workspaceResponse,
} from './workspaces-dto';
import type { WorkspacesService } from './workspaces-service';

const noQuery = z.object({}).strict();

export function workspacesRoutes(
  workspaces: WorkspacesService,
  invitations: InvitationsService,
): RouteDefinition[] {
  const base = { tag: 'workspaces' } as const;
  return [
    defineRoute({
      ...base,
      method: 'get',
      path: '/workspaces',
      summary: "The caller's workspaces with the caller's role",
      access: 'user',
      query: noQuery,
      success: { status: 200, description: 'Workspaces', schema: listWorkspacesResponse },
      handle: async (_i, req) => ({ items: await workspaces.listForUser(currentUser(req).id) }),
    }),
    defineRoute({
      ...base,
      method: 'post',
      path: '/workspaces',
      summary: 'Create a workspace; the caller becomes its owner',
      access: 'user',
      body: createWorkspaceRequest,
      success: { status: 201, description: 'Created', schema: workspaceResponse },
      handle: ({ body }, req) => workspaces.create(currentUser(req).id, body.name),
    }),
    defineRoute({
      ...base,
      method: 'get',
      path: '/workspaces/:workspaceId',
      summary: 'One workspace',
      access: { role: 'viewer' },
      params: workspaceParams,
      query: noQuery,
      success: { status: 200, description: 'The workspace', schema: workspaceResponse },
      handle: ({ params }, req) => workspaces.get(params.workspaceId, currentMembership(req).role),
    }),
    defineRoute({
      ...base,
      method: 'patch',
      path: '/workspaces/:workspaceId',
      summary: 'Rename a workspace',
      access: { role: 'owner' },
      params: workspaceParams,
      body: updateWorkspaceRequest,
      success: { status: 200, description: 'Renamed', schema: workspaceResponse },
      handle: ({ params, body }, req) =>
        workspaces.rename(params.workspaceId, currentUser(req).id, body.name),
    }),
    defineRoute({
      ...base,
      method: 'get',
      path: '/workspaces/:workspaceId/members',
      summary: 'Members and their roles',
      access: { role: 'viewer' },
      params: workspaceParams,
      query: noQuery,
      success: { status: 200, description: 'Members', schema: listMembersResponse },
      handle: async ({ params }) => ({ items: await workspaces.listMembers(params.workspaceId) }),
    }),
    defineRoute({
      ...base,
      method: 'patch',
      path: '/workspaces/:workspaceId/members/:userId',
      summary: "Change a member's role (owner only; a workspace keeps an owner)",
      access: { role: 'owner' },
      params: memberParams,
      body: updateMemberRequest,
      success: { status: 200, description: 'Updated member', schema: memberResponse },
      errors: [409],
      handle: ({ params, body }, req) =>
        workspaces.changeRole(params.workspaceId, currentUser(req).id, params.userId, body.role),
    }),
    defineRoute({
      ...base,
      method: 'delete',
      path: '/workspaces/:workspaceId/members/:userId',
      summary: 'Remove a member (owner), or leave (the member themself)',
      access: { role: 'viewer' },
      params: memberParams,
      success: { status: 204, description: 'Removed' },
      errors: [409],
      handle: async ({ params }, req) => {
        await workspaces.removeMember(params.workspaceId, currentUser(req).id, params.userId);
        return undefined;
      },
    }),
    defineRoute({
      ...base,
      method: 'get',
      path: '/workspaces/:workspaceId/invitations',
      summary: 'Invitations of the workspace, newest first',
      access: { role: 'owner' },
      params: workspaceParams,
      query: noQuery,
      success: { status: 200, description: 'Invitations', schema: listInvitationsResponse },
      handle: async ({ params }) => ({ items: await invitations.list(params.workspaceId) }),
    }),
    defineRoute({
      ...base,
      method: 'post',
      path: '/workspaces/:workspaceId/invitations',
      summary: 'Invite someone by e-mail with a role (the mail goes through the outbox)',
      access: { role: 'owner' },
      params: workspaceParams,
      body: createInvitationRequest,
      success: { status: 201, description: 'Invitation sent', schema: invitationResponse },
      errors: [409],
      handle: ({ params, body }, req) =>
        invitations.invite(params.workspaceId, currentUser(req).id, body.email, body.role),
    }),
    defineRoute({
      ...base,
      method: 'delete',
      path: '/workspaces/:workspaceId/invitations/:invitationId',
      summary: 'Revoke an invitation',
      access: { role: 'owner' },
      params: invitationParams,
      success: { status: 204, description: 'Revoked' },
      errors: [409],
      handle: async ({ params }, req) => {
        await invitations.revoke(params.workspaceId, currentUser(req).id, params.invitationId);
        return undefined;
      },
    }),
    defineRoute({
      ...base,
      method: 'get',
      path: '/workspaces/:workspaceId/audit',
      summary: 'Audit events of the workspace, newest first',
      access: { role: 'owner' },
      params: workspaceParams,
      query: noQuery,
      success: { status: 200, description: 'Audit events', schema: listAuditEventsResponse },
      handle: async ({ params }) => ({ items: await workspaces.listAudit(params.workspaceId) }),
    }),
    defineRoute({
      method: 'get',
      path: '/invitations/:token',
      summary: 'What an invitation link offers (no sign-in needed)',
      tag: 'invitations',
      access: 'public',
      params: invitationTokenParams,
      success: { status: 200, description: 'Preview', schema: invitationPreviewResponse },
      errors: [404],
      handle: ({ params }) => invitations.preview(params.token),
    }),
    defineRoute({
      method: 'post',
      path: '/invitations/:token/accept',
      summary: 'Accept an invitation as the signed-in user (once)',
      tag: 'invitations',
      access: 'user',
      params: invitationTokenParams,
      success: { status: 200, description: 'Joined', schema: acceptInvitationResponse },
      errors: [404, 409],
      handle: ({ params }, req) => invitations.accept(params.token, currentUser(req).id),
    }),
  ];
}
