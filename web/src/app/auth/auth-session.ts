import { HttpClient } from '@angular/common/http';
import { Injectable, computed, inject, signal } from '@angular/core';
import { Observable, catchError, finalize, firstValueFrom, map, of, shareReplay, tap } from 'rxjs';
import type {
  ForgotPasswordRequest,
  ResetPasswordRequest,
  SessionResponse,
  SignInRequest,
  SignUpRequest,
  UserResponse,
} from '../api-types';

export const authBase = '/api/v1/auth';

// Refresh this long before the server's expiry, so a token never expires on the wire.
const expirySkewMs = 30_000;

/**
 * The signed-in user and their short-lived access token. The refresh token never reaches
 * script: it lives in the httpOnly cookie the server sets on /api/v1/auth.
 */
@Injectable({ providedIn: 'root' })
export class AuthSession {
  private readonly http = inject(HttpClient);

  private readonly userState = signal<UserResponse | null>(null);
  private readonly tokenState = signal<string | null>(null);
  private readonly expiresAtState = signal<Date | null>(null);
  /** The one refresh on the wire; concurrent callers share it. */
  private inFlightRefresh: Observable<SessionResponse> | null = null;

  readonly user = this.userState.asReadonly();
  readonly accessToken = this.tokenState.asReadonly();
  readonly expiresAt = this.expiresAtState.asReadonly();
  readonly isSignedIn = computed(() => this.userState() !== null);

  signIn(request: SignInRequest): Observable<UserResponse> {
    return this.http
      .post<SessionResponse>(`${authBase}/sign-in`, request, { withCredentials: true })
      .pipe(map((session) => this.adopt(session)));
  }

  signUp(request: SignUpRequest): Observable<UserResponse> {
    return this.http
      .post<SessionResponse>(`${authBase}/sign-up`, request, { withCredentials: true })
      .pipe(map((session) => this.adopt(session)));
  }

  /** Ends the session here even when the server cannot be reached. */
  signOut(): Observable<void> {
    return this.http.post<void>(`${authBase}/sign-out`, null, { withCredentials: true }).pipe(
      catchError(() => of(undefined)),
      // Cleared before subscribers hear of it, so a navigation they start sees no session;
      // `finalize` covers a caller that unsubscribes before the answer.
      map(() => this.clear()),
      finalize(() => this.clear()),
    );
  }

  /**
   * Trades the refresh cookie for a new access token. While one refresh is on the wire every
   * caller gets that same one: the server rotates the cookie on each use and treats a second use
   * of the old one as theft, revoking the whole family.
   */
  refresh(): Observable<SessionResponse> {
    if (!this.inFlightRefresh) {
      this.inFlightRefresh = this.http
        .post<SessionResponse>(`${authBase}/refresh`, null, { withCredentials: true })
        .pipe(
          tap({
            next: (session) => this.adopt(session),
            error: () => this.clear(),
          }),
          finalize(() => (this.inFlightRefresh = null)),
          shareReplay({ bufferSize: 1, refCount: false }),
        );
    }
    return this.inFlightRefresh;
  }

  /** On page load: a valid refresh cookie signs the user back in; anything else leaves them out. */
  restore(): Promise<void> {
    return firstValueFrom(
      this.refresh().pipe(
        map(() => undefined),
        catchError(() => of(undefined)),
      ),
    );
  }

  forgotPassword(request: ForgotPasswordRequest): Observable<void> {
    return this.http.post<void>(`${authBase}/forgot-password`, request);
  }

  resetPassword(request: ResetPasswordRequest): Observable<void> {
    return this.http.post<void>(`${authBase}/reset-password`, request);
  }

  /** True when the access token is missing or about to expire. */
  needsRefresh(now = Date.now()): boolean {
    const expiresAt = this.expiresAtState();
    return !this.tokenState() || !expiresAt || expiresAt.getTime() - now < expirySkewMs;
  }

  /** Forgets the session locally (after sign-out, or when refresh fails). */
  clear(): void {
    this.userState.set(null);
    this.tokenState.set(null);
    this.expiresAtState.set(null);
  }

  private adopt(session: SessionResponse): UserResponse {
    this.userState.set(session.user);
    this.tokenState.set(session.accessToken);
    this.expiresAtState.set(new Date(session.expiresAt));
    return session.user;
  }
}
