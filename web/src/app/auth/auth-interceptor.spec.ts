import { HttpClient, provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { Component } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { Router, provideRouter } from '@angular/router';
import type { SessionResponse } from '../api-types';
import { authInterceptor } from './auth-interceptor';
import { AuthSession } from './auth-session';

const session = (token: string): SessionResponse => ({
  user: {
    id: '0b7e5c1e-7d0a-4a53-9c53-2f0e1d7b9a01',
    email: 'ines.ferreira@halden-robotics.example',
    displayName: 'Inês Ferreira',
    createdAt: '2026-11-30T09:00:00.000Z',
  },
  accessToken: token,
  expiresAt: new Date(Date.now() + 15 * 60_000).toISOString(),
});
@Component({ selector: 'app-blank-auth-interceptor', template: '' })
class Blank {}

const unauthorized = { status: 401, statusText: 'Unauthorized' };
const expiredBody = { code: 'token_expired', message: 'access token expired' };

describe('authInterceptor', () => {
  let client: HttpClient;
  let http: HttpTestingController;
  let auth: AuthSession;
  let router: Router;

  beforeEach(() => {
    TestBed.configureTestingModule({
      providers: [
        provideHttpClient(withInterceptors([authInterceptor])),
        provideHttpClientTesting(),
        provideRouter([{ path: '**', component: Blank }]),
      ],
    });
    client = TestBed.inject(HttpClient);
    http = TestBed.inject(HttpTestingController);
    auth = TestBed.inject(AuthSession);
    router = TestBed.inject(Router);
    auth.signIn({ email: 'ines.ferreira@halden-robotics.example', password: 'x' }).subscribe();
    http.expectOne('/api/v1/auth/sign-in').flush(session('token-a'));
  });

  afterEach(() => http.verify());

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

    http.expectOne('/api/v1/auth/refresh').flush(session('token-b'));
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
    http.expectOne('/api/v1/auth/refresh').flush(session('token-b'));
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
    http.expectOne('/api/v1/auth/refresh').flush(session('token-b'));
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
