import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { resetAndVerify, signInAs, testSession } from '../testing/page-test-bed';
import { AuthSession } from './auth-session';

describe('AuthSession', () => {
  let auth: AuthSession;
  let http: HttpTestingController;

  beforeEach(() => {
    TestBed.configureTestingModule({
      providers: [provideHttpClient(), provideHttpClientTesting()],
    });
    auth = TestBed.inject(AuthSession);
    http = TestBed.inject(HttpTestingController);
  });

  afterEach(() => resetAndVerify(http));

  it('signs in with cookies allowed and keeps user, token and expiry', () => {
    let name = '';
    auth
      .signIn({ email: 'ines.ferreira@halden-robotics.example', password: 'tx-coil-2026!' })
      .subscribe((user) => (name = user.displayName));
    const request = http.expectOne('/api/v1/auth/sign-in');
    expect(request.request.method).toBe('POST');
    expect(request.request.withCredentials).toBe(true);
    request.flush(testSession('token-a'));

    expect(name).toBe('Inês Ferreira');
    expect(auth.isSignedIn()).toBe(true);
    expect(auth.accessToken()).toBe('token-a');
    expect(auth.expiresAt()?.getTime()).toBeGreaterThan(Date.now());
    expect(auth.needsRefresh()).toBe(false);
  });

  it('shares one refresh among concurrent callers, then starts a new one next time', () => {
    const seen: string[] = [];
    auth.refresh().subscribe((s) => seen.push(s.accessToken));
    auth.refresh().subscribe((s) => seen.push(s.accessToken));
    auth.refresh().subscribe((s) => seen.push(s.accessToken));

    // Exactly one request: a second use of the old refresh cookie would revoke the family.
    const first = http.expectOne('/api/v1/auth/refresh');
    expect(first.request.withCredentials).toBe(true);
    first.flush(testSession('token-b'));
    expect(seen).toEqual(['token-b', 'token-b', 'token-b']);

    auth.refresh().subscribe((s) => seen.push(s.accessToken));
    http.expectOne('/api/v1/auth/refresh').flush(testSession('token-c'));
    expect(seen.at(-1)).toBe('token-c');
    expect(auth.accessToken()).toBe('token-c');
  });

  it('forgets the session when the refresh is refused', () => {
    signInAs();

    let failed = false;
    auth.refresh().subscribe({ error: () => (failed = true) });
    http
      .expectOne('/api/v1/auth/refresh')
      .flush(
        { code: 'unauthenticated', message: 'refresh token is not valid' },
        { status: 401, statusText: 'Unauthorized' },
      );
    expect(failed).toBe(true);
    expect(auth.isSignedIn()).toBe(false);
    expect(auth.accessToken()).toBeNull();
  });

  it('restores a session from the refresh cookie, or resolves signed out', async () => {
    const restored = auth.restore();
    http.expectOne('/api/v1/auth/refresh').flush(testSession('token-r'));
    await restored;
    expect(auth.user()?.displayName).toBe('Inês Ferreira');

    auth.clear();
    const none = auth.restore();
    http
      .expectOne('/api/v1/auth/refresh')
      .flush(
        { code: 'unauthenticated', message: 'no' },
        { status: 401, statusText: 'Unauthorized' },
      );
    await expect(none).resolves.toBeUndefined();
    expect(auth.isSignedIn()).toBe(false);
  });

  it('signs out locally even when the server cannot be reached', () => {
    signInAs();

    let done = false;
    auth.signOut().subscribe({ complete: () => (done = true) });
    http.expectOne('/api/v1/auth/sign-out').error(new ProgressEvent('error'));
    expect(done).toBe(true);
    expect(auth.isSignedIn()).toBe(false);
  });

  it('asks for a refresh when the token is within 30 s of expiry', () => {
    auth.signIn({ email: 'a@b.example', password: 'x' }).subscribe();
    http.expectOne('/api/v1/auth/sign-in').flush(testSession('token-a', 0.25));
    expect(auth.needsRefresh()).toBe(true);
  });
});
