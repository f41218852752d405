import type { PoseInput, SweepAxisSpec, SweepSpec } from '../../../physics/src/index';
import { ValidationError } from '../errors/app-errors';
import { MAX_STORED_SWEEP_POSES, type SweepKind } from './sweeps-dto';

type Axis = keyof SweepSpec;
const axes: Axis[] = ['x', 'y', 'z', 'tiltX', 'tiltY'];

const isRange = (a: SweepAxisSpec | undefined): a is Exclude<SweepAxisSpec, number> =>
  typeof a === 'object';

/** Poses of a (schema-valid) grid: the product of the axes' steps. */
export function sweepPoseCount(grid: SweepSpec): number {
  return axes.reduce((n, axis) => {
    const a = grid[axis];
    return n * (isRange(a) ? a.steps : 1);
  }, 1);
}

const kindNames: Record<SweepKind, string> = {
  'xy-map': 'an xy-map',
  gap: 'a gap sweep',
  tilt: 'a tilt sweep',
  'xy-stack': 'an xy-stack',
};

/** An xy-stack keeps one map per gap; more than a dozen is not a stack a person reads. */
const MAX_STACK_GAPS = 12;

/**
 * The shape rules of each sweep kind (sweeps-dto.ts), checked after the engine's own schema:
 * which axes are ranges and which single values, the gaps of a stack, and the stored-pose cap.
 * The error names the axis (`grid.x`, `grid.z.steps`, …) so a form can mark the field.
 */
export function checkSweepShape(kind: SweepKind, grid: SweepSpec): void {
  const what = kindNames[kind];
  const range = (axis: Axis, label: string) => {
    if (!isRange(grid[axis])) {
      fail(`grid.${axis}`, `must be a range {from, to, steps} of ${label} for ${what}`);
    }
  };
  const single = (axis: Axis, label: string) => {
    if (isRange(grid[axis])) fail(`grid.${axis}`, `must be a single ${label} for ${what}`);
  };
  if (kind === 'xy-map') {
    range('x', 'offsets');
    range('y', 'offsets');
    single('z', 'gap');
    single('tiltX', 'tilt');
    single('tiltY', 'tilt');
  } else if (kind === 'gap') {
    range('z', 'gaps');
    single('x', 'offset');
    single('y', 'offset');
    single('tiltX', 'tilt');
    single('tiltY', 'tilt');
  } else if (kind === 'tilt') {
    if (isRange(grid.tiltX) && isRange(grid.tiltY)) {
      fail('grid.tiltY', `must be a single tilt when tiltX is swept; ${what} sweeps one tilt`);
    }
    if (!isRange(grid.tiltX) && !isRange(grid.tiltY)) {
      fail('grid.tiltX', `must be a range {from, to, steps} of tilts (or tiltY) for ${what}`);
    }
    single('z', 'gap');
    single('x', 'offset');
    single('y', 'offset');
  } else {
    range('x', 'offsets');
    range('y', 'offsets');
    range('z', 'gaps');
    const z = grid.z as Exclude<SweepAxisSpec, number>;
    if (z.steps > MAX_STACK_GAPS) {
      fail('grid.z.steps', `must be 2 to ${MAX_STACK_GAPS} gaps for ${what} (got ${z.steps})`);
    }
    single('tiltX', 'tilt');
    single('tiltY', 'tilt');
  }
  const count = sweepPoseCount(grid);
  if (count > MAX_STORED_SWEEP_POSES) {
    fail(
      'grid',
      `${count} poses is too many to store; allowed: at most ${MAX_STORED_SWEEP_POSES} per run`,
    );
  }
}

/**
 * The poses checked for clearance before a run is queued: every combination of the ends and
 * the middle of each swept axis (at most 27 for the three-range xy-stack). Coils that touch
 * somewhere inside the grid but not at these poses fail the run with the pose named.
 */
export function clearanceProbes(grid: SweepSpec): PoseInput[] {
  let poses: PoseInput[] = [{}];
  for (const axis of axes) {
    const a = grid[axis];
    const values = isRange(a) ? [...new Set([a.from, (a.from + a.to) / 2, a.to])] : [a ?? 0];
    poses = poses.flatMap((p) => values.map((v) => ({ ...p, [axis]: v })));
  }
  return poses;
}

function fail(field: string, message: string): never {
  throw new ValidationError(`${field}: ${message}`, field);
}
