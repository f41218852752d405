import type { Coil } from '../coils/coil-schema';
import { ferriteImages } from '../coils/ferrite-images';
import { parseCoil } from '../coils/parse-coil';
import type { FilamentSet } from '../filaments';
import { checkClearance } from '../pose/check-clearance';
import { parsePose } from '../pose/parse-pose';
import type { Pose, PoseInput } from '../pose/pose-schema';
import { transformFilaments } from '../pose/transform-filaments';
import { coaxialCoilMutualMany } from './coaxial-coil-mutual-many';
import { coaxialStack, type StackRing } from './coaxial-stack';
import { conductorReach } from './conductor-reach';
import { filamentSetMutual } from './filament-set-mutual';
import { filamentSetSelf } from './filament-set-self';
import { heightRange } from './height-range';
import { pairFilaments } from './pair-filaments';
import { stackRoute } from './stack-route';

/** Options of a prepared pair. */
export interface PreparePairOptions {
  /** Reject poses in which the coils intersect (default true; a sweep may check its grid once). */
  checkClearance?: boolean;
}

/** A Tx–Rx pair ready for many poses. Inductances in henries, poses in metres and degrees. */
export interface PreparedPair {
  /** Tx self-inductance, low frequency, its backing included. */
  L1: number;
  /** Rx self-inductance on its own (no plate). */
  L2: number;
  /** Rx self-inductance in a pose: with a Tx backing the Rx's own image adds to it. */
  L2At(pose: PoseInput): number;
  mutual(pose: PoseInput): number;
  mutualMany(poses: readonly PoseInput[]): Float64Array;
  /** k = M / sqrt(L1 L2At(pose)), dimensionless, |k| <= 1. */
  coupling(pose: PoseInput): number;
}

const union = (a: FilamentSet, b: FilamentSet): FilamentSet => ({
  rings: [...a.rings, ...b.rings],
  paths: [...a.paths, ...b.paths],
});

/**
 * Prepares a Tx–Rx pair for many poses: what makes a sweep cheap.
 *
 * Method: filaments and self-inductances are built once. Poses are then served by the cheapest
 * exact route: (1) both coils coaxial-ring stacks (rings, circular spirals, ring solenoids) and
 * the Rx untilted — M depends only on the gap z and the radial offset rho, so poses are grouped by
 * z, offsets keyed by x² + y² (exactly equal for ±x, ±y and x <-> y), and each group is one call
 * of `coaxialCoilMutualMany` (Maxwell at rho = 0; Conway's Bessel form with each coil summarised
 * once per gap; Grover's integral when the coils overlap in height); (2) a polygon coil against a
 * coaxial-ring coil in any other pose: the ring stack's summed vector potential, tabulated once
 * per pair (`ringStackTable`, verified to 1e-12 of the field), integrated along the polygon sides
 * with distance-graded Gauss–Legendre panels (`stackRoute`, `pathStackMutual`), the remaining
 * ring pairs by Babic's integral; (3) any other pose sums the filament pairs
 * (`filamentSetMutual`: Babic's single integral for tilted rings, the ring vector potential
 * along polygon sides, Neumann with analytic inner integrals between polygons). Results
 * are cached per (z, rho²) for route (1). A Tx `backing` adds its image filaments with weight
 * (mur - 1)/(mur + 1) to the Tx: M = M(Tx, Rx) + w M(image(Tx), Rx) — one image term (the Rx's
 * image seen by the Tx is the same flux by mirror symmetry; counting both would double the plate).
 * The Rx's self-inductance rises by w M(image(Rx), Rx) near the plate (`L2At`). An Rx `backing`
 * is rejected: two plates need an infinite series of images. Clearance: a pose whose Rx lies
 * wholly above the Tx and the plate (heights plus conductor reach) is accepted at once; any other
 * goes through `checkClearance`.
 *
 * References: J. C. Maxwell, Treatise, 1873, art. 701; F. W. Grover, Inductance Calculations,
 * 1946; J. T. Conway, IEEE Trans. Magn. 43(3), 2007; S. Babic et al., IEEE Trans. Magn. 46(9),
 * 2010; J. D. Jackson, Classical Electrodynamics, 3rd ed., problem 5.17.
 *
 * @param tx - transmitter (validated with parseCoil; RangeError naming the field otherwise).
 * @param rx - receiver.
 * @param options - clearance checking.
 * @returns L1, L2 (H) and pose functions.
 *
 * @example
 * const pair = preparePair(pad50mm, pad40mm);
 * pair.mutualMany([{ z: 0.003 }, { x: 0.01, z: 0.003 }]); // ≈ Float64Array [1.1e-5, 6.9e-6]
 */
