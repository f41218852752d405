import { randomUUID } from 'node:crypto';
import { and, count, eq } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { coilFigures, type Coil } from '../../../physics/src/index';
import { auditEvents, coils, studies, sweepRuns } from '../../../schema/src/index';
import { bearer, createTestApp, type TestApp } from '../testing/test-app';
import { workspaceWithAllRoles, type WorkspaceFixture } from '../testing/workspace-fixture';
import type { StudyResponse } from './studies-dto';
import { insertCoil, insertSweepRun, padRx, padTx, studyBody } from './study-fixture';
import { studyInputsHash } from './study-inputs-hash';

let t: TestApp;
let f: WorkspaceFixture;
let other: WorkspaceFixture;
let txId: string;
let rxId: string;
let foreignCoilId: string;

beforeAll(async () => {
  t = await createTestApp();
  f = await workspaceWithAllRoles(t.app, t.database.db, 'studies');
  other = await workspaceWithAllRoles(t.app, t.database.db, 'studies-other');
  txId = (await insertCoil(t.database.db, f.workspaceId, padTx, { name: 'Cradle Tx' })).id;
  rxId = (await insertCoil(t.database.db, f.workspaceId, padRx, { name: 'Phone Rx' })).id;
  foreignCoilId = (await insertCoil(t.database.db, other.workspaceId, padRx)).id;
});
afterAll(async () => {
  await t.close();
});

const url = (suffix = '') => `/api/v1/workspaces/${f.workspaceId}/studies${suffix}`;
const asEditor = () => bearer(f.members.editor);

async function create(body: object = studyBody(txId, rxId)): Promise<StudyResponse> {
  const res = await request(t.app).post(url()).set('Authorization', asEditor()).send(body);
  expect(res.status, res.text).toBe(201);
  return res.body as StudyResponse;
}

async function studyCount(): Promise<number> {
  const rows = await t.database.db
    .select({ n: count() })
    .from(studies)
    .where(eq(studies.workspaceId, f.workspaceId));
  return rows[0]!.n;
}

/** Relative closeness, for values that pass through formulas rather than being copied. */
function expectClose(actual: number | null, expected: number | null, rel: number, what: string) {
  if (expected === null) return expect(actual, what).toBeNull();
  const err = Math.abs((actual ?? NaN) - expected) / Math.abs(expected);
  expect(err, `${what}: got ${actual}, expected ${expected}, rel. tolerance ${rel}`).toBeLessThan(
    rel,
  );
}

