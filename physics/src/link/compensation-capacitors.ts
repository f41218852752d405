import { requireFinite } from '../guards/require-finite';
import { requirePositive } from '../guards/require-positive';
import { rangeMessage } from '../guards/range-message';

/** Where the capacitors sit: in series on both sides, or in series on the Tx, parallel on the Rx. */
export type CompensationTopology = 'series-series' | 'series-parallel';

/** The two compensation capacitors, F. */
export interface CompensationCapacitors {
  /** Tx (primary) capacitor, in series with the Tx coil, F. */
  C1: number;
  /** Rx (secondary) capacitor, in series (SS) or in parallel (SP) with the Rx coil, F. */
  C2: number;
}

/**
 * Compensation capacitors that tune a Tx–Rx pair to the operating frequency, for series–series
 * (SS) and series–parallel (SP) compensation.
 *
 * Method: ω = 2π f. The secondary is tuned on its own in both topologies, C2 = 1/(ω² L2).
 * SS: the reflected impedance of a resonant series secondary is purely resistive, so the primary
 * is tuned on its own too, C1 = 1/(ω² L1), independent of k and load. SP: a resonant parallel
 * secondary reflects a reactance −jω M²/L2 as well, so the primary sees L1 − M²/L2 (its leakage
 * inductance seen from the Tx side) and C1 = 1/(ω² (L1 − M²/L2)), independent of the load but not
 * of the pose. The sign of M does not matter (only M² enters). SP needs |k| < 1: at k = 1 the
 * leakage vanishes and no finite C1 tunes it.
 *
 * References: C.-S. Wang, G. A. Covic, O. H. Stielau, "Power transfer capability and bifurcation
 * phenomena of loosely coupled inductive power transfer systems", IEEE Trans. Industrial
 * Electronics 51(1), 2004 (primary compensation per topology, Table I).
 *
 * @param topology 'series-series' or 'series-parallel'
 * @param L1 Tx self-inductance, H
 * @param L2 Rx self-inductance (in the pose), H
 * @param M mutual inductance in the pose, H (either sign)
 * @param frequency operating frequency, Hz
 * @returns C1 and C2, F
 * @throws RangeError naming the parameter (bad topology, L ≤ 0, |M| ≥ sqrt(L1 L2) for SP, …)
 * @example compensationCapacitors('series-parallel', 100e-6, 100e-6, 20e-6, 85e3).C1
 *   // ≈ 36.5e-9 F (35.06 nF for SS: the leakage 96 µH is tuned instead of 100 µH)
 */
export function compensationCapacitors(
  topology: CompensationTopology,
  L1: number,
  L2: number,
  M: number,
  frequency: number,
): CompensationCapacitors {
  if (topology !== 'series-series' && topology !== 'series-parallel') {
    throw new RangeError(
      rangeMessage('topology', "'series-series' or 'series-parallel'", topology),
    );
  }
  requirePositive('L1', L1, 'H');
  requirePositive('L2', L2, 'H');
  requireFinite('M', M, 'H');
  requirePositive('frequency', frequency, 'Hz');
  const w2 = (2 * Math.PI * frequency) ** 2;
  const C2 = 1 / (w2 * L2);
  if (topology === 'series-series') return { C1: 1 / (w2 * L1), C2 };
  const leakage = L1 - (M * M) / L2;
  // A leakage within rounding of zero (k = 1 to ~1e-12) would give an absurd or infinite C1.
  if (!(leakage > L1 * 1e-12)) {
    throw new RangeError(
      rangeMessage('M', `below sqrt(L1 L2) = ${Math.sqrt(L1 * L2)} in magnitude for SP`, M, 'H'),
    );
  }
  return { C1: 1 / (w2 * leakage), C2 };
}
