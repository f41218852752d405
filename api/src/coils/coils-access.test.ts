import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp, type TestUser } from '../testing/test-app';
import { workspaceWithAllRoles, type WorkspaceFixture } from '../testing/workspace-fixture';
import { roleAtLeast } from '../workspaces/role-rank';
import type { Role } from '../workspaces/workspaces-dto';
import { coilsUrl, createCoil, librarySnapshot, spiralRequest } from './coil-fixture';

// Every coil route × every role × a member of another workspace × anonymous. Each request gets
// a fresh coil, so one cell never depends on another; a refusal must leave the library and the
// audit trail exactly as they were.

let t: TestApp;
let f: WorkspaceFixture;
let outsider: TestUser;

beforeAll(async () => {
  t = await createTestApp();
  f = await workspaceWithAllRoles(t.app, t.database.db, 'coil-matrix');
  outsider = (await workspaceWithAllRoles(t.app, t.database.db, 'coil-matrix-other')).owner;
});
afterAll(async () => {
  await t.close();
});

interface Call {
  method: 'get' | 'post' | 'put' | 'delete';
  path: string;
  body?: object;
}

interface RouteCase {
  name: string;
  minRole: Role;
  success: number;
  writes: boolean;
  prepare(): Promise<Call>;
}

const url = (suffix = '') => coilsUrl(f.workspaceId, suffix);
const freshCoil = () => createCoil(t.app, f.workspaceId, f.owner);

const routes: RouteCase[] = [
  {
    name: 'GET coils',
    minRole: 'viewer',
    success: 200,
    writes: false,
    prepare: async () => ({ method: 'get', path: url() }),
  },
  {
    name: 'POST coil',
    minRole: 'editor',
    success: 201,
    writes: true,
    prepare: async () => ({ method: 'post', path: url(), body: spiralRequest() }),
  },
  {
    name: 'GET coil',
    minRole: 'viewer',
    success: 200,
    writes: false,
    prepare: async () => ({ method: 'get', path: url(`/${(await freshCoil()).id}`) }),
  },
  {
    name: 'PUT coil',
    minRole: 'editor',
    success: 200,
    writes: true,
    prepare: async () => {
      const coil = await freshCoil();
      return {
        method: 'put',
        path: url(`/${coil.id}`),
        body: { ...spiralRequest(coil.name), version: coil.version },
      };
    },
  },
  {
    name: 'POST duplicate',
    minRole: 'editor',
    success: 201,
    writes: true,
    prepare: async () => ({ method: 'post', path: url(`/${(await freshCoil()).id}/duplicate`) }),
  },
  {
    name: 'DELETE coil',
    minRole: 'editor',
    success: 204,
    writes: true,
    prepare: async () => ({ method: 'delete', path: url(`/${(await freshCoil()).id}`) }),
  },
];

type Caller = Role | 'outsider' | 'anonymous';
const callers: Caller[] = ['owner', 'editor', 'reviewer', 'viewer', 'outsider', 'anonymous'];

function tokenOf(caller: Caller): string | undefined {
  if (caller === 'anonymous') return undefined;
  if (caller === 'outsider') return outsider.accessToken;
  if (caller === 'owner') return f.owner.accessToken;
  return f.members[caller].accessToken;
}

function expected(route: RouteCase, caller: Caller): number {
  if (caller === 'anonymous') return 401;
  if (caller === 'outsider') return 404;
  return roleAtLeast(caller, route.minRole) ? route.success : 403;
}

const cells = routes.flatMap((route) =>
  callers.map((caller) => [route.name, caller, route] as const),
);

describe('coil library access', () => {
  it.each(cells)('%s as %s', async (_name, caller, route) => {
    const call = await route.prepare();
    const before = await librarySnapshot(t.database.db, f.workspaceId);
    let req = request(t.app)[call.method](call.path);
    const token = tokenOf(caller);
    if (token) req = req.set('Authorization', `Bearer ${token}`);
    const res = call.body ? await req.send(call.body) : await req;
    const want = expected(route, caller);
    expect(res.status, `${route.name} as ${caller}: ${res.text}`).toBe(want);
    const after = await librarySnapshot(t.database.db, f.workspaceId);
    if (want >= 400) {
      expect(res.body.code).toBe(
        { 401: 'unauthenticated', 403: 'forbidden', 404: 'not_found' }[want],
      );
      // Nothing of the library leaks to those who may not see it, and nothing is written.
      expect(res.text).not.toContain('test spiral');
      expect(after).toEqual(before);
    } else if (route.writes) {
      expect(after).not.toEqual(before);
    } else {
      expect(after).toEqual(before);
    }
  });
});
