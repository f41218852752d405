import type { RingFilament, Vec3 } from '../filaments';
import { adaptiveSegmentQuadrature } from './adaptive-segment-quadrature';
import { ringPotentialFactor } from './ring-potential-factor';

/**
 * Mutual inductance of a straight filament and a circular filament (H), per unit weights of both
 * times the ring's weight.
 *
 * Method: M = ∫ A_ring · dl along the segment, with the closed-form vector potential of the ring
 * (K and E, `ringPotentialFactor`) and Gauss–Legendre panels graded by the distance
 * sqrt((R - a)^2 + z^2) from each panel to the ring (`adaptiveSegmentQuadrature`). Summed over a
 * closed polygon this is the polygon–ring mutual inductance; an open segment's value is a partial
 * inductance (meaningful only inside such a sum).
 *
 * References: J. D. Jackson, Classical Electrodynamics, 3rd ed., 1999, eq. 5.37; S. Babic et al.,
 * IEEE Trans. Magn. 46(9), 2010 (the same single-integral idea for two rings).
 *
 * @param a - segment start (current flows a -> b), m.
 * @param b - segment end, m.
 * @param ring - the circular filament (m, unit normal; its weight multiplies the result).
 * @returns M in henries.
 *
 * @example segmentRingMutual({ x: -1, y: 0.03, z: 0 }, { x: 1, y: 0.03, z: 0 }, ring20mm); // < 0
 */
export function segmentRingMutual(a: Vec3, b: Vec3, ring: RingFilament): number {
  const L = Math.hypot(b.x - a.x, b.y - a.y, b.z - a.z);
  if (!(L > 0) || !Number.isFinite(L))
    throw new RangeError('segment length: must be a finite number > 0, in m');
  const ux = (b.x - a.x) / L;
  const uy = (b.y - a.y) / L;
  const uz = (b.z - a.z) / L;
  const n = ring.normal;
  const r = ring.radius;
  const ox = a.x - ring.center.x;
  const oy = a.y - ring.center.y;
  const oz = a.z - ring.center.z;
  // (n x q) · u = q · (u x n): precompute u x n once.
  const wx = uy * n.z - uz * n.y;
  const wy = uz * n.x - ux * n.z;
  const wz = ux * n.y - uy * n.x;
  const oa = ox * n.x + oy * n.y + oz * n.z;
  const ua = ux * n.x + uy * n.y + uz * n.z;
  const oo = ox * ox + oy * oy + oz * oz;
  const ou = ox * ux + oy * uy + oz * uz;
  const ow = ox * wx + oy * wy + oz * wz;
  const distance = (s: number): number => {
    const z = oa + s * ua;
    const rho = Math.sqrt(Math.max(oo + 2 * s * ou + s * s - z * z, 0));
    return Math.hypot(rho - r, z);
  };
  // q(s) = o + s u, and q · (u x n) = o · (u x n) since u · (u x n) = 0: constant along the line.
  const f = (s: number): number => {
    const z = oa + s * ua;
    const rho2 = oo + 2 * s * ou + s * s - z * z;
    return ringPotentialFactor(r, rho2, z);
  };
  return ring.weight * ow * adaptiveSegmentQuadrature(L, distance, f);
}
