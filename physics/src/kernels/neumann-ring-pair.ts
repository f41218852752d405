import type { RingFilament } from '../filaments';
import { inPlaneBasis } from './in-plane-basis';
import { MU0 } from './mu0';

/**
 * Neumann's double integral for two circular filaments by the product trapezoidal rule (H) — the
 * slow, direct reference that the closed forms and single integrals are checked against.
 *
 * Method: M = (mu0 / 4π) ∮∮ dl1 · dl2 / |r1 - r2| with n x n equally spaced angles. The integrand
 * is periodic and analytic in both angles for separated rings, so the error falls geometrically
 * with n (rate set by separation / radius); cost n^2.
 *
 * References: F. E. Neumann, "Allgemeine Gesetze der inducirten elektrischen Ströme", Abh. Berliner
 * Akad., 1845; L. N. Trefethen, J. A. C. Weideman, SIAM Review 56(3), 2014.
 *
 * @param a - first ring, m.
 * @param b - second ring, m.
 * @param n - angles per ring (>= 3).
 * @returns M in henries, weights included.
 *
 * @example neumannRingPair(ringA, ringB, 512); // ≈ maxwellCoaxial(...) for coaxial rings
 */
export function neumannRingPair(a: RingFilament, b: RingFilament, n: number): number {
  if (!Number.isInteger(n) || n < 3) throw new RangeError(`n: must be an integer >= 3 (got ${n})`);
  const [ua, va] = inPlaneBasis(a.normal);
  const [ub, vb] = inPlaneBasis(b.normal);
  const pb = new Float64Array(3 * n);
  const tb = new Float64Array(3 * n);
  for (let j = 0; j < n; j++) {
    const t = (2 * Math.PI * j) / n;
    const c = Math.cos(t);
    const s = Math.sin(t);
    pb[3 * j] = b.center.x + b.radius * (c * ub.x + s * vb.x);
    pb[3 * j + 1] = b.center.y + b.radius * (c * ub.y + s * vb.y);
    pb[3 * j + 2] = b.center.z + b.radius * (c * ub.z + s * vb.z);
    tb[3 * j] = b.radius * (-s * ub.x + c * vb.x);
    tb[3 * j + 1] = b.radius * (-s * ub.y + c * vb.y);
    tb[3 * j + 2] = b.radius * (-s * ub.z + c * vb.z);
  }
  let sum = 0;
  for (let i = 0; i < n; i++) {
    const t = (2 * Math.PI * i) / n;
    const c = Math.cos(t);
    const s = Math.sin(t);
    const px = a.center.x + a.radius * (c * ua.x + s * va.x);
    const py = a.center.y + a.radius * (c * ua.y + s * va.y);
    const pz = a.center.z + a.radius * (c * ua.z + s * va.z);
    const tx = a.radius * (-s * ua.x + c * va.x);
    const ty = a.radius * (-s * ua.y + c * va.y);
    const tz = a.radius * (-s * ua.z + c * va.z);
    for (let j = 0; j < n; j++) {
      const dx = px - pb[3 * j];
      const dy = py - pb[3 * j + 1];
      const dz = pz - pb[3 * j + 2];
      sum +=
        (tx * tb[3 * j] + ty * tb[3 * j + 1] + tz * tb[3 * j + 2]) /
        Math.sqrt(dx * dx + dy * dy + dz * dz);
    }
  }
  const dt = (2 * Math.PI) / n;
  return (a.weight * b.weight * MU0 * sum * dt * dt) / (4 * Math.PI);
}
