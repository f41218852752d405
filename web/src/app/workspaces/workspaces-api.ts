import { HttpClient, httpResource } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable } from 'rxjs';
import type {
  CreateInvitationRequest,
  InvitationResponse,
  ListAuditEventsResponse,
  ListInvitationsResponse,
  ListMembersResponse,
  MemberResponse,
  Role,
  WorkspaceResponse,
} from '../api-types';

export const workspacesBase = '/api/v1/workspaces';

/**
 * The workspace routes of the API. Reads are `httpResource`s, to be created in a component's
 * injection context with a signal of the workspace id; writes return observables.
 */
@Injectable({ providedIn: 'root' })
export class WorkspacesApi {
  private readonly http = inject(HttpClient);

  workspaceResource(workspaceId: () => string | undefined) {
    return httpResource<WorkspaceResponse>(() => {
      const id = workspaceId();
      return id ? `${workspacesBase}/${encodeURIComponent(id)}` : undefined;
    });
  }

  membersResource(workspaceId: () => string | undefined) {
    return httpResource<ListMembersResponse>(() => {
      const id = workspaceId();
      return id ? `${workspacesBase}/${encodeURIComponent(id)}/members` : undefined;
    });
  }

  /** Owner only: pass `undefined` for anyone else, and nothing is asked. */
  invitationsResource(workspaceId: () => string | undefined) {
    return httpResource<ListInvitationsResponse>(() => {
      const id = workspaceId();
      return id ? `${workspacesBase}/${encodeURIComponent(id)}/invitations` : undefined;
    });
  }

  auditResource(workspaceId: () => string | undefined) {
    return httpResource<ListAuditEventsResponse>(() => {
      const id = workspaceId();
      return id ? `${workspacesBase}/${encodeURIComponent(id)}/audit` : undefined;
    });
  }

  get(workspaceId: string): Observable<WorkspaceResponse> {
    return this.http.get<WorkspaceResponse>(`${workspacesBase}/${encodeURIComponent(workspaceId)}`);
  }

  create(name: string): Observable<WorkspaceResponse> {
    return this.http.post<WorkspaceResponse>(workspacesBase, { name });
  }

  rename(workspaceId: string, name: string): Observable<WorkspaceResponse> {
    return this.http.patch<WorkspaceResponse>(
      `${workspacesBase}/${encodeURIComponent(workspaceId)}`,
      { name },
    );
  }

  changeRole(workspaceId: string, userId: string, role: Role): Observable<MemberResponse> {
    return this.http.patch<MemberResponse>(this.memberUrl(workspaceId, userId), { role });
  }

  removeMember(workspaceId: string, userId: string): Observable<void> {
    return this.http.delete<void>(this.memberUrl(workspaceId, userId));
  }

  invite(workspaceId: string, request: CreateInvitationRequest): Observable<InvitationResponse> {
    return this.http.post<InvitationResponse>(
      `${workspacesBase}/${encodeURIComponent(workspaceId)}/invitations`,
      request,
    );
  }

  revokeInvitation(workspaceId: string, invitationId: string): Observable<void> {
    return this.http.delete<void>(
      `${workspacesBase}/${encodeURIComponent(workspaceId)}/invitations/` +
        encodeURIComponent(invitationId),
    );
  }

  private memberUrl(workspaceId: string, userId: string): string {
    const workspace = encodeURIComponent(workspaceId);
    return `${workspacesBase}/${workspace}/members/${encodeURIComponent(userId)}`;
  }
}
