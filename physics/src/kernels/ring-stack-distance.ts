import type { RingStack } from './ring-stack-factor';

/**
 * Distance from a point, given by its cylinder coordinates in the stack's frame, to the nearest
 * ring of a coaxial stack (m): min_i sqrt((rho - r_i)^2 + (z - z_i)^2).
 *
 * Method: a circle of radius r_i at height z_i is nearest to the point along the meridian
 * half-plane through it, so the 3D distance is the 2D distance in the (rho, z) half-plane.
 *
 * @param stack - the rings, m.
 * @param rho - distance of the point from the axis, m (>= 0).
 * @param z - height of the point on the axis, m.
 * @returns the distance, m.
 *
 * @example ringStackDistance(stackOf20mmRing, 0.02, 0.003); // 0.003
 */
export function ringStackDistance(stack: RingStack, rho: number, z: number): number {
  const { r, z: zi } = stack;
  let best = Infinity;
  for (let i = 0; i < r.length; i++) {
    const dr = rho - r[i];
    const dz = z - zi[i];
    const d2 = dr * dr + dz * dz;
    if (d2 < best) best = d2;
  }
  return Math.sqrt(best);
}
