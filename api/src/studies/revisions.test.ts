import { randomUUID } from 'node:crypto';
import { and, eq, sql } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { coilFigures, ENGINE_VERSION, type Coil } from '../../../physics/src/index';
import { auditEvents, coils, studyRevisions, sweepRuns, users } from '../../../schema/src/index';
import { bearer, createTestApp, signUp, type TestApp } from '../testing/test-app';
import {
  addMember,
  workspaceWithAllRoles,
  type WorkspaceFixture,
} from '../testing/workspace-fixture';
import type { RevisionResponse, StudyResponse } from './studies-dto';
import {
  gapSweepResult,
  insertCoil,
  insertSweepRun,
  padRx,
  padTx,
  studyBody,
} from './study-fixture';
import type { StudyComputeInputs } from './study-inputs-hash';

let t: TestApp;
let f: WorkspaceFixture;

beforeAll(async () => {
  t = await createTestApp();
  f = await workspaceWithAllRoles(t.app, t.database.db, 'revisions');
});
afterAll(async () => {
  await t.close();
});

const studies = () => `/api/v1/workspaces/${f.workspaceId}/studies`;
const asEditor = () => bearer(f.members.editor);

/** A fresh study with its own two coils, so that editing a coil touches this study only. */
async function freshStudy(): Promise<StudyResponse> {
  const tx = await insertCoil(t.database.db, f.workspaceId, padTx);
  const rx = await insertCoil(t.database.db, f.workspaceId, padRx);
  const res = await request(t.app)
    .post(studies())
    .set('Authorization', asEditor())
    .send(studyBody(tx.id, rx.id));
  expect(res.status, res.text).toBe(201);
  return res.body as StudyResponse;
}

function computeInputs(study: StudyResponse): StudyComputeInputs {
  return {
    frequencyHz: study.frequencyHz,
    txCurrentA: study.txCurrentA,
    threshold: study.threshold,
    compensation: study.compensation,
    nominalPose: study.nominalPose,
    tx: study.txCoil.spec,
    rx: study.rxCoil.spec,
  };
}

async function saveRevision(study: { id: string; version: number }, summary = 'For review') {
  return request(t.app)
    .post(`${studies()}/${study.id}/revisions`)
    .set('Authorization', asEditor())
    .send({ summary, studyVersion: study.version });
}

const gapGrid = { z: { from: 0.002, to: 0.008, steps: 4 } };

