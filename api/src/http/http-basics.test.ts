import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { sql } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { users } from '../../../schema/src/index';
import { createTestApp, testPassword, uniqueEmail, type TestApp } from '../testing/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

async function userCount(): Promise<number> {
  const rows = await t.database.db.select({ n: sql<number>`count(*)::int` }).from(users);
  return rows[0]!.n;
}

describe('request basics', () => {
  it('answers malformed JSON with 400 malformed_json', async () => {
    const res = await request(t.app)
      .post('/api/v1/auth/sign-up')
      .set('Content-Type', 'application/json')
      .send('{"email": "a@b.example", "password": ');
    expect(res.status).toBe(400);
    expect(res.body).toMatchObject({ type: 'about:blank', status: 400, code: 'malformed_json' });
    expect(res.headers['content-type']).toMatch(/application\/problem\+json/);
  });

  it('answers a body over 100 kB with 413 and creates nothing', async () => {
    const email = uniqueEmail('huge');
    const res = await request(t.app)
      .post('/api/v1/auth/sign-up')
      .send({ email, password: testPassword, displayName: 'x'.repeat(120_000) });
    expect(res.status).toBe(413);
    expect(res.body.code).toBe('payload_too_large');
    const rows = await t.database.db
      .select()
      .from(users)
      .where(sql`${users.email} = ${email}`);
    expect(rows).toHaveLength(0);
  });

  it('answers a body that is not an object with 400', async () => {
    const before = await userCount();
    const res = await request(t.app).post('/api/v1/auth/sign-up').send([1, 2]);
    expect(res.status).toBe(400);
    expect(res.body.code).toBe('validation_failed');
    expect(await userCount()).toBe(before);
  });

  it('answers unknown API paths with a JSON 404', async () => {
    for (const p of ['/api/v1/no-such-thing', '/api/elsewhere', '/no-web-app-here']) {
      const res = await request(t.app).get(p);
      expect(res.status, p).toBe(404);
      expect(res.body.code, p).toBe('not_found');
    }
  });

  it('reports health including the database', async () => {
    const res = await request(t.app).get('/api/v1/health');
    expect(res.body).toEqual({ status: 'ok', database: 'ok' });
  });

  it('sets security headers with a CSP an Angular app can live with', async () => {
    const res = await request(t.app).get('/api/v1/health');
    const csp = String(res.headers['content-security-policy']);
    expect(csp).toContain("style-src 'self' 'unsafe-inline'");
    expect(csp).toContain("worker-src 'self' blob:");
    expect(csp).toContain("img-src 'self' data: blob:");
    expect(csp).toContain("script-src 'self'");
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['cache-control']).toBe('no-store');
  });
});

describe('serving the web app', () => {
  let dist: string;
  let web: TestApp;
  beforeAll(async () => {
    dist = fs.mkdtempSync(path.join(os.tmpdir(), 'couplet-web-'));
    fs.writeFileSync(path.join(dist, 'index.html'), '<!doctype html><title>Couplet</title>');
    fs.writeFileSync(path.join(dist, 'main-ABCDEF12.js'), 'console.log(1)');
    web = await createTestApp({ webDist: dist });
  });
  afterAll(async () => {
    await web.close();
    fs.rmSync(dist, { recursive: true, force: true });
  });

  it('serves index.html uncached for app routes and hashed bundles cached for long', async () => {
    const page = await request(web.app).get('/w/123/members');
    expect(page.status).toBe(200);
    expect(page.text).toContain('<title>Couplet</title>');
    expect(page.headers['cache-control']).toMatch(/no-cache/);
    const root = await request(web.app).get('/');
    expect(root.text).toContain('<title>Couplet</title>');
    const bundle = await request(web.app).get('/main-ABCDEF12.js');
    expect(bundle.headers['cache-control']).toMatch(/immutable/);
  });

  it('keeps API paths out of the fallback', async () => {
    const res = await request(web.app).get('/api/v1/nothing-here');
    expect(res.status).toBe(404);
    expect(res.body.code).toBe('not_found');
  });
});
