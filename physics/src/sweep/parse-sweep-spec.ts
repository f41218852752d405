import { describeZodError } from '../coils/describe-zod-error';
import { sweepSpecSchema, type SweepSpec } from './sweep-spec-schema';

/**
 * Validate a sweep spec from JSON, with one `RangeError` that names the first bad field.
 *
 * Method: `sweepSpecSchema.safeParse`; the first issue becomes `path.field: message` (the coil
 * models' describeZodError, so all input errors read alike), e.g.
 * `sweep.x.steps: must be an integer from 1 to 1000000 (got 2.5)`. The grid-size bound is part of
 * the schema, so a too-large grid fails here, before any pose is computed.
 *
 * References: none (input validation).
 *
 * @param json parsed JSON (unknown)
 * @param path name of the spec in messages (default `sweep`)
 * @returns the validated spec
 * @example parseSweepSpec({ z: 0.003 }) // { z: 0.003 }
 */
export function parseSweepSpec(json: unknown, path = 'sweep'): SweepSpec {
  const result = sweepSpecSchema.safeParse(json);
  if (result.success) return result.data;
  throw new RangeError(describeZodError(result.error, path));
}
