import type { PathFilament, RingFilament } from '../filaments';
import { pathSegments } from './path-segments';
import { segmentRingMutual } from './segment-ring-mutual';

/**
 * Mutual inductance of a polyline filament and a circular filament (H), weights included.
 *
 * Method: the sum over the polyline's segments of `segmentRingMutual` (ring vector potential in
 * closed form, distance-graded Gauss–Legendre along each segment).
 *
 * References: J. D. Jackson, Classical Electrodynamics, 3rd ed., 1999, eq. 5.37.
 *
 * @param path - the polyline (closed for a meaningful loop value), m.
 * @param ring - the circular filament.
 * @returns M in henries.
 *
 * @example pathRingMutual(squareLoop, ring); // ≈ M of the square and the ring
 */
export function pathRingMutual(path: PathFilament, ring: RingFilament): number {
  let sum = 0;
  for (const [a, b] of pathSegments(path)) sum += segmentRingMutual(a, b, ring);
  return path.weight * sum;
}
