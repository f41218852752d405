import { randomUUID } from 'node:crypto';
import { and, eq } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { coilFigures } from '../../../physics/src/index';
import { auditEvents, coils, studies } from '../../../schema/src/index';
import { bearer, createTestApp, type TestApp } from '../testing/test-app';
import { workspaceWithAllRoles, type WorkspaceFixture } from '../testing/workspace-fixture';
import {
  coilsUrl,
  createCoil,
  insertStudy,
  librarySnapshot,
  ringRequest,
  spiralRequest,
} from './coil-fixture';
import type { CoilResponse } from './coils-dto';

let t: TestApp;
let f: WorkspaceFixture;
beforeAll(async () => {
  t = await createTestApp();
  f = await workspaceWithAllRoles(t.app, t.database.db, 'coils');
});
afterAll(async () => {
  await t.close();
});

const url = (suffix = '') => coilsUrl(f.workspaceId, suffix);
const as = (user: { accessToken: string }) => ({ Authorization: bearer(user) });

describe('create and read', () => {
  it('creates a coil with its figures, the creator and version 1, and reads it back', async () => {
    const body = spiralRequest();
    const res = await request(t.app).post(url()).set(as(f.members.editor)).send(body);
    expect(res.status).toBe(201);
    const coil = res.body as CoilResponse;
    expect(coil).toMatchObject({
      workspaceId: f.workspaceId,
      name: body.name,
      kind: 'circular-spiral',
      spec: body.spec,
      operatingFrequencyHz: 140e3,
      ratedCurrentA: 1.5,
      version: 1,
      usedBy: [],
      createdBy: { userId: f.members.editor.id, displayName: f.members.editor.displayName },
      updatedBy: { userId: f.members.editor.id },
    });
    const got = await request(t.app)
      .get(url(`/${coil.id}`))
      .set(as(f.members.viewer));
    expect(got.status).toBe(200);
    expect(got.body).toEqual(coil);
    // The cached columns the tables sort by hold the same figures.
    const [row] = await t.database.db.select().from(coils).where(eq(coils.id, coil.id));
    expect(row).toMatchObject({
      selfInductanceH: coil.figures.L,
      dcResistanceOhm: coil.figures.Rdc,
      acResistanceOhm: coil.figures.Rac,
      qualityFactor: coil.figures.Q,
      wireLengthM: coil.figures.wireLength,
    });
  });

  it('defaults description, frequency and current, giving DC-only figures per A²', async () => {
    const name = `Bare ${randomUUID().slice(0, 6)}`;
    const res = await request(t.app)
      .post(url())
      .set(as(f.owner))
      .send({ name, spec: ringRequest().spec });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ description: '', operatingFrequencyHz: null });
    expect(res.body.figures).toMatchObject({ Rac: null, Q: null, skinDepth: null });
    expect(res.body.figures).toEqual(coilFigures(ringRequest().spec as never, { current: 1 }));
  });

  it('trims the name and refuses a second coil of the same name with a 409 on name', async () => {
    const name = `Twin ${randomUUID().slice(0, 6)}`;
    await createCoil(t.app, f.workspaceId, f.owner, spiralRequest(name));
    const before = await librarySnapshot(t.database.db, f.workspaceId);
    const res = await request(t.app)
      .post(url())
      .set(as(f.members.editor))
      .send(spiralRequest(`  ${name} `));
    expect(res.status).toBe(409);
    expect(res.body).toMatchObject({ code: 'conflict', field: 'name' });
    expect(res.body.message).toContain(name);
    expect(await librarySnapshot(t.database.db, f.workspaceId)).toEqual(before);
  });

  it('allows the same name in another workspace', async () => {
    const other = await workspaceWithAllRoles(t.app, t.database.db, 'coils-other');
    const name = `Shared ${randomUUID().slice(0, 6)}`;
    await createCoil(t.app, f.workspaceId, f.owner, spiralRequest(name));
    const res = await request(t.app)
      .post(coilsUrl(other.workspaceId))
      .set(as(other.owner))
      .send(spiralRequest(name));
    expect(res.status).toBe(201);
  });

  it('answers 404 for a coil of another workspace and for an unknown id', async () => {
    const other = await workspaceWithAllRoles(t.app, t.database.db, 'coils-foreign');
    const foreign = await createCoil(t.app, other.workspaceId, other.owner);
    for (const id of [foreign.id, randomUUID()]) {
      const res = await request(t.app)
        .get(url(`/${id}`))
        .set(as(f.owner));
      expect(res.status).toBe(404);
      expect(res.text).not.toContain(foreign.name);
    }
    const malformed = await request(t.app).get(url('/not-a-uuid')).set(as(f.owner));
    expect(malformed.status).toBe(400);
    expect(malformed.body.field).toBe('coilId');
  });
});

