/**
 * The sweep spec as JSON: which poses a sweep visits. Lengths in metres, tilts in degrees. An axis
 * is a single number or a range `{from, to, steps}` of `steps` evenly spaced values including both
 * ends; a missing axis is 0. `z` (the gap) is required. Every object is strict: a misspelt axis
 * is an error, not a silently flat sweep.
 */
import { z } from 'zod';

/**
 * Upper bound on the poses of one sweep, checked before any work: a million poses is a 1001² map
 * (finer than any plot shows), ~16 MB of results and minutes of worker time for multi-turn coils;
 * a larger grid is almost certainly a typing slip, and would let one request hog a worker.
 */
export const MAX_SWEEP_POSES = 1_000_000;

/** Positions within ±10 m, the coil models' own coordinate range (COIL_LIMITS.position). */
export const SWEEP_POSITION_LIMIT = 10;

/** Tilts within ±180°: every orientation of the Rx axis is reachable inside that band. */
export const SWEEP_TILT_LIMIT = 180;

function axisSchema(limit: number, unit: string) {
  const value = z
    .number({ error: (i) => `expected a finite number, received ${typeof i.input}` })
    .refine((v) => Math.abs(v) <= limit, {
      error: (i) => `${String(i.input)} is out of range; allowed: -${limit} to ${limit} ${unit}`,
    });
  const range = z
    .strictObject(
      {
        from: value,
        to: value,
        steps: z
          .number({ error: (i) => `expected an integer, received ${typeof i.input}` })
          .refine((v) => Number.isInteger(v) && v >= 1 && v <= MAX_SWEEP_POSES, {
            error: (i) =>
              `must be an integer from 1 to ${MAX_SWEEP_POSES} (got ${String(i.input)})`,
          }),
      },
      { error: () => 'unknown field; allowed fields: from, to, steps' },
    )
    .superRefine((r, ctx) => {
      if (r.from > r.to) {
        ctx.addIssue({
          code: 'custom',
          path: ['to'],
          message: `must be ≥ from (${r.from}) (got ${r.to})`,
        });
      } else if (r.steps === 1 && r.from !== r.to) {
        ctx.addIssue({
          code: 'custom',
          path: ['steps'],
          message: 'must be ≥ 2 when from < to (use a plain number for a single value)',
        });
      }
    });
  return z.union([value, range], {
    error: (i) =>
      typeof i.input === 'object' && i.input !== null
        ? undefined
        : `expected a number or {from, to, steps}, received ${describeInput(i.input)}`,
  });
}

function describeInput(input: unknown): string {
  return input === undefined ? 'nothing' : typeof input;
}

const position = axisSchema(SWEEP_POSITION_LIMIT, 'm');
const tilt = axisSchema(SWEEP_TILT_LIMIT, 'deg');

/** Steps of one axis (1 for a plain number or a missing axis). */
const stepsOf = (a: number | { steps: number } | undefined) =>
  typeof a === 'object' ? a.steps : 1;

export const sweepSpecSchema = z
  .strictObject(
    {
      x: position.optional(),
      y: position.optional(),
      z: position,
      tiltX: tilt.optional(),
      tiltY: tilt.optional(),
    },
    { error: () => 'unknown field; allowed fields: x, y, z, tiltX, tiltY' },
  )
  .superRefine((s, ctx) => {
    const count = [s.x, s.y, s.z, s.tiltX, s.tiltY].reduce<number>((n, a) => n * stepsOf(a), 1);
    if (count > MAX_SWEEP_POSES) {
      ctx.addIssue({
        code: 'custom',
        path: [],
        message: `grid too large: ${count} poses; allowed: at most ${MAX_SWEEP_POSES}`,
      });
    }
  });

export type SweepSpec = z.infer<typeof sweepSpecSchema>;
export type SweepAxisSpec = NonNullable<SweepSpec['x']>;