describe('saving a revision', () => {
  it('freezes inputs, coils, engine version and the newest matching run of each kind', async () => {
    const study = await freshStudy();
    const inputs = computeInputs(study);
    const result = await gapSweepResult(inputs, gapGrid);
    const db = t.database.db;
    const base = Date.now() - 3_600_000;
    const at = (minutes: number) => new Date(base + minutes * 60_000);
    const run = (kind: 'gap' | 'tilt', more: Partial<Parameters<typeof insertSweepRun>[1]>) =>
      insertSweepRun(db, {
        studyId: study.id,
        kind,
        inputs,
        inputsHash: study.inputsHash,
        grid: gapGrid,
        result,
        requestedBy: f.members.editor.id,
        ...more,
      });
    const olderGap = await run('gap', { queuedAt: at(0) });
    const newestGap = await run('gap', { queuedAt: at(10) });
    const tilt = await run('tilt', { queuedAt: at(5) });
    // None of these may be frozen: other inputs, not finished, failed, or an older engine.
    const otherHash = await run('gap', { queuedAt: at(20), inputsHash: 'f'.repeat(64) });
    const running = await run('gap', { queuedAt: at(30), status: 'running', result: null });
    const failed = await run('tilt', { queuedAt: at(30), status: 'failed', result: null });
    const oldEngine = await run('tilt', { queuedAt: at(40), engineVersion: '0.9.0' });

    const res = await saveRevision(study, 'Baseline for the design review');
    expect(res.status, res.text).toBe(201);
    const rev = res.body as RevisionResponse;
    expect(rev).toMatchObject({
      number: 1,
      summary: 'Baseline for the design review',
      engineVersion: ENGINE_VERSION,
      inputsHash: study.inputsHash,
      resultKinds: ['gap', 'tilt'],
      createdBy: { userId: f.members.editor.id, displayName: f.members.editor.displayName },
      inputs: {
        name: study.name,
        frequencyHz: study.frequencyHz,
        txCurrentA: study.txCurrentA,
        threshold: study.threshold,
        compensation: study.compensation,
        notes: study.notes,
        nominalPose: study.nominalPose,
      },
      coilSnapshots: { tx: study.txCoil, rx: study.rxCoil },
    });
    expect(rev.results.runs.map((r) => r.id)).toEqual([newestGap.id, tilt.id]);
    const frozen = rev.results.runs[0]!;
    expect(frozen).toMatchObject({
      kind: 'gap',
      status: 'succeeded',
      inputsHash: study.inputsHash,
      current: true,
      engineVersion: ENGINE_VERSION,
      requestedBy: { userId: f.members.editor.id },
    });
    expect(frozen.result).toEqual(result);

    const links = await db
      .select({ id: sweepRuns.id, revisionId: sweepRuns.revisionId })
      .from(sweepRuns)
      .where(eq(sweepRuns.studyId, study.id));
    const linked = links.filter((l) => l.revisionId === rev.id).map((l) => l.id);
    expect(linked.sort()).toEqual([newestGap.id, tilt.id].sort());
    for (const r of [olderGap, otherHash, running, failed, oldEngine]) {
      expect(links.find((l) => l.id === r.id)?.revisionId).toBeNull();
    }
    const audit = await db
      .select()
      .from(auditEvents)
      .where(
        and(eq(auditEvents.workspaceId, f.workspaceId), eq(auditEvents.action, 'revision.created')),
      );
    expect(audit.some((a) => (a.details as { revisionId?: string }).revisionId === rev.id)).toBe(
      true,
    );

    const latest = await request(t.app)
      .get(`${studies()}/${study.id}`)
      .set('Authorization', asEditor());
    expect(latest.body.latestRevision).toEqual({ id: rev.id, number: 1, createdAt: rev.createdAt });
  });

  it('numbers revisions 1, 2, 3 and lists them newest first without result bodies', async () => {
    const study = await freshStudy();
    await insertSweepRun(t.database.db, {
      studyId: study.id,
      kind: 'gap',
      inputs: computeInputs(study),
      inputsHash: study.inputsHash,
      grid: gapGrid,
      result: await gapSweepResult(computeInputs(study), gapGrid),
    });
    const numbers: number[] = [];
    for (const summary of ['first', 'second', 'third']) {
      const res = await saveRevision(study, summary);
      expect(res.status).toBe(201);
      numbers.push(res.body.number as number);
    }
    expect(numbers).toEqual([1, 2, 3]);
    const list = await request(t.app)
      .get(`${studies()}/${study.id}/revisions`)
      .set('Authorization', bearer(f.members.viewer));
    expect(list.status).toBe(200);
    expect(list.body.items.map((i: { number: number }) => i.number)).toEqual([3, 2, 1]);
    expect(list.body.items[0]).toEqual({
      id: expect.any(String),
      number: 3,
      summary: 'third',
      engineVersion: ENGINE_VERSION,
      inputsHash: study.inputsHash,
      resultKinds: ['gap'],
      createdBy: { userId: f.members.editor.id, displayName: f.members.editor.displayName },
      createdAt: expect.any(String),
    });
    expect(list.text).not.toContain('"etaMax"');
  });

  it('saves a revision without results when no run matches (the inputs alone)', async () => {
    const study = await freshStudy();
    const res = await saveRevision(study);
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ resultKinds: [], results: { runs: [] } });
  });

  it('refuses a stale study version and writes nothing', async () => {
    const study = await freshStudy();
    const saved = await request(t.app)
      .put(`${studies()}/${study.id}`)
      .set('Authorization', bearer(f.owner))
      .send({ ...studyBody(study.txCoil.id, study.rxCoil.id), version: 1 });
    expect(saved.status).toBe(200);
    const res = await saveRevision({ id: study.id, version: 1 });
    expect(res.status).toBe(409);
    expect(res.body).toMatchObject({ code: 'stale_version', currentVersion: 2, field: 'version' });
    expect(res.body.message).toContain(f.owner.displayName);
    const rows = await t.database.db
      .select()
      .from(studyRevisions)
      .where(eq(studyRevisions.studyId, study.id));
    expect(rows).toHaveLength(0);
  });

  it('refuses unknown fields and a missing studyVersion, naming them', async () => {
    const study = await freshStudy();
    const url = `${studies()}/${study.id}/revisions`;
    const extra = await request(t.app)
      .post(url)
      .set('Authorization', asEditor())
      .send({ summary: 'x', studyVersion: 1, number: 7 });
    expect(extra.body).toMatchObject({ status: 400, field: 'number' });
    const missing = await request(t.app).post(url).set('Authorization', asEditor()).send({});
    expect(missing.body).toMatchObject({ status: 400, field: 'studyVersion' });
  });
});

