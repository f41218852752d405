import type { PathFilament } from '../filaments';
import { pathSegments } from './path-segments';
import { segmentSegmentMutual } from './segment-segment-mutual';

/**
 * Mutual inductance of two polyline filaments (H), weights included.
 *
 * Method: Neumann's double integral as the sum over all segment pairs of `segmentSegmentMutual`
 * (closed forms for parallel and end-sharing pairs, analytic inner integral otherwise).
 *
 * References: F. Neumann, 1845; F. W. Grover, Inductance Calculations, 1946, ch. 18.
 *
 * @param p - first polyline, m.
 * @param q - second polyline, m.
 * @returns M in henries.
 *
 * @example pathPathMutual(squareA, squareB); // M of two square loops
 */
export function pathPathMutual(p: PathFilament, q: PathFilament): number {
  const sp = pathSegments(p);
  const sq = pathSegments(q);
  let sum = 0;
  for (const [a1, b1] of sp) for (const [a2, b2] of sq) sum += segmentSegmentMutual(a1, b1, a2, b2);
  return p.weight * q.weight * sum;
}
