import { asc, count, eq, inArray } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { auditEvents, studies, studyRevisions } from '../../../schema/src/index';
import { bearer, createTestApp, type TestApp, type TestUser } from '../testing/test-app';
import { workspaceWithAllRoles, type WorkspaceFixture } from '../testing/workspace-fixture';
import {
  callAs,
  expectedStatus,
  matrixCells,
  refusalCodes,
  type RouteCase,
} from '../testing/role-matrix';
import { insertCoil, padRx, padTx, studyBody } from './study-fixture';

// Every study and revision route × every role × a member of another workspace × anonymous.
// Each cell gets fresh targets, and a refused call must leave the workspace as it was.

let t: TestApp;
let f: WorkspaceFixture;
let outsider: TestUser;
let txId: string;
let rxId: string;

beforeAll(async () => {
  t = await createTestApp();
  f = await workspaceWithAllRoles(t.app, t.database.db, 'study-matrix');
  outsider = (await workspaceWithAllRoles(t.app, t.database.db, 'study-matrix-other')).owner;
  txId = (await insertCoil(t.database.db, f.workspaceId, padTx)).id;
  rxId = (await insertCoil(t.database.db, f.workspaceId, padRx)).id;
});
afterAll(async () => {
  await t.close();
});

const ws = () => `/api/v1/workspaces/${f.workspaceId}/studies`;

async function freshStudy(): Promise<{ id: string; name: string }> {
  const res = await request(t.app)
    .post(ws())
    .set('Authorization', bearer(f.owner))
    .send(studyBody(txId, rxId));
  if (res.status !== 201) throw new Error(res.text);
  return res.body as { id: string; name: string };
}

async function freshRevision(studyId: string): Promise<string> {
  const res = await request(t.app)
    .post(`${ws()}/${studyId}/revisions`)
    .set('Authorization', bearer(f.owner))
    .send({ summary: 'matrix', studyVersion: 1 });
  if (res.status !== 201) throw new Error(res.text);
  return res.body.id as string;
}

const routes: RouteCase[] = [
  {
    name: 'GET studies',
    minRole: 'viewer',
    success: 200,
    writes: false,
    prepare: async () => ({ method: 'get', path: ws() }),
  },
  {
    name: 'POST study',
    minRole: 'editor',
    success: 201,
    writes: true,
    prepare: async () => ({ method: 'post', path: ws(), body: studyBody(txId, rxId) }),
  },
  {
    name: 'GET study',
    minRole: 'viewer',
    success: 200,
    writes: false,
    prepare: async () => ({ method: 'get', path: `${ws()}/${(await freshStudy()).id}` }),
  },
  {
    name: 'PUT study',
    minRole: 'editor',
    success: 200,
    writes: true,
    prepare: async () => {
      const study = await freshStudy();
      return {
        method: 'put',
        path: `${ws()}/${study.id}`,
        body: { ...studyBody(txId, rxId, { name: study.name }), notes: 'changed', version: 1 },
      };
    },
  },
  {
    name: 'DELETE study without revisions',
    minRole: 'editor',
    success: 204,
    writes: true,
    prepare: async () => ({ method: 'delete', path: `${ws()}/${(await freshStudy()).id}` }),
  },
  {
    name: 'DELETE study with revisions',
    minRole: 'owner',
    success: 204,
    writes: true,
    memberOverride: { editor: 409 },
    prepare: async () => {
      const study = await freshStudy();
      await freshRevision(study.id);
      return { method: 'delete', path: `${ws()}/${study.id}` };
    },
  },
  {
    name: 'POST revision',
    minRole: 'editor',
    success: 201,
    writes: true,
    prepare: async () => ({
      method: 'post',
      path: `${ws()}/${(await freshStudy()).id}/revisions`,
      body: { summary: 'cell', studyVersion: 1 },
    }),
  },
  {
    name: 'GET revisions',
    minRole: 'viewer',
    success: 200,
    writes: false,
    prepare: async () => {
      const study = await freshStudy();
      await freshRevision(study.id);
      return { method: 'get', path: `${ws()}/${study.id}/revisions` };
    },
  },
  {
    name: 'GET revision',
    minRole: 'viewer',
    success: 200,
    writes: false,
    prepare: async () => {
      const study = await freshStudy();
      const revisionId = await freshRevision(study.id);
      return { method: 'get', path: `${ws()}/${study.id}/revisions/${revisionId}` };
    },
  },
];

/** What a refused call must leave untouched: the studies, their revisions and the audit log. */
async function snapshot() {
  const db = t.database.db;
  const rows = await db
    .select({ id: studies.id, version: studies.version, notes: studies.notes })
    .from(studies)
    .where(eq(studies.workspaceId, f.workspaceId))
    .orderBy(asc(studies.id));
  const ids = rows.map((r) => r.id);
  const revisions = ids.length
    ? await db
        .select({ id: studyRevisions.id })
        .from(studyRevisions)
        .where(inArray(studyRevisions.studyId, ids))
        .orderBy(asc(studyRevisions.id))
    : [];
  const [audit] = await db
    .select({ n: count() })
    .from(auditEvents)
    .where(eq(auditEvents.workspaceId, f.workspaceId));
  return { rows, revisions, audit: audit!.n };
}

const cells = matrixCells(routes);

describe('study access matrix', () => {
  it.each(cells)('%s as %s', async (_name, caller, route) => {
    const call = await route.prepare();
    const before = await snapshot();
    const res = await callAs(t.app, f, outsider, caller, call);
    const want = expectedStatus(route, caller);
    expect(res.status, `${route.name} as ${caller}: ${res.text}`).toBe(want);
    if (want >= 400) {
      expect(res.body.code).toBe(refusalCodes[want]);
      expect(await snapshot()).toEqual(before);
    } else if (route.writes) {
      expect(await snapshot()).not.toEqual(before);
    }
  });
});
