import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { PathFilament, RingFilament, Vec3 } from '../filaments';
import { poseRotation } from '../pose/pose-rotation';
import { transformFilaments } from '../pose/transform-filaments';
import { expectNear } from '../testing/expect-near';
import { gaussLegendre } from './gauss-legendre';
import { inPlaneBasis } from './in-plane-basis';
import { MU0 } from './mu0';
import { packedSegments } from './packed-segments';
import { pathRingMutual } from './path-ring-mutual';
import { pathSegments } from './path-segments';
import { pathStackMutual } from './path-stack-mutual';
import { ringStackFactor, type RingStack } from './ring-stack-factor';
import { ringStackTable } from './ring-stack-table';

// Demo geometry of our own: three concentric 40 x 30 mm rectangular turns (one with chamfered
// corners) against a four-ring receiver of 6–12 mm radius.
const v = (x: number, y: number, z = 0): Vec3 => ({ x, y, z });
const rectangle = (a: number, b: number, cut = 0): PathFilament => ({
  points:
    cut > 0
      ? [v(a, -b + cut), v(a, b - cut), v(a - cut, b), v(-a + cut, b), v(-a, b - cut)].concat([
          v(-a, -b + cut),
          v(-a + cut, -b),
          v(a - cut, -b),
        ])
      : [v(a, -b), v(a, b), v(-a, b), v(-a, -b)],
  closed: true,
  wireRadius: 4e-4,
  weight: 1,
});
const tx: PathFilament[] = [
  rectangle(0.02, 0.015, 0.002),
  rectangle(0.018, 0.013),
  rectangle(0.016, 0.011),
];
const radii = [0.006, 0.008, 0.01, 0.012];
const stack: RingStack = {
  r: Float64Array.from(radii),
  z: new Float64Array(radii.length),
  w: Float64Array.of(1, 1, 1, 0.5),
};
const rxRings: RingFilament[] = radii.map((r, i) => ({
  center: v(0, 0),
  normal: v(0, 0, 1),
  radius: r,
  wireRadius: 2.5e-4,
  weight: stack.w[i],
}));
const segments = packedSegments(tx);
const direct = { factor: (rho: number, z: number) => ringStackFactor(stack, rho * rho, z) };
const table = ringStackTable(stack, { clearance: 6.5e-4 });

interface Pose {
  x: number;
  y: number;
  z: number;
  tiltX: number;
  tiltY: number;
}
const placement = (p: Pose) => ({ rows: poseRotation(p), t: { x: p.x, y: p.y, z: p.z } });

/**
 * Neumann's double integral done by brute force, sharing no kernel with the fast path:
 * (mu0 / 4π) Σ dl · dl' / r with 8-point Gauss–Legendre panels of at most 0.5 mm on the sides
 * and the 512-point trapezoid rule around each ring (geometric convergence: at a 1.3 mm gap from a
 * 12 mm ring its error is ~e^(-512 · 1.3 / 12), nil; panels of 0.4 gaps leave ~1e-16).
 */
function neumann(rings: readonly RingFilament[]): number {
  const rule = gaussLegendre(8);
  const n = 512;
  let sum = 0;
  for (const ring of rings) {
    const [u, w] = inPlaneBasis(ring.normal);
    const ps: number[] = [];
    for (let j = 0; j < n; j++) {
      const t = (2 * Math.PI * j) / n;
      const [c, s] = [Math.cos(t), Math.sin(t)];
      ps.push(
        ring.center.x + ring.radius * (c * u.x + s * w.x),
        ring.center.y + ring.radius * (c * u.y + s * w.y),
        ring.center.z + ring.radius * (c * u.z + s * w.z),
        ring.radius * (-s * u.x + c * w.x),
        ring.radius * (-s * u.y + c * w.y),
        ring.radius * (-s * u.z + c * w.z),
      );
    }
    for (const path of tx) {
      for (const [a, b] of pathSegments(path)) {
        const L = Math.hypot(b.x - a.x, b.y - a.y, b.z - a.z);
        const panels = Math.ceil(L / 5e-4);
        const [tx1, ty1, tz1] = [(b.x - a.x) / L, (b.y - a.y) / L, (b.z - a.z) / L];
        for (let k = 0; k < panels; k++) {
          for (let g = 0; g < 8; g++) {
            const s = (L / panels) * (k + 0.5 + 0.5 * rule.nodes[g]);
            const wt = (0.5 * L * rule.weights[g]) / panels;
            const [x, y, z] = [a.x + s * tx1, a.y + s * ty1, a.z + s * tz1];
            let inner = 0;
            for (let j = 0; j < ps.length; j += 6) {
              const r = Math.hypot(x - ps[j], y - ps[j + 1], z - ps[j + 2]);
              inner += (tx1 * ps[j + 3] + ty1 * ps[j + 4] + tz1 * ps[j + 5]) / r;
            }
            sum += path.weight * ring.weight * wt * inner * ((2 * Math.PI) / n);
          }
        }
      }
    }
  }
  return (MU0 / (4 * Math.PI)) * sum;
}

