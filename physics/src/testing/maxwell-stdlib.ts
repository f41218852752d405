import ellipe from '@stdlib/math-base-special-ellipe';
import ellipk from '@stdlib/math-base-special-ellipk';

/** mu0 = 4π·1e-7 H/m, written out here so the reference shares no constant with the library. */
const MU0 = 4e-7 * Math.PI;

/**
 * Test reference: the mutual inductance of two coaxial circular filaments by Maxwell's formula,
 * evaluated with the registry's `@stdlib/math-base-special-ellipk` and `-ellipe` (parameter
 * m = k²), independent of the library's own elliptic-integral code.
 *
 * Method: M = mu0 sqrt(r1 r2) [(2/k − k) K(k) − (2/k) E(k)], k² = 4 r1 r2 / ((r1 + r2)² + d²).
 * The textbook form cancels when k is small (far or very unequal rings): for m ≥ 0.3 it loses at
 * most ~2 digits, so use it as a reference there and at modest separations.
 *
 * References: J. C. Maxwell, A Treatise on Electricity and Magnetism, 1873, art. 701; DLMF 19.2
 * (K and E).
 *
 * @param r1 radius of the first ring, m
 * @param r2 radius of the second ring, m
 * @param d axial distance between the ring planes, m
 * @returns M in henries (both rings right-handed about the common axis)
 * @example maxwellStdlib(0.02, 0.015, 0.005) // ≈ 2.30e-8 H
 */
export function maxwellStdlib(r1: number, r2: number, d: number): number {
  const m = (4 * r1 * r2) / ((r1 + r2) ** 2 + d * d);
  const k = Math.sqrt(m);
  return MU0 * Math.sqrt(r1 * r2) * ((2 / k - k) * ellipk(m) - (2 / k) * ellipe(m));
}
