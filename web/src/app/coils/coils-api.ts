import { HttpClient, httpResource } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable } from 'rxjs';
import type {
  CoilResponse,
  CreateCoilRequest,
  DuplicateCoilRequest,
  ListCoilsResponse,
  UpdateCoilRequest,
} from '../api-types';

const workspacesBase = '/api/v1/workspaces';

/** `/api/v1/workspaces/:workspaceId/coils`, with the ids escaped. */
export function coilsUrl(workspaceId: string, coilId?: string): string {
  const base = `${workspacesBase}/${encodeURIComponent(workspaceId)}/coils`;
  return coilId === undefined ? base : `${base}/${encodeURIComponent(coilId)}`;
}

/**
 * The coil library routes of the API. Reads are `httpResource`s, created in a component's
 * injection context with signals of the ids; writes return observables.
 */
@Injectable({ providedIn: 'root' })
export class CoilsApi {
  private readonly http = inject(HttpClient);

  /** Every coil of the workspace; the page filters and sorts them itself. */
  listResource(workspaceId: () => string | undefined) {
    return httpResource<ListCoilsResponse>(() => {
      const id = workspaceId();
      return id ? coilsUrl(id) : undefined;
    });
  }

  /** One coil; pass `undefined` for the coil id of a new coil and nothing is asked. */
  coilResource(workspaceId: () => string | undefined, coilId: () => string | undefined) {
    return httpResource<CoilResponse>(() => {
      const workspace = workspaceId();
      const coil = coilId();
      return workspace && coil ? coilsUrl(workspace, coil) : undefined;
    });
  }

  get(workspaceId: string, coilId: string): Observable<CoilResponse> {
    return this.http.get<CoilResponse>(coilsUrl(workspaceId, coilId));
  }

  create(workspaceId: string, request: CreateCoilRequest): Observable<CoilResponse> {
    return this.http.post<CoilResponse>(coilsUrl(workspaceId), request);
  }

  /** A full replacement; a stale `version` answers 409 `stale_version` with `currentVersion`. */
  update(workspaceId: string, coilId: string, request: UpdateCoilRequest) {
    return this.http.put<CoilResponse>(coilsUrl(workspaceId, coilId), request);
  }

  duplicate(
    workspaceId: string,
    coilId: string,
    request: DuplicateCoilRequest = {},
  ): Observable<CoilResponse> {
    return this.http.post<CoilResponse>(`${coilsUrl(workspaceId, coilId)}/duplicate`, request);
  }

  /** A coil used by a study answers 409 `in_use` with `usedBy`. */
  remove(workspaceId: string, coilId: string, version?: number): Observable<void> {
    const params: Record<string, number> = version === undefined ? {} : { version };
    return this.http.delete<void>(coilsUrl(workspaceId, coilId), { params });
  }
}
