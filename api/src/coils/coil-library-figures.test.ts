import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { coilFigures, MU0, type Coil } from '../../../physics/src/index';
import { bearer, createTestApp, type TestApp } from '../testing/test-app';
import { workspaceWithAllRoles, type WorkspaceFixture } from '../testing/workspace-fixture';
import { coilsUrl, createCoil, ringRequest, spiralRequest } from './coil-fixture';
import type { CoilResponse, CreateCoilRequest } from './coils-dto';

// The figures the library stores and shows: equal to physics' coilFigures for the same spec and
// operating point, on every read, and right against published formulas where one exists.

let t: TestApp;
let f: WorkspaceFixture;
beforeAll(async () => {
  t = await createTestApp();
  f = await workspaceWithAllRoles(t.app, t.database.db, 'coil-figures');
});
afterAll(async () => {
  await t.close();
});

const read = async (id: string): Promise<CoilResponse> =>
  (
    await request(t.app)
      .get(coilsUrl(f.workspaceId, `/${id}`))
      .set('Authorization', bearer(f.owner))
  ).body;

const expectedFigures = (body: CreateCoilRequest) =>
  coilFigures(body.spec as Coil, {
    frequency: body.operatingFrequencyHz ?? undefined,
    current: body.ratedCurrentA ?? 1,
  });

const kinds: [string, CreateCoilRequest][] = [
  ['circular spiral of round wire at 140 kHz, 1.5 A', spiralRequest()],
  ['ring, DC only', ringRequest()],
  [
    'rectangular spiral of Litz on ferrite at 120 kHz, 0 A',
    {
      name: 'Rect Litz',
      spec: {
        kind: 'rectangular-spiral',
        outerWidth: 0.05,
        outerHeight: 0.04,
        cornerRadius: 0.004,
        pitch: 0.0012,
        turns: 8,
        conductor: { type: 'litz', strands: 60, strandDiameter: 1e-4 },
        backing: { mur: 2000, distance: 0.001 },
      },
      operatingFrequencyHz: 120e3,
      ratedCurrentA: 0,
    },
  ],
  [
    'two-layer PCB trace spiral at 6.78 MHz',
    {
      name: 'PCB trace',
      spec: {
        kind: 'circular-spiral',
        turns: 6,
        innerDiameter: 0.012,
        outerDiameter: 0.03,
        layers: 2,
        layerSpacing: 0.0016,
        conductor: { type: 'trace', width: 8e-4, thickness: 3.5e-5 },
      },
      operatingFrequencyHz: 6.78e6,
      ratedCurrentA: 0.8,
    },
  ],
  [
    'solenoid of round wire at 85 kHz',
    {
      name: 'Solenoid',
      spec: {
        kind: 'solenoid',
        radius: 0.006,
        length: 0.01,
        turns: 20,
        conductor: { type: 'round', diameter: 4e-4 },
      },
      operatingFrequencyHz: 85e3,
      ratedCurrentA: 1,
    },
  ],
];

describe('library figures', () => {
  it.each(kinds)('%s: equal to coilFigures on create, read, list and save', async (_w, body) => {
    const want = expectedFigures(body);
    const suffix = Math.random().toString(36).slice(2, 8);
    const coil = await createCoil(t.app, f.workspaceId, f.members.editor, {
      ...body,
      name: `${body.name} ${suffix}`,
    });
    // Exact equality: the stored columns keep every double, and the derived figures are
    // computed by the same functions in the same order.
    expect(coil.figures).toEqual(want);
    expect((await read(coil.id)).figures).toEqual(want);
    const list = await request(t.app)
      .get(coilsUrl(f.workspaceId))
      .set('Authorization', bearer(f.members.viewer));
    const listed = (list.body.items as CoilResponse[]).find((c) => c.id === coil.id);
    expect(listed?.figures).toEqual(want);
    // A save at another operating point stores the figures for that point.
    const next = { ...body, name: coil.name, operatingFrequencyHz: 100e3, ratedCurrentA: 2 };
    const saved = await request(t.app)
      .put(coilsUrl(f.workspaceId, `/${coil.id}`))
      .set('Authorization', bearer(f.members.editor))
      .send({ ...next, version: 1 });
    expect(saved.status).toBe(200);
    expect(saved.body.figures).toEqual(expectedFigures(next));
    expect((await read(coil.id)).figures).toEqual(expectedFigures(next));
  });
});

describe('against published formulas', () => {
  // A 20 mm ring of 1 mm copper wire (a = 0.5 mm).
  const R = 0.02;
  const a = 5e-4;

  it('ring L = μ0 R (ln(8R/a) − 2 + 1/4) (Rosa & Grover 1916; Grover 1946)', async () => {
    const coil = await createCoil(t.app, f.workspaceId, f.owner, {
      ...ringRequest(),
      spec: { kind: 'ring', radius: R, wireRadius: a },
    });
    const published = MU0 * R * (Math.log((8 * R) / a) - 2 + 1 / 4);
    // 1e-9 relative: the closed form is the model for a single ring; only rounding differs.
    expect(
      Math.abs(coil.figures.L / published - 1),
      `L ${coil.figures.L} vs ${published}`,
    ).toBeLessThan(1e-9);
  });

  it('ring R_dc = ρ l / A with ρ = 1.72e-8 Ω·m (IEC 60028 annealed copper, 20 °C)', async () => {
    const coil = await createCoil(t.app, f.workspaceId, f.owner, {
      ...ringRequest(),
      spec: { kind: 'ring', radius: R, wireRadius: a },
    });
    const length = 2 * Math.PI * R;
    const rho = 1 / 58e6; // IEC 60028: 1/58 Ω·mm²/m = 1.7241e-8 Ω·m
    const published = (rho * length) / (Math.PI * a * a);
    expect(coil.figures.wireLength).toBeCloseTo(length, 12);
    // 0.3 % relative: IEC 60028's 1.7241e-8 against the engine's rounded 1.72e-8 (0.24 %).
    expect(Math.abs(coil.figures.Rdc / published - 1)).toBeLessThan(3e-3);
    // τ = L / R_dc by definition.
    expect(coil.figures.timeConstant).toBe(coil.figures.L / coil.figures.Rdc);
  });

  it('skin depth δ = sqrt(ρ / (π f μ0)), ~0.15 mm in copper at 200 kHz (textbook)', async () => {
    const coil = await createCoil(t.app, f.workspaceId, f.owner, {
      ...spiralRequest(),
      operatingFrequencyHz: 200e3,
    });
    const delta = Math.sqrt(1.72e-8 / (Math.PI * 200e3 * 4e-7 * Math.PI));
    // 1e-6 relative: μ0 after the 2019 SI differs from 4π·1e-7 by about 1e-10.
    expect(Math.abs(coil.figures.skinDepth! / delta - 1)).toBeLessThan(1e-6);
    expect(coil.figures.skinDepth).toBeGreaterThan(1.4e-4);
    expect(coil.figures.skinDepth).toBeLessThan(1.55e-4);
    // Q = ωL/R_ac and W = ½ L I² by definition.
    expect(coil.figures.Q).toBeCloseTo(
      (2 * Math.PI * 200e3 * coil.figures.L) / coil.figures.Rac!,
      9,
    );
    expect(coil.figures.storedEnergy).toBeCloseTo(0.5 * coil.figures.L * 1.5 ** 2, 15);
  });
});
