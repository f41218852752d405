import { coilSchema, type Coil } from './coil-schema';
import { describeZodError } from './describe-zod-error';

/**
 * Validates a coil given as JSON and returns it typed, or throws one RangeError that names the
 * field and its allowed range — never a list of zod issues or a stack of them.
 *
 * Method: `coilSchema.safeParse` (ranges of every field, then the cross-field rules of
 * `coilGeometryIssues`); the first issue becomes the message `path.to.field: what; allowed: …`,
 * with array indices written `rings[3]`. Further issues are counted at the end of the message.
 *
 * References: none needed.
 *
 * @param json the parsed JSON value of a coil
 * @param path name of the value in messages, e.g. `tx` or `pairs[2].rx`
 * @returns the validated coil (SI units, metres)
 * @throws RangeError such as `coil.pitch: 0.4 mm is below the conductor width 0.8 mm (turns would
 *   overlap); allowed: pitch ≥ conductor width`
 * @example parseCoil({ kind: 'ring', radius: 0.02, wireRadius: 5e-4 }).radius // 0.02
 */
export function parseCoil(json: unknown, path = 'coil'): Coil {
  const result = coilSchema.safeParse(json);
  if (result.success) return result.data;
  throw new RangeError(describeZodError(result.error, path));
}
