import { requireNonNegative } from '../guards/require-non-negative';
import { requirePositive } from '../guards/require-positive';
import type { Conductor } from './conductor';
import { conductorArea } from './conductor-area';
import { COPPER_RESISTIVITY_20C } from './copper-resistivity';

/**
 * DC resistance of a length of conductor.
 *
 * Method: R = rho · l / A, with A the metal cross-section of {@link conductorArea} (for Litz the
 * strands in parallel). Leads and terminations are not included.
 *
 * References: Ohm's law for a uniform conductor; resistivity from IACS (see copperResistivity).
 *
 * @param length conductor length, m (≥ 0)
 * @param conductor the conductor, dimensions in m
 * @param resistivity Ω·m (default annealed copper at 20 °C, 1.72e-8)
 * @returns resistance, Ω
 * @example dcResistance(10, { type: 'round', diameter: 1e-3 }) // ≈ 0.219 Ω
 */
export function dcResistance(
  length: number,
  conductor: Conductor,
  resistivity: number = COPPER_RESISTIVITY_20C,
): number {
  requireNonNegative('length', length, 'm');
  requirePositive('resistivity', resistivity, 'Ω·m');
  return (resistivity * length) / conductorArea(conductor);
}
