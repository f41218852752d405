// Ferrite images. References: J. D. Jackson, Classical Electrodynamics, 3rd ed., problem 5.17
// (image current (mur - 1)/(mur + 1) times the mirrored current, which for mur → ∞ makes the
// tangential H vanish on the surface); Biot–Savart field of a straight segment (Jackson §5.2);
// Maxwell's mutual inductance of coaxial circles with complete elliptic integrals (Maxwell,
// Treatise, 1873, art. 701), evaluated with @stdlib/math-base-special-ellipk and -ellipe
// (parameter m = k²).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { FilamentSet, RingFilament, Vec3 } from '../filaments';
import { transformFilaments } from '../pose/transform-filaments';
import { expectNear } from '../testing/expect-near';
import { maxwellStdlib } from '../testing/maxwell-stdlib';
import { coilFilaments } from './coil-filaments';
import { ferriteImages } from './ferrite-images';
import { parseCoil } from './parse-coil';

const MU0 = 4e-7 * Math.PI;

/** A ring as a polygon of n points, current right-handed about its normal. */
function ringPolygon(ring: RingFilament, n: number): Vec3[] {
  const nn = ring.normal;
  const helper = Math.abs(nn.x) < 0.9 ? { x: 1, y: 0, z: 0 } : { x: 0, y: 1, z: 0 };
  const cross = (a: Vec3, b: Vec3) => ({
    x: a.y * b.z - a.z * b.y,
    y: a.z * b.x - a.x * b.z,
    z: a.x * b.y - a.y * b.x,
  });
  let e1 = cross(helper, nn);
  const s = Math.hypot(e1.x, e1.y, e1.z);
  e1 = { x: e1.x / s, y: e1.y / s, z: e1.z / s };
  const e2 = cross(nn, e1);
  return Array.from({ length: n }, (_, i) => {
    const t = (2 * Math.PI * i) / n;
    const c = ring.radius * Math.cos(t);
    const d = ring.radius * Math.sin(t);
    return {
      x: ring.center.x + c * e1.x + d * e2.x,
      y: ring.center.y + c * e1.y + d * e2.y,
      z: ring.center.z + c * e1.z + d * e2.z,
    };
  });
}

/** Biot–Savart B (per ampere) of every filament at P; rings as 720-gons. */
function field(set: FilamentSet, p: Vec3): Vec3 {
  const total = { x: 0, y: 0, z: 0 };
  const loops = [
    ...set.paths.map((path) => ({ points: path.points, closed: path.closed, weight: path.weight })),
    ...set.rings.map((ring) => ({
      points: ringPolygon(ring, 720),
      closed: true,
      weight: ring.weight,
    })),
  ];
  for (const loop of loops) {
    const n = loop.points.length;
    for (let i = 0; i < (loop.closed ? n : n - 1); i++) {
      const a = sub(loop.points[i], p);
      const b = sub(loop.points[(i + 1) % n], p);
      const la = norm(a);
      const lb = norm(b);
      const f =
        ((MU0 / (4 * Math.PI)) * loop.weight * (la + lb)) / (la * lb * (la * lb + dot(a, b)));
      total.x += f * (a.y * b.z - a.z * b.y);
      total.y += f * (a.z * b.x - a.x * b.z);
      total.z += f * (a.x * b.y - a.y * b.x);
    }
  }
  return total;
}
const sub = (a: Vec3, b: Vec3) => ({ x: a.x - b.x, y: a.y - b.y, z: a.z - b.z });
const dot = (a: Vec3, b: Vec3) => a.x * b.x + a.y * b.y + a.z * b.z;
const norm = (a: Vec3) => Math.hypot(a.x, a.y, a.z);
const union = (a: FilamentSet, b: FilamentSet): FilamentSet => ({
  rings: [...a.rings, ...b.rings],
  paths: [...a.paths, ...b.paths],
});

describe('ferriteImages: geometry', () => {
  it('mirrors a ring in z = -d with weight (mur - 1)/(mur + 1), normal (-nx, -ny, nz)', () => {
    const tilted = transformFilaments(
      coilFilaments(parseCoil({ kind: 'ring', radius: 0.02, wireRadius: 5e-4 })),
      { z: 0.004, tiltY: 30 },
    );
    const image = ferriteImages(tilted, { mur: 3, distance: 0.001 }).rings[0];
    expectNear(image.center.z, -0.002 - 0.004, 1e-15, 'image centre z', true);
    expectNear(image.normal.x, -0.5, 1e-15, 'image normal x', true);
    expectNear(image.normal.z, Math.sqrt(3) / 2, 1e-15, 'image normal z', true);
    expect(image.weight).toBe(0.5);
  });
  it('mur = 1 (no ferrite) has no images', () => {
    const set = coilFilaments(parseCoil({ kind: 'ring', radius: 0.02, wireRadius: 5e-4 }));
    expect(ferriteImages(set, { mur: 1, distance: 0.001 })).toEqual({ rings: [], paths: [] });
  });
});

