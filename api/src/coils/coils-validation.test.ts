import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bearer, createTestApp, type TestApp } from '../testing/test-app';
import { workspaceWithAllRoles, type WorkspaceFixture } from '../testing/workspace-fixture';
import { coilsUrl, createCoil, librarySnapshot, spiralRequest } from './coil-fixture';

// Bad input is a 400 that names the field (dotted path inside the spec) with the physics
// engine's own message, and writes nothing.

let t: TestApp;
let f: WorkspaceFixture;
beforeAll(async () => {
  t = await createTestApp();
  f = await workspaceWithAllRoles(t.app, t.database.db, 'coil-input');
});
afterAll(async () => {
  await t.close();
});

const spiral = spiralRequest('Valid spiral').spec as Record<string, unknown>;
const withSpec = (spec: Record<string, unknown>) => ({ ...spiralRequest(), spec });

interface BadCase {
  what: string;
  body: unknown;
  field: string;
  message: RegExp;
}

const cases: BadCase[] = [
  {
    what: 'inner diameter above the outer',
    body: withSpec({ ...spiral, innerDiameter: 0.05, outerDiameter: 0.04 }),
    field: 'spec.outerDiameter',
    message: /not above innerDiameter 50 mm; allowed: outerDiameter > innerDiameter/,
  },
  {
    what: 'pitch below the wire diameter',
    body: withSpec({
      kind: 'circular-spiral',
      turns: 10,
      innerRadius: 0.01,
      pitch: 3e-4,
      conductor: { type: 'round', diameter: 5e-4 },
    }),
    field: 'spec.pitch',
    message: /300 µm is below the conductor width 500 µm/,
  },
  {
    what: 'an unknown coil kind',
    body: withSpec({ kind: 'toroid', turns: 3 }),
    field: 'spec.kind',
    message: /unknown coil kind; allowed: ring, rings, circular-spiral/,
  },
  {
    what: 'an unknown field inside the spec',
    body: withSpec({ ...spiral, turnz: 4 }),
    field: 'spec.turnz',
    message: /spec\.turnz: is not an allowed field/,
  },
  {
    what: 'an unknown field inside the conductor',
    body: withSpec({ ...spiral, conductor: { type: 'round', diameter: 5e-4, colour: 'red' } }),
    field: 'spec.conductor.colour',
    message: /is not an allowed field/,
  },
  {
    what: 'an unknown top-level field',
    body: { ...spiralRequest(), workspaceId: '00000000-0000-4000-8000-000000000000' },
    field: 'workspaceId',
    message: /is not an allowed field/,
  },
  {
    what: 'a NaN-ish string for the pitch',
    body: withSpec({ ...spiral, innerDiameter: undefined, innerRadius: 0.01, pitch: 'NaN' }),
    field: 'spec.pitch',
    message: /expected a finite number, received the text "NaN"/,
  },
  {
    what: 'a number as text for the turns',
    body: withSpec({ ...spiral, turns: '10' }),
    field: 'spec.turns',
    message: /expected a finite number, received the text "10"/,
  },
  {
    what: 'a negative wire diameter',
    body: withSpec({ ...spiral, conductor: { type: 'round', diameter: -1e-3 } }),
    field: 'spec.conductor.diameter',
    message: /out of range; allowed: ≥ 1 µm and ≤ 100 mm/,
  },
  {
    what: 'an unknown conductor type',
    body: withSpec({ ...spiral, conductor: { type: 'ribbon', width: 1e-3 } }),
    field: 'spec.conductor.type',
    message: /unknown conductor type; allowed: round, litz, trace/,
  },
  {
    what: 'a name of 81 characters',
    body: spiralRequest('n'.repeat(81)),
    field: 'name',
    message: /must be at most 80 characters/,
  },
  {
    what: 'an empty name',
    body: spiralRequest('   '),
    field: 'name',
    message: /must not be empty/,
  },
  {
    what: 'a name inside the spec (refused: the coil is named by `name` only)',
    body: withSpec({ ...spiral, name: 'Other name' }),
    field: 'spec.name',
    message: /leave name out of spec/,
  },
  {
    what: 'a negative operating frequency',
    body: { ...spiralRequest(), operatingFrequencyHz: -5 },
    field: 'operatingFrequencyHz',
    message: /must be above 0 Hz/,
  },
  {
    what: 'a rated current as text',
    body: { ...spiralRequest(), ratedCurrentA: '1.5 A' },
    field: 'ratedCurrentA',
    message: /must be a number \(A\)/,
  },
  {
    what: 'no spec',
    body: { name: 'No spec' },
    field: 'spec',
    message: /^spec: /,
  },
];

describe('coil input', () => {
  it.each(cases)('refuses $what, naming $field', async ({ body, field, message }) => {
    const before = await librarySnapshot(t.database.db, f.workspaceId);
    const res = await request(t.app)
      .post(coilsUrl(f.workspaceId))
      .set('Authorization', bearer(f.members.editor))
      .send(body as object);
    expect(res.status, res.text).toBe(400);
    expect(res.body).toMatchObject({ code: 'validation_failed', field });
    expect(res.body.message).toMatch(message);
    expect(res.body.message.startsWith(`${field}: `)).toBe(true);
    expect(await librarySnapshot(t.database.db, f.workspaceId)).toEqual(before);
  });

  it('refuses Infinity written as 1e999 in the JSON text', async () => {
    const text = JSON.stringify(withSpec({ ...spiral, turns: 12345 })).replace('12345', '1e999');
    const res = await request(t.app)
      .post(coilsUrl(f.workspaceId))
      .set('Authorization', bearer(f.members.editor))
      .set('Content-Type', 'application/json')
      .send(text);
    expect(res.status).toBe(400);
    expect(res.body.field).toBe('spec.turns');
    expect(res.body.message).toMatch(/expected a finite number, received Infinity/);
  });

  it('refuses bad input on update too and leaves the coil as it was', async () => {
    const coil = await createCoil(t.app, f.workspaceId, f.owner);
    const before = await librarySnapshot(t.database.db, f.workspaceId);
    const res = await request(t.app)
      .put(coilsUrl(f.workspaceId, `/${coil.id}`))
      .set('Authorization', bearer(f.owner))
      .send({ ...withSpec({ ...spiral, outerDiameter: 0.01 }), version: 1 });
    expect(res.status).toBe(400);
    expect(res.body.field).toBe('spec.outerDiameter');
    const noVersion = await request(t.app)
      .put(coilsUrl(f.workspaceId, `/${coil.id}`))
      .set('Authorization', bearer(f.owner))
      .send(spiralRequest(coil.name));
    expect(noVersion.status).toBe(400);
    expect(noVersion.body.field).toBe('version');
    expect(await librarySnapshot(t.database.db, f.workspaceId)).toEqual(before);
  });

  it('refuses a duplicate name that is too long', async () => {
    const coil = await createCoil(t.app, f.workspaceId, f.owner);
    const res = await request(t.app)
      .post(coilsUrl(f.workspaceId, `/${coil.id}/duplicate`))
      .set('Authorization', bearer(f.owner))
      .send({ name: 'x'.repeat(81) });
    expect(res.status).toBe(400);
    expect(res.body.field).toBe('name');
  });
});
