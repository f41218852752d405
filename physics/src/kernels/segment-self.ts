import { requirePositive } from '../guards/require-positive';
import { MU0 } from './mu0';

/**
 * Partial self-inductance of a straight conductor of given length and geometric mean distance (H).
 *
 * Method: the mutual inductance of two parallel filaments of length l at the distance g,
 * L = (mu0 / 2π) [l asinh(l/g) - sqrt(l^2 + g^2) + g], with g the cross-section's self geometric
 * mean distance (round wire a e^(-1/4) for uniform current, which reproduces
 * (mu0 l / 2π)(ln(2l/a) - 3/4) for l >> a).
 *
 * References: E. B. Rosa, "The self and mutual inductances of linear conductors", Bull. Bureau of
 * Standards 4(2), 1908; F. W. Grover, Inductance Calculations, 1946, ch. 5 and 7.
 *
 * @param length - conductor length, m (> 0).
 * @param gmd - geometric mean distance of the cross-section, m (> 0).
 * @returns L in henries (partial inductance: closed loops sum these with all mutual terms).
 *
 * @example segmentSelf(0.1, 0.0005 * Math.exp(-0.25)); // ≈ 1.0e-7 H (100 mm of 1 mm wire)
 */
export function segmentSelf(length: number, gmd: number): number {
  requirePositive('length', length, 'm');
  requirePositive('gmd', gmd, 'm');
  const r = Math.hypot(length, gmd);
  return (MU0 / (2 * Math.PI)) * (length * Math.asinh(length / gmd) - r + gmd);
}
