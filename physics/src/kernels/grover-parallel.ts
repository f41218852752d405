import { requireFinite } from '../guards/require-finite';
import { requireNonNegative } from '../guards/require-non-negative';
import { requirePositive } from '../guards/require-positive';
import { ringPotentialFactor } from './ring-potential-factor';

/** 2^15 nodes on the half circle resolve separations down to ~1e-4 of the radius. */
const MAX_NODES = 32768;

/**
 * Mutual inductance of two parallel circular filaments with lateral offset (H).
 *
 * Method: Grover's single integral for parallel circles, M = ∫_0^{2π} A_phi(R(t), z) r2 (r2 +
 * rho cos t) / R dt with R^2 = rho^2 + r2^2 + 2 rho r2 cos t, written with the factor G = A_phi / R
 * of `ringPotentialFactor` (closed form in K and E, no cancellation). The integrand is even and
 * periodic, so the trapezoidal rule on [0, π] with halved end weights is the full-circle rule; the
 * node count doubles until two sums agree to 1e-11 of the integral of |integrand|.
 *
 * References: F. W. Grover, Inductance Calculations, 1946, ch. 13 (parallel coils with axes
 * displaced), also Proc. IRE 32, 1944; L. N. Trefethen, J. A. C. Weideman, SIAM Review 56(3), 2014.
 *
 * @param r1 - radius of the first ring, m (> 0), centred on the origin, normal +z.
 * @param r2 - radius of the second ring, m (> 0), normal +z.
 * @param rho - lateral distance between the axes, m (>= 0).
 * @param z - axial distance between the planes, m.
 * @returns M in henries (sign follows the geometry: negative when the rings are far apart
 * sideways).
 *
 * @example groverParallel(0.02, 0.02, 0.01, 0.003); // ≈ 5.3e-8 H
 */
export function groverParallel(r1: number, r2: number, rho: number, z: number): number {
  requirePositive('r1', r1, 'm');
  requirePositive('r2', r2, 'm');
  requireNonNegative('rho', rho, 'm');
  requireFinite('z', z, 'm');
  // Path along the smaller ring: its peaks are wider in angle.
  const a = r1 >= r2 ? r1 : r2;
  const b = r1 >= r2 ? r2 : r1;
  const f = (t: number): number => {
    const c = Math.cos(t);
    const rho2 = rho * rho + b * b + 2 * rho * b * c;
    return ringPotentialFactor(a, rho2, z) * b * (b + rho * c);
  };
  let count = 16;
  const ends = 0.5 * (f(0) + f(Math.PI));
  let inner = 0;
  let abs = Math.abs(ends);
  for (let j = 1; j < count; j++) {
    const v = f((Math.PI * j) / count);
    inner += v;
    abs += Math.abs(v);
  }
  let estimate = (2 * Math.PI * (ends + inner)) / count;
  while (count < MAX_NODES) {
    for (let j = 0; j < count; j++) {
      const v = f((Math.PI * (j + 0.5)) / count);
      inner += v;
      abs += Math.abs(v);
    }
    count *= 2;
    const next = (2 * Math.PI * (ends + inner)) / count;
    // 1e-11 of the |integrand| integral: the finer sum is then good to far better (geometric rate).
    if (Math.abs(next - estimate) <= 1e-11 * ((2 * Math.PI * abs) / count)) return next;
    estimate = next;
  }
  throw new RangeError('rings touch or cross: the mutual-inductance integral does not converge');
}
