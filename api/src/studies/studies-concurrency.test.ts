import { eq } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { studies, studyRevisions } from '../../../schema/src/index';
import { bearer, createTestApp, type TestApp } from '../testing/test-app';
import { workspaceWithAllRoles, type WorkspaceFixture } from '../testing/workspace-fixture';
import type { StudyResponse } from './studies-dto';
import { insertCoil, padRx, padTx, studyBody } from './study-fixture';

// Two people saving the same study at once: optimistic versions for the study, a row lock for
// revision numbers. Each test starts its requests together and checks what the database kept.

let t: TestApp;
let f: WorkspaceFixture;
let txId: string;
let rxId: string;

beforeAll(async () => {
  t = await createTestApp();
  f = await workspaceWithAllRoles(t.app, t.database.db, 'study-race');
  txId = (await insertCoil(t.database.db, f.workspaceId, padTx)).id;
  rxId = (await insertCoil(t.database.db, f.workspaceId, padRx)).id;
});
afterAll(async () => {
  await t.close();
});

const url = (suffix = '') => `/api/v1/workspaces/${f.workspaceId}/studies${suffix}`;

async function freshStudy(): Promise<StudyResponse> {
  const res = await request(t.app)
    .post(url())
    .set('Authorization', bearer(f.members.editor))
    .send(studyBody(txId, rxId));
  expect(res.status, res.text).toBe(201);
  return res.body as StudyResponse;
}

describe('concurrent saves', () => {
  it('refuses a stale version, naming who saved last and when', async () => {
    const study = await freshStudy();
    const body = { ...studyBody(txId, rxId, { name: study.name }), version: 1 };
    const first = await request(t.app)
      .put(url(`/${study.id}`))
      .set('Authorization', bearer(f.owner))
      .send({ ...body, notes: 'Owner moved the pocket' });
    expect(first.status).toBe(200);
    const late = await request(t.app)
      .put(url(`/${study.id}`))
      .set('Authorization', bearer(f.members.editor))
      .send({ ...body, notes: 'Editor widened the guide' });
    expect(late.status).toBe(409);
    expect(late.body).toMatchObject({ code: 'stale_version', field: 'version', currentVersion: 2 });
    const savedAt = new Date(first.body.updatedAt as string).toISOString();
    expect(late.body.message).toContain(`by ${f.owner.displayName}`);
    expect(late.body.message).toContain(
      `on ${savedAt.slice(0, 10)} at ${savedAt.slice(11, 16)} UTC`,
    );
    const [row] = await t.database.db.select().from(studies).where(eq(studies.id, study.id));
    expect(row).toMatchObject({ version: 2, notes: 'Owner moved the pocket' });
  });

  it('lets exactly one of two racing saves of the same version win', async () => {
    const study = await freshStudy();
    const body = { ...studyBody(txId, rxId, { name: study.name }), version: 1 };
    const [a, b] = await Promise.all([
      request(t.app)
        .put(url(`/${study.id}`))
        .set('Authorization', bearer(f.owner))
        .send({ ...body, notes: 'A' }),
      request(t.app)
        .put(url(`/${study.id}`))
        .set('Authorization', bearer(f.members.editor))
        .send({ ...body, notes: 'B' }),
    ]);
    const statuses = [a.status, b.status].sort();
    expect(statuses, `${a.text} / ${b.text}`).toEqual([200, 409]);
    const winner = a.status === 200 ? a : b;
    const loser = a.status === 200 ? b : a;
    expect(loser.body).toMatchObject({ code: 'stale_version', currentVersion: 2 });
    const [row] = await t.database.db.select().from(studies).where(eq(studies.id, study.id));
    expect(row).toMatchObject({ version: 2, notes: winner.body.notes });
  });

  it('gives racing revision saves distinct numbers 1 … n', async () => {
    const study = await freshStudy();
    const saves = await Promise.all(
      [1, 2, 3, 4].map((i) =>
        request(t.app)
          .post(url(`/${study.id}/revisions`))
          .set('Authorization', bearer(i % 2 ? f.owner : f.members.editor))
          .send({ summary: `save ${i}`, studyVersion: 1 }),
      ),
    );
    expect(saves.map((s) => s.status)).toEqual([201, 201, 201, 201]);
    expect(saves.map((s) => s.body.number as number).sort()).toEqual([1, 2, 3, 4]);
    const rows = await t.database.db
      .select({ number: studyRevisions.number })
      .from(studyRevisions)
      .where(eq(studyRevisions.studyId, study.id));
    expect(rows.map((r) => r.number).sort()).toEqual([1, 2, 3, 4]);
  });

  it('refuses a revision of the version a racing save just replaced', async () => {
    const study = await freshStudy();
    const [save, revision] = await Promise.all([
      request(t.app)
        .put(url(`/${study.id}`))
        .set('Authorization', bearer(f.owner))
        .send({ ...studyBody(txId, rxId, { name: study.name }), frequencyHz: 150e3, version: 1 }),
      request(t.app)
        .post(url(`/${study.id}/revisions`))
        .set('Authorization', bearer(f.members.editor))
        .send({ summary: 'race', studyVersion: 1 }),
    ]);
    expect(save.status).toBe(200);
    const rows = await t.database.db
      .select()
      .from(studyRevisions)
      .where(eq(studyRevisions.studyId, study.id));
    if (revision.status === 201) {
      // The revision went first: it froze version 1's inputs, never a mix of the two.
      expect(rows).toHaveLength(1);
      expect(revision.body.inputs.frequencyHz).toBe(140e3);
      expect(revision.body.inputsHash).toBe(study.inputsHash);
    } else {
      expect(revision.body).toMatchObject({ status: 409, code: 'stale_version' });
      expect(rows).toHaveLength(0);
    }
  });
});
