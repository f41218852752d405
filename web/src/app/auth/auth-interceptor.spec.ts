import { HttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { Router } from '@angular/router';
import {
  configurePageTest,
  resetAndVerify,
  signInAs,
  testSession,
  testUser,
} from '../testing/page-test-bed';
import { authInterceptor } from './auth-interceptor';
import { AuthSession } from './auth-session';

const unauthorized = { status: 401, statusText: 'Unauthorized' };
const expiredBody = { code: 'token_expired', message: 'access token expired' };

describe('authInterceptor', () => {
  let client: HttpClient;
  let http: HttpTestingController;
  let auth: AuthSession;
  let router: Router;

  beforeEach(() => {
    http = configurePageTest({ httpFeatures: [withInterceptors([authInterceptor])] });
    client = TestBed.inject(HttpClient);
    auth = TestBed.inject(AuthSession);
    router = TestBed.inject(Router);
    signInAs(testUser, 'token-a');
  });

  afterEach(() => resetAndVerify(http));

  it('sends the access token to the API, and only there', () => {
    client.get('/api/v1/workspaces').subscribe();
    client.get('/elsewhere/data.json').subscribe();
    client.post('/api/v1/auth/sign-out', null).subscribe();

    expect(http.expectOne('/api/v1/workspaces').request.headers.get('Authorization')).toBe(
      'Bearer token-a',
    );
    expect(http.expectOne('/elsewhere/data.json').request.headers.has('Authorization')).toBe(false);
    expect(http.expectOne('/api/v1/auth/sign-out').request.headers.has('Authorization')).toBe(
      false,
    );
  });

  it('on a 401 refreshes once and retries with the new token', () => {
    let body: unknown;
    client.get('/api/v1/workspaces').subscribe((value) => (body = value));
    http.expectOne('/api/v1/workspaces').flush(expiredBody, unauthorized);

    http.expectOne('/api/v1/auth/refresh').flush(testSession('token-b'));
    const retry = http.expectOne('/api/v1/workspaces');
    expect(retry.request.headers.get('Authorization')).toBe('Bearer token-b');
    retry.flush({ items: [] });

    expect(body).toEqual({ items: [] });
    expect(auth.accessToken()).toBe('token-b');
  });

  it('lets concurrent requests that meet a 401 share a single refresh', () => {
    const results: unknown[] = [];
    client.get('/api/v1/workspaces').subscribe((v) => results.push(v));
    client.get('/api/v1/me').subscribe((v) => results.push(v));
    http.expectOne('/api/v1/workspaces').flush(expiredBody, unauthorized);
    http.expectOne('/api/v1/me').flush(expiredBody, unauthorized);

    // One refresh only: the match throws if two were sent.
    http.expectOne('/api/v1/auth/refresh').flush(testSession('token-b'));
    http.expectOne('/api/v1/workspaces').flush({ items: [] });
    http.expectOne('/api/v1/me').flush({ ok: true });
    expect(results).toHaveLength(2);
  });

  it('signs out and sends the user to sign-in with a return URL when refresh fails', async () => {
    await router.navigateByUrl('/w/42/members');
    const navigate = vi.spyOn(router, 'navigate');
    let status = 0;
    client.get('/api/v1/workspaces/42/members').subscribe({ error: (e) => (status = e.status) });
    http.expectOne('/api/v1/workspaces/42/members').flush(expiredBody, unauthorized);
    http.expectOne('/api/v1/auth/refresh').flush(expiredBody, unauthorized);

    expect(status).toBe(401);
    expect(auth.isSignedIn()).toBe(false);
    expect(navigate).toHaveBeenCalledWith(['/sign-in'], {
      queryParams: { returnUrl: '/w/42/members' },
    });
  });

  it('does not refresh a second time when the retry is refused too', () => {
    const navigate = vi.spyOn(router, 'navigate');
    let status = 0;
    client.get('/api/v1/workspaces').subscribe({ error: (e) => (status = e.status) });
    http.expectOne('/api/v1/workspaces').flush(expiredBody, unauthorized);
    http.expectOne('/api/v1/auth/refresh').flush(testSession('token-b'));
    http.expectOne('/api/v1/workspaces').flush(expiredBody, unauthorized);

    http.expectNone('/api/v1/auth/refresh');
    expect(status).toBe(401);
    expect(auth.isSignedIn()).toBe(false);
    expect(navigate).toHaveBeenCalledTimes(1);
  });

  it('passes other errors through untouched', () => {
    let status = 0;
    client.get('/api/v1/workspaces/x').subscribe({ error: (e) => (status = e.status) });
    http
      .expectOne('/api/v1/workspaces/x')
      .flush({ code: 'forbidden', message: 'no' }, { status: 403, statusText: 'Forbidden' });
    http.expectNone('/api/v1/auth/refresh');
    expect(status).toBe(403);
    expect(auth.isSignedIn()).toBe(true);
  });
});
