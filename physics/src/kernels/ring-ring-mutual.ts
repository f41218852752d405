import type { RingFilament } from '../filaments';
import { inPlaneBasis } from './in-plane-basis';
import { maxwellCoaxial } from './maxwell-coaxial';
import { ringPotentialFactor } from './ring-potential-factor';

/** Options of the general ring–ring integral. */
export interface RingRingOptions {
  /** Relative tolerance on the trapezoid sums (default 1e-11, see below). */
  tolerance?: number;
}

/** 2^16 nodes resolve rings down to ~1e-4 of their radius apart; closer is contact. */
const MAX_NODES = 65536;

/**
 * Mutual inductance of two circular filaments in any relative position and orientation (H).
 *
 * Method: the closed-form vector potential of one ring (K and E, `ringPotentialFactor`) is
 * integrated along the other, M = ∮ A1 · dl2 — the single-integral formulation of Babic et al.
 * The integrand is periodic and analytic away from contact, so the trapezoidal rule converges
 * geometrically (Trefethen & Weideman); the node count doubles (reusing every node) until two
 * successive sums differ by less than `tolerance` times the integral of |integrand|, at which
 * point the error of the finer sum is far below that (geometric convergence). The smaller ring is
 * the path: its peaks are wider in angle. Coaxial pairs use Maxwell's closed form. Weights
 * multiply.
 *
 * References: S. Babic, F. Sirois, C. Akyel, C. Girardi, "Mutual inductance calculation between
 * circular filaments arbitrarily positioned in space: alternative to Grover's formula", IEEE Trans.
 * Magn. 46(9), 2010; L. N. Trefethen, J. A. C. Weideman, "The exponentially convergent trapezoidal
 * rule", SIAM Review 56(3), 2014.
 *
 * @param a - first ring (m, unit normal; current right-handed about its normal).
 * @param b - second ring.
 * @param options - tolerance.
 * @returns M in henries (weights included); ~1e-12 relative away from contact.
 * @throws RangeError when the rings touch or cross (no convergence within 65536 nodes).
 *
 * @example
 * // 20 mm and 15 mm rings, second 5 mm up, 4 mm aside, tilted 10° about x:
 * ringRingMutual(ringA, ringB); // ≈ 1.8e-8 H
 */
export function ringRingMutual(
  a: RingFilament,
  b: RingFilament,
  options: RingRingOptions = {},
): number {
  const tol = options.tolerance ?? 1e-11;
  const src = a.radius >= b.radius ? a : b;
  const path = src === a ? b : a;
  const n = src.normal;
  const np = path.normal;
  const dx0 = path.center.x - src.center.x;
  const dy0 = path.center.y - src.center.y;
  const dz0 = path.center.z - src.center.z;
  const dot = n.x * np.x + n.y * np.y + n.z * np.z;
  const axial = dx0 * n.x + dy0 * n.y + dz0 * n.z;
  const off2 = dx0 * dx0 + dy0 * dy0 + dz0 * dz0 - axial * axial;
  // Normals parallel to 1e-15 and centres on the common axis to 1e-14 of the radius: coaxial.
  if (Math.abs(Math.abs(dot) - 1) < 1e-15 && off2 < 1e-28 * src.radius * src.radius) {
    return Math.sign(dot) * a.weight * b.weight * maxwellCoaxial(src.radius, path.radius, axial);
  }
  const [u, v] = inPlaneBasis(np);
  const r = path.radius;
  const a0 = src.radius;
  // Integrand at angle t: G(q) (n x q) · dl/dt, q = point on path - source centre.
  const f = (t: number): number => {
    const c = Math.cos(t);
    const s = Math.sin(t);
    const qx = dx0 + r * (c * u.x + s * v.x);
    const qy = dy0 + r * (c * u.y + s * v.y);
    const qz = dz0 + r * (c * u.z + s * v.z);
    const tx = r * (-s * u.x + c * v.x);
    const ty = r * (-s * u.y + c * v.y);
    const tz = r * (-s * u.z + c * v.z);
    const z = qx * n.x + qy * n.y + qz * n.z;
    const rho2 = qx * qx + qy * qy + qz * qz - z * z;
    const g = ringPotentialFactor(a0, rho2, z);
    return (
      g * ((n.y * qz - n.z * qy) * tx + (n.z * qx - n.x * qz) * ty + (n.x * qy - n.y * qx) * tz)
    );
  };
  let count = 16;
  let sum = 0;
  let abs = 0;
  for (let j = 0; j < count; j++) {
    const val = f((2 * Math.PI * j) / count);
    sum += val;
    abs += Math.abs(val);
  }
  let estimate = (2 * Math.PI * sum) / count;
  while (count < MAX_NODES) {
    for (let j = 0; j < count; j++) {
      const val = f((2 * Math.PI * (j + 0.5)) / count);
      sum += val;
      abs += Math.abs(val);
    }
    count *= 2;
    const next = (2 * Math.PI * sum) / count;
    const scale = (2 * Math.PI * abs) / count;
    if (Math.abs(next - estimate) <= tol * scale) {
      return a.weight * b.weight * next;
    }
    estimate = next;
  }
  throw new RangeError('rings touch or cross: the mutual-inductance integral does not converge');
}
