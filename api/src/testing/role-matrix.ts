import type { Express } from 'express';
import request from 'supertest';
import { roleAtLeast } from '../workspaces/role-rank';
import type { Role } from '../workspaces/workspaces-dto';
import type { TestUser } from './test-app';
import type { WorkspaceFixture } from './workspace-fixture';

// The shared frame of the role-matrix tests (workspaces, coils, studies): every route × every
// role × a member of another workspace × anonymous. Each test file keeps its own routes and its
// own snapshot of what a refused call must leave untouched.

export type Caller = Role | 'outsider' | 'anonymous';

export const callers: readonly Caller[] = [
  'owner',
  'editor',
  'reviewer',
  'viewer',
  'outsider',
  'anonymous',
];

export interface RouteCall {
  method: 'get' | 'post' | 'put' | 'patch' | 'delete';
  path: string;
  body?: object;
}

export interface RouteCase {
  name: string;
  minRole: Role;
  success: number;
  writes: boolean;
  /** Fresh targets for one cell, so that no cell depends on another. */
  prepare(): Promise<RouteCall>;
  /** A member's answer other than success or 403 (an editor deleting reviewed work). */
  memberOverride?: Partial<Record<Role, number>>;
}

/** The problem code each refusal status carries. */
export const refusalCodes: Record<number, string> = {
  401: 'unauthenticated',
  403: 'forbidden',
  404: 'not_found',
  409: 'conflict',
};

/** 401 for anonymous, 404 for an outsider (the workspace must not be seen), else by role. */
export function expectedStatus(route: RouteCase, caller: Caller): number {
  if (caller === 'anonymous') return 401;
  if (caller === 'outsider') return 404;
  const override = route.memberOverride?.[caller];
  if (override !== undefined) return override;
  return roleAtLeast(caller, route.minRole) ? route.success : 403;
}

/** One `[route name, caller, route]` row per cell, for `it.each`. */
export function matrixCells<R extends RouteCase>(routes: readonly R[]) {
  return routes.flatMap((route) => callers.map((caller) => [route.name, caller, route] as const));
}

/** Sends a prepared call as the caller (no Authorization header for anonymous). */
export async function callAs(
  app: Express,
  fixture: WorkspaceFixture,
  outsider: TestUser,
  caller: Caller,
  call: RouteCall,
) {
  let req = request(app)[call.method](call.path);
  const token =
    caller === 'anonymous'
      ? undefined
      : caller === 'outsider'
        ? outsider.accessToken
        : caller === 'owner'
          ? fixture.owner.accessToken
          : fixture.members[caller].accessToken;
  if (token) req = req.set('Authorization', `Bearer ${token}`);
  return call.body ? req.send(call.body) : req;
}
