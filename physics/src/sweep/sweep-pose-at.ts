import type { SweepAxes } from './sweep-axes';
import type { SweepPose } from './sweep-pose';

/**
 * The pose at a flat index of a sweep grid.
 *
 * Method: the grid order is x fastest, then y, z, tiltX, tiltY (slowest); index
 * i = ix + nx·(iy + ny·(iz + nz·(itx + ntx·ity))). Yaw is always 0.
 *
 * References: none (row-major indexing).
 *
 * @param axes the axis values (sweepAxes)
 * @param index 0 … count − 1
 * @returns the pose (m, degrees)
 * @example sweepPoseAt({ x: [0, 1], y: [5], z: [2], tiltX: [0], tiltY: [0] }, 1).x // 1
 */
export function sweepPoseAt(axes: SweepAxes, index: number): SweepPose {
  let i = index;
  const ix = i % axes.x.length;
  i = (i - ix) / axes.x.length;
  const iy = i % axes.y.length;
  i = (i - iy) / axes.y.length;
  const iz = i % axes.z.length;
  i = (i - iz) / axes.z.length;
  const itx = i % axes.tiltX.length;
  i = (i - itx) / axes.tiltX.length;
  if (!Number.isInteger(index) || index < 0 || i >= axes.tiltY.length) {
    throw new RangeError(
      `index: must be an integer from 0 to ${sweepCount(axes) - 1} (got ${index})`,
    );
  }
  return {
    x: axes.x[ix],
    y: axes.y[iy],
    z: axes.z[iz],
    tiltX: axes.tiltX[itx],
    tiltY: axes.tiltY[i],
    yaw: 0,
  };
}

function sweepCount(a: SweepAxes): number {
  return a.x.length * a.y.length * a.z.length * a.tiltX.length * a.tiltY.length;
}
