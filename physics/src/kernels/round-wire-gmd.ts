import { requirePositive } from '../guards/require-positive';

/**
 * Geometric mean distance of a round wire's cross-section from itself (m).
 *
 * Method: a e^(-1/4) for a uniform current (the e^(-1/4) carries the internal inductance
 * mu0 / (8 pi) per metre); a for a surface current (high frequency: a thin tube).
 *
 * References: J. C. Maxwell, Treatise, 1873, art. 692; F. W. Grover, Inductance Calculations,
 * 1946, ch. 2.
 *
 * @param wireRadius - wire radius a, m (> 0).
 * @param highFrequency - surface current (true) or uniform current (false, default).
 * @returns the geometric mean distance, m.
 *
 * @example roundWireGmd(0.0005); // ≈ 3.894e-4 m
 */
export function roundWireGmd(wireRadius: number, highFrequency = false): number {
  requirePositive('wireRadius', wireRadius, 'm');
  return highFrequency ? wireRadius : wireRadius * Math.exp(-0.25);
}
