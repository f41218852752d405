import { and, eq } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { auditEvents, workspaces } from '../../../schema/src/index';
import { bearer, createTestApp, signUp, type TestApp } from '../testing/test-app';
import {
  addMember,
  workspaceSnapshot,
  workspaceWithAllRoles,
  type WorkspaceFixture,
} from '../testing/workspace-fixture';

let t: TestApp;
let f: WorkspaceFixture;
beforeAll(async () => {
  t = await createTestApp();
  f = await workspaceWithAllRoles(t.app, t.database.db, 'ws');
});
afterAll(async () => {
  await t.close();
});

const url = (suffix = '') => `/api/v1/workspaces/${f.workspaceId}${suffix}`;

describe('workspaces', () => {
  it('makes the creator owner and lists it with the caller role', async () => {
    const list = await request(t.app)
      .get('/api/v1/workspaces')
      .set('Authorization', bearer(f.owner));
    expect(list.status).toBe(200);
    expect(list.body.items).toEqual([
      expect.objectContaining({ id: f.workspaceId, name: f.name, role: 'owner' }),
    ]);
    const asViewer = await request(t.app).get(url()).set('Authorization', bearer(f.members.viewer));
    expect(asViewer.body).toMatchObject({ id: f.workspaceId, role: 'viewer' });
  });

  it('rejects a workspaceId smuggled into the create body and writes nothing', async () => {
    const user = await signUp(t.app, 'smuggler');
    const res = await request(t.app)
      .post('/api/v1/workspaces')
      .set('Authorization', bearer(user))
      .send({ name: 'Mine', workspaceId: f.workspaceId });
    expect(res.status).toBe(400);
    expect(res.body).toMatchObject({ code: 'validation_failed', field: 'workspaceId' });
    const rows = await t.database.db
      .select()
      .from(workspaces)
      .where(eq(workspaces.createdBy, user.id));
    expect(rows).toHaveLength(0);
  });

  it('lets the owner rename it and records who did', async () => {
    const res = await request(t.app)
      .patch(url())
      .set('Authorization', bearer(f.owner))
      .send({ name: `${f.name} (renamed)` });
    expect(res.status).toBe(200);
    expect(res.body.name).toBe(`${f.name} (renamed)`);
    f.name = res.body.name;
  });

  it('lists members with their roles', async () => {
    const res = await request(t.app)
      .get(url('/members'))
      .set('Authorization', bearer(f.members.reviewer));
    expect(res.status).toBe(200);
    const roles = Object.fromEntries(
      (res.body.items as Array<{ email: string; role: string }>).map((m) => [m.email, m.role]),
    );
    expect(roles).toEqual({
      [f.owner.email]: 'owner',
      [f.members.editor.email]: 'editor',
      [f.members.reviewer.email]: 'reviewer',
      [f.members.viewer.email]: 'viewer',
    });
  });
});

