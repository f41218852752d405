import type { SweepAxes } from '../api-types';

/** The swept axis of a curve: the gap, or one of the tilts. */
export type CurveAxis = 'z' | 'tiltX' | 'tiltY';

/** Values along one axis of a sweep, the other axes at their first value. */
export interface SweepCurve {
  /** Axis values: m for the gap, degrees for tilts. */
  at: number[];
  values: number[];
}

/**
 * One axis of a sweep result as a curve (the gap or a tilt), for the gap and tilt sweeps whose
 * other axes hold a single value.
 *
 * Method: in grid order (x fastest, then y, z, tiltX, tiltY) the stride of an axis is the product
 * of the lengths of the axes before it; pose j along the axis is at j·stride.
 *
 * @param axes the result's axes
 * @param values one value per pose, in grid order
 * @param axis which axis the curve follows
 * @returns the axis values and the values along it
 * @example sweepCurve({ x: [0], y: [0], z: [1, 2, 3], tiltX: [0], tiltY: [0] }, [9, 8, 7], 'z')
 *   // { at: [1, 2, 3], values: [9, 8, 7] }
 */
export function sweepCurve(
  axes: SweepAxes,
  values: readonly number[],
  axis: CurveAxis,
): SweepCurve {
  const lengths = [axes.x, axes.y, axes.z, axes.tiltX, axes.tiltY].map((a) => a.length);
  const count = lengths.reduce((n, l) => n * l, 1);
  if (values.length !== count) {
    throw new RangeError(`values: must have one entry per pose, ${count} (got ${values.length})`);
  }
  const position = { z: 2, tiltX: 3, tiltY: 4 }[axis];
  const stride = lengths.slice(0, position).reduce((n, l) => n * l, 1);
  const at = [...axes[axis]];
  return { at, values: at.map((_, j) => values[j * stride]) };
}

/** The axis a tilt or gap sweep follows: the one with more than one value (the gap if none). */
export function curveAxisOf(axes: SweepAxes): CurveAxis {
  if (axes.tiltX.length > 1) return 'tiltX';
  if (axes.tiltY.length > 1) return 'tiltY';
  return 'z';
}