describe('list', () => {
  it('lists newest change first, filters by kind and by text, and escapes wildcards', async () => {
    const ws = await workspaceWithAllRoles(t.app, t.database.db, 'coils-list');
    const a = await createCoil(t.app, ws.workspaceId, ws.owner, spiralRequest('Alpha 100%'));
    const b = await createCoil(t.app, ws.workspaceId, ws.owner, ringRequest('Beta ring'));
    const c = await createCoil(t.app, ws.workspaceId, ws.owner, {
      ...spiralRequest('Gamma'),
      description: 'candidate for the cradle base',
    });
    // Saving the oldest makes it the newest change.
    const saved = await request(t.app)
      .put(coilsUrl(ws.workspaceId, `/${a.id}`))
      .set(as(ws.owner))
      .send({ ...spiralRequest('Alpha 100%'), version: 1 });
    expect(saved.status).toBe(200);
    const list = async (query: Record<string, string> = {}) => {
      const res = await request(t.app)
        .get(coilsUrl(ws.workspaceId))
        .query(query)
        .set(as(ws.members.viewer));
      expect(res.status).toBe(200);
      return (res.body.items as CoilResponse[]).map((i) => i.name);
    };
    expect(await list()).toEqual([a.name, c.name, b.name]);
    expect(await list({ kind: 'ring' })).toEqual([b.name]);
    expect(await list({ q: 'CRADLE' })).toEqual([c.name]);
    expect(await list({ q: '100%' })).toEqual([a.name]);
    expect(await list({ q: '%' })).toEqual([a.name]);
    expect(await list({ q: 'nothing like it' })).toEqual([]);
    const bad = await request(t.app)
      .get(coilsUrl(ws.workspaceId))
      .query({ kind: 'toroid' })
      .set(as(ws.owner));
    expect(bad.status).toBe(400);
    expect(bad.body.field).toBe('kind');
  });
});

describe('update', () => {
  it('replaces the coil, recomputes the figures, bumps the version and records the saver', async () => {
    const coil = await createCoil(t.app, f.workspaceId, f.owner);
    const changed = { ...spiralRequest(coil.name), version: 1 };
    changed.spec = { ...changed.spec, turns: 14 } as typeof changed.spec;
    changed.operatingFrequencyHz = 200e3;
    const res = await request(t.app)
      .put(url(`/${coil.id}`))
      .set(as(f.members.editor))
      .send(changed);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({
      version: 2,
      spec: { turns: 14 },
      operatingFrequencyHz: 200e3,
      createdBy: { userId: f.owner.id },
      updatedBy: { userId: f.members.editor.id },
    });
    expect(res.body.figures.L).toBeGreaterThan(coil.figures.L);
    expect(Date.parse(res.body.updatedAt)).toBeGreaterThanOrEqual(Date.parse(coil.updatedAt));
  });

  it('changes the kind with the spec, and refuses a rename onto another coil', async () => {
    const coil = await createCoil(t.app, f.workspaceId, f.owner);
    const other = await createCoil(t.app, f.workspaceId, f.owner);
    const ring = await request(t.app)
      .put(url(`/${coil.id}`))
      .set(as(f.owner))
      .send({ ...ringRequest(coil.name), version: 1 });
    expect(ring.status).toBe(200);
    expect(ring.body.kind).toBe('ring');
    const before = await librarySnapshot(t.database.db, f.workspaceId);
    const clash = await request(t.app)
      .put(url(`/${coil.id}`))
      .set(as(f.owner))
      .send({ ...ringRequest(other.name), version: 2 });
    expect(clash.status).toBe(409);
    expect(clash.body).toMatchObject({ code: 'conflict', field: 'name' });
    expect(await librarySnapshot(t.database.db, f.workspaceId)).toEqual(before);
  });

  it('answers 404 for an unknown coil', async () => {
    const res = await request(t.app)
      .put(url(`/${randomUUID()}`))
      .set(as(f.owner))
      .send({ ...spiralRequest(), version: 1 });
    expect(res.status).toBe(404);
  });
});

