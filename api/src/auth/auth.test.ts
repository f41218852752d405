import { and, eq, sql } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { auditEvents, outboxMessages, passwordResets, users } from '../../../schema/src/index';
import {
  createTestApp,
  refreshCookieOf,
  signUp,
  testPassword,
  uniqueEmail,
  type TestApp,
} from '../testing/test-app';
import { hashSecretToken } from './secret-token';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

async function userCount(email: string): Promise<number> {
  const rows = await t.database.db
    .select({ id: users.id })
    .from(users)
    .where(sql`lower(${users.email}) = ${email.toLowerCase()}`);
  return rows.length;
}

/** The token in the newest outbox mail to `email`, read from the link in its text. */
async function tokenFromMail(email: string, pattern: RegExp): Promise<string> {
  const rows = await t.database.db
    .select()
    .from(outboxMessages)
    .where(eq(outboxMessages.toAddress, email));
  expect(rows).toHaveLength(1);
  const match = pattern.exec(rows[0]!.textBody);
  expect(match, rows[0]!.textBody).not.toBeNull();
  return decodeURIComponent(match![1]!);
}

describe('sign-up', () => {
  it('creates the account, a session and an httpOnly strict cookie on the auth path', async () => {
    const email = uniqueEmail('signup');
    const res = await request(t.app)
      .post('/api/v1/auth/sign-up')
      .send({ email, password: testPassword, displayName: 'Ada Field' });
    expect(res.status).toBe(201);
    expect(res.body.user).toMatchObject({ email, displayName: 'Ada Field' });
    expect(Object.keys(res.body.user).sort()).toEqual(['createdAt', 'displayName', 'email', 'id']);
    expect(typeof res.body.accessToken).toBe('string');
    const cookie = (res.headers['set-cookie'] as unknown as string[]).join(';');
    expect(cookie).toMatch(/couplet_refresh=/);
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Strict/);
    expect(cookie).toMatch(/Path=\/api\/v1\/auth/);
    const audit = await t.database.db
      .select()
      .from(auditEvents)
      .where(
        and(eq(auditEvents.actorId, res.body.user.id), eq(auditEvents.action, 'user.signed_up')),
      );
    expect(audit).toHaveLength(1);
    const [row] = await t.database.db.select().from(users).where(eq(users.email, email));
    expect(row!.passwordHash).toMatch(/^\$argon2id\$v=19\$m=19456,t=2,p=1\$/);
  });

  it('refuses a taken e-mail in any letter case with 409 and writes nothing', async () => {
    const user = await signUp(t.app, 'taken');
    const res = await request(t.app)
      .post('/api/v1/auth/sign-up')
      .send({ email: user.email.toUpperCase(), password: testPassword, displayName: 'Twin' });
    expect(res.status).toBe(409);
    expect(res.body).toMatchObject({ code: 'conflict', field: 'email' });
    expect(await userCount(user.email)).toBe(1);
  });

  it('rejects unknown fields such as role instead of assigning them', async () => {
    const email = uniqueEmail('massassign');
    const res = await request(t.app)
      .post('/api/v1/auth/sign-up')
      .send({ email, password: testPassword, displayName: 'Mallory', role: 'owner' });
    expect(res.status).toBe(400);
    expect(res.body).toMatchObject({ code: 'validation_failed', field: 'role' });
    expect(res.headers['content-type']).toMatch(/application\/problem\+json/);
    expect(await userCount(email)).toBe(0);
  });

  it('names the field at fault for a short password', async () => {
    const res = await request(t.app)
      .post('/api/v1/auth/sign-up')
      .send({ email: uniqueEmail('short'), password: 'short', displayName: 'S' });
    expect(res.status).toBe(400);
    expect(res.body).toMatchObject({ code: 'validation_failed', field: 'password' });
    expect(res.body.message).toBe('password: must be at least 10 characters');
  });
});

describe('sign-in', () => {
  it('signs in, and answers a wrong password alike for known and unknown e-mails', async () => {
    const user = await signUp(t.app, 'signin');
    const ok = await request(t.app)
      .post('/api/v1/auth/sign-in')
      .send({ email: user.email, password: testPassword });
    expect(ok.status).toBe(200);
    expect(ok.body.user.id).toBe(user.id);
    const wrong = await request(t.app)
      .post('/api/v1/auth/sign-in')
      .send({ email: user.email, password: 'not the password' });
    const unknown = await request(t.app)
      .post('/api/v1/auth/sign-in')
      .send({ email: uniqueEmail('nobody'), password: 'not the password' });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body).toEqual(unknown.body);
    expect(wrong.body.code).toBe('invalid_credentials');
  });

  it('rate-limits repeated sign-ins for one address and e-mail with 429', async () => {
    const limited = await createTestApp({
      rateLimits: {
        signIn: { windowMs: 60_000, limit: 3 },
        forgotPassword: { windowMs: 60_000, limit: 2 },
      },
    });
    try {
      const email = uniqueEmail('limited');
      const statuses: number[] = [];
      for (let i = 0; i < 4; i += 1) {
        const res = await request(limited.app)
          .post('/api/v1/auth/sign-in')
          .send({ email, password: 'wrong password' });
        statuses.push(res.status);
        if (res.status === 429) expect(res.body.code).toBe('rate_limited');
      }
      expect(statuses).toEqual([401, 401, 401, 429]);
      const forgot: number[] = [];
      for (let i = 0; i < 3; i += 1) {
        forgot.push(
          (await request(limited.app).post('/api/v1/auth/forgot-password').send({ email })).status,
        );
      }
      expect(forgot).toEqual([202, 202, 429]);
    } finally {
      await limited.close();
    }
  });
});

