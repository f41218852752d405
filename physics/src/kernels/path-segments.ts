import type { PathFilament, Vec3 } from '../filaments';

/**
 * The straight segments of a polyline filament as [start, end] pairs, including the closing
 * segment of a closed path; zero-length segments (repeated points) are dropped.
 *
 * @param path - the polyline, m.
 * @returns its segments in current order.
 *
 * @example pathSegments({ points: [p, q], closed: false, wireRadius, weight: 1 }); // [[p, q]]
 */
export function pathSegments(path: PathFilament): Array<[Vec3, Vec3]> {
  const pts = path.points;
  const out: Array<[Vec3, Vec3]> = [];
  const count = path.closed ? pts.length : pts.length - 1;
  for (let i = 0; i < count; i++) {
    const p = pts[i];
    const q = pts[(i + 1) % pts.length];
    for (const c of [p.x, p.y, p.z, q.x, q.y, q.z]) {
      if (!Number.isFinite(c))
        throw new RangeError(`path point: coordinates must be finite numbers, in m (got ${c})`);
    }
    if (p.x !== q.x || p.y !== q.y || p.z !== q.z) out.push([p, q]);
  }
  return out;
}
