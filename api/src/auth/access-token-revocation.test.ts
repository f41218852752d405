import { eq } from 'drizzle-orm';
import jwt from 'jsonwebtoken';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { passwordResets, users } from '../../../schema/src/index';
import {
  createTestApp,
  refreshCookieOf,
  signUp,
  testPassword,
  type TestApp,
  type TestUser,
} from '../testing/test-app';
import { AccessTokens } from './access-tokens';
import { hashSecretToken } from './secret-token';

// Access tokens must stop working when their session ends, not 15 minutes later. A refused token
// answers 401 `unauthenticated` (not `token_expired`: it has not expired, it was revoked); the web
// client treats both alike, trying one refresh before sending the user to sign in.

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

const newPassword = 'a brand new passphrase';

async function me(token: string) {
  return request(t.app).get('/api/v1/me').set('Authorization', `Bearer ${token}`);
}

async function signIn(email: string, password = testPassword) {
  const res = await request(t.app).post('/api/v1/auth/sign-in').send({ email, password });
  expect(res.status).toBe(200);
  return { accessToken: res.body.accessToken as string, refreshCookie: refreshCookieOf(res) };
}

/** Resets the password through the API with a planted reset row (auth.test covers the mail). */
async function resetPassword(user: TestUser): Promise<void> {
  const token = `revocation-reset-${user.id}`;
  await t.database.db.insert(passwordResets).values({
    userId: user.id,
    tokenHash: hashSecretToken(token),
    expiresAt: new Date(Date.now() + 600_000),
  });
  const res = await request(t.app)
    .post('/api/v1/auth/reset-password')
    .send({ token, password: newPassword });
  expect(res.status).toBe(204);
}

function claimsOf(token: string): jwt.JwtPayload {
  return jwt.decode(token) as jwt.JwtPayload;
}

describe('sign-out', () => {
  it('stops the access token of that session, and only of that session', async () => {
    const user = await signUp(t.app, 'out-access');
    const otherDevice = await signIn(user.email);
    expect((await me(user.accessToken)).status).toBe(200);

    const out = await request(t.app)
      .post('/api/v1/auth/sign-out')
      .set('Cookie', user.refreshCookie);
    expect(out.status).toBe(204);

    const after = await me(user.accessToken);
    expect(after.status).toBe(401);
    expect(after.body.code).toBe('unauthenticated');
    // Per-session: the browser that did not sign out stays signed in.
    expect((await me(otherDevice.accessToken)).status).toBe(200);
  });

  it('stops access tokens of every rotation of the session, not just the latest', async () => {
    const user = await signUp(t.app, 'out-rotated');
    const renewed = await request(t.app)
      .post('/api/v1/auth/refresh')
      .set('Cookie', user.refreshCookie);
    expect(renewed.status).toBe(200);
    await request(t.app).post('/api/v1/auth/sign-out').set('Cookie', refreshCookieOf(renewed));
    expect((await me(user.accessToken)).status).toBe(401);
    expect((await me(renewed.body.accessToken as string)).status).toBe(401);
  });

  it('stops the access tokens of a session whose refresh token was replayed', async () => {
    const user = await signUp(t.app, 'out-replay');
    const renewed = await request(t.app)
      .post('/api/v1/auth/refresh')
      .set('Cookie', user.refreshCookie);
    const replay = await request(t.app)
      .post('/api/v1/auth/refresh')
      .set('Cookie', user.refreshCookie);
    expect(replay.status).toBe(401);
    expect((await me(renewed.body.accessToken as string)).status).toBe(401);
  });
});

describe('password reset', () => {
  it('refuses every access token issued before it; a fresh sign-in works', async () => {
    const user = await signUp(t.app, 'reset-access');
    const otherDevice = await signIn(user.email);
    await resetPassword(user);

    for (const token of [user.accessToken, otherDevice.accessToken]) {
      const res = await me(token);
      expect(res.status).toBe(401);
      expect(res.body.code).toBe('unauthenticated');
    }
    const fresh = await signIn(user.email, newPassword);
    const res = await me(fresh.accessToken);
    expect(res.status).toBe(200);
    expect(res.body.user.id).toBe(user.id);
    expect(claimsOf(fresh.accessToken).ver).toBe(claimsOf(user.accessToken).ver + 1);
  });

  it('decides by token version, so the second of issue does not matter', async () => {
    // A token's iat is in whole seconds; a cut-off by time could not tell apart two tokens of the
    // same second on either side of the reset. Both tokens here have the very same iat and the
    // same live session (the one started after the reset), and differ only in version.
    const user = await signUp(t.app, 'reset-edge');
    await resetPassword(user);
    const fresh = await signIn(user.email, newPassword);
    const { sid, ver } = claimsOf(fresh.accessToken);
    const [row] = await t.database.db.select().from(users).where(eq(users.id, user.id));
    expect(row!.tokenVersion).toBe(ver);

    const tokens = new AccessTokens(t.config.jwtSecretHex);
    const sameSecond = new Date();
    const subject = { userId: user.id, sessionId: sid as string };
    const before = tokens.issue({ ...subject, tokenVersion: row!.tokenVersion - 1 }, sameSecond);
    const after = tokens.issue({ ...subject, tokenVersion: row!.tokenVersion }, sameSecond);
    expect(claimsOf(before.token).iat).toBe(claimsOf(after.token).iat);

    const refused = await me(before.token);
    expect(refused.status).toBe(401);
    expect(refused.body.code).toBe('unauthenticated');
    expect((await me(after.token)).status).toBe(200);
    // An old-version token dated later than the reset is refused all the same.
    const later = new Date(Date.now() + 60_000);
    const backdated = tokens.issue({ ...subject, tokenVersion: row!.tokenVersion - 1 }, later);
    expect((await me(backdated.token)).status).toBe(401);
  });

  it('keeps existing accounts working: the column defaults to version 0', async () => {
    const user = await signUp(t.app, 'reset-default');
    const [row] = await t.database.db.select().from(users).where(eq(users.id, user.id));
    expect(row!.tokenVersion).toBe(0);
    expect(claimsOf(user.accessToken).ver).toBe(0);
  });
});
