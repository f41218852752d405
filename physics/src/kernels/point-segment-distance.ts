/**
 * Distance from a point to a straight segment given by its start, unit direction and length (m).
 *
 * Method: project onto the line, clamp to [0, L], measure.
 *
 * @returns the distance, m.
 *
 * @example pointSegmentDistance(0, 0, 0, 1, 0, 0, 1, 2, 0, 0); // 1
 */
export function pointSegmentDistance(
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
  let s = dx * tx + dy * ty + dz * tz;
  s = s < 0 ? 0 : s > L ? L : s;
  return Math.hypot(dx - s * tx, dy - s * ty, dz - s * tz);
}
