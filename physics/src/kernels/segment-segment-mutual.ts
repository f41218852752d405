import type { Vec3 } from '../filaments';
import { adaptiveSegmentQuadrature } from './adaptive-segment-quadrature';
import { MU0 } from './mu0';
import { pointSegmentDistance } from './point-segment-distance';
import { segmentLogIntegral } from './segment-log-integral';

/** Directions closer to parallel than this (|t1 x t2|) use the parallel closed form. */
const PARALLEL = 1e-12;

/** ξ asinh(ξ/d) - sqrt(ξ^2 + d^2): second antiderivative of 1/sqrt(ξ^2 + d^2). */
function parallelKernel(xi: number, d: number): number {
  if (d === 0) return xi === 0 ? 0 : Math.abs(xi) * (Math.log(Math.abs(xi)) - 1);
  return xi * Math.asinh(xi / d) - Math.hypot(xi, d);
}

/**
 * Mutual (partial) inductance of two straight current filaments in 3D (H).
 *
 * Method: Neumann's formula M = (mu0 / 4π) t1·t2 ∫∫ dl1 dl2 / r. Perpendicular filaments give 0.
 * Parallel filaments use the closed form Σ ± [ξ asinh(ξ/d) - sqrt(ξ^2 + d^2)] over the four end
 * differences (Campbell; Grover ch. 5). Filaments meeting at a common end use Grover's closed form
 * 2 cos ε [l atanh(m / (l + R)) + m atanh(l / (m + R))]. Otherwise the inner integral is the
 * analytic segment potential (`segmentLogIntegral`) and the outer one Gauss–Legendre panels
 * graded by the distance to the other filament (`adaptiveSegmentQuadrature`).
 *
 * References: F. Neumann, 1845; G. A. Campbell, "Mutual inductances of circuits composed of
 * straight
 * wires", Phys. Rev. 5, 1915; F. W. Grover, Inductance Calculations, 1946, ch. 5 and 18.
 *
 * @param a1 - start of filament 1 (current flows a1 -> b1), m.
 * @param b1 - end of filament 1, m.
 * @param a2 - start of filament 2, m.
 * @param b2 - end of filament 2, m.
 * @returns M in henries; segments that overlap or cross give a RangeError.
 *
 * @example
 * // two parallel 100 mm filaments 10 mm apart:
 * segmentSegmentMutual(o, { x: 0.1, y: 0, z: 0 }, { x: 0, y: 0.01, z: 0 }, { x: 0.1, y: 0.01, z: 0
 * });
 * // ≈ 4.6e-8 H
 */
export function segmentSegmentMutual(a1: Vec3, b1: Vec3, a2: Vec3, b2: Vec3): number {
  let l1 = Math.hypot(b1.x - a1.x, b1.y - a1.y, b1.z - a1.z);
  let l2 = Math.hypot(b2.x - a2.x, b2.y - a2.y, b2.z - a2.z);
  if (!(l1 > 0) || !(l2 > 0) || !Number.isFinite(l1 + l2)) {
    throw new RangeError('segment length: must be a finite number > 0, in m');
  }
  // Source = longer segment (analytic), path = shorter (quadrature).
  let [sa, sb, pa, pb] = [a1, b1, a2, b2];
  if (l2 > l1) {
    [sa, sb, pa, pb] = [a2, b2, a1, b1];
    [l1, l2] = [l2, l1];
  }
  const tx = (sb.x - sa.x) / l1;
  const ty = (sb.y - sa.y) / l1;
  const tz = (sb.z - sa.z) / l1;
  const ux = (pb.x - pa.x) / l2;
  const uy = (pb.y - pa.y) / l2;
  const uz = (pb.z - pa.z) / l2;
  const cos = tx * ux + ty * uy + tz * uz;
  const cross = Math.hypot(ty * uz - tz * uy, tz * ux - tx * uz, tx * uy - ty * ux);
  if (cross > PARALLEL && Math.abs(cos) < 1e-15) return 0;
  const scale = MU0 / (4 * Math.PI);
  if (cross <= PARALLEL) {
    // Positions along the common direction t, and the distance between the lines.
    const dx = pa.x - sa.x;
    const dy = pa.y - sa.y;
    const dz = pa.z - sa.z;
    const along = dx * tx + dy * ty + dz * tz;
    const d = Math.hypot(dx - along * tx, dy - along * ty, dz - along * tz);
    const b1s = along;
    const b2s = along + cos * l2;
    const lo = Math.min(b1s, b2s);
    const hi = Math.max(b1s, b2s);
    // Collinear overlap: the filament integral diverges.
    if (d < 1e-12 * l1 && hi > 0 && lo < l1) {
      throw new RangeError(
        'segments overlap: coincident filaments have no finite mutual inductance',
      );
    }
    const dd = d < 1e-12 * l1 ? 0 : d;
    const sum =
      parallelKernel(hi, dd) -
      parallelKernel(lo, dd) -
      parallelKernel(hi - l1, dd) +
      parallelKernel(lo - l1, dd);
    return scale * Math.sign(cos) * sum;
  }
  const shared = sharedEnd(sa, sb, pa, pb, l1);
  if (shared) {
    // Directions pointing away from the common vertex.
    const [e1, e2] = shared;
    const cosE = (e1 * e2 < 0 ? -1 : 1) * cos;
    const R = Math.sqrt(Math.max(l1 * l1 + l2 * l2 - 2 * l1 * l2 * cosE, 0));
    const sum = 2 * (l1 * Math.atanh(l2 / (l1 + R)) + l2 * Math.atanh(l1 / (l2 + R)));
    return scale * cos * sum;
  }
  const integral = adaptiveSegmentQuadrature(
    l2,
    (s) =>
      pointSegmentDistance(
        sa.x,
        sa.y,
        sa.z,
        tx,
        ty,
        tz,
        l1,
        pa.x + s * ux,
        pa.y + s * uy,
        pa.z + s * uz,
      ),
    (s) =>
      segmentLogIntegral(
        sa.x,
        sa.y,
        sa.z,
        tx,
        ty,
        tz,
        l1,
        pa.x + s * ux,
        pa.y + s * uy,
        pa.z + s * uz,
      ),
  );
  return scale * cos * integral;
}

/**
 * When the segments share an end point (to 1e-12 of the longer length), the signs (+1 start,
 * -1 end) telling which end of each it is; otherwise null.
 */
function sharedEnd(sa: Vec3, sb: Vec3, pa: Vec3, pb: Vec3, l1: number): [number, number] | null {
  const eps = 1e-12 * l1;
  const near = (p: Vec3, q: Vec3) =>
    Math.abs(p.x - q.x) + Math.abs(p.y - q.y) + Math.abs(p.z - q.z) <= eps;
  if (near(sa, pa)) return [1, 1];
  if (near(sa, pb)) return [1, -1];
  if (near(sb, pa)) return [-1, 1];
  if (near(sb, pb)) return [-1, -1];
  return null;
}