describe('a revision is immutable', () => {
  it('keeps its spec, figures and results after the coil, study and runs change', async () => {
    const study = await freshStudy();
    const inputs = computeInputs(study);
    const result = await gapSweepResult(inputs, gapGrid);
    await insertSweepRun(t.database.db, {
      studyId: study.id,
      kind: 'gap',
      inputs,
      inputsHash: study.inputsHash,
      grid: gapGrid,
      result,
    });
    const created = (await saveRevision(study)).body as RevisionResponse;

    // The library coil is edited: a wider Rx with its figures recomputed.
    const wider = { ...padRx, outerDiameter: 0.044 } as Coil;
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
      .where(eq(coils.id, study.rxCoil.id));
    // The study is saved with another frequency, and a new run computed from the new inputs.
    const saved = await request(t.app)
      .put(`${studies()}/${study.id}`)
      .set('Authorization', asEditor())
      .send({
        ...studyBody(study.txCoil.id, study.rxCoil.id, { name: study.name }),
        frequencyHz: 150e3,
        version: 1,
      });
    expect(saved.status).toBe(200);
    const now = saved.body as StudyResponse;
    expect(now.inputsHash).not.toBe(study.inputsHash);
    expect(now.rxCoil.spec).toEqual(wider);
    const newInputs = computeInputs(now);
    await insertSweepRun(t.database.db, {
      studyId: study.id,
      kind: 'gap',
      inputs: newInputs,
      inputsHash: now.inputsHash,
      grid: gapGrid,
      result: await gapSweepResult(newInputs, gapGrid),
    });

    const got = await request(t.app)
      .get(`${studies()}/${study.id}/revisions/${created.id}`)
      .set('Authorization', bearer(f.members.reviewer));
    expect(got.status).toBe(200);
    expect(got.body).toEqual(created);
    expect(got.body.coilSnapshots.rx.spec).toEqual(padRx);
    expect(got.body.coilSnapshots.rx.figures.L).toBe(study.rxCoil.figures.L);
    expect(got.body.inputs.frequencyHz).toBe(140e3);
    expect(got.body.results.runs[0].result).toEqual(result);

    // A second revision now freezes the new state; the first stays as it was.
    const second = (await saveRevision(now)).body as RevisionResponse;
    expect(second).toMatchObject({ number: 2, inputsHash: now.inputsHash });
    expect(second.coilSnapshots.rx.spec).toEqual(wider);
    expect(second.results.runs[0]!.result!.k).not.toEqual(result.k);
  });

  it('is refused by the database itself on UPDATE', async () => {
    const study = await freshStudy();
    const rev = (await saveRevision(study)).body as RevisionResponse;
    const db = t.database.db;
    await expect(
      db.update(studyRevisions).set({ summary: 'rewritten' }).where(eq(studyRevisions.id, rev.id)),
    ).rejects.toMatchObject({ cause: expect.objectContaining({ code: '23000' }) });
    await expect(
      db.execute(sql`UPDATE study_revisions SET inputs = '{}'::jsonb WHERE id = ${rev.id}`),
    ).rejects.toThrow();
    const [row] = await db.select().from(studyRevisions).where(eq(studyRevisions.id, rev.id));
    expect(row!.summary).toBe('For review');
  });

  it("lets the author's account be deleted: only created_by is cleared", async () => {
    const author = await signUp(t.app, 'rev-author');
    await addMember(t.database.db, f.workspaceId, author, 'editor');
    const study = await freshStudy();
    const res = await request(t.app)
      .post(`${studies()}/${study.id}/revisions`)
      .set('Authorization', bearer(author))
      .send({ summary: 'By a leaver', studyVersion: 1 });
    expect(res.status).toBe(201);
    await t.database.db.delete(users).where(eq(users.id, author.id));
    const got = await request(t.app)
      .get(`${studies()}/${study.id}/revisions/${res.body.id}`)
      .set('Authorization', asEditor());
    expect(got.body).toEqual({ ...res.body, createdBy: null });
  });

  it('gives 404 for a revision of another study', async () => {
    const a = await freshStudy();
    const b = await freshStudy();
    const rev = (await saveRevision(a)).body as RevisionResponse;
    const res = await request(t.app)
      .get(`${studies()}/${b.id}/revisions/${rev.id}`)
      .set('Authorization', asEditor());
    expect(res.status).toBe(404);
    const missing = await request(t.app)
      .get(`${studies()}/${a.id}/revisions/${randomUUID()}`)
      .set('Authorization', asEditor());
    expect(missing.status).toBe(404);
  });
});

describe('deleting a study with revisions', () => {
  it('is refused for an editor with a 409 that says why, and nothing is deleted', async () => {
    const study = await freshStudy();
    await saveRevision(study);
    const res = await request(t.app)
      .delete(`${studies()}/${study.id}`)
      .set('Authorization', asEditor());
    expect(res.status).toBe(409);
    expect(res.body.code).toBe('conflict');
    expect(res.body.message).toMatch(/1 saved revision; only a workspace owner/);
    const rows = await t.database.db
      .select()
      .from(studyRevisions)
      .where(eq(studyRevisions.studyId, study.id));
    expect(rows).toHaveLength(1);
  });

  it('is allowed for an owner; revisions and runs go with the study', async () => {
    const study = await freshStudy();
    await insertSweepRun(t.database.db, {
      studyId: study.id,
      kind: 'gap',
      inputs: computeInputs(study),
      inputsHash: study.inputsHash,
      grid: gapGrid,
      result: await gapSweepResult(computeInputs(study), gapGrid),
    });
    await saveRevision(study);
    const res = await request(t.app)
      .delete(`${studies()}/${study.id}`)
      .set('Authorization', bearer(f.owner));
    expect(res.status).toBe(204);
    const db = t.database.db;
    expect(
      await db.select().from(studyRevisions).where(eq(studyRevisions.studyId, study.id)),
    ).toEqual([]);
    expect(await db.select().from(sweepRuns).where(eq(sweepRuns.studyId, study.id))).toEqual([]);
  });
});
