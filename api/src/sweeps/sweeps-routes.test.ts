import { randomUUID } from 'node:crypto';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { eq } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Coil } from '../../../physics/src/index';
import { coils, sweepRuns } from '../../../schema/src/index';
import { bearer, signUp, type TestUser } from '../testing/test-app';
import { workspaceWithAllRoles, type WorkspaceFixture } from '../testing/workspace-fixture';
import { eventually, insertLibraryCoil, insertStudy, SweepTestBed } from './sweep-test-bed';
import type { FrozenSweepSpec, SweepRunResponse } from './sweeps-dto';

// The sweep routes with the worker off (RUN_SWEEP_WORKER=0): runs stay queued, so what the
// routes write can be checked exactly. Running runs are in api/src/jobs/sweep-worker.test.ts.

let bed: SweepTestBed;
let f: WorkspaceFixture;
let outsider: TestUser;
let studyId: string;
let txCoilId: string;

const tx = { kind: 'ring', radius: 0.02, wireRadius: 5e-4 } as Coil;
const rx = { kind: 'ring', radius: 0.015, wireRadius: 4e-4 } as Coil;
const xyMap = {
  kind: 'xy-map',
  grid: {
    x: { from: -0.01, to: 0.01, steps: 5 },
    y: { from: -0.01, to: 0.01, steps: 5 },
    z: 0.005,
  },
};

const sweepsPath = (sid = studyId, ws = f.workspaceId) =>
  `/api/v1/workspaces/${ws}/studies/${sid}/sweeps`;
const app = () => bed.app.app;
const runCount = async () => (await bed.db.select().from(sweepRuns)).length;

async function queue(user: TestUser, body: object = xyMap): Promise<SweepRunResponse> {
  const res = await request(app()).post(sweepsPath()).set('Authorization', bearer(user)).send(body);
  expect(res.status, res.text).toBe(202);
  return res.body as SweepRunResponse;
}

beforeAll(async () => {
  bed = await SweepTestBed.open('sweep_routes');
  await bed.startApp({ worker: false });
  f = await workspaceWithAllRoles(app(), bed.db, 'sweeps');
  outsider = await signUp(app(), 'sweeps-outsider');
  txCoilId = await insertLibraryCoil(bed.db, f.workspaceId, 'Tx ring', tx, 100e3);
  const rxCoilId = await insertLibraryCoil(bed.db, f.workspaceId, 'Rx ring', rx, 100e3);
  studyId = await insertStudy(bed.db, {
    workspaceId: f.workspaceId,
    name: 'Ring pair',
    txCoilId,
    rxCoilId,
    frequencyHz: 100e3,
    threshold: { kind: 'k', value: 0.05 },
    nominalPose: { x: 0, y: 0, z: 0.005, tiltX: 0, tiltY: 0 },
  });
});
afterAll(async () => {
  await bed?.close();
});