describe('roles', () => {
  it('refuses an editor promoting itself, and changes nothing', async () => {
    const before = await workspaceSnapshot(t.database.db, f.workspaceId);
    const res = await request(t.app)
      .patch(url(`/members/${f.members.editor.id}`))
      .set('Authorization', bearer(f.members.editor))
      .send({ role: 'owner' });
    expect(res.status).toBe(403);
    expect(res.body.code).toBe('forbidden');
    expect(await workspaceSnapshot(t.database.db, f.workspaceId)).toEqual(before);
  });

  it('refuses to demote the last owner, and changes nothing', async () => {
    const before = await workspaceSnapshot(t.database.db, f.workspaceId);
    const res = await request(t.app)
      .patch(url(`/members/${f.owner.id}`))
      .set('Authorization', bearer(f.owner))
      .send({ role: 'editor' });
    expect(res.status).toBe(409);
    expect(res.body.code).toBe('last_owner');
    const leave = await request(t.app)
      .delete(url(`/members/${f.owner.id}`))
      .set('Authorization', bearer(f.owner));
    expect(leave.status).toBe(409);
    expect(leave.body.code).toBe('last_owner');
    expect(await workspaceSnapshot(t.database.db, f.workspaceId)).toEqual(before);
  });

  it('rejects an unknown role and a role sent with extra fields', async () => {
    const bad = await request(t.app)
      .patch(url(`/members/${f.members.viewer.id}`))
      .set('Authorization', bearer(f.owner))
      .send({ role: 'admin' });
    expect(bad.status).toBe(400);
    expect(bad.body.field).toBe('role');
    const extra = await request(t.app)
      .patch(url(`/members/${f.members.viewer.id}`))
      .set('Authorization', bearer(f.owner))
      .send({ role: 'editor', userId: f.owner.id });
    expect(extra.status).toBe(400);
    expect(extra.body.field).toBe('userId');
  });

  it('lets the owner promote a second owner, who may then demote the first', async () => {
    const ws = await workspaceWithAllRoles(t.app, t.database.db, 'handover');
    const promote = await request(t.app)
      .patch(`/api/v1/workspaces/${ws.workspaceId}/members/${ws.members.editor.id}`)
      .set('Authorization', bearer(ws.owner))
      .send({ role: 'owner' });
    expect(promote.status).toBe(200);
    expect(promote.body).toMatchObject({ userId: ws.members.editor.id, role: 'owner' });
    const demote = await request(t.app)
      .patch(`/api/v1/workspaces/${ws.workspaceId}/members/${ws.owner.id}`)
      .set('Authorization', bearer(ws.members.editor))
      .send({ role: 'viewer' });
    expect(demote.status).toBe(200);
    // The old owner is a viewer now: the role is read from the database on this very request.
    const tryAgain = await request(t.app)
      .patch(`/api/v1/workspaces/${ws.workspaceId}/members/${ws.members.editor.id}`)
      .set('Authorization', bearer(ws.owner))
      .send({ role: 'viewer' });
    expect(tryAgain.status).toBe(403);
  });

  it('never leaves a workspace ownerless when two owners demote each other at once', async () => {
    const ws = await workspaceWithAllRoles(t.app, t.database.db, 'race');
    const second = await signUp(t.app, 'race-second-owner');
    await addMember(t.database.db, ws.workspaceId, second, 'owner');
    const base = `/api/v1/workspaces/${ws.workspaceId}/members`;
    const results = await Promise.all([
      request(t.app)
        .patch(`${base}/${second.id}`)
        .set('Authorization', bearer(ws.owner))
        .send({ role: 'viewer' }),
      request(t.app)
        .patch(`${base}/${ws.owner.id}`)
        .set('Authorization', bearer(second))
        .send({ role: 'viewer' }),
    ]);
    const snap = await workspaceSnapshot(t.database.db, ws.workspaceId);
    expect(snap.memberships.filter((m) => m.role === 'owner').length).toBeGreaterThanOrEqual(1);
    expect(results.map((r) => r.status).sort()).toEqual([200, 403]);
  });
});

describe('removing members', () => {
  it('lets an owner remove a member and a member leave; others get 403', async () => {
    const ws = await workspaceWithAllRoles(t.app, t.database.db, 'remove');
    const base = `/api/v1/workspaces/${ws.workspaceId}/members`;
    const byEditor = await request(t.app)
      .delete(`${base}/${ws.members.viewer.id}`)
      .set('Authorization', bearer(ws.members.editor));
    expect(byEditor.status).toBe(403);
    const leave = await request(t.app)
      .delete(`${base}/${ws.members.reviewer.id}`)
      .set('Authorization', bearer(ws.members.reviewer));
    expect(leave.status).toBe(204);
    const remove = await request(t.app)
      .delete(`${base}/${ws.members.viewer.id}`)
      .set('Authorization', bearer(ws.owner));
    expect(remove.status).toBe(204);
    const gone = await request(t.app)
      .get(`/api/v1/workspaces/${ws.workspaceId}`)
      .set('Authorization', bearer(ws.members.viewer));
    expect(gone.status).toBe(404);
    const again = await request(t.app)
      .delete(`${base}/${ws.members.viewer.id}`)
      .set('Authorization', bearer(ws.owner));
    expect(again.status).toBe(404);
  });
});

describe('audit', () => {
  it('records creation, renaming, role changes and removals with their actor', async () => {
    const ws = await workspaceWithAllRoles(t.app, t.database.db, 'audit');
    const base = `/api/v1/workspaces/${ws.workspaceId}`;
    await request(t.app)
      .patch(`${base}/members/${ws.members.viewer.id}`)
      .set('Authorization', bearer(ws.owner))
      .send({ role: 'reviewer' });
    await request(t.app)
      .delete(`${base}/members/${ws.members.editor.id}`)
      .set('Authorization', bearer(ws.owner));
    const res = await request(t.app).get(`${base}/audit`).set('Authorization', bearer(ws.owner));
    expect(res.status).toBe(200);
    const actions = (res.body.items as Array<{ action: string }>).map((e) => e.action);
    expect(actions).toEqual(['member.removed', 'member.role_changed', 'workspace.created']);
    expect(res.body.items[1]).toMatchObject({
      actor: { userId: ws.owner.id, displayName: ws.owner.displayName },
      subject: ws.members.viewer.email,
      details: { from: 'viewer', to: 'reviewer' },
    });
    const rows = await t.database.db
      .select()
      .from(auditEvents)
      .where(and(eq(auditEvents.workspaceId, ws.workspaceId)));
    expect(rows).toHaveLength(3);
  });
});
