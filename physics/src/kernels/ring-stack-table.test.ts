import ellipe from '@stdlib/math-base-special-ellipe';
import ellipk from '@stdlib/math-base-special-ellipk';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { expectNear } from '../testing/expect-near';
import { MU0 } from './mu0';
import { ringStackDistance } from './ring-stack-distance';
import { ringStackFactor, type RingStack } from './ring-stack-factor';
import { ringStackTable } from './ring-stack-table';

// Demo geometry of our own: a 20-turn planar spiral of 8–20 mm radius, and a two-layer one.
const spiral: RingStack = {
  r: Float64Array.from({ length: 20 }, (_, i) => 0.008 + (i * 0.012) / 19),
  z: new Float64Array(20),
  w: Float64Array.from({ length: 20 }, (_, i) => (i === 19 ? 0.5 : 1)),
};
const layered: RingStack = {
  r: Float64Array.of(0.01, 0.012, 0.014, 0.01, 0.012, 0.014),
  z: Float64Array.of(0, 0, 0, 0.001, 0.001, 0.001),
  w: Float64Array.of(1, 1, 1, 1, 1, -0.4),
};
/** Conductor centre lines of the other coil stay at least this far from a ring (m). */
const CLEARANCE = 6.5e-4;

describe('ringStackFactor', () => {
  it("is Jackson's A_phi (eq. 5.37, @stdlib K and E) summed over the rings, over rho", () => {
    // Textbook form A_phi = (mu0 / (π k)) sqrt(a / rho) ((1 - k²/2) K - E), m = k²; it cancels
    // only at small k, and these points keep k² > 0.05, so 1e-12 covers its rounding.
    const jackson = (a: number, rho: number, z: number) => {
      const m = (4 * a * rho) / ((a + rho) ** 2 + z * z);
      const k = Math.sqrt(m);
      return (MU0 / (Math.PI * k)) * Math.sqrt(a / rho) * ((1 - m / 2) * ellipk(m) - ellipe(m));
    };
    for (const [rho, z] of [
      [0.012, -0.003],
      [0.02, 0.0015],
      [0.03, -0.006],
      [0.005, 0.002],
    ]) {
      let want = 0;
      for (let i = 0; i < spiral.r.length; i++)
        want += spiral.w[i] * jackson(spiral.r[i], rho, z - spiral.z[i]);
      expectNear(rho * ringStackFactor(spiral, rho * rho, z), want, 1e-12, `rho ${rho}, z ${z}`);
    }
  });
});

describe('ringStackTable', () => {
  const outside = (stack: RingStack) =>
    fc
      .record({
        rho: fc.double({ min: 0, max: 0.12, noNaN: true }),
        z: fc.double({ min: -0.03, max: 0.03, noNaN: true }),
      })
      .filter(({ rho, z }) => ringStackDistance(stack, rho, z) >= CLEARANCE);
  it('matches the direct sum to 1e-10 wherever the other coil can be (fast-check, seeded)', () => {
    // Cells are accepted at 1e-12 of their largest |G| (tail and check points); 1e-10 leaves
    // room for points where G is far below its cell's largest value. A 1e-6 target on M allows
    // 1e-7 (see ringStackTable).
    for (const stack of [spiral, layered]) {
      const table = ringStackTable(stack, { clearance: CLEARANCE });
      fc.assert(
        fc.property(outside(stack), ({ rho, z }) => {
          const want = ringStackFactor(stack, rho * rho, z);
          const got = table.factor(rho, z);
          const err = Math.abs(got - want) / Math.abs(want);
          if (!(err <= 1e-10)) throw new Error(`(${rho}, ${z}): ${got} vs ${want}, ${err}`);
        }),
        { seed: 42, numRuns: 400 },
      );
    }
  });
  it('matches it near the winding, along a path 0.7–3 mm under the rings', () => {
    const table = ringStackTable(spiral, { clearance: CLEARANCE });
    for (let i = 0; i <= 400; i++) {
      const rho = 0.004 + (i * 0.022) / 400;
      const z = -0.0007 - 0.0023 * Math.abs(Math.sin(i));
      expectNear(
        table.factor(rho, z),
        ringStackFactor(spiral, rho * rho, z),
        1e-10,
        `(${rho}, ${z})`,
      );
    }
  });
  it('gives the same numbers whatever order the points are asked in', () => {
    const points = Array.from({ length: 300 }, (_, i) => [
      0.05 * Math.abs(Math.sin(1.7 * i)),
      -0.01 + 0.02 * Math.abs(Math.cos(2.3 * i)),
    ]);
    const a = ringStackTable(spiral, { clearance: CLEARANCE });
    const b = ringStackTable(spiral, { clearance: CLEARANCE });
    const forward = points.map(([r, z]) => a.factor(r, z));
    const backward = [...points].reverse().map(([r, z]) => b.factor(r, z));
    expect(backward.reverse()).toEqual(forward);
  });
  it('sums directly within the clearance and rejects a point on a ring', () => {
    const table = ringStackTable(spiral, { clearance: CLEARANCE });
    const [rho, z] = [spiral.r[5] + 1e-4, 2e-4];
    expect(table.factor(rho, z)).toBe(ringStackFactor(spiral, rho * rho, z));
    expect(table.counts.direct).toBeGreaterThan(0);
    expect(() => table.factor(spiral.r[3], 0)).toThrow(RangeError);
  });
  it('decays like a dipole far away and is exact on the axis (G finite at rho = 0)', () => {
    const table = ringStackTable(spiral, { clearance: CLEARANCE });
    // On the axis A = 0 but G -> mu0 Σ w a² / (4 (a² + z²)^(3/2)) (Jackson 5.37 at rho -> 0).
    let want = 0;
    for (let i = 0; i < spiral.r.length; i++)
      want += (MU0 * spiral.w[i] * spiral.r[i] ** 2) / (4 * (spiral.r[i] ** 2 + 0.04 ** 2) ** 1.5);
    expectNear(table.factor(0, 0.04), want, 1e-10, 'axis');
    // 100 times farther: G ~ 1/r^3 falls by 1e-6; bound 1e-5 allows for the angular factor.
    expect(Math.abs(table.factor(5, 5))).toBeLessThan(1e-5 * Math.abs(table.factor(0.05, 0.05)));
  });
});
