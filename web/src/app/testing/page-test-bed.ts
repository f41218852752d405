// The set-up the web specs share: a testing module with the HTTP backend mocked and a router,
// a signed-in user, a wait for resources to answer, and the check that no request was left over.
// Test support only: tsconfig.app.json keeps this folder out of the app.
import { HttpFeature, HttpFeatureKind, provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ChangeDetectionStrategy, Component, EnvironmentProviders, Provider } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import {
  RouterFeatures,
  Routes,
  provideRouter,
  withComponentInputBinding,
  withRouterConfig,
} from '@angular/router';
import type { SessionResponse, UserResponse, WorkspaceResponse } from '../api-types';
import { AuthSession } from '../auth/auth-session';

/** The user the specs sign in as, unless one needs someone else. */
export const testUser: UserResponse = {
  id: 'a0000000-0000-4000-8000-000000000001',
  email: 'ines@halden-robotics.example',
  displayName: 'Inês Ferreira',
  createdAt: '2026-11-30T09:00:00.000Z',
};

/** The workspace most specs open; `testUser` owns it. */
export const testWorkspace: WorkspaceResponse = {
  id: '6f1c2d3e-4b5a-4c6d-8e7f-901a2b3c4d5e',
  name: 'Halden dock pad',
  role: 'owner',
  createdAt: '2026-11-30T09:00:00.000Z',
};

/** The server's answer to a sign-in or refresh; 15 minutes is the API's access-token lifetime. */
export function testSession(accessToken = 't', minutes = 15, user = testUser): SessionResponse {
  return {
    user,
    accessToken,
    expiresAt: new Date(Date.now() + minutes * 60_000).toISOString(),
  };
}

/** Where the router lands for any address a spec does not route itself. */
@Component({
  selector: 'app-blank-page',
  template: '',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BlankPage {}

export interface PageTestOptions {
  /** The routes; by default every address shows a blank page. */
  routes?: Routes;
  /** Binds route parameters to inputs, a parent's included, as app.config does. */
  routeInputs?: boolean;
  httpFeatures?: HttpFeature<HttpFeatureKind>[];
  providers?: (Provider | EnvironmentProviders)[];
}

/** Sets up the testing module with a mocked HTTP backend and a router; returns the backend. */
export function configurePageTest(options: PageTestOptions = {}): HttpTestingController {
  const routerFeatures: RouterFeatures[] = options.routeInputs
    ? [withComponentInputBinding(), withRouterConfig({ paramsInheritanceStrategy: 'always' })]
    : [];
  TestBed.configureTestingModule({
    providers: [
      provideHttpClient(...(options.httpFeatures ?? [])),
      provideHttpClientTesting(),
      provideRouter(options.routes ?? [{ path: '**', component: BlankPage }], ...routerFeatures),
      ...(options.providers ?? []),
    ],
  });
  return TestBed.inject(HttpTestingController);
}

/** Signs `user` in through AuthSession, answering its sign-in request at once. */
export function signInAs(user = testUser, accessToken = 't'): void {
  TestBed.inject(AuthSession).signIn({ email: user.email, password: 'x' }).subscribe();
  TestBed.inject(HttpTestingController)
    .expectOne('/api/v1/auth/sign-in')
    .flush(testSession(accessToken, 15, user));
}

/** Lets resources issue their requests and take their answers. */
export async function settle(): Promise<void> {
  for (let i = 0; i < 3; i++) {
    TestBed.tick();
    await new Promise((resolve) => setTimeout(resolve));
  }
}

/** For afterEach: checks that every request was expected and answered. */
export function resetAndVerify(http: HttpTestingController): void {
  // Reset first: a failed verify would leave the module set up and fail every later test.
  TestBed.resetTestingModule();
  http.verify();
}
