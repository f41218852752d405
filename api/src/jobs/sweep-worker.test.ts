import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { eq } from 'drizzle-orm';
import pino from 'pino';
import request from 'supertest';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import type { Coil } from '../../../physics/src/index';
import { sweepRuns } from '../../../schema/src/index';
import { computeSweepResult } from '../sweeps/compute-sweep';
import { eventually, insertLibraryCoil, insertStudy, SweepTestBed } from '../sweeps/sweep-test-bed';
import type { FrozenSweepSpec, SweepProgressEvent, SweepRunResponse } from '../sweeps/sweeps-dto';
import { bearer, signUp, type TestUser } from '../testing/test-app';
import { SweepQueue } from './sweep-queue';
import { MAX_RUN_ATTEMPTS } from './sweep-recovery';
import { SweepWorker } from './sweep-worker';

// The durable path end to end on a database of its own: queue → worker thread → stored result,
// the event stream, cancellation, and what survives a stop, a restart and a crash.

let bed: SweepTestBed;
let owner: TestUser;
let workspaceId: string;
let studyId: string;

// A polygon Tx against a ring Rx takes the tabulated-potential route (~1 ms a pose here), so a
// few thousand poses last long enough to watch; a ring pair computes in an instant.
const rectTx = {
  kind: 'rectangular-spiral',
  outerWidth: 0.07,
  outerHeight: 0.05,
  cornerRadius: 0.002,
  pitch: 0.0012,
  turns: 15,
  conductor: { type: 'round', diameter: 8e-4 },
} as Coil;
const rx = { kind: 'ring', radius: 0.015, wireRadius: 4e-4 } as Coil;
const grid = (steps: number) => ({
  x: { from: -0.02, to: 0.02, steps },
  y: { from: -0.02, to: 0.02, steps },
  z: 0.004,
});
const silent = pino({ level: 'silent' });
const sweepsPath = () => `/api/v1/workspaces/${workspaceId}/studies/${studyId}/sweeps`;

async function queueRun(steps: number): Promise<SweepRunResponse> {
  const res = await request(bed.app.app)
    .post(sweepsPath())
    .set('Authorization', bearer(owner))
    .send({ kind: 'xy-map', grid: grid(steps) });
  expect(res.status, res.text).toBe(202);
  return res.body as SweepRunResponse;
}

async function row(runId: string) {
  const [found] = await bed.db.select().from(sweepRuns).where(eq(sweepRuns.id, runId));
  return found!;
}

const untilStatus = (runId: string, status: string, timeoutMs = 30_000) =>
  eventually(
    async () => {
      const r = await row(runId);
      return r.status === status ? r : undefined;
    },
    `run ${runId} to be ${status}`,
    timeoutMs,
  );

/** A worker as on another machine: its own queue instance and pool, the same database. */
async function outsideWorker(): Promise<{ worker: SweepWorker; stop(): Promise<void> }> {
  const queue = new SweepQueue(bed.databaseUrl, { supervise: true });
  await queue.start();
  const worker = await SweepWorker.start({
    databaseUrl: bed.databaseUrl,
    queue,
    threads: 1,
    logger: silent,
    chunkSize: 64,
  });
  return {
    worker,
    stop: async () => {
      await worker.stop();
      await queue.stop();
    },
  };
}

interface StreamEvent {
  event: string;
  data: unknown;
  at: number;
}

/** Reads a server-sent event stream over a raw HTTP request until the server closes it. */
function readEvents(url: string, token: string, onEvent: (e: StreamEvent) => void) {
  return new Promise<{ status: number; type: string; events: StreamEvent[] }>((resolve, reject) => {
    const events: StreamEvent[] = [];
    const req = http.get(url, { headers: { Authorization: token } }, (res) => {
      let buffer = '';
      res.setEncoding('utf8');
      res.on('data', (chunk: string) => {
        buffer += chunk;
        let cut: number;
        while ((cut = buffer.indexOf('\n\n')) >= 0) {
          const block = buffer.slice(0, cut);
          buffer = buffer.slice(cut + 2);
          const lines = block.split('\n').filter((l) => !l.startsWith(':'));
          const event = lines.find((l) => l.startsWith('event: '))?.slice(7);
          const data = lines.find((l) => l.startsWith('data: '))?.slice(6);
          if (event && data) {
            const e = { event, data: JSON.parse(data) as unknown, at: Date.now() };
            events.push(e);
            onEvent(e);
          }
        }
      });
      res.on('end', () =>
        resolve({ status: res.statusCode ?? 0, type: String(res.headers['content-type']), events }),
      );
    });
    req.on('error', reject);
  });
}

