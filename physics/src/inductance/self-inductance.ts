import type { Coil } from '../coils/coil-schema';
import { parseCoil } from '../coils/parse-coil';
import { filamentSetMutual } from './filament-set-mutual';
import { filamentSetSelf } from './filament-set-self';
import { pairFilaments } from './pair-filaments';

/** Options of a coil's self-inductance. */
export interface SelfInductanceOptions {
  /** Surface-current self terms (ring "- 2" form) instead of the low-frequency default. */
  highFrequency?: boolean;
}

/**
 * Self-inductance of a coil (H), low frequency by default.
 *
 * Method: the coil's filaments (coilFilaments: concentric rings for circular windings, polygons
 * otherwise) with L = Σ self terms + all mutual terms between turns (`filamentSetSelf`): ring self
 * mu0 R (ln(8R/a) - 7/4) (Rosa & Grover; "- 2" with `highFrequency`), Dengler's curve integral for
 * polygons, Maxwell's closed form between coaxial turns. A ferrite `backing` adds the flux of the
 * coil's image, L = L0 + M(image, coil) with image weight (mur - 1)/(mur + 1): the plate is an
 * infinite permeable half-space — an approximation (real ferrite is finite and saturates).
 *
 * References: E. B. Rosa, F. W. Grover, Bull. Bureau of Standards 8(1), 1912; F. W. Grover,
 * Inductance Calculations, 1946; J. C. Maxwell, Treatise, 1873, art. 701; J. D. Jackson,
 * Classical Electrodynamics, 3rd ed., problem 5.17 (images in a permeable half-space).
 *
 * @param coil - a coil (validated with parseCoil here; RangeError naming the field otherwise).
 * @param options - `highFrequency`.
 * @returns L in henries.
 *
 * @example
 * selfInductance({ kind: 'ring', radius: 0.02, wireRadius: 0.0005 }); // ≈ 1.01e-7 H
 */
export function selfInductance(coil: Coil, options: SelfInductanceOptions = {}): number {
  const valid = parseCoil(coil);
  const { own, images } = pairFilaments(valid);
  let L = filamentSetSelf(own, options);
  if (images.rings.length + images.paths.length > 0) L += filamentSetMutual(images, own);
  return L;
}
