import { requireFinite } from '../guards/require-finite';
import { requirePositive } from '../guards/require-positive';

/**
 * The smallest coupling coefficient at which a link can reach a given maximum efficiency: the
 * k_min behind a tolerance envelope set in terms of efficiency.
 *
 * Method: the closed-form inverse of eta = (s − 1)/(s + 1), s = sqrt(1 + k² Q1 Q2):
 * s = (1 + eta)/(1 − eta), k = sqrt((s² − 1)/(Q1 Q2)) = 2 sqrt(eta) / ((1 − eta) sqrt(Q1 Q2)).
 * A k above 1 means no pose can reach eta with these Q: that is an error, not a number.
 *
 * References: inverse of the maximum-efficiency formula of M. Kiani, M. Ghovanloo, IEEE Trans.
 * Industrial Electronics 60(11), 2013.
 *
 * @param etaMin target efficiency, 0 < eta < 1
 * @param Q1 Tx quality factor
 * @param Q2 Rx quality factor (unloaded)
 * @returns k_min (0 … 1)
 * @example couplingForEfficiency(0.819, 100, 100) // ≈ 0.100
 */
export function couplingForEfficiency(etaMin: number, Q1: number, Q2: number): number {
  requireFinite('etaMin', etaMin);
  if (!(etaMin > 0 && etaMin < 1)) {
    throw new RangeError(`etaMin: must be between 0 and 1, exclusive (got ${etaMin})`);
  }
  requirePositive('Q1', Q1);
  requirePositive('Q2', Q2);
  // s² − 1 = 4 eta / (1 − eta)², written so that small eta keeps its digits.
  const k = (2 * Math.sqrt(etaMin)) / ((1 - etaMin) * Math.sqrt(Q1 * Q2));
  if (k > 1) {
    throw new RangeError(
      `etaMin: ${etaMin} needs k = ${k.toPrecision(4)} > 1 with Q1 = ${Q1}, Q2 = ${Q2}; ` +
        `no pose can reach it`,
    );
  }
  return k;
}
