import { eq, sql } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { coilFigures, type Coil } from '../physics/src/index';
import { coilValues } from '../api/src/coils/coil-values';
import { createCoilRequest, type CoilResponse } from '../api/src/coils/coils-dto';
import type { RevisionResponse, StudyResponse } from '../api/src/studies/studies-dto';
import { computeSweepResult } from '../api/src/sweeps/compute-sweep';
import type { FrozenSweepSpec } from '../api/src/sweeps/sweeps-dto';
import { createTestApp, type TestApp } from '../api/src/testing/test-app';
import { auditEvents, coils, studies, studyRevisions, sweepRuns, users } from '../schema/src/index';
import { demoCoils, demoRevisionSummary, demoStudy, demoSweeps } from './demo-library';
import { demoPassword, demoPeople, demoWorkspace } from './demo-workspace';
import { loadDemo } from './load-demo';

let t: TestApp;
let token: string;
let firstLoadSeconds: number;

beforeAll(async () => {
  t = await createTestApp();
  const t0 = performance.now();
  await loadDemo(t.database.db);
  firstLoadSeconds = (performance.now() - t0) / 1000;
  // Measured, not asserted (no test asserts a timing): the brief asks for well under 10 s.
  console.log(`[demo] loadDemo took ${firstLoadSeconds.toFixed(2)} s`);
  const viewer = demoPeople.find((p) => p.role === 'viewer')!;
  const res = await request(t.app)
    .post('/api/v1/auth/sign-in')
    .send({ email: viewer.email, password: demoPassword });
  expect(res.status, res.text).toBe(200);
  token = res.body.accessToken as string;
});
afterAll(async () => {
  await t.close();
});

const ws = `/api/v1/workspaces/${demoWorkspace.id}`;
const get = (path: string) =>
  request(t.app).get(`${ws}${path}`).set('Authorization', `Bearer ${token}`);

/** Rows of each kind the demo owns, for before/after comparison. */
async function counts() {
  const db = t.database.db;
  const total = sql<number>`count(*)::int`;
  const [c] = await db
    .select({ n: total })
    .from(coils)
    .where(eq(coils.workspaceId, demoWorkspace.id));
  const [s] = await db
    .select({ n: total })
    .from(studies)
    .where(eq(studies.workspaceId, demoWorkspace.id));
  const [r] = await db
    .select({ n: total })
    .from(sweepRuns)
    .where(eq(sweepRuns.studyId, demoStudy.id));
  const [v] = await db
    .select({ n: total })
    .from(studyRevisions)
    .where(eq(studyRevisions.studyId, demoStudy.id));
  const [a] = await db
    .select({ n: total })
    .from(auditEvents)
    .where(eq(auditEvents.workspaceId, demoWorkspace.id));
  return { coils: c!.n, studies: s!.n, runs: r!.n, revisions: v!.n, audit: a!.n };
}

const demoRuns = () =>
  t.database.db.select().from(sweepRuns).where(eq(sweepRuns.studyId, demoStudy.id));

interface StoredEnvelope {
  chargeRadius: number;
  chargeRadiusLimitedByMap: boolean;
  nominal: { meets: boolean };
}

