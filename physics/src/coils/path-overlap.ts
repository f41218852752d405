import type { Vec3 } from '../filaments';
import { segmentDistance } from '../pose/segment-distance';

/** Two segments of one path that come too close: indices of their start points. */
export interface PathOverlap {
  first: number;
  second: number;
  /** Distance between the two centre lines, m. */
  distance: number;
}

/**
 * Finds two parts of a polyline winding whose conductors would overlap.
 *
 * Method: every pair of segments further apart along the path than π · width is tested with the
 * exact segment–segment distance (Ericson 2005, §5.1.9); a distance below `width` means the
 * conductors overlap. Pairs closer along the path are skipped: a bend of radius width/2 brings
 * points π · width/2 apart along the path to one width apart in space, so nearer pairs are
 * neighbours on a bend, not a crossing. Bounding boxes skip far pairs; the cost is quadratic in
 * the point count, which the schema caps at 5000.
 *
 * References: C. Ericson, Real-Time Collision Detection (2005), §5.1.9.
 *
 * @param points the polyline, m
 * @param closed whether a segment joins the last point back to the first
 * @param width conductor width (diameter for round wire), m
 * @returns the first overlapping pair found, or null
 * @example pathOverlap([{x:0,y:0,z:0},{x:1,y:0,z:0},{x:1,y:1,z:0},{x:0,y:1,z:0}], true, 1e-3)
 *   // null
 */
export function pathOverlap(points: Vec3[], closed: boolean, width: number): PathOverlap | null {
  const n = points.length;
  const segments = closed ? n : n - 1;
  const along: number[] = [0];
  for (let i = 1; i <= segments; i++) {
    along.push(along[i - 1] + distance(points[i - 1], points[i % n]));
  }
  const total = along[segments];
  const skip = Math.PI * width;
  for (let i = 0; i < segments; i++) {
    const p0 = points[i];
    const p1 = points[(i + 1) % n];
    for (let j = i + 1; j < segments; j++) {
      const gap = along[j] - along[i + 1];
      const wrapGap = closed ? total - along[j + 1] + along[i] : Infinity;
      if (gap < skip || wrapGap < skip) continue;
      const q0 = points[j];
      const q1 = points[(j + 1) % n];
      if (boxesApart(p0, p1, q0, q1, width)) continue;
      const closest = segmentDistance(p0, p1, q0, q1);
      if (closest.distance < width) return { first: i, second: j, distance: closest.distance };
    }
  }
  return null;
}

function boxesApart(p0: Vec3, p1: Vec3, q0: Vec3, q1: Vec3, margin: number): boolean {
  return (
    Math.min(p0.x, p1.x) - margin > Math.max(q0.x, q1.x) ||
    Math.min(q0.x, q1.x) - margin > Math.max(p0.x, p1.x) ||
    Math.min(p0.y, p1.y) - margin > Math.max(q0.y, q1.y) ||
    Math.min(q0.y, q1.y) - margin > Math.max(p0.y, p1.y) ||
    Math.min(p0.z, p1.z) - margin > Math.max(q0.z, q1.z) ||
    Math.min(q0.z, q1.z) - margin > Math.max(p0.z, p1.z)
  );
}

function distance(a: Vec3, b: Vec3): number {
  return Math.hypot(a.x - b.x, a.y - b.y, a.z - b.z);
}