describe('POST …/sweeps', () => {
  it('queues a run for owner and editor, freezing the study, coils and engine version', async () => {
    for (const user of [f.owner, f.members.editor]) {
      const run = await queue(user);
      expect(run).toMatchObject({
        studyId,
        kind: 'xy-map',
        status: 'queued',
        pointsTotal: 25,
        pointsDone: 0,
        current: true,
        cancelRequested: false,
        requestedBy: { userId: user.id, displayName: user.displayName },
      });
      const [row] = await bed.db.select().from(sweepRuns).where(eq(sweepRuns.id, run.id));
      const spec = row!.spec as unknown as FrozenSweepSpec;
      expect(spec.inputs.tx).toEqual(tx);
      expect(spec.inputs.rx).toEqual(rx);
      expect(spec.coilNames).toEqual({ tx: 'Tx ring', rx: 'Rx ring' });
      expect(spec.inputsHash).toBe(run.inputsHash);
      // Sent as a job in the same transaction (the queue's tables exist: the app started it).
      expect(row!.jobId).toMatch(/^[0-9a-f-]{36}$/);
    }
  });

  it('gives the same inputs hash as the study routes show', async () => {
    const run = await queue(f.members.editor);
    const study = await request(app())
      .get(`/api/v1/workspaces/${f.workspaceId}/studies/${studyId}`)
      .set('Authorization', bearer(f.members.viewer));
    expect(study.status, study.text).toBe(200);
    expect(study.body.inputsHash).toBe(run.inputsHash);
  });

  it('refuses reviewers and viewers (403), outsiders (404) and anonymous callers (401)', async () => {
    const before = await runCount();
    for (const [user, status] of [
      [f.members.reviewer, 403],
      [f.members.viewer, 403],
      [outsider, 404],
    ] as const) {
      const res = await request(app())
        .post(sweepsPath())
        .set('Authorization', bearer(user))
        .send(xyMap);
      expect(res.status).toBe(status);
    }
    expect((await request(app()).post(sweepsPath()).send(xyMap)).status).toBe(401);
    expect(await runCount()).toBe(before);
  });

  it.each([
    [
      'a gap range in an xy-map',
      { ...xyMap, grid: { ...xyMap.grid, z: { from: 0.005, to: 0.01, steps: 2 } } },
      'grid.z',
    ],
    ['an xy-map without a y range', { ...xyMap, grid: { ...xyMap.grid, y: 0 } }, 'grid.y'],
    [
      'a gap sweep with an x range',
      {
        kind: 'gap',
        grid: { x: { from: 0, to: 0.01, steps: 3 }, z: { from: 0.005, to: 0.01, steps: 3 } },
      },
      'grid.x',
    ],
    [
      'a tilt sweep of both tilts',
      {
        kind: 'tilt',
        grid: {
          z: 0.01,
          tiltX: { from: 0, to: 10, steps: 3 },
          tiltY: { from: 0, to: 10, steps: 3 },
        },
      },
      'grid.tiltY',
    ],
    ['a tilt sweep of no tilt', { kind: 'tilt', grid: { z: 0.01 } }, 'grid.tiltX'],
    [
      'an xy-stack of 13 gaps',
      { kind: 'xy-stack', grid: { ...xyMap.grid, z: { from: 0.005, to: 0.02, steps: 13 } } },
      'grid.z.steps',
    ],
    [
      'more poses than a run stores',
      {
        ...xyMap,
        grid: {
          ...xyMap.grid,
          x: { from: -0.1, to: 0.1, steps: 600 },
          y: { from: -0.1, to: 0.1, steps: 600 },
        },
      },
      'grid',
    ],
    [
      'a range of one step',
      { ...xyMap, grid: { ...xyMap.grid, x: { from: -0.01, to: 0.01, steps: 1 } } },
      'grid.x.steps',
    ],
    ['an unknown axis', { ...xyMap, grid: { ...xyMap.grid, yaw: 5 } }, 'grid.yaw'],
    ['an unknown kind', { ...xyMap, kind: 'spiral' }, 'kind'],
    ['coils that touch at the nearest gap', { ...xyMap, grid: { ...xyMap.grid, z: 0 } }, 'grid'],
  ])('refuses %s with 400 naming the field, and writes nothing', async (_what, body, field) => {
    const before = await runCount();
    const res = await request(app())
      .post(sweepsPath())
      .set('Authorization', bearer(f.members.editor))
      .send(body);
    expect(res.status, res.text).toBe(400);
    expect(res.body.field).toBe(field);
    expect(res.body.message).toMatch(new RegExp(`^${field.replace(/\./g, '\\.')}`));
    expect(await runCount()).toBe(before);
  });

  it('answers 404 for a study of another workspace or none', async () => {
    const other = await workspaceWithAllRoles(app(), bed.db, 'sweeps-other');
    const res = await request(app())
      .post(sweepsPath(studyId, other.workspaceId))
      .set('Authorization', bearer(other.owner))
      .send(xyMap);
    expect(res.status).toBe(404);
    const none = await request(app())
      .post(sweepsPath(randomUUID()))
      .set('Authorization', bearer(f.owner))
      .send(xyMap);
    expect(none.status).toBe(404);
  });
});

describe('POST …/sweeps/estimate', () => {
  it('measures prepare time and per-pose cost for editors, and refuses viewers', async () => {
    const res = await request(app())
      .post(`${sweepsPath()}/estimate`)
      .set('Authorization', bearer(f.members.editor))
      .send(xyMap);
    expect(res.status, res.text).toBe(200);
    expect(res.body.poses).toBe(25);
    expect(res.body.prepareSeconds).toBeGreaterThan(0);
    expect(res.body.perPoseMicroseconds).toBeGreaterThan(0);
    expect(res.body.estimatedSeconds).toBeCloseTo(
      res.body.prepareSeconds + (res.body.perPoseMicroseconds * 25) / 1e6,
      9,
    );
    const viewer = await request(app())
      .post(`${sweepsPath()}/estimate`)
      .set('Authorization', bearer(f.members.viewer))
      .send(xyMap);
    expect(viewer.status).toBe(403);
  });
});

