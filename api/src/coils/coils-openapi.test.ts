import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../testing/test-app';
import { coilKinds } from './coils-dto';

// The coil routes in the generated OpenAPI document: the physics schemas (discriminated unions
// with refinements) must convert, so a client generator sees every coil kind.

interface Operation {
  summary?: string;
  requestBody?: { content: { 'application/json': { schema: JsonSchema } } };
  responses: Record<string, { content?: { 'application/json'?: { schema: JsonSchema } } }>;
}
interface JsonSchema {
  properties?: Record<string, JsonSchema>;
  oneOf?: JsonSchema[];
  enum?: string[];
  required?: string[];
}

let t: TestApp;
let paths: Record<string, Record<string, Operation>>;
beforeAll(async () => {
  t = await createTestApp();
  paths = (await request(t.app).get('/api/docs/openapi.json')).body.paths;
});
afterAll(async () => {
  await t.close();
});

const base = '/api/v1/workspaces/{workspaceId}/coils';

describe('coil routes in the OpenAPI document', () => {
  it.each([
    ['get', base],
    ['post', base],
    ['get', `${base}/{coilId}`],
    ['put', `${base}/{coilId}`],
    ['post', `${base}/{coilId}/duplicate`],
    ['delete', `${base}/{coilId}`],
  ])('lists %s %s', (method, path) => {
    expect(paths[path]?.[method]?.summary).toBeTruthy();
  });

  it('describes the spec as one schema per coil kind, with the physics fields', () => {
    const body = paths[base]!.post!.requestBody!.content['application/json'].schema;
    const variants = body.properties!.spec!.oneOf!;
    expect(variants.map((v) => v.properties!.kind!.enum![0])).toEqual([...coilKinds]);
    const spiral = variants.find((v) => v.properties!.kind!.enum![0] === 'circular-spiral')!;
    expect(Object.keys(spiral.properties!)).toEqual(
      expect.arrayContaining(['turns', 'innerDiameter', 'outerDiameter', 'pitch', 'conductor']),
    );
    const put = paths[`${base}/{coilId}`]!.put!.requestBody!.content['application/json'].schema;
    expect(put.required).toEqual(expect.arrayContaining(['name', 'spec', 'version']));
  });

  it('describes the response with its figures and the studies that use the coil', () => {
    const ok = paths[`${base}/{coilId}`]!.get!.responses['200']!.content!['application/json']!;
    expect(Object.keys(ok.schema.properties!)).toEqual(
      expect.arrayContaining(['figures', 'usedBy', 'version', 'spec']),
    );
    expect(Object.keys(ok.schema.properties!.figures!.properties!).sort()).toEqual(
      ['L', 'Q', 'Rac', 'Rdc', 'skinDepth', 'storedEnergy', 'timeConstant', 'wireLength'].sort(),
    );
  });
});