describe('demo library', () => {
  it('holds the five FP-7 coils with the figures the engine gives them', async () => {
    const res = await get('/coils');
    expect(res.status).toBe(200);
    const items = res.body.items as CoilResponse[];
    for (const demo of Object.values(demoCoils)) {
      const coil = items.find((c) => c.id === demo.id);
      expect(coil, demo.request.name).toBeDefined();
      expect(coil!.name).toBe(demo.request.name);
      expect(coil!.figures).toEqual(
        coilFigures(demo.request.spec as Coil, {
          frequency: demo.request.operatingFrequencyHz ?? undefined,
          current: demo.request.ratedCurrentA ?? 1,
        }),
      );
    }
    expect(items).toHaveLength(Object.keys(demoCoils).length);
    const used = items
      .filter((c) => c.usedBy.length > 0)
      .map((c) => c.id)
      .sort();
    expect(used).toEqual([demoCoils.rxPcb.id, demoCoils.txSpiral.id].sort());
  });

  it('holds the baseline study with four succeeded, current runs', async () => {
    const study = await get(`/studies/${demoStudy.id}`);
    expect(study.status, study.text).toBe(200);
    const body = study.body as StudyResponse;
    expect(body).toMatchObject({
      name: demoStudy.request.name,
      frequencyHz: 140e3,
      threshold: demoStudy.request.threshold,
      latestRevision: { number: 1 },
    });
    const runs = await demoRuns();
    expect(runs.map((r) => r.kind).sort()).toEqual(demoSweeps.map((s) => s.kind).sort());
    for (const run of runs) {
      expect(run).toMatchObject({ status: 'succeeded', progressFraction: 1 });
      expect(run.pointsDone).toBe(run.pointsTotal);
      // Current: computed from exactly the study's inputs and coils as the API hashes them.
      expect(run.inputsHash).toBe(body.inputsHash);
    }
  });

  it("stores results equal to computeSweepResult of each run's frozen spec", async () => {
    const runs = await demoRuns();
    for (const run of runs) {
      const fresh = await computeSweepResult(run.spec as unknown as FrozenSweepSpec);
      expect(run.result, run.kind).toEqual(JSON.parse(JSON.stringify(fresh)));
    }
  });

  it('gives a tolerance envelope inside the map that covers the 4 mm field requirement', async () => {
    const map = (await demoRuns()).find((r) => r.kind === 'xy-map')!;
    const envelope = (map.result as unknown as { envelopes: StoredEnvelope[] }).envelopes[0]!;
    // Demo-data sanity, not physics: the envelope must be a visible shape on the 30 mm map.
    expect(envelope.nominal.meets).toBe(true);
    expect(envelope.chargeRadiusLimitedByMap).toBe(false);
    expect(envelope.chargeRadius).toBeGreaterThan(0.004);
    expect(envelope.chargeRadius).toBeLessThan(0.015);
  });

  it('has revision 1 with both coils and the four runs frozen', async () => {
    const [row] = await t.database.db
      .select({ id: studyRevisions.id })
      .from(studyRevisions)
      .where(eq(studyRevisions.studyId, demoStudy.id));
    const res = await get(`/studies/${demoStudy.id}/revisions/${row!.id}`);
    expect(res.status, res.text).toBe(200);
    const revision = res.body as RevisionResponse;
    expect(revision).toMatchObject({ number: 1, summary: demoRevisionSummary });
    expect(revision.coilSnapshots.tx.id).toBe(demoCoils.txSpiral.id);
    expect(revision.coilSnapshots.rx.id).toBe(demoCoils.rxPcb.id);
    expect(revision.results.runs.map((r) => r.kind).sort()).toEqual(
      demoSweeps.map((s) => s.kind).sort(),
    );
    for (const run of revision.results.runs) {
      expect(run.result?.count, run.kind).toBe(run.pointsTotal);
      expect(run.current).toBe(true);
    }
    const editor = demoPeople.find((p) => p.role === 'editor')!;
    const [author] = await t.database.db.select().from(users).where(eq(users.email, editor.email));
    expect(revision.createdBy?.userId).toBe(author!.id);
  });

  it('reloads without adding or recomputing anything', async () => {
    const before = await counts();
    expect(before).toMatchObject({ coils: 5, studies: 1, runs: 4, revisions: 1 });
    const t0 = performance.now();
    await loadDemo(t.database.db);
    const reloadSeconds = (performance.now() - t0) / 1000;
    console.log(`[demo] reload took ${reloadSeconds.toFixed(2)} s`);
    expect(await counts()).toEqual(before);
  });

  it('does not bring back a demo coil someone deleted', async () => {
    const solenoid = demoCoils.rxSolenoid;
    await t.database.db.delete(coils).where(eq(coils.id, solenoid.id));
    try {
      await loadDemo(t.database.db);
      const rows = await t.database.db.select().from(coils).where(eq(coils.id, solenoid.id));
      expect(rows).toHaveLength(0);
    } finally {
      // Put it back so the other checks (and a rerun on the same database) see the full library.
      const values = coilValues(createCoilRequest.parse(solenoid.request));
      await t.database.db
        .insert(coils)
        .values({ ...values, id: solenoid.id, workspaceId: demoWorkspace.id })
        .onConflictDoNothing();
    }
  });
});
