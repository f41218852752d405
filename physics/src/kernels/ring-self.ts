import { requirePositive } from '../guards/require-positive';
import { MU0 } from './mu0';

/** Options of the ring self-inductance. */
export interface RingSelfOptions {
  /** Surface (high-frequency) current distribution instead of uniform: the "- 2" form. */
  highFrequency?: boolean;
}

/**
 * Self-inductance of a circular ring of round wire (H).
 *
 * Method: L = mu0 R (ln(8R/a) - 7/4) for a uniform current (low frequency, the default), and
 * L = mu0 R (ln(8R/a) - 2) when the current flows on the wire's surface (high frequency, internal
 * inductance gone). Both are the thin-ring limits (a << R), with relative error O((a/R)^2).
 * Equivalently L = mu0 R (ln(8R/g) - 2) with the geometric mean distance g = a e^(-1/4) (uniform)
 * or g = a (surface); that form is used for other cross-sections via `ringSelfGmd`.
 *
 * References: E. B. Rosa, F. W. Grover, "Formulas and tables for the calculation of mutual and
 * self-inductance", Bull. Bureau of Standards 8(1), 1912 (revised 1916); F. W. Grover, Inductance
 * Calculations, 1946, ch. 16.
 *
 * @param radius - ring radius R to the wire's centre line, m (> 0).
 * @param wireRadius - wire radius a, m (> 0 and < radius).
 * @param options - `highFrequency: true` for the surface-current variant.
 * @returns L in henries.
 *
 * @example ringSelf(0.02, 0.0005); // ≈ 1.43e-7 H (40 mm ring of 1 mm wire)
 */
export function ringSelf(
  radius: number,
  wireRadius: number,
  options: RingSelfOptions = {},
): number {
  requirePositive('radius', radius, 'm');
  requirePositive('wireRadius', wireRadius, 'm');
  if (wireRadius >= radius) {
    throw new RangeError(
      `wireRadius: must be below the ring radius ${radius}, in m (got ${wireRadius})`,
    );
  }
  const tail = options.highFrequency ? 2 : 1.75;
  return MU0 * radius * (Math.log((8 * radius) / wireRadius) - tail);
}
