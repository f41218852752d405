import { requireFinite } from '../guards/require-finite';
import { requireNonNegative } from '../guards/require-non-negative';
import { requirePositive } from '../guards/require-positive';

/**
 * Open-circuit voltage induced in the Rx by the Tx current.
 *
 * Method: V2 = j ω M I1, so |V2| = ω |M| I1 (Faraday's law for coupled coils). The result has the
 * convention of the current: rms in, rms out; peak in, peak out.
 *
 * References: any circuit-theory text (coupled inductors).
 *
 * @param M mutual inductance, H (its sign only sets the phase)
 * @param frequency Hz
 * @param I1 Tx current, A (≥ 0)
 * @returns |V2|, V
 * @example inducedVoltage(5e-6, 85e3, 20) // ≈ 53.4 V
 */
export function inducedVoltage(M: number, frequency: number, I1: number): number {
  requireFinite('M', M, 'H');
  requirePositive('frequency', frequency, 'Hz');
  requireNonNegative('current', I1, 'A');
  return 2 * Math.PI * frequency * Math.abs(M) * I1;
}