describe('ferriteImages: physics (Jackson problem 5.17)', () => {
  const surface = -0.001;
  const backing = { mur: 1e5, distance: 0.001 };
  // Weight (1e5 - 1)/(1e5 + 1) = 1 - 2e-5: tangential B on the surface is left at 1e-5 of the
  // original's; the 720-gon rings add a discretisation residue of order (2π/720)² ≈ 8e-5.
  const tolerance = 3e-4;
  const probes = [
    { x: 0.005, y: 0.003, z: surface },
    { x: 0.021, y: -0.004, z: surface },
    { x: -0.03, y: 0.012, z: surface },
  ];
  const cases: [string, FilamentSet][] = [
    [
      'a tilted ring filament',
      transformFilaments(
        coilFilaments(parseCoil({ kind: 'ring', radius: 0.02, wireRadius: 5e-4 })),
        { x: 0.003, z: 0.004, tiltX: 25, tiltY: -40, yaw: 10 },
      ),
    ],
    [
      'a 3D path',
      transformFilaments(
        coilFilaments(
          parseCoil({
            kind: 'path',
            closed: true,
            conductor: { type: 'round', diameter: 1e-3 },
            points: [
              { x: 0, y: 0, z: 0 },
              { x: 0.03, y: 0, z: 0.004 },
              { x: 0.03, y: 0.02, z: 0.002 },
              { x: -0.01, y: 0.025, z: 0.008 },
            ],
          }),
        ),
        { z: 0.002 },
      ),
    ],
  ];
  for (const [what, set] of cases) {
    it(`${what}: with mur → ∞ the tangential field on the plate surface vanishes`, () => {
      const images = ferriteImages(set, backing);
      for (const p of probes) {
        const alone = field(set, p);
        const both = field(union(set, images), p);
        const scale = Math.hypot(alone.x, alone.y);
        expectNear(both.x, 0, tolerance * scale, `${what} at ${JSON.stringify(p)}: Bx`, true);
        expectNear(both.y, 0, tolerance * scale, `${what} at ${JSON.stringify(p)}: By`, true);
        // ...and the normal field doubles (flux is drawn into the plate).
        expectNear(both.z, 2 * alone.z, 2 * tolerance, `${what}: Bz doubles`);
      }
    });
  }
  it('the image of a coaxial ring raises L and M for coils on the same side', () => {
    const R = 0.02;
    const tx = coilFilaments(parseCoil({ kind: 'ring', radius: R, wireRadius: 5e-4 }));
    const image = ferriteImages(tx, { mur: 1e5, distance: 0.002 }).rings[0];
    const signed = (ring: RingFilament, z: number) =>
      ring.weight * ring.normal.z * maxwellStdlib(R, ring.radius, Math.abs(ring.center.z - z));
    // L: the Tx ring's self term gains its mutual with its image (4 mm below it).
    const lSelf = MU0 * R * (Math.log((8 * R) / 5e-4) - 1.75);
    const lGain = signed(image, 0);
    expect(lGain, `image adds ${lGain} H to L = ${lSelf} H`).toBeGreaterThan(0);
    // M with an Rx ring 5 mm above: the image adds flux of the same sign.
    const m0 = maxwellStdlib(R, 0.015, 0.005);
    const m1 = m0 + signed(image, 0.005);
    expect(m1, `M with backing ${m1} H vs without ${m0} H`).toBeGreaterThan(m0);
  });
  it('the gain grows with mur (fast-check, seed 42)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 1e5, noNaN: true }),
        fc.double({ min: 1, max: 1e5, noNaN: true }),
        (m1, m2) => {
          const set = coilFilaments(parseCoil({ kind: 'ring', radius: 0.02, wireRadius: 5e-4 }));
          const gain = (mur: number) =>
            ferriteImages(set, { mur, distance: 0.001 }).rings[0]?.weight ?? 0;
          if (m1 < m2) expect(gain(m1)).toBeLessThanOrEqual(gain(m2));
        },
      ),
      { seed: 42, numRuns: 100 },
    );
  });
});