describe('duplicate', () => {
  it('names copies "(copy)", "(copy 2)", "(copy 3)" and takes a chosen name', async () => {
    const source = await createCoil(t.app, f.workspaceId, f.owner);
    const dup = (body?: object) => {
      const req = request(t.app)
        .post(url(`/${source.id}/duplicate`))
        .set(as(f.members.editor));
      return body ? req.send(body) : req;
    };
    const first = await dup();
    expect(first.status).toBe(201);
    expect(first.body).toMatchObject({
      name: `${source.name} (copy)`,
      spec: source.spec,
      figures: source.figures,
      version: 1,
      createdBy: { userId: f.members.editor.id },
    });
    expect(first.body.id).not.toBe(source.id);
    expect((await dup({})).body.name).toBe(`${source.name} (copy 2)`);
    expect((await dup()).body.name).toBe(`${source.name} (copy 3)`);
    const chosen = await dup({ name: `${source.name} B` });
    expect(chosen.status).toBe(201);
    expect(chosen.body.name).toBe(`${source.name} B`);
    const clash = await dup({ name: source.name });
    expect(clash.status).toBe(409);
    expect(clash.body.field).toBe('name');
  });

  it('shortens a long name so the copy stays within 80 characters', async () => {
    const long = `L${'x'.repeat(74)}${randomUUID().slice(0, 5)}`;
    expect(long).toHaveLength(80);
    const source = await createCoil(t.app, f.workspaceId, f.owner, spiralRequest(long));
    const res = await request(t.app)
      .post(url(`/${source.id}/duplicate`))
      .set(as(f.owner));
    expect(res.status).toBe(201);
    expect(res.body.name).toHaveLength(80);
    expect(res.body.name.endsWith('… (copy)')).toBe(true);
  });

  it('answers 404 for an unknown coil', async () => {
    const res = await request(t.app)
      .post(url(`/${randomUUID()}/duplicate`))
      .set(as(f.owner));
    expect(res.status).toBe(404);
  });
});