describe('GET …/sweeps and …/sweeps/:runId', () => {
  it('lists runs newest first without results, for every member role', async () => {
    const first = await queue(f.owner);
    const second = await queue(f.owner);
    for (const user of [f.owner, f.members.editor, f.members.reviewer, f.members.viewer]) {
      const res = await request(app()).get(sweepsPath()).set('Authorization', bearer(user));
      expect(res.status).toBe(200);
      const ids = (res.body.items as SweepRunResponse[]).map((r) => r.id);
      expect(ids.indexOf(second.id)).toBeLessThan(ids.indexOf(first.id));
      expect(res.body.items.every((r: SweepRunResponse) => r.result === undefined)).toBe(true);
    }
    expect(
      (await request(app()).get(sweepsPath()).set('Authorization', bearer(outsider))).status,
    ).toBe(404);
    expect((await request(app()).get(sweepsPath())).status).toBe(401);
  });

  it('shows one run, 404 for an unknown one, and marks it stale once a coil changes', async () => {
    const run = await queue(f.owner);
    const one = await request(app())
      .get(`${sweepsPath()}/${run.id}`)
      .set('Authorization', bearer(f.members.reviewer));
    expect(one.status).toBe(200);
    expect(one.body).toMatchObject({ id: run.id, status: 'queued', current: true });
    expect(one.body.result).toBeUndefined();
    const missing = await request(app())
      .get(`${sweepsPath()}/${randomUUID()}`)
      .set('Authorization', bearer(f.owner));
    expect(missing.status).toBe(404);

    await bed.db
      .update(coils)
      .set({ spec: { ...tx, radius: 0.021 } })
      .where(eq(coils.id, txCoilId));
    try {
      const stale = await request(app())
        .get(`${sweepsPath()}/${run.id}`)
        .set('Authorization', bearer(f.owner));
      expect(stale.body.current).toBe(false);
    } finally {
      await bed.db
        .update(coils)
        .set({ spec: tx as never })
        .where(eq(coils.id, txCoilId));
    }
  });
});

describe('POST …/sweeps/:runId/cancel', () => {
  it('cancels a queued run at once for an editor; 409 once finished; viewers refused', async () => {
    const run = await queue(f.owner);
    const viewer = await request(app())
      .post(`${sweepsPath()}/${run.id}/cancel`)
      .set('Authorization', bearer(f.members.viewer));
    expect(viewer.status).toBe(403);
    const res = await request(app())
      .post(`${sweepsPath()}/${run.id}/cancel`)
      .set('Authorization', bearer(f.members.editor));
    expect(res.status, res.text).toBe(202);
    expect(res.body).toMatchObject({ status: 'cancelled', cancelRequested: true });
    expect(res.body.finishedAt).not.toBeNull();
    const again = await request(app())
      .post(`${sweepsPath()}/${run.id}/cancel`)
      .set('Authorization', bearer(f.members.editor));
    expect(again.status).toBe(409);
    const missing = await request(app())
      .post(`${sweepsPath()}/${randomUUID()}/cancel`)
      .set('Authorization', bearer(f.members.editor));
    expect(missing.status).toBe(404);
  });
});

describe('GET …/sweeps/:runId/events', () => {
  it('sends `end` at once for a finished run, to any member; 404 to outsiders', async () => {
    const run = await queue(f.owner);
    await request(app())
      .post(`${sweepsPath()}/${run.id}/cancel`)
      .set('Authorization', bearer(f.owner));
    const res = await request(app())
      .get(`${sweepsPath()}/${run.id}/events`)
      .set('Authorization', bearer(f.members.viewer))
      .buffer(true)
      .parse((response, done) => {
        let text = '';
        response.on('data', (chunk: Buffer) => (text += chunk.toString()));
        response.on('end', () => done(null, text));
      });
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/event-stream/);
    expect(res.body).toMatch(/event: end\ndata: \{.*"status":"cancelled"/);
    const outside = await request(app())
      .get(`${sweepsPath()}/${run.id}/events`)
      .set('Authorization', bearer(outsider));
    expect(outside.status).toBe(404);
  });
});

describe('the event stream of a run in progress', () => {
  it('shows the queued run, sends heartbeats, and lets go when the client leaves', async () => {
    const run = await queue(f.owner);
    const { runtime } = bed.app;
    runtime.streamTiming = { progressMs: 250, heartbeatMs: 100, fallbackMs: 2_000 };
    const server = app().listen(0, '127.0.0.1');
    await new Promise((resolve) => server.once('listening', resolve));
    let req: http.ClientRequest | undefined;
    try {
      const { port } = server.address() as AddressInfo;
      let text = '';
      req = http.get(
        `http://127.0.0.1:${port}${sweepsPath()}/${run.id}/events`,
        { headers: { Authorization: bearer(f.members.viewer) } },
        (res) => res.on('data', (chunk: Buffer) => (text += chunk.toString())),
      );
      await eventually(
        async () => ((text.match(/: heartbeat/g) ?? []).length >= 2 ? true : undefined),
        'two heartbeats',
        5_000,
      ).catch((e) => {
        throw new Error(`${(e as Error).message}; got ${JSON.stringify(text)}`);
      });
      expect(text).toMatch(/event: progress\ndata: \{[^\n]*"status":"queued"/);
      expect(runtime.events.subscribers).toBe(1);
      // The LISTEN connection opens beside the stream (it may still be connecting).
      await eventually(async () => (runtime.events.listening ? true : undefined), 'LISTEN');
      req.destroy();
      // The stream unsubscribes, and the last one leaving closes the LISTEN connection.
      await eventually(
        async () =>
          runtime.events.subscribers === 0 && !runtime.events.listening ? true : undefined,
        'the stream to let go',
      );
    } finally {
      runtime.streamTiming = { progressMs: 250, heartbeatMs: 15_000, fallbackMs: 2_000 };
      req?.destroy();
      await new Promise((resolve) => server.close(resolve));
    }
  });
});
