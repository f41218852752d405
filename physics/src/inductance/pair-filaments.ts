import { coilFilaments } from '../coils/coil-filaments';
import type { Coil } from '../coils/coil-schema';
import { ferriteImages } from '../coils/ferrite-images';
import type { FilamentSet } from '../filaments';

/** A coil's filaments in its own frame with its ferrite images kept apart. */
export interface CoilFilaments {
  own: FilamentSet;
  images: FilamentSet;
  /** (mur - 1)/(mur + 1) of the backing, 0 without one. */
  imageWeight: number;
}

/**
 * A coil's filaments (local frame) and, when it has a `backing`, the image filaments of the
 * ferrite plate (method of images, an approximation: infinite, linear, lossless plate).
 *
 * @param coil - a validated coil.
 * @returns own filaments, image filaments and the image weight.
 *
 * @example pairFilaments(backedPad).images.rings.length; // as many as the pad's rings
 */
export function pairFilaments(coil: Coil): CoilFilaments {
  const own = coilFilaments(coil);
  if (!coil.backing) return { own, images: { rings: [], paths: [] }, imageWeight: 0 };
  const { mur } = coil.backing;
  return { own, images: ferriteImages(own, coil.backing), imageWeight: (mur - 1) / (mur + 1) };
}
