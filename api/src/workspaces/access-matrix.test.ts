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
import {
  callAs,
  expectedStatus,
  matrixCells,
  refusalCodes,
  type RouteCase,
} from '../testing/role-matrix';

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

const cells = matrixCells(routes);

describe('access matrix', () => {
  it.each(cells)('%s as %s', async (_name, caller, route) => {
    const call = await route.prepare();
    const before = await workspaceSnapshot(t.database.db, f.workspaceId);
    const res = await callAs(t.app, f, outsider, caller, call);
    const want = expectedStatus(route, caller);
    expect(res.status, `${route.name} as ${caller}: ${res.text}`).toBe(want);
    if (want >= 400) {
      expect(res.body.code).toBe(refusalCodes[want]);
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
