/**
 * The line integral ∫ dl / |p - l| over a straight segment, in closed form (dimensionless).
 *
 * Method: with the segment's direction t, length L, the foot F of the perpendicular from p, the
 * distance h of p from the line, and signed positions ξa < ξb of the ends measured from F,
 * ∫ = asinh(ξb/h) - asinh(ξa/h) = ln((ξb + R_b) / (ξa + R_a)). Each factor ξ + R is computed as
 * h^2 / (R - ξ) when ξ < 0, so points far along the line's extension and points near the segment
 * keep full relative accuracy (the textbook ln((R_a + R_b + L) / (R_a + R_b - L)) cancels there).
 * The vector potential of the segment is then mu0 I / (4 pi) t times this integral.
 *
 * References: F. W. Grover, Inductance Calculations, 1946, ch. 5 (straight filaments); C. R. Paul,
 * Inductance: Loop and Partial, Wiley, 2010, §4.
 *
 * @param ax - segment start, m (x, y, z), then the unit direction (tx, ty, tz) and length L, m.
 * @param px - field point, m (x, y, z); must not lie on the segment.
 * @returns the integral, dimensionless (Infinity on the segment itself).
 *
 * @example segmentLogIntegral(0, 0, 0, 1, 0, 0, 1, 0.5, 0.1, 0); // ≈ 4.605 (2 asinh(5))
 */
export function segmentLogIntegral(
  ax: number,
  ay: number,
  az: number,
  tx: number,
  ty: number,
  tz: number,
  L: number,
  px: number,
  py: number,
  pz: number,
): number {
  const dx = px - ax;
  const dy = py - ay;
  const dz = pz - az;
  const s = dx * tx + dy * ty + dz * tz;
  // Cross product keeps h^2 accurate when p is close to the line.
  const cx = dy * tz - dz * ty;
  const cy = dz * tx - dx * tz;
  const cz = dx * ty - dy * tx;
  const h2 = cx * cx + cy * cy + cz * cz;
  // Positions of the ends relative to the foot of the perpendicular.
  const xa = -s;
  const xb = L - s;
  const ra = Math.sqrt(xa * xa + h2);
  const rb = Math.sqrt(xb * xb + h2);
  if (xa >= 0) return Math.log((xb + rb) / (xa + ra));
  if (xb <= 0) return Math.log((ra - xa) / (rb - xb));
  return Math.log(((xb + rb) * (ra - xa)) / h2);
}
