import besselj0 from '@stdlib/math-base-special-besselj0';
import { requireFinite } from '../guards/require-finite';
import { requireNonNegative } from '../guards/require-non-negative';
import { requirePositive } from '../guards/require-positive';
import { besselPairSummary } from './bessel-pair-summary';
import { besselQuadrature } from './bessel-quadrature';
import { MU0 } from './mu0';

/**
 * Mutual inductance of two parallel circular filaments by the Bessel-function (Hankel) form (H).
 *
 * Method: M = mu0 π r1 r2 ∫_0^∞ J1(k r1) J1(k r2) J0(k rho) e^(-k |z|) dk, by composite
 * Gauss–Legendre on [0, 36 / |z|] (`besselQuadrature`); J0, J1 from @stdlib. Needs z ≠ 0; cost
 * grows like (r1 + r2 + rho) / |z|. For one pair Grover's integral is cheaper; the form pays for
 * multi-turn coils (`besselPairSummary`).
 *
 * References: J. T. Conway, "Inductance calculations for noncoaxial coils using Bessel functions",
 * IEEE Trans. Magn. 43(3), 2007.
 *
 * @param r1 - radius of the first ring, m (> 0).
 * @param r2 - radius of the second ring, m (> 0).
 * @param rho - lateral offset of the axes, m (>= 0).
 * @param z - axial distance, m (non-zero).
 * @returns M in henries.
 *
 * @example conwayBessel(0.02, 0.02, 0.01, 0.003); // ≈ 5.3e-8 H, as groverParallel
 */
export function conwayBessel(r1: number, r2: number, rho: number, z: number): number {
  requirePositive('r1', r1, 'm');
  requirePositive('r2', r2, 'm');
  requireNonNegative('rho', rho, 'm');
  requireFinite('z', z, 'm');
  if (z === 0) throw new RangeError('z: must be non-zero for the Bessel form (got 0)');
  const h = Math.abs(z);
  const nodes = besselQuadrature(h, r1 + r2 + rho);
  const s1 = besselPairSummary([{ r: r1, depth: 0, weight: 1 }], nodes.k);
  const s2 = besselPairSummary([{ r: r2, depth: 0, weight: 1 }], nodes.k);
  let sum = 0;
  for (let n = 0; n < nodes.k.length; n++) {
    const k = nodes.k[n];
    sum += nodes.w[n] * s1[n] * s2[n] * besselj0(k * rho) * Math.exp(-k * h);
  }
  return MU0 * Math.PI * sum;
}
