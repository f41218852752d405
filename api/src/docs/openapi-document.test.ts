import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../testing/test-app';

// The route table of the API contract (/tmp/couplet-api-contract.md, issue 3), written out by
// hand so the test catches a route that is missing from the app or from the document.
const contractRoutes = [
  ['get', '/health'],
  ['post', '/auth/sign-up'],
  ['post', '/auth/sign-in'],
  ['post', '/auth/refresh'],
  ['post', '/auth/sign-out'],
  ['post', '/auth/forgot-password'],
  ['post', '/auth/reset-password'],
  ['get', '/me'],
  ['get', '/workspaces'],
  ['post', '/workspaces'],
  ['get', '/workspaces/{workspaceId}'],
  ['patch', '/workspaces/{workspaceId}'],
  ['get', '/workspaces/{workspaceId}/members'],
  ['patch', '/workspaces/{workspaceId}/members/{userId}'],
  ['delete', '/workspaces/{workspaceId}/members/{userId}'],
  ['get', '/workspaces/{workspaceId}/invitations'],
  ['post', '/workspaces/{workspaceId}/invitations'],
  ['delete', '/workspaces/{workspaceId}/invitations/{invitationId}'],
  ['get', '/invitations/{token}'],
  ['post', '/invitations/{token}/accept'],
  ['get', '/workspaces/{workspaceId}/audit'],
  // Coil library (issue 4).
  ['get', '/workspaces/{workspaceId}/coils'],
  ['post', '/workspaces/{workspaceId}/coils'],
  ['get', '/workspaces/{workspaceId}/coils/{coilId}'],
  ['put', '/workspaces/{workspaceId}/coils/{coilId}'],
  ['post', '/workspaces/{workspaceId}/coils/{coilId}/duplicate'],
  ['delete', '/workspaces/{workspaceId}/coils/{coilId}'],
  // Studies and revisions (issue 4).
  ['get', '/workspaces/{workspaceId}/studies'],
  ['post', '/workspaces/{workspaceId}/studies'],
  ['get', '/workspaces/{workspaceId}/studies/{studyId}'],
  ['put', '/workspaces/{workspaceId}/studies/{studyId}'],
  ['delete', '/workspaces/{workspaceId}/studies/{studyId}'],
  ['post', '/workspaces/{workspaceId}/studies/{studyId}/revisions'],
  ['get', '/workspaces/{workspaceId}/studies/{studyId}/revisions'],
  ['get', '/workspaces/{workspaceId}/studies/{studyId}/revisions/{revisionId}'],
  // Sweep runs (issue 4).
  ['get', '/workspaces/{workspaceId}/studies/{studyId}/sweeps'],
  ['post', '/workspaces/{workspaceId}/studies/{studyId}/sweeps'],
  ['post', '/workspaces/{workspaceId}/studies/{studyId}/sweeps/estimate'],
  ['get', '/workspaces/{workspaceId}/studies/{studyId}/sweeps/{runId}'],
  ['post', '/workspaces/{workspaceId}/studies/{studyId}/sweeps/{runId}/cancel'],
  ['get', '/workspaces/{workspaceId}/studies/{studyId}/sweeps/{runId}/events'],
  ['get', '/dev/mail'],
] as const;

let t: TestApp;
let doc: { paths: Record<string, Record<string, { summary?: string }>> };
beforeAll(async () => {
  t = await createTestApp();
  doc = (await request(t.app).get('/api/docs/openapi.json')).body;
});
afterAll(async () => {
  await t.close();
});

const sample = (path: string) => path.replace(/\{[^}]+\}/g, '00000000-0000-4000-8000-000000000000');

describe('OpenAPI document', () => {
  it('is OpenAPI 3.1 with the problem body and the request schemas as components', () => {
    expect((doc as unknown as { openapi: string }).openapi).toBe('3.1.0');
    const schemas = Object.keys(
      (doc as unknown as { components: { schemas: object } }).components.schemas,
    );
    expect(schemas).toEqual(
      expect.arrayContaining(['ProblemResponse', 'SignUpRequest', 'CreateInvitationRequest']),
    );
  });

  it.each(contractRoutes)('lists %s %s, and the app serves it', async (method, path) => {
    expect(doc.paths[`/api/v1${path}`]?.[method]?.summary, `${method} ${path}`).toBeTruthy();
    const res = await request(t.app)[method](`/api/v1${sample(path)}`);
    expect(String(res.body?.message ?? '')).not.toMatch(/^No route for/);
  });

  it('lists no route beyond the contract', () => {
    const listed = Object.entries(doc.paths).flatMap(([p, ops]) =>
      Object.keys(ops).map((m) => `${m} ${p.replace('/api/v1', '')}`),
    );
    expect(listed.sort()).toEqual(contractRoutes.map(([m, p]) => `${m} ${p}`).sort());
  });

  it('serves a human page that links the document and lists the operations', async () => {
    const res = await request(t.app).get('/api/docs');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/text\/html/);
    expect(res.text).toContain('/api/docs/openapi.json');
    expect(res.text).toContain('/api/v1/workspaces/{workspaceId}/invitations');
    expect(res.text).not.toMatch(/<script/i);
  });
});
