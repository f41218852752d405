import { parseSweepSpec } from './parse-sweep-spec';
import { sweepAxes, type SweepAxes } from './sweep-axes';
import type { SweepPose } from './sweep-pose';
import { sweepPoseAt } from './sweep-pose-at';
import type { SweepSpec } from './sweep-spec-schema';

/** Every pose of a sweep, in grid order, with the axes that span it. */
export interface SweepGrid {
  axes: SweepAxes;
  count: number;
  poses: SweepPose[];
}

/**
 * The poses a sweep visits, in a documented deterministic order.
 *
 * Method: the spec is validated first (including the MAX_SWEEP_POSES bound, so an oversized grid
 * fails before any allocation); the poses are the Cartesian product of the axes with x varying
 * fastest, then y, z, tiltX and tiltY slowest — the row-major order of an x–y map per gap and
 * tilt. Pose i is sweepPoseAt(axes, i).
 *
 * References: none (bookkeeping).
 *
 * @param spec the sweep spec (validated again here)
 * @returns axes, count and poses (m, degrees; yaw 0)
 * @example
 * sweepGrid({ x: { from: 0, to: 0.01, steps: 2 }, z: { from: 0.002, to: 0.004, steps: 2 } })
 *   .poses.map((p) => [p.x, p.z]) // [[0, 0.002], [0.01, 0.002], [0, 0.004], [0.01, 0.004]]
 */
export function sweepGrid(spec: SweepSpec): SweepGrid {
  const axes = sweepAxes(parseSweepSpec(spec));
  const count =
    axes.x.length * axes.y.length * axes.z.length * axes.tiltX.length * axes.tiltY.length;
  const poses = Array.from({ length: count }, (_, i) => sweepPoseAt(axes, i));
  return { axes, count, poses };
}
