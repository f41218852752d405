import {
  HttpErrorResponse,
  HttpEvent,
  HttpHandlerFn,
  HttpInterceptorFn,
  HttpRequest,
} from '@angular/common/http';
import { inject } from '@angular/core';
import { Router } from '@angular/router';
import { Observable, catchError, map, of, switchMap, throwError } from 'rxjs';
import { AuthSession, authBase } from './auth-session';

function isApiCall(url: string): boolean {
  return url.startsWith('/api/');
}

/** Auth routes carry the refresh cookie or a password, never the bearer token. */
function isAuthCall(url: string): boolean {
  return url.startsWith(authBase + '/');
}

function withToken(request: HttpRequest<unknown>, token: string | null): HttpRequest<unknown> {
  return token ? request.clone({ setHeaders: { Authorization: `Bearer ${token}` } }) : request;
}

function isUnauthorized(error: unknown): boolean {
  return error instanceof HttpErrorResponse && error.status === 401;
}

/**
 * Attaches the access token to API calls. A 401 gets one refresh (shared with every other request
 * waiting on it) and one retry; if that fails the session is over and the user signs in again,
 * coming back to where they were.
 */
export const authInterceptor: HttpInterceptorFn = (
  request: HttpRequest<unknown>,
  next: HttpHandlerFn,
): Observable<HttpEvent<unknown>> => {
  if (!isApiCall(request.url) || isAuthCall(request.url)) return next(request);

  const session = inject(AuthSession);
  const router = inject(Router);

  const endSession = (): void => {
    session.clear();
    const target = router.currentNavigation()?.extractedUrl.toString() ?? router.url;
    if (target.startsWith('/sign-in')) return;
    void router.navigate(['/sign-in'], { queryParams: { returnUrl: target } });
  };

  // A token known to be stale is refreshed before sending; that counts as the one refresh.
  const refreshFirst = session.isSignedIn() && session.needsRefresh();
  const token$: Observable<string | null> = refreshFirst
    ? session.refresh().pipe(
        map((fresh) => fresh.accessToken),
        catchError(() => of(null)),
      )
    : of(session.accessToken());

  return token$.pipe(
    switchMap((token) => next(withToken(request, token))),
    catchError((error: unknown) => {
      if (!isUnauthorized(error)) return throwError(() => error);
      if (refreshFirst) {
        endSession();
        return throwError(() => error);
      }
      return session.refresh().pipe(
        catchError(() => {
          endSession();
          return throwError(() => error);
        }),
        switchMap((fresh) =>
          next(withToken(request, fresh.accessToken)).pipe(
            catchError((retryError: unknown) => {
              if (isUnauthorized(retryError)) endSession();
              return throwError(() => retryError);
            }),
          ),
        ),
      );
    }),
  );
};
