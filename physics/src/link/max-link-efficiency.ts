import { requireFinite } from '../guards/require-finite';
import { requirePositive } from '../guards/require-positive';

/**
 * Maximum efficiency of a two-coil resonant link, reached at the optimal load.
 *
 * Method: with x = k² Q1 Q2 (the link's figure of merit, (kQ)² with kQ = k sqrt(Q1 Q2)),
 * eta_max = x / (1 + sqrt(1 + x))². Coil losses only: the power stage, the compensation
 * capacitors' ESR, ferrite and nearby-metal losses lower it further.
 *
 * References: M. Kiani, M. Ghovanloo, "A figure-of-merit for designing high-performance inductive
 * power transmission links", IEEE Trans. Industrial Electronics 60(11), 2013; W. Zhong,
 * S. Y. R. Hui, "Maximum energy efficiency tracking for wireless power transfer systems", IEEE
 * Trans. Power Electronics 30(7), 2015.
 *
 * @param k coupling coefficient (its sign does not matter)
 * @param Q1 Tx quality factor
 * @param Q2 Rx quality factor (unloaded)
 * @returns efficiency, 0 … 1
 * @example maxLinkEfficiency(0.1, 100, 100) // ≈ 0.819 (kQ = 10)
 */
export function maxLinkEfficiency(k: number, Q1: number, Q2: number): number {
  requireFinite('k', k);
  requirePositive('Q1', Q1);
  requirePositive('Q2', Q2);
  const x = k * k * Q1 * Q2;
  // Divided twice rather than by (1 + s)²: no cancellation at tiny x, no overflow at huge x.
  const s = 1 + Math.sqrt(1 + x);
  return x / s / s;
}
