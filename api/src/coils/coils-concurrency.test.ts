import { eq } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { auditEvents, coils, users } from '../../../schema/src/index';
import { bearer, createTestApp, type TestApp } from '../testing/test-app';
import { workspaceWithAllRoles, type WorkspaceFixture } from '../testing/workspace-fixture';
import { coilsUrl, createCoil, spiralRequest } from './coil-fixture';
import * as repo from './coils-repository';

// Optimistic concurrency: a save names the version it was made from, and the check and the write
// are one UPDATE … WHERE version = …, so of two saves from the same version exactly one wins.

let t: TestApp;
let f: WorkspaceFixture;
beforeAll(async () => {
  t = await createTestApp();
  f = await workspaceWithAllRoles(t.app, t.database.db, 'coil-race');
  // The name the message must show, as in the brief's example.
  await t.database.db
    .update(users)
    .set({ displayName: 'Oskar Brandt' })
    .where(eq(users.id, f.members.editor.id));
});
afterAll(async () => {
  await t.close();
});

const put = (id: string, token: { accessToken: string }, body: object) =>
  request(t.app)
    .put(coilsUrl(f.workspaceId, `/${id}`))
    .set('Authorization', bearer(token))
    .send(body);

describe('stale saves', () => {
  it('refuses a save from an older version, naming who saved last, when and the version', async () => {
    const coil = await createCoil(t.app, f.workspaceId, f.owner);
    const first = await put(coil.id, f.members.editor, { ...spiralRequest(coil.name), version: 1 });
    expect(first.status).toBe(200);
    const savedAt = new Date(first.body.updatedAt as string).toISOString().slice(11, 16);

    const stale = await put(coil.id, f.owner, {
      ...spiralRequest(coil.name),
      description: 'my edit from the old version',
      version: 1,
    });
    expect(stale.status).toBe(409);
    expect(stale.body).toMatchObject({
      code: 'stale_version',
      field: 'version',
      currentVersion: 2,
    });
    expect(stale.body.message).toBe(
      `This coil was changed by Oskar Brandt at ${savedAt} UTC (now version 2); ` +
        'reload to see their changes',
    );
    const now = await request(t.app)
      .get(coilsUrl(f.workspaceId, `/${coil.id}`))
      .set('Authorization', bearer(f.owner));
    expect(now.body).toMatchObject({ version: 2, description: 'test spiral' });
  });

  it('refuses a version that was never stored', async () => {
    const coil = await createCoil(t.app, f.workspaceId, f.owner);
    const res = await put(coil.id, f.owner, { ...spiralRequest(coil.name), version: 7 });
    expect(res.status).toBe(409);
    expect(res.body).toMatchObject({ code: 'stale_version', currentVersion: 1 });
    expect(res.body.message).toMatch(/^Version 7 of this coil does not exist/);
  });
});

describe('racing saves', () => {
  it.each([1, 2, 3])('lets exactly one of two simultaneous saves win (round %i)', async () => {
    const coil = await createCoil(t.app, f.workspaceId, f.owner);
    const [a, b] = await Promise.all([
      put(coil.id, f.owner, { ...spiralRequest(coil.name), description: 'by owner', version: 1 }),
      put(coil.id, f.members.editor, {
        ...spiralRequest(coil.name),
        description: 'by editor',
        version: 1,
      }),
    ]);
    expect([a.status, b.status].sort()).toEqual([200, 409]);
    const winner = a.status === 200 ? a : b;
    const loser = a.status === 200 ? b : a;
    expect(loser.body).toMatchObject({ code: 'stale_version', currentVersion: 2 });
    const stored = await request(t.app)
      .get(coilsUrl(f.workspaceId, `/${coil.id}`))
      .set('Authorization', bearer(f.owner));
    expect(stored.body).toMatchObject({ version: 2, description: winner.body.description });
    // One update recorded, by the winner.
    const updates = (
      await t.database.db
        .select({ action: auditEvents.action, details: auditEvents.details })
        .from(auditEvents)
        .where(eq(auditEvents.workspaceId, f.workspaceId))
    ).filter((e) => e.action === 'coil.updated' && e.details.coilId === coil.id);
    expect(updates).toHaveLength(1);
  });

  it('lets five simultaneous saves from one version produce exactly one new version', async () => {
    const coil = await createCoil(t.app, f.workspaceId, f.owner);
    const results = await Promise.all(
      [0, 1, 2, 3, 4].map((i) =>
        put(coil.id, i % 2 ? f.owner : f.members.editor, {
          ...spiralRequest(coil.name),
          description: `save ${i}`,
          version: 1,
        }),
      ),
    );
    expect(results.filter((r) => r.status === 200)).toHaveLength(1);
    expect(results.filter((r) => r.status === 409)).toHaveLength(4);
  });

  it('lets two simultaneous duplicates both succeed under different copy names', async () => {
    const coil = await createCoil(t.app, f.workspaceId, f.owner);
    const dup = () =>
      request(t.app)
        .post(coilsUrl(f.workspaceId, `/${coil.id}/duplicate`))
        .set('Authorization', bearer(f.owner));
    const [a, b] = await Promise.all([dup(), dup()]);
    expect([a.status, b.status]).toEqual([201, 201]);
    expect([a.body.name, b.body.name].sort()).toEqual([
      `${coil.name} (copy 2)`,
      `${coil.name} (copy)`,
    ]);
  });
});

describe('the guarded UPDATE itself', () => {
  it('makes a second save from the same version wait for the first and then match nothing', async () => {
    const coil = await createCoil(t.app, f.workspaceId, f.owner);
    const db = t.database.db;
    const values = (description: string): repo.CoilValues => ({
      name: coil.name,
      kind: coil.kind,
      description,
      spec: coil.spec as unknown as Record<string, unknown>,
      operatingFrequencyHz: coil.operatingFrequencyHz,
      ratedCurrentA: coil.ratedCurrentA,
      selfInductanceH: coil.figures.L,
      dcResistanceOhm: coil.figures.Rdc,
      acResistanceOhm: coil.figures.Rac,
      qualityFactor: coil.figures.Q,
      wireLengthM: coil.figures.wireLength,
    });
    let release!: () => void;
    const held = new Promise<void>((resolve) => (release = resolve));
    let firstUpdated!: () => void;
    const updated = new Promise<void>((resolve) => (firstUpdated = resolve));
    // The first save updates the row and keeps its transaction open, holding the row lock.
    const first = db.transaction(async (tx) => {
      const row = await repo.updateCoilAtVersion(
        tx,
        f.workspaceId,
        coil.id,
        1,
        f.owner.id,
        values('first'),
      );
      firstUpdated();
      await held;
      return row;
    });
    await updated;
    let secondFinished = false;
    const second = db
      .transaction((tx) =>
        repo.updateCoilAtVersion(tx, f.workspaceId, coil.id, 1, f.owner.id, values('second')),
      )
      .finally(() => (secondFinished = true));
    // 200 ms: ample for an unblocked UPDATE on loopback; the second must still be waiting.
    await new Promise((resolve) => setTimeout(resolve, 200));
    expect(secondFinished).toBe(false);
    release();
    expect((await first)?.version).toBe(2);
    // PostgreSQL re-checks the WHERE clause on the committed row: version is 2 now, no match.
    expect(await second).toBeUndefined();
    const [stored] = await db.select().from(coils).where(eq(coils.id, coil.id));
    expect(stored).toMatchObject({ version: 2, description: 'first' });
  });
});
