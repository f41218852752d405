import { describe, expect, it } from 'vitest';
import type { PathFilament, RingFilament, Vec3 } from '../filaments';
import { expectNear } from '../testing/expect-near';
import { gaussLegendre } from './gauss-legendre';
import { MU0 } from './mu0';
import { pathPathMutual } from './path-path-mutual';
import { pathRingMutual } from './path-ring-mutual';
import { polylineSelf } from './polyline-self';
import { ringRingMutual } from './ring-ring-mutual';
import { ringSelf } from './ring-self';
import { segmentSegmentMutual } from './segment-segment-mutual';
import { segmentSelf } from './segment-self';

const v = (x: number, y: number, z: number): Vec3 => ({ x, y, z });

/** Brute-force Neumann for two segments: composite Gauss–Legendre, 64 panels x 16 points. */
function bruteSegments(a1: Vec3, b1: Vec3, a2: Vec3, b2: Vec3): number {
  const g = gaussLegendre(16);
  const P = 64;
  let sum = 0;
  const d1 = v(b1.x - a1.x, b1.y - a1.y, b1.z - a1.z);
  const d2 = v(b2.x - a2.x, b2.y - a2.y, b2.z - a2.z);
  const dot = d1.x * d2.x + d1.y * d2.y + d1.z * d2.z;
  for (let p = 0; p < P; p++)
    for (let i = 0; i < 16; i++) {
      const s = (p + 0.5 + 0.5 * g.nodes[i]) / P;
      for (let q = 0; q < P; q++)
        for (let j = 0; j < 16; j++) {
          const t = (q + 0.5 + 0.5 * g.nodes[j]) / P;
          const r = Math.hypot(
            a1.x + s * d1.x - a2.x - t * d2.x,
            a1.y + s * d1.y - a2.y - t * d2.y,
            a1.z + s * d1.z - a2.z - t * d2.z,
          );
          sum += (g.weights[i] * g.weights[j]) / (4 * P * P) / r;
        }
    }
  return (MU0 / (4 * Math.PI)) * dot * sum;
}

describe('straight filaments against brute-force Neumann', () => {
  // Separations >= 1/20 of the lengths: 64 x 16-point panels reach ~1e-12; tolerance 1e-9.
  const cases: Array<[string, Vec3, Vec3, Vec3, Vec3]> = [
    ['skew', v(0, 0, 0), v(0.1, 0, 0), v(0.02, 0.01, 0.005), v(0.05, 0.08, 0.02)],
    ['parallel offset', v(0, 0, 0), v(0.1, 0, 0), v(0.03, 0.005, 0), v(0.09, 0.005, 0)],
    ['antiparallel', v(0, 0, 0), v(0.05, 0, 0), v(0.08, 0.01, 0.002), v(0.01, 0.01, 0.002)],
    ['collinear apart', v(0, 0, 0), v(0.05, 0, 0), v(0.06, 0, 0), v(0.1, 0, 0)],
  ];
  it.each(cases)('%s', (label, a1, b1, a2, b2) => {
    expectNear(segmentSegmentMutual(a1, b1, a2, b2), bruteSegments(a1, b1, a2, b2), 1e-9, label);
  });
  it('meeting at a corner: Grover closed form vs graded quadrature of the same integral', () => {
    // Collinear continuation (F. W. Grover, 1946, ch. 5): ∫∫ 1/(s + t) = (l+m) ln(l+m) - l ln l - m
    // ln m.
    const [l, m] = [0.03, 0.05];
    const want =
      (MU0 / (4 * Math.PI)) * ((l + m) * Math.log(l + m) - l * Math.log(l) - m * Math.log(m));
    expectNear(
      segmentSegmentMutual(v(0, 0, 0), v(l, 0, 0), v(l, 0, 0), v(l + m, 0, 0)),
      want,
      1e-13,
      'collinear corner',
    );
    // Perpendicular corner: zero (t1 · t2 = 0).
    expect(segmentSegmentMutual(v(0, 0, 0), v(l, 0, 0), v(l, 0, 0), v(l, m, 0))).toBe(0);
  });
  it('rejects overlapping collinear segments', () => {
    expect(() => segmentSegmentMutual(v(0, 0, 0), v(1, 0, 0), v(0.5, 0, 0), v(2, 0, 0))).toThrow(
      /overlap/,
    );
  });
});

