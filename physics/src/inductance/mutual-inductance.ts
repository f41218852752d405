import type { Coil } from '../coils/coil-schema';
import type { PoseInput } from '../pose/pose-schema';
import { preparePair } from './prepare-pair';

/**
 * Mutual inductance of a Tx and an Rx coil with the Rx in a given pose (H).
 *
 * Method: checks the clearance (RangeError when the coils intersect or the Rx enters the Tx's
 * ferrite), then sums the filament pairs as in `preparePair` (Maxwell's closed form when coaxial,
 * Conway's Bessel form or Grover's integral for parallel circular coils, the single integrals of
 * Babic et al. and Neumann otherwise). A Tx `backing` adds one image term:
 * M = M(Tx, Rx) + w M(image(Tx), Rx), w = (mur - 1)/(mur + 1). Not two: the field of the Tx current
 * above the plate is that of the Tx plus its image, and M is the flux of that field through the Rx;
 * the "Rx image seen by the Tx", w M(Tx, image(Rx)), is the same number by mirror symmetry
 * (reciprocity), so adding it would count the plate twice. For a single pose; sweeps should call
 * `preparePair(tx, rx).mutualMany(poses)`, which reuses work between poses.
 *
 * References: F. Neumann, 1845; J. C. Maxwell, Treatise, 1873, art. 701; J. T. Conway, IEEE
 * Trans. Magn. 43(3), 2007; S. Babic et al., IEEE Trans. Magn. 46(9), 2010; J. D. Jackson,
 * Classical Electrodynamics, 3rd ed., problem 5.17.
 *
 * @param tx - transmitter coil (its frame is the world frame).
 * @param rx - receiver coil.
 * @param pose - Rx pose: metres and degrees (missing fields are 0).
 * @returns M in henries (> 0 when coaxial and both currents circulate about +z).
 *
 * @example
 * mutualInductance(ring20mm, ring20mm, { z: 0.003 }); // ≈ 5.0e-8 H
 */
export function mutualInductance(tx: Coil, rx: Coil, pose: PoseInput): number {
  return preparePair(tx, rx).mutual(pose);
}
