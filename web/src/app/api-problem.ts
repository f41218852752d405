import { HttpErrorResponse } from '@angular/common/http';
import type { ProblemResponse } from './api-types';

/** What the user interface needs from a failed API call. */
export interface ApiProblem {
  status: number;
  code: string;
  message: string;
  field?: string;
}

const fallbackMessages: Record<number, string> = {
  0: 'Couplet cannot reach its server. Check your connection, then try again.',
  401: 'Your session has ended. Sign in again.',
  403: 'Your role in this workspace does not allow this.',
  404: 'Not found. It may have been removed, or you are not a member.',
  409: 'This conflicts with the current state. Reload and try again.',
  413: 'That is too large to send.',
  429: 'Too many attempts. Wait a minute, then try again.',
};

function isProblemBody(body: unknown): body is ProblemResponse {
  return (
    typeof body === 'object' &&
    body !== null &&
    typeof (body as { code?: unknown }).code === 'string' &&
    typeof (body as { message?: unknown }).message === 'string'
  );
}

/** Turns anything an HTTP call can throw into one problem shape (the contract's error body). */
export function apiProblem(error: unknown): ApiProblem {
  if (error instanceof HttpErrorResponse) {
    if (isProblemBody(error.error)) {
      const { code, message, field } = error.error;
      return { status: error.status, code, message, ...(field ? { field } : {}) };
    }
    const status = error.status;
    const message =
      fallbackMessages[status] ??
      (status >= 500
        ? 'The server failed to answer. Try again in a moment.'
        : `The request failed (HTTP ${status}).`);
    return { status, code: status === 0 ? 'network' : 'http_' + status, message };
  }
  return { status: 0, code: 'client', message: 'Something went wrong in the page. Reload it.' };
}
