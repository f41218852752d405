import type { Vec3 } from '../filaments';
import { gaussLegendre } from './gauss-legendre';
import { ringStackDistance } from './ring-stack-distance';
import type { RingStack } from './ring-stack-factor';

/** Numbers per packed segment: start x, y, z, end x, y, z, weight. */
export const SEGMENT_STRIDE = 7;

/** Where the stack sits: its frame's axes as columns of R (rows r0, r1, r2) and its origin t. */
export interface StackPlacement {
  rows: readonly [Vec3, Vec3, Vec3];
  t: Vec3;
}

/** The stack's potential factor G(rho, z) (H/m^2): `ringStackFactor` or a `ringStackTable`. */
export interface StackField {
  factor(rho: number, z: number): number;
}

/** Options of the path–stack integral. */
export interface PathStackOptions {
  /** Gauss–Legendre points per panel (default 8). */
  points?: number;
  /** Split a panel while its length exceeds `ratio` times its midpoint's distance (default 1). */
  ratio?: number;
}

/** Panels deeper than 48 bisections are 2^-48 of a side: far below any physical detail. */
const MAX_DEPTH = 48;

/**
 * Mutual inductance of straight segments (closed polylines, packed) and a coaxial ring stack in
 * any placement (H), weights included — a polygon Tx against a circular-ring Rx.
 *
 * Method: M = ∮ A_stack · dl with the stack's summed potential A = G (e_z x q) in its own frame
 * (`ringStackFactor`, or a table of it). Each segment is carried into the stack's frame once,
 * q(s) = q0 + s u; since (e_z x q(s)) · u = (e_z x q0) · u along the whole segment, its share is
 * that constant times ∫ G(rho(s), z(s)) ds. The integral uses Gauss–Legendre panels graded by the
 * distance to the nearest ring (`ringStackDistance`): a panel is bisected while longer than
 * `ratio` times that distance at its midpoint. The integrand's complex singularities lie where
 * the complexified distance to a ring vanishes, at least that distance off the real line, so
 * with ratio 1 they stay outside the Bernstein ellipse of parameter 2 + √3 about each panel and
 * 8 points leave ~(2 + √3)^-16 ≈ 7e-10 of the panel's share (the defaults); with ratio 2 the
 * parameter is ≥ 1 + √2 and n points leave ~(1 + √2)^-2n. Sides far from the stack stay one
 * panel. One field evaluation per quadrature point serves all the rings, instead of one graded
 * quadrature per ring and side; with a `ringStackTable` that evaluation is one polynomial.
 *
 * References: J. D. Jackson, Classical Electrodynamics, 3rd ed., 1999, eq. 5.37; L. N. Trefethen,
 * Approximation Theory and Approximation Practice, SIAM, 2013, ch. 19; S. Babic et al., IEEE
 * Trans. Magn. 46(9), 2010 (the vector-potential single integral).
 *
 * @param segments - packed segments in the common frame (`SEGMENT_STRIDE` numbers each), m.
 * @param stack - the rings in the stack's own frame, m (for the distance grading).
 * @param placement - the stack's rotation and origin in the common frame.
 * @param field - G(rho, z) of the stack, H/m^2 (`ringStackFactor` or `ringStackTable`).
 * @param options - points per panel, grading ratio.
 * @returns M in henries.
 *
 * @example pathStackMutual(rectTurns, rx20, placed, table); // ≈ 5.8e-6 H at 3 mm
 */
export function pathStackMutual(
  segments: Float64Array,
  stack: RingStack,
  placement: StackPlacement,
  field: StackField,
  options: PathStackOptions = {},
): number {
  const rule = gaussLegendre(options.points ?? 8);
  const ratio = options.ratio ?? 1;
  const [r0, r1, r2] = placement.rows;
  const { t } = placement;
  const nodes = rule.nodes;
  const weights = rule.weights;
  const starts: number[] = [];
  const ends: number[] = [];
  const depths: number[] = [];
  let total = 0;
  for (let k = 0; k + SEGMENT_STRIDE <= segments.length; k += SEGMENT_STRIDE) {
    // Into the stack's frame: q = R^T (p - t).
    const ax = segments[k] - t.x;
    const ay = segments[k + 1] - t.y;
    const az = segments[k + 2] - t.z;
    const dx = segments[k + 3] - segments[k];
    const dy = segments[k + 4] - segments[k + 1];
    const dz = segments[k + 5] - segments[k + 2];
    const L = Math.sqrt(dx * dx + dy * dy + dz * dz);
    if (!(L > 0)) continue;
    const qx = r0.x * ax + r1.x * ay + r2.x * az;
    const qy = r0.y * ax + r1.y * ay + r2.y * az;
    const qz = r0.z * ax + r1.z * ay + r2.z * az;
    const ux = (r0.x * dx + r1.x * dy + r2.x * dz) / L;
    const uy = (r0.y * dx + r1.y * dy + r2.y * dz) / L;
    const uz = (r0.z * dx + r1.z * dy + r2.z * dz) / L;
    const ow = qx * uy - qy * ux;
    // A segment through the axis, or along a meridian, has no share: (e_z x q) ⟂ u.
    if (ow === 0) continue;
    let integral = 0;
    starts.push(0);
    ends.push(L);
    depths.push(0);
    while (starts.length > 0) {
      const s0 = starts.pop() as number;
      const s1 = ends.pop() as number;
      const depth = depths.pop() as number;
      const mid = 0.5 * (s0 + s1);
      const half = 0.5 * (s1 - s0);
      const mx = qx + mid * ux;
      const my = qy + mid * uy;
      if (
        depth < MAX_DEPTH &&
        2 * half > ratio * ringStackDistance(stack, Math.sqrt(mx * mx + my * my), qz + mid * uz)
      ) {
        // Right half first on the stack, so panels come left to right (table lookups stay local).
        starts.push(mid, s0);
        ends.push(s1, mid);
        depths.push(depth + 1, depth + 1);
        continue;
      }
      let sum = 0;
      for (let i = 0; i < nodes.length; i++) {
        const s = mid + half * nodes[i];
        const x = qx + s * ux;
        const y = qy + s * uy;
        sum += weights[i] * field.factor(Math.sqrt(x * x + y * y), qz + s * uz);
      }
      integral += half * sum;
    }
    total += segments[k + 6] * ow * integral;
  }
  return total;
}
