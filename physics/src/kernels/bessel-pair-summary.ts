import besselj1 from '@stdlib/math-base-special-besselj1';
import { requireNonNegative } from '../guards/require-non-negative';
import { requirePositive } from '../guards/require-positive';

/** One coaxial ring of a coil for the Bessel summary. */
export interface SummaryRing {
  /** Radius, m. */
  r: number;
  /** Distance from the coil's reference plane, m (>= 0, measured away from the other coil). */
  depth: number;
  /** Current weight (1 for a turn, (mur-1)/(mur+1) for a ferrite image). */
  weight: number;
}

/**
 * Conway's per-coil summary of a stack of coaxial rings for the Hankel form of the mutual
 * inductance: S(k) = Σ_i w_i r_i J1(k r_i) e^(-k depth_i), sampled at the quadrature nodes.
 *
 * Method: for two coaxial-ring coils with parallel axes, every turn pair's
 * M_ij = mu0 π r_i r_j ∫ J1(k r_i) J1(k r_j) J0(k rho) e^(-k |z_ij|) dk, and when all of one coil
 * lies on one side of the other, |z_ij| = h + depth_i + depth_j separates, so
 * M = mu0 π ∫ S1(k) S2(k) J0(k rho) e^(-k h) dk: each coil is summarised once, and each pose
 * (rho, h) then costs one sum over the nodes. J1 from @stdlib.
 *
 * References: J. T. Conway, "Inductance calculations for noncoaxial coils using Bessel functions",
 * IEEE Trans. Magn. 43(3), 2007; G. N. Watson, A Treatise on the Theory of Bessel Functions, 1944,
 * §13.2 (the Lipschitz–Hankel integral).
 *
 * @param rings - radii (m), depths (m, >= 0) and weights of the coil's rings.
 * @param k - quadrature nodes, 1/m.
 * @returns S at every node, in m.
 *
 * @example besselPairSummary([{ r: 0.02, depth: 0, weight: 1 }], Float64Array.of(0)); // [0]
 */
export function besselPairSummary(rings: readonly SummaryRing[], k: Float64Array): Float64Array {
  for (const ring of rings) {
    requirePositive('ring radius', ring.r, 'm');
    requireNonNegative('ring depth', ring.depth, 'm');
  }
  const out = new Float64Array(k.length);
  for (let n = 0; n < k.length; n++) {
    const kn = k[n];
    let s = 0;
    for (const ring of rings) {
      s += ring.weight * ring.r * besselj1(kn * ring.r) * Math.exp(-kn * ring.depth);
    }
    out[n] = s;
  }
  return out;
}
