import type { PathFilament } from '../filaments';
import { SEGMENT_STRIDE } from './path-stack-mutual';
import { pathSegments } from './path-segments';

/**
 * The straight segments of polyline filaments packed into one typed array for inner loops:
 * start x, y, z, end x, y, z and the path's weight per segment (`SEGMENT_STRIDE` numbers), in
 * current order; zero-length segments are dropped (`pathSegments`).
 *
 * @param paths - the polylines, m.
 * @returns the packed segments.
 *
 * @example packedSegments([squareLoop]).length; // 4 · 7
 */
export function packedSegments(paths: readonly PathFilament[]): Float64Array {
  const all = paths.flatMap((p) => pathSegments(p).map(([a, b]) => [a, b, p.weight] as const));
  const out = new Float64Array(all.length * SEGMENT_STRIDE);
  all.forEach(([a, b, w], i) => {
    out.set([a.x, a.y, a.z, b.x, b.y, b.z, w], i * SEGMENT_STRIDE);
  });
  return out;
}
