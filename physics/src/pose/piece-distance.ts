import type { Vec3 } from '../filaments';
import type { ClearancePiece } from './clearance-pieces';
import { segmentDistance } from './segment-distance';

/** Closest points of two pieces of centre line and the unit tangents there. */
export interface PieceClosest {
  distance: number;
  pointA: Vec3;
  pointB: Vec3;
  tangentA: Vec3;
  tangentB: Vec3;
}

/** Samples of the parameter before refining: 5° on a ring, so no basin of a minimum is missed. */
const RING_SAMPLES = 72;
const SEGMENT_SAMPLES = 24;
/** Golden-section steps: shrink the bracket by 0.618^48 ≈ 1e-10, far below any wire radius. */
const REFINE_STEPS = 48;

/**
 * Shortest distance between two pieces of conductor centre line (rings and straight segments in
 * any position), with the closest points and the tangents there.
 *
 * Method: segment–segment in closed form (Ericson 2005, §5.1.9). A ring against anything: the
 * distance from a point to a circle is closed-form, sqrt(h² + (ρ - R)²) with h the height above
 * the ring's plane and ρ the distance from its axis; the other piece's parameter (angle on a ring,
 * position on a segment) is sampled (every 5° or 24 steps) and the best sample refined by golden
 * section search within one sample step either side.
 *
 * References: C. Ericson, Real-Time Collision Detection (2005), §5.1.9; J. Kiefer, "Sequential
 * minimax search for a maximum", Proc. AMS 4 (1953) (golden section search).
 *
 * @param a first piece, m
 * @param b second piece, m
 * @returns distance between centre lines (m), closest points and tangents
 * @example pieceDistance(ringAtOrigin, ringAbove3mm).distance // 0.003 for equal coaxial rings
 */
export function pieceDistance(a: ClearancePiece, b: ClearancePiece): PieceClosest {
  if (a.kind === 'segment' && b.kind === 'segment') {
    const c = segmentDistance(a.p, a.q, b.p, b.q);
    return {
      distance: c.distance,
      pointA: lerp(a.p, a.q, c.s),
      pointB: lerp(b.p, b.q, c.t),
      tangentA: unit(sub(a.q, a.p)),
      tangentB: unit(sub(b.q, b.p)),
    };
  }
  if (a.kind === 'ring') {
    const flipped = nearestToRing(a, b);
    return {
      distance: flipped.distance,
      pointA: flipped.pointB,
      pointB: flipped.pointA,
      tangentA: flipped.tangentB,
      tangentB: flipped.tangentA,
    };
  }
  return nearestToRing(b as Extract<ClearancePiece, { kind: 'ring' }>, a);
}

type Ring = Extract<ClearancePiece, { kind: 'ring' }>;

/** Walks `other` (pointA, tangentA) and finds its closest approach to `ring` (pointB, tangentB). */
function nearestToRing(ring: Ring, other: ClearancePiece): PieceClosest {
  let at: (u: number) => Vec3;
  let tangent: (u: number) => Vec3;
  let samples: number;
  let periodic: boolean;
  if (other.kind === 'ring') {
    const [e1, e2] = basis(other.normal);
    const r = other.radius;
    at = (u) => add(other.center, add(scale(e1, r * Math.cos(u)), scale(e2, r * Math.sin(u))));
    tangent = (u) => add(scale(e1, -Math.sin(u)), scale(e2, Math.cos(u)));
    samples = RING_SAMPLES;
    periodic = true;
  } else {
    at = (u) => lerp(other.p, other.q, u);
    const direction = unit(sub(other.q, other.p));
    tangent = () => direction;
    samples = SEGMENT_SAMPLES;
    periodic = false;
  }
  const span = periodic ? 2 * Math.PI : 1;
  const step = span / samples;
  const f = (u: number) => pointToRing(at(u), ring).distance;
  let best = 0;
  let bestValue = Infinity;
  for (let k = 0; k <= samples - (periodic ? 1 : 0); k++) {
    const value = f(k * step);
    if (value < bestValue) [best, bestValue] = [k * step, value];
  }
  let lo = periodic ? best - step : Math.max(0, best - step);
  let hi = periodic ? best + step : Math.min(1, best + step);
  const g = (Math.sqrt(5) - 1) / 2;
  let x1 = hi - g * (hi - lo);
  let x2 = lo + g * (hi - lo);
  let f1 = f(x1);
  let f2 = f(x2);
  for (let i = 0; i < REFINE_STEPS; i++) {
    if (f1 < f2) {
      hi = x2;
      x2 = x1;
      f2 = f1;
      x1 = hi - g * (hi - lo);
      f1 = f(x1);
    } else {
      lo = x1;
      x1 = x2;
      f1 = f2;
      x2 = lo + g * (hi - lo);
      f2 = f(x2);
    }
  }
  const u = [best, x1, x2].reduce((p, q) => (f(q) < f(p) ? q : p));
  const point = at(u);
  const near = pointToRing(point, ring);
  return {
    distance: near.distance,
    pointA: point,
    pointB: near.point,
    tangentA: unit(tangent(u)),
    tangentB: near.tangent,
  };
}

function pointToRing(p: Vec3, ring: Ring): { distance: number; point: Vec3; tangent: Vec3 } {
  const v = sub(p, ring.center);
  const h = dot(v, ring.normal);
  const w = sub(v, scale(ring.normal, h));
  const rho = Math.hypot(w.x, w.y, w.z);
  const radial = rho > 0 ? scale(w, 1 / rho) : basis(ring.normal)[0];
  return {
    distance: Math.hypot(h, rho - ring.radius),
    point: add(ring.center, scale(radial, ring.radius)),
    tangent: cross(ring.normal, radial),
  };
}

/** Two unit vectors completing `n` to a right-handed orthonormal frame (e1 × e2 = n). */
function basis(n: Vec3): [Vec3, Vec3] {
  const helper = Math.abs(n.x) < 0.9 ? { x: 1, y: 0, z: 0 } : { x: 0, y: 1, z: 0 };
  const e1 = unit(cross(helper, n));
  return [e1, cross(n, e1)];
}

const add = (a: Vec3, b: Vec3): Vec3 => ({ x: a.x + b.x, y: a.y + b.y, z: a.z + b.z });
const sub = (a: Vec3, b: Vec3): Vec3 => ({ x: a.x - b.x, y: a.y - b.y, z: a.z - b.z });
const scale = (a: Vec3, s: number): Vec3 => ({ x: a.x * s, y: a.y * s, z: a.z * s });
const dot = (a: Vec3, b: Vec3): number => a.x * b.x + a.y * b.y + a.z * b.z;
const cross = (a: Vec3, b: Vec3): Vec3 => ({
  x: a.y * b.z - a.z * b.y,
  y: a.z * b.x - a.x * b.z,
  z: a.x * b.y - a.y * b.x,
});
const lerp = (a: Vec3, b: Vec3, t: number): Vec3 => add(a, scale(sub(b, a), t));
function unit(a: Vec3): Vec3 {
  const length = Math.hypot(a.x, a.y, a.z);
  return length > 0 ? scale(a, 1 / length) : { x: 0, y: 0, z: 1 };
}