export function preparePair(tx: Coil, rx: Coil, options: PreparePairOptions = {}): PreparedPair {
  const txCoil = parseCoil(tx, 'tx');
  const rxCoil = parseCoil(rx, 'rx');
  if (rxCoil.backing) {
    throw new RangeError(
      'rx.backing: only the Tx ferrite backing is modelled in a pair; allowed: a backing on the Tx',
    );
  }
  const check = options.checkClearance ?? true;
  const txF = pairFilaments(txCoil);
  const rxOwn = pairFilaments(rxCoil).own;
  const txAll = union(txF.own, txF.images);
  const txStack = coaxialStack(txAll);
  const rxStack = coaxialStack(rxOwn);
  // Self-inductances on first use: a single mutualInductance call does not need them.
  let l1: number | undefined;
  let l2: number | undefined;
  const getL1 = (): number =>
    (l1 ??=
      filamentSetSelf(txF.own) + (txF.imageWeight ? filamentSetMutual(txF.images, txF.own) : 0));
  const getL2 = (): number => (l2 ??= filamentSetSelf(rxOwn));
  const cache = new Map<string, number>();
  const l2Cache = new Map<number, number>();

  // Whole Rx above the whole Tx (and above the plate): no contact possible, skip the full check.
  const txTop = heightRange(txF.own)[1] + conductorReach(txCoil);
  const rxReach = conductorReach(rxCoil);
  const floor = txCoil.backing ? -txCoil.backing.distance : -Infinity;
  const rxLocalLow = heightRange(rxOwn)[0];
  const accept = (input: PoseInput): Pose => {
    const pose = parsePose(input);
    if (!check) return pose;
    const untilted = pose.tiltX === 0 && pose.tiltY === 0;
    const low =
      (untilted ? pose.z + rxLocalLow : heightRange(transformFilaments(rxOwn, pose))[0]) - rxReach;
    if (!(low > txTop && low > floor)) checkClearance(txCoil, rxCoil, pose);
    return pose;
  };
  const parallel = (p: Pose): boolean =>
    txStack !== null && rxStack !== null && p.tiltX === 0 && p.tiltY === 0;
  const viaStack = stackRoute(txAll, rxOwn, txStack, rxStack);
  const generic = (p: Pose): number =>
    viaStack ? viaStack(p) : filamentSetMutual(txAll, transformFilaments(rxOwn, p));

  const mutualMany = (inputs: readonly PoseInput[]): Float64Array => {
    const poses = inputs.map(accept);
    const out = new Float64Array(poses.length);
    const groups = new Map<number, number[]>();
    poses.forEach((p, i) => {
      if (!parallel(p)) {
        out[i] = generic(p);
        return;
      }
      const hit = cache.get(`${p.z}|${p.x * p.x + p.y * p.y}`);
      if (hit !== undefined) {
        out[i] = hit;
        return;
      }
      const list = groups.get(p.z) ?? [];
      list.push(i);
      groups.set(p.z, list);
    });
    for (const [z, idx] of groups) {
      const rho2 = Float64Array.from(idx, (i) => poses[i].x * poses[i].x + poses[i].y * poses[i].y);
      const values = coaxialCoilMutualMany(txStack as StackRing[], rxStack as StackRing[], z, rho2);
      idx.forEach((i, j) => {
        out[i] = values[j];
        cache.set(`${z}|${rho2[j]}`, values[j]);
      });
    }
    return out;
  };

  const L2At = (input: PoseInput): number => {
    if (!txCoil.backing) return getL2();
    const p = parsePose(input);
    const untilted = p.tiltX === 0 && p.tiltY === 0;
    // An untilted Rx's image depends on its height only.
    const hit = untilted ? l2Cache.get(p.z) : undefined;
    if (hit !== undefined) return hit;
    const placed = transformFilaments(rxOwn, p);
    const value = getL2() + filamentSetMutual(ferriteImages(placed, txCoil.backing), placed);
    if (untilted) l2Cache.set(p.z, value);
    return value;
  };

  return {
    get L1() {
      return getL1();
    },
    get L2() {
      return getL2();
    },
    L2At,
    mutual: (pose) => mutualMany([pose])[0],
    mutualMany,
    coupling: (pose) => {
      const m = mutualMany([pose])[0];
      return m / Math.sqrt(getL1() * L2At(pose));
    },
  };
}
