import { requirePositive } from '../guards/require-positive';
import { MU0 } from './mu0';

/**
 * Self-inductance of a thin circular ring of any cross-section given its geometric mean
 * distance (H).
 *
 * Method: L = mu0 R (ln(8R/g) - 2), the thin-ring result of Rosa with the cross-section's
 * self geometric mean distance g (round wire, uniform current: a e^(-1/4), which gives
 * `ringSelf`; rectangle w x t: 0.2235 (w + t)). Valid for g << R.
 *
 * References: E. B. Rosa, Bull. Bureau of Standards 4, 1908; F. W. Grover, Inductance
 * Calculations, 1946, ch. 2 and 16.
 *
 * @param radius - ring radius to the centre of the cross-section, m (> 0).
 * @param gmd - the cross-section's geometric mean distance, m (> 0, < radius).
 * @returns L in henries.
 *
 * @example ringSelfGmd(0.02, 0.2235 * (0.001 + 35e-6)); // ≈ 1.53e-7 H (1 mm x 35 µm trace)
 */
export function ringSelfGmd(radius: number, gmd: number): number {
  requirePositive('radius', radius, 'm');
  requirePositive('gmd', gmd, 'm');
  if (gmd >= radius) {
    throw new RangeError(`gmd: must be below the ring radius ${radius}, in m (got ${gmd})`);
  }
  return MU0 * radius * (Math.log((8 * radius) / gmd) - 2);
}
