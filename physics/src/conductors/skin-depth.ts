import { requirePositive } from '../guards/require-positive';
import { MU0 } from '../kernels/mu0';

/**
 * Skin depth of a good conductor: the depth at which an AC current density falls to 1/e.
 *
 * Method: delta = sqrt(rho / (pi · f · mu0 · mur)) = sqrt(2 rho / (omega mu)), valid while the
 * conduction current dominates the displacement current (any metal below optical frequencies).
 *
 * References: S. Ramo, J. R. Whinnery, T. Van Duzer, Fields and Waves in Communication
 * Electronics, 3rd ed., Wiley 1994, §5.4; J. D. Jackson, Classical Electrodynamics, 3rd ed., §5.18.
 *
 * @param resistivity conductor resistivity, Ω·m
 * @param frequency frequency, Hz (> 0)
 * @param mur relative permeability of the conductor (1 for copper)
 * @returns skin depth, m
 * @example skinDepth(1.72e-8, 85e3) // ≈ 2.26e-4 m (0.23 mm, copper at 85 kHz)
 */
export function skinDepth(resistivity: number, frequency: number, mur = 1): number {
  requirePositive('resistivity', resistivity, 'Ω·m');
  requirePositive('frequency', frequency, 'Hz');
  requirePositive('mur', mur);
  return Math.sqrt(resistivity / (Math.PI * frequency * MU0 * mur));
}
