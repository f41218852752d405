import besselj0 from '@stdlib/math-base-special-besselj0';
import { besselPairSummary } from '../kernels/bessel-pair-summary';
import { BESSEL_DECAY, BESSEL_MAX_NODES, besselQuadrature } from '../kernels/bessel-quadrature';
import { groverParallel } from '../kernels/grover-parallel';
import { maxwellCoaxial } from '../kernels/maxwell-coaxial';
import { MU0 } from '../kernels/mu0';
import type { StackRing } from './coaxial-stack';

/** Grover's integral costs about this many kernel calls per ring pair and offset. */
const GROVER_COST = 128;

/**
 * Mutual inductance of two coaxial-ring coils with parallel axes at one gap z and many lateral
 * offsets (H each) — the core of a sweep over x and y.
 *
 * Method: offset 0 sums Maxwell's closed form over the ring pairs. Other offsets use Conway's
 * Bessel form when the coils are apart (h = z + lowest Rx ring - highest Tx ring > 0): each coil is
 * summarised once, S(k) = Σ w_i r_i J1(k r_i) e^(-k depth_i) (`besselPairSummary`), the product
 * P(k) = mu0 π S_tx S_rx e^(-k h) is formed once per gap, and each offset then costs one sum
 * Σ P(k_n) J0(k_n rho) w_n over the nodes of `besselQuadrature`. When the coils overlap in height,
 * or Grover's per-pair integral is cheaper (few offsets, tiny gap), the pairs are summed with
 * `groverParallel`. The caller passes offsets squared so that symmetric grid points (±x, ±y,
 * x <-> y) share one exact key.
 *
 * References: J. C. Maxwell, Treatise, 1873, art. 701; F. W. Grover, Inductance Calculations,
 * 1946, ch. 13; J. T. Conway, IEEE Trans. Magn. 43(3), 2007.
 *
 * @param tx - Tx rings (its images included), m.
 * @param rx - Rx rings in its local frame, m.
 * @param z - height of the Rx's local origin above the Tx's, m.
 * @param rho2 - squared lateral offsets, m^2 (duplicates are computed once).
 * @returns M for every offset, henries.
 *
 * @example coaxialCoilMutualMany(tx20, rx20, 0.003, Float64Array.of(0, 1e-4)); // [M(0), M(10 mm)]
 */
export function coaxialCoilMutualMany(
  tx: readonly StackRing[],
  rx: readonly StackRing[],
  z: number,
  rho2: Float64Array,
): Float64Array {
  const unique = new Map<number, number>();
  for (const r2 of rho2) unique.set(r2, NaN);
  const offsets = [...unique.keys()].filter((r2) => r2 > 0);
  if (unique.has(0)) {
    let sum = 0;
    for (const a of tx)
      for (const b of rx) sum += a.weight * b.weight * maxwellCoaxial(a.r, b.r, z + b.z - a.z);
    unique.set(0, sum);
  }
  if (offsets.length > 0) {
    const values = bessel(tx, rx, z, offsets) ?? grover(tx, rx, z, offsets);
    offsets.forEach((r2, i) => unique.set(r2, values[i]));
  }
  return Float64Array.from(rho2, (r2) => unique.get(r2) as number);
}

function bessel(
  tx: readonly StackRing[],
  rx: readonly StackRing[],
  z: number,
  offsets: number[],
): number[] | null {
  const top = Math.max(...tx.map((a) => a.z));
  const bottom = Math.min(...rx.map((b) => b.z));
  const h = z + bottom - top;
  if (!(h > 0)) return null;
  const rhoMax = Math.sqrt(Math.max(...offsets));
  const reach = Math.max(...tx.map((a) => a.r)) + Math.max(...rx.map((b) => b.r)) + rhoMax;
  // Node count of besselQuadrature (8 points per panel of min(2π/reach, 2/h)).
  const nodes = 8 * Math.ceil(BESSEL_DECAY / h / Math.min((2 * Math.PI) / reach, 2 / h));
  const besselCost = nodes * (tx.length + rx.length + offsets.length);
  const groverCost = GROVER_COST * tx.length * rx.length * offsets.length;
  if (nodes > BESSEL_MAX_NODES || besselCost > groverCost) return null;
  const q = besselQuadrature(h, reach);
  const sTx = besselPairSummary(
    tx.map((a) => ({ r: a.r, depth: top - a.z, weight: a.weight })),
    q.k,
  );
  const sRx = besselPairSummary(
    rx.map((b) => ({ r: b.r, depth: b.z - bottom, weight: b.weight })),
    q.k,
  );
  const p = new Float64Array(q.k.length);
  for (let n = 0; n < p.length; n++)
    p[n] = MU0 * Math.PI * q.w[n] * sTx[n] * sRx[n] * Math.exp(-q.k[n] * h);
  return offsets.map((r2) => {
    const rho = Math.sqrt(r2);
    let sum = 0;
    for (let n = 0; n < p.length; n++) sum += p[n] * besselj0(q.k[n] * rho);
    return sum;
  });
}

function grover(
  tx: readonly StackRing[],
  rx: readonly StackRing[],
  z: number,
  offsets: number[],
): number[] {
  return offsets.map((r2) => {
    const rho = Math.sqrt(r2);
    let sum = 0;
    for (const a of tx)
      for (const b of rx) sum += a.weight * b.weight * groverParallel(a.r, b.r, rho, z + b.z - a.z);
    return sum;
  });
}
