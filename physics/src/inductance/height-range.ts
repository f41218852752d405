import type { FilamentSet } from '../filaments';

/**
 * Lowest and highest z reached by a set's centre lines (m): a ring of normal n and radius r spans
 * c_z ± r sqrt(n_x^2 + n_y^2); a polyline spans its points.
 *
 * @param set - filaments, m.
 * @returns [lowest, highest] z, m.
 *
 * @example heightRange(coilFilaments(flatSpiral)); // [0, 0]
 */
export function heightRange(set: FilamentSet): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  for (const ring of set.rings) {
    const spread = ring.radius * Math.hypot(ring.normal.x, ring.normal.y);
    lo = Math.min(lo, ring.center.z - spread);
    hi = Math.max(hi, ring.center.z + spread);
  }
  for (const path of set.paths) {
    for (const p of path.points) {
      lo = Math.min(lo, p.z);
      hi = Math.max(hi, p.z);
    }
  }
  return [lo, hi];
}
