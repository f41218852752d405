import { MU0 } from './mu0';
import { ringPotentialShape } from './ring-potential-shape';

/**
 * Scalar factor G of a circular filament's vector potential, A = G (n x q) per ampere, where q is
 * the field point relative to the ring's centre and n the ring's unit normal (T·m/A per m).
 *
 * Method: A_phi = (mu0 / (pi k)) sqrt(a/R) [(1 - k^2/2) K - E] (Jackson eq. 5.37) rewritten as
 * A_phi = 8 mu0 a^2 R h(m) / (pi D^(3/2)), D = (a + R)^2 + z^2, m = 4 a R / D, so that A = G (n x
 * q)
 * with G = 8 mu0 a^2 h(m) / (pi D^(3/2)): no division by R, exact on the axis, no cancellation far
 * away (h from `ringPotentialShape`, given m' = ((a - R)^2 + z^2) / D directly).
 *
 * References: J. D. Jackson, Classical Electrodynamics, 3rd ed., 1999, §5.5; J. C. Maxwell,
 * Treatise, 1873, art. 701.
 *
 * @param a - ring radius, m (> 0; not checked: inner-loop function).
 * @param rho2 - squared distance of the point from the ring's axis, m^2 (>= 0).
 * @param z - signed distance of the point from the ring's plane, m.
 * @returns G in H/m^2, so that A = G (n x q) is in H/m (vector potential per ampere).
 *
 * @example ringPotentialFactor(0.02, 0, 1); // ≈ mu0 a^2 / (4 z^3) = 1.26e-10
 */
export function ringPotentialFactor(a: number, rho2: number, z: number): number {
  const R = Math.sqrt(rho2 > 0 ? rho2 : 0);
  const D = a * a + 2 * a * R + rho2 + z * z;
  const dr = a - R;
  // m' = 1 - m from the nearest distance, accurate near the wire where 1 - m would cancel.
  const mc = (dr * dr + z * z) / D;
  // Points on the filament itself (m' = 0) have no finite potential.
  if (!(mc > 0)) throw new RangeError('filaments touch or cross: a field point lies on a ring');
  const h = ringPotentialShape(Math.min((4 * a * R) / D, 1), mc);
  return (8 * MU0 * a * a * h) / (Math.PI * D * Math.sqrt(D));
}
