import { ringPotentialFactor } from './ring-potential-factor';

/**
 * Coaxial circular filaments on one axis (the stack's local +z), packed for inner loops: radius
 * r_i (m), height z_i on the axis (m) and current weight w_i of every ring.
 */
export interface RingStack {
  r: Float64Array;
  z: Float64Array;
  w: Float64Array;
}

/**
 * Scalar factor of the summed vector potential of a coaxial ring stack, A = G (e_z x q) per
 * ampere, with q the field point in the stack's frame (H/m^2).
 *
 * Method: every ring's potential is G_i (e_z x (q - z_i e_z)) = G_i (e_z x q), because e_z x e_z
 * = 0, so the stack's potential is G (e_z x q) with G = Σ_i w_i G_i(rho^2, z - z_i), each G_i the
 * closed form in K and E of `ringPotentialFactor` (Jackson eq. 5.37, no cancellation). The field
 * point's transform is shared by all rings: one call per quadrature point instead of one
 * quadrature per ring.
 *
 * References: J. D. Jackson, Classical Electrodynamics, 3rd ed., 1999, §5.5.
 *
 * @param stack - the rings, m.
 * @param rho2 - squared distance of the point from the stack's axis, m^2 (>= 0).
 * @param z - height of the point on the stack's axis, m.
 * @returns G in H/m^2; A = G (e_z x q) is then in H/m.
 * @throws RangeError when the point lies on a ring.
 *
 * @example ringStackFactor(stack, 0, 1); // ≈ mu0 Σ w_i r_i^2 / (4 (1 - z_i)^3)
 */
export function ringStackFactor(stack: RingStack, rho2: number, z: number): number {
  const { r, z: zi, w } = stack;
  let sum = 0;
  for (let i = 0; i < r.length; i++) sum += w[i] * ringPotentialFactor(r[i], rho2, z - zi[i]);
  return sum;
}
