import { requireFinite } from '../guards/require-finite';
import { requirePositive } from '../guards/require-positive';

/**
 * How far |k| may exceed 1 and still be read as 1: the filament models promise 1e-6 relative on
 * M and L, so a |k| above 1 + 1e-6 cannot be rounding and signals inconsistent inputs.
 */
export const COUPLING_TOLERANCE = 1e-6;

/**
 * Coupling coefficient of two coils.
 *
 * Method: k = M / sqrt(L1 L2). Energy conservation demands |k| ≤ 1; results within
 * COUPLING_TOLERANCE above 1 are clamped to ±1 (model rounding), larger ones are an error
 * (coils that overlap in the pose, or M and L from different models).
 *
 * References: any circuit-theory text, e.g. C. A. Desoer, E. S. Kuh, Basic Circuit Theory (1969),
 * §coupled inductors (passivity requires M² ≤ L1 L2).
 *
 * @param M mutual inductance, H (sign kept)
 * @param L1 self-inductance of the Tx, H
 * @param L2 self-inductance of the Rx, H
 * @returns k (dimensionless, −1 … 1)
 * @example couplingCoefficient(2e-6, 10e-6, 6.4e-6) // ≈ 0.25
 */
export function couplingCoefficient(M: number, L1: number, L2: number): number {
  requireFinite('M', M, 'H');
  requirePositive('L1', L1, 'H');
  requirePositive('L2', L2, 'H');
  const k = M / Math.sqrt(L1 * L2);
  if (Math.abs(k) > 1 + COUPLING_TOLERANCE) {
    throw new RangeError(
      `k: |M|/sqrt(L1 L2) = ${Math.abs(k)} exceeds 1; M is inconsistent with L1 and L2 ` +
        `(overlapping coils or values from different models)`,
    );
  }
  return Math.max(-1, Math.min(1, k));
}
