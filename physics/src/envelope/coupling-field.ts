/**
 * A sampled x–y map of one quantity (k, M or efficiency) at fixed gap and tilt: `values` is
 * row-major with x fastest, values[j·xs.length + i] at (xs[i], ys[j]). Positions in metres, both
 * axes strictly ascending (spacing may vary).
 */
export interface CouplingField {
  xs: ArrayLike<number>;
  ys: ArrayLike<number>;
  values: ArrayLike<number>;
}
