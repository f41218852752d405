import type { FilamentSet, Vec3 } from '../filaments';
import type { Backing } from './coil-schema';

/**
 * The image filaments of a ferrite backing: an infinite plate of relative permeability mur
 * filling z < -distance, replaced by mirrored currents scaled by (mur - 1)/(mur + 1). An
 * APPROXIMATION: real ferrite tiles are finite, saturate and have losses; the plate is taken as
 * infinite, linear and lossless, and the field inside it is not modelled.
 *
 * Method: a current element at (x, y, z) with direction (dx, dy, dz) above a permeable half-space
 * has an image at (x, y, -2d - z) with direction (dx, dy, -dz) — the geometric mirror — carrying
 * (mur - 1)/(mur + 1) of the current; together they make the tangential H vanish on the surface
 * when mur → ∞. So path points are mirrored in the plane z = -d and keep their order. A ring's
 * normal mirrors to (nx, ny, -nz) and the mirrored ring circulates the opposite way about it,
 * i.e. right-handed about (-nx, -ny, nz): a ring parallel to the plate keeps its normal +z, and
 * a coaxial image adds to the ring's own flux — backing raises L and, for coils on the same side,
 * M. Only the images are returned (mur = 1 gives none); add them to the original filaments.
 *
 * References: J. D. Jackson, Classical Electrodynamics, 3rd ed. (Wiley, 1999), §5.13 and
 * problem 5.17 (line current parallel to a permeable half-space).
 *
 * @param set filaments in the frame of the backed coil (the Tx frame for the Tx's backing), m
 * @param backing relative permeability (1 … 1e5) and distance of the plate surface below z = 0, m
 * @returns the image filaments (same frame), weights scaled by (mur - 1)/(mur + 1)
 * @example ferriteImages(coilFilaments(ring), { mur: 1e5, distance: 0.001 }).rings[0].center.z
 *   // -0.002 (a ring at z = 0, plate surface at z = -1 mm)
 */
export function ferriteImages(set: FilamentSet, backing: Backing): FilamentSet {
  const scale = (backing.mur - 1) / (backing.mur + 1);
  if (scale === 0) return { rings: [], paths: [] };
  const plane = -backing.distance;
  const mirror = (p: Vec3): Vec3 => ({ x: p.x, y: p.y, z: 2 * plane - p.z });
  return {
    rings: set.rings.map((ring) => ({
      center: mirror(ring.center),
      normal: { x: -ring.normal.x, y: -ring.normal.y, z: ring.normal.z },
      radius: ring.radius,
      wireRadius: ring.wireRadius,
      weight: ring.weight * scale,
    })),
    paths: set.paths.map((path) => ({
      points: path.points.map(mirror),
      closed: path.closed,
      wireRadius: path.wireRadius,
      weight: path.weight * scale,
    })),
  };
}
