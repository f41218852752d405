import type { FilamentSet } from '../filaments';
import { pathPathMutual } from '../kernels/path-path-mutual';
import { pathRingMutual } from '../kernels/path-ring-mutual';
import { ringRingMutual } from '../kernels/ring-ring-mutual';

/**
 * Mutual inductance between two sets of filaments in one frame (H): the sum over every pair.
 *
 * Method: ring–ring pairs by `ringRingMutual` (Maxwell's closed form when coaxial, else the
 * vector-potential single integral of Babic et al.); ring–polyline pairs by `pathRingMutual`;
 * polyline pairs by `pathPathMutual` (Neumann with the inner integral analytic). Weights multiply
 * each filament's current (turn fractions, reversed turns, ferrite images).
 *
 * References: F. Neumann, 1845; S. Babic et al., IEEE Trans. Magn. 46(9), 2010; J. C. Maxwell,
 * Treatise, 1873, art. 701.
 *
 * @param a - first set, m.
 * @param b - second set, m (same frame).
 * @returns M in henries.
 *
 * @example filamentSetMutual(txFilaments, placedRxFilaments); // ≈ 1e-6 H for phone-size pads
 */
export function filamentSetMutual(a: FilamentSet, b: FilamentSet): number {
  let sum = 0;
  for (const ra of a.rings) {
    for (const rb of b.rings) sum += ringRingMutual(ra, rb);
    for (const pb of b.paths) sum += pathRingMutual(pb, ra);
  }
  for (const pa of a.paths) {
    for (const rb of b.rings) sum += pathRingMutual(pa, rb);
    for (const pb of b.paths) sum += pathPathMutual(pa, pb);
  }
  return sum;
}
