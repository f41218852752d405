import type { RingFilament, Vec3 } from '../filaments';
import { requireFinite } from '../guards/require-finite';
import { ringPotentialFactor } from './ring-potential-factor';

/**
 * Magnetic vector potential of a circular filament at a point, per ampere (H/m).
 *
 * Method: closed form A = G(m) (n x q) with K and E (see `ringPotentialFactor`), q = point -
 * centre,
 * scaled by the ring's `weight`. Exact on the axis (A = 0 there) and accurate far away.
 *
 * References: J. D. Jackson, Classical Electrodynamics, 3rd ed., 1999, eq. 5.37.
 *
 * @param ring - the filament (m; unit normal).
 * @param point - field point, m, not on the filament.
 * @returns A per ampere of ring current, H/m (Wb/m per A).
 *
 * @example
 * ringVectorPotential(ring20mm, { x: 0.02, y: 0, z: 0.003 }); // ≈ { x: 0, y: 6.5e-7, z: 0 }
 */
export function ringVectorPotential(ring: RingFilament, point: Vec3): Vec3 {
  requireFinite('point.x', point.x, 'm');
  requireFinite('point.y', point.y, 'm');
  requireFinite('point.z', point.z, 'm');
  const n = ring.normal;
  const qx = point.x - ring.center.x;
  const qy = point.y - ring.center.y;
  const qz = point.z - ring.center.z;
  const z = qx * n.x + qy * n.y + qz * n.z;
  const rho2 = qx * qx + qy * qy + qz * qz - z * z;
  if (
    Math.abs(z) < 1e-15 * ring.radius &&
    Math.abs(Math.sqrt(Math.max(rho2, 0)) - ring.radius) < 1e-15 * ring.radius
  ) {
    throw new RangeError('point lies on the filament: the vector potential diverges there');
  }
  const g = ring.weight * ringPotentialFactor(ring.radius, rho2, z);
  return {
    x: g * (n.y * qz - n.z * qy),
    y: g * (n.z * qx - n.x * qz),
    z: g * (n.x * qy - n.y * qx),
  };
}
