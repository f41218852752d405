/** Chebyshev points of the first kind and the matrix T_a(t_j) for one order n. */
export interface ChebyshevBasis {
  n: number;
  /** Nodes t_j = cos(π (j + 1/2) / n), j = 0 … n - 1, on [-1, 1]. */
  nodes: Float64Array;
  /** T_a(t_j) at index a n + j. */
  cos: Float64Array;
}

const bases = new Map<number, ChebyshevBasis>();

/**
 * The first-kind Chebyshev points of order n on [-1, 1] and the values T_a(t_j) of the Chebyshev
 * polynomials there, for tensor interpolation (`chebyshevPatch`). Rules are cached.
 *
 * Method: t_j = cos(π (j + 1/2) / n) and T_a(t_j) = cos(a π (j + 1/2) / n).
 *
 * References: J. C. Mason, D. C. Handscomb, Chebyshev Polynomials, 2003, §6.3.
 *
 * @param n - the order, an integer 2..64.
 * @returns nodes and the n x n cosine matrix.
 *
 * @example chebyshevBasis(2).nodes; // ≈ [0.7071, -0.7071]
 */
export function chebyshevBasis(n: number): ChebyshevBasis {
  if (!Number.isInteger(n) || n < 2 || n > 64) {
    throw new RangeError(`n: must be an integer in 2..64 (got ${String(n)})`);
  }
  const hit = bases.get(n);
  if (hit) return hit;
  const nodes = new Float64Array(n);
  const cos = new Float64Array(n * n);
  for (let j = 0; j < n; j++) nodes[j] = Math.cos((Math.PI * (j + 0.5)) / n);
  for (let a = 0; a < n; a++)
    for (let j = 0; j < n; j++) cos[a * n + j] = Math.cos((Math.PI * a * (j + 0.5)) / n);
  const basis = { n, nodes, cos };
  bases.set(n, basis);
  return basis;
}
