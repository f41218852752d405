import { HttpClient, HttpEvent, HttpEventType } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable, concatMap, defer, from, takeWhile } from 'rxjs';
import type {
  CreateSweepRequest,
  ListSweepRunsResponse,
  SweepEstimateResponse,
  SweepProgressEvent,
  SweepRunResponse,
} from '../api-types';
import { SseTextParser, type SseMessage } from './sse-text-parser';

const workspacesBase = '/api/v1/workspaces';

/** What the event stream of a run says: progress while it runs, then the finished run. */
export type SweepStreamEvent = SweepProgressEvent | { end: SweepRunResponse };

export function isStreamEnd(event: SweepStreamEvent): event is { end: SweepRunResponse } {
  return 'end' in event;
}

/**
 * The sweep routes of a study. Plain observables: the panel decides when to ask, since a run's
 * state changes under it while it streams.
 */
@Injectable({ providedIn: 'root' })
export class SweepsApi {
  private readonly http = inject(HttpClient);

  list(workspaceId: string, studyId: string): Observable<ListSweepRunsResponse> {
    return this.http.get<ListSweepRunsResponse>(this.base(workspaceId, studyId));
  }

  /** One run; a succeeded one comes with its result. */
  get(workspaceId: string, studyId: string, runId: string): Observable<SweepRunResponse> {
    return this.http.get<SweepRunResponse>(this.runUrl(workspaceId, studyId, runId));
  }

  create(
    workspaceId: string,
    studyId: string,
    request: CreateSweepRequest,
  ): Observable<SweepRunResponse> {
    return this.http.post<SweepRunResponse>(this.base(workspaceId, studyId), request);
  }

  estimate(
    workspaceId: string,
    studyId: string,
    request: CreateSweepRequest,
  ): Observable<SweepEstimateResponse> {
    return this.http.post<SweepEstimateResponse>(
      `${this.base(workspaceId, studyId)}/estimate`,
      request,
    );
  }

  cancel(workspaceId: string, studyId: string, runId: string): Observable<SweepRunResponse> {
    return this.http.post<SweepRunResponse>(
      `${this.runUrl(workspaceId, studyId, runId)}/cancel`,
      null,
    );
  }

  /**
   * A run's server-sent events, until its `end`. Read through HttpClient rather than
   * EventSource, which cannot send the bearer token: the auth interceptor adds the token and, on
   * a 401, refreshes it once and opens the stream again. The fetch backend reports the body as it
   * grows (`partialText`); only the text past what was already read goes to the parser, and the
   * final response adds whatever the last progress report did not hold (the test backend sends
   * the whole body at once). Unsubscribing aborts the request. Events of other types are ignored.
   */
  events(workspaceId: string, studyId: string, runId: string): Observable<SweepStreamEvent> {
    const url = `${this.runUrl(workspaceId, studyId, runId)}/events`;
    // Deferred: each subscription (a retry, say) reads its own stream from the start.
    return defer(() => {
      const parser = new SseTextParser();
      let read = 0;
      const take = (text: string | null | undefined): SseMessage[] => {
        if (!text || text.length <= read) return [];
        const fresh = text.slice(read);
        read = text.length;
        return parser.push(fresh);
      };
      const messages = (event: HttpEvent<string>): SseMessage[] => {
        if (event.type === HttpEventType.DownloadProgress) return take(event.partialText);
        if (event.type === HttpEventType.Response) return take(event.body);
        return [];
      };
      return this.http
        .get(url, {
          observe: 'events',
          reportProgress: true,
          responseType: 'text',
          headers: { Accept: 'text/event-stream' },
        })
        .pipe(concatMap((event) => from(messages(event).flatMap(toStreamEvent))));
    }).pipe(takeWhile((event) => !isStreamEnd(event), true));
  }

  private base(workspaceId: string, studyId: string): string {
    const workspace = encodeURIComponent(workspaceId);
    return `${workspacesBase}/${workspace}/studies/${encodeURIComponent(studyId)}/sweeps`;
  }

  private runUrl(workspaceId: string, studyId: string, runId: string): string {
    return `${this.base(workspaceId, studyId)}/${encodeURIComponent(runId)}`;
  }
}

function toStreamEvent(message: SseMessage): SweepStreamEvent[] {
  if (message.event === 'progress') return [JSON.parse(message.data) as SweepProgressEvent];
  if (message.event === 'end') return [{ end: JSON.parse(message.data) as SweepRunResponse }];
  return [];
}
