import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { RingFilament, Vec3 } from '../filaments';
import { expectNear } from '../testing/expect-near';
import { conwayBessel } from './conway-bessel';
import { groverParallel } from './grover-parallel';
import { maxwellCoaxial } from './maxwell-coaxial';
import { neumannRingPair } from './neumann-ring-pair';
import { ringRingMutual } from './ring-ring-mutual';

const unit = (v: Vec3): Vec3 => {
  const s = Math.hypot(v.x, v.y, v.z);
  return { x: v.x / s, y: v.y / s, z: v.z / s };
};
const ring = (r: number, c: Vec3, n: Vec3 = { x: 0, y: 0, z: 1 }, weight = 1): RingFilament => ({
  center: c,
  normal: unit(n),
  radius: r,
  wireRadius: 1e-4,
  weight,
});

describe('ring pairs in any pose against Neumann brute force', () => {
  // The product trapezoid rule with 384^2 angles converges to ~1e-13 for these separations
  // (>= 0.1 of the radius); the single integral is asked for 1e-11 — tolerance 1e-9 covers both.
  const cases: Array<[string, RingFilament, RingFilament]> = [
    [
      'offset and tilt',
      ring(0.02, { x: 0, y: 0, z: 0 }),
      ring(0.015, { x: 0.004, y: 0.002, z: 0.005 }, { x: 0, y: -0.2, z: 1 }),
    ],
    [
      'perpendicular',
      ring(0.02, { x: 0, y: 0, z: 0 }),
      ring(0.01, { x: 0.03, y: 0, z: 0.01 }, { x: 1, y: 0, z: 0 }),
    ],
    [
      'large and small, skew',
      ring(0.3, { x: 0.1, y: -0.05, z: 0 }),
      ring(0.05, { x: -0.1, y: 0.2, z: 0.15 }, { x: 0.3, y: 0.4, z: 1 }),
    ],
    ['parallel offset', ring(0.02, { x: 0, y: 0, z: 0 }), ring(0.02, { x: 0.03, y: 0, z: 0.003 })],
  ];
  it.each(cases)('%s', (label, a, b) => {
    expectNear(ringRingMutual(a, b), neumannRingPair(a, b, 384), 1e-9, label);
  });
});

describe('Grover, Conway (Bessel) and the general single integral agree', () => {
  // Three independent formulations of the same filament quantity. Bessel form: truncation at
  // e^(-27) and 8-point panels give ~1e-10 relative; tolerance 1e-8 against the integral's scale.
  for (const [r1, r2, rho, z] of [
    [0.02, 0.015, 0.01, 0.003],
    [0.02, 0.015, 0.03, 0.003],
    [0.3, 0.2, 0.2, 0.15],
    [0.02, 0.02, 0.05, 0.001],
  ]) {
    it(`r1 ${r1}, r2 ${r2}, rho ${rho}, z ${z}`, () => {
      const g = groverParallel(r1, r2, rho, z);
      const b = ringRingMutual(ring(r1, { x: 0, y: 0, z: 0 }), ring(r2, { x: rho, y: 0, z }));
      const c = conwayBessel(r1, r2, rho, z);
      const scale = maxwellCoaxial(r1, r2, z);
      expectNear(b, g, 1e-11 * scale, 'Babic vs Grover', true);
      expectNear(c, g, 1e-8 * scale, 'Conway vs Grover', true);
    });
  }
});

