import { HttpClient, httpResource } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable } from 'rxjs';
import type { AcceptInvitationResponse, InvitationPreviewResponse } from '../api-types';

const invitationsBase = '/api/v1/invitations';

/** The invitation routes that the invitee uses: the public preview and the acceptance. */
@Injectable({ providedIn: 'root' })
export class InvitationsApi {
  private readonly http = inject(HttpClient);

  previewResource(token: () => string | undefined) {
    return httpResource<InvitationPreviewResponse>(() => {
      const value = token();
      return value ? `${invitationsBase}/${encodeURIComponent(value)}` : undefined;
    });
  }

  accept(token: string): Observable<AcceptInvitationResponse> {
    return this.http.post<AcceptInvitationResponse>(
      `${invitationsBase}/${encodeURIComponent(token)}/accept`,
      null,
    );
  }
}
