import type { PathFilament, RingFilament } from '../src/filaments';
import { inPlaneBasis } from '../src/kernels/in-plane-basis';
import { MU0 } from '../src/kernels/mu0';
import { pathSegments } from '../src/kernels/path-segments';
import { segmentLogIntegral } from '../src/kernels/segment-log-integral';

/**
 * Converged brute-force reference for polygons against rings, independent of the ring kernel:
 * the polygons' vector potential in closed form (straight segments: logarithms only) integrated
 * around each ring by the trapezoidal rule, nodes doubled from 512 until two sums agree to 1e-11
 * of the integral of |integrand| (geometric convergence for a periodic analytic integrand).
 *
 * @returns M in henries and the node count reached.
 */
export function ringPathReference(
  paths: readonly PathFilament[],
  rings: readonly RingFilament[],
): { M: number; nodes: number } {
  const segs = paths.flatMap((p) =>
    pathSegments(p).map(([a, b]) => {
      const L = Math.hypot(b.x - a.x, b.y - a.y, b.z - a.z);
      return {
        a,
        t: { x: (b.x - a.x) / L, y: (b.y - a.y) / L, z: (b.z - a.z) / L },
        L,
        w: p.weight,
      };
    }),
  );
  let total = 0;
  let most = 0;
  for (const ring of rings) {
    const [u, v] = inPlaneBasis(ring.normal);
    const f = (t: number): number => {
      const c = Math.cos(t);
      const s = Math.sin(t);
      const px = ring.center.x + ring.radius * (c * u.x + s * v.x);
      const py = ring.center.y + ring.radius * (c * u.y + s * v.y);
      const pz = ring.center.z + ring.radius * (c * u.z + s * v.z);
      const tx = ring.radius * (-s * u.x + c * v.x);
      const ty = ring.radius * (-s * u.y + c * v.y);
      const tz = ring.radius * (-s * u.z + c * v.z);
      let sum = 0;
      for (const g of segs) {
        const dot = g.t.x * tx + g.t.y * ty + g.t.z * tz;
        sum +=
          g.w * dot * segmentLogIntegral(g.a.x, g.a.y, g.a.z, g.t.x, g.t.y, g.t.z, g.L, px, py, pz);
      }
      return sum;
    };
    let n = 512;
    let sum = 0;
    let abs = 0;
    for (let j = 0; j < n; j++) {
      const val = f((2 * Math.PI * j) / n);
      sum += val;
      abs += Math.abs(val);
    }
    let est = (2 * Math.PI * sum) / n;
    for (;;) {
      for (let j = 0; j < n; j++) {
        const val = f((2 * Math.PI * (j + 0.5)) / n);
        sum += val;
        abs += Math.abs(val);
      }
      n *= 2;
      const next = (2 * Math.PI * sum) / n;
      if (Math.abs(next - est) <= 1e-11 * ((2 * Math.PI * abs) / n) || n >= 1 << 16) {
        est = next;
        break;
      }
      est = next;
    }
    most = Math.max(most, n);
    total += ring.weight * est;
  }
  return { M: (MU0 / (4 * Math.PI)) * total, nodes: most };
}
