import { HttpClient, httpResource } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable } from 'rxjs';
import type {
  CreateRevisionRequest,
  CreateStudyRequest,
  ListCoilsResponse,
  ListRevisionsResponse,
  ListStudiesResponse,
  RevisionResponse,
  RevisionSummaryResponse,
  StudyResponse,
  UpdateStudyRequest,
} from '../api-types';

const base = '/api/v1/workspaces';

/** `/api/v1/workspaces/:workspaceId/<rest>`, every part encoded. */
export function workspaceUrl(workspaceId: string, ...rest: string[]): string {
  return [base, workspaceId, ...rest]
    .map((p, i) => (i === 0 ? p : encodeURIComponent(p)))
    .join('/');
}

/**
 * The study and revision routes of the API, and the coil library list the study form picks
 * from. Reads are `httpResource`s created in a component's injection context with signals of the
 * ids (undefined: nothing is asked); writes return observables.
 */
@Injectable({ providedIn: 'root' })
export class StudiesApi {
  private readonly http = inject(HttpClient);

  listResource(workspaceId: () => string | undefined) {
    return httpResource<ListStudiesResponse>(() => {
      const id = workspaceId();
      return id ? workspaceUrl(id, 'studies') : undefined;
    });
  }

  studyResource(ids: () => { workspaceId: string; studyId: string } | undefined) {
    return httpResource<StudyResponse>(() => {
      const at = ids();
      return at ? workspaceUrl(at.workspaceId, 'studies', at.studyId) : undefined;
    });
  }

  revisionsResource(ids: () => { workspaceId: string; studyId: string } | undefined) {
    return httpResource<ListRevisionsResponse>(() => {
      const at = ids();
      return at ? workspaceUrl(at.workspaceId, 'studies', at.studyId, 'revisions') : undefined;
    });
  }

  /** The coil library, for the Tx and Rx pickers. */
  coilsResource(workspaceId: () => string | undefined) {
    return httpResource<ListCoilsResponse>(() => {
      const id = workspaceId();
      return id ? workspaceUrl(id, 'coils') : undefined;
    });
  }

  get(workspaceId: string, studyId: string): Observable<StudyResponse> {
    return this.http.get<StudyResponse>(workspaceUrl(workspaceId, 'studies', studyId));
  }

  create(workspaceId: string, request: CreateStudyRequest): Observable<StudyResponse> {
    return this.http.post<StudyResponse>(workspaceUrl(workspaceId, 'studies'), request);
  }

  /** A full replacement; a `version` older than the stored one is refused with `stale_version`. */
  update(
    workspaceId: string,
    studyId: string,
    request: UpdateStudyRequest,
  ): Observable<StudyResponse> {
    return this.http.put<StudyResponse>(workspaceUrl(workspaceId, 'studies', studyId), request);
  }

  revision(workspaceId: string, studyId: string, revisionId: string): Observable<RevisionResponse> {
    return this.http.get<RevisionResponse>(
      workspaceUrl(workspaceId, 'studies', studyId, 'revisions', revisionId),
    );
  }

  createRevision(
    workspaceId: string,
    studyId: string,
    request: CreateRevisionRequest,
  ): Observable<RevisionSummaryResponse> {
    return this.http.post<RevisionSummaryResponse>(
      workspaceUrl(workspaceId, 'studies', studyId, 'revisions'),
      request,
    );
  }
}
