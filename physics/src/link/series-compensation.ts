import { requirePositive } from '../guards/require-positive';

/**
 * Series compensation capacitor that resonates a coil at the operating frequency.
 *
 * Method: C = 1 / (ω² L), ω = 2π f. For series–series compensation the same rule holds on both
 * sides and is independent of k and load; other topologies (parallel secondary, LCC) differ.
 *
 * References: textbook resonance; C.-S. Wang, G. A. Covic, O. H. Stielau, "Power transfer
 * capability and bifurcation phenomena of loosely coupled inductive power transfer systems",
 * IEEE Trans. Industrial Electronics 51(1), 2004 (compensation topologies).
 *
 * @param L inductance to compensate, H
 * @param frequency resonance frequency, Hz
 * @returns capacitance, F
 * @example seriesCompensation(100e-6, 85e3) // ≈ 35.1e-9 F
 */
export function seriesCompensation(L: number, frequency: number): number {
  requirePositive('L', L, 'H');
  requirePositive('frequency', frequency, 'Hz');
  const w = 2 * Math.PI * frequency;
  return 1 / (w * w * L);
}
