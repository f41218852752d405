import { requirePositive } from '../guards/require-positive';
import { wireImpedanceRatio } from './wire-impedance-ratio';

/**
 * Skin-effect resistance ratio R_ac/R_dc of a solid round wire.
 *
 * Method: the exact Bessel-function (Kelvin-function) solution for an isolated straight wire,
 * R_ac/R_dc = Re[(z/2) J0(z)/J1(z)], z = (1 − j)·a/δ, a = d/2 (see wireImpedanceRatio, which sums
 * it to about 1e-11 relative). Limits: 1 + (a/δ)⁴/48 at low frequency, a/(2δ) + 1/4 at high.
 * Accuracy: exact for skin effect alone; the proximity effect of neighbouring turns (often larger
 * than skin effect in a tightly wound coil) is NOT included, so a coil's true AC resistance is
 * higher: read the result as a lower bound.
 *
 * References: S. Ramo, J. R. Whinnery, T. Van Duzer, Fields and Waves in Communication
 * Electronics, 3rd ed. (1994), §5.6; F. E. Terman, Radio Engineers' Handbook (1943), skin-effect
 * table for round wire.
 *
 * @param diameter wire diameter, m
 * @param delta skin depth, m (Infinity for DC)
 * @returns R_ac/R_dc (≥ 1)
 * @example roundWireAcFactor(1e-3, 0.226e-3) // ≈ 1.36 (1 mm copper at 85 kHz)
 */
export function roundWireAcFactor(diameter: number, delta: number): number {
  requirePositive('diameter', diameter, 'm');
  if (delta === Infinity) return 1;
  requirePositive('skinDepth', delta, 'm');
  return wireImpedanceRatio(diameter / 2 / delta)[0];
}