/** The old route: one distance-graded quadrature per ring and side (segmentRingMutual). */
function adaptive(rings: readonly RingFilament[]): number {
  let sum = 0;
  for (const path of tx) for (const ring of rings) sum += pathRingMutual(path, ring);
  return sum;
}

const placedRings = (p: Pose) =>
  transformFilaments({ rings: rxRings, paths: [] }, p).rings as RingFilament[];
const peak = adaptive(placedRings({ x: 0, y: 0, z: 0.003, tiltX: 0, tiltY: 0 }));

/** Relative to the aligned M: off-centre poses pass through zero, where ratios say nothing. */
function expectNearPeak(label: string, got: number, want: number, tol: number): void {
  expectNear(got, want, tol * Math.abs(peak), `${label} (tolerance ${tol} of the peak M)`, true);
}

// Rx up to 12 mm radius tilted up to 5° dips 1.05 mm: a 3 mm gap keeps the wires 1.3 mm apart.
const pose = fc.record({
  x: fc.double({ min: -0.02, max: 0.02, noNaN: true }),
  y: fc.double({ min: -0.02, max: 0.02, noNaN: true }),
  z: fc.double({ min: 0.003, max: 0.012, noNaN: true }),
  tiltX: fc.double({ min: -5, max: 5, noNaN: true }),
  tiltY: fc.double({ min: -5, max: 5, noNaN: true }),
});

describe('pathStackMutual', () => {
  it('agrees with the per-ring adaptive route, direct and tabulated (fast-check, seeded)', () => {
    // Both routes are converged to ~1e-12; 1e-9 is the route's stated panel error (ratio 2,
    // 10 points) with margin.
    fc.assert(
      fc.property(pose, (p) => {
        const want = adaptive(placedRings(p));
        const opts = { ratio: 2, points: 10 };
        expectNearPeak(
          'direct',
          pathStackMutual(segments, stack, placement(p), direct, opts),
          want,
          1e-9,
        );
        expectNearPeak(
          'table',
          pathStackMutual(segments, stack, placement(p), table, opts),
          want,
          1e-9,
        );
        expectNearPeak(
          'defaults',
          pathStackMutual(segments, stack, placement(p), table),
          want,
          1e-9,
        );
      }),
      { seed: 42, numRuns: 30 },
    );
  });
  it('agrees with the Neumann brute force to 1e-9 of the peak (fast-check, seeded)', () => {
    fc.assert(
      fc.property(pose, (p) => {
        const got = pathStackMutual(segments, stack, placement(p), table, { ratio: 2, points: 10 });
        expectNearPeak(`pose ${JSON.stringify(p)}`, got, neumann(placedRings(p)), 1e-9);
      }),
      { seed: 7, numRuns: 4 },
    );
  });
  it('reverses sign with the current and vanishes far away', () => {
    const p = { x: 0.004, y: -0.002, z: 0.004, tiltX: 3, tiltY: 0 };
    const reversed = packedSegments(tx.map((path) => ({ ...path, weight: -1 })));
    const m = pathStackMutual(segments, stack, placement(p), table);
    expect(pathStackMutual(reversed, stack, placement(p), table)).toBe(-m);
    const far = pathStackMutual(segments, stack, placement({ ...p, z: 10 }), table);
    // Dipole limit of two coaxial loops, M = mu0 A1 A2 cos(tilt) / (2π d^3) (Jackson §5.6):
    // Tx turn areas 1.192e-3 + 9.36e-4 + 7.04e-4 m², Rx π Σ w r²; corrections (size / d)² ~ 1e-6.
    const areaRx = Math.PI * radii.reduce((s, r, i) => s + stack.w[i] * r * r, 0);
    const dipole =
      (MU0 * 2.832e-3 * areaRx * Math.cos((3 * Math.PI) / 180)) / (2 * Math.PI * 10 ** 3);
    expect(Math.abs(far / dipole - 1)).toBeLessThan(1e-4);
  });
});
