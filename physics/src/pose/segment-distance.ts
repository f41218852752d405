import type { Vec3 } from '../filaments';

/** Closest points of two segments and their distance, metres. */
export interface SegmentClosest {
  distance: number;
  /** Parameter along the first segment, 0 at p0, 1 at p1. */
  s: number;
  /** Parameter along the second segment, 0 at q0, 1 at q1. */
  t: number;
}

/**
 * Shortest distance between segment p0–p1 and segment q0–q1 in 3D.
 *
 * Method: minimise |p(s) - q(t)|² over the unit square. The minimum lies either at the interior
 * critical point (the 2 × 2 normal equations of the infinite lines, when both parameters fall
 * inside (0, 1)) or on the square's boundary: an endpoint of one segment against the other
 * segment, a clamped projection. All five candidates are evaluated and the least kept, which
 * stays exact for parallel, near-parallel and zero-length segments where the usual clamping
 * order can pick the wrong end.
 *
 * References: C. Ericson, Real-Time Collision Detection (Morgan Kaufmann, 2005), §5.1.9,
 * "Closest points of two line segments" (normal equations; boundary handling made exhaustive).
 *
 * @param p0 start of the first segment, m
 * @param p1 end of the first segment, m
 * @param q0 start of the second segment, m
 * @param q1 end of the second segment, m
 * @returns distance (m) and the parameters of the closest points
 * @example segmentDistance({x:0,y:0,z:0},{x:1,y:0,z:0},{x:0.5,y:1,z:-1},{x:0.5,y:1,z:1})
 *   // { distance: 1, s: 0.5, t: 0.5 }
 */
export function segmentDistance(p0: Vec3, p1: Vec3, q0: Vec3, q1: Vec3): SegmentClosest {
  const d1 = sub(p1, p0);
  const d2 = sub(q1, q0);
  const r = sub(p0, q0);
  const a = dot(d1, d1);
  const e = dot(d2, d2);
  const b = dot(d1, d2);
  const c = dot(d1, r);
  const f = dot(d2, r);
  // The minimum over the unit square lies on its boundary or at the interior critical point.
  let best = at(0, clamp(e > 0 ? f / e : 0));
  for (const candidate of [
    at(1, clamp(e > 0 ? (b + f) / e : 0)),
    at(clamp(a > 0 ? -c / a : 0), 0),
    at(clamp(a > 0 ? (b - c) / a : 0), 1),
  ]) {
    if (candidate.distance < best.distance) best = candidate;
  }
  const denom = a * e - b * b;
  // Near-parallel segments have no well-defined interior point; the boundary holds the minimum.
  if (denom > 1e-12 * a * e) {
    const s = (b * f - c * e) / denom;
    const t = (a * f - b * c) / denom;
    if (s > 0 && s < 1 && t > 0 && t < 1) {
      const interior = at(s, t);
      if (interior.distance < best.distance) best = interior;
    }
  }
  return best;

  function at(s: number, t: number): SegmentClosest {
    const dx = r.x + d1.x * s - d2.x * t;
    const dy = r.y + d1.y * s - d2.y * t;
    const dz = r.z + d1.z * s - d2.z * t;
    return { distance: Math.sqrt(dx * dx + dy * dy + dz * dz), s, t };
  }
}

const sub = (u: Vec3, v: Vec3): Vec3 => ({ x: u.x - v.x, y: u.y - v.y, z: u.z - v.z });
const dot = (u: Vec3, v: Vec3): number => u.x * v.x + u.y * v.y + u.z * v.z;

function clamp(value: number): number {
  return value < 0 ? 0 : value > 1 ? 1 : value;
}