describe('delete', () => {
  it('is refused while a study uses the coil, naming the studies, and allowed after', async () => {
    const tx = await createCoil(t.app, f.workspaceId, f.owner);
    const rx = await createCoil(t.app, f.workspaceId, f.owner, ringRequest());
    const s1 = await insertStudy(t.database.db, f.workspaceId, tx.id, rx.id, 'A baseline');
    const s2 = await insertStudy(t.database.db, f.workspaceId, rx.id, rx.id, 'B rx as both');
    const got = await request(t.app)
      .get(url(`/${rx.id}`))
      .set(as(f.members.viewer));
    expect(got.body.usedBy).toEqual([s1, s2]);

    const before = await librarySnapshot(t.database.db, f.workspaceId);
    const refused = await request(t.app)
      .delete(url(`/${rx.id}`))
      .set(as(f.members.editor));
    expect(refused.status).toBe(409);
    expect(refused.body).toMatchObject({ code: 'in_use', usedBy: [s1, s2] });
    expect(refused.body.message).toContain('"A baseline"');
    expect(refused.body.message).toContain('"B rx as both"');
    expect(await librarySnapshot(t.database.db, f.workspaceId)).toEqual(before);

    await t.database.db.delete(studies).where(eq(studies.id, s2.id));
    await t.database.db.update(studies).set({ rxCoilId: tx.id }).where(eq(studies.id, s1.id));
    const ok = await request(t.app)
      .delete(url(`/${rx.id}`))
      .set(as(f.members.editor));
    expect(ok.status).toBe(204);
    expect(
      (
        await request(t.app)
          .get(url(`/${rx.id}`))
          .set(as(f.owner))
      ).status,
    ).toBe(404);
    const again = await request(t.app)
      .delete(url(`/${rx.id}`))
      .set(as(f.owner));
    expect(again.status).toBe(404);
    // The Tx is still held by the remaining study.
    const held = await request(t.app)
      .delete(url(`/${tx.id}`))
      .set(as(f.owner));
    expect(held.body).toMatchObject({ code: 'in_use', usedBy: [s1] });
  });

  it('falls back on the foreign key when the check cannot see the study', async () => {
    // A study row of another workspace pointing at this coil: outside the in-workspace check,
    // so only the restrict foreign key stops the delete (SQLSTATE 23503 → in_use).
    const coil = await createCoil(t.app, f.workspaceId, f.owner);
    const other = await workspaceWithAllRoles(t.app, t.database.db, 'coils-fk');
    await insertStudy(t.database.db, other.workspaceId, coil.id, coil.id, 'Hidden study');
    const before = await librarySnapshot(t.database.db, f.workspaceId);
    const res = await request(t.app)
      .delete(url(`/${coil.id}`))
      .set(as(f.owner));
    expect(res.status).toBe(409);
    expect(res.body).toMatchObject({ code: 'in_use', usedBy: [] });
    expect(res.body.message).toBe(
      `"${coil.name}" is used by a study; choose another Tx or Rx there, or delete the study, first`,
    );
    expect(res.text).not.toContain('Hidden study');
    expect(await librarySnapshot(t.database.db, f.workspaceId)).toEqual(before);
  });

  it('checks ?version when given: a stale one is refused, the current one deletes', async () => {
    const coil = await createCoil(t.app, f.workspaceId, f.owner);
    await request(t.app)
      .put(url(`/${coil.id}`))
      .set(as(f.members.editor))
      .send({ ...spiralRequest(coil.name), version: 1 });
    const stale = await request(t.app)
      .delete(url(`/${coil.id}?version=1`))
      .set(as(f.owner));
    expect(stale.status).toBe(409);
    expect(stale.body).toMatchObject({ code: 'stale_version', currentVersion: 2 });
    expect(stale.body.message).toContain(f.members.editor.displayName);
    const bad = await request(t.app)
      .delete(url(`/${coil.id}?version=two`))
      .set(as(f.owner));
    expect(bad.status).toBe(400);
    expect(bad.body.field).toBe('version');
    const ok = await request(t.app)
      .delete(url(`/${coil.id}?version=2`))
      .set(as(f.owner));
    expect(ok.status).toBe(204);
  });
});

describe('audit', () => {
  it('records created, updated, duplicated and deleted with the actor', async () => {
    const coil = await createCoil(t.app, f.workspaceId, f.members.editor);
    await request(t.app)
      .put(url(`/${coil.id}`))
      .set(as(f.members.editor))
      .send({ ...spiralRequest(coil.name), version: 1 });
    const copy = await request(t.app)
      .post(url(`/${coil.id}/duplicate`))
      .set(as(f.owner));
    await request(t.app)
      .delete(url(`/${copy.body.id}`))
      .set(as(f.owner));
    const rows = await t.database.db
      .select({
        action: auditEvents.action,
        actor: auditEvents.actorId,
        details: auditEvents.details,
      })
      .from(auditEvents)
      .where(and(eq(auditEvents.workspaceId, f.workspaceId)));
    const mine = rows.filter((r) =>
      [coil.id, copy.body.id].includes((r.details as { coilId?: string }).coilId),
    );
    expect(mine.map((r) => [r.action, r.actor]).sort()).toEqual(
      [
        ['coil.created', f.members.editor.id],
        ['coil.updated', f.members.editor.id],
        ['coil.duplicated', f.owner.id],
        ['coil.deleted', f.owner.id],
      ].sort(),
    );
    const audit = await request(t.app)
      .get(`/api/v1/workspaces/${f.workspaceId}/audit`)
      .set(as(f.owner));
    expect(audit.body.items.map((i: { action: string }) => i.action)).toContain('coil.deleted');
  });
});
