import { createSecretKey, randomBytes } from 'node:crypto';
import jwt from 'jsonwebtoken';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, signUp, type TestApp, type TestUser } from '../testing/test-app';
import { tokenAudience, tokenIssuer } from './access-tokens';

let t: TestApp;
let user: TestUser;
/** The session claims of the user's real token, so hand-signed tokens differ only as meant. */
let session: { sid: string; ver: number };
beforeAll(async () => {
  t = await createTestApp();
  user = await signUp(t.app, 'tokens');
  const payload = jwt.decode(user.accessToken) as jwt.JwtPayload;
  session = { sid: payload.sid as string, ver: payload.ver as number };
});
afterAll(async () => {
  await t.close();
});

const b64 = (value: object) => Buffer.from(JSON.stringify(value)).toString('base64url');

function rightKey() {
  return createSecretKey(Buffer.from(t.config.jwtSecretHex, 'hex'));
}

function sign(payload: object, options: jwt.SignOptions = {}, key = rightKey()) {
  return jwt.sign({ ...session, ...payload }, key, {
    algorithm: 'HS256',
    issuer: tokenIssuer,
    audience: tokenAudience,
    subject: user.id,
    ...options,
  });
}

async function me(token: string) {
  return request(t.app).get('/api/v1/me').set('Authorization', `Bearer ${token}`);
}

describe('access tokens', () => {
  it('accepts the token the API issued', async () => {
    expect((await me(user.accessToken)).status).toBe(200);
  });

  it('accepts a token we sign the same way (the control for the cases below)', async () => {
    expect((await me(sign({}, { expiresIn: 60 }))).status).toBe(200);
  });

  const now = () => Math.floor(Date.now() / 1000);
  const cases: Array<[string, () => string, string]> = [
    [
      'forged with another key',
      () => sign({}, { expiresIn: 60 }, createSecretKey(randomBytes(32))),
      'unauthenticated',
    ],
    ['expired', () => sign({ iat: now() - 3600, exp: now() - 60 }), 'token_expired'],
    ['without exp', () => sign({}), 'unauthenticated'],
    [
      'with alg none',
      () =>
        `${b64({ alg: 'none', typ: 'JWT' })}.${b64({
          sub: user.id,
          iss: tokenIssuer,
          aud: tokenAudience,
          exp: now() + 600,
        })}.`,
      'unauthenticated',
    ],
    [
      'with another audience',
      () => sign({}, { expiresIn: 60, audience: 'other' }),
      'unauthenticated',
    ],
    ['with another issuer', () => sign({}, { expiresIn: 60, issuer: 'other' }), 'unauthenticated'],
    [
      'signed HS512 with the right key (algorithm pinned)',
      () => sign({}, { expiresIn: 60, algorithm: 'HS512' }),
      'unauthenticated',
    ],
    [
      'for a user that does not exist',
      () => sign({}, { expiresIn: 60, subject: '00000000-0000-4000-8000-000000000000' }),
      'unauthenticated',
    ],
    ['that is not a JWT', () => 'not-a-token', 'unauthenticated'],
    ['without sid', () => sign({ sid: undefined }, { expiresIn: 60 }), 'unauthenticated'],
    ['without ver', () => sign({ ver: undefined }, { expiresIn: 60 }), 'unauthenticated'],
    ['with a sid that is no uuid', () => sign({ sid: 'x' }, { expiresIn: 60 }), 'unauthenticated'],
    [
      'of a session that does not exist',
      () => sign({ sid: '00000000-0000-4000-8000-000000000000' }, { expiresIn: 60 }),
      'unauthenticated',
    ],
    [
      'with a token version the user never had',
      () => sign({ ver: session.ver + 1 }, { expiresIn: 60 }),
      'unauthenticated',
    ],
    ['with a fractional ver', () => sign({ ver: 0.5 }, { expiresIn: 60 }), 'unauthenticated'],
  ];
  it.each(cases)('rejects a token %s with 401', async (_name, make, code) => {
    const res = await me(make());
    expect(res.status).toBe(401);
    expect(res.body.code).toBe(code);
  });

  it('rejects a request without a token', async () => {
    const res = await request(t.app).get('/api/v1/me');
    expect(res.status).toBe(401);
    expect(res.body.code).toBe('unauthenticated');
  });

  it('issues HS256 tokens that live 15 minutes with issuer, audience and subject', () => {
    const decoded = jwt.decode(user.accessToken, { complete: true })!;
    const payload = decoded.payload as jwt.JwtPayload;
    expect(decoded.header.alg).toBe('HS256');
    expect(payload.exp! - payload.iat!).toBe(900);
    expect(payload).toMatchObject({ iss: tokenIssuer, aud: tokenAudience, sub: user.id, ver: 0 });
    expect(payload.sid).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/);
  });

  it('refuses a session of another user even with the right version', async () => {
    const other = await signUp(t.app, 'tokens-other');
    const otherSid = (jwt.decode(other.accessToken) as jwt.JwtPayload).sid as string;
    const res = await me(sign({ sid: otherSid }, { expiresIn: 60 }));
    expect(res.status).toBe(401);
    expect(res.body.code).toBe('unauthenticated');
  });
});
