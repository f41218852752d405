import type { SweepAxisSpec, SweepSpec } from './sweep-spec-schema';

/** The values each axis of a sweep takes: metres for x, y, z; degrees for tilts. */
export interface SweepAxes {
  x: number[];
  y: number[];
  z: number[];
  tiltX: number[];
  tiltY: number[];
}

/**
 * The values of every axis of a validated sweep spec.
 *
 * Method: a range {from, to, steps} gives (from·(n − 1 − i) + to·i)/(n − 1), i = 0 … n − 1,
 * computed per index (not by accumulating a step) so both ends are exact, a symmetric range hits
 * 0 exactly, and the values do not depend on how the grid is traversed; each value is then
 * rounded to 15 significant digits so that 0.005 is not printed as 0.004999999999999999 (a change
 * below 5e-16 relative, far below any physical tolerance; the rounded value is the one computed
 * and reported). A number gives [number]; a missing axis gives [0].
 *
 * References: none (bookkeeping).
 *
 * @param spec a spec validated by sweepSpecSchema
 * @returns the axis values
 * @example sweepAxes({ x: { from: -0.01, to: 0.01, steps: 3 }, z: 0.003 }).x // [-0.01, 0, 0.01]
 */
export function sweepAxes(spec: SweepSpec): SweepAxes {
  return {
    x: axisValues(spec.x),
    y: axisValues(spec.y),
    z: axisValues(spec.z),
    tiltX: axisValues(spec.tiltX),
    tiltY: axisValues(spec.tiltY),
  };
}

function axisValues(axis: SweepAxisSpec | undefined): number[] {
  if (axis === undefined) return [0];
  if (typeof axis === 'number') return [axis];
  const { from, to, steps } = axis;
  if (steps === 1) return [from];
  const n = steps - 1;
  return Array.from({ length: steps }, (_, i) =>
    i === n ? to : Number(((from * (n - i) + to * i) / n).toPrecision(15)),
  );
}
