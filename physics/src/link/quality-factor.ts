import { requirePositive } from '../guards/require-positive';

/**
 * Quality factor of a coil at its operating frequency.
 *
 * Method: Q = ω L / R, ω = 2π f, with R the coil's AC resistance at f. Core and dielectric losses
 * and radiation are not part of R unless the caller adds them.
 *
 * References: F. E. Terman, Radio Engineers' Handbook (1943), §3; any circuit-theory text.
 *
 * @param L inductance, H
 * @param R series resistance at f, Ω
 * @param frequency Hz
 * @returns Q (dimensionless)
 * @example qualityFactor(24e-6, 0.1, 85e3) // ≈ 128
 */
export function qualityFactor(L: number, R: number, frequency: number): number {
  requirePositive('L', L, 'H');
  requirePositive('R', R, 'Ω');
  requirePositive('frequency', frequency, 'Hz');
  return (2 * Math.PI * frequency * L) / R;
}
