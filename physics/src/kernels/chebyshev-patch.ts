import type { ChebyshevBasis } from './chebyshev-basis';

/**
 * Coefficients of the tensor Chebyshev interpolant of degree n - 1 in each variable through
 * values on the n x n grid of first-kind Chebyshev points of [-1, 1]^2.
 *
 * Method: the discrete cosine transform in each direction, c_ab = (2 - δ_a0)(2 - δ_b0) / n^2
 * Σ_j Σ_k f_jk T_a(t_j) T_b(t_k), done as two one-dimensional passes (2 n^3 operations). For a
 * function analytic in a Bernstein polyellipse of parameter ρ the coefficients fall like ρ^-(a+b)
 * and the interpolant's error is bounded by twice the sum of the dropped ones.
 *
 * References: L. N. Trefethen, Approximation Theory and Approximation Practice, SIAM, 2013,
 * ch. 4 and 8; J. C. Mason, D. C. Handscomb, Chebyshev Polynomials, 2003, §6.3.
 *
 * @param basis - the order-n basis.
 * @param values - f(t_j, t_k) at index j n + k (first variable slow).
 * @param out - receives c_ab at index a n + b.
 * @param scratch - n^2 numbers of working space.
 * @param offset - where the coefficients start in `out` (default 0).
 *
 * @example chebyshevPatch(chebyshevBasis(2), Float64Array.of(1, 1, 1, 1), c, s); // [1, 0, 0, 0]
 */
export function chebyshevPatch(
  basis: ChebyshevBasis,
  values: Float64Array,
  out: Float64Array | number[],
  scratch: Float64Array,
  offset = 0,
): void {
  const { n, cos } = basis;
  for (let a = 0; a < n; a++) {
    for (let k = 0; k < n; k++) {
      let s = 0;
      for (let j = 0; j < n; j++) s += cos[a * n + j] * values[j * n + k];
      scratch[a * n + k] = s;
    }
  }
  const scale = 4 / (n * n);
  for (let a = 0; a < n; a++) {
    for (let b = 0; b < n; b++) {
      let s = 0;
      for (let k = 0; k < n; k++) s += scratch[a * n + k] * cos[b * n + k];
      out[offset + a * n + b] = s * scale * (a === 0 ? 0.5 : 1) * (b === 0 ? 0.5 : 1);
    }
  }
}
