import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp, type TestUser } from '../testing/test-app';
import { workspaceWithAllRoles, type WorkspaceFixture } from '../testing/workspace-fixture';
import {
  callAs,
  expectedStatus,
  matrixCells,
  refusalCodes,
  type RouteCase,
} from '../testing/role-matrix';
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

const cells = matrixCells(routes);

describe('coil library access', () => {
  it.each(cells)('%s as %s', async (_name, caller, route) => {
    const call = await route.prepare();
    const before = await librarySnapshot(t.database.db, f.workspaceId);
    const res = await callAs(t.app, f, outsider, caller, call);
    const want = expectedStatus(route, caller);
    expect(res.status, `${route.name} as ${caller}: ${res.text}`).toBe(want);
    const after = await librarySnapshot(t.database.db, f.workspaceId);
    if (want >= 400) {
      expect(res.body.code).toBe(refusalCodes[want]);
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
