import type { FilamentSet } from '../filaments';
import { packedSegments } from '../kernels/packed-segments';
import { pathStackMutual, type StackPlacement } from '../kernels/path-stack-mutual';
import type { RingStack } from '../kernels/ring-stack-factor';
import { ringStackTable, type RingStackTable } from '../kernels/ring-stack-table';
import type { Pose } from '../pose/pose-schema';
import { poseRotation } from '../pose/pose-rotation';
import { transformFilaments } from '../pose/transform-filaments';
import type { StackRing } from './coaxial-stack';
import { filamentSetMutual } from './filament-set-mutual';

/**
 * Panels of the polygon sides: bisected while longer than twice their distance to the nearest
 * ring, 10 Gauss–Legendre points each (Bernstein bound (1 + √2)^-20 ≈ 2e-8 per panel). Measured
 * against the bench's independent reference (segment potentials integrated around the rings) on
 * 14 poses of bench case (c): ≤ 1.4e-9 of M at the pose, 700 times inside the 1e-6 target, for
 * 17 % fewer points than 12 per panel (2e-11) and 35 % fewer than ratio 1 with 8 (2e-13).
 */
const QUADRATURE = { ratio: 2, points: 10 };

const IDENTITY: StackPlacement['rows'] = [
  { x: 1, y: 0, z: 0 },
  { x: 0, y: 1, z: 0 },
  { x: 0, y: 0, z: 1 },
];

const packStack = (rings: readonly StackRing[]): RingStack => ({
  r: Float64Array.from(rings, (b) => b.r),
  z: Float64Array.from(rings, (b) => b.z),
  w: Float64Array.from(rings, (b) => b.weight),
});

/** Sum of the smallest wire radii of two sets: no conductor centre line comes closer (m). */
function clearanceOf(a: FilamentSet, b: FilamentSet): number {
  const least = (s: FilamentSet) =>
    Math.min(...s.rings.map((f) => f.wireRadius), ...s.paths.map((f) => f.wireRadius));
  return least(a) + least(b);
}

/**
 * The route for a polygon coil against a coaxial-ring coil in any pose (H), or null when the
 * pair has no such part: M = ∮_paths A_stack · dl + the remaining ring–ring terms.
 *
 * Method: when the Rx is a coaxial-ring stack and the Tx has polylines (or the Tx, images
 * included, is a stack and the Rx has polylines), the polylines' share is `pathStackMutual` with
 * the stack's summed potential from a `ringStackTable` built once per pair (lazily, only where
 * the polylines go; interpolation verified to 1e-12 of the local field), instead of one graded
 * quadrature per ring and side. Ring–ring pairs (a Tx with both kinds, or the images of a ring
 * Tx) stay with `filamentSetMutual` (Babic's single integral, Maxwell when coaxial).
 *
 * References: J. D. Jackson, Classical Electrodynamics, 3rd ed., 1999, eq. 5.37; S. Babic et al.,
 * IEEE Trans. Magn. 46(9), 2010.
 *
 * @param txAll - Tx filaments with its images, Tx frame, m.
 * @param rxOwn - Rx filaments, its local frame, m.
 * @param txStack - the Tx as a stack, or null.
 * @param rxStack - the Rx as a stack, or null.
 * @returns M(pose) in henries, or null.
 *
 * @example stackRoute(rectTx, rx20, null, rx20Stack)?.(pose); // ≈ filamentSetMutual(...)
 */
export function stackRoute(
  txAll: FilamentSet,
  rxOwn: FilamentSet,
  txStack: StackRing[] | null,
  rxStack: StackRing[] | null,
): ((pose: Pose) => number) | null {
  if (rxStack && rxStack.length > 0 && txAll.paths.length > 0) {
    const stack = packStack(rxStack);
    const segments = packedSegments(txAll.paths);
    const rings: FilamentSet = { rings: txAll.rings, paths: [] };
    let table: RingStackTable | undefined;
    return (p) => {
      table ??= ringStackTable(stack, { clearance: clearanceOf(txAll, rxOwn) });
      const placement = { rows: poseRotation(p), t: { x: p.x, y: p.y, z: p.z } };
      const m = pathStackMutual(segments, stack, placement, table, QUADRATURE);
      return rings.rings.length > 0
        ? m + filamentSetMutual(rings, transformFilaments(rxOwn, p))
        : m;
    };
  }
  if (txStack && txStack.length > 0 && rxOwn.paths.length > 0) {
    const stack = packStack(txStack);
    let table: RingStackTable | undefined;
    return (p) => {
      table ??= ringStackTable(stack, { clearance: clearanceOf(txAll, rxOwn) });
      const placed = transformFilaments(rxOwn, p);
      const segments = packedSegments(placed.paths);
      const m = pathStackMutual(
        segments,
        stack,
        { rows: IDENTITY, t: { x: 0, y: 0, z: 0 } },
        table,
        QUADRATURE,
      );
      return placed.rings.length > 0
        ? m + filamentSetMutual(txAll, { rings: placed.rings, paths: [] })
        : m;
    };
  }
  return null;
}