beforeAll(async () => {
  bed = await SweepTestBed.open('sweep_worker');
  const { app } = await bed.startApp({ worker: false });
  owner = await signUp(app, 'sweep-worker-owner');
  const ws = await request(app)
    .post('/api/v1/workspaces')
    .set('Authorization', bearer(owner))
    .send({ name: 'Sweep worker tests' });
  workspaceId = ws.body.id;
  const txCoilId = await insertLibraryCoil(bed.db, workspaceId, 'Rect Tx', rectTx, 150e3);
  const rxCoilId = await insertLibraryCoil(bed.db, workspaceId, 'Ring Rx', rx, 150e3);
  studyId = await insertStudy(bed.db, {
    workspaceId,
    name: 'Rect over ring',
    txCoilId,
    rxCoilId,
    frequencyHz: 150e3,
    threshold: { kind: 'eta', value: 0.5 },
    nominalPose: { x: 0, y: 0, z: 0.004, tiltX: 0, tiltY: 0 },
  });
  await bed.stopApp();
});
afterEach(async () => {
  await bed.stopApp();
});
afterAll(async () => {
  await bed?.close();
});

describe('a sweep run through the queue', () => {
  it('goes queued → running → succeeded, streamed, with the result computeSweepResult gives', async () => {
    const { app } = await bed.startApp({ worker: false });
    const server = app.listen(0, '127.0.0.1');
    await new Promise((resolve) => server.once('listening', resolve));
    let outside: Awaited<ReturnType<typeof outsideWorker>> | undefined;
    try {
      const run = await queueRun(31);
      const { port } = server.address() as AddressInfo;
      const starting: Promise<void>[] = [];
      const stream = readEvents(
        `http://127.0.0.1:${port}${sweepsPath()}/${run.id}/events`,
        bearer(owner),
        (e) => {
          // The worker starts only once the stream has shown the run queued.
          if (e.event === 'progress' && starting.length === 0) {
            starting.push(outsideWorker().then((w) => void (outside = w)));
          }
        },
      );
      const { status, type, events } = await stream;
      await Promise.all(starting);
      expect(status).toBe(200);
      expect(type).toMatch(/^text\/event-stream/);

      const progress = events.filter((e) => e.event === 'progress');
      const data = progress.map((e) => e.data as SweepProgressEvent);
      expect(data[0]).toMatchObject({ runId: run.id, status: 'queued', pointsDone: 0 });
      const running = data.filter((d) => d.status === 'running' && d.pointsDone > 0);
      expect(running.length).toBeGreaterThan(0);
      expect(running.every((d) => d.pointsTotal === 961 && d.fraction <= 1)).toBe(true);
      const done = data.map((d) => d.pointsDone);
      expect(done).toEqual([...done].sort((a, b) => a - b));
      // At most one progress event per 250 ms, less 100 ms for delivery jitter on a busy
      // machine; without the throttle chunks of 64 poses (~50 ms) would arrive far closer.
      for (let i = 1; i < progress.length; i++) {
        expect(progress[i]!.at - progress[i - 1]!.at).toBeGreaterThanOrEqual(150);
      }
      const end = events.at(-1)!;
      expect(end.event).toBe('end');
      expect(end.data).toMatchObject({ id: run.id, status: 'succeeded', pointsDone: 961 });

      const stored = await row(run.id);
      expect(stored.startedAt!.getTime()).toBeLessThanOrEqual(stored.finishedAt!.getTime());
      expect(stored.computeTimeS).toBeGreaterThan(0);
      expect(stored.progressFraction).toBe(1);
      const got = await request(app)
        .get(`${sweepsPath()}/${run.id}`)
        .set('Authorization', bearer(owner));
      expect(got.status).toBe(200);
      const expected = await computeSweepResult(stored.spec as unknown as FrozenSweepSpec);
      // Through JSON (and jsonb) exactly: shortest round-trip decimals, -0 read back as 0.
      expect(got.body.result).toEqual(JSON.parse(JSON.stringify(expected)));
      expect(got.body.result.envelopes).toHaveLength(1);
    } finally {
      await new Promise((resolve) => server.close(resolve));
      await outside?.stop();
    }
  });

  it('ends a running run as cancelled at its next chunk', async () => {
    const { app } = await bed.startApp({ worker: true, workerOptions: { chunkSize: 64 } });
    const run = await queueRun(41);
    await eventually(async () => {
      const r = await row(run.id);
      return r.status === 'running' && r.pointsDone > 0 ? r : undefined;
    }, 'progress');
    const res = await request(app)
      .post(`${sweepsPath()}/${run.id}/cancel`)
      .set('Authorization', bearer(owner));
    expect(res.status, res.text).toBe(202);
    expect(res.body).toMatchObject({ status: 'running', cancelRequested: true });
    const ended = await untilStatus(run.id, 'cancelled');
    expect(ended.pointsDone).toBeLessThan(1681);
    expect(ended.result).toBeNull();
    expect(ended.finishedAt).not.toBeNull();
  });
});

