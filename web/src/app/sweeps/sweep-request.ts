import type {
  CreateSweepRequest,
  MAX_STORED_SWEEP_POSES,
  StudyPose,
  SweepKind,
  SweepSpec,
} from '../api-types';

/** The API's cap on a stored run (a value, so it cannot come through a type-only import). */
export const maxStoredSweepPoses: typeof MAX_STORED_SWEEP_POSES = 250_000;

/** Gaps of a stack of maps: the API's rule for xy-stack. */
export const stackGapSteps = { min: 2, max: 12 } as const;

/** A range as the form holds it: lengths in metres, tilts in degrees, empty fields null. */
export interface RangeValue {
  from: number | null;
  to: number | null;
  steps: number | null;
}

/**
 * Everything the sweep set-up form holds: one block per kind, so switching kinds keeps what was
 * typed for each. Lengths in metres, tilts in degrees.
 */
export interface SweepSetupValue {
  kind: SweepKind;
  map: { x: RangeValue; y: RangeValue; gap: number | null };
  gap: { gaps: RangeValue };
  tilt: { axis: 'tiltX' | 'tiltY'; tilt: RangeValue; gap: number | null };
  stack: { x: RangeValue; y: RangeValue; gaps: RangeValue };
}

export type SweepRequestResult =
  { request: CreateSweepRequest; poses: number } | { problem: string; poses: number | null };

type Axis = NonNullable<SweepSpec['x']>;

/**
 * The request a set-up form describes, or what is wrong with it, in words for the user.
 *
 * The axes a kind does not sweep stay at the study's nominal pose (x, y, tilts), so a gap sweep
 * runs at the design offset; zero axes are left out, as the engine reads a missing axis as 0.
 * The pose count is the product of the steps; above the API's storage cap the request is refused
 * here, with the reason, before the server is asked.
 *
 * @param value the form's value
 * @param nominal the study's nominal pose (m, degrees)
 * @returns the request and its pose count, or a problem (with the count when it is known)
 */
export function sweepRequest(value: SweepSetupValue, nominal: StudyPose): SweepRequestResult {
  const at = (v: number) => (v === 0 ? undefined : v);
  let grid: Partial<Record<keyof SweepSpec, Axis | undefined>>;
  const ranges: Axis[] = [];
  const range = (name: string, r: RangeValue, steps?: { min: number; max: number }): Axis => {
    const checked = rangeSpec(name, r, steps);
    if (typeof checked === 'string') throw new SetupProblem(checked);
    ranges.push(checked);
    return checked;
  };
  try {
    switch (value.kind) {
      case 'xy-map':
        grid = {
          x: range('x', value.map.x),
          y: range('y', value.map.y),
          z: gapValue(value.map.gap),
          tiltX: at(nominal.tiltX),
          tiltY: at(nominal.tiltY),
        };
        break;
      case 'gap':
        grid = {
          x: at(nominal.x),
          y: at(nominal.y),
          z: range('gap', value.gap.gaps),
          tiltX: at(nominal.tiltX),
          tiltY: at(nominal.tiltY),
        };
        break;
      case 'tilt': {
        const other = value.tilt.axis === 'tiltX' ? 'tiltY' : 'tiltX';
        grid = {
          x: at(nominal.x),
          y: at(nominal.y),
          z: gapValue(value.tilt.gap),
          [value.tilt.axis]: range('tilt', value.tilt.tilt),
          [other]: at(nominal[other]),
        };
        break;
      }
      case 'xy-stack':
        grid = {
          x: range('x', value.stack.x),
          y: range('y', value.stack.y),
          z: range('gap', value.stack.gaps, stackGapSteps),
        };
        break;
    }
  } catch (error) {
    if (error instanceof SetupProblem) return { problem: error.message, poses: null };
    throw error;
  }
  const poses = ranges.reduce<number>((n, r) => n * (typeof r === 'object' ? r.steps : 1), 1);
  if (poses > maxStoredSweepPoses) {
    return {
      problem:
        `${poses.toLocaleString('en')} poses is more than one run may store ` +
        `(${maxStoredSweepPoses.toLocaleString('en')}), since results are kept with the ` +
        'study. Use fewer steps or a smaller range.',
      poses,
    };
  }
  const spec = Object.fromEntries(
    Object.entries(grid).filter(([, v]) => v !== undefined),
  ) as SweepSpec;
  return { request: { kind: value.kind, grid: spec }, poses };
}

class SetupProblem extends Error {}

function gapValue(gap: number | null): number {
  if (gap === null || !Number.isFinite(gap)) throw new SetupProblem('Enter the gap.');
  if (gap < 0) throw new SetupProblem('The gap must be at least 0 mm.');
  return gap;
}

function rangeSpec(
  name: string,
  r: RangeValue,
  steps: { min: number; max: number } = { min: 2, max: Infinity },
): Axis | string {
  if (r.from === null || r.to === null || r.steps === null) {
    return `Enter the ${name} range: from, to and steps.`;
  }
  if (!Number.isInteger(r.steps) || r.steps < steps.min || r.steps > steps.max) {
    const allowed =
      steps.max === Infinity ? `at least ${steps.min}` : `${steps.min} to ${steps.max}`;
    return `Steps of ${name}: a whole number, ${allowed}.`;
  }
  if (!(r.from < r.to)) return `The ${name} range must end above where it starts.`;
  return { from: r.from, to: r.to, steps: r.steps };
}
