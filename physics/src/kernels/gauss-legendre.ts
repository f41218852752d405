/** Nodes and weights of an n-point Gauss–Legendre rule on [-1, 1]. */
export interface GaussRule {
  nodes: Float64Array;
  weights: Float64Array;
}

const cache = new Map<number, GaussRule>();

/**
 * Gauss–Legendre quadrature rule of n points on [-1, 1], exact for polynomials of degree 2n - 1.
 *
 * Method: Newton's iteration on the Legendre polynomial P_n from Tricomi's initial guesses, the
 * three-term recurrence for P_n and P_n'; weights 2 / ((1 - x^2) P_n'(x)^2). Rules are cached.
 *
 * References: G. H. Golub, J. H. Welsch, "Calculation of Gauss quadrature rules", Math. Comp.
 * 23(106), 1969; DLMF §3.5(v).
 *
 * @param n - number of points, an integer 1..512.
 * @returns nodes ascending and their weights (the weights sum to 2).
 *
 * @example gaussLegendre(2).nodes; // ≈ [-0.57735, 0.57735]
 */
export function gaussLegendre(n: number): GaussRule {
  if (!Number.isInteger(n) || n < 1 || n > 512) {
    throw new RangeError(`n: must be an integer in 1..512 (got ${String(n)})`);
  }
  const hit = cache.get(n);
  if (hit) return hit;
  const nodes = new Float64Array(n);
  const weights = new Float64Array(n);
  for (let i = 0; i < Math.ceil(n / 2); i++) {
    // Tricomi's approximation of the i-th root, descending from 1.
    let x = Math.cos((Math.PI * (i + 0.75)) / (n + 0.5));
    for (let iter = 0; iter < 100; iter++) {
      const [pn, dp] = legendreWithSlope(n, x);
      const dx = pn / dp;
      x -= dx;
      // 1e-16 is below the spacing of doubles near the roots: Newton has converged.
      if (Math.abs(dx) < 1e-16) break;
    }
    // The derivative at the converged root, for the weight.
    const dp = legendreWithSlope(n, x)[1];
    const w = 2 / ((1 - x * x) * dp * dp);
    nodes[n - 1 - i] = x;
    nodes[i] = -x;
    weights[i] = w;
    weights[n - 1 - i] = w;
  }
  if (n % 2 === 1) nodes[(n - 1) / 2] = 0;
  const rule = { nodes, weights };
  cache.set(n, rule);
  return rule;
}

/**
 * P_n(x) and P_n'(x) by the three-term recurrence (k P_k = (2k − 1) x P_(k−1) − (k − 1) P_(k−2))
 * and P_n' = n (x P_n − P_(n−1)) / (x² − 1), for |x| < 1 (DLMF 18.9.1, 18.9.18).
 */
function legendreWithSlope(n: number, x: number): [number, number] {
  let p0 = 1;
  let p1 = x;
  for (let k = 2; k <= n; k++) {
    const p2 = ((2 * k - 1) * x * p1 - (k - 1) * p0) / k;
    p0 = p1;
    p1 = p2;
  }
  return [p1, (n * (x * p1 - p0)) / (x * x - 1)];
}