describe('creating and reading a study', () => {
  it('answers 201 with both coils, their library figures and the inputs hash', async () => {
    const body = studyBody(txId, rxId);
    const study = await create(body);
    expect(study).toMatchObject({
      workspaceId: f.workspaceId,
      name: body.name,
      frequencyHz: 140e3,
      txCurrentA: 1.5,
      threshold: { kind: 'k', value: 0.3 },
      compensation: 'series-series',
      version: 1,
      latestRevision: null,
      createdBy: { userId: f.members.editor.id, displayName: f.members.editor.displayName },
      updatedBy: { userId: f.members.editor.id },
    });
    expect(study.txCoil).toMatchObject({ id: txId, name: 'Cradle Tx', kind: 'circular-spiral' });
    expect(study.txCoil.spec).toEqual(padTx);
    expect(study.rxCoil.spec).toEqual(padRx);
    expect(study.inputsHash).toBe(
      studyInputsHash({
        frequencyHz: 140e3,
        txCurrentA: 1.5,
        threshold: { kind: 'k', value: 0.3 },
        compensation: 'series-series',
        nominalPose: { x: 0, y: 0, z: 0.004, tiltX: 0, tiltY: 0 },
        tx: padTx,
        rx: padRx,
      }),
    );
    // The figures are the engine's at the library's 140 kHz; the cached columns round-trip
    // through double precision exactly, the derived ones are recomputed (1e-12: rounding only).
    const engine = coilFigures(padTx, { frequency: 140e3 });
    for (const key of Object.keys(engine) as (keyof typeof engine)[]) {
      expectClose(study.txCoil.figures[key], engine[key], 1e-12, `tx figures.${key}`);
    }
    // Q = ωL/R_ac (textbook definition of the quality factor).
    const { L, Rac, Q } = study.txCoil.figures;
    expectClose(Q, (2 * Math.PI * 140e3 * L) / Rac!, 1e-12, 'Q = ωL/R');
    // W = ½ L I² at the 1 A the library uses when no rated current is set (textbook).
    expectClose(study.txCoil.figures.storedEnergy, 0.5 * L, 1e-12, 'W = ½LI²');

    const got = await request(t.app)
      .get(url(`/${study.id}`))
      .set('Authorization', bearer(f.members.viewer));
    expect(got.status).toBe(200);
    expect(got.body).toEqual(study);
    const audit = await t.database.db
      .select()
      .from(auditEvents)
      .where(
        and(eq(auditEvents.workspaceId, f.workspaceId), eq(auditEvents.action, 'study.created')),
      );
    expect(audit.map((a) => a.subject)).toContain(body.name);
  });

  it('fills the defaults: compensation, notes, pose offsets and tilts', async () => {
    const study = await create({
      name: `Defaults ${randomUUID().slice(0, 6)}`,
      txCoilId: txId,
      rxCoilId: rxId,
      frequencyHz: 85e3,
      txCurrentA: 10,
      threshold: { kind: 'eta', value: 0.85 },
      nominalPose: { z: 0.15 },
    });
    expect(study).toMatchObject({
      compensation: 'series-series',
      notes: '',
      threshold: { kind: 'eta', value: 0.85 },
      nominalPose: { x: 0, y: 0, z: 0.15, tiltX: 0, tiltY: 0 },
    });
  });

  it('allows the same coil as Tx and Rx (comparing identical pads is a real study)', async () => {
    const study = await create(studyBody(txId, txId));
    expect(study.txCoil).toEqual(study.rxCoil);
  });

  it('gives 404 for a study that does not exist or belongs to another workspace', async () => {
    const theirs = await request(t.app)
      .post(`/api/v1/workspaces/${other.workspaceId}/studies`)
      .set('Authorization', bearer(other.owner))
      .send(studyBody(foreignCoilId, foreignCoilId));
    expect(theirs.status).toBe(201);
    for (const id of [randomUUID(), theirs.body.id as string]) {
      const res = await request(t.app)
        .get(url(`/${id}`))
        .set('Authorization', bearer(f.owner));
      expect(res.status).toBe(404);
      expect(res.body.code).toBe('not_found');
      expect(res.text).not.toContain(theirs.body.name);
    }
  });
});