describe('runs that outlive their process', () => {
  it('completes a run queued with the worker off once a new app starts with a worker', async () => {
    await bed.startApp({ worker: false });
    const run = await queueRun(5);
    await new Promise((resolve) => setTimeout(resolve, 300));
    expect((await row(run.id)).status).toBe('queued');
    await bed.stopApp(); // app, queue and pools all gone
    await bed.startApp({ worker: true });
    const done = await untilStatus(run.id, 'succeeded');
    expect(done.pointsDone).toBe(25);
  });

  it('hands a running run back on a clean stop, and the next worker computes it', async () => {
    await bed.startApp({ worker: true, workerOptions: { chunkSize: 16 } });
    const run = await queueRun(31);
    const before = await eventually(async () => {
      const r = await row(run.id);
      return r.status === 'running' && r.pointsDone > 0 ? r : undefined;
    }, 'progress');
    await bed.stopApp();
    const handedBack = await row(run.id);
    expect(handedBack).toMatchObject({ status: 'queued', pointsDone: 0, startedAt: null });
    expect(handedBack.jobId).not.toBe(before.jobId);
    await bed.startApp({ worker: true });
    await untilStatus(run.id, 'succeeded', 60_000);
  });

  it('requeues a run whose worker crashed (running, nobody holding its lock)', async () => {
    await bed.startApp({ worker: false });
    const run = await queueRun(5);
    await bed.stopApp();
    // What a worker killed mid-run leaves: the row running, its job active, no lock held.
    await bed.db
      .update(sweepRuns)
      .set({ status: 'running', startedAt: new Date(), pointsDone: 7 })
      .where(eq(sweepRuns.id, run.id));
    const crashedJob = (await row(run.id)).jobId;
    await bed.startApp({ worker: true });
    const done = await untilStatus(run.id, 'succeeded');
    expect(done.jobId).not.toBe(crashedJob);
    const job = await bed.app.runtime.queue.jobState(done.jobId!);
    expect(job?.attempt).toBe(2);
  });

  it(`fails a run after ${MAX_RUN_ATTEMPTS} lost workers instead of retrying forever`, async () => {
    const { runtime } = await bed.startApp({ worker: false });
    const run = await queueRun(5);
    // A job that is already the last attempt, and a row its (vanished) worker left running.
    const client = await bed.database.pool.connect();
    let jobId: string | null;
    try {
      jobId = await runtime.queue.send(client, { runId: run.id, attempt: MAX_RUN_ATTEMPTS });
    } finally {
      client.release();
    }
    await bed.db
      .update(sweepRuns)
      .set({ status: 'running', startedAt: new Date(), jobId })
      .where(eq(sweepRuns.id, run.id));
    await bed.stopApp();
    await bed.startApp({ worker: true });
    const failed = await untilStatus(run.id, 'failed');
    expect(failed.error).toMatch(/worker stopped 3 times/);
  });
});