describe('partial and loop self-inductance', () => {
  it('straight wire tends to (mu0 l / 2π)(ln(2l/a) - 3/4) for l >> a', () => {
    // Rosa 1908; next term of order a/l: l/a = 1e4 gives ~1e-4 of the log-sized bracket.
    const [l, a] = [1, 1e-4];
    const want = ((MU0 * l) / (2 * Math.PI)) * (Math.log((2 * l) / a) - 0.75);
    expectNear(segmentSelf(l, a * Math.exp(-0.25)), want, 2e-4, 'segmentSelf');
  });
  it(
    'square loop of round wire: (2 mu0 s / π)(ln(s/a) - 0.524), ' +
      'Grover 1946 ch. 7 (from memory)',
    () => {
      // The constant follows from Rosa's partial inductances: ln 2 - 3/4 - asinh(1) + √2 - 1.
      // Model and formula differ by O(a/s): s/a = 200, tolerance 2e-3.
      const [s, a] = [0.1, 5e-4];
      const square: PathFilament = {
        points: [v(0, 0, 0), v(s, 0, 0), v(s, s, 0), v(0, s, 0)],
        closed: true,
        wireRadius: a,
        weight: 1,
      };
      const want = ((2 * MU0 * s) / Math.PI) * (Math.log(s / a) - 0.524);
      expectNear(polylineSelf(square), want, 2e-3, 'square');
      // High frequency: -0.774 (surface current).
      expectNear(
        polylineSelf(square, { highFrequency: true }),
        ((2 * MU0 * s) / Math.PI) * (Math.log(s / a) - 0.774),
        2e-3,
        'square HF',
      );
    },
  );
  it(
    'a finely cut circle tends to the ring formula mu0 R (ln(8R/a) - 7/4) ' +
      '(Rosa & Grover 1912)',
    () => {
      // Polygon error O(1/n^2) plus thin-ring error O((a/R)^2) = 6e-4 · small constant: 2e-5 at n =
      // 1024.
      const [R, a, n] = [0.02, 5e-4, 1024];
      const circle: PathFilament = {
        points: Array.from({ length: n }, (_, i) =>
          v(R * Math.cos((2 * Math.PI * i) / n), R * Math.sin((2 * Math.PI * i) / n), 0),
        ),
        closed: true,
        wireRadius: a,
        weight: 1,
      };
      expectNear(polylineSelf(circle), ringSelf(R, a), 2e-5, 'polygon vs ring');
    },
  );
});

describe('polygons and rings', () => {
  const ring = (r: number, c: Vec3): RingFilament => ({
    center: c,
    normal: v(0, 0, 1),
    radius: r,
    wireRadius: 1e-4,
    weight: 1,
  });
  const polygon = (r: number, n: number, c: Vec3): PathFilament => ({
    points: Array.from({ length: n }, (_, i) =>
      v(c.x + r * Math.cos((2 * Math.PI * i) / n), c.y + r * Math.sin((2 * Math.PI * i) / n), c.z),
    ),
    closed: true,
    wireRadius: 1e-4,
    weight: 1,
  });
  it(
    'inscribed polygons converge to the ring pair at second order ' +
      '(ring–polygon and polygon–polygon)',
    () => {
      const want = ringRingMutual(ring(0.02, v(0, 0, 0)), ring(0.015, v(0.004, 0, 0.003)));
      const err = (n: number) => [
        Math.abs(
          pathRingMutual(polygon(0.02, n, v(0, 0, 0)), ring(0.015, v(0.004, 0, 0.003))) - want,
        ) / want,
        Math.abs(
          pathPathMutual(polygon(0.02, n, v(0, 0, 0)), polygon(0.015, n, v(0.004, 0, 0.003))) -
            want,
        ) / want,
      ];
      const [e64, e256] = [err(64), err(256)];
      // Quadrupling n divides an O(1/n^2) error by 16; allow 12–20.
      for (const k of [0, 1]) {
        const ratio = e64[k] / e256[k];
        expect(ratio, `convergence ratio ${ratio} (errors ${e64[k]}, ${e256[k]})`).toBeGreaterThan(
          12,
        );
        expect(ratio).toBeLessThan(20);
      }
    },
  );
  it('ring vector potential along a polygon matches Neumann with a 4096-gon ring (1e-6)', () => {
    const p = polygon(0.02, 12, v(0, 0, 0));
    const r = ring(0.01, v(0.005, 0.002, 0.004));
    const viaRing = pathRingMutual(p, r);
    const viaSegments = pathPathMutual(p, polygon(0.01, 4096, v(0.005, 0.002, 0.004)));
    // The 4096-gon stands in for the ring to (2π/4096)^2 / 6 ≈ 4e-7.
    expectNear(viaSegments, viaRing, 1e-6, 'reciprocity');
  });
});