describe('bad input', () => {
  const cases: [string, (b: Record<string, unknown>) => object, string][] = [
    ['frequency 0', (b) => ({ ...b, frequencyHz: 0 }), 'frequencyHz'],
    ['k_min 1.5', (b) => ({ ...b, threshold: { kind: 'k', value: 1.5 } }), 'threshold.value'],
    ['η_min 1', (b) => ({ ...b, threshold: { kind: 'eta', value: 1 } }), 'threshold.value'],
    ['unknown compensation', (b) => ({ ...b, compensation: 'lcc' }), 'compensation'],
    ['unknown field', (b) => ({ ...b, colour: 'teal' }), 'colour'],
    ['negative gap', (b) => ({ ...b, nominalPose: { z: -0.001 } }), 'nominalPose.z'],
    ['zero current', (b) => ({ ...b, txCurrentA: 0 }), 'txCurrentA'],
    ['empty name', (b) => ({ ...b, name: '  ' }), 'name'],
    ['malformed coil id', (b) => ({ ...b, rxCoilId: 'coil-7' }), 'rxCoilId'],
  ];

  it.each(cases)('refuses %s naming the field, and writes nothing', async (_n, change, field) => {
    const before = await studyCount();
    const body = change(studyBody(txId, rxId) as unknown as Record<string, unknown>);
    const res = await request(t.app).post(url()).set('Authorization', asEditor()).send(body);
    expect(res.status, res.text).toBe(400);
    expect(res.body).toMatchObject({ code: 'validation_failed', field });
    expect(res.body.message).toMatch(new RegExp(`^${field.replace('.', '\\.')}: `));
    expect(await studyCount()).toBe(before);
  });

  it('answers a coil of another workspace exactly like a missing one', async () => {
    const before = await studyCount();
    const foreign = await request(t.app)
      .post(url())
      .set('Authorization', asEditor())
      .send(studyBody(foreignCoilId, rxId));
    const missing = await request(t.app)
      .post(url())
      .set('Authorization', asEditor())
      .send(studyBody(randomUUID(), rxId));
    expect(foreign.status).toBe(400);
    expect(foreign.body).toMatchObject({ code: 'validation_failed', field: 'txCoilId' });
    expect(foreign.body).toEqual(missing.body);
    const rx = await request(t.app)
      .post(url())
      .set('Authorization', asEditor())
      .send(studyBody(txId, foreignCoilId));
    expect(rx.body).toMatchObject({ status: 400, field: 'rxCoilId' });
    expect(await studyCount()).toBe(before);
  });

  it('refuses a second study of the same name with 409 on name', async () => {
    const first = await create();
    const before = await studyCount();
    const res = await request(t.app)
      .post(url())
      .set('Authorization', asEditor())
      .send(studyBody(txId, rxId, { name: first.name }));
    expect(res.status).toBe(409);
    expect(res.body).toMatchObject({ code: 'conflict', field: 'name' });
    expect(await studyCount()).toBe(before);
  });
});

describe('saving a study', () => {
  it('replaces every field, raises the version and records who saved', async () => {
    const study = await create();
    const res = await request(t.app)
      .put(url(`/${study.id}`))
      .set('Authorization', bearer(f.owner))
      .send({
        ...studyBody(rxId, txId, { name: `${study.name} swapped` }),
        threshold: { kind: 'eta', value: 0.7 },
        compensation: 'series-parallel',
        version: 1,
      });
    expect(res.status, res.text).toBe(200);
    expect(res.body).toMatchObject({
      id: study.id,
      name: `${study.name} swapped`,
      txCoil: { id: rxId },
      rxCoil: { id: txId },
      threshold: { kind: 'eta', value: 0.7 },
      compensation: 'series-parallel',
      version: 2,
      createdBy: { userId: f.members.editor.id },
      updatedBy: { userId: f.owner.id, displayName: f.owner.displayName },
    });
    expect(res.body.inputsHash).not.toBe(study.inputsHash);
    // The k_min column is cleared when the threshold becomes an efficiency.
    const [row] = await t.database.db.select().from(studies).where(eq(studies.id, study.id));
    expect(row).toMatchObject({ thresholdKind: 'eta', minEfficiency: 0.7, minCouplingK: null });
  });

  it('keeps the inputs hash when only the name and notes change', async () => {
    const study = await create();
    const res = await request(t.app)
      .put(url(`/${study.id}`))
      .set('Authorization', asEditor())
      .send({ ...studyBody(txId, rxId), notes: 'Moved the pocket 2 mm', version: 1 });
    expect(res.status).toBe(200);
    expect(res.body.inputsHash).toBe(study.inputsHash);
  });

  it('refuses a coil of another workspace on save, naming the field', async () => {
    const study = await create();
    const res = await request(t.app)
      .put(url(`/${study.id}`))
      .set('Authorization', asEditor())
      .send({ ...studyBody(txId, foreignCoilId), version: 1 });
    expect(res.status).toBe(400);
    expect(res.body).toMatchObject({ field: 'rxCoilId' });
    const got = await request(t.app)
      .get(url(`/${study.id}`))
      .set('Authorization', asEditor());
    expect(got.body).toEqual(study);
  });

  it('shows the library coil as it is now: a spec change changes the inputs hash', async () => {
    const coil = await insertCoil(t.database.db, f.workspaceId, padRx);
    const study = await create(studyBody(txId, coil.id));
    const wider: Coil = { ...padRx, outerDiameter: 0.042 } as Coil;
    const figures = coilFigures(wider, { frequency: 140e3 });
    await t.database.db
      .update(coils)
      .set({
        spec: wider as unknown as Record<string, unknown>,
        selfInductanceH: figures.L,
        dcResistanceOhm: figures.Rdc,
        acResistanceOhm: figures.Rac,
        qualityFactor: figures.Q,
        wireLengthM: figures.wireLength,
        version: 2,
      })
      .where(eq(coils.id, coil.id));
    const got = await request(t.app)
      .get(url(`/${study.id}`))
      .set('Authorization', asEditor());
    expect(got.body.rxCoil).toMatchObject({ version: 2, spec: wider });
    expect(got.body.rxCoil.figures.L).toBe(figures.L);
    // A larger winding area gives more inductance (common practice, no source).
    expect(figures.L).toBeGreaterThan(study.rxCoil.figures.L);
    expect(got.body.inputsHash).not.toBe(study.inputsHash);
    expect(got.body.version).toBe(1);
  });
});

