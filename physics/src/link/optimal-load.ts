import { requireFinite } from '../guards/require-finite';
import { requirePositive } from '../guards/require-positive';

/**
 * Load resistance that gives the maximum link efficiency, for a series-compensated Rx.
 *
 * Method: R_L,opt = R2 · sqrt(1 + k² Q1 Q2), R2 the Rx coil's own AC resistance; the load is in
 * series with the resonant Rx. (For a parallel-compensated Rx the optimum differs.)
 *
 * References: M. Kiani, M. Ghovanloo, "A figure-of-merit for designing high-performance inductive
 * power transmission links", IEEE Trans. Industrial Electronics 60(11), 2013.
 *
 * @param R2 Rx coil resistance at the operating frequency, Ω
 * @param k coupling coefficient
 * @param Q1 Tx quality factor
 * @param Q2 Rx quality factor (unloaded)
 * @returns load resistance, Ω
 * @example optimalLoad(0.1, 0.1, 100, 100) // ≈ 1.005 Ω
 */
export function optimalLoad(R2: number, k: number, Q1: number, Q2: number): number {
  requirePositive('R2', R2, 'Ω');
  requireFinite('k', k);
  requirePositive('Q1', Q1);
  requirePositive('Q2', Q2);
  return R2 * Math.sqrt(1 + k * k * Q1 * Q2);
}
