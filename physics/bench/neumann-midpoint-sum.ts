import type { RingFilament } from '../src/filaments';
import { inPlaneBasis } from '../src/kernels/in-plane-basis';
import { MU0 } from '../src/kernels/mu0';

/** Midpoints and chord vectors of every ring cut into n straight segments, packed x, y, z. */
function chords(
  rings: readonly RingFilament[],
  n: number,
): { mid: Float64Array; dl: Float64Array } {
  const mid = new Float64Array(3 * n * rings.length);
  const dl = new Float64Array(3 * n * rings.length);
  let k = 0;
  for (const ring of rings) {
    const [u, v] = inPlaneBasis(ring.normal);
    const at = (t: number) =>
      [0, 1, 2].map((c) => {
        const key = (['x', 'y', 'z'] as const)[c];
        return ring.center[key] + ring.radius * (Math.cos(t) * u[key] + Math.sin(t) * v[key]);
      });
    for (let i = 0; i < n; i++) {
      const p = at((2 * Math.PI * i) / n);
      const q = at((2 * Math.PI * (i + 1)) / n);
      for (let c = 0; c < 3; c++) {
        mid[3 * k + c] = 0.5 * (p[c] + q[c]);
        dl[3 * k + c] = ring.weight * (q[c] - p[c]);
      }
      k++;
    }
  }
  return { mid, dl };
}

/**
 * The naive baseline: every ring becomes an n-gon and Neumann's double integral is the plain sum
 * over chord pairs, (mu0 / 4π) Σ_i Σ_j dl_i · dl_j / |m_i - m_j| (midpoint rule). Converges
 * like 1/n^2; cost (turns · n)^2.
 *
 * @param a - first coil's rings, m.
 * @param b - second coil's rings, m (same frame).
 * @param n - segments per turn.
 * @returns M in henries.
 */
export function neumannMidpointSum(
  a: readonly RingFilament[],
  b: readonly RingFilament[],
  n: number,
): number {
  const A = chords(a, n);
  const B = chords(b, n);
  const nb = B.mid.length / 3;
  let sum = 0;
  for (let i = 0; i < A.mid.length / 3; i++) {
    const x = A.mid[3 * i];
    const y = A.mid[3 * i + 1];
    const z = A.mid[3 * i + 2];
    const dx = A.dl[3 * i];
    const dy = A.dl[3 * i + 1];
    const dz = A.dl[3 * i + 2];
    for (let j = 0; j < nb; j++) {
      const rx = x - B.mid[3 * j];
      const ry = y - B.mid[3 * j + 1];
      const rz = z - B.mid[3 * j + 2];
      sum +=
        (dx * B.dl[3 * j] + dy * B.dl[3 * j + 1] + dz * B.dl[3 * j + 2]) /
        Math.sqrt(rx * rx + ry * ry + rz * rz);
    }
  }
  return (MU0 / (4 * Math.PI)) * sum;
}
