import { HttpTestingController } from '@angular/common/http/testing';
import { EnvironmentInjector, runInInjectionContext } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import {
  ActivatedRouteSnapshot,
  RouterStateSnapshot,
  UrlTree,
  convertToParamMap,
} from '@angular/router';
import { Observable, firstValueFrom, isObservable, of } from 'rxjs';
import { configurePageTest, resetAndVerify } from '../testing/page-test-bed';
import { ownerGuard } from './owner-guard';

const workspaceId = '6f1c2d3e-4b5a-4c6d-8e7f-901a2b3c4d5e';

describe('ownerGuard', () => {
  let http: HttpTestingController;

  beforeEach(() => {
    http = configurePageTest({ routes: [] });
  });

  afterEach(() => resetAndVerify(http));

  function run(): Promise<boolean | UrlTree> {
    const route = { paramMap: convertToParamMap({ workspaceId }) } as ActivatedRouteSnapshot;
    const result = runInInjectionContext(TestBed.inject(EnvironmentInjector), () =>
      ownerGuard(route, {} as RouterStateSnapshot),
    );
    const result$ = isObservable(result) ? result : of(result);
    return firstValueFrom(result$ as Observable<boolean | UrlTree>);
  }

  it('asks the server for the role and lets an owner in', async () => {
    const decision = run();
    http
      .expectOne(`/api/v1/workspaces/${workspaceId}`)
      .flush({ id: workspaceId, name: 'W', role: 'owner', createdAt: '2026-12-01T00:00:00Z' });
    expect(await decision).toBe(true);
  });

  it('sends an editor back to the workspace home', async () => {
    const decision = run();
    http
      .expectOne(`/api/v1/workspaces/${workspaceId}`)
      .flush({ id: workspaceId, name: 'W', role: 'editor', createdAt: '2026-12-01T00:00:00Z' });
    expect(String(await decision)).toBe(`/w/${workspaceId}`);
  });

  it('sends a non-member (404) back too, never further in', async () => {
    const decision = run();
    http
      .expectOne(`/api/v1/workspaces/${workspaceId}`)
      .flush({ code: 'not_found', message: 'no' }, { status: 404, statusText: 'Not Found' });
    expect(String(await decision)).toBe(`/w/${workspaceId}`);
  });
});
