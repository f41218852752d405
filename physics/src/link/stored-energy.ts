import { requireNonNegative } from '../guards/require-non-negative';
import { requirePositive } from '../guards/require-positive';

/**
 * Magnetic energy stored in a coil.
 *
 * Method: W = ½ L I². With the peak current this is the peak energy of an AC cycle; with the rms
 * current it is the time-averaged energy.
 *
 * References: any electromagnetics text, e.g. D. J. Griffiths, Introduction to Electrodynamics,
 * §7.2.4.
 *
 * @param L inductance, H
 * @param I current, A
 * @returns energy, J
 * @example storedEnergy(100e-6, 30) // 0.045 J
 */
export function storedEnergy(L: number, I: number): number {
  requirePositive('L', L, 'H');
  requireNonNegative('current', I, 'A');
  return 0.5 * L * I * I;
}