describe('refresh tokens', () => {
  it('rotates on every use, and reuse of a rotated token ends the whole family', async () => {
    const user = await signUp(t.app, 'rotate');
    const first = await request(t.app)
      .post('/api/v1/auth/refresh')
      .set('Cookie', user.refreshCookie);
    expect(first.status).toBe(200);
    const second = refreshCookieOf(first);
    expect(second).not.toBe(user.refreshCookie);
    expect(first.body.user.id).toBe(user.id);

    const reuse = await request(t.app)
      .post('/api/v1/auth/refresh')
      .set('Cookie', user.refreshCookie);
    expect(reuse.status).toBe(401);
    expect(reuse.body.code).toBe('unauthenticated');
    // The thief's copy and the owner's current token are both dead now.
    const after = await request(t.app).post('/api/v1/auth/refresh').set('Cookie', second);
    expect(after.status).toBe(401);
  });

  it('ends the session on sign-out and clears the cookie', async () => {
    const user = await signUp(t.app, 'signout');
    const out = await request(t.app)
      .post('/api/v1/auth/sign-out')
      .set('Cookie', user.refreshCookie);
    expect(out.status).toBe(204);
    expect((out.headers['set-cookie'] as unknown as string[]).join(';')).toMatch(
      /couplet_refresh=;/,
    );
    const again = await request(t.app)
      .post('/api/v1/auth/refresh')
      .set('Cookie', user.refreshCookie);
    expect(again.status).toBe(401);
  });

  it('answers 401 without a cookie', async () => {
    const res = await request(t.app).post('/api/v1/auth/refresh');
    expect(res.status).toBe(401);
  });
});

describe('password reset', () => {
  it('mails a single-use link that sets the password and ends every session', async () => {
    const user = await signUp(t.app, 'reset');
    const forgot = await request(t.app)
      .post('/api/v1/auth/forgot-password')
      .send({ email: user.email });
    expect(forgot.status).toBe(202);
    const token = await tokenFromMail(user.email, /reset-password\?token=([^\s]+)/);

    const newPassword = 'a brand new passphrase';
    const reset = await request(t.app)
      .post('/api/v1/auth/reset-password')
      .send({ token, password: newPassword });
    expect(reset.status).toBe(204);

    const oldPw = await request(t.app)
      .post('/api/v1/auth/sign-in')
      .send({ email: user.email, password: testPassword });
    expect(oldPw.status).toBe(401);
    const newPw = await request(t.app)
      .post('/api/v1/auth/sign-in')
      .send({ email: user.email, password: newPassword });
    expect(newPw.status).toBe(200);
    const oldSession = await request(t.app)
      .post('/api/v1/auth/refresh')
      .set('Cookie', user.refreshCookie);
    expect(oldSession.status).toBe(401);

    const twice = await request(t.app)
      .post('/api/v1/auth/reset-password')
      .send({ token, password: 'yet another passphrase' });
    expect(twice.status).toBe(400);
    expect(twice.body).toMatchObject({ code: 'validation_failed', field: 'token' });
    const audit = await t.database.db
      .select()
      .from(auditEvents)
      .where(and(eq(auditEvents.actorId, user.id), eq(auditEvents.action, 'user.password_reset')));
    expect(audit).toHaveLength(1);
  });

  it('accepts unknown e-mails with the same 202 and queues no mail', async () => {
    const email = uniqueEmail('ghost');
    const res = await request(t.app).post('/api/v1/auth/forgot-password').send({ email });
    expect(res.status).toBe(202);
    const rows = await t.database.db
      .select()
      .from(outboxMessages)
      .where(eq(outboxMessages.toAddress, email));
    expect(rows).toHaveLength(0);
  });

  it('refuses an expired token', async () => {
    const user = await signUp(t.app, 'expiredreset');
    const token = 'expired-token-' + user.id;
    await t.database.db.insert(passwordResets).values({
      userId: user.id,
      tokenHash: hashSecretToken(token),
      expiresAt: new Date(Date.now() - 1000),
    });
    const res = await request(t.app)
      .post('/api/v1/auth/reset-password')
      .send({ token, password: 'a brand new passphrase' });
    expect(res.status).toBe(400);
    const still = await request(t.app)
      .post('/api/v1/auth/sign-in')
      .send({ email: user.email, password: testPassword });
    expect(still.status).toBe(200);
  });
});

describe('me', () => {
  it('returns the user and their workspaces', async () => {
    const user = await signUp(t.app, 'me');
    await request(t.app)
      .post('/api/v1/workspaces')
      .set('Authorization', `Bearer ${user.accessToken}`)
      .send({ name: 'Bench rig' });
    const res = await request(t.app)
      .get('/api/v1/me')
      .set('Authorization', `Bearer ${user.accessToken}`);
    expect(res.status).toBe(200);
    expect(res.body.user.email).toBe(user.email);
    expect(res.body.workspaces).toEqual([
      expect.objectContaining({ name: 'Bench rig', role: 'owner' }),
    ]);
  });
});
