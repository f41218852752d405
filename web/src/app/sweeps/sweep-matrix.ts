import type { SweepAxes } from '../api-types';

/** One x–y slice of a sweep: rows follow y, columns follow x (the layout plots expect). */
export interface SweepMatrix {
  /** m. */
  xs: number[];
  /** m. */
  ys: number[];
  /** values[iy][ix]. */
  values: number[][];
}

/** Which gap and tilts the slice is taken at (indices into the axes; 0 when missing). */
export interface SweepSliceIndex {
  z?: number;
  tiltX?: number;
  tiltY?: number;
}

/**
 * The x–y matrix of one gap (and tilt) of a sweep result.
 *
 * Method: results are stored in grid order, x fastest, then y, z, tiltX and tiltY slowest
 * (physics' sweepPoseAt), so pose (ix, iy, iz, itx, ity) is at
 * ix + nx·(iy + ny·(iz + nz·(itx + ntx·ity))); one slice is ny consecutive runs of nx values.
 *
 * @param axes the result's axes
 * @param values one value per pose, in grid order (k, η_max, M …)
 * @param at the gap and tilt indices of the slice
 * @returns xs, ys and values[iy][ix]
 * @example sweepMatrix({ x: [0, 1], y: [0, 1], z: [1, 2], tiltX: [0], tiltY: [0] },
 *   [1, 2, 3, 4, 5, 6, 7, 8], { z: 1 }).values // [[5, 6], [7, 8]]
 */
export function sweepMatrix(
  axes: SweepAxes,
  values: readonly number[],
  at: SweepSliceIndex = {},
): SweepMatrix {
  const nx = axes.x.length;
  const ny = axes.y.length;
  const nz = axes.z.length;
  const ntx = axes.tiltX.length;
  const count = nx * ny * nz * ntx * axes.tiltY.length;
  if (values.length !== count) {
    throw new RangeError(`values: must have one entry per pose, ${count} (got ${values.length})`);
  }
  const iz = checkIndex('z', at.z ?? 0, nz);
  const itx = checkIndex('tiltX', at.tiltX ?? 0, ntx);
  const ity = checkIndex('tiltY', at.tiltY ?? 0, axes.tiltY.length);
  const sliceStart = nx * ny * (iz + nz * (itx + ntx * ity));
  const rows = Array.from({ length: ny }, (_, iy) =>
    values.slice(sliceStart + iy * nx, sliceStart + (iy + 1) * nx),
  );
  return { xs: [...axes.x], ys: [...axes.y], values: rows };
}

function checkIndex(name: string, index: number, length: number): number {
  if (!Number.isInteger(index) || index < 0 || index >= length) {
    throw new RangeError(
      `${name}: index must be an integer from 0 to ${length - 1} (got ${index})`,
    );
  }
  return index;
}