describe('listing and deleting', () => {
  it('lists the most recently saved first with revision counts and the last run', async () => {
    const older = await create();
    const newer = await create();
    const run = await insertSweepRun(t.database.db, {
      studyId: older.id,
      kind: 'gap',
      inputs: {} as never,
      inputsHash: older.inputsHash,
      grid: { z: { from: 0.002, to: 0.01, steps: 5 } },
      status: 'running',
      queuedAt: new Date(Date.now() + 60_000),
    });
    await insertSweepRun(t.database.db, {
      studyId: older.id,
      kind: 'xy-map',
      inputs: {} as never,
      inputsHash: older.inputsHash,
      grid: { z: 0.004 },
      status: 'succeeded',
    });
    const res = await request(t.app).get(url()).set('Authorization', bearer(f.members.viewer));
    expect(res.status).toBe(200);
    const items = res.body.items as { id: string; updatedAt: string }[];
    const ids = items.map((i) => i.id);
    expect(ids.indexOf(newer.id)).toBeLessThan(ids.indexOf(older.id));
    const times = items.map((i) => Date.parse(i.updatedAt));
    expect([...times].sort((a, b) => b - a)).toEqual(times);
    expect(items.find((i) => i.id === older.id)).toEqual({
      id: older.id,
      name: older.name,
      txCoil: { id: txId, name: 'Cradle Tx' },
      rxCoil: { id: rxId, name: 'Phone Rx' },
      frequencyHz: 140e3,
      threshold: { kind: 'k', value: 0.3 },
      revisionCount: 0,
      lastRun: { id: run.id, kind: 'gap', status: 'running', finishedAt: null },
      updatedAt: older.updatedAt,
    });
    expect(items.find((i) => i.id === newer.id)).toMatchObject({ lastRun: null });
  });

  it('lets an editor delete a study without revisions; its runs go with it', async () => {
    const study = await create();
    await insertSweepRun(t.database.db, {
      studyId: study.id,
      kind: 'gap',
      inputs: {} as never,
      inputsHash: study.inputsHash,
      grid: { z: 0.004 },
    });
    const stale = await request(t.app)
      .delete(url(`/${study.id}?version=7`))
      .set('Authorization', asEditor());
    expect(stale.status).toBe(409);
    expect(stale.body).toMatchObject({ code: 'stale_version', currentVersion: 1 });
    const res = await request(t.app)
      .delete(url(`/${study.id}?version=1`))
      .set('Authorization', asEditor());
    expect(res.status).toBe(204);
    const runs = await t.database.db
      .select()
      .from(sweepRuns)
      .where(eq(sweepRuns.studyId, study.id));
    expect(runs).toHaveLength(0);
    const again = await request(t.app)
      .get(url(`/${study.id}`))
      .set('Authorization', asEditor());
    expect(again.status).toBe(404);
    const audit = await t.database.db
      .select()
      .from(auditEvents)
      .where(
        and(eq(auditEvents.workspaceId, f.workspaceId), eq(auditEvents.action, 'study.deleted')),
      );
    expect(audit.map((a) => a.subject)).toContain(study.name);
  });
});
