import type { FilamentSet, Vec3 } from '../../../../physics/src/index';

/** An axis-aligned box, m. */
export interface Bounds {
  min: Vec3;
  max: Vec3;
}

/**
 * The box around a coil's conductors in its own frame, wire radius included. A ring of radius r
 * about the unit normal n reaches r·sqrt(1 − n_i²) along axis i (its projection is an ellipse).
 *
 * @param set filaments, m
 * @returns the bounds, m (a zero box at the origin for an empty set)
 */
export function coilBounds(set: FilamentSet): Bounds {
  const min = { x: Infinity, y: Infinity, z: Infinity };
  const max = { x: -Infinity, y: -Infinity, z: -Infinity };
  const grow = (c: Vec3, reach: Vec3) => {
    for (const axis of ['x', 'y', 'z'] as const) {
      min[axis] = Math.min(min[axis], c[axis] - reach[axis]);
      max[axis] = Math.max(max[axis], c[axis] + reach[axis]);
    }
  };
  for (const ring of set.rings) {
    const n = ring.normal;
    const reach = (ni: number) =>
      ring.radius * Math.sqrt(Math.max(0, 1 - ni * ni)) + ring.wireRadius;
    grow(ring.center, { x: reach(n.x), y: reach(n.y), z: reach(n.z) });
  }
  for (const path of set.paths) {
    const w = path.wireRadius;
    for (const p of path.points) grow(p, { x: w, y: w, z: w });
  }
  if (min.x === Infinity) return { min: { x: 0, y: 0, z: 0 }, max: { x: 0, y: 0, z: 0 } };
  return { min, max };
}
