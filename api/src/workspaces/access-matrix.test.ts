import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  bearer,
  createTestApp,
  signUp,
  uniqueEmail,
  type TestApp,
  type TestUser,
} from '../testing/test-app';
import {
  addMember,
  workspaceSnapshot,
  workspaceWithAllRoles,
  type WorkspaceFixture,
} from '../testing/workspace-fixture';
import { roleAtLeast } from './role-rank';
import type { Role } from './workspaces-dto';

// Every workspace route × every role × a member of another workspace × anonymous. Each request
// gets fresh targets, so the outcome of one cell never depends on another.

let t: TestApp;
let f: WorkspaceFixture;
let outsider: TestUser;
let outsiderWorkspaceId: string;

beforeAll(async () => {
  t = await createTestApp();
  f = await workspaceWithAllRoles(t.app, t.database.db, 'matrix');
  const other = await workspaceWithAllRoles(t.app, t.database.db, 'matrix-other');
  outsider = other.owner;
  outsiderWorkspaceId = other.workspaceId;
});
afterAll(async () => {
  await t.close();
});

interface Call {
  method: 'get' | 'post' | 'patch' | 'delete';
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

const ws = () => `/api/v1/workspaces/${f.workspaceId}`;

async function freshMember(): Promise<TestUser> {
  const user = await signUp(t.app, 'matrix-target');
  await addMember(t.database.db, f.workspaceId, user, 'viewer');
  return user;
}

async function freshInvitationId(): Promise<string> {
  const res = await request(t.app)
    .post(`${ws()}/invitations`)
    .set('Authorization', bearer(f.owner))
    .send({ email: uniqueEmail('matrix-inv'), role: 'viewer' });
  return res.body.id as string;
}

const routes: RouteCase[] = [
  {
    name: 'GET workspace',
    minRole: 'viewer',
    success: 200,
    writes: false,
    prepare: async () => ({ method: 'get', path: ws() }),
  },
  {
    name: 'PATCH workspace',
    minRole: 'owner',
    success: 200,
    writes: true,
    prepare: async () => ({
      method: 'patch',
      path: ws(),
      body: { name: `Renamed ${randomUUID()}` },
    }),
  },
  {
    name: 'GET members',
    minRole: 'viewer',
    success: 200,
    writes: false,
    prepare: async () => ({ method: 'get', path: `${ws()}/members` }),
  },
  {
    name: 'PATCH member role',
    minRole: 'owner',
    success: 200,
    writes: true,
    prepare: async () => ({
      method: 'patch',
      path: `${ws()}/members/${(await freshMember()).id}`,
      body: { role: 'editor' },
    }),
  },
  {
    name: 'DELETE another member',
    minRole: 'owner',
    success: 204,
    writes: true,
    prepare: async () => ({
      method: 'delete',
      path: `${ws()}/members/${(await freshMember()).id}`,
    }),
  },
  {
    name: 'GET invitations',
    minRole: 'owner',
    success: 200,
    writes: false,
    prepare: async () => ({ method: 'get', path: `${ws()}/invitations` }),
  },
  {
    name: 'POST invitation',
    minRole: 'owner',
    success: 201,
    writes: true,
    prepare: async () => ({
      method: 'post',
      path: `${ws()}/invitations`,
      body: { email: uniqueEmail('matrix-new'), role: 'editor' },
    }),
  },
  {
    name: 'DELETE invitation',
    minRole: 'owner',
    success: 204,
    writes: true,
    prepare: async () => ({
      method: 'delete',
      path: `${ws()}/invitations/${await freshInvitationId()}`,
    }),
  },
  {
    name: 'GET audit',
    minRole: 'owner',
    success: 200,
    writes: false,
    prepare: async () => ({ method: 'get', path: `${ws()}/audit` }),
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

describe('access matrix', () => {
  it.each(cells)('%s as %s', async (_name, caller, route) => {
    const call = await route.prepare();
    const before = await workspaceSnapshot(t.database.db, f.workspaceId);
    let req = request(t.app)[call.method](call.path);
    const token = tokenOf(caller);
    if (token) req = req.set('Authorization', `Bearer ${token}`);
    const res = call.body ? await req.send(call.body) : await req;
    const want = expected(route, caller);
    expect(res.status, `${route.name} as ${caller}: ${res.text}`).toBe(want);
    if (want >= 400) {
      expect(res.body.code).toBe(
        { 401: 'unauthenticated', 403: 'forbidden', 404: 'not_found' }[want],
      );
      // Nothing about the workspace leaks to those who may not see it, and nothing is written.
      expect(res.text).not.toContain(f.name);
      expect(await workspaceSnapshot(t.database.db, f.workspaceId)).toEqual(before);
    } else if (route.writes) {
      expect(await workspaceSnapshot(t.database.db, f.workspaceId)).not.toEqual(before);
    }
  });

  it('gives an outsider 404 on their own workspace path for a member of another', async () => {
    const res = await request(t.app)
      .patch(`/api/v1/workspaces/${outsiderWorkspaceId}/members/${f.members.viewer.id}`)
      .set('Authorization', bearer(outsider))
      .send({ role: 'editor' });
    expect(res.status).toBe(404);
  });

  it('gives 404 for a workspace that does not exist and 400 for a malformed id', async () => {
    const missing = await request(t.app)
      .get(`/api/v1/workspaces/${randomUUID()}`)
      .set('Authorization', bearer(f.owner));
    expect(missing.status).toBe(404);
    const malformed = await request(t.app)
      .get('/api/v1/workspaces/not-a-uuid')
      .set('Authorization', bearer(f.owner));
    expect(malformed.status).toBe(400);
  });

  it.each([
    ['get', '/api/v1/me'],
    ['get', '/api/v1/workspaces'],
    ['post', '/api/v1/workspaces'],
    ['post', '/api/v1/invitations/any-token/accept'],
  ] as const)('%s %s needs a signed-in user', async (method, path) => {
    const res = await request(t.app)[method](path).send({ name: 'x' });
    expect(res.status).toBe(401);
  });
});
