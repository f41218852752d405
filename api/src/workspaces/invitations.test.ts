import { eq } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { invitations, outboxMessages } from '../../../schema/src/index';
import { bearer, createTestApp, signUp, uniqueEmail, type TestApp } from '../testing/test-app';
import { workspaceWithAllRoles, type WorkspaceFixture } from '../testing/workspace-fixture';

let t: TestApp;
let f: WorkspaceFixture;
beforeAll(async () => {
  t = await createTestApp();
  f = await workspaceWithAllRoles(t.app, t.database.db, 'inv');
});
afterAll(async () => {
  await t.close();
});

const base = () => `/api/v1/workspaces/${f.workspaceId}/invitations`;

/** Invites an e-mail and returns the invitation id and the token from the queued mail. */
async function invite(email: string, role = 'editor') {
  const res = await request(t.app)
    .post(base())
    .set('Authorization', bearer(f.owner))
    .send({ email, role });
  expect(res.status, res.text).toBe(201);
  const mail = await t.database.db
    .select()
    .from(outboxMessages)
    .where(eq(outboxMessages.idempotencyKey, `invitation:${res.body.id}`));
  expect(mail).toHaveLength(1);
  const match = /\/invitations\/([A-Za-z0-9_-]+)/.exec(mail[0]!.textBody);
  expect(match, mail[0]!.textBody).not.toBeNull();
  return { id: res.body.id as string, token: match![1]!, body: res.body, mail: mail[0]! };
}

describe('invitations', () => {
  it('queues a mail with the link, previews it, and joins the accepting user once', async () => {
    const email = uniqueEmail('invitee');
    const inv = await invite(email, 'reviewer');
    expect(inv.body).toMatchObject({
      email,
      role: 'reviewer',
      invitedBy: { userId: f.owner.id, displayName: f.owner.displayName },
      acceptedAt: null,
      revokedAt: null,
    });
    expect(inv.mail.textBody).toContain(`http://couplet.test/invitations/${inv.token}`);
    expect(inv.mail.subject).toContain(f.name);

    const preview = await request(t.app).get(`/api/v1/invitations/${inv.token}`);
    expect(preview.status).toBe(200);
    expect(preview.body).toMatchObject({
      workspaceName: f.name,
      email,
      role: 'reviewer',
      invitedByName: f.owner.displayName,
      status: 'pending',
    });

    const invitee = await signUp(t.app, 'invitee-account');
    const anon = await request(t.app).post(`/api/v1/invitations/${inv.token}/accept`);
    expect(anon.status).toBe(401);
    const accept = await request(t.app)
      .post(`/api/v1/invitations/${inv.token}/accept`)
      .set('Authorization', bearer(invitee));
    expect(accept.status).toBe(200);
    expect(accept.body.workspace).toMatchObject({ id: f.workspaceId, role: 'reviewer' });
    const [row] = await t.database.db.select().from(invitations).where(eq(invitations.id, inv.id));
    expect(row!.acceptedBy).toBe(invitee.id);

    const someoneElse = await signUp(t.app, 'second-taker');
    const again = await request(t.app)
      .post(`/api/v1/invitations/${inv.token}/accept`)
      .set('Authorization', bearer(someoneElse));
    expect(again.status).toBe(409);
    expect(again.body.code).toBe('conflict');
    const outsider = await request(t.app)
      .get(`/api/v1/workspaces/${f.workspaceId}`)
      .set('Authorization', bearer(someoneElse));
    expect(outsider.status).toBe(404);
    expect((await request(t.app).get(`/api/v1/invitations/${inv.token}`)).body.status).toBe(
      'accepted',
    );
  });

  it('refuses an expired invitation', async () => {
    const inv = await invite(uniqueEmail('late'));
    await t.database.db
      .update(invitations)
      .set({ expiresAt: new Date(Date.now() - 1000) })
      .where(eq(invitations.id, inv.id));
    expect((await request(t.app).get(`/api/v1/invitations/${inv.token}`)).body.status).toBe(
      'expired',
    );
    const user = await signUp(t.app, 'late-account');
    const res = await request(t.app)
      .post(`/api/v1/invitations/${inv.token}/accept`)
      .set('Authorization', bearer(user));
    expect(res.status).toBe(409);
  });

  it('revokes an invitation so it can no longer be accepted', async () => {
    const inv = await invite(uniqueEmail('revoked'));
    const revoke = await request(t.app)
      .delete(`${base()}/${inv.id}`)
      .set('Authorization', bearer(f.owner));
    expect(revoke.status).toBe(204);
    const user = await signUp(t.app, 'revoked-account');
    const res = await request(t.app)
      .post(`/api/v1/invitations/${inv.token}/accept`)
      .set('Authorization', bearer(user));
    expect(res.status).toBe(409);
    const list = await request(t.app).get(base()).set('Authorization', bearer(f.owner));
    const listed = (list.body.items as Array<{ id: string; revokedAt: string | null }>).find(
      (i) => i.id === inv.id,
    );
    expect(listed?.revokedAt).not.toBeNull();
  });

  it('replaces an open invitation for the same e-mail with the new one', async () => {
    const email = uniqueEmail('twice');
    const first = await invite(email, 'viewer');
    await invite(email, 'editor');
    const preview = await request(t.app).get(`/api/v1/invitations/${first.token}`);
    expect(preview.body.status).toBe('revoked');
  });

  it('refuses to invite a member, and rejects smuggled fields', async () => {
    const member = await request(t.app)
      .post(base())
      .set('Authorization', bearer(f.owner))
      .send({ email: f.members.viewer.email.toUpperCase(), role: 'editor' });
    expect(member.status).toBe(409);
    const email = uniqueEmail('smuggle');
    const smuggled = await request(t.app)
      .post(base())
      .set('Authorization', bearer(f.owner))
      .send({ email, role: 'editor', workspaceId: '00000000-0000-4000-8000-000000000000' });
    expect(smuggled.status).toBe(400);
    expect(smuggled.body.field).toBe('workspaceId');
    const rows = await t.database.db.select().from(invitations).where(eq(invitations.email, email));
    expect(rows).toHaveLength(0);
  });

  it('answers an unknown token with 404', async () => {
    const res = await request(t.app).get('/api/v1/invitations/no-such-token');
    expect(res.status).toBe(404);
  });

  it('audits sent, accepted and revoked invitations', async () => {
    const accepted = await invite(uniqueEmail('audit-a'));
    const user = await signUp(t.app, 'audit-acceptor');
    await request(t.app)
      .post(`/api/v1/invitations/${accepted.token}/accept`)
      .set('Authorization', bearer(user));
    const revoked = await invite(uniqueEmail('audit-r'));
    await request(t.app).delete(`${base()}/${revoked.id}`).set('Authorization', bearer(f.owner));
    const res = await request(t.app)
      .get(`/api/v1/workspaces/${f.workspaceId}/audit`)
      .set('Authorization', bearer(f.owner));
    const events = res.body.items as Array<{ action: string; details: { invitationId?: string } }>;
    const about = (id: string) =>
      events.filter((e) => e.details.invitationId === id).map((e) => e.action);
    expect(about(accepted.id).sort()).toEqual(['invitation.accepted', 'invitation.sent']);
    expect(about(revoked.id).sort()).toEqual(['invitation.revoked', 'invitation.sent']);
  });
});
