import type { PathFilament, Vec3 } from '../filaments';
import { requirePositive } from '../guards/require-positive';
import { adaptiveSegmentQuadrature } from './adaptive-segment-quadrature';
import { MU0 } from './mu0';
import { pathSegments } from './path-segments';
import { pointSegmentDistance } from './point-segment-distance';
import { segmentLogIntegral } from './segment-log-integral';
import { segmentSegmentMutual } from './segment-segment-mutual';

/** Options of the polyline self-inductance. */
export interface PolylineSelfOptions {
  /** Wire radius a, m; defaults to the path's own (use g e^(1/4) for a trace of GMD g). */
  wireRadius?: number;
  /** Surface current (no internal inductance) instead of a uniform current. */
  highFrequency?: boolean;
}

interface Seg {
  a: Vec3;
  b: Vec3;
  t: Vec3;
  l: number;
  start: number;
}

/**
 * Self-inductance of a thin round wire following a polyline (a polygon loop when closed) (H).
 *
 * Method: Dengler's curve integral, L = (mu0 / 4π) [∮∮_{|s - s'| > a/2} t·t' / |r - r'| ds ds'
 * + Y ℓ], Y = 1/2 for a uniform current (low frequency) and 0 for a surface current, ℓ the wire
 * length. It is the Neumann integral of the centre line with the pairs closer than a/2 in arc
 * length left out; for a circle it gives mu0 R (ln(8R/a) - 7/4) (or - 2), and it stays right
 * however
 * finely an arc is cut into segments (partial inductances with a GMD do not when segments get
 * shorter than the wire is thick). Same-segment terms are closed form, 2l (ln(2l/a) - 1) + a;
 * pairs farther than a/2 apart along the wire use `segmentSegmentMutual`; the few pairs nearer
 * than that integrate the analytic segment potential over the allowed part with graded panels.
 * Rectangular traces: pass a = g e^(1/4) with g = 0.2235 (w + t) (Rosa's GMD), which matches the
 * GMD form at low frequency.
 *
 * References: R. Dengler, "Self inductance of a wire loop as a curve integral", Advanced
 * Electromagnetics 5(1), 2016; E. B. Rosa, Bull. Bureau of Standards 4(2), 1908; F. W. Grover,
 * Inductance Calculations, 1946, ch. 18.
 *
 * @param path - the wire's centre line, m (its weight is ignored: this is the loop's own L).
 * @param options - wire radius override, high-frequency variant.
 * @returns L in henries.
 *
 * @example polylineSelf(square100mmOf1mmWire); // ≈ 3.6e-7 H
 */
export function polylineSelf(path: PathFilament, options: PolylineSelfOptions = {}): number {
  const a = requirePositive('wireRadius', options.wireRadius ?? path.wireRadius, 'm');
  const c = a / 2;
  const segs: Seg[] = [];
  let total = 0;
  for (const [p, q] of pathSegments(path)) {
    const l = Math.hypot(q.x - p.x, q.y - p.y, q.z - p.z);
    segs.push({
      a: p,
      b: q,
      l,
      start: total,
      t: { x: (q.x - p.x) / l, y: (q.y - p.y) / l, z: (q.z - p.z) / l },
    });
    total += l;
  }
  if (total <= a)
    throw new RangeError(`path length: must exceed the wire radius ${a}, in m (got ${total})`);
  let sum = 0;
  for (let i = 0; i < segs.length; i++) {
    const si = segs[i];
    if (si.l > c) sum += 2 * si.l * (Math.log(si.l / c) - 1) + a;
    for (let j = i + 1; j < segs.length; j++) {
      const sj = segs[j];
      const forward = sj.start - (si.start + si.l);
      const backward = path.closed ? total - (sj.start + sj.l) + si.start : Infinity;
      const gap = Math.min(forward, backward);
      if (gap >= c) {
        sum += (2 * segmentSegmentMutual(si.a, si.b, sj.a, sj.b)) / (MU0 / (4 * Math.PI));
      } else if (forward <= backward) {
        sum += 2 * nearPair(si, false, sj, true, gap, c);
      } else {
        sum += 2 * nearPair(si, true, sj, false, gap, c);
      }
    }
  }
  const y = options.highFrequency ? 0 : 0.5;
  return (MU0 / (4 * Math.PI)) * (sum + y * total);
}

/**
 * ∫∫ t_i·t_j / r over the pairs of points of segments i and j farther than c apart along the wire,
 * the wire joining them through the given near ends (`iNearStart`: i's near end is its start).
 */
function nearPair(
  si: Seg,
  iNearStart: boolean,
  sj: Seg,
  jNearStart: boolean,
  gap: number,
  c: number,
): number {
  const dot = si.t.x * sj.t.x + si.t.y * sj.t.y + si.t.z * sj.t.z;
  if (dot === 0) return 0;
  // Point on j at distance tau from its near end.
  const pj = (tau: number): Vec3 => {
    const s = jNearStart ? tau : sj.l - tau;
    return { x: sj.a.x + s * sj.t.x, y: sj.a.y + s * sj.t.y, z: sj.a.z + s * sj.t.z };
  };
  // Allowed part of i: distance >= from its near end; returned as start point and length.
  const part = (from: number): [Vec3, number] => {
    const len = si.l - from;
    const s0 = iNearStart ? from : 0;
    return [{ x: si.a.x + s0 * si.t.x, y: si.a.y + s0 * si.t.y, z: si.a.z + s0 * si.t.z }, len];
  };
  const f = (tau: number): number => {
    const from = Math.max(0, c - gap - tau);
    if (from >= si.l) return 0;
    const [o, len] = part(from);
    const p = pj(tau);
    return segmentLogIntegral(o.x, o.y, o.z, si.t.x, si.t.y, si.t.z, len, p.x, p.y, p.z);
  };
  const dist = (tau: number): number => {
    const from = Math.max(0, c - gap - tau);
    if (from >= si.l) return Infinity;
    const [o, len] = part(from);
    const p = pj(tau);
    return pointSegmentDistance(o.x, o.y, o.z, si.t.x, si.t.y, si.t.z, len, p.x, p.y, p.z);
  };
  // Breakpoints where the allowed part of i starts to exist and becomes the whole segment.
  const t1 = Math.min(Math.max(c - gap - si.l, 0), sj.l);
  const t2 = Math.min(Math.max(c - gap, 0), sj.l);
  let sum = 0;
  for (const [lo, hi] of [
    [t1, t2],
    [t2, sj.l],
  ]) {
    if (hi > lo)
      sum += adaptiveSegmentQuadrature(
        hi - lo,
        (s) => dist(lo + s),
        (s) => f(lo + s),
        { points: 12 },
      );
  }
  return dot * sum;
}
