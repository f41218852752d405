import { describeZodError } from '../coils/describe-zod-error';
import { poseSchema, type Pose } from './pose-schema';

/**
 * Validates a pose given as JSON, filling missing fields with 0, or throws one RangeError naming
 * the field and its allowed range.
 *
 * Method: `poseSchema.safeParse`; the first issue becomes `pose.field: what; allowed: …`.
 *
 * References: none needed.
 *
 * @param json the parsed JSON value of a pose (`undefined` means the aligned pose)
 * @param path name of the value in messages
 * @returns the complete pose, metres and degrees
 * @throws RangeError such as `pose.tiltY: 400° is out of range; allowed: ≥ -360° and ≤ 360°`
 * @example parsePose({ z: 0.003 }) // { x: 0, y: 0, z: 0.003, tiltX: 0, tiltY: 0, yaw: 0 }
 */
export function parsePose(json: unknown, path = 'pose'): Pose {
  const result = poseSchema.safeParse(json ?? {});
  if (result.success) return result.data;
  throw new RangeError(describeZodError(result.error, path));
}