describe('invariants (fast-check, seeded)', () => {
  const radius = fc.double({ min: 0.005, max: 0.3, noNaN: true });
  const coord = fc.double({ min: -0.2, max: 0.2, noNaN: true });
  const dir = fc.record({
    x: fc.double({ min: -1, max: 1, noNaN: true }),
    y: fc.double({ min: -1, max: 1, noNaN: true }),
    z: fc.double({ min: 0.1, max: 1, noNaN: true }),
  });
  const pair = fc
    .tuple(radius, radius, coord, coord, fc.double({ min: 0.01, max: 0.3, noNaN: true }), dir)
    .map(
      ([r1, r2, x, y, z, n]) =>
        [ring(r1, { x: 0, y: 0, z: 0 }), ring(r2, { x, y, z: z + 0.3 }, n)] as const,
    );

  it('M12 = M21', () => {
    fc.assert(
      fc.property(pair, ([a, b]) => {
        // Swapping the roles changes which ring is the path only for equal radii; 1e-10 of the
        // scale.
        const scale = Math.abs(maxwellCoaxial(a.radius, b.radius, 0.3)) + 1e-30;
        expectNear(ringRingMutual(a, b), ringRingMutual(b, a), 1e-10 * scale, 'M12 vs M21', true);
      }),
      { seed: 42, numRuns: 60 },
    );
  });

  it('rotating both rings about the common z axis changes nothing', () => {
    fc.assert(
      fc.property(pair, fc.double({ min: -Math.PI, max: Math.PI, noNaN: true }), ([a, b], t) => {
        const rot = (v: Vec3): Vec3 => ({
          x: Math.cos(t) * v.x - Math.sin(t) * v.y,
          y: Math.sin(t) * v.x + Math.cos(t) * v.y,
          z: v.z,
        });
        const a2 = { ...a, center: rot(a.center), normal: rot(a.normal) };
        const b2 = { ...b, center: rot(b.center), normal: rot(b.normal) };
        const scale = Math.abs(maxwellCoaxial(a.radius, b.radius, 0.3));
        expectNear(ringRingMutual(a2, b2), ringRingMutual(a, b), 1e-10 * scale, 'rotated', true);
      }),
      { seed: 42, numRuns: 40 },
    );
  });

  it('M -> 0 with distance, and |M| falls as the distance grows', () => {
    fc.assert(
      fc.property(radius, radius, dir, (r1, r2, n) => {
        const at = (d: number) =>
          Math.abs(
            ringRingMutual(
              ring(r1, { x: 0, y: 0, z: 0 }),
              ring(r2, { x: 0.3 * d, y: 0.1 * d, z: d }, n),
            ),
          );
        const far = at(1000 * (r1 + r2));
        expect(far).toBeLessThan(at(10 * (r1 + r2)));
        // Dipole bound mu0 pi r1^2 r2^2 / (2 d^3) times 4 for orientation: M -> 0.
        expect(far).toBeLessThan(
          (4e-7 * Math.PI * Math.PI * r1 ** 2 * r2 ** 2 * 4) / (2 * (1000 * (r1 + r2)) ** 3),
        );
      }),
      { seed: 42, numRuns: 30 },
    );
  });

  it('parallel rings change sign at large lateral offset (coplanar-ish)', () => {
    fc.assert(
      fc.property(radius, radius, (r1, r2) => {
        const z = 0.05 * Math.min(r1, r2);
        expect(groverParallel(r1, r2, 0, z)).toBeGreaterThan(0);
        expect(groverParallel(r1, r2, 3 * (r1 + r2), z)).toBeLessThan(0);
      }),
      { seed: 42, numRuns: 40 },
    );
  });
});

describe('bad input', () => {
  it('names the parameter and its range', () => {
    expect(() => groverParallel(-1, 0.02, 0, 0.01)).toThrow(
      /^r1: must be a finite number > 0, in m \(got -1\)$/,
    );
    expect(() => groverParallel(0.02, 0.02, -1, 0.01)).toThrow(
      /^rho: must be a finite number >= 0, in m/,
    );
    expect(() => conwayBessel(0.02, 0.02, 0, 0)).toThrow(/^z: must be non-zero/);
    expect(() => conwayBessel(0.02, Infinity, 0, 0.01)).toThrow(/r2/);
  });
  it('reports touching rings instead of returning a wrong number', () => {
    const a = ring(0.02, { x: 0, y: 0, z: 0 });
    const b = ring(0.02, { x: 0.04, y: 0, z: 0 });
    expect(() => ringRingMutual(a, b)).toThrow(/touch or cross/);
  });
});
